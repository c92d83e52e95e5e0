// Small invented gardens for the engine's tests, built directly as GardenInputs (SI).
import type {
  ApplicationLog,
  BinInput,
  GardenInputs,
  PlantingInput,
  StockLotInput,
} from "@/lib/engine";
import { toSi } from "@/lib/units";

export const LB = toSi(1, "lb"); // 0.45359237 kg exactly (NIST HB 44 App. C)

export function bin(over: Partial<BinInput> = {}): BinInput {
  return {
    id: "b1",
    name: "Test stack",
    startDate: "2026-01-01",
    trays: 4,
    // 21 × 17 × 5½ in inside: a 24 × 20 in stack of 2×6 (PS 20 dry sizes)
    tray: {
      insideLengthM: toSi(21, "in"),
      insideWidthM: toSi(17, "in"),
      insideDepthM: toSi(5.5, "in"),
    },
    rotationIntervalDays: null,
    processingDays: null,
    fillFraction: null,
    bulkDensityKgPerL: null,
    dormantMonths: [],
    manureFeedstock: false,
    startingWorms: 2000,
    leachateEstimateLPerWeek: null,
    intakeFractionPerDay: null,
    densityCeilingKgPerM2: null,
    retiredOn: null,
    ...over,
  };
}

export function planting(over: Partial<PlantingInput> & { id: string }): PlantingInput {
  return {
    bedId: "bed",
    crop: null,
    feederClass: "heavy",
    plantCount: 1,
    startDate: "2026-05-01",
    endDate: "2026-10-01",
    harvestDate: null,
    priority: null,
    edible: true,
    edibleTouchesSoil: false,
    rules: [
      {
        material: "castings",
        method: "top-dress",
        basis: "per-plant",
        measure: "mass",
        amount: 1,
        recurrence: "FREQ=MONTHLY",
        dilutionWaterParts: null,
        teaCastingsPerWater: null,
      },
    ],
    ...over,
  };
}

export function lot(over: Partial<StockLotInput> & { id: string }): StockLotInput {
  return {
    binId: null,
    material: "castings",
    madeOn: "2026-05-01",
    amount: 10,
    manureFeedstock: false,
    ...over,
  };
}

export function application(
  over: Partial<ApplicationLog> & { id: string; plantingId: string },
): ApplicationLog {
  return {
    date: "2026-05-15",
    material: "castings",
    method: "top-dress",
    amount: 1,
    plannedFeedingId: null,
    draws: [],
    ...over,
  };
}

export function garden(over: Partial<GardenInputs> = {}): GardenInputs {
  return {
    garden: { id: "g", name: "Test garden" },
    settings: {
      unitSystem: "metric",
      timeZone: "UTC",
      lastSpringFrost: { month: 3, day: 1 },
      firstFallFrost: { month: 11, day: 30 },
      shelfLifeDays: null,
      liquidMaxAgeDays: null,
      castingsPricePerKg: null,
      teaCastingsPerWater: null,
    },
    bins: [],
    beds: [
      { id: "bed", name: "Bed", kind: "bed", indoor: false, areaM2: 3, containerVolumeL: null },
    ],
    plantings: [],
    stockLots: [],
    logs: {
      harvests: [],
      drains: [],
      applications: [],
      adjustments: [],
      wormMoves: [],
      observations: [],
    },
    asOf: "2026-04-30",
    ...over,
  };
}
