import { addDays } from "@/lib/engine";

// A planting's expected end, when the grower does not give one: planted day +
// the crop's days to harvest. Outdoors nothing grows on past the first fall
// frost (PRODUCT.md: the growing season runs last spring frost → first fall
// frost), so an outdoor planting's expected end stops at the first fall frost
// on or after its planting day — the same frost the engine ends its feeding at.

/** The first fall frost (kept as month and day, applied to every year) on or after `day`. */
export function nextFirstFallFrost(day: string, firstFallFrost: string): string {
  // The gardens table keeps "MM-DD"; a full date (older callers) keeps its month and day.
  const monthDay = firstFallFrost.slice(-5);
  const sameYear = `${day.slice(0, 4)}-${monthDay}`;
  return sameYear >= day ? sameYear : `${Number(day.slice(0, 4)) + 1}-${monthDay}`;
}

export function expectedEnd({
  plantedOn,
  daysToHarvest,
  indoors,
  firstFallFrost,
}: {
  plantedOn: string;
  daysToHarvest: number | null;
  indoors: boolean;
  /** The garden's setting ("YYYY-MM-DD"; only month and day count). */
  firstFallFrost: string;
}): string | null {
  if (!daysToHarvest) return null;
  const byDays = addDays(plantedOn, daysToHarvest);
  if (indoors) return byDays;
  const frost = nextFirstFallFrost(plantedOn, firstFallFrost);
  return byDays > frost ? frost : byDays;
}
