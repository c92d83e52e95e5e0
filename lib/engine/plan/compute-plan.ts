// One call for the whole garden: replay the history up to asOf, forecast every
// bin and planting after it, balance month by month, check the worms, and say
// how to close a shortfall. Returns everything the screens and the CLI show.
import {
  AMOUNT_EPSILON,
  runLedger,
  type LedgerInput,
  type Pool,
} from "@/lib/engine/balance/ledger";
import { fromDayNumber, toDayNumber } from "@/lib/engine/core/dates";
import { closePlanGap } from "@/lib/engine/gap/close";
import { buildBins } from "@/lib/engine/plan/bins";
import { planContext } from "@/lib/engine/plan/context";
import { buildDemand, feedingId } from "@/lib/engine/plan/demand";
import type { Material } from "@/lib/engine/core/types";
import type { GardenInputs, PlanOptions } from "@/lib/engine/plan/inputs";
import type {
  BedDemand,
  ExplainValue,
  Explanation,
  GardenPlan,
  MonthRow,
  PlannedFeeding,
  PlanWarning,
  PlantingCoverage,
} from "@/lib/engine/plan/results";
import { buildSupply } from "@/lib/engine/plan/supply";

const POOLS: Pool[] = ["castings", "leachate"];

export function computePlan(inputs: GardenInputs, options: PlanOptions = {}): GardenPlan {
  const ctx = planContext(inputs, options);
  const warnings: PlanWarning[] = [];
  const supply = buildSupply(inputs, ctx, warnings);
  const demand = buildDemand(inputs, ctx, warnings);
  const ledgerInput: LedgerInput = {
    lots: supply.lots.map((l) => l.lot),
    planned: demand.planned,
    logged: demand.logged,
    keepDays: { castings: ctx.shelfLifeDays, leachate: ctx.liquidMaxAgeDays },
    spans: ctx.spans,
    adjustments: inputs.logs.adjustments.map((a) => ({
      lotId: a.lotId,
      day: toDayNumber(a.date, "logs.adjustments[].date"),
      amount: a.amount,
    })),
  };
  // The gap search re-runs only the months from asOf on, resuming from the lots as they stood then.
  const resumeMonth = Math.max(
    0,
    ctx.spans.findIndex((s) => s.endDay > ctx.asOfDay + 1),
  );
  const ledger = runLedger({
    ...ledgerInput,
    recordDrawsFrom: ctx.planStartDay,
    // Only the gap search resumes from the snapshot.
    snapshotAtMonth: options.suggestions !== false ? resumeMonth : undefined,
  });
  const planSpans = ctx.spans.slice(ctx.firstPlanMonth);
  // The loops below run once per feeding (thousands): plain loops, module values in locals, the
  // plan's window compared inline rather than through helper closures.
  const EPS = AMOUNT_EPSILON;
  const planStart = ctx.planStartDay;
  const planEnd = ctx.planEndDay;
  const planned = demand.planned;
  const logged = demand.logged;

  // Month × pool rows.
  const rows: MonthRow[] = [];
  const teaByMonth = new Map<string, { litres: number; need: number; got: number }>();
  for (let i = 0; i < planned.length; i++) {
    const c = planned[i]!;
    if (c.material !== "tea" || c.day < planStart || c.day > planEnd) continue;
    const month = c.date.slice(0, 7);
    const t = teaByMonth.get(month) ?? { litres: 0, need: 0, got: 0 };
    t.litres += c.amount;
    t.need += c.need;
    t.got += ledger.plannedGot[i]!;
    teaByMonth.set(month, t);
  }
  for (let i = 0; i < logged.length; i++) {
    const c = logged[i]!;
    // The day first: most logs are history, and the claim is at hand while the log is not.
    if (c.day < planStart || c.day > planEnd) continue;
    const a = inputs.logs.applications[c.index]!;
    if (a.material !== "tea") continue;
    const month = a.date.slice(0, 7);
    const t = teaByMonth.get(month) ?? { litres: 0, need: 0, got: 0 };
    t.litres += a.amount;
    t.need += c.need;
    t.got += ledger.loggedGot[i]!;
    teaByMonth.set(month, t);
  }
  for (const r of ledger.rows.slice(ctx.firstPlanMonth * POOLS.length)) {
    const span = planSpans.find((s) => s.month === r.month)!;
    const unit = r.pool === "castings" ? "kg" : "L";
    const tea = teaByMonth.get(r.month);
    rows.push({
      ...r,
      tea:
        r.pool === "castings"
          ? {
              litres: tea?.litres ?? 0,
              castingsDemandKg: tea?.need ?? 0,
              castingsAllocatedKg: tea?.got ?? 0,
            }
          : undefined,
      replayed: span.startDay <= ctx.asOfDay,
      explanation: {
        kind: "pool-month",
        inputs: {
          pool: { text: r.pool },
          opening: { unit, value: r.opening },
          supplied: { unit, value: r.supplied },
          adjusted: { unit, value: r.adjusted },
          allocated: { unit, value: r.allocated },
          agedOut: { unit, value: r.agedOut },
          closing: { unit, value: r.closing },
          demand: { unit, value: r.demand },
          shortfall: { unit, value: r.shortfall },
        },
      },
    });
  }

  // Feedings in the plan's months, planned and logged, with their stable ids.
  // Explanations share the parts that are the same for many rows (a planting's reference; a
  // rule's need and its own explanation): thousands of feedings need not carry copies, and the
  // JSON is the same. The plan is read-only to its callers.
  const plantingRefs = new Map<string, { ref: "planting"; id: string }>();
  const plantingRef = (id: string) => {
    let r = plantingRefs.get(id);
    if (!r) plantingRefs.set(id, (r = { ref: "planting", id }));
    return r;
  };
  const cleanParts = new Map<
    Explanation,
    { need: number; quantity: ExplainValue; parts: Explanation[] }
  >();
  const feedings: PlannedFeeding[] = [];
  const feedingDays: number[] = []; // day number of each feeding, for the sort below
  const blockedByPlanting = new Map<string, { dates: string[]; kg: number }>();
  for (let i = 0; i < planned.length; i++) {
    const c = planned[i]!;
    if (c.day < planStart || c.day > planEnd) continue;
    const got = ledger.plannedGot[i]!;
    const refused = ledger.manureRefused[i]!;
    const blocked = c.cleanOnly && got <= EPS && refused > EPS;
    if (c.cleanOnly && refused > EPS) {
      const b = blockedByPlanting.get(c.plantingId) ?? { dates: [], kg: 0 };
      b.dates.push(c.date);
      b.kg += refused;
      blockedByPlanting.set(c.plantingId, b);
    }
    feedingDays.push(c.day);
    let shared = c.cleanOnly ? cleanParts.get(c.explanation) : undefined;
    if (c.cleanOnly && shared?.need !== c.need) {
      shared = {
        need: c.need,
        quantity: { unit: c.pool === "castings" ? "kg" : "L", value: c.need },
        parts: [c.explanation],
      };
      cleanParts.set(c.explanation, shared);
    }
    feedings.push({
      id: c.id,
      plantingId: c.plantingId,
      bedId: c.bedId,
      date: c.date,
      material: c.material,
      method: c.method,
      amount: c.amount,
      need: c.need,
      allocated: got,
      coveragePct: c.need > 0 ? (100 * got) / c.need : 100,
      status: blocked ? "blocked" : "planned",
      draws: ledger.plannedDraws?.[i] ?? [],
      explanation: shared
        ? {
            kind: "pre-harvest-clean-lots",
            inputs: {
              planting: plantingRef(c.plantingId),
              need: shared.quantity,
              fromCleanLots: { unit: c.pool === "castings" ? "kg" : "L", value: got },
              manureStockRefused: { unit: c.pool === "castings" ? "kg" : "L", value: refused },
            },
            parts: shared.parts,
          }
        : c.explanation,
    });
  }
  const bedOf = new Map(inputs.plantings.map((p) => [p.id, p.bedId]));
  for (let i = 0; i < logged.length; i++) {
    const c = logged[i]!;
    if (c.day < planStart || c.day > planEnd) continue;
    const a = inputs.logs.applications[c.index]!;
    const got = ledger.loggedGot[i]!;
    feedingDays.push(c.day);
    feedings.push({
      id: a.plannedFeedingId ?? feedingId(a.plantingId, a.material, a.date),
      plantingId: a.plantingId,
      bedId: bedOf.get(a.plantingId)!,
      date: a.date,
      material: a.material,
      method: a.method,
      amount: a.amount,
      need: c.need,
      allocated: got,
      coveragePct: c.need > 0 ? (100 * got) / c.need : 100,
      status: "logged",
      draws: ledger.loggedDraws?.[i] ?? [],
      explanation: {
        kind: "application-logged",
        inputs: {
          planting: plantingRef(a.plantingId),
          applied: { unit: a.material === "castings" ? "kg" : "L", value: a.amount },
          drawn: { unit: c.pool === "leachate" ? "L" : "kg", value: c.need },
          drawnFromStock: { unit: c.pool === "leachate" ? "L" : "kg", value: got },
        },
      },
    });
  }
  // By date, then id. Day numbers order exactly as the (checked, YYYY-MM-DD) dates do: the indices
  // are bucketed by day (a counting sort), then each day's run is sorted by id. Ids are unique in
  // practice, and then this is the one order of the comparison below; should two be equal, the
  // whole list is sorted with that comparison instead, as before.
  const byDateThenId = (a: number, b: number) => {
    const da = feedingDays[a]!;
    const db = feedingDays[b]!;
    return da < db ? -1 : da > db ? 1 : feedings[a]!.id < feedings[b]!.id ? -1 : 1;
  };
  let order = sortByDayThenId(feedingDays, feedings, ctx.planStartDay, ctx.planEndDay);
  if (!order) {
    const byComparison = feedings.map((_, i) => i);
    byComparison.sort(byDateThenId);
    order = Int32Array.from(byComparison);
  }
  // Reordered in place through typed arrays, so every run sees the same kinds of arrays (a
  // mixed array here made the optimised plan fall back to slow code again and again).
  const unsorted = feedings.slice();
  const sortedDays = new Int32Array(order.length);
  for (let k = 0; k < order.length; k++) {
    feedings[k] = unsorted[order[k]!]!;
    sortedDays[k] = feedingDays[order[k]!]!;
  }

  for (const [plantingId, b] of blockedByPlanting) {
    warnings.push({
      kind: "pre-harvest-block",
      plantingId,
      date: b.dates[0],
      explanation: {
        kind: "pre-harvest-block",
        inputs: {
          planting: plantingRef(plantingId),
          first: { date: b.dates[0]! },
          feedings: { unit: "count", value: b.dates.length },
          manureStockRefused: { unit: "kg", value: b.kg },
          rule: {
            text: "7 CFR 205.203(c)(1): 120 days before harvest if the edible part touches soil, 90 otherwise",
          },
        },
      },
    });
  }

  // Aged out: castings lot by lot; leachate summed per bin and month (a lot a day).
  const liquid = new Map<string, { binId: string | null; day: number; amount: number }>();
  for (let k = 0; k < ledger.agedOut.length; k++) {
    const a = ledger.agedOut[k]!;
    if (a.amount <= EPS) continue;
    if (a.pool === "castings") {
      warnings.push({
        kind: "aged-out",
        lotId: a.lotId,
        binId: a.binId ?? undefined,
        date: fromDayNumber(a.day),
        explanation: {
          kind: "castings-aged-out",
          inputs: {
            lot: { ref: "lot", id: a.lotId },
            amount: { unit: "kg", value: a.amount },
            shelfLife: { unit: "days", value: ctx.shelfLifeDays },
            on: { date: fromDayNumber(a.day) },
          },
        },
      });
    } else {
      if (a.day < ctx.planStartDay || a.day > ctx.planEndDay) continue;
      const key = `${a.binId}:${fromDayNumber(a.day).slice(0, 7)}`;
      const l = liquid.get(key) ?? { binId: a.binId, day: a.day, amount: 0 };
      l.amount += a.amount;
      liquid.set(key, l);
    }
  }
  for (const l of liquid.values()) {
    if (l.day < ctx.planStartDay || l.day > ctx.planEndDay) continue;
    warnings.push({
      kind: "aged-out",
      binId: l.binId ?? undefined,
      date: fromDayNumber(l.day),
      explanation: {
        kind: "liquid-aged-out",
        inputs: {
          month: { text: fromDayNumber(l.day).slice(0, 7) },
          amount: { unit: "L", value: l.amount },
          maxAge: { unit: "days", value: ctx.liquidMaxAgeDays },
        },
      },
    });
  }

  // Coverage per planting and month; demand per bed and month. The feedings are sorted by day, so a
  // month index walks forward with them; slots are numbered (planting, month, material) and
  // (bed, month) instead of string keys, sums are kept in typed arrays, and each row object is
  // made once at the end. Coverage keeps the order each slot was first seen.
  const MATERIALS: Material[] = ["castings", "leachate", "tea"];
  const monthCount = planSpans.length;
  const plantingIndex = new Map(inputs.plantings.map((p, i) => [p.id, i]));
  const covOfSlot = new Int32Array(inputs.plantings.length * monthCount * MATERIALS.length).fill(
    -1,
  );
  const covFirst: number[] = []; // index in feedings of each coverage row's first feeding
  const covMonth: number[] = [];
  const covNeed = new Float64Array(feedings.length);
  const covGot = new Float64Array(feedings.length);
  const bedIndex = new Map<string, number>();
  const bedSums: Float64Array[] = []; // per bed: (castings, leachate, tea, need, got) × month
  const BED_FIELDS = 5;
  let mi = 0;
  for (let k = 0; k < feedings.length; k++) {
    const f = feedings[k]!;
    const day = sortedDays[k]!;
    while (day >= planSpans[mi]!.endDay) mi++;
    const slotKey =
      (plantingIndex.get(f.plantingId)! * monthCount + mi) * MATERIALS.length +
      MATERIALS.indexOf(f.material);
    let c = covOfSlot[slotKey]!;
    if (c < 0) {
      c = covFirst.length;
      covOfSlot[slotKey] = c;
      covFirst.push(k);
      covMonth.push(mi);
    }
    covNeed[c]! += f.need;
    covGot[c]! += f.allocated;
    let b = bedIndex.get(f.bedId);
    if (b === undefined) {
      b = bedSums.length;
      bedIndex.set(f.bedId, b);
      bedSums.push(new Float64Array(monthCount * BED_FIELDS).fill(NaN));
    }
    const sums = bedSums[b]!;
    const at = mi * BED_FIELDS;
    if (Number.isNaN(sums[at]!)) sums.fill(0, at, at + BED_FIELDS);
    sums[at + MATERIALS.indexOf(f.material)]! += f.amount;
    sums[at + 3]! += f.need;
    sums[at + 4]! += f.allocated;
  }
  const coverage: PlantingCoverage[] = new Array<PlantingCoverage>(covFirst.length);
  for (let c = 0; c < covFirst.length; c++) {
    const f = feedings[covFirst[c]!]!;
    const need = covNeed[c]!;
    const allocated = covGot[c]!;
    const pct = need > 0 ? (100 * allocated) / need : 100;
    const unit = f.material === "leachate" ? "L" : "kg";
    coverage[c] = {
      plantingId: f.plantingId,
      month: planSpans[covMonth[c]!]!.month,
      material: f.material,
      need,
      allocated,
      coveragePct: pct,
      explanation: {
        kind: "coverage",
        inputs: {
          planting: plantingRef(f.plantingId),
          need: { unit, value: need },
          allocated: { unit, value: allocated },
          coverage: { unit: "percent", value: pct },
        },
      },
    };
  }
  // Months of a bed in month order (NaN marks a month with no feeding of the bed).
  const bedDemand: BedDemand[] = [];
  for (const [bedId, b] of bedIndex) {
    const sums = bedSums[b]!;
    const months: BedDemand["months"] = [];
    for (let m = 0; m < monthCount; m++) {
      const at = m * BED_FIELDS;
      if (Number.isNaN(sums[at]!)) continue;
      const need = sums[at + 3]!;
      months.push({
        month: planSpans[m]!.month,
        castingsKg: sums[at]!,
        leachateL: sums[at + 1]!,
        teaL: sums[at + 2]!,
        coveragePct: need > 0 ? (100 * sums[at + 4]!) / need : 100,
      });
    }
    bedDemand.push({ bedId, months });
  }

  const bins = buildBins(supply.bins, supply.lots, inputs, ctx, warnings);

  // First shortfall per pool in the plan's months.
  const first: Record<Pool, string | null> = { castings: null, leachate: null };
  for (let k = 0; k < feedings.length; k++) {
    const f = feedings[k]!;
    if (f.need - f.allocated <= Math.max(EPS, f.need * 1e-9)) continue;
    const pool: Pool = f.material === "leachate" ? "leachate" : "castings";
    if (first[pool] === null || f.date < first[pool]!) first[pool] = f.date;
  }
  const castingsRows = rows.filter((r) => r.pool === "castings");
  const agedKg = castingsRows.reduce((s, r) => s + r.agedOut, 0);
  const closingKg = castingsRows[castingsRows.length - 1]?.closing ?? 0;
  const harvestedKg = castingsRows.reduce((s, r) => s + r.supplied, 0);
  const surplusKg = agedKg + closingKg;

  const plan: GardenPlan = {
    garden: inputs.garden,
    asOf: inputs.asOf,
    range: { from: fromDayNumber(ctx.planStartDay), to: fromDayNumber(ctx.planEndDay) },
    months: planSpans.map((s) => s.month),
    rows,
    bins,
    beds: bedDemand,
    feedings,
    coverage,
    firstShortfall: first,
    surplus: {
      castingsKg: surplusKg,
      value: surplusKg * ctx.pricePerKg,
      explanation: {
        kind: "surplus",
        inputs: {
          agedOut: { unit: "kg", value: agedKg },
          leftAtEnd: { unit: "kg", value: closingKg },
          price: { unit: "money/kg", value: ctx.pricePerKg },
        },
      },
    },
    outputValue: {
      castingsKg: harvestedKg,
      value: harvestedKg * ctx.pricePerKg,
      explanation: {
        kind: "output-value",
        inputs: {
          harvested: { unit: "kg", value: harvestedKg },
          price: { unit: "money/kg", value: ctx.pricePerKg },
        },
      },
    },
    warnings,
    gap: null,
  };
  if (options.suggestions !== false) {
    const resumeDay = ctx.spans[resumeMonth]!.startDay;
    const logged = demand.logged.filter((c) => c.day >= resumeDay);
    plan.gap = closePlanGap({
      inputs,
      ctx,
      ledgerInput: {
        ...ledgerInput,
        lots: ledger.snapshot ?? ledgerInput.lots,
        logged,
        spans: ctx.spans.slice(resumeMonth),
      },
      supply,
      demand,
      plan,
    });
  }
  return plan;
}

