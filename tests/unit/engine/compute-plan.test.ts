import { describe, expect, it } from "vitest";
import { computePlan, dflt, feedingId } from "@/lib/engine";
import { toSi } from "@/lib/units";
import { application, bin, garden, lot, planting, LB } from "./garden-fixtures";

// computePlan on small invented gardens. Sources are named beside each expected number.

const castings = (plan: ReturnType<typeof computePlan>, month: string) =>
  plan.rows.find((r) => r.pool === "castings" && r.month === month)!;

describe("replaying history up to asOf", () => {
  it("a logged application draws from the lot it names, not the oldest", () => {
    const g = garden({
      asOf: "2026-05-31",
      stockLots: [
        lot({ id: "old", madeOn: "2026-04-20", amount: 5 }),
        lot({ id: "new", madeOn: "2026-05-10", amount: 5 }),
      ],
      plantings: [planting({ id: "p", startDate: "2026-05-01", endDate: "2026-05-31" })],
    });
    g.logs.applications = [
      application({
        id: "a",
        plantingId: "p",
        date: "2026-05-15",
        amount: 2,
        draws: [{ lotId: "new", amount: 2 }],
      }),
    ];
    const plan = computePlan(g, { from: "2026-06", months: 1 });
    // Opening in June: old 5 (made 20 Apr, keeps 60 days to 19 Jun) + new 5 − 2 = 8 kg.
    expect(castings(plan, "2026-06").opening).toBeCloseTo(8, 12);
    // Old lot (5 kg) ages out on 19 Jun, in June: nothing took from it.
    expect(castings(plan, "2026-06").agedOut).toBeCloseTo(5, 12);
  });

  it("a logged application that names no lot draws oldest first", () => {
    const g = garden({
      asOf: "2026-05-31",
      stockLots: [
        lot({ id: "old", madeOn: "2026-04-20", amount: 5 }),
        lot({ id: "new", madeOn: "2026-05-10", amount: 5 }),
      ],
      plantings: [planting({ id: "p", startDate: "2026-05-01", endDate: "2026-05-31" })],
    });
    g.logs.applications = [
      application({ id: "a", plantingId: "p", date: "2026-05-15", amount: 2 }),
    ];
    const plan = computePlan(g, { from: "2026-06", months: 1 });
    expect(castings(plan, "2026-06").agedOut).toBeCloseTo(3, 12); // 5 − 2 taken from the old lot
  });

  it("reports a lot that expires before the plan as aged out on its day, and one expiring in month 1 in month 1", () => {
    const g = garden({
      asOf: "2026-05-31",
      stockLots: [
        lot({ id: "gone", madeOn: "2026-03-01", amount: 4 }),
        lot({ id: "soon", madeOn: "2026-04-15", amount: 3 }),
      ],
    });
    const plan = computePlan(g, { from: "2026-06", months: 2 });
    // 60-day shelf life (Harit et al. 2014): 1 Mar + 60 = 30 Apr; 15 Apr + 60 = 14 Jun.
    const aged = plan.warnings.filter((w) => w.kind === "aged-out");
    expect(aged.map((w) => [w.lotId, w.date])).toEqual([
      ["gone", "2026-04-30"],
      ["soon", "2026-06-14"],
    ]);
    expect(castings(plan, "2026-06").agedOut).toBeCloseTo(3, 12);
    expect(castings(plan, "2026-06").opening).toBeCloseTo(3, 12);
  });

  it("a logged application replaces the planned feeding it names, keeping its id", () => {
    const g = garden({
      asOf: "2026-05-31",
      stockLots: [lot({ id: "s", madeOn: "2026-05-20", amount: 20 })],
      plantings: [planting({ id: "p", startDate: "2026-05-01", endDate: "2026-08-31" })],
    });
    const before = computePlan(g, { from: "2026-06", months: 3 });
    const june = before.feedings.find((f) => f.date === "2026-06-01")!;
    expect(june.id).toBe(feedingId("p", "castings", "2026-06-01"));
    g.logs.applications = [
      application({
        id: "a",
        plantingId: "p",
        date: "2026-06-02",
        amount: 0.5,
        plannedFeedingId: june.id,
      }),
    ];
    const after = computePlan(g, { from: "2026-06", months: 3 });
    const same = after.feedings.filter((f) => f.id === june.id);
    expect(same.map((f) => [f.status, f.amount])).toEqual([["logged", 0.5]]);
    // The other occurrences keep their ids.
    expect(after.feedings.map((f) => f.id)).toEqual(before.feedings.map((f) => f.id));
  });
});

