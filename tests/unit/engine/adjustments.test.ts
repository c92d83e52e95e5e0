import { describe, expect, it } from "vitest";
import { computePlan } from "@/lib/engine";
import { application, garden, lot, planting } from "./garden-fixtures";

// A hand adjustment (spilled, given away) is a log on its own date: the lot keeps
// its full amount until that day. Invented garden, numbers by hand:
// - lot "bought": 10 kg made 1 May 2026, shelf life set to 365 days so nothing ages out;
// - 20 May: 8 kg top-dressed from it (logged) → 2 kg left;
// - 10 June: 1 kg spilled (logged adjustment) → 1 kg left.
function spillGarden(spillKg = -1) {
  return garden({
    settings: { ...garden().settings, shelfLifeDays: 365 },
    plantings: [planting({ id: "p", bedId: "bed", startDate: "2026-05-01" })],
    stockLots: [lot({ id: "bought", madeOn: "2026-05-01", amount: 10 })],
    logs: {
      ...garden().logs,
      applications: [application({ id: "a1", plantingId: "p", date: "2026-05-20", amount: 8 })],
      adjustments: [
        {
          id: "spill",
          lotId: "bought",
          date: "2026-06-10",
          amount: spillKg,
          reason: "spilled",
          note: null,
        },
      ],
    },
    asOf: "2026-06-30",
  });
}

const castings = (plan: ReturnType<typeof computePlan>, month: string) =>
  plan.rows.find((r) => r.pool === "castings" && r.month === month)!;

describe("stock adjustments in the ledger", () => {
  const plan = computePlan(spillGarden(), { from: "2026-05", months: 2, suggestions: false });

  it("leaves the lot whole before the spill: May closes with 10 − 8 = 2 kg, the 8 kg fully served", () => {
    const may = castings(plan, "2026-05");
    expect(may.supplied).toBeCloseTo(10, 12);
    expect(may.allocated).toBeCloseTo(8, 12);
    expect(may.adjusted).toBe(0);
    expect(may.closing).toBeCloseTo(2, 12);
    const a1 = plan.feedings.find((f) => f.plantingId === "p" && f.date === "2026-05-20")!;
    expect(a1.coveragePct).toBeCloseTo(100, 9);
  });

  it("takes the spill from its own date: June opens at 2 kg, adjusted −1 kg, closes at 1 kg", () => {
    const june = castings(plan, "2026-06");
    expect(june.opening).toBeCloseTo(2, 12);
    expect(june.adjusted).toBeCloseTo(-1, 12);
    expect(june.closing).toBeCloseTo(1, 12);
    // Conservation with the new term: opening + supplied + adjusted − allocated − aged out = closing.
    expect(
      june.opening + june.supplied + june.adjusted - june.allocated - june.agedOut,
    ).toBeCloseTo(june.closing, 12);
  });

  it("never takes more than the lot holds: a 5 kg spill of 2 kg left takes 2", () => {
    const june = castings(
      computePlan(spillGarden(-5), { from: "2026-05", months: 2, suggestions: false }),
      "2026-06",
    );
    expect(june.adjusted).toBeCloseTo(-2, 12);
    expect(june.closing).toBeCloseTo(0, 12);
  });
});
