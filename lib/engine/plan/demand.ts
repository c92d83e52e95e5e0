// Planted feedings after asOf, and logged applications, as ledger claims.
import { dflt } from "@/lib/engine/core/defaults";
import { dayOfYearDate, fromDayNumber, toDayNumber, yearOfDay } from "@/lib/engine/core/dates";
import { EngineInputError } from "@/lib/engine/core/errors";
import type { IsoDate, Material, Method } from "@/lib/engine/core/types";
import { POOL_OF, type LedgerClaim, type LedgerLogged } from "@/lib/engine/balance/ledger";
import {
  expandRuleDates,
  preHarvestBlockStart,
  preHarvestDays,
  type RuleDates,
} from "@/lib/engine/demand/demand";
import type { FeedingRule } from "@/lib/engine/demand/feeding-rules";
import type {
  BedInput as DemandBed,
  PlantingInput as DemandPlanting,
} from "@/lib/engine/demand/types";
import { isBoundedRule } from "@/lib/engine/demand/recurrence";
import type {
  FeedingRuleInput,
  GardenInputs,
  MonthDay,
  PlantingInput,
} from "@/lib/engine/plan/inputs";
import type { PlanContext } from "@/lib/engine/plan/context";
import type { Explanation, PlanWarning } from "@/lib/engine/plan/results";

export interface PlannedClaim extends LedgerClaim {
  id: string;
  plantingId: string;
  bedId: string;
  date: IsoDate;
  material: Material;
  method: Method;
  /** As expanded: kg castings, L undiluted leachate, L tea. */
  amount: number;
  explanation: Explanation;
  /** Index of the planting in inputs.plantings, and of the rule among all rules expanded. */
  plantingIndex: number;
  ruleIndex: number;
}

/**
 * A logged application as the ledger needs it; `index` points into inputs.logs.applications, or
 * is -1 for the summed history of one day and pool (see buildDemand).
 */
export interface LoggedClaim extends LedgerLogged {
  index: number;
}

const NO_DRAWS: LoggedClaim["draws"] = [];

/** What every feeding id of one planting and material starts with (the date follows). */
export const feedingIdPrefix = (plantingId: string, material: Material) =>
  `${plantingId}:${material}:`;

export const feedingId = (plantingId: string, material: Material, date: IsoDate) =>
  feedingIdPrefix(plantingId, material) + date;

/**
 * A planting's rules one by one (none: its feeder class default, `rule` null).
 * Stable ids when a planting has several rules: a feeding keeps
 * `planting:material:date` (feedingId) unless an earlier rule of the planting
 * (in its order) already has a feeding of that material that day; then it gets
 * `:2` (`:3`, …) on that day only. So castings monthly on the 1st and castings
 * weekly give `p:castings:2026-07-01` and `p:castings:2026-07-01:2`; a rule
 * added after the others changes none of their ids, and no planting's ids
 * depend on another planting's.
 */
interface RuleOfPlanting {
  p: PlantingInput;
  i: number;
  rule: FeedingRuleInput | null;
  k: number | null;
  idOf: (id: string) => string;
}

const sameId = (id: string) => id;

function eachRule(plantings: readonly PlantingInput[]): RuleOfPlanting[] {
  const out: RuleOfPlanting[] = [];
  for (let i = 0; i < plantings.length; i++) {
    const p = plantings[i]!;
    // One rule's dates never repeat (expandRecurrence), so its ids are unique as they are.
    if (p.rules.length <= 1) {
      out.push({
        p,
        i,
        rule: p.rules[0] ?? null,
        k: p.rules.length === 0 ? null : 0,
        idOf: sameId,
      });
      continue;
    }
    const seen = new Map<string, number>();
    const idOf = (id: string) => {
      const n = (seen.get(id) ?? 0) + 1;
      seen.set(id, n);
      return n === 1 ? id : `${id}:${n}`;
    };
    for (let k = 0; k < p.rules.length; k++) out.push({ p, i, rule: p.rules[k]!, k, idOf });
  }
  return out;
}

/** expandRuleDates for rule k of a planting: its errors name `plantings[i].rules[k].…`. */
function expandRule(
  dp: DemandPlanting,
  bed: DemandBed,
  options: Parameters<typeof expandRuleDates>[2],
  field: string,
  k: number | null,
): RuleDates {
  try {
    return expandRuleDates(dp, bed, options, field);
  } catch (e) {
    if (k === null || !(e instanceof EngineInputError) || !e.field.startsWith(`${field}.rule.`))
      throw e;
    const at = e.field.replace(`${field}.rule.`, `${field}.rules[${k}].`);
    throw new EngineInputError(at, e.message.slice(e.field.length + 2));
  }
}

const md = (m: MonthDay) => `${String(m.month).padStart(2, "0")}-${String(m.day).padStart(2, "0")}`;

