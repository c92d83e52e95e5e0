import { describe, expect, it } from "vitest";
import { cropList } from "@/lib/crops/crop-list";
import { matchCrop, parseQuickEntry } from "@/lib/plantings/quick-entry";
import { crowding } from "@/lib/plantings/rules";

const crops = cropList.map((c, i) => ({ id: String(i), name: c.name }));

describe("parseQuickEntry", () => {
  it('reads "6 tomato, 4 pepper" (PRODUCT.md journey 1)', () => {
    expect(parseQuickEntry("6 tomato, 4 pepper")).toEqual({
      parts: [
        { count: 6, name: "tomato" },
        { count: 4, name: "pepper" },
      ],
      errors: [],
    });
  });
  it("reads other ways people write it", () => {
    expect(parseQuickEntry("6 tomatoes and 4 peppers\nbasil x3; 2x kale").parts).toEqual([
      { count: 6, name: "tomatoes" },
      { count: 4, name: "peppers" },
      { count: 3, name: "basil" },
      { count: 2, name: "kale" },
    ]);
  });
  it("names a part without a count", () => {
    const r = parseQuickEntry("6 tomato, pepper");
    expect(r.parts).toHaveLength(1);
    expect(r.errors).toEqual(['"pepper": say how many, e.g. "6 pepper".']);
  });
  it("refuses zero plants and empty text", () => {
    expect(parseQuickEntry("0 tomato").errors[0]).toMatch(/at least one/);
    expect(parseQuickEntry("  ").errors).toHaveLength(1);
  });
});

describe("matchCrop", () => {
  it("matches names, plurals and aliases case-insensitively", () => {
    expect(matchCrop("Tomatoes", crops)?.name).toBe("Tomato");
    expect(matchCrop("peppers", crops)?.name).toBe("Pepper");
    expect(matchCrop("zucchini", crops)?.name).toBe("Squash");
    expect(matchCrop("strawberries", crops)?.name).toBe("Strawberry");
    expect(matchCrop("dragonfruit", crops)).toBeUndefined();
  });
});

describe("crop list", () => {
  it("has at least 40 crops across vegetables, herbs, fruit and flowers, names unique", () => {
    expect(cropList.length).toBeGreaterThanOrEqual(40);
    expect(new Set(cropList.map((c) => c.category))).toEqual(
      new Set(["vegetable", "herb", "fruit", "flower"]),
    );
    expect(new Set(cropList.map((c) => c.name.toLowerCase())).size).toBe(cropList.length);
  });
  it("flowers are not edible, so no pre-harvest interval applies (7 CFR 205.203(c)(1) covers crops for human consumption)", () => {
    for (const c of cropList.filter((x) => x.category === "flower")) {
      expect(c.edible).toBe(false);
      expect(c.edibleTouchesSoil).toBe(false);
    }
  });
});

describe("crowding", () => {
  it("10,000 plants at 24 in spacing need 40,000 ft² in a 2 ft² bed: 20,000× (1 ft = 0.3048 m, NIST HB 44)", () => {
    const ft = 0.3048;
    expect(crowding(2 * ft * ft, [{ count: 10_000, spacingM: 2 * ft }])).toBeCloseTo(20_000, 6);
  });
  it("is unknown without a spacing", () => {
    expect(crowding(3, [{ count: 1, spacingM: null }])).toBeNull();
  });
});
