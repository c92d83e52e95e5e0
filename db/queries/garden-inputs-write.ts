import "server-only";
import crypto from "node:crypto";
import type { DbOrTx } from "@/db";
import {
  beds,
  binEvents,
  bins,
  crops,
  feedingRules,
  gardens,
  memberships,
  plantings,
  stockAdjustments,
  stockLots,
  wormMoves,
} from "@/db/schema";
import { insertApplicationWithDraws, insertDrain, insertHarvest } from "@/db/queries/lots";
import type { FeedingRuleInput, GardenInputs, MonthDay } from "@/lib/engine";
import type { GardenRecords } from "@/lib/scenario/records";
import { cropKey } from "@/lib/validation/scenario";
import { ruleRows } from "./feeding-rules-write";

// GardenInputs → a new garden's rows: the write half of the database adapter
// (garden-inputs.ts reads them back). Ids are new uuids made here, so rows can
// be inserted in batches without reading ids back; `ids` maps every id of the
// inputs to its new one. Runs in the caller's transaction: on any failure the
// caller's rollback leaves nothing behind.

export interface InsertGardenOptions {
  inputs: GardenInputs;
  ownerId: string;
  /**
   * What the source says beyond GardenInputs (ids as in the inputs). Without it,
   * beds are squares of their area, the crop list is made from the plantings'
   * facts, and every planting holds the rules it is fed by as its own.
   */
  records?: GardenRecords;
  /** Overrides records.location (the demo seed sets it). */
  location?: string | null;
}

let lastMs = 0;
let sequence = 0;

/**
 * A time-ordered uuid (RFC 9562 version 7, with a 12-bit counter within the
 * millisecond): rows written in one transaction share created_at, and ordering
 * them by id then keeps the order of the file they came from, so a garden read
 * back lists its plantings and logs in the same order as the file.
 */
