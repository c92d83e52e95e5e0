import "server-only";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { markGardenInputsChanged } from "@/db/queries/garden-inputs-version";
import {
  applicationDraws,
  applications,
  binEvents,
  stockAdjustments,
  stockLots,
} from "@/db/schema";
import { AppError } from "@/lib/errors";

// The one place that writes stock: lots (from harvests and drains), the draws
// applications make on them, and adjustments by hand (spilled, given away). What
// remains in a lot is never stored; it is the lot's initial amount less its
// draws plus its adjustments (negative ones take away), and the functions here
// check, in the same transaction and with the lots locked, that no lot goes
// below zero.

/** Slack for decimal rounding: numeric(14, 6) keeps micro-units. */
const EPSILON = 1e-6;

export interface DrawInput {
  lotId: string;
  /** In the lot's unit: kg of castings (for tea, the castings steeped), L of undiluted leachate. */
  amountSi: number;
}

export interface RecordApplicationInput {
  /** Set by an import that keeps its file's order; otherwise the database makes one. */
  id?: string;
  gardenId: string;
  plantingId: string;
  appliedOn: string;
  material: "castings" | "leachate" | "tea";
  method: "top-dress" | "side-dress" | "soil-mix" | "drench";
  /** As applied: kg of castings, or L of diluted leachate or tea. */
  amountSi: number;
  /** The planned feeding's stable id (PlannedFeeding.id); null or absent when unplanned. */
  plannedKey?: string | null;
  draws: DrawInput[];
  loggedBy?: string | null;
  note?: string | null;
}

/** Logs an application and its draws in one transaction; refuses a draw larger than what is left. */
export async function recordApplication(input: RecordApplicationInput): Promise<{ id: string }> {
  const db = await getDb();
  const result = await db.transaction((tx) => insertApplicationWithDraws(tx, input));
  markGardenInputsChanged(input.gardenId); // after commit: see garden-inputs-version.ts
  return result;
}

/** recordApplication inside the caller's transaction (the import uses it for every logged application). */
export async function insertApplicationWithDraws(
  tx: DbOrTx,
  input: RecordApplicationInput,
): Promise<{ id: string }> {
  const { gardenId, draws } = input;
  const lotIds = [...new Set(draws.map((d) => d.lotId))];
  if (lotIds.length !== draws.length)
    throw new AppError("validation:draws", "Each lot may be named once.", {
      draws: "names a lot twice",
    });
  const pool = input.material === "leachate" ? "leachate" : "castings";
  const lots = await readLots(tx, { gardenId, lotIds, lock: true });
  const fields: Record<string, string> = {};
  draws.forEach((d, i) => {
    const lot = lots.find((l) => l.id === d.lotId);
    const at = `draws[${i}]`;
    if (!lot) fields[`${at}.lotId`] = "no such lot in this garden";
    else if (lot.material !== pool) fields[`${at}.lotId`] = `is ${lot.material}, not ${pool}`;
    else if (lot.producedOn > input.appliedOn) fields[`${at}.lotId`] = "was made after that day";
    else if (!(d.amountSi > 0)) fields[`${at}.amountSi`] = "must be more than zero";
    else if (goesBelowZero(lot, -d.amountSi))
      fields[`${at}.amountSi`] = "is more than the lot has left";
  });
  if (Object.keys(fields).length) {
    const short = Object.keys(fields).some((k) => k.endsWith("amountSi"));
    throw new AppError(short ? "conflict:stock" : "validation:draws", undefined, fields);
  }
  const [row] = await tx
    .insert(applications)
    .values({
      id: input.id,
      gardenId,
      plantingId: input.plantingId,
      material: input.material,
      method: input.method,
      amountSi: input.amountSi,
      appliedOn: input.appliedOn,
      plannedFor: input.plannedKey ? plannedDate(input.plannedKey) : null,
      plannedKey: input.plannedKey ?? null,
      loggedBy: input.loggedBy ?? null,
      note: input.note ?? null,
    })
    .onConflictDoNothing({ target: [applications.gardenId, applications.plannedKey] })
    .returning({ id: applications.id });
  if (!row)
    throw new AppError("conflict:already_logged", "That planned feeding is already logged.", {
      plannedKey: "is already logged",
    });
  if (draws.length) {
    await tx
      .insert(applicationDraws)
      .values(draws.map((d) => ({ gardenId, applicationId: row.id, ...d })));
  }
  return row;
}

