import { fromDayNumber, parseMonthDay, rangeDays, toDayNumber, type DateRange } from "@/lib/engine/dates";
import { dflt } from "@/lib/engine/defaults";
import { EngineInputError, requireFinite, requireNonNegative, requirePositive } from "@/lib/engine/errors";
import { defaultRuleFor, type FeedingRule } from "@/lib/engine/feeding-rules";
import { fmt, plural } from "@/lib/engine/format";
import { expandRecurrence } from "@/lib/engine/recurrence";
import type {
  BlockedOccurrence,
  DemandOccurrence,
  Explanation,
  FeederClass,
  IsoDate,
} from "@/lib/engine/types";

export type { FeedingRule } from "@/lib/engine/feeding-rules";

export interface BedInput {
  id: string;
  /** Indoor beds and containers are fed all year, ignoring frost dates. */
  indoor?: boolean;
  areaM2?: number;
  containerVolumeL?: number;
}

export interface PlantingInput {
  id: string;
  bedId: string;
  feederClass: FeederClass;
  plantCount: number;
  startDate: IsoDate;
  /** Last day in the ground; also the harvest day unless harvestDate is set. */
  endDate: IsoDate;
  harvestDate?: IsoDate;
  /** Lower is fed first when stock is short. */
  priority?: number;
  /** Edible crop (pre-harvest interval applies). Default true. */
  edible?: boolean;
  /** Edible part touches the soil (120-day rather than 90-day interval). Default false. */
  edibleTouchesSoil?: boolean;
  /** Overrides the crop's rule; without it the feeder-class default applies. */
  rule?: FeedingRule;
  /** Part of the bed this planting occupies, if not all of it. */
  areaM2?: number;
  containerVolumeL?: number;
}

/** Growing season as month-days "MM-DD" (a "YYYY-MM-DD" is read by its month-day), every year. */
export interface GardenSeason {
  lastSpringFrost: string;
  firstFallFrost: string;
}

export interface DemandOptions {
  range: DateRange;
  season: GardenSeason;
  /** Some source bin's feedstock includes manure: apply the pre-harvest interval. */
  manureFeedstock?: boolean;
  bulkDensityKgPerL?: number;
}

export interface DemandWarning {
  plantingId: string;
  field: string;
  text: string;
}

export interface DemandResult {
  occurrences: DemandOccurrence[];
  blocked: BlockedOccurrence[];
  warnings: DemandWarning[];
}

export const DEFAULT_PRIORITY = 3;

interface Season {
  from: number; // month * 100 + day
  to: number;
  text: string;
}

/** Checks frost dates; the last spring frost must come before the first fall frost. */
export function parseSeason(season: GardenSeason, field = "season"): Season {
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
  const md = Number(date.slice(5, 7)) * 100 + Number(date.slice(8, 10));
  return md >= s.from && md <= s.to;
}

/** Days before harvest during which manure-fed outputs are not applied, or 0 when none applies. */
export function preHarvestDays(planting: Pick<PlantingInput, "edible" | "edibleTouchesSoil">): number {
  if (planting.edible === false) return 0;
  return planting.edibleTouchesSoil ? dflt("preHarvestDaysSoilContact") : dflt("preHarvestDaysOther");
}

/** First calendar day on which manure-fed outputs may no longer go on this planting, or null. */
export function preHarvestBlockStart(planting: PlantingInput, field = "planting"): IsoDate | null {
  const days = preHarvestDays(planting);
  if (days === 0) return null;
  const harvest = toDayNumber(planting.harvestDate ?? planting.endDate, `${field}.harvestDate`);
  // 7 CFR 205.203(c)(1): harvest "not less than" N days after application → day harvest − N is still allowed.
  return fromDayNumber(harvest - days + 1);
}

interface Amount {
  amount: number;
  explanation: Explanation;
  warnings: string[];
}

