import { z } from "zod";
import { normalizeRrule, whyNoDates } from "@/lib/plantings/recurrence";
import { ruleSchema } from "@/lib/validation/scenario-rule";

// A feeding rule as a planting or crop carries it: material × method × basis ×
// amount (in the grower's units, { value, unit, per? }) × recurrence (RRULE).
// The same rule shape as the scenario file (lib/validation/scenario-rule.ts),
// with the RRULE upper-cased first: RFC 5545 names are case-insensitive.

export const feedingRuleSchema = z
  .preprocess((value) => {
    if (value && typeof value === "object" && "recurrence" in value) {
      const r = (value as { recurrence: unknown }).recurrence;
      if (typeof r === "string") return { ...value, recurrence: normalizeRrule(r) };
    }
    return value;
  }, ruleSchema)
  .superRefine((rule, ctx) => {
    const why = recurrenceWithoutDates(rule.recurrence, RULE_CHECK_ANCHOR);
    if (why) ctx.addIssue({ code: "custom", path: ["recurrence"], message: why });
  });

/**
 * A rule on its own (a crop's) has no first day yet: checked from this one, so a
 * day no month in BYMONTH has (BYMONTHDAY=31 in June) is caught anywhere. A
 * planting checks its rule again from its own planting day (an UNTIL before it).
 */
const RULE_CHECK_ANCHOR = "2000-01-01";

/** Why the rule gives no dates from `anchor` (lib/plantings/recurrence.ts explains), or null. */
export function recurrenceWithoutDates(recurrence: string, anchor: string): string | null {
  try {
    return whyNoDates(recurrence, anchor);
  } catch {
    return null; // unreadable: the RRULE check itself names that
  }
}

export type FeedingRuleBody = z.infer<typeof feedingRuleSchema>;
