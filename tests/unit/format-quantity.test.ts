import { describe, expect, it } from "vitest";
import {
  formatAmount,
  formatPercent,
  formatTemperature,
  roundForDisplay,
} from "@/lib/format-quantity";

// Expected SI inputs are written out from NIST Handbook 44 (2024), Appendix C:
// 1 US cup = 236.5882365 mL, 1 gal = 3.785411784 L, 1 fl oz = 29.5735295625 mL,
// 1 lb = 0.45359237 kg, 1 ft² = 0.09290304 m², 1 in = 2.54 cm.
const CUP_L = 0.2365882365;
const GAL_L = 3.785411784;
const LB_KG = 0.45359237;
const FT2_M2 = 0.09290304;
const IN_M = 0.0254;

describe("formatAmount, US customary", () => {
  it("shows scoops in quarter cups, as measured (PRODUCT.md: ¾–1 cup per plant)", () => {
    expect(formatAmount(0.75 * CUP_L, "castings-volume", "us")).toBe("¾ cup");
    expect(formatAmount(1 * CUP_L, "castings-volume", "us")).toBe("1 cup");
    expect(formatAmount(1.5 * CUP_L, "castings-volume", "us")).toBe("1 ½ cup");
    // 0.74 cup is a quarter-cup scoop short of nothing: still ¾.
    expect(formatAmount(0.74 * CUP_L, "castings-volume", "us")).toBe("¾ cup");
  });

  it("shows a harvest in whole pounds and small amounts in ounces", () => {
    // 20.27 kg ÷ 0.45359237 kg/lb = 44.69 lb.
    expect(formatAmount(20.27, "castings-mass", "us")).toBe("45 lb");
    // 0.25 lb = 4 oz exactly (16 oz per lb).
    expect(formatAmount(0.25 * LB_KG, "castings-mass", "us")).toBe("4 oz");
    expect(formatAmount(2.5 * LB_KG, "castings-mass", "us")).toBe("2.5 lb");
  });

  it("shows liquids in gallons with one decimal, fluid ounces below a gallon", () => {
    expect(formatAmount(1.2 * GAL_L, "liquid", "us")).toBe("1.2 gal");
    // 0.3 gal = 38.4 fl oz (128 fl oz per gal).
    expect(formatAmount(0.3 * GAL_L, "liquid", "us")).toBe("38 fl oz");
    expect(formatAmount(0, "liquid", "us")).toBe("0 gal");
  });

  it("shows areas and depths the way a bed is described", () => {
    // An 8 × 4 ft bed is 32 ft².
    expect(formatAmount(32 * FT2_M2, "area", "us")).toBe("32 ft²");
    expect(formatAmount(0.5 * IN_M, "depth", "us")).toBe("½ in");
  });
});

describe("formatAmount, metric", () => {
  it("uses kilograms, litres and millilitres", () => {
    expect(formatAmount(20.27, "castings-mass", "metric")).toBe("20 kg");
    expect(formatAmount(0.4, "castings-mass", "metric")).toBe("400 g");
    // ¾ cup = 177.44 mL.
    expect(formatAmount(0.75 * CUP_L, "castings-volume", "metric")).toBe("177 mL");
    expect(formatAmount(4.5424941, "liquid", "metric")).toBe("4.5 L");
  });
});

describe("roundForDisplay", () => {
  it("keeps two significant figures below one and none from ten up", () => {
    expect(roundForDisplay(0.012345)).toBe(0.012);
    expect(roundForDisplay(3.14159)).toBe(3.1);
    expect(roundForDisplay(1963.5)).toBe(1964);
    expect(roundForDisplay(-0.75)).toBe(-0.75);
  });
});

describe("formatTemperature", () => {
  it("converts the NC State Extension band 55–77 °F (12.8–25 °C) by °F = °C × 9/5 + 32", () => {
    expect(formatTemperature(25, "us")).toBe("77 °F");
    expect(formatTemperature((55 - 32) * (5 / 9), "us")).toBe("55 °F");
    expect(formatTemperature(25, "metric")).toBe("25 °C");
  });
});

describe("formatPercent", () => {
  it("rounds a share to whole percent", () => {
    expect(formatPercent(0.784)).toBe("78 %");
    expect(formatPercent(Number.NaN)).toBe("—");
  });
});
