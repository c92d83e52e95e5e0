// Invented gardens of any size for the bench: 5 bins and n plantings, built
// from a seeded random stream so every run measures the same gardens.
import type { Scenario } from "@/lib/validation/scenario";

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

const q = <U extends string>(value: number, unit: U) => ({ value, unit });
const pad = (n: number) => String(n).padStart(2, "0");

export function benchGarden(plantings: number, seed = 1): Scenario {
  const r = rng(seed);
  const bins = Array.from({ length: 5 }, (_, i) => ({
    id: `bin-${i + 1}`,
    startDate: `2026-0${1 + i}-0${1 + i}`,
    trays: 2 + (i % 3),
    tray: { insideVolume: q(20 + 6 * i, "L") },
    leachateEstimatePerWeek: q(0.4, "L"),
  }));
  const bedCount = Math.max(1, Math.ceil(plantings / 5));
  const beds = Array.from({ length: bedCount }, (_, i) =>
    i % 4 === 3
      ? { id: `pot-${i}`, kind: "container" as const, volume: q(5, "gal") }
      : { id: `bed-${i}`, kind: "bed" as const, length: q(8, "ft"), width: q(4, "ft") },
  );
  const classes = ["heavy", "medium", "light"] as const;
  const list = Array.from({ length: plantings }, (_, i) => {
    const start = `2026-${pad(4 + Math.floor(r() * 3))}-${pad(1 + Math.floor(r() * 28))}`;
    const end = `2026-${pad(8 + Math.floor(r() * 3))}-${pad(1 + Math.floor(r() * 28))}`;
    const roll = r();
    const rule =
      roll < 0.1
        ? {
            material: "tea" as const,
            method: "drench" as const,
            basis: "per-plant" as const,
            amount: q(0.1, "L"),
            recurrence: "FREQ=WEEKLY",
          }
        : roll < 0.2
          ? {
              material: "leachate" as const,
              method: "drench" as const,
              basis: "per-plant" as const,
              amount: q(1, "cup"),
              recurrence: "FREQ=WEEKLY;BYDAY=SU",
            }
          : undefined;
    return {
      id: `p-${i}`,
      bedId: (beds[i % bedCount] as { id: string }).id,
      feederClass: classes[Math.floor(r() * 3)] as (typeof classes)[number],
      plantCount: 1 + Math.floor(r() * 8),
      startDate: start,
      endDate: end,
      priority: 1 + Math.floor(r() * 5),
      ...(rule ? { rule } : {}),
    };
  });
  return {
    format: "castline-scenario",
    version: 1,
    garden: { name: `Bench garden (${plantings} plantings)` },
    settings: {
      unitSystem: "us",
      timeZone: "America/Chicago",
      lastSpringFrost: "04-15",
      firstFallFrost: "10-20",
    },
    bins,
    beds,
    plantings: list,
  } as Scenario;
}
