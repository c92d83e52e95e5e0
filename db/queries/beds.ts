import "server-only";
import { and, asc, count, eq, gt, ilike, inArray, isNotNull, isNull, or } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { applications, beds, plantings } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { BedShape, CreateBedInput, ListBedsQuery } from "@/lib/validation/bed";
import { si } from "@/lib/validation/scenario-quantity";
import { thenInvalidatePlan } from "./plan-invalidation";
import { gardenToday } from "./plantings";

export interface BedDto extends BedShape {
  id: string;
  /** length × width for a bed; null for a container. */
  areaM2: number | null;
  /** Kept for its history, out of the plan and the default list. */
  archivedOn: string | null;
  plantingCount: number;
}

const bedColumns = {
  id: beds.id,
  name: beds.name,
  kind: beds.kind,
  indoors: beds.indoors,
  lengthM: beds.lengthM,
  widthM: beds.widthM,
  depthM: beds.depthM,
  containerVolumeL: beds.containerVolumeL,
  notes: beds.notes,
  archivedOn: beds.archivedOn,
};

type BedRow = Omit<BedDto, "areaM2" | "plantingCount">;

function toDto(row: BedRow, plantingCount: number): BedDto {
  const areaM2 =
    row.kind === "bed" && row.lengthM !== null && row.widthM !== null
      ? row.lengthM * row.widthM
      : null;
  return { ...row, areaM2, plantingCount };
}

/** Entered sizes → SI columns. A container given as diameter × depth is a cylinder. */
export function bedColumnsFromInput(input: CreateBedInput) {
  const isBed = input.kind === "bed";
  const depthM = input.depth ? si(input.depth) : null;
  let containerVolumeL: number | null = null;
  if (!isBed) {
    if (input.volume) containerVolumeL = si(input.volume);
    else if (input.diameter && depthM !== null)
      containerVolumeL = Math.PI * (si(input.diameter) / 2) ** 2 * depthM * 1000;
  }
  return {
    name: input.name,
    kind: input.kind,
    indoors: input.indoors,
    lengthM: isBed && input.length ? si(input.length) : null,
    widthM: isBed && input.width ? si(input.width) : null,
    depthM,
    containerVolumeL,
    notes: input.notes ?? null,
  };
}

async function plantingCounts(tx: DbOrTx, gardenId: string, bedIds: string[]) {
  if (!bedIds.length) return new Map<string, number>();
  const rows = await tx
    .select({ bedId: plantings.bedId, n: count() })
    .from(plantings)
    .where(and(eq(plantings.gardenId, gardenId), inArray(plantings.bedId, bedIds)))
    .groupBy(plantings.bedId);
  return new Map(rows.map((r) => [r.bedId, r.n]));
}

export async function listBeds({
  gardenId,
  query,
}: {
  gardenId: string;
  query: ListBedsQuery;
}): Promise<{ beds: BedDto[]; total: number }> {
  const db = await getDb();
  const where = and(
    eq(beds.gardenId, gardenId),
    query.archived ? isNotNull(beds.archivedOn) : isNull(beds.archivedOn),
    query.kind ? eq(beds.kind, query.kind) : undefined,
    query.indoors === undefined ? undefined : eq(beds.indoors, query.indoors),
    query.q ? ilike(beds.name, `%${query.q.replace(/[%_\\]/g, "\\$&")}%`) : undefined,
  );
  const rows = await db
    .select(bedColumns)
    .from(beds)
    .where(where)
    .orderBy(asc(beds.kind), asc(beds.name), asc(beds.id))
    .limit(query.limit)
    .offset(query.offset);
  const [{ total } = { total: 0 }] = await db.select({ total: count() }).from(beds).where(where);
  const counts = await plantingCounts(
    db,
    gardenId,
    rows.map((r) => r.id),
  );
  return { beds: rows.map((r) => toDto(r, counts.get(r.id) ?? 0)), total };
}

