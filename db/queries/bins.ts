import "server-only";
import { markGardenInputsChanged } from "@/db/queries/garden-inputs-version";
import { and, asc, desc, eq, inArray, isNotNull, isNull, lte, or, sql } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { binEvents, bins, gardens, memberships, stockLots, wormMoves } from "@/db/schema";
import { AppError } from "@/lib/errors";

// Bins of one garden. Every query is scoped by gardenId; a bin id from
// another garden finds nothing.

export const binColumns = {
  id: bins.id,
  gardenId: bins.gardenId,
  name: bins.name,
  kind: bins.kind,
  trayLengthM: bins.trayLengthM,
  trayWidthM: bins.trayWidthM,
  trayDepthM: bins.trayDepthM,
  trayCount: bins.trayCount,
  startedOn: bins.startedOn,
  rotationDays: bins.rotationDays,
  processingDays: bins.processingDays,
  fillFraction: bins.fillFraction,
  bulkDensityKgPerL: bins.bulkDensityKgPerL,
  leachateEstimateLPerWeek: bins.leachateEstimateLPerWeek,
  intakeFractionPerDay: bins.intakeFractionPerDay,
  densityCeilingKgPerM2: bins.densityCeilingKgPerM2,
  drainIntervalDays: bins.drainIntervalDays,
  dormantMonths: bins.dormantMonths,
  indoors: bins.indoors,
  manureFeedstock: bins.manureFeedstock,
  startingWormCount: bins.startingWormCount,
  retiredOn: bins.retiredOn,
};

export type BinDto = {
  id: string;
  gardenId: string;
  name: string;
  kind: "stacked-tray" | "single" | "flow-through";
  trayLengthM: number;
  trayWidthM: number;
  trayDepthM: number;
  trayCount: number;
  startedOn: string;
  rotationDays: number | null;
  processingDays: number | null;
  fillFraction: number | null;
  bulkDensityKgPerL: number | null;
  leachateEstimateLPerWeek: number | null;
  intakeFractionPerDay: number | null;
  densityCeilingKgPerM2: number | null;
  drainIntervalDays: number | null;
  dormantMonths: number[];
  indoors: boolean;
  manureFeedstock: boolean;
  startingWormCount: number;
  retiredOn: string | null;
};

/** A bin row as written: SI sizes, worm count, nullable engine parameters. */
export type BinValues = Omit<BinDto, "id" | "gardenId" | "retiredOn"> & {
  retiredOn?: string | null;
};

export async function listBins({ gardenId }: { gardenId: string }): Promise<BinDto[]> {
  const db = await getDb();
  return db
    .select(binColumns)
    .from(bins)
    .where(eq(bins.gardenId, gardenId))
    .orderBy(asc(bins.retiredOn), asc(bins.startedOn), asc(bins.name));
}

export async function getBinById(
  { gardenId, binId }: { gardenId: string; binId: string },
  tx?: DbOrTx,
): Promise<BinDto | null> {
  const db = tx ?? (await getDb());
  const [row] = await db
    .select(binColumns)
    .from(bins)
    .where(and(eq(bins.gardenId, gardenId), eq(bins.id, binId)))
    .limit(1);
  return row ?? null;
}

export async function createBin({
  gardenId,
  values,
}: {
  gardenId: string;
  values: BinValues;
}): Promise<BinDto> {
  const db = await getDb();
  const [row] = await db
    .insert(bins)
    .values({ gardenId, ...values })
    .returning(binColumns);
  markGardenInputsChanged(gardenId); // after the write: the cached plan is stale
  return row!;
}

export async function updateBin({
  gardenId,
  binId,
  values,
}: {
  gardenId: string;
  binId: string;
  values: Partial<BinValues>;
}): Promise<BinDto> {
  const db = await getDb();
  const [row] = await db
    .update(bins)
    .set(values)
    .where(and(eq(bins.gardenId, gardenId), eq(bins.id, binId)))
    .returning(binColumns);
  if (!row) throw new AppError("not_found:bin");
  markGardenInputsChanged(gardenId);
  return row;
}

/**
 * Worms in a bin on a day by the log: the latest count someone logged (an
 * observation), or else the starting count, plus moves in and less moves out
 * after it. Births and deaths are the engine's forecast, not a count anyone
 * made, so a move is limited by this figure; logging a count lifts it.
 * Locks the bin row so two moves out at once cannot both pass the check.
 */
