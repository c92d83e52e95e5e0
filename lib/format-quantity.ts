import type { ExplainValue } from "@/lib/engine";
import {
  celsiusToFahrenheit,
  displayUnits,
  fromSi,
  temperatureLabel,
  toSi,
  unitLabel,
  type UnitName,
  type UnitSystem,
} from "@/lib/units";

// The one place an SI quantity becomes words on a screen, in a CSV or in an
// e-mail, in the garden's units. Rounding follows how growers measure: a scoop
// is "¾ cup", not "0.7500 cup"; a harvest is "44 lb"; a jug is "1.2 gal".

/** What an amount is, which decides the unit it is shown in. */
export type AmountKind =
  | "castings-mass" // a harvest, stock on the shelf (kg)
  | "castings-volume" // a per-plant scoop (L)
  | "liquid" // leachate, tea (L)
  | "area" // a bed, a tray surface (m²)
  | "length" // a bed or tray side (m)
  | "depth" // a top-dressing depth (m)
  | "tray-volume" // a tray's inside volume (L)
  | "tray-side"; // a tray's inside length, width or depth (m), read off a tape in in or cm

export interface DisplayAmount {
  value: number;
  unit: UnitName;
  /** The rounded number as shown, e.g. "¾", "1.2", "1,964". */
  text: string;
  /** Number and unit together, e.g. "¾ cup". */
  label: string;
}

const FRACTIONS: Record<number, string> = { 0.25: "¼", 0.5: "½", 0.75: "¾" };

const numberFormat = new Intl.NumberFormat("en-US", { maximumFractionDigits: 2 });

/**
 * Rounds to what a person would read off: whole numbers from 10 up, one decimal
 * from 1 to 10, two significant figures below 1.
 */
export function roundForDisplay(value: number): number {
  const magnitude = Math.abs(value);
  if (magnitude === 0) return 0;
  if (magnitude >= 10) return Math.round(value);
  if (magnitude >= 1) return Math.round(value * 10) / 10;
  const digits = 1 - Math.floor(Math.log10(magnitude));
  const scale = 10 ** digits;
  return Math.round(value * scale) / scale;
}

/** A cup count in quarters below 4 cups ("1 ¾"), as people measure with a scoop. */
function cupText(cups: number): { value: number; text: string } {
  if (cups >= 4) {
    const value = Math.round(cups * 2) / 2;
    return { value, text: numberFormat.format(value) };
  }
  const quarters = Math.round(cups * 4) / 4;
  if (quarters === 0) return smallNumber(cups);
  const whole = Math.floor(quarters);
  const fraction = FRACTIONS[quarters - whole];
  const text = fraction ? (whole ? `${whole} ${fraction}` : fraction) : String(whole);
  return { value: quarters, text };
}

function smallNumber(value: number): { value: number; text: string } {
  const rounded = roundForDisplay(value);
  return { value: rounded, text: numberFormat.format(rounded) };
}

function amount(value: number, unit: UnitName, text?: string): DisplayAmount {
  const shown = text ?? numberFormat.format(value);
  return { value, unit, text: shown, label: `${shown} ${unitLabel(unit)}` };
}

/** Chooses the unit for `kind` in `system` and the rounding that suits it. */
export function toDisplayAmount(si: number, kind: AmountKind, system: UnitSystem): DisplayAmount {
  if (!Number.isFinite(si)) return { value: NaN, unit: "L", text: "—", label: "—" };
  const units = displayUnits(system);
  switch (kind) {
    case "castings-mass": {
      // Below one pound (or kilogram) a scale reads ounces (or grams).
      const small: UnitName = system === "us" ? "oz" : "g";
      const large = fromSi(si, units.castingsMass);
      if (Math.abs(large) >= 1 || si === 0)
        return amount(roundForDisplay(large), units.castingsMass);
      return amount(roundForDisplay(fromSi(si, small)), small);
    }
    case "castings-volume": {
      if (system === "us") {
        const cups = fromSi(si, "cup");
        if (Math.abs(cups) >= 16) return amount(roundForDisplay(fromSi(si, "gal")), "gal");
        const { value, text } = cupText(cups);
        return amount(value, "cup", text);
      }
      if (Math.abs(si) >= 1 || si === 0) return amount(roundForDisplay(si), "L");
      return amount(roundForDisplay(fromSi(si, "mL")), "mL");
    }
    case "liquid": {
      const large = fromSi(si, units.liquid);
      if (Math.abs(large) >= 1 || si === 0) return amount(roundForDisplay(large), units.liquid);
      return amount(roundForDisplay(fromSi(si, units.liquidSmall)), units.liquidSmall);
    }
    case "area":
      return amount(roundForDisplay(fromSi(si, units.area)), units.area);
    case "length":
      return amount(roundForDisplay(fromSi(si, units.length)), units.length);
    case "depth": {
      if (system === "us") {
        // Top-dressing depths are spoken in quarter inches.
        const { value, text } = cupText(fromSi(si, "in"));
        return amount(value, "in", text);
      }
      return amount(roundForDisplay(fromSi(si, units.depth)), units.depth);
    }
    case "tray-volume":
      return amount(roundForDisplay(fromSi(si, units.trayVolume)), units.trayVolume);
    case "tray-side": {
      // Boards are measured to the quarter inch (PS 20 sizes are in quarters: 5½, 7¼).
      if (system === "us") {
        const { value, text } = cupText(fromSi(si, "in"));
        return amount(value, "in", text);
      }
      return amount(roundForDisplay(fromSi(si, "cm")), "cm");
    }
  }
}

