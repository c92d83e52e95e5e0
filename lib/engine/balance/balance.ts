// The monthly balance: opening stock + harvests/collections − allocated −
// aged out = closing, per pool (castings; leachate). Within a month every
// occurrence is allocated in tier order (see allocate.ts) from the lots on hand
// on its own date, oldest first; so a lot is never used before it is harvested
// nor after it ages out, and a later high-priority feed can reserve stock ahead
// of an earlier low-priority one. Tea is brewed from castings on its day.
import { EngineInputError, requireFinite, requireNonNegative } from "@/lib/engine/core/errors";
import type { DemandOccurrence } from "@/lib/engine/core/types";
import { AMOUNT_EPSILON, LotShelf } from "@/lib/engine/balance/lots";
import { grantMonth, orderIntoTiers, type Claim } from "@/lib/engine/balance/allocate";
import { dayNumber, isoFromDay, monthSpans } from "@/lib/engine/core/dates";
import { explainPoolMonth, fmt } from "@/lib/engine/balance/explain";
import {
  DEFAULT_PRICE_PER_LB,
  DEFAULT_SHELF_LIFE_DAYS,
  emptyTotals,
  resolveOptions,
} from "@/lib/engine/balance/options";
import { finish } from "@/lib/engine/balance/result";
import type {
  BalanceInput,
  BalanceResult,
  CastingsMonth,
  OccurrenceResult,
  Pool,
  PoolMonth,
} from "@/lib/engine/balance/types";
import type { Explanation, SupplyEvent } from "@/lib/engine/core/types";

export { DEFAULT_PRICE_PER_LB, DEFAULT_SHELF_LIFE_DAYS };

export function computeBalance(input: BalanceInput): BalanceResult {
  const opts = resolveOptions(input.options);
  const spans = monthSpans(input.options.from, input.options.months, "options.from");
  // Dates repeat across thousands of applications; parse each distinct one once.
  const days = new Map<string, number>();
  const dayOf = (date: string, field: string) => {
    let d = days.get(date);
    if (d === undefined) {
      d = dayNumber(date, field);
      days.set(date, d);
    }
    return d;
  };
  const monthOf = (day: number): number | undefined => {
    let lo = 0;
    let hi = spans.length - 1;
    if (day < spans[0]!.startDay || day >= spans[hi]!.endDay) return undefined;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (spans[mid]!.startDay <= day) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  };
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
    const day = dayOf(ev.date, `supply[${i}].date`);
    requireNonNegative(ev.amount, `supply[${i}].amount`, 1e7);
    const m = monthOf(day);
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
    const day = dayOf(d.date, `demand[${i}].date`);
    const amount = requireNonNegative(d.amount, `demand[${i}].amount`, 1e6);
    const priority = requireFinite(d.priority, `demand[${i}].priority`);
    const m = monthOf(day);
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
      const claims = claimsByMonth[m]?.[pool] ?? [];
      const grants = grantMonth(shelf.snapshot(), shelf.keepDays, orderIntoTiers(claims));
      // Physical use: in date order, oldest lot first (delivers every grant; see grantMonth).
      const byDate = [...claims].sort((x, y) => x.day - y.day || x.ref - y.ref);
      for (const c of byDate) {
        const occ = occurrences[c.ref] as OccurrenceResult;
        const got = shelf.draw(c.day, Math.min(occ.need, grants.get(c.ref) ?? 0));
        occ.allocated = got;
        occ.coveragePct = (100 * got) / occ.need;
        demand += occ.need;
        allocated += got;
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

export { isoFromDay };
