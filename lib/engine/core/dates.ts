import { EngineInputError } from "@/lib/engine/core/errors";
import type { IsoDate } from "@/lib/engine/core/types";

// Calendar days are handled as whole-day numbers counted from 1970-01-01 and built
// with Date.UTC, never with local-time Date methods: a floating all-day date must
// come out the same on a server in UTC and a laptop in New York across DST.

const MS_PER_DAY = 86_400_000;
const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const MIN_YEAR = 1900;
const MAX_YEAR = 2200;

/** Days since 1970-01-01 for a "YYYY-MM-DD" string; EngineInputError naming `field` otherwise. */
// Plans parse the same few hundred dates thousands of times; valid ones are remembered.
const dayCache = new Map<string, number>();

export function toDayNumber(date: unknown, field = "date"): number {
  if (typeof date === "string") {
    const hit = dayCache.get(date);
    if (hit !== undefined) return hit;
  }
  const day = parseDayNumber(date, field);
  if (dayCache.size > 200_000) dayCache.clear();
  dayCache.set(date as string, day);
  return day;
}

/** The day number of a date already checked by toDayNumber, without building a field name for it. */
export function checkedDayNumber(date: string): number | undefined {
  return dayCache.get(date);
}

function parseDayNumber(date: unknown, field: string): number {
  if (typeof date !== "string") {
    throw new EngineInputError(field, `must be a date written YYYY-MM-DD (got ${String(date)})`);
  }
  const m = ISO_DATE.exec(date);
  if (!m) throw new EngineInputError(field, `must be a date written YYYY-MM-DD (got "${date}")`);
  const y = Number(m[1]);
  const mo = Number(m[2]);
  const d = Number(m[3]);
  if (y < MIN_YEAR || y > MAX_YEAR) {
    throw new EngineInputError(
      field,
      `year must be from ${MIN_YEAR} to ${MAX_YEAR} (got "${date}")`,
    );
  }
  const ms = Date.UTC(y, mo - 1, d);
  const back = new Date(ms);
  // Date.UTC rolls 2027-02-30 over to March; a real calendar day round-trips.
  if (back.getUTCMonth() !== mo - 1 || back.getUTCDate() !== d) {
    throw new EngineInputError(field, `is not a calendar day (got "${date}")`);
  }
  return Math.round(ms / MS_PER_DAY);
}

export function fromDayNumber(day: number): IsoDate {
  return utcDateToIso(new Date(day * MS_PER_DAY));
}

/** The calendar day of a Date's UTC fields, "YYYY-MM-DD". */
export function utcDateToIso(d: Date): IsoDate {
  const y = d.getUTCFullYear();
  const m = d.getUTCMonth() + 1;
  const day = d.getUTCDate();
  return `${y}-${m < 10 ? "0" : ""}${m}-${day < 10 ? "0" : ""}${day}`;
}

/** Midnight UTC of a floating calendar day, the form the rrule library expects. */
export function isoToUtcDate(date: IsoDate, field = "date"): Date {
  return new Date(toDayNumber(date, field) * MS_PER_DAY);
}

export function addDays(date: IsoDate, days: number, field = "date"): IsoDate {
  return fromDayNumber(toDayNumber(date, field) + days);
}

/** b − a in whole days. */
export function daysBetween(a: IsoDate, b: IsoDate): number {
  return toDayNumber(b, "to") - toDayNumber(a, "from");
}

/** Month 1–12 of a day number. */
export function monthOfDay(day: number): number {
  return new Date(day * MS_PER_DAY).getUTCMonth() + 1;
}

export function monthOf(date: IsoDate, field = "date"): number {
  return monthOfDay(toDayNumber(date, field));
}

/** "YYYY-MM" of a calendar day, the balance's month key. */
export function monthKey(date: IsoDate): string {
  return date.slice(0, 7);
}

export interface DateRange {
  from: IsoDate;
  to: IsoDate; // inclusive
}

