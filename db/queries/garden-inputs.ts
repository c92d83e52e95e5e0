import "server-only";
import { and, asc, eq, inArray, lte } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import {
  applicationDraws,
  applications,
  beds,
  binEvents,
  bins,
  crops,
  feedingRules,
  gardens,
  plantings,
  stockAdjustments,
  stockLots,
  wormMoves,
} from "@/db/schema";
import type { GardenInputs, LotDraw, MonthDay } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { rulesByOwner } from "./feeding-rules-write";

// Database → GardenInputs. Rows are already SI, so they map straight across:
// no conversion to the grower's units and back. A null engine parameter stays
// null (the engine's default). One query per table, each scoped by gardenId,
// all in one read transaction so they see the same moment of the garden.
// Rows come in the order they were written (created_at, then the time-ordered
// ids of an import), so a garden plans in the same order as the file it came from.

/** A frost day as the gardens table keeps it, "MM-DD", as the engine takes it. */
function monthDay(md: string): MonthDay {
  return { month: Number(md.slice(0, 2)), day: Number(md.slice(3, 5)) };
}

function byId<T extends { id: string }>(rows: T[]): Map<string, T> {
  return new Map(rows.map((r) => [r.id, r]));
}

/**
 * Everything the engine needs to plan one garden, read from the database.
 * Logs dated after `asOf` (and stock made after it) are left out: the plan
 * replays history up to and including asOf and forecasts after it.
 */
export async function loadGardenInputs({
  gardenId,
  asOf,
}: {
  gardenId: string;
  asOf: string;
}): Promise<GardenInputs> {
  const db = await getDb();
  return db.transaction((tx) => readGardenInputs(tx, { gardenId, asOf }), {
    isolationLevel: "repeatable read",
    accessMode: "read only",
  });
}

