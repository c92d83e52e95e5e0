import { describe, expect, it } from "vitest";
import { computePlan } from "@/lib/engine";
import { application, garden, lot, planting } from "./garden-fixtures";

// The replay of history before the plan's first month. Invented garden, numbers by hand:
// lots L1 (1 kg, made 1 April) and L2 (1 kg, made 10 April), shelf life 365 days so nothing
// ages out; asOf 31 May, so the plan starts in June and every log below is history.
const june = (plan: ReturnType<typeof computePlan>) =>
  plan.rows.find((r) => r.pool === "castings" && r.month === "2026-06")!;

function historyGarden(applications: ReturnType<typeof application>[]) {
  return garden({
    settings: { ...garden().settings, shelfLifeDays: 365 },
    plantings: [
      planting({ id: "p", bedId: "bed", startDate: "2026-04-01" }),
      planting({ id: "q", bedId: "bed", startDate: "2026-04-01" }),
    ],
    stockLots: [
      lot({ id: "L1", madeOn: "2026-04-01", amount: 1 }),
      lot({ id: "L2", madeOn: "2026-04-10", amount: 1 }),
    ],
    logs: { ...garden().logs, applications },
    asOf: "2026-05-31",
  });
}

describe("history replay", () => {
  it("replays a day with a log that names its lot: June opens at 0.75 kg", () => {
    // 15 May: 0.5 kg unnamed takes L1 down to 0.5 (oldest first); 0.25 kg naming L2 takes L2
    // down to 0.75; 0.5 kg unnamed takes the rest of L1. Left: L2's 0.75 kg.
    // (Dropping the named log would leave 1 kg; dropping the unnamed ones, 1.75 kg.)
    const plan = computePlan(
      historyGarden([
        application({ id: "u1", plantingId: "p", date: "2026-05-15", amount: 0.5 }),
        application({
          id: "n1",
          plantingId: "q",
          date: "2026-05-15",
          amount: 0.25,
          draws: [{ lotId: "L2", amount: 0.25 }],
        }),
        application({ id: "u2", plantingId: "p", date: "2026-05-15", amount: 0.5 }),
      ]),
      { months: 1, suggestions: false },
    );
    expect(june(plan).opening).toBeCloseTo(0.75, 12);
  });

  it("takes every unnamed log of a day and of other days: 2 kg − (0.25 + 0.5) − 0.75 = 0.5 kg", () => {
    const plan = computePlan(
      historyGarden([
        application({ id: "a", plantingId: "p", date: "2026-05-03", amount: 0.25 }),
        application({ id: "b", plantingId: "q", date: "2026-05-03", amount: 0.5 }),
        application({ id: "c", plantingId: "p", date: "2026-05-20", amount: 0.75 }),
      ]),
      { months: 1, suggestions: false },
    );
    expect(june(plan).opening).toBeCloseTo(0.5, 12);
  });

  it("asks no more than the lots hold: 3 kg logged of 2 kg leaves nothing, not a negative", () => {
    const plan = computePlan(
      historyGarden([
        application({ id: "a", plantingId: "p", date: "2026-05-03", amount: 1.5 }),
        application({ id: "b", plantingId: "q", date: "2026-05-03", amount: 1.5 }),
      ]),
      { months: 1, suggestions: false },
    );
    expect(june(plan).opening).toBe(0);
  });
});

describe("draws of a logged application in the plan's months", () => {
  it("lists the named lot first, then what the rest took oldest first: new 1 kg, old 1 kg", () => {
    // Lots: old 5 kg (1 May), new 1 kg (10 May). On 10 June a log names 2 kg from "new": it gets
    // the 1 kg there, and the missing 1 kg is drawn oldest first, from "old". asOf 20 June, so
    // the log is in the plan's first month and shows as a logged feeding with its draws.
    const g = garden({
      settings: { ...garden().settings, shelfLifeDays: 365 },
      plantings: [planting({ id: "p", bedId: "bed", startDate: "2026-04-01" })],
      stockLots: [
        lot({ id: "old", madeOn: "2026-05-01", amount: 5 }),
        lot({ id: "new", madeOn: "2026-05-10", amount: 1 }),
      ],
      logs: {
        ...garden().logs,
        applications: [
          application({
            id: "a",
            plantingId: "p",
            date: "2026-06-10",
            amount: 2,
            draws: [{ lotId: "new", amount: 2 }],
          }),
        ],
      },
      asOf: "2026-06-20",
    });
    const plan = computePlan(g, { months: 1, suggestions: false });
    const f = plan.feedings.find((x) => x.status === "logged" && x.date === "2026-06-10")!;
    expect(f.draws).toEqual([
      { lotId: "new", amount: 1 },
      { lotId: "old", amount: 1 },
    ]);
    expect(f.allocated).toBeCloseTo(2, 12);
  });
});
