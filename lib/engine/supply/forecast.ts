import {
  fromDayNumber,
  monthOfDay,
  monthSet,
  rangeDays,
  toDayNumber,
  type DateRange,
} from "@/lib/engine/core/dates";
import { dflt } from "@/lib/engine/core/defaults";
import {
  EngineInputError,
  requireInteger,
  requireNonNegative,
  requirePositive,
} from "@/lib/engine/core/errors";
import { fmt, plural } from "@/lib/engine/core/format";
import type { Explanation, IsoDate, SupplyEvent } from "@/lib/engine/core/types";

export interface HarvestLog {
  date: IsoDate;
  actualKg: number;
  /** What the forecast said for that harvest at the time. */
  predictedKg: number;
}

/** A stacked-tray bin, in SI. Optional fields fall back to DEFAULTS. */
export interface BinForecastInput {
  binId: string;
  /** Day the first tray started processing. */
  startDate: IsoDate;
  /** Trays in the stack. */
  trays: number;
  trayInsideVolumeL: number;
  rotationIntervalDays?: number;
  processingDays?: number;
  fillFraction?: number;
  bulkDensityKgPerL?: number;
  /** Months 1–12 with no processing and no harvest (outdoor bin in winter). */
  dormantMonths?: number[];
  manureFeedstock?: boolean;
  harvestLogs?: HarvestLog[];
  calibrationHarvests?: number;
  /**
   * Last day that is already history. When set, forecast events start the day
   * after, and logged harvests up to it are returned as actual events.
   */
  asOf?: IsoDate;
}

export interface Calibration {
  factor: number;
  used: number;
}

export interface CastingsForecast {
  events: SupplyEvent[];
  /** Forecast kg per harvest, calibration included. */
  perHarvestKg: number;
  /** Before calibration: volume × fill × density. */
  uncalibratedKg: number;
  harvestIntervalDays: number;
  calibration: Calibration;
  explanation: Explanation;
}

const MAX_DAYS = 3650;

/** Mean actual/predicted over the most recent `window` harvests that have a prediction. */
export function calibrate(
  logs: readonly HarvestLog[] | undefined,
  window = dflt("calibrationHarvests"),
  field = "harvestLogs",
): Calibration {
  requireInteger(window, `${field}.window`, 1, 100);
  const checked = (logs ?? []).map((log, i) => ({
    day: toDayNumber(log.date, `${field}[${i}].date`),
    actual: requireNonNegative(log.actualKg, `${field}[${i}].actualKg`, 10_000),
    predicted: requireNonNegative(log.predictedKg, `${field}[${i}].predictedKg`, 10_000),
  }));
  const recent = checked
    .filter((l) => l.predicted > 0)
    .sort((a, b) => b.day - a.day)
    .slice(0, window);
  if (recent.length === 0) return { factor: 1, used: 0 };
  const mean = recent.reduce((s, l) => s + l.actual / l.predicted, 0) / recent.length;
  return { factor: mean, used: recent.length };
}

interface Checked {
  start: number;
  trays: number;
  volume: number;
  P: number;
  T: number;
  fill: number;
  density: number;
  dormant: Set<number>;
}

function check(bin: BinForecastInput, field: string): Checked {
  if (typeof bin.binId !== "string" || bin.binId === "") {
    throw new EngineInputError(`${field}.binId`, "must be a non-empty id");
  }
  const dormant = monthSet(bin.dormantMonths, `${field}.dormantMonths`);
  if (dormant.size === 12) {
    throw new EngineInputError(
      `${field}.dormantMonths`,
      "cannot hold all twelve months (the bin would never finish)",
    );
  }
  return {
    start: toDayNumber(bin.startDate, `${field}.startDate`),
    trays: requireInteger(bin.trays, `${field}.trays`, 1, 20),
    volume: requirePositive(bin.trayInsideVolumeL, `${field}.trayInsideVolumeL`, 2000),
    P: requirePositive(
      bin.rotationIntervalDays ?? dflt("rotationIntervalDays"),
      `${field}.rotationIntervalDays`,
      365,
    ),
    T: requirePositive(
      bin.processingDays ?? dflt("processingDays"),
      `${field}.processingDays`,
      730,
    ),
    fill: requirePositive(bin.fillFraction ?? dflt("fillFraction"), `${field}.fillFraction`, 1),
    density: requirePositive(
      bin.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL"),
      `${field}.bulkDensityKgPerL`,
      2,
    ),
    dormant,
  };
}