export function toEngineRule(rule: FeedingRuleInput): FeedingRule {
  return {
    material: rule.material,
    method: rule.method,
    basis: rule.basis,
    amount: rule.amount,
    amountUnit: rule.measure === "mass" ? "kg" : "L",
    recurrence: rule.recurrence,
    dilutionWaterParts: rule.dilutionWaterParts ?? undefined,
  };
}

function seasonEnd(startDay: number, frost: MonthDay): number {
  const year = yearOfDay(startDay);
  const f = dayOfYearDate(year, [frost.month, frost.day]);
  return f >= startDay ? f : dayOfYearDate(year + 1, [frost.month, frost.day]);
}

export function buildDemand(
  inputs: GardenInputs,
  ctx: PlanContext,
  warnings: PlanWarning[],
): { planned: PlannedClaim[]; logged: LoggedClaim[] } {
  const beds = new Map(inputs.beds.map((b) => [b.id, b]));
  const season = {
    lastSpringFrost: md(inputs.settings.lastSpringFrost),
    firstFallFrost: md(inputs.settings.firstFallFrost),
  };
  const from = ctx.asOfDay + 1;
  const range = { from: fromDayNumber(from), to: fromDayNumber(Math.max(from, ctx.planEndDay)) };
  const planted: PlannedClaim[] = [];
  const plantings = new Map<string, { p: DemandPlanting; rules: FeedingRuleInput[] }>();
  const density = ctx.castingsDensityKgPerL;

  const expandOptions = { range, season, bulkDensityKgPerL: density, explain: false };
  // Every rule expands into its own feedings.
  let ruleIndex = -1;
  for (const { p, i, rule: ruleInput, k, idOf } of eachRule(inputs.plantings)) {
    ruleIndex++;
    const field = `plantings[${i}]`;
    const bed = beds.get(p.bedId);
    if (!bed) throw new EngineInputError(`${field}.bedId`, `no bed with id "${p.bedId}"`);
    if (!Number.isInteger(p.plantCount) || p.plantCount < 1)
      throw new EngineInputError(`${field}.plantCount`, `must be a whole number of plants ≥ 1`);
    const rule = ruleInput ? toEngineRule(ruleInput) : undefined;
    let end = p.endDate;
    if (end === null) {
      const start = toDayNumber(p.startDate, `${field}.startDate`);
      // The planting's end, not the rule's: it ends with the season unless every rule ends.
      const bounded =
        p.rules.length > 0 &&
        p.rules.every((r, j) => isBoundedRule(r.recurrence, `${field}.rules[${j}].recurrence`));
      if (bounded) end = fromDayNumber(Math.max(start, ctx.planEndDay));
      else if (!bed.indoor) end = fromDayNumber(seasonEnd(start, inputs.settings.firstFallFrost));
      else
        throw new EngineInputError(
          `${field}.endDate`,
          "is needed: the rule never ends and an indoor bed has no season",
        );
    }
    const dp: DemandPlanting = {
      id: p.id,
      bedId: p.bedId,
      feederClass: p.feederClass,
      plantCount: p.plantCount,
      startDate: p.startDate,
      endDate: end,
      harvestDate: p.harvestDate ?? undefined,
      priority: p.priority ?? undefined,
      edible: p.edible,
      edibleTouchesSoil: p.edibleTouchesSoil,
      rule,
    };
    plantings.set(p.id, { p: dp, rules: p.rules });
    const db: DemandBed = {
      id: bed.id,
      indoor: bed.indoor,
      areaM2: bed.areaM2 ?? undefined,
      containerVolumeL: bed.containerVolumeL ?? undefined,
    };
    const r = expandRule(dp, db, expandOptions, field, k);
    for (const w of r.warnings)
      warnings.push({
        kind: "mix-above-limit",
        plantingId: p.id,
        explanation: {
          kind: "mix-above-limit",
          inputs: {
            planting: { ref: "planting", id: p.id },
            limit: { unit: "percent", value: dflt("pottingMixWarnAbovePercent") },
            note: { text: w.text },
          },
        },
      });
    const phi = preHarvestBlockStart(dp, field);
    const teaRatio = ruleInput?.teaCastingsPerWater ?? ctx.teaCastingsPerWater;
    // One explanation per rule: every date of a rule needs the same amount.
    const need1 = r.material === "tea" ? r.amount * teaRatio * density : r.amount;
    const explanation: Explanation | undefined =
      r.fed.length === 0
        ? undefined
        : r.material === "tea"
          ? {
              kind: "tea-brewed",
              inputs: {
                planting: { ref: "planting", id: p.id },
                tea: { unit: "L", value: r.amount },
                castingsPerWater: { unit: "ratio", value: teaRatio },
                bulkDensity: { unit: "ratio", value: density },
                castings: { unit: "kg", value: need1 },
              },
            }
          : {
              kind: "demand-amount",
              inputs: {
                planting: { ref: "planting", id: p.id },
                basis: { text: (rule ?? { basis: "per-plant" }).basis },
                plants: { unit: "count", value: p.plantCount },
                amount: { unit: r.material === "castings" ? "kg" : "L", value: r.amount },
              },
            };
    // Every date of a rule asks the same: one object per feeding, made here.
    const idPrefix = feedingIdPrefix(p.id, r.material);
    const pool = POOL_OF[r.material];
    for (let d = 0; d < r.fed.length; d++) {
      const date = r.fed[d]!;
      planted.push({
        id: idOf(idPrefix + date),
        plantingId: p.id,
        bedId: p.bedId,
        date,
        material: r.material,
        method: r.method,
        amount: r.amount,
        explanation: explanation!,
        pool,
        day: toDayNumber(date),
        need: need1,
        priority: r.priority,
        feederClass: r.feederClass,
        cleanOnly: phi !== null && date >= phi,
        plantingIndex: i,
        ruleIndex,
      });
    }
  }

  // Tens of thousands of logs in a long history: a plain loop, the planting looked up once per
  // run of its logs, and no closure per log.
  //
  // Before the plan's first month a log only matters as stock drawn: nothing shows it one by one,
  // and the ledger draws a day's logs that name no lot together as one draw (oldest lots first)
  // and shares it. So those are summed per day and pool here into one claim (index -1), in the
  // order the ledger would add them, and the draw is the same. A day with a history log that
  // names its lots keeps every log of it as its own claim, in order, as the ledger expects.
  const applications = inputs.logs.applications;
  const days = ctx.applicationDays;
  const logged: LoggedClaim[] = [];
  const replaced = new Set<string>();
  const firstDay = ctx.spans[0]!.startDay;
  const history = Math.max(0, ctx.planStartDay - firstDay); // days before the plan
  const summed = new Float64Array(2 * history); // need per (day, pool)
  const summedAny = new Uint8Array(summed.length);
  const namedDay = new Uint8Array(history); // a history day with a log that names its lots
  // First pass: each log's need and pool (typed arrays: the second pass reads only these).
  const needs = new Float64Array(applications.length);
  const castings = new Uint8Array(applications.length);
  let pl: { p: DemandPlanting; rules: FeedingRuleInput[] } | undefined;
  for (let i = 0; i < applications.length; i++) {
    const a = applications[i]!;
    if (pl?.p.id !== a.plantingId) pl = plantings.get(a.plantingId);
    if (!pl)
      throw new EngineInputError(
        `logs.applications[${i}].plantingId`,
        `no planting with id "${a.plantingId}"`,
      );
    const day = days[i]!;
    // The planting's first rule of that material holds its recipe (tea ratio, dilution).
    let rule: FeedingRuleInput | undefined;
    for (let k = 0; k < pl.rules.length && !rule; k++)
      if (pl.rules[k]!.material === a.material) rule = pl.rules[k];
    let need: number;
    if (a.draws.length > 0) need = a.draws.reduce((s, d) => s + d.amount, 0);
    else if (a.material === "castings") need = a.amount;
    else if (a.material === "tea")
      need = a.amount * (rule?.teaCastingsPerWater ?? ctx.teaCastingsPerWater) * density;
    else need = a.amount / (1 + (rule?.dilutionWaterParts ?? dflt("leachateDilutionWaterParts")));
    // Planned feedings all fall after asOf: only a log that names one, or is dated after asOf, can replace it.
    if (a.plannedFeedingId !== null) replaced.add(a.plannedFeedingId);
    else if (day > ctx.asOfDay) replaced.add(feedingId(a.plantingId, a.material, a.date));
    needs[i] = need;
    castings[i] = POOL_OF[a.material] === "castings" ? 1 : 0;
    if (day < ctx.planStartDay && a.draws.length > 0) namedDay[day - firstDay] = 1;
  }
  for (let i = 0; i < applications.length; i++) {
    const day = days[i]!;
    if (day < ctx.planStartDay && namedDay[day - firstDay] === 0) {
      const at = 2 * (day - firstDay) + (castings[i] === 1 ? 0 : 1);
      summed[at]! += Math.max(0, needs[i]!); // what the ledger's shared draw asks of each
      summedAny[at] = 1;
    } else
      logged.push({
        index: i,
        pool: castings[i] === 1 ? "castings" : "leachate",
        day,
        need: needs[i]!,
        draws: applications[i]!.draws,
      });
  }
  for (let at = 0; at < summed.length; at++)
    if (summedAny[at] === 1)
      logged.push({
        index: -1,
        pool: at % 2 === 0 ? "castings" : "leachate",
        day: firstDay + (at >> 1),
        need: summed[at]!,
        draws: NO_DRAWS,
      });
  // A logged application replaces the planned occurrence it fulfils.
  const planned = replaced.size === 0 ? planted : planted.filter((c) => !replaced.has(c.id));
  return { planned, logged };
}

export { preHarvestDays };
