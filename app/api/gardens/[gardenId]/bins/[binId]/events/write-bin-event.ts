import "server-only";
import type { DbOrTx } from "@/db";
import {
  insertDrain,
  insertHarvestEvent,
  insertSimpleEvent,
  insertWormMove,
} from "@/db/queries/bin-events";
import { countLoggedWorms, getBinById, type BinDto } from "@/db/queries/bins";
import { requireMembership, type Member } from "@/lib/auth/require-role";
import { dflt, trayInsideVolumeL } from "@/lib/engine";
import { WORM_BAND_C } from "@/lib/cautions";
import { AppError } from "@/lib/errors";
import { formatDayWithYear } from "@/lib/format";
import { formatAmount } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";
import { warningsForFoods, type BinEventInput } from "@/lib/validation/bin-event";
import { wormCount } from "@/lib/validation/bin-values";

// One bin-log entry and what it makes (a lot, a second worm-move row), inside
// the caller's transaction, so a refused check leaves nothing half-written.

export interface WriteResult {
  eventId: string | null;
  moveIds?: string[];
  lotId?: string;
  warnings: string[];
}

/** What one full tray of this bin holds, and what the forecast expects from it (uncalibrated). */
export function trayCapacity(bin: BinDto) {
  const volumeL = trayInsideVolumeL({
    lengthM: bin.trayLengthM,
    widthM: bin.trayWidthM,
    depthM: bin.trayDepthM,
  });
  const density = bin.bulkDensityKgPerL ?? dflt("castingsBulkDensityKgPerL");
  const fill = bin.fillFraction ?? dflt("fillFraction");
  return { volumeL, density, maxKg: volumeL * density, predictedKg: volumeL * fill * density };
}

export async function writeBinEvent(
  tx: DbOrTx,
  {
    member,
    bin,
    input,
    confirm,
    system,
  }: { member: Member; bin: BinDto; input: BinEventInput; confirm: boolean; system: UnitSystem },
): Promise<WriteResult> {
  const base = {
    gardenId: bin.gardenId,
    binId: bin.id,
    on: input.on,
    loggedBy: member.user.id,
    note: input.note ?? null,
  };
  switch (input.kind) {
    case "food-added": {
      const { eventId } = await insertSimpleEvent(tx, {
        ...base,
        kind: "feeding",
        foodKg: input.foodKg,
        foods: input.foods,
      });
      return { eventId, warnings: warningsForFoods(input.foods) };
    }
    case "bedding-added": {
      const { eventId } = await insertSimpleEvent(tx, { ...base, kind: "bedding-added" });
      return { eventId, warnings: [] };
    }
    case "tray-added": {
      const { eventId } = await insertSimpleEvent(tx, { ...base, kind: "tray-added" });
      return { eventId, warnings: [] };
    }
    case "observation": {
      const { eventId } = await insertSimpleEvent(tx, {
        ...base,
        kind: "observation",
        temperatureC: input.temperatureC,
        moisturePercent: input.moisturePercent,
        wormCount: input.wormCount,
      });
      return { eventId, warnings: temperatureWarnings(input.temperatureC) };
    }
    case "liquid-drained": {
      const made = await insertDrain(tx, { ...base, litres: input.litres });
      return { eventId: made.eventId, lotId: made.lotId, warnings: [] };
    }
    case "tray-harvested": {
      const cap = trayCapacity(bin);
      const kg = input.castingsKg ?? input.castingsL! * cap.density;
      const tooMuch =
        (input.castingsL !== undefined && input.castingsL > cap.volumeL) || kg > cap.maxKg;
      if (tooMuch && !confirm) {
        const field = input.castingsKg !== undefined ? "castingsKg" : "castingsL";
        throw new AppError(
          "validation:over_capacity",
          "That is more than one tray of this bin can hold. Check the unit, or confirm it.",
          {
            [field]: `is more than a full tray holds (max ${formatAmount(cap.maxKg, "castings-mass", system)}, ${formatAmount(cap.volumeL, "castings-volume", system)})`,
          },
        );
      }
      const made = await insertHarvestEvent(tx, {
        ...base,
        castingsKg: kg,
        castingsL: input.castingsL ?? null,
        predictedKg: cap.predictedKg,
      });
      return { eventId: made.eventId, lotId: made.lotId, warnings: [] };
    }
    case "worms-moved":
      return moveWorms(tx, { bin, input, base });
  }
}

async function moveWorms(
  tx: DbOrTx,
  {
    bin,
    input,
    base,
  }: {
    bin: BinDto;
    input: Extract<BinEventInput, { kind: "worms-moved" }>;
    base: { gardenId: string; binId: string; on: string; loggedBy: string; note: string | null };
  },
): Promise<WriteResult> {
  const worms = wormCount(input.worms);
  const { worms: has } = await countLoggedWorms(tx, {
    gardenId: bin.gardenId,
    binId: bin.id,
    on: input.on,
  });
  if (worms > has)
    throw new AppError(
      "conflict:worms",
      `The log shows about ${has.toLocaleString("en-US")} worms in this bin on that day. Log a count (an observation) if it has grown.`,
      { worms: `is more than the ${has} worms the bin has` },
    );
  const { moveIds } = await insertWormMove(tx, { ...base, worms, to: input.to });
  return { eventId: null, moveIds, warnings: [] };
}

/**
 * Checks a move's receiving bin before the transaction opens (the membership
 * look-up uses its own connection): the person must be allowed to log in the
 * receiving garden too, and the bin must be in use on that day.
 */
export async function checkWormTarget(
  member: Member,
  bin: BinDto,
  input: Extract<BinEventInput, { kind: "worms-moved" }>,
): Promise<void> {
  if (!input.to) return;
  if (input.to.binId === bin.id)
    throw new AppError("validation:to", "Choose another bin.", { "to.binId": "is this bin" });
  // The person must be allowed to log in the receiving garden too.
  if (input.to.gardenId !== bin.gardenId) {
    try {
      await requireMembership(member.user, input.to.gardenId, "helper");
    } catch (error) {
      if (error instanceof AppError && error.kind === "not_found")
        throw new AppError("validation:to", "Choose a bin in a garden you belong to.", {
          "to.gardenId": "is not a garden you belong to",
        });
      throw error;
    }
  }
  const target = await getBinById(input.to);
  if (!target)
    throw new AppError("validation:to", "Choose a bin in that garden.", {
      "to.binId": "is not a bin in that garden",
    });
  if (target.retiredOn && target.retiredOn < input.on)
    throw new AppError("validation:to", "That bin is retired.", { "to.binId": "is retired" });
  if (target.startedOn > input.on)
    throw new AppError(
      "validation:to",
      `That bin starts on ${formatDayWithYear(target.startedOn)}.`,
      {
        "to.binId": "had not started on that day",
      },
    );
}

function temperatureWarnings(c: number | null | undefined): string[] {
  if (c == null) return [];
  if (c < WORM_BAND_C.low)
    return ["Below the worms' comfortable band: they slow down and eat less."];
  if (c > WORM_BAND_C.high) return ["Above the worms' comfortable band: shade or cool the bin."];
  return [];
}
