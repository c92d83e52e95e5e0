import "server-only";
import { and, asc, count, eq, gte, inArray, isNotNull, isNull, or } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { applications, beds, crops, gardens, plantings } from "@/db/schema";
import type { FeederClass, FeedingRuleInput } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import {
  CROWDED_REFUSE_RATIO,
  cropFacts,
  crowding,
  effectiveRules,
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
import { ownRulesChange } from "@/lib/validation/feeding-rule";
import { si } from "@/lib/validation/scenario-quantity";
import { adoptCrop } from "./crops";
import { readRules, replaceRules } from "./feeding-rules-write";
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
  /** The planting's own rules, in order; [] = inherits its crop's. */
  rules: FeedingRuleInput[];
  /** What it is fed by: its own rules, else its crop's, else the feeder-class default. */
  effectiveRules: FeedingRuleInput[];
  ruleSource: RuleSource;
  /** For the one-rule form until it edits `rules`: rules[0] ?? null, and effectiveRules[0]. */
  rule: FeedingRuleInput | null;
  effectiveRule: FeedingRuleInput;
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
  const rulesOf = await readRules(tx, gardenId, {
    plantingIds: rows.map((r) => r.id),
    cropIds: cropRows.map((c) => c.id),
  });
  const crop = new Map(cropRows.map((c) => [c.id, c]));
  const bedName = new Map(bedRows.map((b) => [b.id, b.name]));
  return rows.map((p): PlantingDto => {
    const c = crop.get(p.cropId)!;
    const own = rulesOf(p.id) ?? [];
    const eff = effectiveRules(own, rulesOf(c.id) ?? [], c.feederClass);
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
      rules: own,
      effectiveRules: eff.rules,
      ruleSource: eff.source,
      rule: own[0] ?? null,
      effectiveRule: eff.rules[0]!,
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
            notes: input.notes ?? null,
          })
          .returning();
        await replaceRules(
          tx,
          gardenId,
          { plantingId: row!.id },
          ownRulesChange(input)?.map(ruleInput),
        );
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
  /** undefined: keep its own rules; []: back to the crop's rules; a list: its own rules, in order. */
  ruleChange: CreatePlantingInput["rules"];
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
      await replaceRules(tx, gardenId, { plantingId }, ruleChange?.map(ruleInput));
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
          notes: input.notes ?? null,
        })
        .where(and(eq(plantings.gardenId, gardenId), eq(plantings.id, plantingId)));
      return getPlantingById({ gardenId, plantingId, tx });
    }),
  );
}

/**
 * A planting with logged applications is archived and ended (kept for the
 * record, fed no more after today); one without logs is removed with its own rules.
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
      return { removed: true as const }; // its rules go with it (on delete cascade)
    }),
  );
}