export async function countLoggedWorms(
  tx: DbOrTx,
  { gardenId, binId, on }: { gardenId: string; binId: string; on: string },
): Promise<{ worms: number; countedOn: string | null }> {
  const [bin] = await tx
    .select({ start: bins.startingWormCount, startedOn: bins.startedOn })
    .from(bins)
    .where(and(eq(bins.gardenId, gardenId), eq(bins.id, binId)))
    .for("update");
  if (!bin) throw new AppError("not_found:bin");
  const [counted] = await tx
    .select({
      on: binEvents.occurredOn,
      worms: binEvents.wormCount,
      createdAt: binEvents.createdAt,
    })
    .from(binEvents)
    .where(
      and(
        eq(binEvents.gardenId, gardenId),
        eq(binEvents.binId, binId),
        eq(binEvents.kind, "observation"),
        isNotNull(binEvents.wormCount),
        lte(binEvents.occurredOn, on),
      ),
    )
    .orderBy(desc(binEvents.occurredOn), desc(binEvents.createdAt))
    .limit(1);
  const moves = await tx
    .select({
      on: wormMoves.movedOn,
      from: wormMoves.fromBinId,
      to: wormMoves.toBinId,
      worms: wormMoves.wormCount,
    })
    .from(wormMoves)
    .where(
      and(
        eq(wormMoves.gardenId, gardenId),
        lte(wormMoves.movedOn, on),
        or(eq(wormMoves.fromBinId, binId), eq(wormMoves.toBinId, binId)),
      ),
    );
  // A count logged on a day already reflects that day's moves.
  const since = counted ? counted.on : null;
  let worms = counted ? counted.worms! : bin.start;
  for (const m of moves) {
    if (since !== null && m.on <= since) continue;
    if (m.to === binId) worms += m.worms;
    if (m.from === binId) worms -= m.worms;
  }
  return { worms: Math.max(0, worms), countedOn: since };
}

/** The bin page's "worms by the log": the same count a worm move is checked against. */
export async function getLoggedWorms(input: { gardenId: string; binId: string; on: string }) {
  const db = await getDb();
  return db.transaction((tx) => countLoggedWorms(tx, input));
}

/** Where each lot came from, for the stock list: its bin (name), its log entry, its manure flag as it applies. */
export async function listLotSources({ gardenId }: { gardenId: string }) {
  const db = await getDb();
  return db
    .select({
      id: stockLots.id,
      sourceEventId: stockLots.sourceEventId,
      binName: bins.name,
      // null on the lot = the bin's flag; bought stock without a bin = false.
      manureFeedstock: sql<boolean>`coalesce(${stockLots.manureFeedstock}, ${bins.manureFeedstock}, false)`,
    })
    .from(stockLots)
    .leftJoin(bins, and(eq(bins.gardenId, stockLots.gardenId), eq(bins.id, stockLots.binId)))
    .where(eq(stockLots.gardenId, gardenId));
}

/** The garden's stock limits (null = the engine's default) and time zone, for lot status. */
export async function getStockSettings({ gardenId }: { gardenId: string }) {
  const db = await getDb();
  const [row] = await db
    .select({
      timeZone: gardens.timeZone,
      unitSystem: gardens.unitSystem,
      shelfLifeDays: gardens.shelfLifeDays,
      liquidMaxAgeDays: gardens.liquidMaxAgeDays,
    })
    .from(gardens)
    .where(eq(gardens.id, gardenId))
    .limit(1);
  if (!row) throw new AppError("not_found:garden");
  return row;
}

/** Bins a person may move worms into: in use, in any garden where they are helper or above. */
export async function listMoveTargets({ userId }: { userId: string }) {
  const db = await getDb();
  return db
    .select({
      gardenId: bins.gardenId,
      gardenName: gardens.name,
      binId: bins.id,
      binName: bins.name,
    })
    .from(bins)
    .innerJoin(gardens, eq(gardens.id, bins.gardenId))
    .innerJoin(
      memberships,
      and(eq(memberships.gardenId, bins.gardenId), eq(memberships.userId, userId)),
    )
    .where(and(isNull(bins.retiredOn), inArray(memberships.role, ["helper", "grower", "owner"])))
    .orderBy(asc(gardens.name), asc(bins.name));
}