describe("liquids as they are handled", () => {
  const leachateGarden = (estimateLPerWeek: number, maxAge: number | null = null) => {
    const g = garden({
      asOf: "2026-05-31",
      bins: [bin({ leachateEstimateLPerWeek: estimateLPerWeek, startDate: "2026-05-01" })],
      plantings: [
        planting({
          id: "kale",
          startDate: "2026-06-07",
          endDate: "2026-08-31",
          rules: [
            {
              material: "leachate",
              method: "drench",
              basis: "per-plant",
              measure: "volume",
              amount: 5.5,
              recurrence: "FREQ=WEEKLY",
              dilutionWaterParts: 10,
              teaCastingsPerWater: null,
            },
          ],
        }),
      ],
    });
    g.settings.liquidMaxAgeDays = maxAge;
    return g;
  };

  it("a weekly drench draws the week's drainage: 0.5 L wanted, 0.7 L a week drained", () => {
    // 5.5 L of 1:10 solution (Arthur et al., HortScience) = 0.5 L leachate; one day's drip is 0.1 L.
    const plan = computePlan(leachateGarden(0.7), { from: "2026-06", months: 3 });
    const drenches = plan.feedings.filter((f) => f.material === "leachate");
    expect(drenches.length).toBeGreaterThan(10);
    for (const f of drenches) {
      expect(f.need).toBeCloseTo(0.5, 12);
      expect(f.coveragePct).toBeCloseTo(100, 6);
    }
  });

  it("discards liquid older than the max age (default 7 days, from memory)", () => {
    expect(dflt("liquidMaxAgeDays")).toBe(7);
    const plan = computePlan(leachateGarden(0.7, 3), { from: "2026-06", months: 3 });
    // Kept only 3 days, a weekly drench finds at most 3 days' collection: 0.3 L of the 0.5 L wanted.
    const drenches = plan.feedings.filter((f) => f.material === "leachate");
    for (const f of drenches) expect(f.allocated).toBeLessThanOrEqual(0.3 + 1e-9);
    const june = plan.rows.find((r) => r.pool === "leachate" && r.month === "2026-06")!;
    expect(june.agedOut).toBeGreaterThan(0);
  });

  it("brews tea from castings on the day and never carries it", () => {
    const g = garden({
      asOf: "2026-05-31",
      stockLots: [lot({ id: "s", madeOn: "2026-06-10", amount: 1 })],
      plantings: [
        planting({
          id: "pepper",
          startDate: "2026-06-06",
          endDate: "2026-06-30",
          rules: [
            {
              material: "tea",
              method: "drench",
              basis: "per-plant",
              measure: "volume",
              amount: 1,
              recurrence: "FREQ=WEEKLY",
              dilutionWaterParts: null,
              teaCastingsPerWater: null,
            },
          ],
        }),
      ],
    });
    const plan = computePlan(g, { from: "2026-06", months: 1 });
    const tea = plan.feedings.filter((f) => f.material === "tea");
    // 1 L of 10 % tea needs 0.1 L castings × 0.7 kg/L = 0.07 kg (Arancon; India FCO bulk density).
    for (const f of tea) expect(f.need).toBeCloseTo(0.07, 12);
    // 6 June comes before the only castings (10 June): nothing to brew with, and no tea stock exists.
    expect(tea.find((f) => f.date === "2026-06-06")!.allocated).toBe(0);
    expect(tea.find((f) => f.date === "2026-06-13")!.coveragePct).toBeCloseTo(100, 9);
    expect(plan.rows.every((r) => r.pool === "castings" || r.pool === "leachate")).toBe(true);
  });
});

