import { ruleAmount } from "@/lib/engine/demand/amount";
import type {
  BedInput,
  DemandOptions,
  DemandResult,
  GardenSeason,
  PlantingInput,
} from "@/lib/engine/demand/types";
import {
  checkedDayNumber,
  fromDayNumber,
  parseMonthDay,
  rangeDays,
  toDayNumber,
} from "@/lib/engine/core/dates";
import { dflt } from "@/lib/engine/core/defaults";
import { EngineInputError, requireFinite, requirePositive } from "@/lib/engine/core/errors";
import { defaultRuleFor, type FeedingRule } from "@/lib/engine/demand/feeding-rules";
import { expandRecurrence } from "@/lib/engine/demand/recurrence";
import type { IsoDate } from "@/lib/engine/core/types";

export type { FeedingRule } from "@/lib/engine/demand/feeding-rules";
export type {
  BedInput,
  DemandOptions,
  DemandResult,
  DemandWarning,
  GardenSeason,
  PlantingInput,
} from "@/lib/engine/demand/types";

export const DEFAULT_PRIORITY = 3;
const FEEDER_CLASSES: readonly string[] = ["heavy", "medium", "light"];

interface Season {
  from: number; // month * 100 + day
  to: number;
  text: string;
}

/** A plan passes the same range for every planting: read it once. */
function rangeOf(range: DemandOptions["range"]): { from: number; to: number } {
  if (!lastRange || lastRange.from !== range.from || lastRange.to !== range.to)
    lastRange = { from: range.from, to: range.to, days: rangeDays(range, "range") };
  return lastRange.days;
}

let lastRange: { from: string; to: string; days: { from: number; to: number } } | undefined;

/** Checks frost dates; the last spring frost must come before the first fall frost. */
export function parseSeason(season: GardenSeason, field = "season"): Season {
  // A plan passes the same season for every planting: check it once.
  if (
    lastSeason &&
    lastSeason.from === season?.lastSpringFrost &&
    lastSeason.to === season?.firstFallFrost
  )
    return lastSeason.parsed;
  const parsed = checkSeason(season, field);
  lastSeason = { from: season.lastSpringFrost, to: season.firstFallFrost, parsed };
  return parsed;
}

let lastSeason: { from: string; to: string; parsed: Season } | undefined;

function checkSeason(season: GardenSeason, field: string): Season {
  const [sm, sd] = parseMonthDay(season?.lastSpringFrost, `${field}.lastSpringFrost`);
  const [fm, fd] = parseMonthDay(season?.firstFallFrost, `${field}.firstFallFrost`);
  const from = sm * 100 + sd;
  const to = fm * 100 + fd;
  if (to <= from) {
    throw new EngineInputError(
      `${field}.firstFallFrost`,
      `must come after the last spring frost (${season.lastSpringFrost}), got ${season.firstFallFrost}`,
    );
  }
  return { from, to, text: `${season.lastSpringFrost} → ${season.firstFallFrost}` };
}

function inSeason(date: IsoDate, s: Season): boolean {
  // month * 100 + day from the digits of a checked "YYYY-MM-DD" ("0" is char code 48); no helper
  // closure, since this runs for every date of every planting.
  const md =
    (date.charCodeAt(5) - 48) * 1000 +
    (date.charCodeAt(6) - 48) * 100 +
    (date.charCodeAt(8) - 48) * 10 +
    (date.charCodeAt(9) - 48);
  return md >= s.from && md <= s.to;
}

/** Days before harvest during which manure-fed outputs are not applied, or 0 when none applies. */
export function preHarvestDays(
  planting: Pick<PlantingInput, "edible" | "edibleTouchesSoil">,
): number {
  if (planting.edible === false) return 0;
  return planting.edibleTouchesSoil
    ? dflt("preHarvestDaysSoilContact")
    : dflt("preHarvestDaysOther");
}

/** First calendar day on which manure-fed outputs may no longer go on this planting, or null. */
export function preHarvestBlockStart(planting: PlantingInput, field = "planting"): IsoDate | null {
  const days = preHarvestDays(planting);
  if (days === 0) return null;
  const harvest = toDayNumber(planting.harvestDate ?? planting.endDate, `${field}.harvestDate`);
  // 7 CFR 205.203(c)(1): harvest "not less than" N days after application → day harvest − N is still allowed.
  return fromDayNumber(harvest - days + 1);
}

/**
 * One planting's rule before its dates become objects: what every date asks (the same for each)
 * and which dates in the range are fed, in order; `blocked` holds the others with the reason.
 * The plan reads this directly (thousands of feedings); expandPlanting builds one object per date.
 */
export interface RuleDates {
  plantingId: string;
  bedId: string;
  material: FeedingRule["material"];
  method: FeedingRule["method"];
  amount: number;
  priority: number;
  feederClass: PlantingInput["feederClass"];
  explanation: DemandResult["occurrences"][number]["explanation"];
  warnings: DemandResult["warnings"];
  /** Read-only: may be the recurrence cache's own frozen list. */
  fed: readonly IsoDate[];
  blocked: DemandResult["blocked"];
}

