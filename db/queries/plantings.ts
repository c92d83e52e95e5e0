import "server-only";
import { and, asc, count, eq, gte, inArray, isNotNull, isNull, or } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { applications, beds, crops, feedingRules, gardens, plantings } from "@/db/schema";
import type { FeederClass, FeedingRuleInput } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import {
  CROWDED_REFUSE_RATIO,
  cropFacts,
  crowding,
  effectiveRule,
  type RuleSource,
} from "@/lib/plantings/rules";
import { expectedEnd } from "@/lib/plantings/expected-end";
import { ruleInput } from "@/lib/scenario/to-inputs";
import {
  PRIORITY_RANK,
  priorityFromRank,
  type CreatePlantingInput,
  type Priority,
} from "@/lib/validation/planting";
import { si } from "@/lib/validation/scenario-quantity";
import { adoptCrop } from "./crops";
import { dropRule, ruleFromRow, writeRule } from "./feeding-rules-write";
import { thenInvalidatePlan } from "./plan-invalidation";

export interface PlantingDto {
  id: string;
  bedId: string;
  bedName: string;
  cropId: string;
  cropName: string;
  feederClass: FeederClass;
  plantCount: number;
  areaM2: number | null;
  plantedOn: string;
  expectedHarvestOn: string | null;
  endedOn: string | null;
  priority: Priority;
  /** The planting's own override; null = inherits. */
  rule: FeedingRuleInput | null;
  effectiveRule: FeedingRuleInput;
  ruleSource: RuleSource;
  notes: string | null;
  archivedOn: string | null;
}

export interface PlantingWarning {
  field: string;
  message: string;
}

async function toDtos(tx: DbOrTx, gardenId: string, rows: (typeof plantings.$inferSelect)[]) {
  if (!rows.length) return [];
  const cropRows = await tx
    .select()
    .from(crops)
    .where(
      and(eq(crops.gardenId, gardenId), inArray(crops.id, [...new Set(rows.map((r) => r.cropId))])),
    );
  const bedRows = await tx
    .select({ id: beds.id, name: beds.name })
    .from(beds)
    .where(
      and(eq(beds.gardenId, gardenId), inArray(beds.id, [...new Set(rows.map((r) => r.bedId))])),
    );
  const ruleIds = [
    ...rows.map((r) => r.feedingRuleId),
    ...cropRows.map((c) => c.feedingRuleId),
  ].filter((id): id is string => id !== null);
  const ruleRows = ruleIds.length
    ? await tx
        .select()
        .from(feedingRules)
        .where(and(eq(feedingRules.gardenId, gardenId), inArray(feedingRules.id, ruleIds)))
    : [];
  const rule = new Map(ruleRows.map((r) => [r.id, ruleFromRow(r)]));
  const crop = new Map(cropRows.map((c) => [c.id, c]));
  const bedName = new Map(bedRows.map((b) => [b.id, b.name]));
  return rows.map((p): PlantingDto => {
    const c = crop.get(p.cropId)!;
    const own = p.feedingRuleId ? (rule.get(p.feedingRuleId) ?? null) : null;
    const cropRule = c.feedingRuleId ? (rule.get(c.feedingRuleId) ?? null) : null;
    const eff = effectiveRule(own, cropRule, c.feederClass);
    return {
      id: p.id,
      bedId: p.bedId,
      bedName: bedName.get(p.bedId) ?? "",
      cropId: p.cropId,
      cropName: c.name ?? "(unnamed crop)",
      feederClass: c.feederClass,
      plantCount: p.plantCount,
      areaM2: p.areaM2,
      plantedOn: p.plantedOn,
      expectedHarvestOn: p.expectedHarvestOn,
      endedOn: p.endedOn,
      priority: priorityFromRank(p.priority),
      rule: own,
      effectiveRule: eff.rule,
      ruleSource: eff.source,
      notes: p.notes,
      archivedOn: p.archivedOn,
    };
  });
}

/** Today in the garden's time zone, as a floating date. */
export async function gardenToday(tx: DbOrTx, gardenId: string): Promise<string> {
  const [g] = await tx
    .select({ tz: gardens.timeZone })
    .from(gardens)
    .where(eq(gardens.id, gardenId));
  return new Intl.DateTimeFormat("en-CA", { timeZone: g?.tz ?? "UTC" }).format(new Date());
}