describe("pre-harvest interval per lot (7 CFR 205.203(c)(1))", () => {
  const phiGarden = (cleanKg: number) =>
    garden({
      asOf: "2026-05-31",
      stockLots: [
        lot({ id: "manure", madeOn: "2026-06-01", amount: 50, manureFeedstock: true }),
        lot({ id: "clean", madeOn: "2026-06-01", amount: cleanKg }),
      ],
      plantings: [
        // Harvest 1 Sep, edible part off the soil: 90 days → no manure-fed castings from 4 Jun.
        planting({ id: "lettuce", startDate: "2026-06-05", endDate: "2026-09-01", priority: 1 }),
        planting({
          id: "roses",
          startDate: "2026-06-05",
          endDate: "2026-09-01",
          edible: false,
          priority: 2,
        }),
      ],
    });

  it("feeds an edible planting inside its window from clean lots only", () => {
    const plan = computePlan(phiGarden(5), { from: "2026-06", months: 2 });
    const lettuce = plan.feedings.filter((f) => f.plantingId === "lettuce");
    expect(lettuce.length).toBe(2);
    for (const f of lettuce) {
      expect(f.coveragePct).toBeCloseTo(100, 9);
      expect(f.draws.every((d) => d.lotId === "clean")).toBe(true);
    }
    const roses = plan.feedings.filter((f) => f.plantingId === "roses");
    for (const f of roses) expect(f.coveragePct).toBeCloseTo(100, 9);
  });

  it("blocks the feeding, and says so, only when no clean stock can serve it", () => {
    const plan = computePlan(phiGarden(0), { from: "2026-06", months: 2 });
    const lettuce = plan.feedings.filter((f) => f.plantingId === "lettuce");
    expect(lettuce.every((f) => f.status === "blocked" && f.allocated === 0)).toBe(true);
    const w = plan.warnings.filter((x) => x.kind === "pre-harvest-block");
    expect(w.map((x) => x.plantingId)).toEqual(["lettuce"]);
    // The non-edible planting is still fed from the manure-fed lot.
    expect(
      plan.feedings.filter((f) => f.plantingId === "roses").every((f) => f.coveragePct > 99.99),
    ).toBe(true);
  });
});

describe("worms in the plan", () => {
  it("a stacked bin started with 2,000 worms is well past 10,000 after about three months (common practice)", () => {
    const g = garden({
      asOf: "2026-05-01",
      bins: [bin({ startDate: "2026-05-01", startingWorms: 2000 })],
    });
    const plan = computePlan(g, { from: "2026-05", months: 3 });
    const july = plan.bins[0]!.months[2]!; // end of July: day 91
    expect(july.worms).toBeGreaterThan(10_000);
  });

  it("warns that 1,500 worms cannot make 44 lb a month (intake 25 %/day, Alabama Ext.; 1 ft²/lb/week, MSU Ext.)", () => {
    // The 21 × 17 × 5½ in tray gives 32.2 L × 0.9 × 0.7 kg/L ≈ 20.3 kg ≈ 44.7 lb a harvest (PRODUCT.md).
    // 1,500 worms ≈ 1.5 lb eat 0.375 lb a day, 2.6 lb a week; the top tray's 2.48 ft² takes 2.48 lb a week;
    // the month's castings need at least 44.7 lb of food, about 10 lb a week.
    const g = garden({
      asOf: "2026-05-31",
      bins: [bin({ startDate: "2026-03-01", startingWorms: 1500 })],
    });
    g.logs.observations = [
      {
        id: "o",
        binId: "b1",
        date: "2026-05-31",
        wormCount: 1500,
        temperatureC: null,
        moisturePercent: null,
        note: null,
      },
    ];
    const plan = computePlan(g, { from: "2026-06", months: 1 });
    const kinds = plan.warnings.filter((w) => w.binId === "b1").map((w) => w.kind);
    expect(kinds).toContain("capacity-intake");
    expect(kinds).toContain("capacity-surface");
    expect(plan.bins[0]!.months[0]!.castingsKg).toBeGreaterThan(40 * LB);
  });
});