/** "¾ cup", "44 lb", "1.2 gal": an SI amount in the garden's units. */
export function formatAmount(si: number, kind: AmountKind, system: UnitSystem): string {
  return toDisplayAmount(si, kind, system).label;
}

/** A temperature given in °C, shown in °F for US gardens. Whole degrees. */
export function formatTemperature(celsius: number, system: UnitSystem): string {
  if (!Number.isFinite(celsius)) return "—";
  const degrees = system === "us" ? celsiusToFahrenheit(celsius) : celsius;
  return `${Math.round(degrees)} ${temperatureLabel(system)}`;
}

/** A share as a whole percentage, e.g. 0.784 → "78 %". */
export function formatPercent(share: number): string {
  if (!Number.isFinite(share)) return "—";
  return `${Math.round(share * 100)} %`;
}

/** Money at the garden's price, e.g. 44.69 → "$44.69". */
export function formatMoney(dollars: number): string {
  if (!Number.isFinite(dollars)) return "—";
  return new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" }).format(dollars);
}

/** The two stock pools of the balance: castings by mass, leachate by volume. */
export type PoolKind = "castings" | "leachate";

/** A pool amount (kg castings or L leachate) in the garden's units, e.g. "44 lb", "1.2 gal". */
export function formatPoolAmount(si: number, pool: PoolKind, system: UnitSystem): string {
  return formatAmount(si, pool === "castings" ? "castings-mass" : "liquid", system);
}

/** Units an engine figure is tagged with: named once, in the engine's ExplainValue. */
export type SiTag = Extract<ExplainValue, { unit: unknown }>["unit"];

const countFormat = new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 });

/**
 * Any tagged engine figure in words, in the garden's units: "44 lb", "0.3 lb a day",
 * "$1.00 per lb", "60 days", "78 %". Rates per area are shown per ft² or m².
 */
export function formatTagged(value: number, tag: SiTag, system: UnitSystem): string {
  if (!Number.isFinite(value)) return "—";
  const area = displayUnits(system).area;
  const perArea = fromSi(1, area) === 0 ? 1 : 1 / fromSi(1, area); // m² in one display area unit
  switch (tag) {
    case "kg":
      return formatAmount(value, "castings-mass", system);
    case "L":
      return formatAmount(value, "liquid", system);
    case "m":
      return formatAmount(value, "length", system);
    case "m2":
      return formatAmount(value, "area", system);
    case "kg/m2":
      return `${formatAmount(value * perArea, "castings-mass", system)} per ${unitLabel(area)}`;
    case "L/m2":
      return `${formatAmount(value * perArea, "liquid", system)} per ${unitLabel(area)}`;
    case "kg/day":
      return `${formatAmount(value, "castings-mass", system)} a day`;
    case "kg/week":
      return `${formatAmount(value, "castings-mass", system)} a week`;
    case "L/day":
      return `${formatAmount(value, "liquid", system)} a day`;
    case "L/week":
      return `${formatAmount(value, "liquid", system)} a week`;
    case "money":
      return formatMoney(value);
    case "money/kg": {
      const unit = displayUnits(system).castingsMass;
      return `${formatMoney(toSi(1, unit) * value)} per ${unitLabel(unit)}`;
    }
    case "percent":
      return `${Math.round(value)} %`;
    case "ratio":
      return numberFormat.format(roundForDisplay(value));
    case "days":
      return `${countFormat.format(value)} ${Math.round(value) === 1 ? "day" : "days"}`;
    case "count":
      return countFormat.format(value);
  }
}

/** A bulk density given in kg per litre, as lb per ft³ (US) or kg per litre (metric). */
export function formatDensity(kgPerL: number, system: UnitSystem): string {
  if (!Number.isFinite(kgPerL)) return "—";
  if (system === "metric") return `${numberFormat.format(roundForDisplay(kgPerL))} kg per litre`;
  const lbPerFt3 = fromSi(kgPerL * toSi(1, "ft3"), "lb");
  return `${numberFormat.format(roundForDisplay(lbPerFt3))} lb per ft³`;
}

/**
 * The one unit a table column of `kind` is in (a CSV column or a sortable table
 * column cannot switch to oz or fl oz for its small rows the way a label does).
 */
export function columnUnit(kind: AmountKind, system: UnitSystem): UnitName {
  const units = displayUnits(system);
  switch (kind) {
    case "castings-mass":
      return units.castingsMass;
    case "castings-volume":
      return units.castingsVolume;
    case "liquid":
      return units.liquid;
    case "area":
      return units.area;
    case "length":
      return units.length;
    case "depth":
      return units.depth;
    case "tray-volume":
      return units.trayVolume;
    case "tray-side":
      return system === "us" ? "in" : "cm";
  }
}

/** An SI amount as a number in its column's unit, rounded as on screen (44, 1.2, 0.75). */
export function toColumnValue(si: number, kind: AmountKind, system: UnitSystem): number {
  return roundForDisplay(fromSi(si, columnUnit(kind, system)));
}

/** "Castings opening (lb)": a column header with its unit. */
export function columnHeader(title: string, kind: AmountKind, system: UnitSystem): string {
  return `${title} (${unitLabel(columnUnit(kind, system))})`;
}

// toColumnValue has already rounded (two significant figures below 1): show every digit it kept.
const columnNumber = new Intl.NumberFormat("en-US", { maximumFractionDigits: 6 });

/** An amount in its column's fixed unit, e.g. "0.75 lb" (the table beside its CSV shows the same number). */
export function formatColumnAmount(si: number, kind: AmountKind, system: UnitSystem): string {
  if (!Number.isFinite(si)) return "—";
  return `${columnNumber.format(toColumnValue(si, kind, system))} ${unitLabel(columnUnit(kind, system))}`;
}
