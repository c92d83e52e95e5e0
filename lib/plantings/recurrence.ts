import { RRule } from "rrule";
import { addDays, EngineInputError, expandRecurrence, parseRecurrence } from "@/lib/engine";
import { MONTH_NAMES } from "@/lib/format";

// A feeding rule's recurrence as growers see it: built from a small form, read
// back in plain words and as its next dates, or typed as a raw RRULE
// (RFC 5545 §3.3.10). Dates are floating all-day dates, expanded by the engine.

/**
 * RFC 5545 §3.3.10 lists rule parts and values like "FREQ=MONTHLY", but §2 says
 * names and enumerated values are case-insensitive, so "freq=weekly;byday=mo" is
 * legal. The rrule library only reads upper case (it parses "mo" as no weekday),
 * so everything is upper-cased here, once, before anyone parses or stores it.
 */
export function normalizeRrule(raw: string): string {
  return raw
    .trim()
    .replace(/^RRULE:/i, "")
    .replace(/\s+/g, "")
    .replace(/;+$/, "")
    .toUpperCase();
}

export const WEEKDAYS = ["MO", "TU", "WE", "TH", "FR", "SA", "SU"] as const;
export type Weekday = (typeof WEEKDAYS)[number];
const WEEKDAY_NAMES: Record<Weekday, string> = {
  MO: "Monday",
  TU: "Tuesday",
  WE: "Wednesday",
  TH: "Thursday",
  FR: "Friday",
  SA: "Saturday",
  SU: "Sunday",
};

/** What the recurrence form holds. */
export interface RecurrenceForm {
  every: number;
  unit: "weeks" | "months";
  /** weeks: which weekday; months: day of the month 1–31 (null = the planting's day). */
  weekday?: Weekday | null;
  monthDay?: number | null;
  /** Last day (inclusive), "YYYY-MM-DD"; null = while the planting lasts. */
  until?: string | null;
  /** Months 1–12 it applies in; empty or null = every month (the season still applies outdoors). */
  months?: number[] | null;
}

export function buildRrule(form: RecurrenceForm): string {
  const parts = [form.unit === "weeks" ? "FREQ=WEEKLY" : "FREQ=MONTHLY"];
  if (form.every > 1) parts.push(`INTERVAL=${form.every}`);
  if (form.unit === "weeks" && form.weekday) parts.push(`BYDAY=${form.weekday}`);
  if (form.unit === "months" && form.monthDay) parts.push(`BYMONTHDAY=${form.monthDay}`);
  if (form.months?.length)
    parts.push(`BYMONTH=${[...form.months].sort((a, b) => a - b).join(",")}`);
  if (form.until) parts.push(`UNTIL=${form.until.replaceAll("-", "")}`);
  return parts.join(";");
}

function ordinal(n: number): string {
  if (n < 0) return n === -1 ? "last day" : `${ordinal(-n)} from last`;
  const rem100 = n % 100;
  const suffix = rem100 >= 11 && rem100 <= 13 ? "th" : (["th", "st", "nd", "rd"][n % 10] ?? "th");
  return `${n}${suffix}`;
}

function list(items: string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items.at(-1)}`;
}

function formatDay(iso: string): string {
  const [y, m, d] = iso.split("-").map(Number);
  return `${d} ${MONTH_NAMES[(m ?? 1) - 1]?.slice(0, 3)} ${y}`;
}

const UNIT_BY_FREQ: Record<number, [string, string]> = {
  [RRule.YEARLY]: ["year", "years"],
  [RRule.MONTHLY]: ["month", "months"],
  [RRule.WEEKLY]: ["week", "weeks"],
  [RRule.DAILY]: ["day", "days"],
};

/** "every 2 weeks on Monday, until 30 Sep 2027": the rule in plain words. */
export function describeRrule(rule: string): string {
  const opts = parseRecurrence(normalizeRrule(rule));
  const interval = (opts.interval as number | undefined) ?? 1;
  const [one, many] = UNIT_BY_FREQ[opts.freq as number] ?? ["time", "times"];
  if (opts.count === 1) return "once, on the planting's first day";
  const words: string[] = [interval === 1 ? `every ${one}` : `every ${interval} ${many}`];
  const days = opts.byweekday == null ? [] : [opts.byweekday].flat();
  if (days.length) {
    const names = days.map((d) => {
      const wd = typeof d === "number" ? d : (d as { weekday: number; n?: number }).weekday;
      const n = typeof d === "number" ? undefined : (d as { n?: number }).n;
      const name = WEEKDAY_NAMES[WEEKDAYS[wd] ?? "MO"];
      return n ? `the ${ordinal(n)} ${name}` : name;
    });
    words.push(`on ${list(names)}`);
  }
  const monthDays = opts.bymonthday == null ? [] : [opts.bymonthday].flat();
  if (monthDays.length) words.push(`on the ${list(monthDays.map((d) => ordinal(d as number)))}`);
  const months = opts.bymonth == null ? [] : [opts.bymonth].flat();
  if (months.length) words.push(`in ${list(months.map((m) => MONTH_NAMES[(m as number) - 1]!))}`);
  let text = words.join(" ");
  if (opts.count != null) text += `, ${opts.count} times`;
  if (opts.until) text += `, until ${formatDay(opts.until.toISOString().slice(0, 10))}`;
  return text;
}

/** The first `n` dates on or after `anchor` (the planting's first day), looking up to 3 years ahead. */
export function nextDates(rule: string, anchor: string, n = 5): string[] {
  const dates = expandRecurrence(
    normalizeRrule(rule),
    { from: anchor, to: addDays(anchor, 3 * 366) },
    { anchor },
  );
  return dates.slice(0, n);
}

const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/**
 * Why a rule gives no dates from `anchor`, in words; null when it does give
 * some. Names the common causes (a day the month never has, an UNTIL before
 * the start) before falling back to a general answer.
 */
export function whyNoDates(rule: string, anchor: string): string | null {
  const normalized = normalizeRrule(rule);
  if (nextDates(normalized, anchor, 1).length) return null;
  const opts = parseRecurrence(normalized);
  const months = (opts.bymonth == null ? [] : [opts.bymonth].flat()) as number[];
  const monthDays = (opts.bymonthday == null ? [] : [opts.bymonthday].flat()) as number[];
  if (months.length && monthDays.length) {
    const impossible = monthDays.filter((d) =>
      months.every((m) => Math.abs(d) > (DAYS_IN_MONTH[m - 1] ?? 31)),
    );
    if (impossible.length === monthDays.length) {
      const m = list(months.map((x) => MONTH_NAMES[x - 1]!));
      return `${m} never has a ${list(impossible.map(ordinal))} day (BYMONTHDAY=${impossible.join(",")}, BYMONTH=${months.join(",")}), so the rule gives no dates.`;
    }
  }
  if (opts.until) {
    const until = opts.until.toISOString().slice(0, 10);
    if (until < anchor)
      return `UNTIL ${formatDay(until)} is before the first day ${formatDay(anchor)}, so the rule gives no dates.`;
  }
  if (opts.count === 0) return "COUNT=0 asks for no dates at all.";
  return "The rule gives no dates in the three years from its first day: check BYMONTH, BYMONTHDAY, BYDAY and UNTIL together.";
}

/** For zod refinements: the engine's message for a rule it cannot read, or null. */
export function rruleProblem(rule: string): string | null {
  try {
    parseRecurrence(normalizeRrule(rule));
    return null;
  } catch (e) {
    if (e instanceof EngineInputError) return e.message.replace(/^recurrence:?\s*/, "");
    return "This is not an RRULE we can read.";
  }
}
