// Words for the balance's numbers. Amounts are written in SI here; `inputs`
// carry the raw figures so the UI can re-render them in the garden's units.
import type { Explanation } from "@/lib/engine/core/types";

/** One decimal, never "-0.0", never NaN (callers only pass finite numbers). */
export function fmt(n: number, digits = 1): string {
  const v = Math.abs(n) < 0.5 * 10 ** -digits ? 0 : n;
  return v.toFixed(digits);
}

export function explainPoolMonth(
  unit: "kg" | "L",
  row: {
    month: string;
    opening: number;
    supplied: number;
    allocated: number;
    agedOut: number;
    closing: number;
    demand: number;
    shortfall: number;
  },
  words: { supplied: string; agedOut: string },
): Explanation {
  let text =
    `${row.month}: opening ${fmt(row.opening)} ${unit} + ${fmt(row.supplied)} ${unit} ${words.supplied}` +
    ` − ${fmt(row.allocated)} ${unit} fed − ${fmt(row.agedOut)} ${unit} ${words.agedOut}` +
    ` = ${fmt(row.closing)} ${unit}`;
  text +=
    row.shortfall > 0
      ? `; wanted ${fmt(row.demand)} ${unit}, ${fmt(row.shortfall)} ${unit} short`
      : `; wanted ${fmt(row.demand)} ${unit}, all covered`;
  return {
    text,
    inputs: {
      unit,
      opening: row.opening,
      supplied: row.supplied,
      allocated: row.allocated,
      agedOut: row.agedOut,
      closing: row.closing,
      demand: row.demand,
      shortfall: row.shortfall,
    },
  };
}

export function explainCoverage(
  unit: "kg" | "L",
  count: number,
  need: number,
  allocated: number,
  pct: number,
  tea: boolean,
): Explanation {
  const what = tea ? `${unit} castings to brew tea` : unit;
  return {
    text:
      `${count} application${count === 1 ? "" : "s"} wanted ${fmt(need, 2)} ${what}; ` +
      `${fmt(allocated, 2)} allocated (${fmt(pct, 0)} %)`,
    inputs: { count, need, allocated, coveragePct: pct },
  };
}

export function explainSurplus(
  agedOut: number,
  closing: number,
  pricePerLb: number,
  value: number,
): Explanation {
  return {
    text:
      `${fmt(agedOut)} kg aged out + ${fmt(closing)} kg left at the end = ${fmt(agedOut + closing)} kg ` +
      `not used by the plan, worth ${fmt(value, 2)} at ${fmt(pricePerLb, 2)} per lb`,
    inputs: { agedOut, closing, pricePerLb, value },
  };
}