/** Indices of `feedings` by day then id, or null when two ids of one day are equal. */
function sortByDayThenId(
  days: readonly number[],
  feedings: readonly { id: string }[],
  firstDay: number,
  lastDay: number,
): Int32Array | null {
  const width = lastDay - firstDay + 1;
  if (!(width > 0)) return null;
  const counts = new Int32Array(width + 1);
  for (let i = 0; i < days.length; i++) {
    const d = days[i]!;
    if (d < firstDay || d > lastDay) return null;
    counts[d - firstDay + 1]!++;
  }
  for (let d = 1; d <= width; d++) counts[d]! += counts[d - 1]!;
  const order = new Int32Array(days.length);
  const starts = counts.slice();
  for (let i = 0; i < days.length; i++) order[starts[days[i]! - firstDay]!++] = i;
  let equal = false;
  const byId = (a: number, b: number) => {
    const ia = feedings[a]!.id;
    const ib = feedings[b]!.id;
    if (ia === ib) equal = true;
    return ia < ib ? -1 : 1;
  };
  for (let d = 0; d < width; d++) {
    const from = counts[d]!;
    const to = counts[d + 1]!;
    if (to - from < 2) continue;
    const run = order.slice(from, to).sort(byId);
    for (let k = 0; k < run.length; k++) order[from + k] = run[k]!;
    if (equal) return null;
  }
  return order;
}
