import { displayUnits, fromSi, toSi, unitLabel, type UnitName, type UnitSystem } from "@/lib/units";

// A feeding rule's amount as a grower enters it in the what-if panel: in the garden's
// units, per plant or per area as the rule measures it, converted only through
// lib/units. The engine keeps the amount in SI in the rule's own measure:
//   per-plant            kg (mass) or L (volume) per plant
//   per-area             kg/m² (mass) or L/m² (volume; for castings 1 L/m² is a 1 mm layer)
//   per-container-volume L of material per L of container
//   percent-of-mix       % (no unit)

export interface RuleShape {
  material: string;
  measure: string;
  basis: string;
}

export interface AmountEntry {
  /** What the number means, e.g. "cup per plant", "in deep", "lb per ft²". */
  label: string;
  toSi: (value: number) => number;
  fromSi: (si: number) => number;
}

const ratio = (label: string, top: UnitName, bottom: UnitName): AmountEntry => ({
  label,
  toSi: (v) => toSi(v, top, "amount") / toSi(1, bottom, "amount"),
  fromSi: (si) => fromSi(si * toSi(1, bottom, "amount"), top, "amount"),
});

const perPlant = (unit: UnitName): AmountEntry => ({
  label: `${unitLabel(unit)} per plant`,
  toSi: (v) => toSi(v, unit, "amount"),
  fromSi: (si) => fromSi(si, unit, "amount"),
});

export function amountEntryFor(rule: RuleShape, system: UnitSystem): AmountEntry {
  const u = displayUnits(system);
  const castings = rule.material === "castings";
  const perPlantUnit: UnitName =
    rule.measure === "mass" ? u.castingsMass : castings ? u.castingsVolume : u.liquidSmall;
  switch (rule.basis) {
    case "per-plant":
      return perPlant(perPlantUnit);
    case "per-area": {
      if (rule.measure === "volume" && castings) {
        // L/m² is a depth in mm: 1 L spread over 1 m² stands 1 mm high.
        const depth = u.depth;
        return {
          label: `${unitLabel(depth)} deep`,
          toSi: (v) => toSi(v, depth, "amount") * 1000,
          fromSi: (si) => fromSi(si / 1000, depth, "amount"),
        };
      }
      const top = rule.measure === "mass" ? u.castingsMass : u.liquid;
      return ratio(`${unitLabel(top)} per ${unitLabel(u.area)}`, top, u.area);
    }
    case "per-container-volume": {
      const top = castings ? u.castingsVolume : u.liquidSmall;
      return ratio(
        `${unitLabel(top)} per ${unitLabel(u.castingsVolumeLarge)} of pot`,
        top,
        u.castingsVolumeLarge,
      );
    }
    default:
      return { label: "% of the mix", toSi: (v) => v, fromSi: (si) => si };
  }
}

/**
 * Largest amount a planting's rule may be set to, by basis and measure (SI). Sanity
 * bounds, not advice: each is several times the largest common-practice dose —
 * heavy feeders get ¾–1 cup of castings per plant monthly (PRODUCT.md), 1 cup =
 * 0.2366 L ≈ 0.17 kg at 0.7 kg/L; top-dressing ¼–½ in (Cumberland County SWCD),
 * ½ in = 12.7 mm = 12.7 L/m² ≈ 8.9 kg/m²; potting mix above 20 % castings is
 * warned about (Atiyeh et al. 2000).
 */
const MAX_AMOUNT: Record<string, { max: number; unit: string }> = {
  "per-plant:mass": { max: 2, unit: "kg per plant" },
  "per-plant:volume:castings": { max: 3, unit: "L per plant" },
  "per-plant:volume": { max: 20, unit: "L per plant" },
  "per-area:mass": { max: 20, unit: "kg per m²" },
  "per-area:volume": { max: 30, unit: "L per m²" },
  "per-container-volume:volume": { max: 0.5, unit: "L per L of container" },
  "percent-of-mix:percent-of-mix": { max: 50, unit: "% of the mix" },
};

/** The bound for a rule's amount (SI, in its own measure), or undefined when none applies. */
export function amountLimit(rule: RuleShape): { max: number; unit: string } | undefined {
  const key = `${rule.basis}:${rule.measure}`;
  return (
    (rule.material === "castings" ? MAX_AMOUNT[`${key}:castings`] : undefined) ?? MAX_AMOUNT[key]
  );
}

/**
 * The largest amount the what-if accepts for this rule, in the entry's units, to two
 * significant digits rounded down (a bound shown rounded up would itself be refused).
 */
export function largestEntry(rule: RuleShape, entry: AmountEntry): number | null {
  const limit = amountLimit(rule);
  if (!limit) return null;
  const most = entry.fromSi(limit.max);
  const step = 10 ** (Math.floor(Math.log10(most)) - 1);
  return Number((Math.floor(most / step + 1e-9) * step).toPrecision(2));
}