/** Checks a range and returns its day numbers; `to` before `from` is an error. */
export function rangeDays(range: DateRange, field = "range"): { from: number; to: number } {
  const from = toDayNumber(range.from, `${field}.from`);
  const to = toDayNumber(range.to, `${field}.to`);
  if (to < from) {
    throw new EngineInputError(`${field}.to`, `must not be before ${field}.from (${range.from})`);
  }
  return { from, to };
}

/** A set of months 1–12 (dormant months), checked. */
export function monthSet(months: readonly number[] | undefined, field: string): Set<number> {
  const set = new Set<number>();
  (months ?? []).forEach((m, i) => {
    if (!Number.isInteger(m) || m < 1 || m > 12) {
      throw new EngineInputError(
        `${field}[${i}]`,
        `must be a month number 1–12 (got ${String(m)})`,
      );
    }
    set.add(m);
  });
  return set;
}

/** Month-day "MM-DD" (or the month-day of a "YYYY-MM-DD") → [month, day], checked. */
export function parseMonthDay(value: unknown, field: string): [number, number] {
  if (typeof value === "string") {
    const full = ISO_DATE.exec(value);
    const md = full ? [full[2], full[3]] : /^(\d{2})-(\d{2})$/.exec(value)?.slice(1);
    if (md) {
      const m = Number(md[0]);
      const d = Number(md[1]);
      // 2024 is a leap year, so 02-29 is accepted as a month-day.
      const probe = new Date(Date.UTC(2024, m - 1, d));
      if (m >= 1 && m <= 12 && probe.getUTCMonth() === m - 1 && probe.getUTCDate() === d) {
        return [m, d];
      }
    }
  }
  throw new EngineInputError(field, `must be a month and day written MM-DD (got ${String(value)})`);
}

/** Day number of month-day [m, d] in a given year; Feb 29 falls back to Feb 28 off leap years. */
export function dayOfYearDate(year: number, [m, d]: [number, number]): number {
  const ms = Date.UTC(year, m - 1, d);
  const back = new Date(ms);
  const fixed = back.getUTCMonth() === m - 1 ? ms : Date.UTC(year, m - 1, d - 1);
  return Math.round(fixed / MS_PER_DAY);
}

export function yearOfDay(day: number): number {
  return new Date(day * MS_PER_DAY).getUTCFullYear();
}

/** Alias kept for readability where day numbers are turned back into dates. */
export const isoFromDay = fromDayNumber;
export const dayNumber = toDayNumber;

const ISO_MONTH = /^(\d{4})-(\d{2})$/;

/** "YYYY-MM" of a day number. */
export function monthKeyOfDay(day: number): string {
  return fromDayNumber(day).slice(0, 7);
}

export interface MonthSpan {
  month: string; // "YYYY-MM"
  startDay: number; // first day, inclusive
  endDay: number; // first day of the next month, exclusive
}

/** Accepts "YYYY-MM" or "YYYY-MM-DD" (the day is ignored: balances run in whole months). */
export function monthSpans(
  from: string,
  months: number,
  field = "from",
  maxMonths = 60,
): MonthSpan[] {
  const m = ISO_MONTH.exec(from) ?? ISO_DATE.exec(from);
  if (!m) throw new EngineInputError(field, `must be a month written YYYY-MM (got "${from}")`);
  const y = Number(m[1]);
  const mo = Number(m[2]);
  if (mo < 1 || mo > 12) throw new EngineInputError(field, `month must be 01–12 (got "${from}")`);
  if (!Number.isInteger(months) || months < 1 || months > maxMonths) {
    throw new EngineInputError(
      "months",
      `must be a whole number from 1 to ${maxMonths} (got ${months})`,
    );
  }
  const spans: MonthSpan[] = [];
  for (let i = 0; i < months; i++) {
    const start = Math.round(Date.UTC(y, mo - 1 + i, 1) / MS_PER_DAY);
    const end = Math.round(Date.UTC(y, mo + i, 1) / MS_PER_DAY);
    spans.push({ month: fromDayNumber(start).slice(0, 7), startDay: start, endDay: end });
  }
  return spans;
}
