import { dflt } from "@/lib/engine/core/defaults";
import type { Basis, FeederClass, Material, Method } from "@/lib/engine/core/types";

/**
 * What a planting is fed. `amount` is per unit of `basis`, in SI:
 * - per-plant: per plant;
 * - per-area: per m² of bed (for castings in L, 1 L/m² is a 1 mm layer);
 * - per-container-volume: per litre of container soil;
 * - percent-of-mix: percent (0–100) of the container's volume, castings only.
 */
export interface FeedingRule {
  material: Material;
  method: Method;
  basis: Basis;
  amount: number;
  /** Castings measured by volume ("L", the default) or by mass ("kg"). Liquids are always L. */
  amountUnit?: "L" | "kg";
  /** RRULE (RFC 5545), e.g. "FREQ=MONTHLY"; anchored on the planting's first day. */
  recurrence: string;
  /**
   * Leachate only: `amount` is litres of diluted solution made with this many
   * parts water per part leachate (default 10, Arthur et al.); 0 = fed undiluted.
   */
  dilutionWaterParts?: number;
}

/** Castings per plant by feeder class (common practice; see DEFAULTS for sources). */
export function defaultRuleFor(feederClass: FeederClass): FeedingRule {
  switch (feederClass) {
    case "heavy":
      return castingsPerPlant(dflt("heavyCastingsPerPlantL"), "FREQ=MONTHLY");
    case "medium":
      return castingsPerPlant(dflt("mediumCastingsPerPlantL"), "FREQ=MONTHLY");
    case "light":
      return castingsPerPlant(dflt("lightCastingsPerPlantL"), "FREQ=MONTHLY;INTERVAL=2");
  }
}

function castingsPerPlant(litres: number, recurrence: string): FeedingRule {
  return {
    material: "castings",
    method: "top-dress",
    basis: "per-plant",
    amount: litres,
    amountUnit: "L",
    recurrence,
  };
}

/** Tea: 100 mL of 10 % solution per plant weekly (Arancon, via conference notes). */
export const DEFAULT_TEA_RULE: FeedingRule = {
  material: "tea",
  method: "drench",
  basis: "per-plant",
  amount: dflt("teaPerPlantL"),
  recurrence: "FREQ=WEEKLY",
};

/**
 * Bed top-dressing ¼ in deep (Cumberland County SWCD: ¼–⅜ in), as litres per m²
 * (depth in mm). Once, on the planting's first day: the sources give a depth, not
 * a rhythm, so repeating it is the grower's call.
 */
export const DEFAULT_BED_TOPDRESS_RULE: FeedingRule = {
  material: "castings",
  method: "top-dress",
  basis: "per-area",
  amount: dflt("bedTopDressDepthM") * 1000,
  amountUnit: "L",
  recurrence: "FREQ=DAILY;COUNT=1",
};

/** Potting mix 10 % castings by volume (Atiyeh et al. 2000), mixed in once at planting. */
export const DEFAULT_POTTING_MIX_RULE: FeedingRule = {
  material: "castings",
  method: "soil-mix",
  basis: "percent-of-mix",
  amount: dflt("pottingMixCastingsPercent"),
  recurrence: "FREQ=DAILY;COUNT=1",
};
