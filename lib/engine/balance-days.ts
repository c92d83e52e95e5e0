// Day arithmetic the balance needs on floating all-day dates. Days are counted
// from 1970-01-01 in UTC so that no local zone or DST shift can move a date.
import type { IsoDate } from "@/lib/engine/types";
import { EngineInputError } from "@/lib/engine/errors";
import { toDayNumber } from "@/lib/engine/dates";

const MS_PER_DAY = 86_400_000;
const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;
const ISO_MONTH = /^(\d{4})-(\d{2})$/;

/** Day number of a "YYYY-MM-DD" date; throws naming `field` when it is not a real date. */
export function dayNumber(date: IsoDate, field = "date"): number {
  return toDayNumber(date, field);
}

export function isoFromDay(day: number): IsoDate {
  return new Date(day * MS_PER_DAY).toISOString().slice(0, 10);
}

/** "YYYY-MM" of a day number. */
export function monthOfDay(day: number): string {
  return isoFromDay(day).slice(0, 7);
}

export interface MonthSpan {
  month: string; // "YYYY-MM"
  startDay: number; // first day, inclusive
  endDay: number; // first day of the next month, exclusive
}

/** Accepts "YYYY-MM" or "YYYY-MM-DD" (the day is ignored: balances run in whole months). */
export function monthSpans(from: string, months: number, field = "from"): MonthSpan[] {
  const m = ISO_MONTH.exec(from) ?? ISO_DAY.exec(from);
  if (!m) throw new EngineInputError(field, `must be a month written YYYY-MM (got "${from}")`);
  const y = Number(m[1]);
  const mo = Number(m[2]);
  if (mo < 1 || mo > 12) throw new EngineInputError(field, `month must be 01–12 (got "${from}")`);
  if (!Number.isInteger(months) || months < 1 || months > 60) {
    throw new EngineInputError("months", `must be a whole number from 1 to 60 (got ${months})`);
  }
  const spans: MonthSpan[] = [];
  for (let i = 0; i < months; i++) {
    const start = Math.round(Date.UTC(y, mo - 1 + i, 1) / MS_PER_DAY);
    const end = Math.round(Date.UTC(y, mo + i, 1) / MS_PER_DAY);
    spans.push({ month: isoFromDay(start).slice(0, 7), startDay: start, endDay: end });
  }
  return spans;
}
