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
