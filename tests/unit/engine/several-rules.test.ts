import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays, computePlan, type FeedingRuleInput, type GardenInputs } from "@/lib/engine";
import { garden, planting } from "./garden-fixtures";

// Issue 10, item 3: a planting can hold several rules ("castings monthly and tea
// every two weeks"); every rule expands into its own feedings, and the stable
// ids of issue 8, item 5 stay unique and stable.

const castingsMonthly: FeedingRuleInput = {
  material: "castings",
  method: "top-dress",
  basis: "per-plant",
  measure: "mass",
  amount: 0.1,
  recurrence: "FREQ=MONTHLY",
  dilutionWaterParts: null,
  teaCastingsPerWater: null,
};
const teaFortnightly: FeedingRuleInput = {
  material: "tea",
  method: "drench",
  basis: "per-plant",
  measure: "volume",
  amount: 0.25,
  recurrence: "FREQ=WEEKLY;INTERVAL=2",
  dilutionWaterParts: null,
  teaCastingsPerWater: null,
};

const plan = (g: GardenInputs) =>
  computePlan(g, { from: "2026-05", months: 3, suggestions: false });

describe("several rules on one planting", () => {
  const g = garden({
    asOf: "2026-04-30",
    plantings: [
      planting({
        id: "tomato",
        plantCount: 4,
        startDate: "2026-05-01",
        endDate: "2026-07-31",
        rules: [castingsMonthly, teaFortnightly],
      }),
    ],
  });
  const feedings = plan(g).feedings;
  const series = (material: string) =>
    feedings.filter((f) => f.material === material).map((f) => [f.id, f.date, f.amount]);

  it("castings monthly and tea every two weeks give both series", () => {
    // RFC 5545 §3.3.10: FREQ=MONTHLY from DTSTART 1 May repeats on the 1st; FREQ=WEEKLY;INTERVAL=2
    // repeats every 14 days from 1 May. Amounts per plant × 4 plants.
    expect(series("castings")).toEqual([
      ["tomato:castings:2026-05-01", "2026-05-01", 0.4],
      ["tomato:castings:2026-06-01", "2026-06-01", 0.4],
      ["tomato:castings:2026-07-01", "2026-07-01", 0.4],
    ]);
    expect(series("tea")).toEqual(
      ["05-01", "05-15", "05-29", "06-12", "06-26", "07-10", "07-24"].map((d) => [
        `tomato:tea:2026-${d}`,
        `2026-${d}`,
        1,
      ]),
    );
  });

  it("two rules of one material meeting on a day get distinct ids; the first rule keeps the plain ones", () => {
    const weekly = { ...castingsMonthly, amount: 0.05, recurrence: "FREQ=WEEKLY" };
    const both = garden({
      asOf: "2026-04-30",
      plantings: [
        planting({
          id: "kale",
          startDate: "2026-05-01",
          endDate: "2026-05-31",
          rules: [castingsMonthly, weekly],
        }),
      ],
    });
    const ids = plan(both).feedings.map((f) => f.id);
    // 1 May is the monthly rule's and the weekly rule's first day (both anchored on the start).
    expect(ids).toContain("kale:castings:2026-05-01");
    expect(ids).toContain("kale:castings:2026-05-01:2");
    // Weekly from 1 May: 1, 8, 15, 22, 29 May; monthly: 1 May. Six feedings, six ids.
    expect(ids).toHaveLength(6);
    expect(new Set(ids).size).toBe(6);
  });
});

describe("stable ids with several rules (property)", () => {
  const AS_OF = "2026-04-30";
  const ruleArb = fc.record({
    material: fc.constantFrom("castings" as const, "leachate" as const, "tea" as const),
    weekly: fc.boolean(),
    interval: fc.integer({ min: 1, max: 3 }),
  });
  const toRule = (r: {
    material: FeedingRuleInput["material"];
    weekly: boolean;
    interval: number;
  }) =>
    ({
      ...castingsMonthly,
      material: r.material,
      method: r.material === "castings" ? "top-dress" : "drench",
      measure: r.material === "castings" ? "mass" : "volume",
      recurrence: `FREQ=${r.weekly ? "WEEKLY" : "MONTHLY"};INTERVAL=${r.interval}`,
    }) satisfies FeedingRuleInput;
  const gardenArb = fc.array(
    fc.record({
      start: fc.integer({ min: 0, max: 40 }),
      rules: fc.array(ruleArb, { maxLength: 3 }),
    }),
    { minLength: 1, maxLength: 5 },
  );

  it("adding a rule to one planting changes no other planting's ids, nor its own earlier rules' ids", () => {
    fc.assert(
      fc.property(gardenArb, fc.nat(), ruleArb, (list, pick, extra) => {
        const g = garden({
          asOf: AS_OF,
          plantings: list.map((p, i) =>
            planting({
              id: `p${i}`,
              startDate: addDays(AS_OF, 1 + p.start),
              endDate: addDays(AS_OF, 90 + p.start),
              rules: p.rules.map(toRule),
            }),
          ),
        });
        const before = plan(g).feedings.map((f) => f.id);
        const target = pick % g.plantings.length;
        const more = structuredClone(g);
        more.plantings[target]!.rules.push(toRule(extra));
        const after = plan(more).feedings.map((f) => f.id);
        expect(new Set(after).size).toBe(after.length);
        const kept = new Set(after);
        // A planting without rules was fed its class default; a rule of its own replaces that.
        const hadRules = g.plantings[target]!.rules.length > 0;
        for (const id of before)
          if (hadRules || !id.startsWith(`p${target}:`)) expect(kept.has(id)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
});
