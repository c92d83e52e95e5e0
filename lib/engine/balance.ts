// The monthly balance: opening stock + harvests/collections − allocated −
// aged out = closing, per pool (castings; leachate). Within a month every
// occurrence is allocated in tier order (see allocate.ts) from the lots on hand
// on its own date, oldest first; so a lot is never used before it is harvested
// nor after it ages out, and a later high-priority feed can reserve stock ahead
// of an earlier low-priority one. Tea is brewed from castings on its day.
import { EngineInputError, requireFinite, requireNonNegative } from "@/lib/engine/errors";
import type { BlockedOccurrence, DemandOccurrence } from "@/lib/engine/types";
import { AMOUNT_EPSILON, LotShelf } from "@/lib/engine/lots";
import { orderIntoTiers, splitTier, type Claim } from "@/lib/engine/allocate";
import { dayNumber, isoFromDay, monthOfDay, monthSpans } from "@/lib/engine/balance-days";
import { explainPoolMonth, explainSurplus, fmt } from "@/lib/engine/balance-explain";
import { summariseCoverage } from "@/lib/engine/balance-coverage";
import type {
  BalanceInput,
  BalanceResult,
  CastingsMonth,
  OccurrenceResult,
  Pool,
  PoolMonth,
  PoolTotals,
} from "@/lib/engine/balance-types";
import type { Explanation, SupplyEvent } from "@/lib/engine/types";

export const DEFAULT_SHELF_LIFE_DAYS = 60; // Harit et al. 2014, J. Applied Horticulture 16(2)
export const DEFAULT_PRICE_PER_LB = 1.0; // common retail, from memory
const KG_PER_LB = 0.45359237; // exact, NIST Handbook 44 Appendix C

interface Resolved {
  shelfLifeDays: number;
  leachateKeepDays: number;
  pricePerLb: number;
  teaKgPerL: number | undefined;
}

function resolveOptions(o: BalanceInput["options"]): Resolved {
  const shelf = o.shelfLifeDays ?? DEFAULT_SHELF_LIFE_DAYS;
  const keep = o.leachateKeepDays ?? 1;
  if (!Number.isInteger(shelf) || shelf < 1 || shelf > 3650) {
    throw new EngineInputError(
      "options.shelfLifeDays",
      `must be a whole number of days 1–3650 (got ${shelf})`,
    );
  }
  if (!Number.isInteger(keep) || keep < 1 || keep > 365) {
    throw new EngineInputError(
      "options.leachateKeepDays",
      `must be a whole number of days 1–365 (got ${keep})`,
    );
  }
  const price = requireNonNegative(o.pricePerLb ?? DEFAULT_PRICE_PER_LB, "options.pricePerLb", 1e6);
  const tea =
    o.teaCastingsKgPerLitre === undefined
      ? undefined
      : requireNonNegative(o.teaCastingsKgPerLitre, "options.teaCastingsKgPerLitre", 10);
  return { shelfLifeDays: shelf, leachateKeepDays: keep, pricePerLb: price, teaKgPerL: tea };
}

function emptyTotals(): PoolTotals {
  return { supplied: 0, demand: 0, allocated: 0, agedOut: 0, shortfall: 0, closing: 0 };
}

