// Per bin: worms over time (starting worms, logged moves and counts, density
// ceiling over every tray the worms occupy), the calendar's bin tasks, and the
// capacity checks of the forecast output against the worms (intake rule) and
// the active tray's surface (surface rule).
import { dflt } from "@/lib/engine/core/defaults";
import { fromDayNumber, toDayNumber } from "@/lib/engine/core/dates";
import { simulatePopulation } from "@/lib/engine/supply/population";
import type { GardenInputs } from "@/lib/engine/plan/inputs";
import type { PlanContext } from "@/lib/engine/plan/context";
import type { BinSupplyInfo, LotInfo } from "@/lib/engine/plan/supply";
import type { BinMonth, BinSupply, BinTask, PlanWarning } from "@/lib/engine/plan/results";
import { toSi } from "@/lib/units";

const LB_PER_FT2_AS_KG_PER_M2 = toSi(1, "lb") / toSi(1, "ft2");

/** Worms (adults + juveniles) at the end of each day from the bin's start to `lastDay`. */
export function binWorms(
  info: BinSupplyInfo,
  inputs: GardenInputs,
  lastDay: number,
): { startDay: number; worms: Float64Array; kg: Float64Array } {
  const bin = info.bin;
  const startDay = toDayNumber(bin.startDate);
  const days = Math.max(0, Math.min(3650, lastDay - startDay));
  const areaM2 = bin.tray.insideLengthM * bin.tray.insideWidthM;
  const P = bin.rotationIntervalDays ?? dflt("rotationIntervalDays");
  const changes = new Map<number, { add?: number; set?: number }>();
  const at = (date: string) => toDayNumber(date) - startDay;
  for (const m of inputs.logs.wormMoves) {
    const t = at(m.date);
    if (t < 0 || t > days) continue;
    const delta = (m.toBinId === bin.id ? m.worms : 0) - (m.fromBinId === bin.id ? m.worms : 0);
    if (delta === 0) continue;
    const prev = changes.get(t);
    changes.set(t, { add: (prev?.add ?? 0) + delta });
  }
  for (const o of inputs.logs.observations) {
    if (o.binId !== bin.id || o.wormCount === null) continue;
    const t = at(o.date);
    if (t >= 0 && t <= days) changes.set(t, { set: o.wormCount });
  }
  const start = changes.get(0);
  changes.delete(0);
  const startWorms = Math.max(0, start?.set ?? bin.startingWorms + (start?.add ?? 0));
  const ceilingPerM2 = bin.densityCeilingKgPerM2;
  const worms = new Float64Array(days + 1);
  const kg = new Float64Array(days + 1);
  simulatePopulation({
    startWorms,
    surfaceM2: areaM2,
    days,
    start: "adults",
    params:
      ceilingPerM2 === null
        ? undefined
        : { densityCeilingLbPerFt2: ceilingPerM2 / LB_PER_FT2_AS_KG_PER_M2 },
    // The stack grows by one tray every P days until it is full; worms spread into every tray.
    surfaceOnDay: (t) => Math.min(bin.trays, 1 + Math.floor(t / P)) * areaM2,
    changes,
    totalsOnly: { worms, kg },
  });
  return { startDay, worms, kg };
}

