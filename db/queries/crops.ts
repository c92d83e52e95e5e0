import "server-only";
import { and, count, eq, inArray, isNull, or } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { crops, feedingRules, plantings } from "@/db/schema";
import type { FeederClass, FeedingRuleInput } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { cropFacts, effectiveRule, type RuleSource } from "@/lib/plantings/rules";
import { ruleInput } from "@/lib/scenario/to-inputs";
import type { CreateCropInput, UpdateCropInput } from "@/lib/validation/crop";
import { dropRule, ruleFromRow, writeRule } from "./feeding-rules-write";
import { thenInvalidatePlan } from "./plan-invalidation";
import { gardenToday } from "./plantings";
import { si } from "@/lib/validation/scenario-quantity";

// A garden sees its own crops and the shared starter list, minus the starter
// crops it has its own copy of (same name). Plantings always point at the
// garden's own crop: a starter crop is copied in when first planted or changed.

export interface CropDto {
  id: string;
  name: string;
  feederClass: FeederClass;
  edible: boolean;
  edibleTouchesSoil: boolean;
  /** true for the shared list (not yet this garden's own copy). */
  starter: boolean;
  /** The crop's own rule; null = the feeder-class default. */
  rule: FeedingRuleInput | null;
  effectiveRule: FeedingRuleInput;
  ruleSource: Exclude<RuleSource, "planting">;
  spacingM: number | null;
  daysToHarvest: number | null;
  /** Kept for the plantings that use it; no longer offered for new ones. */
  archivedOn: string | null;
}

type CropRow = typeof crops.$inferSelect;

async function rulesById(tx: DbOrTx, gardenId: string, ids: (string | null)[]) {
  const wanted = ids.filter((id): id is string => id !== null);
  if (!wanted.length) return new Map<string, FeedingRuleInput>();
  const rows = await tx
    .select()
    .from(feedingRules)
    .where(and(eq(feedingRules.gardenId, gardenId), inArray(feedingRules.id, wanted)));
  return new Map(rows.map((r) => [r.id, ruleFromRow(r)]));
}

function toDto(row: CropRow, rules: Map<string, FeedingRuleInput>): CropDto {
  const own = row.feedingRuleId ? (rules.get(row.feedingRuleId) ?? null) : null;
  const eff = effectiveRule(null, own, row.feederClass);
  return {
    id: row.id,
    name: row.name ?? "(unnamed crop)",
    feederClass: row.feederClass,
    edible: row.edible,
    edibleTouchesSoil: row.edibleTouchesSoil,
    starter: row.gardenId === null,
    rule: own,
    effectiveRule: eff.rule,
    ruleSource: eff.source === "crop" ? "crop" : "default",
    ...cropFacts(row),
    archivedOn: row.archivedOn,
  };
}

/** Every crop the garden can plant: its own (not archived), then starter crops it has no copy of. */
export async function listVisibleCrops(tx: DbOrTx, gardenId: string): Promise<CropRow[]> {
  const rows = await tx
    .select()
    .from(crops)
    .where(or(eq(crops.gardenId, gardenId), isNull(crops.gardenId)));
  const own = new Set(
    rows.filter((c) => c.gardenId !== null && c.name).map((c) => c.name!.toLowerCase()),
  );
  return rows
    .filter((c) => c.archivedOn === null)
    .filter((c) => c.gardenId !== null || !own.has(c.name!.toLowerCase()))
    .sort((a, b) => (a.name ?? "").localeCompare(b.name ?? "") || a.id.localeCompare(b.id));
}

export async function listCrops({
  gardenId,
  query,
}: {
  gardenId: string;
  query: { q?: string; feederClass?: FeederClass; limit: number; offset: number };
}): Promise<{ crops: CropDto[]; total: number }> {
  const db = await getDb();
  const q = query.q?.toLowerCase();
  const all = (await listVisibleCrops(db, gardenId)).filter(
    (c) =>
      (!q || (c.name ?? "").toLowerCase().includes(q)) &&
      (!query.feederClass || c.feederClass === query.feederClass),
  );
  const page = all.slice(query.offset, query.offset + query.limit);
  const rules = await rulesById(
    db,
    gardenId,
    page.map((c) => c.feedingRuleId),
  );
  return { crops: page.map((c) => toDto(c, rules)), total: all.length };
}

async function findVisibleCrop(tx: DbOrTx, gardenId: string, cropId: string) {
  const [row] = await tx
    .select()
    .from(crops)
    .where(and(eq(crops.id, cropId), or(eq(crops.gardenId, gardenId), isNull(crops.gardenId))))
    .limit(1);
  return row ?? null;
}

export async function getCropById({ gardenId, cropId }: { gardenId: string; cropId: string }) {
  const db = await getDb();
  const row = await findVisibleCrop(db, gardenId, cropId);
  if (!row) return null;
  return toDto(row, await rulesById(db, gardenId, [row.feedingRuleId]));
}

async function ownCropNamed(tx: DbOrTx, gardenId: string, name: string) {
  const rows = await tx.select().from(crops).where(eq(crops.gardenId, gardenId));
  return rows.find((c) => c.name?.toLowerCase() === name.toLowerCase()) ?? null;
}

