import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  addDays,
  computePlan,
  runLedger,
  toDayNumber,
  type GardenInputs,
  type GardenPlan,
} from "@/lib/engine";
import { application, bin, garden, lot, planting } from "./garden-fixtures";

// Invariants of the plan (PRODUCT.md "Balance (the heart)" and issue 8 "Checks"), on random
// invented gardens. Tolerances are for float rounding only.
const TOL = 1e-6;
const AS_OF = "2026-05-31";

const gardenArb: fc.Arbitrary<GardenInputs> = fc
  .record({
    lots: fc.array(
      fc.record({
        ago: fc.integer({ min: -40, max: 90 }),
        kg: fc.double({ min: 0, max: 8, noNaN: true }),
        manure: fc.boolean(),
        liquid: fc.boolean(),
      }),
      { maxLength: 6 },
    ),
    plantings: fc.array(
      fc.record({
        start: fc.integer({ min: -20, max: 60 }),
        length: fc.integer({ min: 10, max: 120 }),
        priority: fc.integer({ min: 1, max: 3 }),
        kg: fc.double({ min: 0.01, max: 2, noNaN: true }),
        material: fc.constantFrom("castings" as const, "leachate" as const, "tea" as const),
        edible: fc.boolean(),
        soil: fc.boolean(),
        weekly: fc.boolean(),
      }),
      { maxLength: 6 },
    ),
    withBin: fc.boolean(),
    manureBin: fc.boolean(),
    logs: fc.array(
      fc.record({
        p: fc.nat(5),
        ago: fc.integer({ min: 0, max: 60 }),
        kg: fc.double({ min: 0, max: 1, noNaN: true }),
      }),
      { maxLength: 5 },
    ),
  })
  .map((r) => {
    const g = garden({ asOf: AS_OF });
    g.stockLots = r.lots.map((l, i) =>
      lot({
        id: `lot-${i}`,
        madeOn: addDays(AS_OF, -l.ago),
        amount: l.kg,
        manureFeedstock: l.manure,
        material: l.liquid ? "leachate" : "castings",
      }),
    );
    if (r.withBin)
      g.bins = [
        bin({
          startDate: "2026-01-10",
          manureFeedstock: r.manureBin,
          leachateEstimateLPerWeek: 0.5,
        }),
      ];
    g.plantings = r.plantings.map((p, i) =>
      planting({
        id: `p${i}`,
        startDate: addDays(AS_OF, p.start),
        endDate: addDays(AS_OF, p.start + p.length),
        priority: p.priority,
        edible: p.edible,
        edibleTouchesSoil: p.soil,
        rules: [
          {
            material: p.material,
            method: p.material === "castings" ? "top-dress" : "drench",
            basis: "per-plant",
            measure: p.material === "castings" ? "mass" : "volume",
            amount: p.kg,
            recurrence: p.weekly ? "FREQ=WEEKLY" : "FREQ=MONTHLY",
            dilutionWaterParts: null,
            teaCastingsPerWater: null,
          },
        ],
      }),
    );
    g.logs.applications = r.logs
      .filter((l) => l.p < g.plantings.length)
      .map((l, i) =>
        application({
          id: `a${i}`,
          plantingId: `p${l.p}`,
          date: addDays(AS_OF, -l.ago),
          material: "castings",
          amount: l.kg,
        }),
      );
    return g;
  });

const plan = (g: GardenInputs): GardenPlan => computePlan(g, { months: 4, suggestions: false });

