import fc from "fast-check";
import { computeBalance } from "@/lib/engine/balance/balance";
import type { BalanceInput, BalanceResult } from "@/lib/engine/balance/types";
import { closeGap } from "@/lib/engine/gap/gap";
import { addDays } from "@/lib/engine/core/dates";
import type { StockLot } from "@/lib/engine/balance/lots";
import type { DemandOccurrence, SupplyEvent } from "@/lib/engine/core/types";
import { collect, harvest, want } from "./balance-fixtures";

// Invariants of the balance (PRODUCT.md "Balance (the heart)"), checked on
// random gardens. Tolerances are for float rounding only.
const TOL = 1e-6;
const START = "2026-03-01";

const supplyArb: fc.Arbitrary<SupplyEvent> = fc
  .record({
    day: fc.integer({ min: 0, max: 120 }),
    amount: fc.double({ min: 0, max: 20, noNaN: true }),
    liquid: fc.boolean(),
  })
  .map(({ day, amount, liquid }) => (liquid ? collect : harvest)(addDays(START, day), amount));

const demandArb: fc.Arbitrary<DemandOccurrence> = fc
  .record({
    p: fc.integer({ min: 0, max: 5 }),
    day: fc.integer({ min: 0, max: 120 }),
    amount: fc.double({ min: 0, max: 10, noNaN: true }),
    priority: fc.integer({ min: 1, max: 3 }),
    feederClass: fc.constantFrom("heavy" as const, "medium" as const, "light" as const),
    material: fc.constantFrom("castings" as const, "leachate" as const, "tea" as const),
  })
  .map((d) => want(`p${d.p}`, addDays(START, d.day), d.amount, d));

const lotArb: fc.Arbitrary<StockLot> = fc
  .record({
    ago: fc.integer({ min: 1, max: 90 }),
    amount: fc.double({ min: 0, max: 30, noNaN: true }),
  })
  .map(({ ago, amount }) => ({
    id: `lot-${ago}`,
    material: "castings" as const,
    madeOn: addDays(START, -ago),
    amount,
  }));

const inputArb: fc.Arbitrary<BalanceInput> = fc
  .record({
    supply: fc.array(supplyArb, { maxLength: 12 }),
    demand: fc.array(demandArb, { maxLength: 25 }),
    openingLots: fc.array(lotArb, { maxLength: 3 }),
    months: fc.integer({ min: 1, max: 4 }),
  })
  .map(({ months, ...rest }) => ({
    ...rest,
    options: { from: "2026-03", months, teaCastingsKgPerLitre: 0.1 },
  }));

function allNumbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === "number") out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => allNumbers(v, out));
  else if (value && typeof value === "object")
    Object.values(value).forEach((v) => allNumbers(v, out));
  return out;
}

const rows = (r: BalanceResult) => [...r.castings, ...r.leachate];

describe("balance invariants", () => {
  it("stock is never negative", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const r = computeBalance(input);
        for (const m of rows(r)) {
          expect(m.opening).toBeGreaterThanOrEqual(0);
          expect(m.closing).toBeGreaterThanOrEqual(0);
          expect(m.agedOut).toBeGreaterThanOrEqual(0);
        }
        for (const o of r.occurrences) expect(o.allocated).toBeGreaterThanOrEqual(0);
      }),
    );
  });

  it("allocated ≤ demand and ≤ available, per application and per month", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const r = computeBalance(input);
        for (const o of r.occurrences) expect(o.allocated).toBeLessThanOrEqual(o.need + TOL);
        for (const m of rows(r)) {
          expect(m.allocated).toBeLessThanOrEqual(m.demand + TOL);
          expect(m.allocated).toBeLessThanOrEqual(m.opening + m.supplied + TOL);
        }
      }),
    );
  });

  it("conserves stock every month: opening + supplied − allocated − aged out = closing", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const r = computeBalance(input);
        for (const pool of [r.castings, r.leachate]) {
          pool.forEach((m, i) => {
            expect(m.opening + m.supplied - m.allocated - m.agedOut).toBeCloseTo(m.closing, 6);
            const next = pool[i + 1];
            if (next) expect(next.opening).toBeCloseTo(m.closing, 9);
          });
        }
      }),
    );
  });

  it("more supply never lowers any planting's coverage", () => {
    fc.assert(
      fc.property(inputArb, fc.array(supplyArb, { minLength: 1, maxLength: 4 }), (input, more) => {
        const before = computeBalance(input);
        const after = computeBalance({ ...input, supply: [...input.supply, ...more] });
        const key = (c: { plantingId: string; month: string; material: string }) =>
          `${c.plantingId}|${c.month}|${c.material}`;
        const was = new Map(before.coverage.map((c) => [key(c), c.coveragePct]));
        for (const c of after.coverage)
          expect(c.coveragePct).toBeGreaterThanOrEqual((was.get(key(c)) ?? 0) - TOL);
      }),
      { numRuns: 300 },
    );
  });

  it("never returns NaN or Infinity", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const nums = allNumbers(computeBalance(input));
        expect(nums.every(Number.isFinite)).toBe(true);
      }),
    );
  });
});

describe("gap suggestions, applied, leave no shortfall", () => {
  it("holds for every suggestion on random short gardens", () => {
    fc.assert(
      fc.property(inputArb, fc.double({ min: 1, max: 15, noNaN: true }), (input, kgPerTray) => {
        const bin = (start: string) =>
          [30, 60, 90, 120].map((k) => harvest(addDays(start, k), kgPerTray, "bin-2"));
        const report = closeGap({
          base: input,
          tray: { binId: "bin-a", kgPerTray, processingDays: 30, manureFeedstock: false },
          secondBin: { binId: "bin-a", supplyFrom: bin },
        });
        expect(allNumbers(report).every(Number.isFinite)).toBe(true);
        for (const s of report.suggestions) {
          let applied: BalanceInput = input;
          if (s.kind === "extra-trays") {
            applied = {
              ...input,
              supply: [...input.supply, ...s.harvests.map((h) => harvest(h.harvestOn, h.kg))],
            };
          } else if (s.kind === "second-bin") {
            applied = { ...input, supply: [...input.supply, ...bin(s.latestStart)] };
          } else {
            const ids = new Set(s.plantingIds);
            applied = {
              ...input,
              demand: input.demand.map((d) =>
                d.material !== "leachate" && ids.has(d.plantingId)
                  ? { ...d, amount: d.amount * (1 - s.cutPct / 100) }
                  : d,
              ),
            };
          }
          expect(computeBalance(applied).firstShortfall.castings).toBeNull();
          expect(s.proof.totals.castings.shortfall).toBe(0);
        }
      }),
      { numRuns: 60 },
    );
  });
});
