// Invented gardens of any size for the bench, built as GardenInputs (SI): 5 bins,
// n plantings, and three years of logs (harvests, weekly drains, a monthly
// castings application per planting) to replay before the plan's first month.
// A seeded random stream makes every run measure the same gardens.
import type { ApplicationLog, BedInput, BinInput, GardenInputs, PlantingInput } from "@/lib/engine";
import { addDays, daysBetween } from "@/lib/engine";

function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const pad = (n: number) => String(n).padStart(2, "0");
export const BENCH_AS_OF = "2026-02-28";
const HISTORY_FROM = "2023-03-01"; // three years of logs before asOf

export function benchGarden(plantings: number, seed = 1): GardenInputs {
  const r = rng(seed);
  const bins: BinInput[] = Array.from({ length: 5 }, (_, i) => ({
    id: `bin-${i + 1}`,
    name: `Bin ${i + 1}`,
    startDate: `2023-0${1 + i}-0${1 + i}`,
    trays: 2 + (i % 3),
    tray: { insideLengthM: 0.4, insideWidthM: 0.3, insideDepthM: 0.15 + 0.05 * i },
    rotationIntervalDays: null,
    processingDays: null,
    fillFraction: null,
    bulkDensityKgPerL: null,
    dormantMonths: [],
    manureFeedstock: i === 4,
    startingWorms: 2000,
    leachateEstimateLPerWeek: 0.4,
    intakeFractionPerDay: null,
    densityCeilingKgPerM2: null,
    retiredOn: null,
  }));
  const bedCount = Math.max(1, Math.ceil(plantings / 5));
  const beds: BedInput[] = Array.from({ length: bedCount }, (_, i) =>
    i % 4 === 3
      ? {
          id: `pot-${i}`,
          name: `Pot ${i}`,
          kind: "container",
          indoor: false,
          areaM2: null,
          containerVolumeL: 18.9,
        }
      : {
          id: `bed-${i}`,
          name: `Bed ${i}`,
          kind: "bed",
          indoor: false,
          areaM2: 2.97,
          containerVolumeL: null,
        },
  );
  const classes = ["heavy", "medium", "light"] as const;
  const list: PlantingInput[] = Array.from({ length: plantings }, (_, i) => {
    const start = `2026-${pad(4 + Math.floor(r() * 3))}-${pad(1 + Math.floor(r() * 28))}`;
    const end = `2026-${pad(8 + Math.floor(r() * 3))}-${pad(1 + Math.floor(r() * 28))}`;
    const roll = r();
    const liquid = roll < 0.2;
    return {
      id: `p-${i}`,
      bedId: beds[i % bedCount]!.id,
      crop: null,
      feederClass: classes[Math.floor(r() * 3)]!,
      plantCount: 1 + Math.floor(r() * 8),
      startDate: start,
      endDate: end,
      harvestDate: null,
      priority: 1 + Math.floor(r() * 5),
      edible: true,
      edibleTouchesSoil: r() < 0.3,
      rules: liquid
        ? [
            {
              material: roll < 0.1 ? "tea" : "leachate",
              method: "drench",
              basis: "per-plant",
              measure: "volume",
              amount: roll < 0.1 ? 0.1 : 0.2366,
              recurrence: roll < 0.1 ? "FREQ=WEEKLY" : "FREQ=WEEKLY;BYDAY=SU",
              dilutionWaterParts: null,
              teaCastingsPerWater: null,
            },
          ]
        : [],
    };
  });
  const days = daysBetween(HISTORY_FROM, BENCH_AS_OF);
  const harvests = bins.flatMap((b) =>
    Array.from({ length: Math.floor(days / 30) }, (_, k) => ({
      id: `${b.id}-h${k}`,
      binId: b.id,
      date: addDays(HISTORY_FROM, 30 * k + 20),
      castingsKg: 8 + 4 * r(),
      predictedKg: null,
    })),
  );
  const drains = bins.flatMap((b) =>
    Array.from({ length: Math.floor(days / 7) }, (_, k) => ({
      id: `${b.id}-d${k}`,
      binId: b.id,
      date: addDays(HISTORY_FROM, 7 * k + 3),
      litres: 0.3 + 0.2 * r(),
    })),
  );
  const applications: ApplicationLog[] = [];
  for (const p of list) {
    for (let k = 0; 30 * k + 25 < days; k++) {
      applications.push({
        id: `${p.id}-a${k}`,
        plantingId: p.id,
        date: addDays(HISTORY_FROM, 30 * k + 25),
        material: "castings",
        method: "top-dress",
        amount: 0.05 + 0.1 * r(),
        plannedFeedingId: null,
        draws: [],
      });
    }
  }
  return {
    garden: { id: `bench-${plantings}`, name: `Bench garden (${plantings} plantings)` },
    settings: {
      unitSystem: "us",
      timeZone: "America/Chicago",
      lastSpringFrost: { month: 4, day: 15 },
      firstFallFrost: { month: 10, day: 20 },
      shelfLifeDays: null,
      liquidMaxAgeDays: null,
      castingsPricePerKg: null,
      teaCastingsPerWater: null,
    },
    bins,
    beds,
    plantings: list,
    stockLots: [],
    logs: { harvests, drains, applications, adjustments: [], wormMoves: [], observations: [] },
    asOf: BENCH_AS_OF,
  };
}
