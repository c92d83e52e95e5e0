import { z } from "zod";

// The Balance's month range: `from` "YYYY-MM" (a real month), `months` 3–24.
// Shared by the balance route (query string) and the what-if body.

export const BALANCE_MONTHS = { min: 3, max: 24, default: 12 } as const;

export const monthSchema = z
  .string()
  .regex(/^\d{4}-(0[1-9]|1[0-2])$/, "must be a month as YYYY-MM, e.g. 2026-03")
  .refine((m) => Number(m.slice(0, 4)) >= 1900 && Number(m.slice(0, 4)) <= 2200, {
    message: "must be a year between 1900 and 2200",
  });

const monthCount = z
  .number({ error: "must be a whole number of months" })
  .int("must be a whole number of months")
  .min(BALANCE_MONTHS.min, `must be at least ${BALANCE_MONTHS.min}`)
  .max(BALANCE_MONTHS.max, `must be at most ${BALANCE_MONTHS.max}`);

/** In a JSON body: a number, never a string or anything else coerced into one. */
export const monthsSchema = monthCount;

/** In a query string: digits only, then the same bounds. */
export const monthsQuerySchema = z
  .string()
  .regex(/^\d{1,3}$/, "must be a whole number of months")
  .transform(Number)
  .pipe(monthCount);

/** The calendar day it is now in `timeZone`, "YYYY-MM-DD". */
export function todayIn(timeZone: string, now: Date = new Date()): string {
  // en-CA formats a date as YYYY-MM-DD.
  return new Intl.DateTimeFormat("en-CA", {
    timeZone,
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
  }).format(now);
}
