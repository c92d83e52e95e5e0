import { EngineInputError } from "@/lib/engine/core/errors";

// SI inside the product: litre (volume), kilogram (mass), square metre (area),
// metre (length). Every factor is built from the exact NIST Handbook 44
// Appendix C definitions (1 in = 2.54 cm, 1 lb = 0.45359237 kg, 1 gal = 231 in³,
// 1 acre = 43,560 ft²). The `convert` package gives the same numbers, but it
// ships as ESM only, which the tsx-run scripts (CommonJS) cannot load; the unit
// test checks this table against it.

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

const IN_M = 0.0254;
const FT_M = 12 * IN_M;
const IN3_L = IN_M ** 3 * 1000;
const GAL_L = 231 * IN3_L;
const LB_KG = 0.45359237;

interface UnitDef {
  quantity: Quantity;
  /** How many SI units (L, kg, m², m) one of this unit is. */
  toSi: number;
  label: string;
}

const UNITS: Record<UnitName, UnitDef> = {
  mL: { quantity: "volume", toSi: 0.001, label: "mL" },
  L: { quantity: "volume", toSi: 1, label: "L" },
  m3: { quantity: "volume", toSi: 1000, label: "m³" },
  cm3: { quantity: "volume", toSi: 0.001, label: "cm³" },
  "fl-oz": { quantity: "volume", toSi: GAL_L / 128, label: "fl oz" },
  cup: { quantity: "volume", toSi: GAL_L / 16, label: "cup" },
  qt: { quantity: "volume", toSi: GAL_L / 4, label: "qt" },
  gal: { quantity: "volume", toSi: GAL_L, label: "gal" },
  in3: { quantity: "volume", toSi: IN3_L, label: "in³" },
  ft3: { quantity: "volume", toSi: FT_M ** 3 * 1000, label: "ft³" },
  g: { quantity: "mass", toSi: 0.001, label: "g" },
  kg: { quantity: "mass", toSi: 1, label: "kg" },
  oz: { quantity: "mass", toSi: LB_KG / 16, label: "oz" },
  lb: { quantity: "mass", toSi: LB_KG, label: "lb" },
  m2: { quantity: "area", toSi: 1, label: "m²" },
  ft2: { quantity: "area", toSi: FT_M ** 2, label: "ft²" },
  in2: { quantity: "area", toSi: IN_M ** 2, label: "in²" },
  acre: { quantity: "area", toSi: 43_560 * FT_M ** 2, label: "acre" },
  mm: { quantity: "length", toSi: 0.001, label: "mm" },
  cm: { quantity: "length", toSi: 0.01, label: "cm" },
  m: { quantity: "length", toSi: 1, label: "m" },
  in: { quantity: "length", toSi: IN_M, label: "in" },
  ft: { quantity: "length", toSi: FT_M, label: "ft" },
};

export const siUnit: Record<Quantity, UnitName> = {
  volume: "L",
  mass: "kg",
  area: "m2",
  length: "m",
};

export function isUnitName(value: unknown): value is UnitName {
  return typeof value === "string" && Object.prototype.hasOwnProperty.call(UNITS, value);
}

/** Checks a unit name (and, if given, its quantity); EngineInputError naming `field` otherwise. */
export function parseUnit(value: unknown, field = "unit", quantity?: Quantity): UnitName {
  if (!isUnitName(value)) {
    throw new EngineInputError(
      field,
      `unknown unit "${String(value)}"; use one of ${unitNames.join(", ")}`,
    );
  }
  if (quantity && UNITS[value].quantity !== quantity) {
    throw new EngineInputError(
      field,
      `"${value}" is a ${UNITS[value].quantity} unit, expected ${quantity}`,
    );
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
  return UNITS[parseUnit(unit, `${field}.unit`, quantity)].toSi;
}

function finite(value: unknown, field: string): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new EngineInputError(field, `must be a finite number (got ${String(value)})`);
  }
  return value;
}

/** value in `unit` → SI (L, kg, m², m). */
export function toSi(
  value: number,
  unit: UnitName | string,
  field = "value",
  quantity?: Quantity,
): number {
  return finite(value, field) * factor(unit, field, quantity);
}

/** SI value → `unit`. */
export function fromSi(
  value: number,
  unit: UnitName | string,
  field = "value",
  quantity?: Quantity,
): number {
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
  if (!units)
    throw new EngineInputError("unitSystem", `must be "us" or "metric" (got ${String(system)})`);
  return units;
}

/**
 * A liquid volume in the garden's units, switching to the small unit below one
 * large unit (0.3 gal reads better as 38 fl oz).
 */
export function displayLiquid(
  litres: number,
  system: UnitSystem,
): { value: number; unit: UnitName } {
  const u = displayUnits(system);
  const large = fromSi(litres, u.liquid, "litres");
  return large >= 1 || litres === 0
    ? { value: large, unit: u.liquid }
    : { value: fromSi(litres, u.liquidSmall, "litres"), unit: u.liquidSmall };
}

/** Degrees Fahrenheit → Celsius: °C = (°F − 32) × 5/9 (NIST SP 811, B.8). */
export function fahrenheitToCelsius(fahrenheit: number): number {
  return ((fahrenheit - 32) * 5) / 9;
}

/** Degrees Celsius → Fahrenheit: °F = °C × 9/5 + 32 (NIST SP 811, B.8). */
export function celsiusToFahrenheit(celsius: number): number {
  return (celsius * 9) / 5 + 32;
}

/** The temperature scale a garden reads: "°F" for US customary, "°C" for metric. */
export function temperatureLabel(system: UnitSystem): string {
  return system === "us" ? "°F" : "°C";
}
