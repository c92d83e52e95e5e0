import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { feedingRules } from "@/db/schema";
import type { FeedingRuleInput } from "@/lib/engine";

// Rules belong to a crop or a planting (rules travel inside them); these are
// the only writers of feeding_rules for beds, crops and plantings.

export function ruleFromRow(r: typeof feedingRules.$inferSelect): FeedingRuleInput {
  return {
    material: r.material,
    method: r.method,
    basis: r.basis,
    measure: r.amountMeasure,
    amount: r.amountSi,
    recurrence: r.rrule,
    dilutionWaterParts: r.dilutionWaterParts,
    teaCastingsPerWater: r.teaCastingsPerWater,
  };
}

function columns(rule: FeedingRuleInput) {
  return {
    material: rule.material,
    method: rule.method,
    basis: rule.basis,
    amountMeasure: rule.measure,
    amountSi: rule.amount,
    rrule: rule.recurrence,
    dilutionWaterParts: rule.dilutionWaterParts,
    teaCastingsPerWater: rule.teaCastingsPerWater,
  };
}

/**
 * Sets an owner's rule: undefined leaves it, null removes it, a rule replaces
 * it (in place when there is one). Returns the rule id the owner should hold.
 */
export async function writeRule(
  tx: DbOrTx,
  gardenId: string,
  currentId: string | null,
  next: FeedingRuleInput | null | undefined,
): Promise<string | null> {
  if (next === undefined) return currentId;
  if (next === null) return null; // the caller clears its reference, then calls dropRule
  if (currentId) {
    await tx
      .update(feedingRules)
      .set(columns(next))
      .where(and(eq(feedingRules.gardenId, gardenId), eq(feedingRules.id, currentId)));
    return currentId;
  }
  const [row] = await tx
    .insert(feedingRules)
    .values({ gardenId, ...columns(next) })
    .returning({ id: feedingRules.id });
  return row!.id;
}

export async function dropRule(tx: DbOrTx, gardenId: string, ruleId: string | null): Promise<void> {
  if (!ruleId) return;
  await tx
    .delete(feedingRules)
    .where(and(eq(feedingRules.gardenId, gardenId), eq(feedingRules.id, ruleId)));
}