export function buildBins(
  infos: BinSupplyInfo[],
  lots: LotInfo[],
  inputs: GardenInputs,
  ctx: PlanContext,
  warnings: PlanWarning[],
): BinSupply[] {
  const planSpans = ctx.spans.slice(ctx.firstPlanMonth);
  // One pass over the lots: each bin's forecast lots in the plan, in their given order, and the
  // plan month of every plan day looked up once.
  const monthOfPlanDay = new Int32Array(Math.max(0, ctx.planEndDay - ctx.planStartDay + 1));
  for (let d = ctx.planStartDay, m = 0; d <= ctx.planEndDay; d++) {
    while (m < planSpans.length - 1 && d >= planSpans[m]!.endDay) m++;
    monthOfPlanDay[d - ctx.planStartDay] = m;
  }
  const lotsOfBin = new Map<string, LotInfo[]>();
  for (const l of lots) {
    if (l.lot.binId === null || l.source === "stock") continue;
    const d = l.lot.madeDay;
    if (d < ctx.planStartDay || d > ctx.planEndDay) continue;
    const list = lotsOfBin.get(l.lot.binId);
    if (list) list.push(l);
    else lotsOfBin.set(l.lot.binId, [l]);
  }
  return infos.map((info) => {
    const bin = info.bin;
    const pop = binWorms(info, inputs, ctx.planEndDay);
    const wormsOn = (day: number) => {
      const t = day - pop.startDay;
      if (t < 0) return { worms: 0, kg: 0 };
      const i = Math.min(t, pop.worms.length - 1);
      return { worms: pop.worms[i]!, kg: pop.kg[i]! };
    };
    const made = planSpans.map(() => ({ castingsKg: 0, leachateL: 0 }));
    for (const l of lotsOfBin.get(bin.id) ?? []) {
      const m = monthOfPlanDay[l.lot.madeDay - ctx.planStartDay]!;
      if (l.lot.pool === "castings") made[m]!.castingsKg += l.lot.amount;
      else made[m]!.leachateL += l.lot.amount;
    }
    const months: BinMonth[] = planSpans.map((span, m) => {
      const w = wormsOn(span.endDay - 1);
      return { month: span.month, ...made[m]!, worms: w.worms, wormMassKg: w.kg };
    });

    // Capacity: food for the month's forecast castings (at least their own mass) per week,
    // against what the worms eat (intake) and what the active tray's surface allows.
    const intake = bin.intakeFractionPerDay ?? dflt("wormIntakeFractionPerDay");
    const foodPerCastings = dflt("foodKgPerCastingsKg");
    const topTrayM2 = bin.tray.insideLengthM * bin.tray.insideWidthM;
    const surfaceKgPerWeek =
      (topTrayM2 / toSi(1, "ft2") / dflt("surfaceFt2PerLbFoodPerWeek")) * toSi(1, "lb");
    const over = { intake: [] as number[], surface: [] as number[] };
    let worst = {
      intake: { need: 0, limit: 0, month: "" },
      surface: { need: 0, limit: 0, month: "" },
    };
    planSpans.forEach((span, m) => {
      const row = months[m]!;
      if (row.castingsKg <= 0) return;
      const weeks = (span.endDay - span.startDay) / 7;
      const needPerWeek = (row.castingsKg * foodPerCastings) / weeks;
      const mid = wormsOn(Math.floor((span.startDay + span.endDay) / 2));
      const intakePerWeek = mid.kg * intake * 7;
      if (needPerWeek > intakePerWeek + 1e-12) {
        over.intake.push(m);
        if (needPerWeek - intakePerWeek > worst.intake.need - worst.intake.limit)
          worst = {
            ...worst,
            intake: { need: needPerWeek, limit: intakePerWeek, month: span.month },
          };
      }
      if (needPerWeek > surfaceKgPerWeek + 1e-12) {
        over.surface.push(m);
        if (needPerWeek - surfaceKgPerWeek > worst.surface.need - worst.surface.limit)
          worst = {
            ...worst,
            surface: { need: needPerWeek, limit: surfaceKgPerWeek, month: span.month },
          };
      }
    });
    for (const kind of ["intake", "surface"] as const) {
      if (over[kind].length === 0) continue;
      const w = worst[kind];
      warnings.push({
        kind: kind === "intake" ? "capacity-intake" : "capacity-surface",
        binId: bin.id,
        explanation: {
          kind: kind === "intake" ? "capacity-intake" : "capacity-surface",
          inputs: {
            bin: { ref: "bin", id: bin.id },
            month: { text: w.month },
            months: { unit: "count", value: over[kind].length },
            foodNeeded: { unit: "kg/week", value: w.need },
            limit: { unit: "kg/week", value: w.limit },
            rule:
              kind === "intake"
                ? { default: "wormIntakeFractionPerDay", source: String(intake) }
                : { default: "surfaceFt2PerLbFoodPerWeek", source: "1 ft² per lb food per week" },
            foodPerCastings: { unit: "ratio", value: foodPerCastings },
            worms: { unit: "count", value: wormsOn(toDayNumber(`${w.month}-15`)).worms },
          },
        },
      });
    }

    // Tasks after asOf: add a tray every P days until the stack is full, then with each harvest.
    const tasks: BinTask[] = [];
    const P = bin.rotationIntervalDays ?? dflt("rotationIntervalDays");
    const startDay = toDayNumber(bin.startDate);
    const inPlan = (d: number) => d > ctx.asOfDay && d >= ctx.planStartDay && d <= ctx.planEndDay;
    for (let k = 1; k < bin.trays; k++) {
      const d = startDay + Math.round(k * P);
      if (inPlan(d)) tasks.push(task(bin.id, "add-tray", d, null));
    }
    for (const d of info.harvestDays) {
      if (!inPlan(d)) continue;
      tasks.push(task(bin.id, "harvest-tray", d, info.perHarvestKg));
      tasks.push(task(bin.id, "add-tray", d, null));
    }
    // Drain the base before liquid ages out, counted from the last logged drain.
    const maxAge = ctx.liquidMaxAgeDays;
    const drains = inputs.logs.drains
      .filter((d) => d.binId === bin.id && d.date <= inputs.asOf)
      .map((d) => toDayNumber(d.date));
    let next = (drains.length ? Math.max(...drains) : Math.max(startDay, ctx.asOfDay)) + maxAge;
    while (next <= ctx.planEndDay) {
      if (inPlan(next)) tasks.push(task(bin.id, "drain", next, info.leachateLPerDay * maxAge));
      next += maxAge;
    }
    tasks.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : a.kind < b.kind ? -1 : 1));
    return {
      binId: bin.id,
      name: bin.name,
      perHarvestKg: info.perHarvestKg,
      harvestIntervalDays: info.harvestIntervalDays,
      calibration: { factor: info.calibration.factor, harvestsUsed: info.calibration.used },
      leachateLPerDay: info.leachateLPerDay,
      months,
      tasks,
      explanation: info.explanation,
    };
  });
}

function task(binId: string, kind: BinTask["kind"], day: number, amount: number | null): BinTask {
  const date = fromDayNumber(day);
  return {
    id: `${binId}:${kind}:${date}`,
    binId,
    kind,
    date,
    amount,
    logged: false,
    explanation: {
      kind: kind === "drain" ? "leachate-collected" : "harvest-forecast",
      inputs: {
        bin: { ref: "bin", id: binId },
        ...(amount === null
          ? {}
          : { amount: { unit: kind === "drain" ? "L" : "kg", value: amount } }),
      },
    },
  };
}