/** loadGardenInputs inside a transaction the caller already holds. */
export async function readGardenInputs(
  tx: DbOrTx,
  { gardenId, asOf }: { gardenId: string; asOf: string },
): Promise<GardenInputs> {
  const [garden] = await tx.select().from(gardens).where(eq(gardens.id, gardenId)).limit(1);
  if (!garden) throw new AppError("not_found:garden");

  const binRows = await tx
    .select()
    .from(bins)
    .where(eq(bins.gardenId, gardenId))
    .orderBy(asc(bins.createdAt), asc(bins.id));
  const bedRows = await tx
    .select()
    .from(beds)
    .where(eq(beds.gardenId, gardenId))
    .orderBy(asc(beds.createdAt), asc(beds.id));
  const plantingRows = await tx
    .select()
    .from(plantings)
    .where(eq(plantings.gardenId, gardenId))
    .orderBy(asc(plantings.createdAt), asc(plantings.id));
  const cropRows = await tx.select().from(crops).where(eq(crops.gardenId, gardenId));
  const ruleRows = await tx
    .select()
    .from(feedingRules)
    .where(eq(feedingRules.gardenId, gardenId))
    .orderBy(asc(feedingRules.position));
  const lotRows = await tx
    .select()
    .from(stockLots)
    .where(and(eq(stockLots.gardenId, gardenId), lte(stockLots.producedOn, asOf)))
    .orderBy(asc(stockLots.createdAt), asc(stockLots.id));
  const eventRows = await tx
    .select()
    .from(binEvents)
    .where(
      and(
        eq(binEvents.gardenId, gardenId),
        lte(binEvents.occurredOn, asOf),
        inArray(binEvents.kind, ["harvest", "liquid-drained", "observation"]),
      ),
    )
    .orderBy(asc(binEvents.createdAt), asc(binEvents.id));
  const applicationRows = await tx
    .select()
    .from(applications)
    .where(and(eq(applications.gardenId, gardenId), lte(applications.appliedOn, asOf)))
    .orderBy(asc(applications.createdAt), asc(applications.id));
  const drawRows = await tx
    .select()
    .from(applicationDraws)
    .where(eq(applicationDraws.gardenId, gardenId))
    .orderBy(asc(applicationDraws.applicationId), asc(applicationDraws.lotId));
  const adjustmentRows = await tx
    .select()
    .from(stockAdjustments)
    .where(and(eq(stockAdjustments.gardenId, gardenId), lte(stockAdjustments.adjustedOn, asOf)))
    .orderBy(
      asc(stockAdjustments.adjustedOn),
      asc(stockAdjustments.createdAt),
      asc(stockAdjustments.id),
    );
  const moveRows = await tx
    .select()
    .from(wormMoves)
    .where(and(eq(wormMoves.gardenId, gardenId), lte(wormMoves.movedOn, asOf)))
    .orderBy(asc(wormMoves.createdAt), asc(wormMoves.id));

  const cropById = byId(cropRows);
  const rulesOf = rulesByOwner(ruleRows);
  const lotByEvent = new Map(
    lotRows.filter((l) => l.sourceEventId !== null).map((l) => [l.sourceEventId!, l]),
  );
  const drawsByApplication = new Map<string, LotDraw[]>();
  for (const d of drawRows) {
    const list = drawsByApplication.get(d.applicationId) ?? [];
    list.push({ lotId: d.lotId, amount: d.amountSi });
    drawsByApplication.set(d.applicationId, list);
  }

  // An archived planting (or one in an archived bed) is out of the garden from
  // that day: its plan ends there. One archived before it was planted, with no
  // logged application, was never in the garden and is left out.
  const bedById = byId(bedRows);
  const logged = new Set(applicationRows.map((a) => a.plantingId));
  const endOf = (p: (typeof plantingRows)[number]): string | null | "gone" => {
    const archived = [p.archivedOn, bedById.get(p.bedId)?.archivedOn ?? null]
      .filter((d): d is string => d !== null)
      .sort()[0];
    if (archived === undefined) return p.endedOn;
    if (archived <= p.plantedOn && !logged.has(p.id)) return "gone";
    const end = p.endedOn !== null && p.endedOn < archived ? p.endedOn : archived;
    return end < p.plantedOn ? p.plantedOn : end;
  };

  // A harvest or drain and the lot it made share one id: the lot's, which draws name.
  const lotIdOf = (eventId: string) => lotByEvent.get(eventId)?.id ?? eventId;
  const eventsOf = (kind: (typeof eventRows)[number]["kind"]) =>
    eventRows.filter((e) => e.kind === kind);

  return {
    garden: { id: garden.id, name: garden.name },
    settings: {
      unitSystem: garden.unitSystem,
      timeZone: garden.timeZone,
      lastSpringFrost: monthDay(garden.lastSpringFrost),
      firstFallFrost: monthDay(garden.firstFallFrost),
      shelfLifeDays: garden.shelfLifeDays,
      liquidMaxAgeDays: garden.liquidMaxAgeDays,
      castingsPricePerKg: garden.castingsPricePerKg,
      teaCastingsPerWater: garden.teaCastingsPerWater,
    },
    bins: binRows.map((b) => ({
      id: b.id,
      name: b.name,
      startDate: b.startedOn,
      trays: b.trayCount,
      tray: {
        insideLengthM: b.trayLengthM,
        insideWidthM: b.trayWidthM,
        insideDepthM: b.trayDepthM,
      },
      rotationIntervalDays: b.rotationDays,
      processingDays: b.processingDays,
      fillFraction: b.fillFraction,
      bulkDensityKgPerL: b.bulkDensityKgPerL,
      dormantMonths: b.dormantMonths,
      manureFeedstock: b.manureFeedstock,
      startingWorms: b.startingWormCount,
      leachateEstimateLPerWeek: b.leachateEstimateLPerWeek,
      intakeFractionPerDay: b.intakeFractionPerDay,
      densityCeilingKgPerM2: b.densityCeilingKgPerM2,
      retiredOn: b.retiredOn,
    })),
    beds: bedRows.map((b) => ({
      id: b.id,
      name: b.name,
      kind: b.kind,
      indoor: b.indoors,
      areaM2:
        b.kind === "bed" && b.lengthM !== null && b.widthM !== null ? b.lengthM * b.widthM : null,
      containerVolumeL: b.kind === "container" ? b.containerVolumeL : null,
    })),
    plantings: plantingRows.flatMap((p) => {
      // The composite key (garden_id, crop_id) guarantees the crop is this garden's.
      const crop = cropById.get(p.cropId)!;
      const end = endOf(p);
      if (end === "gone") return [];
      return {
        id: p.id,
        bedId: p.bedId,
        crop: crop.name,
        feederClass: crop.feederClass,
        plantCount: p.plantCount,
        startDate: p.plantedOn,
        endDate: end,
        harvestDate: p.expectedHarvestOn,
        priority: p.priority,
        edible: crop.edible,
        edibleTouchesSoil: crop.edibleTouchesSoil,
        // Its own rules replace its crop's; none of either = the feeder class default.
        rules: rulesOf(p.id) ?? rulesOf(crop.id) ?? [],
      };
    }),
    stockLots: lotRows
      .filter((l) => l.sourceEventId === null)
      .map((l) => ({
        id: l.id,
        binId: l.binId,
        material: l.material,
        madeOn: l.producedOn,
        amount: l.initialAmountSi,
        manureFeedstock: l.manureFeedstock,
      })),
    logs: {
      harvests: eventsOf("harvest").map((e) => ({
        id: lotIdOf(e.id),
        binId: e.binId,
        date: e.occurredOn,
        castingsKg: e.castingsKg ?? 0,
        predictedKg: e.predictedCastingsKg,
      })),
      drains: eventsOf("liquid-drained").map((e) => ({
        id: lotIdOf(e.id),
        binId: e.binId,
        date: e.occurredOn,
        litres: e.liquidL ?? 0,
      })),
      applications: applicationRows.map((a) => ({
        id: a.id,
        plantingId: a.plantingId,
        date: a.appliedOn,
        material: a.material,
        method: a.method,
        amount: a.amountSi,
        plannedFeedingId: a.plannedKey,
        draws: drawsByApplication.get(a.id) ?? [],
      })),
      // Applied by the ledger on their own date (a spill does not shrink the lot's earlier days).
      adjustments: adjustmentRows.map((a) => ({
        id: a.id,
        lotId: a.lotId,
        date: a.adjustedOn,
        amount: a.amountSi,
        reason: a.reason,
        note: a.note,
      })),
      wormMoves: moveRows.map((m) => ({
        id: m.id,
        date: m.movedOn,
        fromBinId: m.fromBinId,
        toBinId: m.toBinId,
        worms: m.wormCount,
      })),
      observations: eventsOf("observation").map((e) => ({
        id: e.id,
        binId: e.binId,
        date: e.occurredOn,
        wormCount: e.wormCount,
        temperatureC: e.temperatureC,
        moisturePercent: e.moisturePercent,
        note: e.note,
      })),
    },
    asOf,
  };
}