export async function listPlantings({
  gardenId,
  query,
}: {
  gardenId: string;
  query: {
    bedId?: string;
    cropId?: string;
    active?: boolean;
    archived?: boolean;
    limit: number;
    offset: number;
  };
}): Promise<{ plantings: PlantingDto[]; total: number }> {
  const db = await getDb();
  const today = query.active === undefined ? null : await gardenToday(db, gardenId);
  const where = and(
    eq(plantings.gardenId, gardenId),
    query.archived ? isNotNull(plantings.archivedOn) : isNull(plantings.archivedOn),
    query.bedId ? eq(plantings.bedId, query.bedId) : undefined,
    query.cropId ? eq(plantings.cropId, query.cropId) : undefined,
    query.active === true
      ? or(isNull(plantings.endedOn), gte(plantings.endedOn, today!))
      : undefined,
  );
  let rows = await db
    .select()
    .from(plantings)
    .where(where)
    .orderBy(asc(plantings.plantedOn), asc(plantings.id))
    .limit(query.limit)
    .offset(query.offset);
  if (query.active === false) rows = rows.filter((r) => r.endedOn !== null && r.endedOn < today!);
  const [{ total } = { total: 0 }] = await db
    .select({ total: count() })
    .from(plantings)
    .where(where);
  return { plantings: await toDtos(db, gardenId, rows), total };
}

export async function getPlantingById({
  gardenId,
  plantingId,
  tx,
}: {
  gardenId: string;
  plantingId: string;
  tx?: DbOrTx;
}): Promise<PlantingDto | null> {
  const db = tx ?? (await getDb());
  const rows = await db
    .select()
    .from(plantings)
    .where(and(eq(plantings.gardenId, gardenId), eq(plantings.id, plantingId)))
    .limit(1);
  return (await toDtos(db, gardenId, rows))[0] ?? null;
}

const fieldError = (field: string, message: string) =>
  new AppError("validation", `Please check: ${field}.`, { [field]: message });

/**
 * Writes new plantings in one transaction (quick entry writes several). Each
 * gets the garden's own copy of its crop and, unless given, an expected
 * harvest from the crop's days to harvest (outdoors: not past the first fall frost). Plantings far beyond their crops'
 * spacing are refused unless confirmed; merely full beds come back as warnings.
 */
export async function createPlantings({
  gardenId,
  inputs,
  countField = "plantCount",
}: {
  gardenId: string;
  inputs: CreatePlantingInput[];
  /** Which request field a crowding problem is reported on ("quick" for quick entry). */
  countField?: string;
}): Promise<{ plantings: PlantingDto[]; warnings: PlantingWarning[] }> {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const warnings: PlantingWarning[] = [];
      const rows: (typeof plantings.$inferSelect)[] = [];
      const byBed = new Map<string, { count: number; spacingM: number | null }[]>();
      const [garden] = await tx
        .select({ firstFallFrost: gardens.firstFallFrost })
        .from(gardens)
        .where(eq(gardens.id, gardenId));
      for (const input of inputs) {
        const [bed] = await tx
          .select({
            id: beds.id,
            kind: beds.kind,
            indoors: beds.indoors,
            lengthM: beds.lengthM,
            widthM: beds.widthM,
          })
          .from(beds)
          .where(and(eq(beds.gardenId, gardenId), eq(beds.id, input.bedId)));
        if (!bed) throw fieldError("bedId", "No such bed or container in this garden.");
        const crop = await adoptCrop(tx, gardenId, input.cropId);
        if (!crop) throw fieldError("cropId", "No such crop in this garden.");
        const facts = cropFacts(crop);
        if (bed.kind === "bed") {
          const list = byBed.get(bed.id) ?? [];
          list.push({ count: input.plantCount, spacingM: facts.spacingM });
          byBed.set(bed.id, list);
          const ratio = crowding(input.area ? si(input.area) : bed.lengthM! * bed.widthM!, list);
          if (ratio !== null && ratio > CROWDED_REFUSE_RATIO && !input.confirmCrowded)
            throw fieldError(
              countField,
              `${input.plantCount.toLocaleString("en-US")} ${crop.name} need about ${Math.round(ratio)} times this bed's area at the usual spacing (common practice). Check the count, or confirm to plant them anyway.`,
            );
          if (ratio !== null && ratio > 1)
            warnings.push({
              field: countField,
              message: `${crop.name}: closer than the usual spacing.`,
            });
        }
        const ruleId = await writeRule(
          tx,
          gardenId,
          null,
          input.rule ? ruleInput(input.rule) : null,
        );
        const [row] = await tx
          .insert(plantings)
          .values({
            gardenId,
            bedId: bed.id,
            cropId: crop.id,
            plantCount: input.plantCount,
            areaM2: input.area ? si(input.area) : null,
            plantedOn: input.plantedOn,
            expectedHarvestOn:
              input.expectedHarvestOn ??
              expectedEnd({
                plantedOn: input.plantedOn,
                daysToHarvest: facts.daysToHarvest,
                indoors: bed.indoors,
                firstFallFrost: garden!.firstFallFrost,
              }),
            endedOn: input.endedOn ?? null,
            priority: PRIORITY_RANK[input.priority],
            feedingRuleId: ruleId,
            notes: input.notes ?? null,
          })
          .returning();
        rows.push(row!);
      }
      return { plantings: await toDtos(tx, gardenId, rows), warnings };
    }),
  );
}

