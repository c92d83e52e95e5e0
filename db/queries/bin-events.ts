import "server-only";
import { and, desc, eq, inArray, or } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { binEvents, bins, gardens, stockLots, uploads, users, wormMoves } from "@/db/schema";
import { PHOTO_OWNER_TYPE } from "@/db/queries/photos";
import { insertDrain, insertHarvest } from "@/db/queries/lots";
import type { BinEventKind } from "@/lib/validation/bin-event";

// The bin log: rows of bin_events plus the worm_moves that touch the bin,
// merged into one timeline. Harvests and drains go through db/queries/lots.ts,
// which writes the lot with the event in the caller's transaction.

export interface BinLogEntry {
  id: string;
  /** "event" rows come from bin_events, "move" rows from worm_moves. */
  source: "event" | "move";
  kind: BinEventKind;
  on: string;
  foodKg: number | null;
  foods: string[];
  castingsL: number | null;
  castingsKg: number | null;
  predictedCastingsKg: number | null;
  liquidL: number | null;
  temperatureC: number | null;
  moisturePercent: number | null;
  wormCount: number | null;
  /** Worm moves: +worms in, −worms out; the other bin's name when known. */
  direction: "in" | "out" | null;
  otherBin: { gardenName: string; binName: string } | null;
  note: string | null;
  lotId: string | null;
  /** Photos attached to the entry (a harvest's), oldest first; read through /photos/{id}. */
  photoIds: string[];
  loggedBy: string | null;
  loggedAt: string;
}

const eventKind = (kind: string): BinEventKind => {
  switch (kind) {
    case "feeding":
      return "food-added";
    case "bedding-added":
      return "bedding-added";
    case "tray-added":
      return "tray-added";
    case "harvest":
      return "tray-harvested";
    case "liquid-drained":
      return "liquid-drained";
    case "worms-moved":
      return "worms-moved";
    default:
      return "observation";
  }
};

/** One bin's log, newest first; `kind` filters it. */
export async function listBinLog({
  gardenId,
  binId,
  kind,
  limit,
}: {
  gardenId: string;
  binId: string;
  kind?: BinEventKind;
  limit: number;
}): Promise<BinLogEntry[]> {
  const db = await getDb();
  const events = await db
    .select({
      id: binEvents.id,
      kind: binEvents.kind,
      on: binEvents.occurredOn,
      foodKg: binEvents.foodKg,
      foods: binEvents.foodKinds,
      castingsL: binEvents.castingsL,
      castingsKg: binEvents.castingsKg,
      predictedCastingsKg: binEvents.predictedCastingsKg,
      liquidL: binEvents.liquidL,
      temperatureC: binEvents.temperatureC,
      moisturePercent: binEvents.moisturePercent,
      wormCount: binEvents.wormCount,
      note: binEvents.note,
      lotId: stockLots.id,
      loggedBy: users.name,
      loggedAt: binEvents.createdAt,
    })
    .from(binEvents)
    .leftJoin(users, eq(users.id, binEvents.loggedBy))
    .leftJoin(
      stockLots,
      and(eq(stockLots.gardenId, binEvents.gardenId), eq(stockLots.sourceEventId, binEvents.id)),
    )
    .where(and(eq(binEvents.gardenId, gardenId), eq(binEvents.binId, binId)))
    .orderBy(desc(binEvents.occurredOn), desc(binEvents.createdAt))
    .limit(limit);
  const moves =
    kind && kind !== "worms-moved"
      ? []
      : await db
          .select({
            id: wormMoves.id,
            on: wormMoves.movedOn,
            from: wormMoves.fromBinId,
            to: wormMoves.toBinId,
            worms: wormMoves.wormCount,
            note: wormMoves.note,
            loggedBy: users.name,
            loggedAt: wormMoves.createdAt,
          })
          .from(wormMoves)
          .leftJoin(users, eq(users.id, wormMoves.loggedBy))
          .where(
            and(
              eq(wormMoves.gardenId, gardenId),
              or(eq(wormMoves.fromBinId, binId), eq(wormMoves.toBinId, binId)),
            ),
          )
          .orderBy(desc(wormMoves.movedOn), desc(wormMoves.createdAt))
          .limit(limit);
  const names = await binNames(db, gardenId);
  const photos = await photosByEvent(
    db,
    gardenId,
    events.map((e) => e.id),
  );
  const entries: BinLogEntry[] = [
    ...events.map((e) => ({
      ...e,
      photoIds: photos.get(e.id) ?? [],
      source: "event" as const,
      kind: eventKind(e.kind),
      direction: null,
      otherBin: null,
      loggedAt: e.loggedAt.toISOString(),
    })),
    ...moves.map((m) => {
      const out = m.from === binId;
      const other = out ? m.to : m.from;
      return {
        id: m.id,
        source: "move" as const,
        kind: "worms-moved" as const,
        on: m.on,
        foodKg: null,
        foods: [],
        castingsL: null,
        castingsKg: null,
        predictedCastingsKg: null,
        liquidL: null,
        temperatureC: null,
        moisturePercent: null,
        wormCount: m.worms,
        direction: out ? ("out" as const) : ("in" as const),
        otherBin: other ? (names.get(other) ?? null) : null,
        note: m.note,
        lotId: null,
        photoIds: [],
        loggedBy: m.loggedBy,
        loggedAt: m.loggedAt.toISOString(),
      };
    }),
  ];
  return entries
    .filter((e) => !kind || e.kind === kind)
    .sort((a, b) =>
      a.on === b.on ? b.loggedAt.localeCompare(a.loggedAt) : b.on.localeCompare(a.on),
    )
    .slice(0, limit);
}