function ruleAmount(rule: FeedingRule, planting: PlantingInput, bed: BedInput, density: number, field: string): Amount {
  const r = `${field}.rule`;
  const per = requireNonNegative(rule.amount, `${r}.amount`, rule.basis === "percent-of-mix" ? 100 : 1000);
  const unit = rule.amountUnit ?? (rule.material === "castings" && rule.basis !== "percent-of-mix" ? "L" : "L");
  if (unit !== "L" && unit !== "kg") throw new EngineInputError(`${r}.amountUnit`, `must be "L" or "kg"`);
  if (unit === "kg" && rule.material !== "castings") {
    throw new EngineInputError(`${r}.amountUnit`, "only castings can be measured in kg; liquids are litres");
  }
  const warnings: string[] = [];
  let base: number;
  let how: string;
  switch (rule.basis) {
    case "per-plant": {
      const n = requirePositive(planting.plantCount, `${field}.plantCount`, 100_000);
      base = per * n;
      how = `${plural(n, "plant")} × ${fmt(per, 3)} ${unit}`;
      break;
    }
    case "per-area": {
      const area = planting.areaM2 ?? bed.areaM2;
      const a = requirePositive(area, `${field}.areaM2`, 10_000);
      base = per * a;
      how = `${fmt(a, 2)} m² × ${fmt(per, 3)} ${unit}/m²`;
      if (rule.material === "castings" && unit === "L" && per > 12.7 + 1e-9) {
        warnings.push(`top-dressing ${fmt(per, 1)} mm deep is more than ½ in (12.7 mm)`);
      }
      break;
    }
    case "per-container-volume":
    case "percent-of-mix": {
      const v = requirePositive(planting.containerVolumeL ?? bed.containerVolumeL, `${field}.containerVolumeL`, 2000);
      if (rule.basis === "percent-of-mix") {
        if (rule.material !== "castings") {
          throw new EngineInputError(`${r}.basis`, "percent-of-mix applies to castings only");
        }
        base = (per / 100) * v;
        how = `${fmt(per, 1)} % of ${fmt(v, 1)} L mix`;
        if (per > dflt("pottingMixWarnAbovePercent")) {
          warnings.push(`${fmt(per, 1)} % castings is above the 20 % by volume Atiyeh et al. (2000) recommend`);
        }
      } else {
        base = per * v;
        how = `${fmt(v, 1)} L container × ${fmt(per, 3)} ${unit}/L`;
      }
      break;
    }
    default:
      throw new EngineInputError(`${r}.basis`, `unknown basis "${String(rule.basis)}"`);
  }

  if (rule.material === "castings") {
    const kg = unit === "kg" ? base : base * density;
    const text = unit === "kg" ? `${how} = ${fmt(kg, 3)} kg castings` : `${how} × ${fmt(density, 2)} kg/L = ${fmt(kg, 3)} kg castings`;
    return { amount: kg, explanation: { text, inputs: { amountPer: per, bulkDensityKgPerL: density } }, warnings };
  }
  if (rule.material === "leachate") {
    const parts = requireNonNegative(rule.dilutionWaterParts ?? dflt("leachateDilutionWaterParts"), `${r}.dilutionWaterParts`, 1000);
    const undiluted = base / (1 + parts);
    const text = parts > 0 ? `${how} of solution ÷ ${1 + parts} (1 part leachate to ${parts} water) = ${fmt(undiluted, 3)} L leachate` : `${how} = ${fmt(undiluted, 3)} L leachate, undiluted`;
    return { amount: undiluted, explanation: { text, inputs: { solutionL: base, waterParts: parts } }, warnings };
  }
  return { amount: base, explanation: { text: `${how} = ${fmt(base, 3)} L tea` }, warnings };
}

/** Dated applications for one planting within the range, season and pre-harvest interval. */
export function expandPlanting(planting: PlantingInput, bed: BedInput, options: DemandOptions, field = "planting"): DemandResult {
  if (typeof planting.id !== "string" || planting.id === "") throw new EngineInputError(`${field}.id`, "must be a non-empty id");
  const season = parseSeason(options.season);
  const range = rangeDays(options.range, "range");
  const start = toDayNumber(planting.startDate, `${field}.startDate`);
  const end = toDayNumber(planting.endDate, `${field}.endDate`);
  if (end < start) throw new EngineInputError(`${field}.endDate`, `must not be before startDate (${planting.startDate})`);
  const density = requirePositive(options.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL"), "bulkDensityKgPerL", 2);
  const priority = requireFinite(planting.priority ?? DEFAULT_PRIORITY, `${field}.priority`);
  const rule = planting.rule ?? defaultRuleFor(planting.feederClass);
  if (!planting.rule && !["heavy", "medium", "light"].includes(planting.feederClass)) {
    throw new EngineInputError(`${field}.feederClass`, `must be heavy, medium or light`);
  }
  const { amount, explanation, warnings } = ruleAmount(rule, planting, bed, density, field);
  const result: DemandResult = {
    occurrences: [],
    blocked: [],
    warnings: warnings.map((text) => ({ plantingId: planting.id, field: `${field}.rule.amount`, text })),
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
  const seasonReason = `outside the growing season (${season.text}); the bed is outdoors`;
  for (const date of dates) {
    if (!bed.indoor && !inSeason(date, season)) {
      result.blocked.push({ plantingId: planting.id, date, reason: seasonReason });
    } else if (phiStart && date >= phiStart) {
      result.blocked.push({ plantingId: planting.id, date, reason: phiReason });
    } else {
      result.occurrences.push({
        plantingId: planting.id,
        bedId: planting.bedId,
        date,
        material: rule.material,
        method: rule.method,
        amount,
        priority,
        feederClass: planting.feederClass,
        explanation,
      });
    }
  }
  return result;
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