describe("plan invariants", () => {
  it("conserves stock every month: opening + in + adjusted − allocated − aged out = closing, never negative", () => {
    fc.assert(
      fc.property(gardenArb, (g) => {
        const p = plan(g);
        for (const r of p.rows) {
          expect(
            r.opening + r.supplied + r.adjusted - r.allocated - r.agedOut - r.closing,
          ).toBeCloseTo(0, 6);
          expect(r.closing).toBeGreaterThanOrEqual(-TOL);
          expect(r.allocated).toBeLessThanOrEqual(r.demand + TOL);
        }
        for (const m of ["castings", "leachate"] as const) {
          const rows = p.rows.filter((r) => r.pool === m);
          for (let i = 1; i < rows.length; i++)
            expect(rows[i]!.opening).toBeCloseTo(rows[i - 1]!.closing, 9);
        }
      }),
      { numRuns: 60 },
    );
  });

  it("replay conserves each lot: what is drawn from a lot never exceeds what it held", () => {
    fc.assert(
      fc.property(gardenArb, (g) => {
        const lots = g.stockLots.map((l) => ({
          id: l.id,
          pool: l.material,
          madeDay: toDayNumber(l.madeOn),
          amount: l.amount,
          binId: null,
          manure: l.manureFeedstock ?? false,
        }));
        const start = toDayNumber("2026-01-01");
        const spans = Array.from({ length: 12 }, (_, k) => {
          const from = toDayNumber(`2026-${String(k + 1).padStart(2, "0")}-01`);
          const to =
            k === 11
              ? toDayNumber("2027-01-01")
              : toDayNumber(`2026-${String(k + 2).padStart(2, "0")}-01`);
          return { month: `2026-${String(k + 1).padStart(2, "0")}`, startDay: from, endDay: to };
        });
        const logged = g.logs.applications.map((a) => ({
          pool: "castings" as const,
          day: toDayNumber(a.date),
          need: a.amount,
          draws: [],
        }));
        const r = runLedger({
          lots,
          planned: [],
          logged,
          keepDays: { castings: 60, leachate: 7 },
          spans,
          recordDrawsFrom: start,
        });
        const drawn = new Map<string, number>();
        for (const list of r.loggedDraws ?? [])
          for (const d of list ?? []) drawn.set(d.lotId, (drawn.get(d.lotId) ?? 0) + d.amount);
        for (const l of lots) expect(drawn.get(l.id) ?? 0).toBeLessThanOrEqual(l.amount + TOL);
        const aged = new Map(r.agedOut.map((a) => [a.lotId, a.amount]));
        // Made in 2026, each lot ends drawn, aged out or still on the shelf at the end of the year.
        for (const l of lots) {
          if (l.madeDay < start) continue;
          const left = (r.snapshot ?? []).find((x) => x.id === l.id)?.amount ?? 0;
          expect((drawn.get(l.id) ?? 0) + (aged.get(l.id) ?? 0) + left).toBeLessThanOrEqual(
            l.amount + TOL,
          );
        }
      }),
      { numRuns: 60 },
    );
  });

  it("a manure-fed lot is never given to an edible planting inside its 90/120-day window (7 CFR 205.203(c)(1))", () => {
    fc.assert(
      fc.property(gardenArb, (g) => {
        const p = plan(g);
        const manureLots = new Set(g.stockLots.filter((l) => l.manureFeedstock).map((l) => l.id));
        const manureBin = g.bins.some((b) => b.manureFeedstock);
        for (const f of p.feedings) {
          if (f.status === "logged") continue;
          const pl = g.plantings.find((x) => x.id === f.plantingId)!;
          if (!pl.edible) continue;
          const days = pl.edibleTouchesSoil ? 120 : 90;
          const harvest = toDayNumber(pl.harvestDate ?? pl.endDate!);
          if (harvest - toDayNumber(f.date) >= days) continue;
          for (const d of f.draws) {
            expect(manureLots.has(d.lotId)).toBe(false);
            if (manureBin) expect(d.lotId.startsWith("b1:")).toBe(false);
          }
        }
      }),
      { numRuns: 60 },
    );
  });

  it("more clean stock never lowers any planned feeding's coverage", () => {
    fc.assert(
      fc.property(
        gardenArb,
        fc.integer({ min: 0, max: 60 }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (g, ago, kg) => {
          const before = plan(g);
          const more = {
            ...g,
            stockLots: [
              ...g.stockLots,
              lot({ id: "extra", madeOn: addDays(AS_OF, -ago), amount: kg }),
            ],
          };
          const after = new Map(plan(more).feedings.map((f) => [f.id, f]));
          for (const f of before.feedings) {
            if (f.status === "logged") continue;
            expect(after.get(f.id)!.allocated).toBeGreaterThanOrEqual(f.allocated - TOL);
          }
        },
      ),
      { numRuns: 60 },
    );
  });

  it("adding an unrelated planting changes no existing id", () => {
    fc.assert(
      fc.property(gardenArb, fc.integer({ min: 0, max: 60 }), (g, start) => {
        const before = plan(g);
        const more = {
          ...g,
          plantings: [...g.plantings, planting({ id: "new", startDate: addDays(AS_OF, start) })],
        };
        const after = plan(more);
        const ids = new Set(after.feedings.map((f) => f.id));
        for (const f of before.feedings) expect(ids.has(f.id)).toBe(true);
        expect(after.bins.flatMap((b) => b.tasks.map((t) => t.id))).toEqual(
          before.bins.flatMap((b) => b.tasks.map((t) => t.id)),
        );
      }),
      { numRuns: 40 },
    );
  });

  it("liquids never outlive their keep window: every leachate draw is younger than the max age", () => {
    fc.assert(
      fc.property(gardenArb, fc.integer({ min: 1, max: 10 }), (g, maxAge) => {
        g.settings.liquidMaxAgeDays = maxAge;
        const p = plan(g);
        const made = new Map(g.stockLots.map((l) => [l.id, toDayNumber(l.madeOn)]));
        for (const f of p.feedings) {
          if (f.material !== "leachate") continue;
          for (const d of f.draws) {
            const m = made.get(d.lotId) ?? toDayNumber(d.lotId.slice(-10));
            const age = toDayNumber(f.date) - m;
            expect(age).toBeGreaterThanOrEqual(0);
            expect(age).toBeLessThan(maxAge);
          }
        }
      }),
      { numRuns: 60 },
    );
  });

  it("never returns NaN or Infinity", () => {
    fc.assert(
      fc.property(gardenArb, (g) => {
        const nums: number[] = [];
        const walk = (v: unknown) => {
          if (typeof v === "number") nums.push(v);
          else if (v && typeof v === "object") Object.values(v).forEach(walk);
        };
        walk(computePlan(g, { months: 3 }));
        expect(nums.every(Number.isFinite)).toBe(true);
      }),
      { numRuns: 30 },
    );
  });
});