/**
 * Harvest days (day numbers) up to `to`. Processing counts only active
 * (non-dormant) days: harvest k falls on the first active day by which the bin
 * has processed T + k·I days, I = max(P, T / trays).
 */
function harvestDays(c: Checked, to: number, field: string): number[] {
  const interval = Math.max(c.P, c.T / c.trays);
  const out: number[] = [];
  if (c.dormant.size === 0) {
    for (let k = 0; ; k++) {
      const day = c.start + Math.ceil(c.T + k * interval - 1e-9);
      if (day > to) return out;
      out.push(day);
    }
  }
  if (to - c.start > MAX_DAYS * 10) {
    throw new EngineInputError(
      `${field}.startDate`,
      "is more than a century before the forecast range",
    );
  }
  let processed = 0;
  let next = c.T;
  for (let d = c.start; d <= to; d++) {
    if (c.dormant.has(monthOfDay(d))) continue;
    if (processed >= next - 1e-9) {
      out.push(d);
      next += interval;
    }
    processed++;
  }
  return out;
}

/** Forecast harvest dates of a bin within a range (ignores logs and asOf). */
export function harvestDates(bin: BinForecastInput, range: DateRange, field = "bin"): IsoDate[] {
  const c = check(bin, field);
  const { from, to } = rangeDays(range, "range");
  return harvestDays(c, to, field)
    .filter((d) => d >= from)
    .map(fromDayNumber);
}

/** Castings a bin is forecast (and, with asOf, logged) to yield within [from, to]. */
export function forecastCastings(
  bin: BinForecastInput,
  range: DateRange,
  field = "bin",
): CastingsForecast {
  const c = check(bin, field);
  const { from, to } = rangeDays(range, "range");
  if (to - from > MAX_DAYS)
    throw new EngineInputError("range", `must span at most ${MAX_DAYS} days`);
  const asOf = bin.asOf === undefined ? undefined : toDayNumber(bin.asOf, `${field}.asOf`);
  const calibration = calibrate(bin.harvestLogs, bin.calibrationHarvests, `${field}.harvestLogs`);
  const uncalibratedKg = c.volume * c.fill * c.density;
  const perHarvestKg = uncalibratedKg * calibration.factor;
  const manure = bin.manureFeedstock ?? false;
  const calText =
    calibration.used > 0
      ? `, calibrated ×${fmt(calibration.factor, 2)} from ${plural(calibration.used, "logged harvest")}`
      : ", not calibrated yet (no logged harvests)";
  const formula = `${fmt(c.volume)} L × ${fmt(c.fill, 2)} × ${fmt(c.density, 2)} kg/L`;
  const inputs = {
    trayInsideVolumeL: c.volume,
    fillFraction: c.fill,
    bulkDensityKgPerL: c.density,
    calibrationFactor: calibration.factor,
    calibrationHarvests: calibration.used,
  };

  const events: SupplyEvent[] = [];
  if (asOf !== undefined) {
    (bin.harvestLogs ?? []).forEach((log, i) => {
      const day = toDayNumber(log.date, `${field}.harvestLogs[${i}].date`);
      if (day < from || day > to || day > asOf) return;
      events.push({
        binId: bin.binId,
        date: log.date,
        material: "castings",
        amount: log.actualKg,
        actual: true,
        manureFeedstock: manure,
        explanation: { text: `logged harvest of ${fmt(log.actualKg)} kg` },
      });
    });
  }
  const forecastFrom = asOf === undefined ? from : Math.max(from, asOf + 1);
  const days = harvestDays(c, to, field).filter((d) => d >= forecastFrom);
  for (const d of days) {
    events.push({
      binId: bin.binId,
      date: fromDayNumber(d),
      material: "castings",
      amount: perHarvestKg,
      actual: false,
      manureFeedstock: manure,
      explanation: { text: `1 harvest × ${formula} = ${fmt(perHarvestKg)} kg${calText}`, inputs },
    });
  }
  events.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  return {
    events,
    perHarvestKg,
    uncalibratedKg,
    harvestIntervalDays: Math.max(c.P, c.T / c.trays),
    calibration,
    explanation: { text: `${plural(days.length, "harvest")} × ${formula}${calText}`, inputs },
  };
}
