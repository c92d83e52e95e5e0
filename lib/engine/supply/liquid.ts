import {
  checkedDayNumber,
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

export interface LeachateCollection {
  date: IsoDate;
  litres: number;
}

export interface LeachateInput {
  binId: string;
  collections?: LeachateCollection[];
  /** Used until there are two collections to measure a rate from. */
  estimateLPerWeek?: number;
  trailingDays?: number;
  dormantMonths?: number[];
  manureFeedstock?: boolean;
  /** Forecast starts the day after; logged collections up to it become actual events. */
  asOf?: IsoDate;
  /** One forecast event every this many days (1 = daily, as the balance wants). */
  everyDays?: number;
}

export interface LeachateRate {
  litresPerDay: number;
  source: "logs" | "estimate";
  collectionsUsed: number;
  explanation: Explanation;
}

function checkCollections(list: readonly LeachateCollection[] | undefined, field: string) {
  return (list ?? [])
    .map((c, i) => ({
      // Names built only for a value that fails: a bin can have years of weekly drains.
      day: checkedDayNumber(c.date) ?? toDayNumber(c.date, `${field}[${i}].date`),
      litres:
        typeof c.litres === "number" && c.litres >= 0 && c.litres <= 1000
          ? c.litres
          : requireNonNegative(c.litres, `${field}[${i}].litres`, 1000),
      date: c.date,
    }))
    .sort((a, b) => a.day - b.day);
}

/**
 * Trailing mean L/day. Each collection holds what drained since the one
 * before, so the rate is the litres of all but the earliest collection in the
 * window over the days between the earliest and the latest.
 */
export function leachateRate(input: LeachateInput, field = "leachate"): LeachateRate {
  const trailing = requireInteger(
    input.trailingDays ?? dflt("leachateTrailingDays"),
    `${field}.trailingDays`,
    7,
    730,
  );
  const estimateWeek = requireNonNegative(
    input.estimateLPerWeek ?? dflt("leachateEstimateLPerWeek"),
    `${field}.estimateLPerWeek`,
    1000,
  );
  const logs = checkCollections(input.collections, `${field}.collections`);
  const asOf = input.asOf === undefined ? undefined : toDayNumber(input.asOf, `${field}.asOf`);
  const usable = asOf === undefined ? logs : logs.filter((l) => l.day <= asOf);
  const last = usable[usable.length - 1];
  const window = last ? usable.filter((l) => l.day > last.day - trailing) : [];
  const first = window[0];
  if (last && first && window.length >= 2 && last.day > first.day) {
    const litres = window.slice(1).reduce((s, l) => s + l.litres, 0);
    const span = last.day - first.day;
    const rate = litres / span;
    return {
      litresPerDay: rate,
      source: "logs",
      collectionsUsed: window.length,
      explanation: {
        text: `${fmt(rate, 3)} L/day: ${fmt(litres, 2)} L over ${plural(span, "day")} from ${plural(window.length, "logged collection")} (last ${trailing} days)`,
        inputs: { litresPerDay: rate, collections: window.length, spanDays: span },
      },
    };
  }
  const rate = estimateWeek / 7;
  return {
    litresPerDay: rate,
    source: "estimate",
    collectionsUsed: 0,
    explanation: {
      text: `${fmt(rate, 3)} L/day from the estimate of ${fmt(estimateWeek, 2)} L a week (not enough collections logged yet)`,
      inputs: { litresPerDay: rate, estimateLPerWeek: estimateWeek },
    },
  };
}

/** Leachate SupplyEvents over [from, to]: logged collections up to asOf, then the rate. */
export function forecastLeachate(
  input: LeachateInput,
  range: DateRange,
  field = "leachate",
): { events: SupplyEvent[]; rate: LeachateRate } {
  if (typeof input.binId !== "string" || input.binId === "") {
    throw new EngineInputError(`${field}.binId`, "must be a non-empty id");
  }
  const { from, to } = rangeDays(range, "range");
  if (to - from > 3650) throw new EngineInputError("range", "must span at most 3650 days");
  const every = requireInteger(input.everyDays ?? 1, `${field}.everyDays`, 1, 60);
  const dormant = monthSet(input.dormantMonths, `${field}.dormantMonths`);
  const rate = leachateRate(input, field);
  const manure = input.manureFeedstock ?? false;
  const asOf = input.asOf === undefined ? undefined : toDayNumber(input.asOf, `${field}.asOf`);
  const events: SupplyEvent[] = [];
  if (asOf !== undefined) {
    for (const c of checkCollections(input.collections, `${field}.collections`)) {
      if (c.day < from || c.day > to || c.day > asOf) continue;
      events.push({
        binId: input.binId,
        date: c.date,
        material: "leachate",
        amount: c.litres,
        actual: true,
        manureFeedstock: manure,
        explanation: { text: `logged collection of ${fmt(c.litres, 2)} L` },
      });
    }
  }
  const start = asOf === undefined ? from : Math.max(from, asOf + 1);
  if (rate.litresPerDay > 0) {
    for (let d = start; d <= to; d += every) {
      // A dormant bin is not fed, so it drains nothing worth counting.
      let litres = 0;
      for (let k = 0; k < every && d + k <= to; k++) {
        if (!dormant.has(monthOfDay(d + k))) litres += rate.litresPerDay;
      }
      if (litres <= 0) continue;
      events.push({
        binId: input.binId,
        date: fromDayNumber(d),
        material: "leachate",
        amount: litres,
        actual: false,
        manureFeedstock: manure,
        explanation: rate.explanation,
      });
    }
  }
  return { events, rate };
}

/** Total litres of solution from `leachateL` diluted 1 part to `waterParts` parts water. */
export function dilute(leachateL: number, waterParts = dflt("leachateDilutionWaterParts")): number {
  const l = requireNonNegative(leachateL, "leachateL", 10_000);
  return l * (1 + requireNonNegative(waterParts, "waterParts", 1000));
}

/** Undiluted leachate needed for `solutionL` litres of diluted solution. */
export function leachateForSolution(
  solutionL: number,
  waterParts = dflt("leachateDilutionWaterParts"),
): number {
  const s = requireNonNegative(solutionL, "solutionL", 100_000);
  return s / (1 + requireNonNegative(waterParts, "waterParts", 1000));
}

export interface TeaRecipe {
  /** Litres of castings per litre of water (0.1 = the 10 % solution). */
  castingsPerWater?: number;
  bulkDensityKgPerL?: number;
}

/**
 * Castings (kg) to brew `teaLitres` of tea on the day. Brewed tea is taken as
 * equal to the water put in (the castings are strained out), so castings
 * volume = tea × ratio, and mass = volume × bulk density.
 */
export function teaCastingsNeeded(teaLitres: number, recipe: TeaRecipe = {}): number {
  const tea = requireNonNegative(teaLitres, "teaLitres", 100_000);
  const ratio = requirePositive(
    recipe.castingsPerWater ?? dflt("teaCastingsPerWater"),
    "recipe.castingsPerWater",
    2,
  );
  const density = requirePositive(
    recipe.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL"),
    "recipe.bulkDensityKgPerL",
    2,
  );
  return tea * ratio * density;
}