/** Applies a checked, merged planting (the handler merges a PATCH onto the current values). */
export async function updatePlanting({
  gardenId,
  plantingId,
  input,
  ruleChange,
}: {
  gardenId: string;
  plantingId: string;
  input: CreatePlantingInput;
  /** undefined: keep the override; null: back to the crop's rule; a rule: override. */
  ruleChange: CreatePlantingInput["rule"] | undefined;
}): Promise<PlantingDto | null> {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const [current] = await tx
        .select()
        .from(plantings)
        .where(and(eq(plantings.gardenId, gardenId), eq(plantings.id, plantingId)));
      if (!current) return null;
      const [bed] = await tx
        .select({ id: beds.id })
        .from(beds)
        .where(and(eq(beds.gardenId, gardenId), eq(beds.id, input.bedId)));
      if (!bed) throw fieldError("bedId", "No such bed or container in this garden.");
      const crop = await adoptCrop(tx, gardenId, input.cropId);
      if (!crop) throw fieldError("cropId", "No such crop in this garden.");
      const next =
        ruleChange === undefined ? undefined : ruleChange === null ? null : ruleInput(ruleChange);
      const ruleId = await writeRule(tx, gardenId, current.feedingRuleId, next);
      await tx
        .update(plantings)
        .set({
          bedId: bed.id,
          cropId: crop.id,
          plantCount: input.plantCount,
          areaM2: input.area ? si(input.area) : null,
          plantedOn: input.plantedOn,
          expectedHarvestOn: input.expectedHarvestOn ?? null,
          endedOn: input.endedOn ?? null,
          priority: PRIORITY_RANK[input.priority],
          feedingRuleId: ruleId,
          notes: input.notes ?? null,
        })
        .where(and(eq(plantings.gardenId, gardenId), eq(plantings.id, plantingId)));
      if (next === null) await dropRule(tx, gardenId, current.feedingRuleId);
      return getPlantingById({ gardenId, plantingId, tx });
    }),
  );
}

/**
 * A planting with logged applications is archived and ended (kept for the
 * record, fed no more after today); one without logs is removed with its own rule.
 */
export async function removePlanting({
  gardenId,
  plantingId,
}: {
  gardenId: string;
  plantingId: string;
}): Promise<{ removed: true } | { archivedOn: string; endedOn: string }> {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const [current] = await tx
        .select()
        .from(plantings)
        .where(and(eq(plantings.gardenId, gardenId), eq(plantings.id, plantingId)));
      if (!current) throw new AppError("not_found:planting");
      const [{ logged } = { logged: 0 }] = await tx
        .select({ logged: count() })
        .from(applications)
        .where(and(eq(applications.gardenId, gardenId), eq(applications.plantingId, plantingId)));
      if (logged > 0) {
        const today = await gardenToday(tx, gardenId);
        const endedOn = today < current.plantedOn ? current.plantedOn : today;
        if (current.archivedOn !== null)
          throw new AppError("conflict:planting_archived", "This planting is already archived.");
        // Archived and ended: kept with its log, fed no more after today.
        await tx
          .update(plantings)
          .set({
            archivedOn: today,
            endedOn:
              current.endedOn !== null && current.endedOn < endedOn ? current.endedOn : endedOn,
          })
          .where(and(eq(plantings.gardenId, gardenId), eq(plantings.id, plantingId)));
        return { archivedOn: today, endedOn };
      }
      await tx
        .delete(plantings)
        .where(and(eq(plantings.gardenId, gardenId), eq(plantings.id, plantingId)));
      await dropRule(tx, gardenId, current.feedingRuleId);
      return { removed: true as const };
    }),
  );
}
