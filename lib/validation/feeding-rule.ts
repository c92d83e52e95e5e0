import { z } from "zod";
import { normalizeRrule } from "@/lib/plantings/recurrence";
import { ruleSchema } from "@/lib/validation/scenario-rule";

// A feeding rule as a planting or crop carries it: material × method × basis ×
// amount (in the grower's units, { value, unit, per? }) × recurrence (RRULE).
// The same rule shape as the scenario file (lib/validation/scenario-rule.ts),
// with the RRULE upper-cased first: RFC 5545 names are case-insensitive.

export const feedingRuleSchema = z.preprocess((value) => {
  if (value && typeof value === "object" && "recurrence" in value) {
    const r = (value as { recurrence: unknown }).recurrence;
    if (typeof r === "string") return { ...value, recurrence: normalizeRrule(r) };
  }
  return value;
}, ruleSchema);

export type FeedingRuleBody = z.infer<typeof feedingRuleSchema>;