describe("stable ids", () => {
  it("adding an unrelated planting changes no existing feeding or bin task id", () => {
    const g = garden({
      asOf: "2026-05-31",
      bins: [bin({ startDate: "2026-02-01" })],
      plantings: [
        planting({ id: "a" }),
        planting({ id: "b", feederClass: "light", startDate: "2026-06-03" }),
      ],
    });
    const before = computePlan(g);
    g.plantings.push(planting({ id: "c", startDate: "2026-06-17" }));
    const after = computePlan(g);
    const ids = new Set(after.feedings.map((f) => f.id));
    for (const f of before.feedings) expect(ids.has(f.id)).toBe(true);
    expect(after.bins[0]!.tasks.map((t) => t.id)).toEqual(before.bins[0]!.tasks.map((t) => t.id));
    expect(before.bins[0]!.tasks[0]!.id).toMatch(
      /^b1:(add-tray|harvest-tray|drain):\d{4}-\d{2}-\d{2}$/,
    );
  });
});

describe("closing the gap", () => {
  it("never cuts top-priority plantings: with only priority 1 short, no rate cut is offered", () => {
    const g = garden({
      asOf: "2026-05-31",
      stockLots: [lot({ id: "s", madeOn: "2026-05-30", amount: 1 })],
      plantings: [
        planting({ id: "p", priority: 1, startDate: "2026-06-01", endDate: "2026-07-31" }),
      ],
    });
    const gap = computePlan(g, { from: "2026-06", months: 2 }).gap!;
    expect(gap.needed).toBe(true);
    expect(gap.suggestions.some((s) => s.kind === "rate-cut")).toBe(false);
    expect(gap.unavailable.map((u) => u.kind)).toContain("rate-cut");
  });

  it("cuts the lower priority by less than 100 %", () => {
    const g = garden({
      asOf: "2026-05-31",
      stockLots: [lot({ id: "s", madeOn: "2026-05-31", amount: 1.5 })],
      plantings: [
        planting({ id: "top", priority: 1, startDate: "2026-06-01", endDate: "2026-06-30" }),
        planting({ id: "low", priority: 2, startDate: "2026-06-01", endDate: "2026-06-30" }),
      ],
    });
    const gap = computePlan(g, { from: "2026-06", months: 1 }).gap!;
    const cut = gap.suggestions.find((s) => s.kind === "rate-cut")!;
    // 1.5 kg for 1 + 1 kg: the low planting must drop to 0.5 kg, a 50 % cut.
    expect(cut.cutPct).toBe(50);
    expect(cut.plantingIds).toEqual(["low"]);
  });

  it("with no bins suggests starting one (PS 20 tray, four trays, 2,000 worms) or buying castings at the garden's price", () => {
    const g = garden({
      asOf: "2026-05-31",
      plantings: [planting({ id: "p", startDate: "2026-06-01", endDate: "2026-09-30" })],
    });
    const gap = computePlan(g, { from: "2026-06", months: 4 }).gap!;
    const start = gap.suggestions.find((s) => s.kind === "start-bin")!;
    // 24 × 20 in outside of 2×6 (1½ in thick, PS 20) = 21 × 17 × 5½ in inside.
    expect(start.tray!.insideLengthM).toBeCloseTo(toSi(21, "in"), 12);
    expect(start.tray!.insideWidthM).toBeCloseTo(toSi(17, "in"), 12);
    expect(start.tray!.insideDepthM).toBeCloseTo(toSi(5.5, "in"), 12);
    expect([start.traysInStack, start.worms, start.startDate]).toEqual([4, 2000, "2026-06-01"]);
    const buy = gap.suggestions.find((s) => s.kind === "buy-castings")!;
    // 4 monthly feedings × 1 kg, at $1.00 per lb (from memory) = 4 / 0.45359237 dollars.
    expect(buy.castingsKg).toBeCloseTo(4, 12);
    expect(buy.cost).toBeCloseTo(4 / 0.45359237, 9);
    expect(gap.suggestions.some((s) => s.kind === "rate-cut" && (s.cutPct ?? 0) >= 100)).toBe(
      false,
    );
  });
});
