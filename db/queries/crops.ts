import "server-only";
import { and, count, eq, isNull, or } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { crops, plantings } from "@/db/schema";
import type { FeederClass, FeedingRuleInput } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { cropFacts, effectiveRules, type RuleSource } from "@/lib/plantings/rules";
import { ruleInput } from "@/lib/scenario/to-inputs";
import type { CreateCropInput, UpdateCropInput } from "@/lib/validation/crop";
import { ownRulesChange } from "@/lib/validation/feeding-rule";
import { readRules, replaceRules } from "./feeding-rules-write";
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
  /** The crop's own rules, in order, which its plantings inherit; [] = the feeder-class default. */
  rules: FeedingRuleInput[];
  effectiveRules: FeedingRuleInput[];
  ruleSource: Exclude<RuleSource, "planting">;
  /** For the one-rule form until it edits `rules`: rules[0] ?? null, and effectiveRules[0]. */
  rule: FeedingRuleInput | null;
  effectiveRule: FeedingRuleInput;
  spacingM: number | null;
  daysToHarvest: number | null;
  /** Kept for the plantings that use it; no longer offered for new ones. */
  archivedOn: string | null;
}

type CropRow = typeof crops.$inferSelect;

type RulesOf = (cropId: string) => FeedingRuleInput[] | undefined;

/** Rules of these crops; starter crops (no garden) hold none. */
const rulesOfCrops = (tx: DbOrTx, gardenId: string, rows: CropRow[]) =>
  readRules(tx, gardenId, { cropIds: rows.filter((c) => c.gardenId !== null).map((c) => c.id) });

function toDto(row: CropRow, rulesOf: RulesOf): CropDto {
  const own = rulesOf(row.id) ?? [];
  const eff = effectiveRules([], own, row.feederClass);
  return {
    id: row.id,
    name: row.name ?? "(unnamed crop)",
    feederClass: row.feederClass,
    edible: row.edible,
    edibleTouchesSoil: row.edibleTouchesSoil,
    starter: row.gardenId === null,
    rules: own,
    effectiveRules: eff.rules,
    ruleSource: eff.source === "crop" ? "crop" : "default",
    rule: own[0] ?? null,
    effectiveRule: eff.rules[0]!,
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
  const rulesOf = await rulesOfCrops(db, gardenId, page);
  return { crops: page.map((c) => toDto(c, rulesOf)), total: all.length };
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
  return toDto(row, await rulesOfCrops(db, gardenId, [row]));
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
        })
        .returning();
      await replaceRules(tx, gardenId, { cropId: row!.id }, ownRulesChange(input)?.map(ruleInput));
      return toDto(row!, await rulesOfCrops(tx, gardenId, [row!]));
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
      await replaceRules(tx, gardenId, { cropId: row.id }, ownRulesChange(input)?.map(ruleInput));
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
        })
        .where(and(eq(crops.gardenId, gardenId), eq(crops.id, row.id)))
        .returning();
      return toDto(updated!, await rulesOfCrops(tx, gardenId, [updated!]));
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
      return { removed: true as const }; // its rules go with it (on delete cascade)
    }),
  );
}