function newId(): string {
  let ms = Date.now();
  if (ms <= lastMs) {
    sequence += 1;
    if (sequence > 0xfff) {
      lastMs += 1;
      sequence = 0;
    }
    ms = lastMs;
  } else {
    lastMs = ms;
    sequence = 0;
  }
  const b = crypto.randomBytes(16);
  b.writeUIntBE(ms, 0, 6);
  b[6] = 0x70 | (sequence >> 8);
  b[7] = sequence & 0xff;
  b[8] = (b[8]! & 0x3f) | 0x80;
  const h = b.toString("hex");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

/** A frost day as the gardens table keeps it: "MM-DD", no year. */
function frostDay(md: MonthDay): string {
  return `${String(md.month).padStart(2, "0")}-${String(md.day).padStart(2, "0")}`;
}

/**
 * The planned feeding an application fulfils, renamed with its planting's new
 * id: the engine's ids are `${plantingId}:${material}:${date}` (feedingId, with
 * `:2`… when two rules of one material meet on a day), and an application
 * fulfils a feeding of its own planting.
 */
function remapPlannedKey(key: string | null, oldPlantingId: string, newPlantingId: string) {
  if (key === null || !key.startsWith(`${oldPlantingId}:`)) return key;
  return newPlantingId + key.slice(oldPlantingId.length);
}

export async function insertGardenInputs(
  tx: DbOrTx,
  { inputs, ownerId, records, location }: InsertGardenOptions,
): Promise<{ gardenId: string; ids: Map<string, string> }> {
  const gardenId = newId();
  const ids = new Map<string, string>();
  const idFor = (old: string) => {
    const id = newId();
    ids.set(old, id);
    return id;
  };
  const mapped = (old: string) => {
    const id = ids.get(old);
    if (!id) throw new Error(`garden inputs name an unknown id "${old}"`);
    return id;
  };
  const { settings } = inputs;

  await tx.insert(gardens).values({
    id: gardenId,
    name: inputs.garden.name,
    timeZone: settings.timeZone,
    unitSystem: settings.unitSystem,
    lastSpringFrost: frostDay(settings.lastSpringFrost),
    firstFallFrost: frostDay(settings.firstFallFrost),
    location: location ?? records?.location ?? null,
    castingsPricePerKg: settings.castingsPricePerKg,
    shelfLifeDays: settings.shelfLifeDays,
    liquidMaxAgeDays: settings.liquidMaxAgeDays,
    teaCastingsPerWater: settings.teaCastingsPerWater,
  });
  await tx.insert(memberships).values({ gardenId, userId: ownerId, role: "owner" });

  if (inputs.bins.length) {
    await tx.insert(bins).values(
      inputs.bins.map((b) => ({
        id: idFor(b.id),
        gardenId,
        name: b.name,
        trayLengthM: b.tray.insideLengthM,
        trayWidthM: b.tray.insideWidthM,
        trayDepthM: b.tray.insideDepthM,
        trayCount: b.trays,
        startedOn: b.startDate,
        rotationDays: b.rotationIntervalDays,
        processingDays: b.processingDays,
        fillFraction: b.fillFraction,
        bulkDensityKgPerL: b.bulkDensityKgPerL,
        leachateEstimateLPerWeek: b.leachateEstimateLPerWeek,
        intakeFractionPerDay: b.intakeFractionPerDay,
        densityCeilingKgPerM2: b.densityCeilingKgPerM2,
        dormantMonths: b.dormantMonths,
        manureFeedstock: b.manureFeedstock,
        startingWormCount: b.startingWorms,
        retiredOn: b.retiredOn,
        drainIntervalDays: records?.binDrainIntervalDays.get(b.id) ?? null,
      })),
    );
  }

  if (inputs.beds.length) {
    await tx.insert(beds).values(
      inputs.beds.map((b) => {
        const size =
          records?.bedSizes.get(b.id) ??
          (b.areaM2 === null
            ? null
            : { lengthM: Math.sqrt(b.areaM2), widthM: Math.sqrt(b.areaM2) });
        return {
          id: idFor(b.id),
          gardenId,
          name: b.name,
          kind: b.kind,
          indoors: b.indoor,
          lengthM: b.kind === "bed" ? (size?.lengthM ?? null) : null,
          widthM: b.kind === "bed" ? (size?.widthM ?? null) : null,
          containerVolumeL: b.kind === "container" ? b.containerVolumeL : null,
          notes: records?.bedNotes.get(b.id) ?? null,
        };
      }),
    );
  }

  // A garden's own crop list: the source's crops (with their rules), then one
  // crop per other distinct name and facts among its plantings (cropKey).
  const cropIds = new Map<string, string>();
  const cropRows: (typeof crops.$inferInsert)[] = [];
  const rules: (typeof feedingRules.$inferInsert)[] = [];
  const plantingRows: (typeof plantings.$inferInsert)[] = [];
  for (const c of records?.crops ?? []) {
    const cropId = newId();
    cropIds.set(cropKey(c), cropId);
    cropRows.push({
      id: cropId,
      gardenId,
      name: c.name,
      feederClass: c.feederClass,
      edible: c.edible,
      edibleTouchesSoil: c.edibleTouchesSoil,
      daysToHarvest: c.daysToHarvest,
      spacingM: c.spacingM,
    });
    rules.push(...ruleRows(gardenId, { cropId }, c.rules));
  }
  const listed = new Set(cropIds.keys());
  for (const p of inputs.plantings) {
    const key = cropKey(p);
    let cropId = cropIds.get(key);
    if (!cropId) {
      cropId = newId();
      cropIds.set(key, cropId);
      cropRows.push({
        id: cropId,
        gardenId,
        name: p.crop,
        feederClass: p.feederClass,
        edible: p.edible,
        edibleTouchesSoil: p.edibleTouchesSoil,
      });
    }
    // Its own rules; one of a listed crop that has none inherits the crop's.
    const own: FeedingRuleInput[] = records?.ownRules.get(p.id) ?? (listed.has(key) ? [] : p.rules);
    const plantingId = idFor(p.id);
    rules.push(...ruleRows(gardenId, { plantingId }, own));
    plantingRows.push({
      id: plantingId,
      gardenId,
      bedId: mapped(p.bedId),
      cropId,
      plantCount: p.plantCount,
      plantedOn: p.startDate,
      endedOn: p.endDate,
      expectedHarvestOn: p.harvestDate,
      priority: p.priority,
    });
  }
  if (cropRows.length) await tx.insert(crops).values(cropRows);
  if (plantingRows.length) await tx.insert(plantings).values(plantingRows);
  if (rules.length) await tx.insert(feedingRules).values(rules);

  if (inputs.stockLots.length) {
    await tx.insert(stockLots).values(
      inputs.stockLots.map((l) => ({
        id: idFor(l.id),
        gardenId,
        binId: l.binId === null ? null : mapped(l.binId),
        material: l.material,
        producedOn: l.madeOn,
        initialAmountSi: l.amount,
        manureFeedstock: l.manureFeedstock,
        pricePerKg: records?.lotDetails.get(l.id)?.pricePerKg ?? null,
        note: records?.lotDetails.get(l.id)?.note ?? null,
      })),
    );
  }

  const { logs } = inputs;
  // Harvests and drains go through the same functions the log screens use; each
  // makes its lot, whose id the applications' draws name.
  for (const h of logs.harvests) {
    const made = await insertHarvest(tx, {
      ids: { eventId: newId(), lotId: newId() },
      gardenId,
      binId: mapped(h.binId),
      on: h.date,
      castingsKg: h.castingsKg,
      predictedKg: h.predictedKg,
    });
    ids.set(h.id, made.lotId);
  }
  for (const d of logs.drains) {
    const made = await insertDrain(tx, {
      ids: { eventId: newId(), lotId: newId() },
      gardenId,
      binId: mapped(d.binId),
      on: d.date,
      litres: d.litres,
    });
    ids.set(d.id, made.lotId);
  }
  if (logs.observations.length) {
    await tx.insert(binEvents).values(
      logs.observations.map((o) => ({
        id: idFor(o.id),
        gardenId,
        binId: mapped(o.binId),
        kind: "observation" as const,
        occurredOn: o.date,
        wormCount: o.wormCount,
        temperatureC: o.temperatureC,
        moisturePercent: o.moisturePercent,
        note: o.note,
      })),
    );
  }
  if (logs.wormMoves.length) {
    await tx.insert(wormMoves).values(
      logs.wormMoves.map((m) => ({
        id: idFor(m.id),
        gardenId,
        movedOn: m.date,
        fromBinId: m.fromBinId === null ? null : mapped(m.fromBinId),
        toBinId: m.toBinId === null ? null : mapped(m.toBinId),
        wormCount: m.worms,
      })),
    );
  }
  // Ids in file order (the order they read back in); written oldest first, so
  // every draw is checked against the stock left at its time.
  for (const a of logs.applications) idFor(a.id);
  for (const a of [...logs.applications].sort((x, y) => x.date.localeCompare(y.date))) {
    await insertApplicationWithDraws(tx, {
      id: mapped(a.id),
      gardenId,
      plantingId: mapped(a.plantingId),
      appliedOn: a.date,
      material: a.material,
      method: a.method,
      amountSi: a.amount,
      plannedKey: remapPlannedKey(a.plannedFeedingId, a.plantingId, mapped(a.plantingId)),
      draws: a.draws.map((d) => ({ lotId: mapped(d.lotId), amountSi: d.amount })),
    });
  }
  if (logs.adjustments.length) {
    await tx.insert(stockAdjustments).values(
      logs.adjustments.map((a) => ({
        id: idFor(a.id),
        gardenId,
        lotId: mapped(a.lotId),
        adjustedOn: a.date,
        amountSi: a.amount,
        // The scenario schema admits only the column's values (lib/validation/scenario.ts).
        reason: a.reason as (typeof stockAdjustments.$inferInsert)["reason"],
        note: a.note,
      })),
    );
  }
  return { gardenId, ids };
}
