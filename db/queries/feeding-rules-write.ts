import "server-only";
import { and, asc, eq, inArray, or } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { feedingRules } from "@/db/schema";
import type { FeedingRuleInput } from "@/lib/engine";

// Rules belong to one crop or one planting (rules travel inside them), several
// per owner in `position` order; these are the only readers and writers of
// feeding_rules for beds, crops and plantings. A rule goes with its owner
// (composite foreign key, on delete cascade).

type RuleRow = typeof feedingRules.$inferSelect;
export type RuleOwner = { plantingId: string } | { cropId: string };

export function ruleFromRow(r: RuleRow): FeedingRuleInput {
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

/** Rows grouped by owner (planting or crop id) in position order; an owner with no rules gives undefined. */
export function rulesByOwner(rows: RuleRow[]): (ownerId: string) => FeedingRuleInput[] | undefined {
  const byOwner = new Map<string, FeedingRuleInput[]>();
  for (const r of [...rows].sort((a, b) => a.position - b.position)) {
    const owner = r.plantingId ?? r.cropId!;
    const list = byOwner.get(owner) ?? [];
    list.push(ruleFromRow(r));
    byOwner.set(owner, list);
  }
  return (ownerId) => byOwner.get(ownerId);
}

/** The rules of these plantings or crops, in one query. */
export async function readRules(
  tx: DbOrTx,
  gardenId: string,
  owners: { plantingIds?: string[]; cropIds?: string[] },
): Promise<(ownerId: string) => FeedingRuleInput[] | undefined> {
  const plantingIds = owners.plantingIds ?? [];
  const cropIds = owners.cropIds ?? [];
  if (!plantingIds.length && !cropIds.length) return () => undefined;
  const rows = await tx
    .select()
    .from(feedingRules)
    .where(
      and(
        eq(feedingRules.gardenId, gardenId),
        or(
          plantingIds.length ? inArray(feedingRules.plantingId, plantingIds) : undefined,
          cropIds.length ? inArray(feedingRules.cropId, cropIds) : undefined,
        ),
      ),
    )
    .orderBy(asc(feedingRules.position));
  return rulesByOwner(rows);
}

/** Rows for an owner's rules, positions 0, 1, … in the order given. */
export function ruleRows(
  gardenId: string,
  owner: RuleOwner,
  rules: readonly FeedingRuleInput[],
): (typeof feedingRules.$inferInsert)[] {
  return rules.map((rule, position) => ({
    gardenId,
    ...owner,
    position,
    material: rule.material,
    method: rule.method,
    basis: rule.basis,
    amountMeasure: rule.measure,
    amountSi: rule.amount,
    rrule: rule.recurrence,
    dilutionWaterParts: rule.dilutionWaterParts,
    teaCastingsPerWater: rule.teaCastingsPerWater,
  }));
}

/**
 * Sets an owner's rules: undefined leaves them, [] removes them (a planting
 * then inherits its crop's, a crop has the feeder-class default), a list
 * replaces them in its order. Runs in the caller's transaction.
 */
export async function replaceRules(
  tx: DbOrTx,
  gardenId: string,
  owner: RuleOwner,
  rules: readonly FeedingRuleInput[] | undefined,
): Promise<void> {
  if (rules === undefined) return;
  await tx
    .delete(feedingRules)
    .where(
      and(
        eq(feedingRules.gardenId, gardenId),
        "plantingId" in owner
          ? eq(feedingRules.plantingId, owner.plantingId)
          : eq(feedingRules.cropId, owner.cropId),
      ),
    );
  if (rules.length) await tx.insert(feedingRules).values(ruleRows(gardenId, owner, rules));
}