/**
 * The garden's own crop for `cropId`: itself, or the garden's copy of a
 * starter crop (made now if there is none). null when the id is neither
 * (another garden's crop, or no crop at all).
 */
export async function adoptCrop(
  tx: DbOrTx,
  gardenId: string,
  cropId: string,
): Promise<CropRow | null> {
  const row = await findVisibleCrop(tx, gardenId, cropId);
  if (!row) return null;
  if (row.gardenId !== null) return row;
  const existing = await ownCropNamed(tx, gardenId, row.name!);
  if (existing) return existing;
  const [copy] = await tx
    .insert(crops)
    .values({
      gardenId,
      name: row.name,
      feederClass: row.feederClass,
      edible: row.edible,
      edibleTouchesSoil: row.edibleTouchesSoil,
      ...cropFacts(row),
    })
    .returning();
  return copy!;
}

const nameTaken = (name: string) =>
  new AppError("validation:crop_name", `You already have a crop called ${name}.`, {
    name: `You already have a crop called ${name}; change that one instead.`,
  });

export async function createCrop({
  gardenId,
  input,
}: {
  gardenId: string;
  input: CreateCropInput;
}) {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      if (await ownCropNamed(tx, gardenId, input.name)) throw nameTaken(input.name);
      const ruleId = await writeRule(tx, gardenId, null, input.rule ? ruleInput(input.rule) : null);
      const [row] = await tx
        .insert(crops)
        .values({
          gardenId,
          name: input.name,
          feederClass: input.feederClass,
          edible: input.edible,
          edibleTouchesSoil: input.edible ? input.edibleTouchesSoil : false,
          daysToHarvest: input.daysToHarvest ?? null,
          spacingM: input.spacing ? si(input.spacing) : null,
          feedingRuleId: ruleId,
        })
        .returning();
      return toDto(row!, await rulesById(tx, gardenId, [ruleId]));
    }),
  );
}

/** Changes a crop for this garden; a starter crop is copied into the garden first. */
export async function updateCrop({
  gardenId,
  cropId,
  input,
}: {
  gardenId: string;
  cropId: string;
  input: UpdateCropInput;
}): Promise<CropDto | null> {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const row = await adoptCrop(tx, gardenId, cropId);
      if (!row) return null;
      if (input.name && input.name.toLowerCase() !== row.name?.toLowerCase()) {
        if (await ownCropNamed(tx, gardenId, input.name)) throw nameTaken(input.name);
      }
      const next =
        input.rule === undefined ? undefined : input.rule === null ? null : ruleInput(input.rule);
      const ruleId = await writeRule(tx, gardenId, row.feedingRuleId, next);
      const edible = input.edible ?? row.edible;
      const [updated] = await tx
        .update(crops)
        .set({
          name: input.name ?? row.name,
          feederClass: input.feederClass ?? row.feederClass,
          edible,
          edibleTouchesSoil: edible ? (input.edibleTouchesSoil ?? row.edibleTouchesSoil) : false,
          daysToHarvest:
            input.daysToHarvest === undefined ? row.daysToHarvest : input.daysToHarvest,
          spacingM:
            input.spacing === undefined ? row.spacingM : input.spacing ? si(input.spacing) : null,
          feedingRuleId: ruleId,
        })
        .where(and(eq(crops.gardenId, gardenId), eq(crops.id, row.id)))
        .returning();
      if (next === null) await dropRule(tx, gardenId, row.feedingRuleId);
      return toDto(updated!, await rulesById(tx, gardenId, [ruleId]));
    }),
  );
}

/** Removes a garden's own crop no planting uses; archives one in use. Starter crops are shared: 409. */
export async function removeCrop({
  gardenId,
  cropId,
}: {
  gardenId: string;
  cropId: string;
}): Promise<{ removed: true } | { archivedOn: string }> {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const row = await findVisibleCrop(tx, gardenId, cropId);
      if (!row) throw new AppError("not_found:crop");
      if (row.gardenId === null)
        throw new AppError("conflict:starter_crop", "Crops on the shared list cannot be removed.");
      const [{ used } = { used: 0 }] = await tx
        .select({ used: count() })
        .from(plantings)
        .where(and(eq(plantings.gardenId, gardenId), eq(plantings.cropId, cropId)));
      if (used > 0) {
        // Plantings still point at it: archive, so it leaves the list and their history stays whole.
        if (row.archivedOn)
          throw new AppError("conflict:crop_archived", "This crop is already archived.");
        const today = await gardenToday(tx, gardenId);
        await tx
          .update(crops)
          .set({ archivedOn: today })
          .where(and(eq(crops.gardenId, gardenId), eq(crops.id, cropId)));
        return { archivedOn: today };
      }
      await tx.delete(crops).where(and(eq(crops.gardenId, gardenId), eq(crops.id, cropId)));
      await dropRule(tx, gardenId, row.feedingRuleId);
      return { removed: true as const };
    }),
  );
}
