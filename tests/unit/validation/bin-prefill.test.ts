import { describe, expect, it } from "vitest";
import { editBinPrefill, newBinPrefill, wantsEditForm } from "@/lib/validation/bin-prefill";

// The URL contract between the Balance's suggestions and the bin forms (RULES.md,
// "URL contract"): known, valid parameters fill the form; anything else is ignored.
// Bounds are the bin form's own: 1–12 trays, a whole count of worms up to 1,000,000,
// names of 1–60 characters, calendar dates in 1900–2200.

describe("the new-bin link (/bins/new?…)", () => {
  it("fills every field the second-bin suggestion sends", () => {
    expect(
      newBinPrefill({
        name: "Second stack",
        trays: "3",
        startedOn: "2026-12-01",
        worms: "1500",
        kind: "flow-through",
      }),
    ).toEqual({
      name: "Second stack",
      trayCount: 3,
      startedOn: "2026-12-01",
      startingWormCount: 1500,
      kind: "flow-through",
    });
  });

  it.each([
    ["trays", "0"],
    ["trays", "13"],
    ["trays", "2.5"],
    ["trays", "three"],
    ["trays", ""],
    ["worms", "-5"],
    ["worms", "1000001"],
    ["worms", "Infinity"],
    ["kind", "worm-tower"],
    ["startedOn", "2026-02-30"], // no 30 February in the Gregorian calendar
    ["startedOn", "1899-12-31"],
    ["startedOn", "2026-1-5"],
    ["name", "x".repeat(61)],
    ["name", "Bin\u0000two"],
    ["name", "   "],
    ["lengthM", "-0.5"],
    ["depthM", "0.61"],
  ])("ignores %s=%j and keeps the others", (key, value) => {
    const prefill = newBinPrefill({ [key]: value, trays: key === "trays" ? value : "5" });
    expect(prefill).toEqual(key === "trays" ? {} : { trayCount: 5 });
  });

  it("ignores unknown parameters and takes the first of a repeated one", () => {
    expect(newBinPrefill({ colour: "red", trays: ["6", "9"] })).toEqual({
      trayCount: 6,
    });
  });
});

describe("the extra-trays link (/bins/{binId}?edit=1&trays=n)", () => {
  it("asks for the edit form only with edit=1", () => {
    expect(wantsEditForm({ edit: "1" })).toBe(true);
    expect(wantsEditForm({ edit: "true" })).toBe(false);
    expect(wantsEditForm({})).toBe(false);
  });

  it("fills the tray count when it is a whole 1–12, and nothing otherwise", () => {
    expect(editBinPrefill({ edit: "1", trays: "7" })).toEqual({ trayCount: 7 });
    expect(editBinPrefill({ edit: "1", trays: "99" })).toEqual({});
    expect(editBinPrefill({ edit: "1" })).toEqual({});
  });
});
