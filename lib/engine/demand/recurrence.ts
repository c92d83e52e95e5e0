import { Frequency, RRule, type Options } from "rrule";
import {
  fromDayNumber,
  rangeDays,
  toDayNumber,
  utcDateToIso,
  type DateRange,
} from "@/lib/engine/core/dates";
import { EngineInputError } from "@/lib/engine/core/errors";
import type { IsoDate } from "@/lib/engine/core/types";

// RRULE strings are expanded as floating all-day dates: every date handed to the
// rrule library is midnight UTC of the calendar day, and results are read back
// from their UTC fields. A TZID in the string is dropped on purpose (the
// calendar day is what matters to a grower), and UNTIL counts by its calendar
// day, inclusive.

const MS_PER_DAY = 86_400_000;
const MAX_CACHE = 20_000;
/** Beyond this many dates in one expansion the rule is almost surely a mistake. */
export const MAX_OCCURRENCES = 5_000;

type ParsedRule = Partial<Options>;
const parsedCache = new Map<string, ParsedRule>();
const expandedCache = new Map<string, readonly IsoDate[]>();

function remember<V>(cache: Map<string, V>, key: string, value: V): V {
  // Crude bound: clearing beats unbounded growth in a long-lived server.
  if (cache.size >= MAX_CACHE) cache.clear();
  cache.set(key, value);
  return value;
}

const INT_LIST_FIELDS = ["bymonth", "bymonthday", "byyearday", "byweekno", "bysetpos"] as const;

function checkIntegers(value: unknown, name: string, field: string): void {
  const list = Array.isArray(value) ? value : [value];
  for (const v of list) {
    if (typeof v !== "number" || !Number.isInteger(v)) {
      throw new EngineInputError(
        field,
        `${name.toUpperCase()} must be whole numbers (got ${String(v)})`,
      );
    }
  }
}

/** Parse and check an RRULE string once; later calls with the same string reuse it. */
export function parseRecurrence(rule: unknown, field = "recurrence"): ParsedRule {
  if (typeof rule !== "string" || rule.trim() === "") {
    throw new EngineInputError(field, "must be an RRULE such as FREQ=MONTHLY (RFC 5545)");
  }
  const key = rule.trim();
  const hit = parsedCache.get(key);
  if (hit) return hit;
  let opts: ParsedRule;
  try {
    opts = RRule.parseString(key);
  } catch (e) {
    throw new EngineInputError(field, `is not a valid RRULE: ${(e as Error).message}`);
  }
  if (opts.freq === undefined || opts.freq === null) {
    throw new EngineInputError(field, "is not a valid RRULE: FREQ is missing or unknown");
  }
  if (opts.freq > Frequency.DAILY) {
    throw new EngineInputError(field, "must repeat daily or less often (feedings are whole days)");
  }
  if (opts.byhour != null || opts.byminute != null || opts.bysecond != null) {
    throw new EngineInputError(
      field,
      "BYHOUR/BYMINUTE/BYSECOND have no meaning for all-day feedings",
    );
  }
  if (opts.count != null) checkIntegers(opts.count, "count", field);
  if (opts.interval != null) {
    checkIntegers(opts.interval, "interval", field);
    if ((opts.interval as number) < 1)
      throw new EngineInputError(field, "INTERVAL must be at least 1");
  }
  for (const name of INT_LIST_FIELDS) {
    if (opts[name] != null) checkIntegers(opts[name], name, field);
  }
  const days = opts.byweekday;
  if (days != null && (Array.isArray(days) ? days : [days]).some((d) => d == null)) {
    throw new EngineInputError(field, "BYDAY has an unknown weekday");
  }
  const clean: ParsedRule = { ...opts, tzid: null };
  if (opts.until) clean.until = new Date(toDayNumber(utcDateToIso(opts.until), field) * MS_PER_DAY);
  if (opts.dtstart)
    clean.dtstart = new Date(toDayNumber(utcDateToIso(opts.dtstart), field) * MS_PER_DAY);
  return remember(parsedCache, key, clean);
}

/** true when the rule itself ends (COUNT or UNTIL); otherwise the caller's range bounds it. */
export function isBoundedRule(rule: string, field = "recurrence"): boolean {
  const opts = parseRecurrence(rule, field);
  return opts.count != null || opts.until != null;
}

export interface ExpandOptions {
  /** Anchor of the series (e.g. the planting's first day); a DTSTART inside the rule wins. */
  anchor: IsoDate;
  /** Field name for errors, e.g. "plantings[3].rule.recurrence". */
  field?: string;
}

/**
 * All calendar days of `rule` within `range` (inclusive), in order, without
 * duplicates. The result is cached and frozen: callers must not mutate it.
 */
export function expandRecurrence(
  rule: string,
  range: DateRange,
  options: ExpandOptions,
): readonly IsoDate[] {
  const field = options.field ?? "recurrence";
  const opts = parseRecurrence(rule, field);
  const anchorDay = opts.dtstart
    ? Math.round(opts.dtstart.getTime() / MS_PER_DAY)
    : toDayNumber(options.anchor, `${field}.anchor`);
  const { from, to } = rangeDays(range, `${field}.range`);
  const key = `${rule.trim()}|${anchorDay}|${from}|${to}`;
  const hit = expandedCache.get(key);
  if (hit) return hit;

  let out: IsoDate[] = [];
  if (to >= anchorDay) {
    const rr = new RRule({ ...opts, dtstart: new Date(anchorDay * MS_PER_DAY) });
    const dates = rr.between(
      new Date(from * MS_PER_DAY),
      new Date(to * MS_PER_DAY),
      true,
      (_d, i) => {
        if (i >= MAX_OCCURRENCES) {
          throw new EngineInputError(
            field,
            `gives more than ${MAX_OCCURRENCES} dates in the range`,
          );
        }
        return true;
      },
    );
    let last = Number.NEGATIVE_INFINITY;
    for (const d of dates) {
      const day = Math.floor(d.getTime() / MS_PER_DAY);
      if (day > last && day >= from && day <= to) {
        out.push(fromDayNumber(day));
        last = day;
      }
    }
  }
  out = Object.freeze(out) as IsoDate[];
  return remember(expandedCache, key, out);
}
