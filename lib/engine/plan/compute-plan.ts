// One call for the whole garden: replay the history up to asOf, forecast every
// bin and planting after it, balance month by month, check the worms, and say
// how to close a shortfall. Returns everything the screens and the CLI show.
import {
  AMOUNT_EPSILON,
  runLedger,
  type LedgerInput,
  type LedgerResult,
  type Pool,
} from "@/lib/engine/balance/ledger";
import { fromDayNumber, toDayNumber, type MonthSpan } from "@/lib/engine/core/dates";
import { closePlanGap } from "@/lib/engine/gap/close";
import { buildBins } from "@/lib/engine/plan/bins";
import { planContext, type PlanContext } from "@/lib/engine/plan/context";
import { coverageAndBeds } from "@/lib/engine/plan/coverage";
import { buildDemand, type LoggedClaim, type PlannedClaim } from "@/lib/engine/plan/demand";
import { planFeedings, PlantingRefs } from "@/lib/engine/plan/feedings";
import type { GardenInputs, PlanOptions } from "@/lib/engine/plan/inputs";
import type { GardenPlan, MonthRow, PlannedFeeding, PlanWarning } from "@/lib/engine/plan/results";
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
  const refs = new PlantingRefs();
  const rows = monthRows(inputs, ctx, demand, ledger, planSpans);
  const { feedings, days, plantingOf, blockedByPlanting } = planFeedings(
    inputs,
    ctx,
    demand,
    ledger,
    refs,
  );
  preHarvestWarnings(blockedByPlanting, refs, warnings);
  agedOutWarnings(ledger, ctx, warnings);
  const { coverage, beds: bedDemand } = coverageAndBeds(
    inputs,
    planSpans,
    feedings,
    days,
    plantingOf,
    refs,
  );
  const bins = buildBins(supply.bins, supply.lots, inputs, ctx, warnings);
  const first = firstShortfall(feedings);
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

/** Month × pool rows of the plan's months, with the tea brewed from castings. */
function monthRows(
  inputs: GardenInputs,
  ctx: PlanContext,
  demand: { planned: readonly PlannedClaim[]; logged: readonly LoggedClaim[] },
  ledger: LedgerResult,
  planSpans: readonly MonthSpan[],
): MonthRow[] {
  const planStart = ctx.planStartDay;
  const planEnd = ctx.planEndDay;
  const planned = demand.planned;
  const logged = demand.logged;
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

  return rows;
}

/** One warning per planting a pre-harvest interval kept manure-fed stock from. */
function preHarvestWarnings(
  blockedByPlanting: Map<string, { dates: string[]; kg: number }>,
  refs: PlantingRefs,
  warnings: PlanWarning[],
): void {
  // forEach, not for…of: no [key, value] pair per entry.
  blockedByPlanting.forEach((b, plantingId) => {
    warnings.push({
      kind: "pre-harvest-block",
      plantingId,
      date: b.dates[0],
      explanation: {
        kind: "pre-harvest-block",
        inputs: {
          planting: refs.of(plantingId),
          first: { date: b.dates[0]! },
          feedings: { unit: "count", value: b.dates.length },
          manureStockRefused: { unit: "kg", value: b.kg },
          rule: PRE_HARVEST_RULE,
        },
      },
    });
  });
}

const PRE_HARVEST_RULE = {
  text: "7 CFR 205.203(c)(1): 120 days before harvest if the edible part touches soil, 90 otherwise",
} as const;

/** Aged out: castings lot by lot; leachate summed per bin and month (a lot a day). */
function agedOutWarnings(ledger: LedgerResult, ctx: PlanContext, warnings: PlanWarning[]): void {
  const EPS = AMOUNT_EPSILON;
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
}

/** First shortfall per pool in the plan's months (the feedings are in date order). */
function firstShortfall(feedings: readonly PlannedFeeding[]): Record<Pool, string | null> {
  const EPS = AMOUNT_EPSILON;
  const first: Record<Pool, string | null> = { castings: null, leachate: null };
  for (let k = 0; k < feedings.length; k++) {
    if (first.castings !== null && first.leachate !== null) break; // later dates cannot be earlier
    const f = feedings[k]!;
    if (f.need - f.allocated <= Math.max(EPS, f.need * 1e-9)) continue;
    const pool: Pool = f.material === "leachate" ? "leachate" : "castings";
    if (first[pool] === null || f.date < first[pool]!) first[pool] = f.date;
  }
  return first;
}
