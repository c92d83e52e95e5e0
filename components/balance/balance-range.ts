import { z } from "zod";
import { addMonths } from "@/lib/garden-today";

// The Balance's range lives in the URL (?from=YYYY-MM&months=N) so a view can be linked.
export const MONTHS_MIN = 3;
export const MONTHS_MAX = 24;
export const MONTHS_DEFAULT = 12;
/** By default the range opens four months back, so the season just logged sits beside what is ahead. */
const DEFAULT_MONTHS_BACK = 4;

const rangeSchema = z.object({
  from: z.string().regex(/^\d{4}-(0[1-9]|1[0-2])$/),
  months: z.coerce.number().int().min(MONTHS_MIN).max(MONTHS_MAX),
});

export interface BalanceRangeValue {
  from: string;
  months: number;
}

/** Reads the search params; anything missing or malformed falls back to the default range. */
export function parseBalanceRange(
  params: { from?: string | string[]; months?: string | string[] },
  today: string,
): BalanceRangeValue {
  const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);
  const fallback = {
    from: addMonths(today.slice(0, 7), -DEFAULT_MONTHS_BACK),
    months: MONTHS_DEFAULT,
  };
  const from = rangeSchema.shape.from.safeParse(first(params.from));
  const months = rangeSchema.shape.months.safeParse(first(params.months));
  return {
    from: from.success ? from.data : fallback.from,
    months: months.success ? months.data : fallback.months,
  };
}