/** The date part of a planned feeding id (`planting:material:YYYY-MM-DD`), if it has one. */
function plannedDate(key: string): string | null {
  const m = /(\d{4}-\d{2}-\d{2})$/.exec(key);
  return m ? m[1]! : null;
}

interface LotLeft {
  id: string;
  binId: string | null;
  material: "castings" | "leachate";
  producedOn: string;
  initialSi: number;
  /** Initial amount less every draw, plus adjustments (not aged out: that is the engine's to say). */
  remainingSi: number;
}

/**
 * The one lot look-up: a garden's lots (all, or those named), oldest first, each
 * with what its draws and adjustments have left. `lock` takes the rows FOR
 * UPDATE, so a writer's check and its insert see the same stock.
 */
async function readLots(
  tx: DbOrTx,
  { gardenId, lotIds, lock = false }: { gardenId: string; lotIds?: string[]; lock?: boolean },
): Promise<LotLeft[]> {
  if (lotIds && !lotIds.length) return [];
  const named = lotIds ? inArray(stockLots.id, lotIds) : undefined;
  const query = tx
    .select({
      id: stockLots.id,
      binId: stockLots.binId,
      material: stockLots.material,
      producedOn: stockLots.producedOn,
      initialSi: stockLots.initialAmountSi,
    })
    .from(stockLots)
    .where(and(eq(stockLots.gardenId, gardenId), named))
    .orderBy(asc(stockLots.producedOn), asc(stockLots.id));
  const lots = lock ? await query.for("update") : await query;
  const ids = lots.map((l) => l.id);
  if (!ids.length) return [];
  const draws = await tx
    .select({
      lotId: applicationDraws.lotId,
      total: sql<number>`sum(${applicationDraws.amountSi})`,
    })
    .from(applicationDraws)
    .where(and(eq(applicationDraws.gardenId, gardenId), inArray(applicationDraws.lotId, ids)))
    .groupBy(applicationDraws.lotId);
  const adjustments = await tx
    .select({
      lotId: stockAdjustments.lotId,
      total: sql<number>`sum(${stockAdjustments.amountSi})`,
    })
    .from(stockAdjustments)
    .where(and(eq(stockAdjustments.gardenId, gardenId), inArray(stockAdjustments.lotId, ids)))
    .groupBy(stockAdjustments.lotId);
  const change = new Map<string, number>();
  for (const d of draws) change.set(d.lotId, -Number(d.total));
  for (const a of adjustments) change.set(a.lotId, (change.get(a.lotId) ?? 0) + Number(a.total));
  return lots.map((l) => ({ ...l, remainingSi: l.initialSi + (change.get(l.id) ?? 0) }));
}

/** Would adding `changeSi` (negative takes away) leave the lot below zero? */
function goesBelowZero(lot: LotLeft, changeSi: number): boolean {
  return lot.remainingSi + changeSi < -EPSILON;
}

export interface RecordAdjustmentInput {
  gardenId: string;
  lotId: string;
  adjustedOn: string;
  /** In the lot's unit; negative takes away (spilled, given away, spoiled), positive corrects upward. */
  amountSi: number;
  reason: "spilled" | "given-away" | "spoiled" | "correction";
  note?: string | null;
  loggedBy?: string | null;
}

/** Changes a lot by hand in one transaction; refuses to take more than the lot has left. */
export async function recordStockAdjustment(input: RecordAdjustmentInput): Promise<{ id: string }> {
  const db = await getDb();
  const result = await db.transaction(async (tx) => {
    const [lot] = await readLots(tx, {
      gardenId: input.gardenId,
      lotIds: [input.lotId],
      lock: true,
    });
    if (!lot)
      throw new AppError("validation:lot", undefined, { lotId: "no such lot in this garden" });
    if (lot.producedOn > input.adjustedOn)
      throw new AppError("validation:lot", undefined, { adjustedOn: "is before the lot was made" });
    if (input.amountSi === 0 || !Number.isFinite(input.amountSi))
      throw new AppError("validation:amount", undefined, { amountSi: "must not be zero" });
    if (goesBelowZero(lot, input.amountSi))
      throw new AppError("conflict:stock", undefined, {
        amountSi: "is more than the lot has left",
      });
    const [row] = await tx
      .insert(stockAdjustments)
      .values({
        gardenId: input.gardenId,
        lotId: lot.id,
        adjustedOn: input.adjustedOn,
        amountSi: input.amountSi,
        reason: input.reason,
        note: input.note ?? null,
        loggedBy: input.loggedBy ?? null,
      })
      .returning({ id: stockAdjustments.id });
    return row!;
  });
  markGardenInputsChanged(input.gardenId); // after commit: see garden-inputs-version.ts
  return result;
}

