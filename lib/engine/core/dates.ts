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
// Plans turn tens of thousands of logged dates into day numbers: a valid date is read digit by
// digit with the civil-calendar arithmetic below (no RegExp, no Date, no cache); anything else
// goes the slow way, which names the problem.
export function toDayNumber(date: unknown, field = "date"): number {
  const day = typeof date === "string" ? quickDayNumber(date) : undefined;
  return day ?? parseDayNumber(date, field);
}

/**
 * Day numbers of many dated records at once (logs by the ten thousand), read here so each date
 * costs one call; a bad date throws naming `${list}[i].date`.
 */
export function dayNumbersOf(records: readonly { date: string }[], list: string): Int32Array {
  const days = new Int32Array(records.length);
  for (let i = 0; i < records.length; i++) {
    const date = records[i]!.date;
    days[i] = quickDayNumber(date) ?? parseDayNumber(date, `${list}[${i}].date`);
  }
  return days;
}

/** The day number of a valid "YYYY-MM-DD", or undefined (the caller then reports the field). */
export function checkedDayNumber(date: string): number | undefined {
  return quickDayNumber(date);
}

const DIGIT_0 = 48;
const digitAt = (s: string, i: number): number => {
  const d = s.charCodeAt(i) - DIGIT_0;
  return d >= 0 && d <= 9 ? d : NaN;
};

function quickDayNumber(date: string): number | undefined {
  if (date.length !== 10 || date.charCodeAt(4) !== 45 || date.charCodeAt(7) !== 45)
    return undefined;
  const y =
    digitAt(date, 0) * 1000 + digitAt(date, 1) * 100 + digitAt(date, 2) * 10 + digitAt(date, 3);
  const m = digitAt(date, 5) * 10 + digitAt(date, 6);
  const d = digitAt(date, 8) * 10 + digitAt(date, 9);
  // NaN (a non-digit) fails every comparison below.
  if (!(y >= MIN_YEAR && y <= MAX_YEAR && m >= 1 && m <= 12 && d >= 1)) return undefined;
  const at = (y - MIN_YEAR) * 12 + (m - 1);
  if (d > MONTH_LENGTH[at]!) return undefined;
  return MONTH_START[at]! + d - 1;
}

const isLeap = (y: number) => (y % 4 === 0 && y % 100 !== 0) || y % 400 === 0;
const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
function daysInMonth(y: number, m: number): number {
  return m === 2 && isLeap(y) ? 29 : MONTH_DAYS[m - 1]!;
}

// Day number of the 1st and length of every month from MIN_YEAR to MAX_YEAR, built once from
// daysFromCivil below: reading a date is then two table lookups.
const MONTH_START = new Int32Array((MAX_YEAR - MIN_YEAR + 1) * 12);
const MONTH_LENGTH = new Uint8Array(MONTH_START.length);

// Days from civil and back (H. Hinnant, "chrono-Compatible Low-Level Date Algorithms"):
// proleptic Gregorian calendar, eras of 400 years counted from 0000-03-01.
function daysFromCivil(y: number, m: number, d: number): number {
  const yy = m <= 2 ? y - 1 : y;
  const era = Math.floor(yy / 400);
  const yoe = yy - era * 400;
  const doy = Math.floor((153 * (m + (m > 2 ? -3 : 9)) + 2) / 5) + d - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

for (let y = MIN_YEAR; y <= MAX_YEAR; y++)
  for (let m = 1; m <= 12; m++) {
    MONTH_START[(y - MIN_YEAR) * 12 + m - 1] = daysFromCivil(y, m, 1);
    MONTH_LENGTH[(y - MIN_YEAR) * 12 + m - 1] = daysInMonth(y, m);
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

// Day numbers of years 1900–2200 come back as the same string each time (built once, on demand).
const ISO_FIRST_DAY = -25567; // 1900-01-01
const ISO_LAST_DAY = 84005; // 2199-12-31
const isoOfDay: (string | undefined)[] = new Array(ISO_LAST_DAY - ISO_FIRST_DAY + 1).fill(
  undefined,
);

export function fromDayNumber(day: number): IsoDate {
  const k = day - ISO_FIRST_DAY;
  if (Number.isInteger(day) && k >= 0 && day <= ISO_LAST_DAY) {
    return (isoOfDay[k] ??= utcDateToIso(new Date(day * MS_PER_DAY)));
  }
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
// Civil from days (H. Hinnant, as daysFromCivil above): no Date object, since supply asks the
// month of every day of every bin's forecast.
export function monthOfDay(day: number): number {
  const z = Math.floor(day) + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor(
    (doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365,
  );
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  return mp < 10 ? mp + 3 : mp - 9;
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
function quickOrNamed(date: unknown, field: string, key: string): number {
  const day = typeof date === "string" ? quickDayNumber(date) : undefined;
  return day ?? parseDayNumber(date, field + key);
}

export function rangeDays(range: DateRange, field = "range"): { from: number; to: number } {
  // The field names are only built for a date that fails (plans ask this once per rule).
  const from = quickOrNamed(range.from, field, ".from");
  const to = quickOrNamed(range.to, field, ".to");
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
