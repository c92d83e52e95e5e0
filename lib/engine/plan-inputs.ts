// Scenario (units as typed) → engine inputs (SI). Kept apart from plan.ts so
// that the app's import/export path and the CLI share one conversion.
import {
  dayOfYearDate,
  fromDayNumber,
  parseMonthDay,
  toDayNumber,
  yearOfDay,
  type DateRange,
} from "@/lib/engine/core/dates";
import { dflt } from "@/lib/engine/core/defaults";
import type { BedInput, FeedingRule, PlantingInput } from "@/lib/engine/demand/demand";
import { EngineInputError } from "@/lib/engine/core/errors";
import type { BinForecastInput } from "@/lib/engine/supply/forecast";
import { trayInsideFromOuter, trayInsideVolumeL } from "@/lib/engine/supply/geometry";
import type { LeachateInput } from "@/lib/engine/supply/liquid";
import type { StockLot } from "@/lib/engine/balance/lots";
import { isBoundedRule } from "@/lib/engine/demand/recurrence";
import type {
  Scenario,
  ScenarioBed,
  ScenarioBin,
  ScenarioPlanting,
} from "@/lib/validation/scenario";
import { si } from "@/lib/validation/scenario-quantity";
import { toSi, type UnitName } from "@/lib/units";

type Rule = NonNullable<ScenarioPlanting["rule"]>;

export function trayVolumeL(bin: ScenarioBin, field: string): number {
  const t = bin.tray;
  if ("insideVolume" in t) return si(t.insideVolume);
  if ("inside" in t) {
    const box = {
      lengthM: si(t.inside.length),
      widthM: si(t.inside.width),
      depthM: si(t.inside.depth),
    };
    return trayInsideVolumeL(box, `${field}.tray.inside`);
  }
  const box = trayInsideFromOuter(
    {
      outerLengthM: si(t.outside.length),
      outerWidthM: si(t.outside.width),
      board: t.board as never,
    },
    `${field}.tray.outside`,
  );
  return trayInsideVolumeL(box, `${field}.tray.outside`);
}

export function binForecastInput(
  bin: ScenarioBin,
  asOf: string | undefined,
  field: string,
): BinForecastInput {
  const volume = trayVolumeL(bin, field);
  // A logged harvest without the forecast of its day is compared with this bin's uncalibrated tray.
  const uncalibrated =
    volume *
    (bin.fillFraction ?? dflt("fillFraction")) *
    (bin.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL"));
  return {
    binId: bin.id,
    startDate: bin.startDate,
    trays: bin.trays,
    trayInsideVolumeL: volume,
    rotationIntervalDays: bin.rotationIntervalDays,
    processingDays: bin.processingDays,
    fillFraction: bin.fillFraction,
    bulkDensityKgPerL: bin.bulkDensityKgPerL,
    dormantMonths: bin.dormantMonths,
    manureFeedstock: bin.manureFeedstock,
    harvestLogs: (bin.logs?.harvests ?? []).map((h) => ({
      date: h.date,
      actualKg: si(h.amount),
      predictedKg: h.predicted ? si(h.predicted) : uncalibrated,
    })),
    asOf,
  };
}

export function leachateInput(bin: ScenarioBin, asOf: string | undefined): LeachateInput {
  return {
    binId: bin.id,
    collections: (bin.logs?.leachate ?? []).map((c) => ({ date: c.date, litres: si(c.volume) })),
    estimateLPerWeek: bin.leachateEstimatePerWeek ? si(bin.leachateEstimatePerWeek) : undefined,
    dormantMonths: bin.dormantMonths,
    manureFeedstock: bin.manureFeedstock,
    asOf,
    everyDays: 1,
  };
}

export function bedInput(bed: ScenarioBed): BedInput {
  if (bed.kind === "bed")
    return { id: bed.id, indoor: bed.indoor, areaM2: si(bed.length) * si(bed.width) };
  return { id: bed.id, indoor: bed.indoor, containerVolumeL: si(bed.volume) };
}

export function feedingRule(rule: Rule): FeedingRule {
  const base = {
    material: rule.material,
    method: rule.method,
    basis: rule.basis,
    recurrence: rule.recurrence,
    dilutionWaterParts: rule.dilutionWaterParts,
  };
  const a = rule.amount;
  if (typeof a === "number") return { ...base, amount: a, amountUnit: "L" };
  const unit = a.unit as UnitName;
  if (rule.basis === "per-plant") {
    const isMass = ["g", "kg", "oz", "lb"].includes(unit);
    return { ...base, amount: toSi(a.value, unit), amountUnit: isMass ? "kg" : "L" };
  }
  if (rule.basis === "per-area" && a.per === undefined) {
    // A depth: 1 mm over 1 m² is 1 L.
    return { ...base, amount: toSi(a.value, unit) * 1000, amountUnit: "L" };
  }
  return { ...base, amount: toSi(a.value, unit) / toSi(1, a.per as UnitName), amountUnit: "L" };
}

/** First fall frost on or after a planting's start: an open-ended outdoor rule stops there. */
function seasonEnd(startDate: string, firstFallFrost: string): string {
  const md = parseMonthDay(firstFallFrost, "settings.firstFallFrost");
  const start = toDayNumber(startDate);
  const year = yearOfDay(start);
  const frost = dayOfYearDate(year, md);
  return fromDayNumber(frost >= start ? frost : dayOfYearDate(year + 1, md));
}

export function plantingInput(
  p: ScenarioPlanting,
  bed: ScenarioBed,
  s: Scenario,
  range: DateRange,
  field: string,
): PlantingInput {
  let endDate = p.endDate;
  if (endDate === undefined) {
    const bounded = isBoundedRule(p.rule?.recurrence ?? "FREQ=MONTHLY", `${field}.rule.recurrence`);
    if (bounded) endDate = range.to > p.startDate ? range.to : p.startDate;
    else if (!bed.indoor) endDate = seasonEnd(p.startDate, s.settings.firstFallFrost);
    else
      throw new EngineInputError(
        `${field}.endDate`,
        "is needed: the rule never ends and an indoor bed has no season",
      );
  }
  return {
    id: p.id,
    bedId: p.bedId,
    feederClass: p.feederClass,
    plantCount: p.plantCount,
    startDate: p.startDate,
    endDate,
    harvestDate: p.harvestDate,
    priority: p.priority,
    edible: p.edible,
    edibleTouchesSoil: p.edibleTouchesSoil,
    rule: p.rule ? feedingRule(p.rule) : undefined,
  };
}

export function openingLots(s: Scenario, planStart: string): StockLot[] {
  const manure = new Map(s.bins.map((b) => [b.id, b.manureFeedstock ?? false]));
  return (s.stock?.lots ?? []).map((lot, i) => {
    if (lot.madeOn >= planStart) {
      throw new EngineInputError(
        `stock.lots[${i}].madeOn`,
        `must be before the plan's first day (${planStart}); later harvests belong in the bin's logs`,
      );
    }
    return {
      id: lot.id,
      material: "castings",
      madeOn: lot.madeOn,
      amount: si(lot.amount),
      binId: lot.binId,
      manureFeedstock: lot.binId ? manure.get(lot.binId) : false,
    };
  });
}
