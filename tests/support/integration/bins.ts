import { createBin, type BinValues } from "@/db/queries/bins";
import { recordEnteredLot } from "@/db/queries/lots";

// Bins and lots for route tests, written straight through db/queries so a
// test of one route does not depend on another.

const INCH = 0.0254; // m, exact (NIST Handbook 44 App. C)

/** The product brief's tray: 24 × 20 in outside from 2×6 → 21 × 17 × 5½ in inside (PS 20). */
export const briefTrayInside = { lengthM: 21 * INCH, widthM: 17 * INCH, depthM: 5.5 * INCH };

/** A create-bin body as the form sends it (SI). */
export function binBody(overrides: Record<string, unknown> = {}) {
  return {
    name: "Porch stack",
    kind: "stacked-tray",
    trayCount: 4,
    tray: { mode: "outer", outerLengthM: 24 * INCH, outerWidthM: 20 * INCH, board: "2x6" },
    startedOn: "2026-01-10",
    startingWorms: { count: 2000 },
    manureFeedstock: false,
    indoors: true,
    dormantMonths: [],
    ...overrides,
  };
}

export async function seedBin(gardenId: string, overrides: Partial<BinValues> = {}) {
  return createBin({
    gardenId,
    values: {
      name: "Shed stack",
      kind: "stacked-tray",
      trayLengthM: briefTrayInside.lengthM,
      trayWidthM: briefTrayInside.widthM,
      trayDepthM: briefTrayInside.depthM,
      trayCount: 4,
      startedOn: "2026-01-10",
      rotationDays: null,
      processingDays: null,
      fillFraction: null,
      bulkDensityKgPerL: null,
      leachateEstimateLPerWeek: null,
      intakeFractionPerDay: null,
      densityCeilingKgPerM2: null,
      drainIntervalDays: null,
      dormantMonths: [],
      indoors: true,
      manureFeedstock: false,
      startingWormCount: 2000,
      ...overrides,
    },
  });
}

export async function seedBoughtLot(gardenId: string, amountSi = 10) {
  return recordEnteredLot({
    gardenId,
    material: "castings",
    producedOn: "2026-11-20",
    amountSi,
    manureFeedstock: false,
  });
}
