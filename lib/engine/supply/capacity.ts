import { toSi } from "@/lib/units";
import { dflt } from "@/lib/engine/core/defaults";
import { requireNonNegative, requirePositive } from "@/lib/engine/core/errors";
import { fmt } from "@/lib/engine/core/format";

// The surface rule, 1 ft² per lb of food per week, turned into SI with exact
// NIST factors (1 lb = 0.45359237 kg, 1 ft² = 0.09290304 m²).
const LB_KG = toSi(1, "lb");
const FT2_M2 = toSi(1, "ft2");

export interface CapacityInput {
  wormMassKg: number;
  /** Worm surface of the active tray, m². */
  surfaceM2: number;
  /** Food the grower plans to give, kg per week. */
  plannedFoodKgPerWeek: number;
  intakeFractionPerDay?: number;
  surfaceFt2PerLbPerWeek?: number;
}

export interface CapacityWarning {
  kind: "intake" | "surface";
  text: string;
  limitKgPerWeek: number;
  plannedKgPerWeek: number;
}

export interface CapacityCheck {
  /** Food the worms can process, kg/day (worm mass × intake). */
  intakeKgPerDay: number;
  /** Food the surface allows, kg/week. */
  surfaceKgPerWeek: number;
  /** The tighter of the two limits, kg/week. */
  limitKgPerWeek: number;
  plannedKgPerWeek: number;
  warnings: CapacityWarning[];
}

/** Is planned feeding within what the worms eat and what the surface allows? */
export function checkCapacity(input: CapacityInput, field = "capacity"): CapacityCheck {
  const mass = requireNonNegative(input.wormMassKg, `${field}.wormMassKg`, 1000);
  const surface = requirePositive(input.surfaceM2, `${field}.surfaceM2`, 100);
  const planned = requireNonNegative(
    input.plannedFoodKgPerWeek,
    `${field}.plannedFoodKgPerWeek`,
    10_000,
  );
  const intake = requirePositive(
    input.intakeFractionPerDay ?? dflt("wormIntakeFractionPerDay"),
    `${field}.intakeFractionPerDay`,
    2,
  );
  const ft2PerLb = requirePositive(
    input.surfaceFt2PerLbPerWeek ?? dflt("surfaceFt2PerLbFoodPerWeek"),
    `${field}.surfaceFt2PerLbPerWeek`,
    100,
  );
  const intakeKgPerDay = mass * intake;
  const surfaceKgPerWeek = (surface / FT2_M2 / ft2PerLb) * LB_KG;
  const warnings: CapacityWarning[] = [];
  if (planned > intakeKgPerDay * 7 + 1e-12) {
    warnings.push({
      kind: "intake",
      limitKgPerWeek: intakeKgPerDay * 7,
      plannedKgPerWeek: planned,
      text:
        `Planned ${fmt(planned, 2)} kg food a week is more than ${fmt(mass, 2)} kg of worms eat ` +
        `(${fmt(intake * 100, 0)} % of body weight a day = ${fmt(intakeKgPerDay * 7, 2)} kg a week).`,
    });
  }
  if (planned > surfaceKgPerWeek + 1e-12) {
    warnings.push({
      kind: "surface",
      limitKgPerWeek: surfaceKgPerWeek,
      plannedKgPerWeek: planned,
      text:
        `Planned ${fmt(planned, 2)} kg food a week needs more surface than ${fmt(surface, 2)} m² ` +
        `(${fmt(ft2PerLb, 2)} ft² per lb a week allows ${fmt(surfaceKgPerWeek, 2)} kg a week).`,
    });
  }
  return {
    intakeKgPerDay,
    surfaceKgPerWeek,
    limitKgPerWeek: Math.min(intakeKgPerDay * 7, surfaceKgPerWeek),
    plannedKgPerWeek: planned,
    warnings,
  };
}