export function expandRuleDates(
  planting: PlantingInput,
  bed: BedInput,
  options: DemandOptions,
  field = "planting",
): RuleDates {
  if (typeof planting.id !== "string" || planting.id === "")
    throw new EngineInputError(`${field}.id`, "must be a non-empty id");
  const season = parseSeason(options.season);
  const range = rangeOf(options.range);
  // Field names are only built for a date that fails (this runs once per rule of every planting).
  const start =
    checkedDayNumber(planting.startDate) ?? toDayNumber(planting.startDate, `${field}.startDate`);
  const end =
    checkedDayNumber(planting.endDate) ?? toDayNumber(planting.endDate, `${field}.endDate`);
  if (end < start)
    throw new EngineInputError(
      `${field}.endDate`,
      `must not be before startDate (${planting.startDate})`,
    );
  const density = requirePositive(
    options.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL"),
    "bulkDensityKgPerL",
    2,
  );
  const priority = requireFinite(planting.priority ?? DEFAULT_PRIORITY, field, ".priority");
  if (!FEEDER_CLASSES.includes(planting.feederClass)) {
    throw new EngineInputError(`${field}.feederClass`, `must be heavy, medium or light`);
  }
  const rule = planting.rule ?? defaultRuleFor(planting.feederClass);
  const { amount, explanation, warnings } = ruleAmount(
    rule,
    planting,
    bed,
    density,
    field,
    options.explain !== false,
  );
  const result: RuleDates = {
    plantingId: planting.id,
    bedId: planting.bedId,
    material: rule.material,
    method: rule.method,
    amount,
    priority,
    feederClass: planting.feederClass,
    explanation,
    warnings:
      warnings.length === 0
        ? []
        : warnings.map((text) => ({
            plantingId: planting.id,
            field: `${field}.rule.amount`,
            text,
          })),
    fed: [],
    blocked: [],
  };
  const from = Math.max(range.from, start);
  const to = Math.min(range.to, end);
  if (to < from) return result;
  const dates = expandRecurrence(
    rule.recurrence,
    { from: fromDayNumber(from), to: fromDayNumber(to) },
    { anchor: planting.startDate, field: `${field}.rule.recurrence` },
  );
  const phiStart = options.manureFeedstock ? preHarvestBlockStart(planting, field) : null;
  const phiReason = phiStart
    ? `pre-harvest interval: a source bin is fed manure, so nothing within ${preHarvestDays(planting)} days before harvest on ${planting.harvestDate ?? planting.endDate} (7 CFR 205.203(c)(1))`
    : "";
  // Every date is fed until one is not: only then is a list of its own made (the expansion is
  // the recurrence cache's, shared and frozen).
  let fed: IsoDate[] | undefined;
  for (let d = 0; d < dates.length; d++) {
    const date = dates[d]!;
    if (!bed.indoor && !inSeason(date, season)) {
      fed ??= dates.slice(0, d);
      result.blocked.push({
        plantingId: planting.id,
        date,
        reason: `outside the growing season (${season.text}); the bed is outdoors`,
      });
    } else if (phiStart && date >= phiStart) {
      fed ??= dates.slice(0, d);
      result.blocked.push({ plantingId: planting.id, date, reason: phiReason });
    } else fed?.push(date);
  }
  result.fed = fed ?? dates;
  return result;
}

/** Dated applications for one planting within the range, season and pre-harvest interval. */
export function expandPlanting(
  planting: PlantingInput,
  bed: BedInput,
  options: DemandOptions,
  field = "planting",
): DemandResult {
  const r = expandRuleDates(planting, bed, options, field);
  return {
    occurrences: r.fed.map((date) => ({
      plantingId: r.plantingId,
      bedId: r.bedId,
      date,
      material: r.material,
      method: r.method,
      amount: r.amount,
      priority: r.priority,
      feederClass: r.feederClass,
      explanation: r.explanation,
    })),
    blocked: r.blocked,
    warnings: r.warnings,
  };
}

/** Every planting's applications, with the beds looked up by id. */
export function expandDemand(input: {
  plantings: readonly PlantingInput[];
  beds: readonly BedInput[];
  options: DemandOptions;
}): DemandResult {
  const beds = new Map(input.beds.map((b) => [b.id, b]));
  parseSeason(input.options.season);
  const out: DemandResult = { occurrences: [], blocked: [], warnings: [] };
  input.plantings.forEach((p, i) => {
    const bed = beds.get(p.bedId);
    if (!bed) throw new EngineInputError(`plantings[${i}].bedId`, `no bed with id "${p.bedId}"`);
    const r = expandPlanting(p, bed, input.options, `plantings[${i}]`);
    for (const o of r.occurrences) out.occurrences.push(o);
    for (const b of r.blocked) out.blocked.push(b);
    for (const w of r.warnings) out.warnings.push(w);
  });
  return out;
}
