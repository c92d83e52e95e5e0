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
import type { BedSize } from "@/lib/scenario/to-scenario";

// GardenInputs → a new garden's rows: the write half of the database adapter
// (garden-inputs.ts reads them back). Ids are new uuids made here, so rows can
// be inserted in batches without reading ids back; `ids` maps every id of the
// inputs to its new one. Runs in the caller's transaction: on any failure the
// caller's rollback leaves nothing behind.

export interface InsertGardenOptions {
  inputs: GardenInputs;
  ownerId: string;
  /** Length and width of beds (by input id) when the source knows them; otherwise a square of the bed's area. */
  bedSizes?: ReadonlyMap<string, BedSize>;
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

/** A frost date as the gardens table keeps it: the month and day in the year of `asOf`. */
function frostDate(md: MonthDay, asOf: string): string {
  // 29 February only exists in leap years; keep it in 2024 rather than lose the day.
  const year = md.month === 2 && md.day === 29 ? "2024" : asOf.slice(0, 4);
  return `${year}-${String(md.month).padStart(2, "0")}-${String(md.day).padStart(2, "0")}`;
}

function ruleRow(gardenId: string, id: string, r: FeedingRuleInput) {
  return {
    id,
    gardenId,
    material: r.material,
    method: r.method,
    basis: r.basis,
    amountMeasure: r.measure,
    amountSi: r.amount,
    dilutionWaterParts: r.dilutionWaterParts,
    teaCastingsPerWater: r.teaCastingsPerWater,
    rrule: r.recurrence,
  };
}

/**
 * The planned feeding an application fulfils, renamed with its planting's new
 * id: the engine's ids are `${plantingId}:${material}:${date}` (feedingId), and
 * an application fulfils a feeding of its own planting.
 */
function remapPlannedKey(key: string | null, oldPlantingId: string, newPlantingId: string) {
  if (key === null || !key.startsWith(`${oldPlantingId}:`)) return key;
  return newPlantingId + key.slice(oldPlantingId.length);
}

export async function insertGardenInputs(
  tx: DbOrTx,
  { inputs, ownerId, bedSizes, location = null }: InsertGardenOptions,
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
  const { settings, asOf } = inputs;

  await tx.insert(gardens).values({
    id: gardenId,
    name: inputs.garden.name,
    timeZone: settings.timeZone,
    unitSystem: settings.unitSystem,
    lastSpringFrost: frostDate(settings.lastSpringFrost, asOf),
    firstFallFrost: frostDate(settings.firstFallFrost, asOf),
    location,
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
      })),
    );
  }

  if (inputs.beds.length) {
    await tx.insert(beds).values(
      inputs.beds.map((b) => {
        const size =
          bedSizes?.get(b.id) ??
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
        };
      }),
    );
  }

  // A garden's own crop list: one crop per distinct name and facts among its plantings.
  const cropIds = new Map<string, string>();
  const cropRows: (typeof crops.$inferInsert)[] = [];
  const ruleRows: (typeof feedingRules.$inferInsert)[] = [];
  const plantingRows: (typeof plantings.$inferInsert)[] = [];
  for (const p of inputs.plantings) {
    const name = p.crop;
    const key = JSON.stringify([name, p.feederClass, p.edible, p.edibleTouchesSoil]);
    let cropId = cropIds.get(key);
    if (!cropId) {
      cropId = newId();
      cropIds.set(key, cropId);
      cropRows.push({
        id: cropId,
        gardenId,
        name,
        feederClass: p.feederClass,
        edible: p.edible,
        edibleTouchesSoil: p.edibleTouchesSoil,
      });
    }
    let ruleId: string | null = null;
    if (p.rule) {
      ruleId = newId();
      ruleRows.push(ruleRow(gardenId, ruleId, p.rule));
    }
    plantingRows.push({
      id: idFor(p.id),
      gardenId,
      bedId: mapped(p.bedId),
      cropId,
      plantCount: p.plantCount,
      plantedOn: p.startDate,
      endedOn: p.endDate,
      expectedHarvestOn: p.harvestDate,
      priority: p.priority,
      feedingRuleId: ruleId,
    });
  }
  if (ruleRows.length) await tx.insert(feedingRules).values(ruleRows);
  if (cropRows.length) await tx.insert(crops).values(cropRows);
  if (plantingRows.length) await tx.insert(plantings).values(plantingRows);

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
