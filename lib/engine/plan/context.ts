// Settings with their defaults filled in, the plan's months and the replay's
// months, computed once per plan.
import { dflt } from "@/lib/engine/core/defaults";
import {
  checkedDayNumber,
  dayNumbersOf,
  fromDayNumber,
  monthSpans,
  toDayNumber,
  type MonthSpan,
} from "@/lib/engine/core/dates";
import { EngineInputError } from "@/lib/engine/core/errors";
import type { GardenInputs, PlanOptions } from "@/lib/engine/plan/inputs";
import { toSi } from "@/lib/units";

export interface PlanContext {
  asOfDay: number;
  /** Every month from the first day of history to the end of the plan. */
  spans: MonthSpan[];
  /** Index in `spans` of the plan's first month. */
  firstPlanMonth: number;
  planStartDay: number;
  planEndDay: number; // inclusive
  shelfLifeDays: number;
  liquidMaxAgeDays: number;
  pricePerKg: number;
  teaCastingsPerWater: number;
  castingsDensityKgPerL: number;
  /** Day number of each logged application (inputs.logs.applications[i].date), read once. */
  applicationDays: Int32Array;
}

function wholeDays(v: number, field: string, max: number): number {
  if (!Number.isInteger(v) || v < 1 || v > max)
    throw new EngineInputError(field, `must be a whole number of days 1–${max} (got ${v})`);
  return v;
}

export function planContext(inputs: GardenInputs, options: PlanOptions): PlanContext {
  const asOfDay = toDayNumber(inputs.asOf, "asOf");
  const from = options.from ?? fromDayNumber(asOfDay + 1).slice(0, 7);
  const plan = monthSpans(from, options.months ?? 12, "options.from");
  const planStartDay = plan[0]!.startDay;
  // History starts with the earliest bin, lot or log; the walk starts on that month's first day.
  let first = Math.min(planStartDay, asOfDay + 1);
  // Thousands of logged dates: the field name is only built for a date not yet checked.
  const see = (date: string, list: string, i: number, key: string) =>
    (first = Math.min(first, checkedDayNumber(date) ?? toDayNumber(date, `${list}[${i}].${key}`)));
  inputs.bins.forEach((b, i) => see(b.startDate, "bins", i, "startDate"));
  inputs.stockLots.forEach((l, i) => see(l.madeOn, "stockLots", i, "madeOn"));
  inputs.logs.harvests.forEach((h, i) => see(h.date, "logs.harvests", i, "date"));
  inputs.logs.drains.forEach((d, i) => see(d.date, "logs.drains", i, "date"));
  const applicationDays = dayNumbersOf(inputs.logs.applications, "logs.applications");
  for (let i = 0; i < applicationDays.length; i++)
    if (applicationDays[i]! < first) first = applicationDays[i]!;
  const firstMonth = fromDayNumber(first).slice(0, 7);
  const lead = monthSpans(firstMonth, 1, "history")[0]!;
  const before: MonthSpan[] = [];
  if (lead.startDay < planStartDay) {
    const [y1, m1] = firstMonth.split("-").map(Number) as [number, number];
    const [y2, m2] = from.slice(0, 7).split("-").map(Number) as [number, number];
    const count = (y2 - y1) * 12 + (m2 - m1);
    for (const s of monthSpans(firstMonth, count, "history", 1200)) before.push(s);
  }
  const s = inputs.settings;
  const priceDefault = dflt("pricePerLb") / toSi(1, "lb");
  return {
    asOfDay,
    spans: [...before, ...plan],
    firstPlanMonth: before.length,
    planStartDay,
    planEndDay: plan[plan.length - 1]!.endDay - 1,
    shelfLifeDays: wholeDays(
      s.shelfLifeDays ?? dflt("castingsShelfLifeDays"),
      "settings.shelfLifeDays",
      3650,
    ),
    liquidMaxAgeDays: wholeDays(
      s.liquidMaxAgeDays ?? dflt("liquidMaxAgeDays"),
      "settings.liquidMaxAgeDays",
      90,
    ),
    pricePerKg: s.castingsPricePerKg ?? priceDefault,
    teaCastingsPerWater: s.teaCastingsPerWater ?? dflt("teaCastingsPerWater"),
    castingsDensityKgPerL: dflt("castingsBulkDensityKgPerL"),
    applicationDays,
  };
}