export function computeBalance(input: BalanceInput): BalanceResult {
  const opts = resolveOptions(input.options);
  const spans = monthSpans(input.options.from, input.options.months, "options.from");
  const monthIdx = new Map(spans.map((s, i) => [s.month, i] as const));
  const horizonStart = (spans[0] as (typeof spans)[0]).startDay;
  const notes: Explanation[] = [];

  const shelves: Record<Pool, LotShelf> = {
    castings: new LotShelf(opts.shelfLifeDays),
    leachate: new LotShelf(opts.leachateKeepDays),
  };
  (input.openingLots ?? []).forEach((lot, i) => {
    const field = `openingLots[${i}]`;
    const madeDay = dayNumber(lot.madeOn, `${field}.madeOn`);
    const amount = requireNonNegative(lot.amount, `${field}.amount`, 1e7);
    if (madeDay >= horizonStart) {
      throw new EngineInputError(`${field}.madeOn`, "must be before the first month of the plan");
    }
    shelves[lot.material].add({
      id: lot.id,
      madeDay,
      amount,
      binId: lot.binId,
      manure: !!lot.manureFeedstock,
    });
  });
  // Opening lots already past their shelf life never count as stock.
  const staleAtStart =
    shelves.castings.ageOutBefore(horizonStart) + shelves.leachate.ageOutBefore(horizonStart);
  if (staleAtStart > 0)
    notes.push({
      text: `${fmt(staleAtStart)} of opening stock was already too old and is not counted`,
    });

  const supplyByMonth = spans.map((): { day: number; ev: SupplyEvent }[] => []);
  let outside = 0;
  input.supply.forEach((ev, i) => {
    const day = dayNumber(ev.date, `supply[${i}].date`);
    requireNonNegative(ev.amount, `supply[${i}].amount`, 1e7);
    const m = monthIdx.get(monthOfDay(day));
    if (m === undefined) outside++;
    else supplyByMonth[m]?.push({ day, ev });
  });
  if (outside > 0)
    notes.push({
      text: `${outside} harvests/collections fall outside the plan's months and are not counted (stock from before the start belongs in opening stock)`,
    });

  const occurrences: OccurrenceResult[] = [];
  const claimsByMonth = spans.map((): Record<Pool, Claim[]> => ({ castings: [], leachate: [] }));
  let demandOutside = 0;
  input.demand.forEach((d: DemandOccurrence, i) => {
    const day = dayNumber(d.date, `demand[${i}].date`);
    const amount = requireNonNegative(d.amount, `demand[${i}].amount`, 1e6);
    const priority = requireFinite(d.priority, `demand[${i}].priority`);
    const m = monthIdx.get(monthOfDay(day));
    if (m === undefined) return void demandOutside++;
    let need = amount;
    if (d.material === "tea") {
      if (opts.teaKgPerL === undefined) {
        throw new EngineInputError(
          "options.teaCastingsKgPerLitre",
          "is required when a planting wants tea",
        );
      }
      need = amount * opts.teaKgPerL;
    }
    if (!(need > 0)) return;
    const pool: Pool = d.material === "leachate" ? "leachate" : "castings";
    const ref = occurrences.length;
    occurrences.push({
      plantingId: d.plantingId,
      bedId: d.bedId,
      date: d.date,
      material: d.material,
      pool,
      amount,
      need,
      allocated: 0,
      coveragePct: 0,
      explanation: d.explanation,
    });
    claimsByMonth[m]?.[pool].push({ ref, priority, feederClass: d.feederClass, day, need });
  });
  if (demandOutside > 0)
    notes.push({ text: `${demandOutside} applications fall outside the plan's months` });

  const castings: CastingsMonth[] = [];
  const leachate: PoolMonth[] = [];
  const totals = { castings: emptyTotals(), leachate: emptyTotals() };

  spans.forEach((span, m) => {
    for (const pool of ["castings", "leachate"] as const) {
      const shelf = shelves[pool];
      const opening = shelf.total();
      let supplied = 0;
      const harvests: SupplyEvent[] = [];
      for (const { day, ev } of supplyByMonth[m] ?? []) {
        if (ev.material !== pool) continue;
        shelf.add({
          id: `${ev.binId}@${ev.date}`,
          madeDay: day,
          amount: ev.amount,
          binId: ev.binId,
          manure: ev.manureFeedstock,
        });
        supplied += ev.amount;
        harvests.push(ev);
      }
      let demand = 0;
      let allocated = 0;
      for (const tier of orderIntoTiers(claimsByMonth[m]?.[pool] ?? [])) {
        const day = (tier[0] as Claim).day;
        const grants = splitTier(tier, shelf.available(day));
        let want = 0;
        for (const g of grants) want += g;
        const got = shelf.draw(day, want);
        const scale = want > 0 ? got / want : 0;
        tier.forEach((c, k) => {
          const occ = occurrences[c.ref] as OccurrenceResult;
          occ.allocated = Math.min(occ.need, (grants[k] ?? 0) * scale);
          occ.coveragePct = (100 * occ.allocated) / occ.need;
          demand += occ.need;
          allocated += occ.allocated;
        });
      }
      const agedOut = shelf.ageOutBefore(span.endDay);
      const closing = shelf.total();
      // Float dust from pro-rata splits is not a shortfall a grower could act on.
      const gap = demand - allocated;
      const shortfall = gap > AMOUNT_EPSILON * Math.max(1, demand) ? gap : 0;
      const row = {
        month: span.month,
        opening,
        supplied,
        demand,
        allocated,
        agedOut,
        closing,
        shortfall,
      };
      const t = totals[pool];
      t.supplied += supplied;
      t.demand += demand;
      t.allocated += allocated;
      t.agedOut += agedOut;
      t.shortfall += shortfall;
      t.closing = closing;
      if (pool === "leachate") {
        leachate.push({
          ...row,
          explanation: explainPoolMonth("L", row, {
            supplied: "collected",
            agedOut: "unused (does not keep)",
          }),
        });
      } else {
        let teaLitres = 0,
          teaNeed = 0,
          teaGot = 0;
        for (const c of claimsByMonth[m]?.castings ?? []) {
          const occ = occurrences[c.ref] as OccurrenceResult;
          if (occ.material !== "tea") continue;
          teaLitres += occ.amount;
          teaNeed += occ.need;
          teaGot += occ.allocated;
        }
        castings.push({
          ...row,
          teaLitres,
          teaCastingsDemand: teaNeed,
          teaCastingsAllocated: teaGot,
          harvests,
          explanation: explainPoolMonth("kg", row, { supplied: "harvested", agedOut: "aged out" }),
        });
      }
    }
  });

  return finish({
    spans,
    castings,
    leachate,
    occurrences,
    totals,
    notes,
    opts,
    blocked: input.blocked ?? [],
  });
}

