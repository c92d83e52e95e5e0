import { displayUnits, fromSi, unitLabel, type UnitName, type UnitSystem } from "@/lib/units";

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
  // °F = °C × 9/5 + 32 (NIST SP 811, B.8).
  return system === "us" ? `${Math.round((celsius * 9) / 5 + 32)} °F` : `${Math.round(celsius)} °C`;
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
