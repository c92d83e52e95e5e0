import { z } from "zod";
import { monthSchema, monthsQuerySchema } from "@/lib/balance/range";

/** GET …/balance query: from=YYYY-MM, months=3–24, format=json|csv (each optional). */
export const balanceQuerySchema = z.object({
  from: monthSchema.optional(),
  months: monthsQuerySchema.optional(),
  format: z.enum(["json", "csv"]).optional(),
});

/** The query string as an object, each parameter once (a repeated one is refused by name). */
export function queryObject(url: string): Record<string, string | string[]> {
  const out: Record<string, string | string[]> = {};
  for (const [key, value] of new URL(url).searchParams) {
    const seen = out[key];
    out[key] = seen === undefined ? value : [...(Array.isArray(seen) ? seen : [seen]), value];
  }
  return out;
}
