import { describe, expect, it } from "vitest";
import type { Explanation } from "@/lib/engine";
import { explain } from "@/lib/explain-sentences";
import { formatDensity, formatTagged } from "@/lib/format-quantity";

// Conversion factors from NIST Handbook 44 (2024), Appendix C:
// 1 lb = 0.45359237 kg, 1 gal = 3.785411784 L, 1 ft³ = 28.316846592 L, 1 ft² = 0.09290304 m².
const LB_KG = 0.45359237;
const GAL_L = 3.785411784;

const knownNames: Record<string, string> = {
  "bin:b1": "Cedar stack",
  "planting:p1": "Tomatoes in Bed 1",
};
const names = (ref: string, id: string): string | undefined => knownNames[`${ref}:${id}`];

describe("explain: a month of castings", () => {
  const month: Explanation = {
    kind: "pool-month",
    inputs: {
      pool: { text: "castings" },
      opening: { unit: "kg", value: 20 * LB_KG },
      supplied: { unit: "kg", value: 44 * LB_KG },
      allocated: { unit: "kg", value: 50 * LB_KG },
      agedOut: { unit: "kg", value: 4 * LB_KG },
      closing: { unit: "kg", value: 10 * LB_KG },
      demand: { unit: "kg", value: 56 * LB_KG },
      shortfall: { unit: "kg", value: 6 * LB_KG },
    },
  };

  it("reads as opening + harvested − fed − aged out = closing, in pounds for a US garden", () => {
    const text = explain(month, { system: "us" }).sentences.join(" ");
    // 20 + 44 − 50 − 4 = 10 (the balance identity in PRODUCT.md).
    expect(text).toContain("20 lb on the shelf at the start, plus 44 lb harvested");
    expect(text).toContain("minus 50 lb fed and 4 lb past its shelf life, leaves 10 lb");
    expect(text).toContain("wanted 56 lb; 6 lb of that could not be served");
  });

  it("uses kilograms for a metric garden (20 lb = 9.07 kg, NIST HB 44)", () => {
    const text = explain(month, { system: "metric" }).sentences.join(" ");
    expect(text).toContain("9.1 kg on the shelf");
    expect(text).not.toContain("lb");
  });

  it("says all was served when nothing is short", () => {
    const covered = {
      ...month,
      inputs: { ...month.inputs, shortfall: { unit: "kg" as const, value: 0 } },
    };
    expect(explain(covered, { system: "us" }).sentences[1]).toMatch(/all of it was served/);
  });
});

describe("explain: other kinds", () => {
  it("names the bin and converts the tray and density (0.7 kg/L = 43.7 lb/ft³)", () => {
    const e: Explanation = {
      kind: "castings-forecast",
      inputs: {
        bin: { ref: "bin", id: "b1" },
        // PRODUCT.md: 21 × 17 × 5½ in inside = 1,963.5 in³ ≈ 32.2 L.
        trayVolume: { unit: "L", value: 1963.5 * 0.016387064 },
        fillFraction: { unit: "ratio", value: 0.9 },
        bulkDensity: { unit: "ratio", value: 0.7 },
        calibrationFactor: { unit: "ratio", value: 1 },
        calibrationHarvests: { unit: "count", value: 0 },
        perHarvest: { unit: "kg", value: 20.27 },
      },
    };
    const text = explain(e, { system: "us", nameOf: names }).sentences.join(" ");
    expect(text).toContain("Cedar stack");
    expect(text).toContain("1,964 in³");
    expect(text).toContain("90 % full");
    expect(text).toContain("44 lb per ft³");
    // 20.27 kg = 44.69 lb → "45 lb".
    expect(text).toContain("45 lb a harvest");
  });

  it("writes leachate in gallons and a pre-harvest block in plain words", () => {
    const e: Explanation = {
      kind: "pre-harvest-clean-lots",
      inputs: {
        planting: { ref: "planting", id: "p1" },
        need: { unit: "L", value: 1.2 * GAL_L },
        fromCleanLots: { unit: "L", value: 0 },
        manureStockRefused: { unit: "L", value: 1.2 * GAL_L },
      },
    };
    const text = explain(e, { system: "us", nameOf: names }).sentences.join(" ");
    expect(text).toContain("Tomatoes in Bed 1 is inside its pre-harvest interval");
    expect(text).toContain("wanted 1.2 gal");
  });

  it("falls back to labelled inputs for a kind without a template, and nests parts", () => {
    const e: Explanation = {
      kind: "out-of-season",
      inputs: { firstFallFrost: { date: "2026-10-18" } },
      parts: [
        {
          kind: "drain-logged",
          inputs: { bin: { ref: "bin", id: "zz" }, liquid: { unit: "L", value: GAL_L } },
        },
      ],
    };
    const out = explain(e, { system: "us" });
    expect(out.sentences).toEqual(["First fall frost: Oct 18, 2026."]);
    expect(out.parts[0]!.sentences).toEqual(["a bin: a drain of 1 gal was logged."]);
  });
});

describe("tagged figures", () => {
  it("shows a price per kg as a price per lb ($2.2046/kg × 0.45359237 = $1.00/lb)", () => {
    expect(formatTagged(1 / LB_KG, "money/kg", "us")).toBe("$1.00 per lb");
  });
  it("shows bulk density per litre in a metric garden", () => {
    expect(formatDensity(0.7, "metric")).toBe("0.7 kg per litre");
  });
});

describe("a tray-surface warning in the garden's units", () => {
  // Rule of thumb (common practice, PRODUCT.md): 1 ft² of tray surface per lb of food a week.
  // In metric: 0.09290304 m² / 0.45359237 kg = 0.2048 m² per kg (NIST HB 44, App. C).
  const warning = {
    kind: "capacity-surface",
    inputs: {
      bin: { ref: "bin", id: "b1" },
      month: { text: "2026-06" },
      months: { unit: "count", value: 1 },
      foodNeeded: { unit: "kg/week", value: 4.8 },
      limit: { unit: "kg/week", value: 2 },
      rule: { default: "surfaceFt2PerLbFoodPerWeek", source: "1 ft² per lb food per week" },
    },
  } as unknown as Explanation;

  it("says the rule in m² per kg for a metric garden", () => {
    const text = explain(warning, { system: "metric" }).sentences.join(" ");
    expect(text).toContain("0.2 m² of tray surface per kg of food a week");
    expect(text).not.toMatch(/ft²|\blb\b/);
  });

  it("and in ft² per lb for a US garden", () => {
    const text = explain(warning, { system: "us" }).sentences.join(" ");
    expect(text).toContain("1 ft² of tray surface per lb of food a week");
  });
});