export async function getBedById({
  gardenId,
  bedId,
  tx,
}: {
  gardenId: string;
  bedId: string;
  tx?: DbOrTx;
}): Promise<BedDto | null> {
  const db = tx ?? (await getDb());
  const [row] = await db
    .select(bedColumns)
    .from(beds)
    .where(and(eq(beds.gardenId, gardenId), eq(beds.id, bedId)))
    .limit(1);
  if (!row) return null;
  const counts = await plantingCounts(db, gardenId, [row.id]);
  return toDto(row, counts.get(row.id) ?? 0);
}

export async function createBed({
  gardenId,
  input,
}: {
  gardenId: string;
  input: CreateBedInput;
}): Promise<BedDto> {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const [row] = await tx
        .insert(beds)
        .values({ gardenId, ...bedColumnsFromInput(input) })
        .returning(bedColumns);
      return toDto(row!, 0);
    }),
  );
}

/** Replaces the bed's fields with a full, already-checked input (the handler merges a PATCH first). */
export async function updateBed({
  gardenId,
  bedId,
  input,
}: {
  gardenId: string;
  bedId: string;
  input: CreateBedInput;
}): Promise<BedDto | null> {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const [row] = await tx
        .update(beds)
        .set(bedColumnsFromInput(input))
        .where(and(eq(beds.gardenId, gardenId), eq(beds.id, bedId)))
        .returning(bedColumns);
      if (!row) return null;
      return getBedById({ gardenId, bedId, tx });
    }),
  );
}

/**
 * Removes a bed that nothing logged refers to, with its plantings and their own
 * rules. A bed whose plantings have logged applications is archived instead:
 * deleting it would delete the log (the foreign keys cascade).
 */
export async function removeBed({
  gardenId,
  bedId,
}: {
  gardenId: string;
  bedId: string;
}): Promise<{ removed: true } | { archivedOn: string }> {
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const bed = await getBedById({ gardenId, bedId, tx });
      if (!bed) throw new AppError("not_found:bed");
      const inBed = await tx
        .select({ id: plantings.id })
        .from(plantings)
        .where(and(eq(plantings.gardenId, gardenId), eq(plantings.bedId, bedId)));
      if (inBed.length) {
        const [{ logged } = { logged: 0 }] = await tx
          .select({ logged: count() })
          .from(applications)
          .where(
            and(
              eq(applications.gardenId, gardenId),
              inArray(
                applications.plantingId,
                inBed.map((p) => p.id),
              ),
            ),
          );
        if (logged > 0) {
          if (bed.archivedOn)
            throw new AppError("conflict:bed_archived", "This bed is already archived.");
          // Archive: keep the bed and its log; end what still grows in it so the plan stops feeding it.
          const today = await gardenToday(tx, gardenId);
          await tx
            .update(beds)
            .set({ archivedOn: today })
            .where(and(eq(beds.gardenId, gardenId), eq(beds.id, bedId)));
          const growing = await tx
            .select({ id: plantings.id, plantedOn: plantings.plantedOn })
            .from(plantings)
            .where(
              and(
                eq(plantings.gardenId, gardenId),
                eq(plantings.bedId, bedId),
                or(isNull(plantings.endedOn), gt(plantings.endedOn, today)),
              ),
            );
          for (const p of growing)
            await tx
              .update(plantings)
              .set({ endedOn: p.plantedOn > today ? p.plantedOn : today })
              .where(and(eq(plantings.gardenId, gardenId), eq(plantings.id, p.id)));
          return { archivedOn: today };
        }
      }
      // Its plantings go with it, and their rules with them (on delete cascade).
      await tx.delete(beds).where(and(eq(beds.gardenId, gardenId), eq(beds.id, bedId)));
      return { removed: true as const };
    }),
  );
}

/** Whether any planting in the bed has logged applications: then removing it archives it instead. */
export async function bedHasLoggedFeedings({
  gardenId,
  bedId,
}: {
  gardenId: string;
  bedId: string;
}): Promise<boolean> {
  const db = await getDb();
  const [row] = await db
    .select({ n: count() })
    .from(applications)
    .innerJoin(
      plantings,
      and(eq(plantings.gardenId, applications.gardenId), eq(plantings.id, applications.plantingId)),
    )
    .where(and(eq(applications.gardenId, gardenId), eq(plantings.bedId, bedId)));
  return (row?.n ?? 0) > 0;
}
