import { describe, expect, it } from "vitest";
import { amountEntryFor, largestEntry } from "@/lib/balance/rule-amount-units";

// The what-if panel's planting amount, entered in the garden's units and stored in SI in
// the rule's own measure. Every factor is from NIST Handbook 44, Appendix C (exact
// definitions): 1 in = 2.54 cm; 1 gal = 231 in³ = 3.785411784 L; 1 cup = 1/16 gal =
// 0.2365882365 L; 1 fl oz = 1/128 gal = 29.5735295625 mL; 1 lb = 0.45359237 kg;
// 1 ft² = 0.09290304 m².

const castings = (basis: string, measure: string) => ({ material: "castings", basis, measure });
const tea = (basis: string, measure: string) => ({ material: "tea", basis, measure });

describe("a planting's amount in the garden's units", () => {
  it("castings by volume per plant: cups (US) or litres (metric)", () => {
    const us = amountEntryFor(castings("per-plant", "volume"), "us");
    expect(us.label).toBe("cup per plant");
    expect(us.toSi(1)).toBeCloseTo(0.2365882365, 10);
    expect(us.fromSi(0.2365882365 * 0.75)).toBeCloseTo(0.75, 10);
    const metric = amountEntryFor(castings("per-plant", "volume"), "metric");
    expect(metric.label).toBe("L per plant");
    expect(metric.toSi(0.25)).toBe(0.25);
  });

  it("castings by mass per plant: pounds (US) or kilograms (metric)", () => {
    const us = amountEntryFor(castings("per-plant", "mass"), "us");
    expect(us.label).toBe("lb per plant");
    expect(us.toSi(1)).toBeCloseTo(0.45359237, 12);
    // 10 kg per plant entered in a metric garden reaches the API as 10 (kg), which it
    // refuses naming the field (tests/integration/balance-api.test.ts).
    expect(amountEntryFor(castings("per-plant", "mass"), "metric").toSi(10)).toBe(10);
  });

  it("tea per plant: fluid ounces (US) or millilitres (metric)", () => {
    const us = amountEntryFor(tea("per-plant", "volume"), "us");
    expect(us.label).toBe("fl oz per plant");
    expect(us.toSi(16)).toBeCloseTo(16 * 0.0295735295625, 12);
    expect(amountEntryFor(tea("per-plant", "volume"), "metric").toSi(500)).toBeCloseTo(0.5, 12);
  });

  it("castings top-dressed by volume per area read as a depth", () => {
    // ½ in = 12.7 mm; 1 L spread on 1 m² stands 1 mm high, so ½ in deep = 12.7 L/m².
    const us = amountEntryFor(castings("per-area", "volume"), "us");
    expect(us.label).toBe("in deep");
    expect(us.toSi(0.5)).toBeCloseTo(12.7, 10);
    expect(us.fromSi(12.7)).toBeCloseTo(0.5, 10);
    expect(amountEntryFor(castings("per-area", "volume"), "metric").toSi(1)).toBeCloseTo(10, 10);
  });

  it("castings by mass per area: lb per ft² (US)", () => {
    const us = amountEntryFor(castings("per-area", "mass"), "us");
    expect(us.label).toBe("lb per ft²");
    // 1 lb/ft² = 0.45359237 kg / 0.09290304 m² = 4.882427636… kg/m².
    expect(us.toSi(1)).toBeCloseTo(0.45359237 / 0.09290304, 10);
    expect(us.fromSi(0.45359237 / 0.09290304)).toBeCloseTo(1, 10);
  });

  it("per container volume: cups per gallon of pot (US), a ratio of volumes", () => {
    const us = amountEntryFor(castings("per-container-volume", "volume"), "us");
    expect(us.label).toBe("cup per gal of pot");
    expect(us.toSi(1)).toBeCloseTo(1 / 16, 12); // a cup is 1/16 gal
    expect(amountEntryFor(castings("per-container-volume", "volume"), "metric").toSi(0.1)).toBe(
      0.1,
    );
  });

  it("percent of the mix stays a percent", () => {
    const e = amountEntryFor(castings("percent-of-mix", "percent-of-mix"), "us");
    expect(e.label).toBe("% of the mix");
    expect(e.toSi(20)).toBe(20);
  });
});

describe("the largest amount the what-if accepts, in the garden's units", () => {
  it("is the API's bound converted and rounded down, never up", () => {
    // Bounds from lib/balance/rule-amount-units.ts: 3 L castings per plant, 2 kg per plant.
    // 3 L / 0.2365882365 L per cup = 12.68 cups → 12 (13 cups would be 3.08 L, refused).
    const cups = castings("per-plant", "volume");
    expect(largestEntry(cups, amountEntryFor(cups, "us"))).toBe(12);
    // 2 kg / 0.45359237 kg per lb = 4.409 lb → 4.4.
    const mass = castings("per-plant", "mass");
    expect(largestEntry(mass, amountEntryFor(mass, "us"))).toBe(4.4);
    expect(largestEntry(mass, amountEntryFor(mass, "metric"))).toBe(2);
  });
});
