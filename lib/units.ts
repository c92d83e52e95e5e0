import { convert } from "convert";
import { EngineInputError } from "@/lib/engine/errors";

// SI inside the product: litre (volume), kilogram (mass), square metre (area),
// metre (length). Factors come from the `convert` package, whose definitions
// are the exact NIST Handbook 44 Appendix C values (1 lb = 0.45359237 kg,
// 1 in = 2.54 cm, 1 gal = 231 in³), rather than a hand-typed table.

export type Quantity = "volume" | "mass" | "area" | "length";
export type UnitSystem = "us" | "metric";
export const unitSystems = ["us", "metric"] as const;

/** Our unit names (what scenario files, forms and the API use). */
export const unitNames = [
  "mL",
  "L",
  "m3",
  "cm3",
  "fl-oz",
  "cup",
  "qt",
  "gal",
  "in3",
  "ft3",
  "g",
  "kg",
  "oz",
  "lb",
  "m2",
  "ft2",
  "in2",
  "acre",
  "mm",
  "cm",
  "m",
  "in",
  "ft",
] as const;
export type UnitName = (typeof unitNames)[number];

interface UnitDef {
  quantity: Quantity;
  /** Name the convert package knows it by. */
  lib: string;
  label: string;
}

const UNITS: Record<UnitName, UnitDef> = {
  mL: { quantity: "volume", lib: "mL", label: "mL" },
  L: { quantity: "volume", lib: "L", label: "L" },
  m3: { quantity: "volume", lib: "m3", label: "m³" },
  cm3: { quantity: "volume", lib: "cm3", label: "cm³" },
  "fl-oz": { quantity: "volume", lib: "fl oz", label: "fl oz" },
  cup: { quantity: "volume", lib: "cup", label: "cup" },
  qt: { quantity: "volume", lib: "qt", label: "qt" },
  gal: { quantity: "volume", lib: "gal", label: "gal" },
  in3: { quantity: "volume", lib: "in3", label: "in³" },
  ft3: { quantity: "volume", lib: "ft3", label: "ft³" },
  g: { quantity: "mass", lib: "g", label: "g" },
  kg: { quantity: "mass", lib: "kg", label: "kg" },
  oz: { quantity: "mass", lib: "oz", label: "oz" },
  lb: { quantity: "mass", lib: "lb", label: "lb" },
  m2: { quantity: "area", lib: "m2", label: "m²" },
  ft2: { quantity: "area", lib: "ft2", label: "ft²" },
  in2: { quantity: "area", lib: "in2", label: "in²" },
  acre: { quantity: "area", lib: "acre", label: "acre" },
  mm: { quantity: "length", lib: "mm", label: "mm" },
  cm: { quantity: "length", lib: "cm", label: "cm" },
  m: { quantity: "length", lib: "m", label: "m" },
  in: { quantity: "length", lib: "in", label: "in" },
  ft: { quantity: "length", lib: "ft", label: "ft" },
};

const SI_LIB: Record<Quantity, string> = { volume: "L", mass: "kg", area: "m2", length: "m" };
export const siUnit: Record<Quantity, UnitName> = { volume: "L", mass: "kg", area: "m2", length: "m" };

// One factor per unit, computed once: a conversion is then one multiply.
const FACTOR_TO_SI = new Map<UnitName, number>(
  unitNames.map((u) => {
    const def = UNITS[u];
    // The package's overloads are keyed on literal unit names; ours are checked above.
    const factor = (convert as unknown as (v: number, from: string) => { to(u: string): number })(
      1,
      def.lib,
    ).to(SI_LIB[def.quantity]);
    return [u, factor];
  }),
);

export function isUnitName(value: unknown): value is UnitName {
  return typeof value === "string" && Object.prototype.hasOwnProperty.call(UNITS, value);
}

/** Checks a unit name (and, if given, its quantity); EngineInputError naming `field` otherwise. */
export function parseUnit(value: unknown, field = "unit", quantity?: Quantity): UnitName {
  if (!isUnitName(value)) {
    throw new EngineInputError(field, `unknown unit "${String(value)}"; use one of ${unitNames.join(", ")}`);
  }
  if (quantity && UNITS[value].quantity !== quantity) {
    throw new EngineInputError(field, `"${value}" is a ${UNITS[value].quantity} unit, expected ${quantity}`);
  }
  return value;
}

export function quantityOf(unit: UnitName): Quantity {
  return UNITS[unit].quantity;
}

export function unitLabel(unit: UnitName): string {
  return UNITS[unit].label;
}

function factor(unit: unknown, field: string, quantity?: Quantity): number {
  const u = parseUnit(unit, `${field}.unit`, quantity);
  return FACTOR_TO_SI.get(u) as number;
}

function finite(value: unknown, field: string): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new EngineInputError(field, `must be a finite number (got ${String(value)})`);
  }
  return value;
}

/** value in `unit` → SI (L, kg, m², m). */
export function toSi(value: number, unit: UnitName | string, field = "value", quantity?: Quantity): number {
  return finite(value, field) * factor(unit, field, quantity);
}

/** SI value → `unit`. */
export function fromSi(value: number, unit: UnitName | string, field = "value", quantity?: Quantity): number {
  return finite(value, field) / factor(unit, field, quantity);
}

/** Between two units of the same quantity. */
export function convertUnit(value: number, from: UnitName, to: UnitName, field = "value"): number {
  const q = quantityOf(parseUnit(from, `${field}.unit`));
  return fromSi(toSi(value, from, field), to, field, q);
}

/** Which units a garden's setting shows, per kind of amount. */
export interface DisplayUnits {
  castingsMass: UnitName; // a harvest, stock
  castingsVolume: UnitName; // a per-plant scoop
  castingsVolumeLarge: UnitName; // bulk castings by volume
  liquid: UnitName; // leachate collected, tea brewed
  liquidSmall: UnitName; // a per-plant dose of tea
  area: UnitName; // beds, tray surface
  length: UnitName; // bed and tray sides
  depth: UnitName; // top-dressing depth
  trayVolume: UnitName; // tray inside volume
}

const DISPLAY: Record<UnitSystem, DisplayUnits> = {
  us: {
    castingsMass: "lb",
    castingsVolume: "cup",
    castingsVolumeLarge: "gal",
    liquid: "gal",
    liquidSmall: "fl-oz",
    area: "ft2",
    length: "ft",
    depth: "in",
    trayVolume: "in3",
  },
  metric: {
    castingsMass: "kg",
    castingsVolume: "L",
    castingsVolumeLarge: "L",
    liquid: "L",
    liquidSmall: "mL",
    area: "m2",
    length: "m",
    depth: "cm",
    trayVolume: "L",
  },
};

export function displayUnits(system: UnitSystem): DisplayUnits {
  const units = DISPLAY[system];
  if (!units) throw new EngineInputError("unitSystem", `must be "us" or "metric" (got ${String(system)})`);
  return units;
}

/**
 * A liquid volume in the garden's units, switching to the small unit below one
 * large unit (0.3 gal reads better as 38 fl oz).
 */
export function displayLiquid(litres: number, system: UnitSystem): { value: number; unit: UnitName } {
  const u = displayUnits(system);
  const large = fromSi(litres, u.liquid, "litres");
  return large >= 1 || litres === 0
    ? { value: large, unit: u.liquid }
    : { value: fromSi(litres, u.liquidSmall, "litres"), unit: u.liquidSmall };
}