export interface RecordYieldInput {
  /** Ids for the event and its lot, set by an import that keeps its file's order. */
  ids?: { eventId: string; lotId: string };
  gardenId: string;
  binId: string;
  on: string;
  loggedBy?: string | null;
  note?: string | null;
}

/** Logs a harvested tray and the castings lot it makes, in the caller's transaction. */
export async function insertHarvest(
  tx: DbOrTx,
  input: RecordYieldInput & { castingsKg: number; predictedKg?: number | null },
): Promise<{ eventId: string; lotId: string }> {
  const [event] = await tx
    .insert(binEvents)
    .values({
      id: input.ids?.eventId,
      gardenId: input.gardenId,
      binId: input.binId,
      kind: "harvest",
      occurredOn: input.on,
      castingsKg: input.castingsKg,
      predictedCastingsKg: input.predictedKg ?? null,
      loggedBy: input.loggedBy ?? null,
      note: input.note ?? null,
    })
    .returning({ id: binEvents.id });
  return {
    eventId: event!.id,
    lotId: await insertLotFor(tx, input, event!.id, "castings", input.castingsKg),
  };
}

/** Logs liquid drained from a bin's base and the leachate lot it makes, in the caller's transaction. */
export async function insertDrain(
  tx: DbOrTx,
  input: RecordYieldInput & { litres: number },
): Promise<{ eventId: string; lotId: string }> {
  const [event] = await tx
    .insert(binEvents)
    .values({
      id: input.ids?.eventId,
      gardenId: input.gardenId,
      binId: input.binId,
      kind: "liquid-drained",
      occurredOn: input.on,
      liquidL: input.litres,
      loggedBy: input.loggedBy ?? null,
      note: input.note ?? null,
    })
    .returning({ id: binEvents.id });
  return {
    eventId: event!.id,
    lotId: await insertLotFor(tx, input, event!.id, "leachate", input.litres),
  };
}

async function insertLotFor(
  tx: DbOrTx,
  input: RecordYieldInput,
  eventId: string,
  material: "castings" | "leachate",
  amount: number,
): Promise<string> {
  const [lot] = await tx
    .insert(stockLots)
    .values({
      id: input.ids?.lotId,
      gardenId: input.gardenId,
      binId: input.binId,
      sourceEventId: eventId,
      material,
      producedOn: input.on,
      initialAmountSi: amount,
      // null = the bin's flag, so the lot follows the bin it came from.
      manureFeedstock: null,
    })
    .returning({ id: stockLots.id });
  return lot!.id;
}

export async function recordHarvest(
  input: RecordYieldInput & { castingsKg: number; predictedKg?: number | null },
) {
  const db = await getDb();
  const result = await db.transaction((tx) => insertHarvest(tx, input));
  markGardenInputsChanged(input.gardenId);
  return result;
}

export async function recordDrain(input: RecordYieldInput & { litres: number }) {
  const db = await getDb();
  const result = await db.transaction((tx) => insertDrain(tx, input));
  markGardenInputsChanged(input.gardenId);
  return result;
}

export type LotStock = LotLeft;

/** Every lot of a garden with what its draws and adjustments have left, oldest first. */
export async function listLotStock({ gardenId }: { gardenId: string }): Promise<LotStock[]> {
  return readLots(await getDb(), { gardenId });
}

// Stock entered by hand (issue 11); POST /api/gardens/[gardenId]/lots calls it.

export interface EnteredLotInput {
  gardenId: string;
  material: "castings" | "leachate";
  producedOn: string;
  amountSi: number;
  manureFeedstock: boolean;
  pricePerKg?: number | null;
  note?: string | null;
}

/** A bought bag or stock on hand before Castline: a lot with no bin and no source event. */
export async function recordEnteredLot(input: EnteredLotInput): Promise<{ lotId: string }> {
  const db = await getDb();
  const [lot] = await db
    .insert(stockLots)
    .values({
      gardenId: input.gardenId,
      binId: null,
      sourceEventId: null,
      material: input.material,
      producedOn: input.producedOn,
      initialAmountSi: input.amountSi,
      manureFeedstock: input.manureFeedstock,
      pricePerKg: input.pricePerKg ?? null,
      note: input.note ?? null,
    })
    .returning({ id: stockLots.id });
  markGardenInputsChanged(input.gardenId); // the Balance starts from stock: its cached plan is stale
  return { lotId: lot!.id };
}
