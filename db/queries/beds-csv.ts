import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { beds, crops, gardens, plantings } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { BedsCsvRead, CsvBed, CsvCrop } from "@/lib/plantings/beds-csv-read";
import { expectedEnd } from "@/lib/plantings/expected-end";
import type { BedCsvLine } from "@/lib/plantings/beds-csv-write";
import { cropFacts } from "@/lib/plantings/rules";
import { PRIORITY_RANK, priorityFromRank } from "@/lib/validation/planting";
import { bedColumnsFromInput } from "./beds";
import { adoptCrop, listVisibleCrops } from "./crops";
import { thenInvalidatePlan } from "./plan-invalidation";

// Beds and plantings in and out as CSV (lib/plantings/beds-csv-*.ts has the format).

/** What a CSV is read against: the crops the garden can plant and its beds in use. */
export async function loadBedsCsvContext({
  gardenId,
  tx,
}: {
  gardenId: string;
  tx?: DbOrTx;
}): Promise<{ crops: CsvCrop[]; beds: CsvBed[] }> {
  const db = tx ?? (await getDb());
  const crops = (await listVisibleCrops(db, gardenId)).map((c) => ({
    id: c.id,
    name: c.name,
    ...cropFacts(c),
  }));
  const bedRows = await db
    .select({
      id: beds.id,
      name: beds.name,
      kind: beds.kind,
      indoors: beds.indoors,
      lengthM: beds.lengthM,
      widthM: beds.widthM,
      depthM: beds.depthM,
      containerVolumeL: beds.containerVolumeL,
    })
    .from(beds)
    .where(and(eq(beds.gardenId, gardenId), isNull(beds.archivedOn)));
  return { crops, beds: bedRows };
}

const CHUNK = 500;

/**
 * Writes a CSV that read without problems, all in one transaction: the new
 * beds, the garden's own copy of each starter crop used, then the plantings
 * (multi-row inserts). Each planting without an expected end gets one from its
 * crop's days to harvest, stopped at the first fall frost outdoors.
 */
export async function importBedsCsv({
  gardenId,
  read,
}: {
  gardenId: string;
  read: BedsCsvRead;
}): Promise<{ beds: number; plantings: number }> {
  if (read.problems.length)
    throw new AppError("validation", "The file has problems; nothing was imported.");
  const db = await getDb();
  return thenInvalidatePlan(
    gardenId,
    db.transaction(async (tx) => {
      const [garden] = await tx
        .select({ firstFallFrost: gardens.firstFallFrost })
        .from(gardens)
        .where(eq(gardens.id, gardenId));
      const bedIds = new Map<string, { id: string; indoors: boolean }>();
      for (let i = 0; i < read.newBeds.length; i += CHUNK) {
        const chunk = read.newBeds.slice(i, i + CHUNK);
        const rows = await tx
          .insert(beds)
          .values(chunk.map((b) => ({ gardenId, ...bedColumnsFromInput(b.input) })))
          .returning({ id: beds.id, indoors: beds.indoors });
        chunk.forEach((b, j) => bedIds.set(b.key, rows[j]!));
      }
      const existingIds = [...new Set(read.plantings.flatMap((p) => (p.bedId ? [p.bedId] : [])))];
      if (existingIds.length) {
        const rows = await tx
          .select({ id: beds.id, indoors: beds.indoors })
          .from(beds)
          .where(and(eq(beds.gardenId, gardenId), inArray(beds.id, existingIds)));
        const found = new Map(rows.map((r) => [r.id, r]));
        for (const p of read.plantings) {
          if (!p.bedId) continue;
          const bed = found.get(p.bedId);
          if (!bed)
            throw rowError(p.row, "Bed", "This bed was removed while you imported; try again.");
          bedIds.set(p.bedKey, bed);
        }
      }
      const ownCrop = new Map<string, { id: string; daysToHarvest: number | null }>();
      for (const cropId of new Set(read.plantings.map((p) => p.cropId))) {
        const crop = await adoptCrop(tx, gardenId, cropId);
        if (!crop)
          throw new AppError("validation", "A crop was removed while you imported; try again.");
        ownCrop.set(cropId, { id: crop.id, daysToHarvest: cropFacts(crop).daysToHarvest });
      }
      const values = read.plantings.map((p) => {
        const bed = bedIds.get(p.bedKey)!;
        const crop = ownCrop.get(p.cropId)!;
        return {
          gardenId,
          bedId: bed.id,
          cropId: crop.id,
          plantCount: p.plantCount,
          plantedOn: p.plantedOn,
          expectedHarvestOn:
            p.expectedEnd ??
            expectedEnd({
              plantedOn: p.plantedOn,
              daysToHarvest: crop.daysToHarvest,
              indoors: bed.indoors,
              firstFallFrost: garden!.firstFallFrost,
            }),
          priority: PRIORITY_RANK[p.priority],
          notes: p.notes,
        };
      });
      for (let i = 0; i < values.length; i += CHUNK)
        await tx.insert(plantings).values(values.slice(i, i + CHUNK));
      return { beds: read.newBeds.length, plantings: values.length };
    }),
  );
}

function rowError(row: number, column: string, message: string): AppError {
  return new AppError("validation", `Row ${row}, ${column}: ${message}`, {
    csv: `Row ${row}, ${column}: ${message}`,
  });
}

/** Every bed in use with its plantings not archived, in bed-name order; a bed with none is one row alone. */
export async function listBedsForExport({ gardenId }: { gardenId: string }): Promise<BedCsvLine[]> {
  const db = await getDb();
  const bedRows = await db
    .select()
    .from(beds)
    .where(and(eq(beds.gardenId, gardenId), isNull(beds.archivedOn)))
    .orderBy(asc(beds.kind), asc(beds.name), asc(beds.id));
  // Plantings point at the garden's own crops (archived ones too).
  const cropNames = new Map(
    (
      await db
        .select({ id: crops.id, name: crops.name })
        .from(crops)
        .where(eq(crops.gardenId, gardenId))
    ).map((c) => [c.id, c.name ?? ""]),
  );
  const plantingRows = await db
    .select()
    .from(plantings)
    .where(and(eq(plantings.gardenId, gardenId), isNull(plantings.archivedOn)))
    .orderBy(asc(plantings.plantedOn), asc(plantings.id));
  const byBed = new Map<string, typeof plantingRows>();
  for (const p of plantingRows) {
    const list = byBed.get(p.bedId) ?? [];
    list.push(p);
    byBed.set(p.bedId, list);
  }
  return bedRows.flatMap((b): BedCsvLine[] => {
    const bed = {
      name: b.name,
      kind: b.kind,
      indoors: b.indoors,
      lengthM: b.lengthM,
      widthM: b.widthM,
      depthM: b.depthM,
      containerVolumeL: b.containerVolumeL,
      notes: b.notes,
    };
    const list = byBed.get(b.id) ?? [];
    if (!list.length) return [{ bed, planting: null }];
    return list.map((p) => ({
      bed,
      planting: {
        cropName: cropNames.get(p.cropId) ?? "",
        plantCount: p.plantCount,
        plantedOn: p.plantedOn,
        expectedHarvestOn: p.expectedHarvestOn,
        priority: priorityFromRank(p.priority),
        notes: p.notes,
      },
    }));
  });
}