async function photosByEvent(db: DbOrTx, gardenId: string, eventIds: string[]) {
  const byEvent = new Map<string, string[]>();
  if (!eventIds.length) return byEvent;
  const rows = await db
    .select({ id: uploads.id, eventId: uploads.attachedToId })
    .from(uploads)
    .where(
      and(
        eq(uploads.gardenId, gardenId),
        eq(uploads.attachedToType, PHOTO_OWNER_TYPE),
        inArray(uploads.attachedToId, eventIds),
      ),
    )
    .orderBy(uploads.createdAt);
  for (const r of rows) byEvent.set(r.eventId!, [...(byEvent.get(r.eventId!) ?? []), r.id]);
  return byEvent;
}

async function binNames(db: DbOrTx, gardenId: string) {
  const rows = await db
    .select({ id: bins.id, binName: bins.name, gardenName: gardens.name })
    .from(bins)
    .innerJoin(gardens, eq(gardens.id, bins.gardenId))
    .where(eq(bins.gardenId, gardenId));
  return new Map(rows.map((r) => [r.id, { gardenName: r.gardenName, binName: r.binName }]));
}

interface EventBase {
  gardenId: string;
  binId: string;
  on: string;
  loggedBy: string;
  note: string | null;
}

/** Food, bedding, a tray added or an observation: one row. */
export async function insertSimpleEvent(
  tx: DbOrTx,
  input: EventBase & {
    kind: "feeding" | "bedding-added" | "tray-added" | "observation";
    foodKg?: number | null;
    foods?: string[];
    temperatureC?: number | null;
    moisturePercent?: number | null;
    wormCount?: number | null;
  },
): Promise<{ eventId: string }> {
  const [row] = await tx
    .insert(binEvents)
    .values({
      gardenId: input.gardenId,
      binId: input.binId,
      kind: input.kind,
      occurredOn: input.on,
      foodKg: input.foodKg ?? null,
      foodKinds: input.foods ?? [],
      temperatureC: input.temperatureC ?? null,
      moisturePercent: input.moisturePercent ?? null,
      wormCount: input.wormCount ?? null,
      note: input.note,
      loggedBy: input.loggedBy,
    })
    .returning({ id: binEvents.id });
  return { eventId: row!.id };
}

export { insertDrain };

/** A harvest (via lots.ts, which writes its lot) plus the volume when it was measured that way. */
export async function insertHarvestEvent(
  tx: DbOrTx,
  input: Parameters<typeof insertHarvest>[1] & { castingsL: number | null },
) {
  const { castingsL, ...rest } = input;
  const made = await insertHarvest(tx, rest);
  if (castingsL !== null)
    await tx
      .update(binEvents)
      .set({ castingsL })
      .where(and(eq(binEvents.gardenId, input.gardenId), eq(binEvents.id, made.eventId)));
  return made;
}

/**
 * Worms out of one bin and, when the target is in another garden, into that
 * garden's bin: two rows, because worm_moves keeps both ends in one garden.
 */
export async function insertWormMove(
  tx: DbOrTx,
  input: EventBase & { worms: number; to: { gardenId: string; binId: string } | null },
): Promise<{ moveIds: string[] }> {
  const sameGarden = input.to?.gardenId === input.gardenId;
  const base = {
    movedOn: input.on,
    wormCount: input.worms,
    note: input.note,
    loggedBy: input.loggedBy,
  };
  const first = await tx
    .insert(wormMoves)
    .values({
      ...base,
      gardenId: input.gardenId,
      fromBinId: input.binId,
      toBinId: sameGarden ? input.to!.binId : null,
    })
    .returning({ id: wormMoves.id });
  const ids = [first[0]!.id];
  if (input.to && !sameGarden) {
    const second = await tx
      .insert(wormMoves)
      .values({ ...base, gardenId: input.to.gardenId, fromBinId: null, toBinId: input.to.binId })
      .returning({ id: wormMoves.id });
    ids.push(second[0]!.id);
  }
  return { moveIds: ids };
}
