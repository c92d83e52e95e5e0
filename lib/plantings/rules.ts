import { defaultRuleFor, type FeederClass, type FeedingRuleInput } from "@/lib/engine";
import { findListedCrop } from "@/lib/crops/crop-list";
import { toSi } from "@/lib/units";

// Which rule a planting is fed by, and crop facts the planting form needs.

export type RuleSource = "planting" | "crop" | "default";

/** The engine's default for a feeder class, in the shape rules are stored and sent (SI). */
export function defaultRuleInput(feederClass: FeederClass): FeedingRuleInput {
  const r = defaultRuleFor(feederClass);
  return {
    material: r.material,
    method: r.method,
    basis: r.basis,
    measure:
      r.basis === "percent-of-mix" ? "percent-of-mix" : r.amountUnit === "kg" ? "mass" : "volume",
    amount: r.amount,
    recurrence: r.recurrence,
    dilutionWaterParts: r.dilutionWaterParts ?? null,
    teaCastingsPerWater: null,
  };
}

/**
 * The rules a planting is fed by: its own when it has any, else its crop's,
 * else the feeder-class default (as loadGardenInputs decides).
 */
export function effectiveRules(
  own: readonly FeedingRuleInput[],
  crop: readonly FeedingRuleInput[],
  feederClass: FeederClass,
): { rules: FeedingRuleInput[]; source: RuleSource } {
  if (own.length) return { rules: [...own], source: "planting" };
  if (crop.length) return { rules: [...crop], source: "crop" };
  return { rules: [defaultRuleInput(feederClass)], source: "default" };
}

/**
 * Spacing and days to harvest: the crop's own (a garden's numbers), else the
 * crop list's (common practice, from memory), else unknown.
 */
export function cropFacts(crop: {
  name: string | null;
  spacingM?: number | null;
  daysToHarvest?: number | null;
}): { spacingM: number | null; daysToHarvest: number | null } {
  const listed = findListedCrop(crop.name);
  return {
    spacingM: crop.spacingM ?? (listed ? toSi(listed.spacingIn, "in") : null),
    daysToHarvest: crop.daysToHarvest ?? listed?.daysToHarvest ?? null,
  };
}

/**
 * How crowded plantings make a bed: the area their spacing needs (count ×
 * spacing², one square per plant) over the bed's area. 1 = exactly full.
 * null when the bed's area or a crop's spacing is unknown.
 */
export function crowding(
  areaM2: number | null,
  plantings: { count: number; spacingM: number | null }[],
): number | null {
  if (!areaM2 || plantings.some((p) => p.spacingM === null)) return null;
  const need = plantings.reduce((sum, p) => sum + p.count * p.spacingM! ** 2, 0);
  return need / areaM2;
}

/** Above this, plantings are refused unless the grower confirms: "far beyond the spacing". */
export const CROWDED_REFUSE_RATIO = 3;
