import { describe, expect, it } from "vitest";
import type { GardenNames } from "@/components/balance/garden-names";
import { formLinksForSuggestion } from "@/components/balance/suggestion-links";
import type { GapSuggestion } from "@/lib/engine";

// Gap suggestions as links to the pre-filled forms, by the URL contract in the team's
// rules (RULES.md "URL contract"): the expected URLs below are written out by hand from it.

const gardenId = "7b0c7a4e-1111-4222-8333-944445555666";
const names: GardenNames = {
  bins: [
    {
      id: "bin-a",
      name: "Shed stack",
      trays: 4,
      rotationIntervalDays: null,
      startDate: "2026-03-01",
      startingWorms: 2000,
      kind: "stacked-tray",
    },
  ],
  beds: [{ id: "bed-1", name: "North bed" }],
  plantings: [
    {
      id: "pl-1",
      label: "Lettuce (12) in North bed",
      bedId: "bed-1",
      feederClass: "light",
      priority: 1,
      edible: true,
      rule: null,
    },
  ],
};
const explanation = (inputs: Record<string, unknown>) =>
  ({ kind: "gap", inputs }) as unknown as GapSuggestion["explanation"];
const like = { like: { ref: "bin", id: "bin-a" } };

describe("suggestion → pre-filled form link", () => {
  it("a rate cut opens each planting's form on its bed page with the cut in percent", () => {
    const links = formLinksForSuggestion(
      {
        kind: "rate-cut",
        cutPct: 25,
        plantingIds: ["pl-1"],
        remainingShortfallKg: 0,
        explanation: explanation({}),
      },
      names,
      gardenId,
    );
    expect(links).toEqual([
      {
        label: "Edit Lettuce (12) in North bed: 25 % less",
        href: `/g/${gardenId}/beds/bed-1?planting=pl-1&cut=25`,
      },
    ]);
  });

  it("a fractional cut is rounded up (a deeper cut closes at least as much)", () => {
    const [link] = formLinksForSuggestion(
      {
        kind: "rate-cut",
        cutPct: 12.5,
        plantingIds: ["pl-1"],
        remainingShortfallKg: 0,
        explanation: explanation({}),
      },
      names,
      gardenId,
    );
    expect(link?.href).toBe(`/g/${gardenId}/beds/bed-1?planting=pl-1&cut=13`);
  });

  it("extra trays open the bin's edit form with today's trays plus the extra ones", () => {
    const links = formLinksForSuggestion(
      { kind: "extra-trays", trays: 2, remainingShortfallKg: 0, explanation: explanation(like) },
      names,
      gardenId,
    );
    // 4 trays today + 2 = 6.
    expect(links).toEqual([
      { label: "Edit Shed stack: 6 trays", href: `/g/${gardenId}/bins/bin-a?edit=1&trays=6` },
    ]);
  });

  it("a second bin opens the new-bin form like the bin it copies, started by the date", () => {
    const [link] = formLinksForSuggestion(
      {
        kind: "second-bin",
        startDate: "2026-05-10",
        remainingShortfallKg: 0,
        explanation: explanation(like),
      },
      names,
      gardenId,
    );
    expect(link?.href).toBe(
      `/g/${gardenId}/bins/new?name=Shed+stack+2&trays=4&startedOn=2026-05-10&worms=2000&kind=stacked-tray`,
    );
  });

  it("buying castings and suggestions naming nothing known give no link", () => {
    expect(
      formLinksForSuggestion(
        {
          kind: "buy-castings",
          castingsKg: 5,
          remainingShortfallKg: 0,
          explanation: explanation({}),
        },
        names,
        gardenId,
      ),
    ).toEqual([]);
    expect(
      formLinksForSuggestion(
        {
          kind: "rate-cut",
          cutPct: 20,
          plantingIds: ["gone"],
          remainingShortfallKg: 0,
          explanation: explanation({}),
        },
        names,
        gardenId,
      ),
    ).toEqual([]);
  });
});
