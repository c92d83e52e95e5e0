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

/** More rules than this on one planting or crop is a slip. */
export const MAX_RULES = 10;

/**
 * A planting's or crop's own rules as a request sends them: `rules` (in order;
 * [] = none of its own), or the single `rule` the one-rule form sends (a rule =
 * `rules: [rule]`, null = none). Not both.
 */
export const ownRulesFields = {
  rule: feedingRuleSchema.nullish(),
  rules: z.array(feedingRuleSchema).max(MAX_RULES, `At most ${MAX_RULES} rules.`).optional(),
};

type OwnRulesBody = { rule?: FeedingRuleBody | null; rules?: FeedingRuleBody[] };

export function checkOwnRules(body: OwnRulesBody, ctx: z.RefinementCtx): void {
  if (body.rules !== undefined && body.rule !== undefined)
    ctx.addIssue({
      code: "custom",
      path: ["rules"],
      message: "Send either rule or rules, not both.",
    });
}

/** undefined: leave the rules as they are; []: none of its own; a list: replaces them. */
export function ownRulesChange(body: OwnRulesBody): FeedingRuleBody[] | undefined {
  if (body.rules !== undefined) return body.rules;
  if (body.rule === undefined) return undefined;
  return body.rule === null ? [] : [body.rule];
}