function finish(a: {
  spans: { month: string }[];
  castings: CastingsMonth[];
  leachate: PoolMonth[];
  occurrences: OccurrenceResult[];
  totals: BalanceResult["totals"];
  notes: Explanation[];
  opts: Resolved;
  blocked: readonly BlockedOccurrence[];
}): BalanceResult {
  const first: Record<Pool, string | null> = { castings: null, leachate: null };
  for (const occ of a.occurrences) {
    if (occ.need - occ.allocated <= Math.max(AMOUNT_EPSILON, occ.need * 1e-9)) continue;
    const cur = first[occ.pool];
    if (cur === null || occ.date < cur) first[occ.pool] = occ.date;
  }
  const any =
    [first.castings, first.leachate].filter((d): d is string => d !== null).sort()[0] ?? null;
  const tc = a.totals.castings;
  const pricePerKg = a.opts.pricePerLb / KG_PER_LB;
  const surplusKg = tc.agedOut + tc.closing;
  const surplusValue = surplusKg * pricePerKg;
  const byMonth: Record<string, number> = {};
  for (const b of a.blocked) byMonth[b.date.slice(0, 7)] = (byMonth[b.date.slice(0, 7)] ?? 0) + 1;
  return {
    months: a.spans.map((s) => s.month),
    castings: a.castings,
    leachate: a.leachate,
    occurrences: a.occurrences,
    coverage: summariseCoverage(a.occurrences),
    firstShortfall: { castings: first.castings, leachate: first.leachate, any },
    totals: a.totals,
    surplus: {
      castingsKg: surplusKg,
      value: surplusValue,
      pricePerLb: a.opts.pricePerLb,
      explanation: explainSurplus(tc.agedOut, tc.closing, a.opts.pricePerLb, surplusValue),
    },
    outputValue: {
      castingsKg: tc.supplied,
      value: tc.supplied * pricePerKg,
      explanation: {
        text: `${fmt(tc.supplied)} kg harvested × ${fmt(a.opts.pricePerLb, 2)} per lb (1 lb = 0.45359237 kg) = ${fmt(tc.supplied * pricePerKg, 2)}`,
        inputs: { harvestedKg: tc.supplied, pricePerLb: a.opts.pricePerLb },
      },
    },
    blocked: { items: [...a.blocked], byMonth },
    notes: a.notes,
  };
}

export { isoFromDay };
