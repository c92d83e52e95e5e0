import { convert } from "convert";
import { EngineInputError } from "@/lib/engine";
import {
  convertUnit,
  quantityOf,
  siUnit,
  displayLiquid,
  displayUnits,
  fromSi,
  parseUnit,
  toSi,
  unitNames,
} from "@/lib/units";

// Every expected value below is from NIST Handbook 44 (2024), Appendix C,
// "General Tables of Units of Measurement" — exact definitions, not rounded.
describe("units against NIST Handbook 44 Appendix C", () => {
  const cases: Array<[number, string, string, number]> = [
    [1, "cup", "mL", 236.5882365], // 1 cup = 236.5882365 mL
    [1, "gal", "L", 3.785411784], // 1 US gal = 3.785411784 L
    [1, "gal", "in3", 231], // 1 US gal = 231 in³
    [1, "ft3", "L", 28.316846592], // 1 ft³ = 28.316846592 L
    [1, "lb", "kg", 0.45359237], // 1 lb = 0.45359237 kg
    [1, "in3", "cm3", 16.387064], // 1 in³ = 16.387064 cm³
    [1, "acre", "ft2", 43_560], // 1 acre = 43,560 ft²
    [1, "fl-oz", "mL", 29.5735295625], // 1 fl oz = 29.5735295625 mL
    [1, "qt", "L", 0.946352946], // 1 qt = 0.946352946 L
    [1, "oz", "g", 28.349523125], // 1 oz (avdp) = 28.349523125 g
    [1, "in", "cm", 2.54], // 1 in = 2.54 cm exactly
    [1, "ft2", "m2", 0.09290304], // 1 ft² = 0.09290304 m²
  ];
  it.each(cases)("%d %s = %d %s", (value, from, to, expected) => {
    const got = convertUnit(value, parseUnit(from), parseUnit(to));
    // 12 significant digits: float noise is ~1e-16 relative, a wrong factor is far larger.
    expect(Math.abs(got - expected) / expected).toBeLessThan(1e-12);
  });

  it("goes to SI and back without drift", () => {
    for (const unit of unitNames) {
      expect(fromSi(toSi(3.7, unit), unit)).toBeCloseTo(3.7, 12);
    }
  });

  it("toSi returns litres, kilograms, square metres, metres", () => {
    expect(toSi(2, "gal")).toBeCloseTo(7.570823568, 12); // 2 × 3.785411784 L (NIST)
    expect(toSi(5, "lb")).toBeCloseTo(2.26796185, 12); // 5 × 0.45359237 kg (NIST)
    expect(toSi(32, "ft2")).toBeCloseTo(2.97289728, 12); // 32 × 0.09290304 m² (NIST)
    expect(toSi(6, "in")).toBeCloseTo(0.1524, 12); // 6 × 2.54 cm (NIST)
  });
});

describe("unit errors name the field", () => {
  it("rejects an unknown unit", () => {
    expect(() => toSi(1, "bushel-ish", "rule.amount")).toThrow(EngineInputError);
    try {
      toSi(1, "bushel-ish", "rule.amount");
    } catch (e) {
      expect((e as EngineInputError).field).toBe("rule.amount.unit");
      expect((e as Error).message).toMatch(/unknown unit "bushel-ish"/);
    }
  });

  it("rejects a unit of the wrong quantity", () => {
    expect(() => toSi(1, "lb", "tray.volume", "volume")).toThrow(/mass unit, expected volume/);
  });

  it("rejects NaN and Infinity rather than passing them on", () => {
    expect(() => toSi(Number.NaN, "L", "amount")).toThrow(/amount: must be a finite number/);
    expect(() => fromSi(Number.POSITIVE_INFINITY, "L", "amount")).toThrow(EngineInputError);
  });
});

describe("display preference", () => {
  it("shows castings in lb and cups (US) or kg and litres (metric)", () => {
    expect(displayUnits("us")).toMatchObject({
      castingsMass: "lb",
      castingsVolume: "cup",
      area: "ft2",
    });
    expect(displayUnits("metric")).toMatchObject({
      castingsMass: "kg",
      castingsVolume: "L",
      area: "m2",
    });
  });

  it("switches liquids to the small unit under one large unit", () => {
    // 1 US gal = 3.785411784 L, 1 fl oz = 29.5735295625 mL (NIST) → 1 L = 33.814 fl oz
    expect(displayLiquid(1, "us").unit).toBe("fl-oz");
    expect(displayLiquid(1, "us").value).toBeCloseTo(33.8140227, 6);
    expect(displayLiquid(7.570823568, "us")).toEqual({ value: expect.closeTo(2, 10), unit: "gal" });
    expect(displayLiquid(0.25, "metric")).toEqual({ value: expect.closeTo(250, 10), unit: "mL" });
  });

  it("rejects an unknown unit system", () => {
    expect(() => displayUnits("imperial" as "us")).toThrow(/unitSystem/);
  });
});

describe("our factor table agrees with the convert package (8.0.2)", () => {
  // Library names for ours where they differ; the rest are spelled the same.
  const libName: Record<string, string> = { "fl-oz": "fl oz" };
  const siLib = { volume: "L", mass: "kg", area: "m2", length: "m" } as const;
  it.each(unitNames)("%s", (unit) => {
    const convertAny = convert as unknown as (v: number, u: string) => { to(u: string): number };
    const expected = convertAny(1, libName[unit] ?? unit).to(siLib[quantityOf(unit)]);
    expect(Math.abs(toSi(1, unit) - expected) / expected).toBeLessThan(1e-12);
    expect(siUnit[quantityOf(unit)]).toBe(siLib[quantityOf(unit)]);
  });
});
