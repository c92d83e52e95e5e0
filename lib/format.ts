// The one place dates and times become words for people: pages, e-mails and
// CSV files all call these, so a day or an instant reads the same everywhere.
//
// Calendar days are floating ("YYYY-MM-DD"): formatted in UTC so a day never
// shifts with the viewer's zone. Instants (an invitation's expiry) are shown
// in the garden's own time zone, with the zone named.

/** Month names, January first: index = month number − 1. */
export const MONTH_NAMES = [
  "January",
  "February",
  "March",
  "April",
  "May",
  "June",
  "July",
  "August",
  "September",
  "October",
  "November",
  "December",
] as const;

export function formatDay(
  day: string,
  options: Intl.DateTimeFormatOptions = { month: "short", day: "numeric" },
): string {
  const date = new Date(`${day}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return day;
  return new Intl.DateTimeFormat("en-US", { ...options, timeZone: "UTC" }).format(date);
}

/** A day of every year, "MM-DD" (a usual frost day), e.g. "Apr 15". */
export function formatMonthDay(md: string): string {
  // 2000 is a leap year, so "02-29" has a day to land on.
  return formatDay(`2000-${md}`, { month: "short", day: "numeric" });
}

/** A calendar day with its year, e.g. "Apr 15, 2026": for messages read out of context. */
export function formatDayWithYear(day: string): string {
  return formatDay(day, { month: "short", day: "numeric", year: "numeric" });
}

/**
 * An instant in `timeZone`, e.g. "December 8, 2026 at 9:20 PM (America/Chicago)".
 * Throws for a zone Intl does not know, so a bad zone is never shown as UTC.
 */
export function formatDateTime(instant: Date | string, timeZone: string): string {
  const date = typeof instant === "string" ? new Date(instant) : instant;
  if (Number.isNaN(date.getTime())) throw new Error("formatDateTime needs a valid date");
  let format: Intl.DateTimeFormat;
  try {
    format = new Intl.DateTimeFormat("en-US", { timeZone, dateStyle: "long", timeStyle: "short" });
  } catch {
    throw new Error(`timeZone must be an IANA time zone name, got "${timeZone}"`);
  }
  return `${format.format(date)} (${timeZone})`;
}
