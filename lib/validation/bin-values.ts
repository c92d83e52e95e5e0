import { EngineInputError, kgToWorms, trayInsideFromOuter, type Box } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import type { TraySizeInput, WormAmountInput } from "./bin";

// Entry aids → what is stored: the inside box of a tray (from the outer size
// and a PS 20 board when given that way) and a whole worm count (from a
// weight through the engine's worms per lb).

export function insideBox(tray: TraySizeInput): Box {
  if (tray.mode === "inside")
    return { lengthM: tray.lengthM, widthM: tray.widthM, depthM: tray.depthM };
  return trayInsideFromOuter({
    outerLengthM: tray.outerLengthM,
    outerWidthM: tray.outerWidthM,
    board: tray.board as Parameters<typeof trayInsideFromOuter>[0]["board"],
  });
}

export function wormCount(amount: WormAmountInput): number {
  return "count" in amount ? amount.count : Math.max(1, Math.round(kgToWorms(amount.kg)));
}

// Today in the garden's zone is worked out in one place; re-exported for the bin routes.
export { todayIn } from "@/lib/garden-today";

/** The PS 20 aid can refuse an outer size thinner than two boards: a 400 on the tray field. */
export function trayBox(tray: Parameters<typeof insideBox>[0]) {
  try {
    return insideBox(tray);
  } catch (error) {
    if (error instanceof EngineInputError)
      throw new AppError("validation:tray", "Please check: tray.", { tray: error.message });
    throw error;
  }
}

/** Engine parameters absent from the body are stored as null (= the engine's default). */
export function nullParams(v: {
  rotationDays?: number | null;
  processingDays?: number | null;
  fillFraction?: number | null;
  bulkDensityKgPerL?: number | null;
  leachateEstimateLPerWeek?: number | null;
  intakeFractionPerDay?: number | null;
  densityCeilingKgPerM2?: number | null;
  drainIntervalDays?: number | null;
}) {
  return {
    rotationDays: v.rotationDays ?? null,
    processingDays: v.processingDays ?? null,
    fillFraction: v.fillFraction ?? null,
    bulkDensityKgPerL: v.bulkDensityKgPerL ?? null,
    leachateEstimateLPerWeek: v.leachateEstimateLPerWeek ?? null,
    intakeFractionPerDay: v.intakeFractionPerDay ?? null,
    densityCeilingKgPerM2: v.densityCeilingKgPerM2 ?? null,
    drainIntervalDays: v.drainIntervalDays ?? null,
  };
}
