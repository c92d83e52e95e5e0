import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { ruleInput, scenarioToInputs } from "@/lib/scenario/to-inputs";
import { parseScenario, type Scenario } from "@/lib/validation/scenario";

// Scenario file (grower's units) → GardenInputs (SI), checked against NIST Handbook 44
// Appendix C (1 in = 2.54 cm, 1 lb = 0.45359237 kg, 1 gal = 231 in³) and PS 20 lumber sizes.
const hollis = (): Scenario => {
  const r = parseScenario(
    JSON.parse(readFileSync("tests/fixtures/scenarios/hollis-street-garden.json", "utf8")),
  );
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.scenario;
};

describe("scenario → GardenInputs", () => {
  const inputs = scenarioToInputs(hollis());

  it("turns a 24 × 20 in outside tray of 2×6 into 21 × 17 × 5½ in inside, in metres (PS 20)", () => {
    const t = inputs.bins[0]!.tray;
    expect(t.insideLengthM).toBeCloseTo(21 * 0.0254, 12);
    expect(t.insideWidthM).toBeCloseTo(17 * 0.0254, 12);
    expect(t.insideDepthM).toBeCloseTo(5.5 * 0.0254, 12);
  });

  it("keeps frost dates as month and day, and the price per kg ($1.00/lb ÷ 0.45359237)", () => {
    expect(inputs.settings.lastSpringFrost).toEqual({ month: 4, day: 15 });
    expect(inputs.settings.firstFallFrost).toEqual({ month: 10, day: 20 });
    expect(inputs.settings.castingsPricePerKg).toBeCloseTo(1 / 0.45359237, 12);
    expect(inputs.settings.liquidMaxAgeDays).toBe(7);
  });

  it("leaves unset engine parameters null (= the engine default), never a copied default", () => {
    const b = inputs.bins[0]!;
    expect([b.rotationIntervalDays, b.processingDays, b.fillFraction, b.bulkDensityKgPerL]).toEqual(
      [null, null, null, null],
    );
  });

  it("gives logged harvests and drains lot ids that applications can name", () => {
    expect(inputs.logs.harvests.map((h) => h.id)).toContain("wood-stack:harvest:2026-07-01");
    expect(inputs.logs.drains.map((d) => d.id)).toContain("wood-stack:drain:2026-07-26");
    const july = inputs.logs.applications.find(
      (a) => a.plantingId === "tomato-north" && a.date === "2026-07-10",
    )!;
    expect(july.draws).toEqual([
      { lotId: "wood-stack:harvest:2026-07-01", amount: 2.2 * 0.45359237 },
    ]);
    expect(inputs.logs.wormMoves).toEqual([
      {
        id: "worm-move-1",
        date: "2026-06-14",
        fromBinId: "wood-stack",
        toBinId: "plastic-pair",
        worms: 600,
      },
    ]);
  });

  it("leaves out logs dated after an explicit asOf, as the database adapter does", () => {
    const july = scenarioToInputs(hollis(), { asOf: "2026-07-31" });
    const logs = july.logs;
    const dates = [
      ...logs.harvests,
      ...logs.drains,
      ...logs.applications,
      ...logs.wormMoves,
      ...logs.observations,
    ].map((l) => l.date);
    expect(dates.every((d) => d <= "2026-07-31")).toBe(true);
    // The fixture's history runs to 1 December: the 1 August harvest is in the full replay only.
    expect(logs.harvests.map((h) => h.id)).not.toContain("wood-stack:harvest:2026-08-01");
    expect(inputs.logs.harvests.map((h) => h.id)).toContain("wood-stack:harvest:2026-08-01");
    // Application ids count over the whole file, so the July ones keep their ids at any asOf.
    expect(logs.applications.map((a) => a.id)).toEqual(
      inputs.logs.applications.slice(0, logs.applications.length).map((a) => a.id),
    );
  });

  it("says what a rule amount measures, in SI", () => {
    const base = { material: "castings", method: "top-dress", recurrence: "FREQ=MONTHLY" } as const;
    // 1 cup = 236.5882365 mL; 2 oz = 56.69904625 g; ¼ in over 1 m² = 6.35 L; 2 qt per gal = 0.5 L/L.
    expect(
      ruleInput({ ...base, basis: "per-plant", amount: { value: 1, unit: "cup" } }),
    ).toMatchObject({
      measure: "volume",
      amount: 0.2365882365,
    });
    const oz = ruleInput({ ...base, basis: "per-plant", amount: { value: 2, unit: "oz" } });
    expect(oz.measure).toBe("mass");
    expect(oz.amount).toBeCloseTo(0.05669904625, 12);
    expect(
      ruleInput({ ...base, basis: "per-area", amount: { value: 0.25, unit: "in" } }).amount,
    ).toBeCloseTo(6.35, 12);
    expect(
      ruleInput({
        ...base,
        basis: "per-container-volume",
        amount: { value: 2, unit: "qt", per: "gal" },
      }).amount,
    ).toBeCloseTo(0.5, 12);
    expect(ruleInput({ ...base, basis: "percent-of-mix", amount: 15 })).toMatchObject({
      measure: "percent-of-mix",
      amount: 15,
    });
  });

  it("takes the plant count as a whole number, in the file as in the inputs", () => {
    const s = JSON.parse(
      readFileSync("tests/fixtures/scenarios/hollis-street-garden.json", "utf8"),
    );
    s.plantings[0].plantCount = 2.5;
    const r = parseScenario(s);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0]!.path).toBe("plantings[0].plantCount");
    expect(inputs.plantings.every((p) => Number.isInteger(p.plantCount))).toBe(true);
  });

  it("reads a bin's intake, density ceiling and retired day, and castings by mass per area or per volume", () => {
    const s = hollis();
    s.bins[0] = {
      ...s.bins[0]!,
      intakeFractionPerDay: 0.3,
      densityCeiling: { value: 2, unit: "lb", per: "ft2" },
      retiredOn: "2026-11-30",
    };
    const b = scenarioToInputs(s).bins[0]!;
    expect(b.intakeFractionPerDay).toBe(0.3);
    // 1 ft² = 0.09290304 m² (NIST HB 44 App. C): 2 lb/ft² = 0.90718474 / 0.09290304 kg/m².
    expect(b.densityCeilingKgPerM2).toBeCloseTo(0.90718474 / 0.09290304, 12);
    expect(b.retiredOn).toBe("2026-11-30");
    const base = { material: "castings", method: "top-dress", recurrence: "FREQ=MONTHLY" } as const;
    // 1 lb per 10 ft² = 0.45359237 / 0.9290304 kg/m²; 4 oz per gal = 0.11339809 / 3.785411784 kg/L.
    const perArea = ruleInput({
      ...base,
      basis: "per-area",
      amount: { value: 0.1, unit: "lb", per: "ft2" },
    });
    expect(perArea.measure).toBe("mass");
    expect(perArea.amount).toBeCloseTo(0.45359237 / 0.9290304, 12);
    const perVolume = ruleInput({
      ...base,
      basis: "per-container-volume",
      amount: { value: 4, unit: "oz", per: "gal" },
    });
    expect(perVolume.measure).toBe("mass");
    expect(perVolume.amount).toBeCloseTo(0.1133980925 / 3.785411784, 12);
    const tea = ruleInput({
      material: "tea",
      method: "drench",
      basis: "per-plant",
      amount: { value: 1, unit: "L" },
      recurrence: "FREQ=WEEKLY",
      teaCastingsPerWater: 0.2,
    });
    expect(tea.teaCastingsPerWater).toBe(0.2);
  });

  it("refuses a mass per area without its area, and a bin retired before it started", () => {
    const s = JSON.parse(
      readFileSync("tests/fixtures/scenarios/hollis-street-garden.json", "utf8"),
    );
    s.bins[0].retiredOn = "2025-12-31";
    s.bins[0].densityCeiling = { value: 2, unit: "lb", per: "ft" };
    s.plantings[0].rule = {
      material: "castings",
      method: "top-dress",
      basis: "per-area",
      amount: { value: 1, unit: "lb" },
      recurrence: "FREQ=MONTHLY",
    };
    const r = parseScenario(s);
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.issues.map((i) => i.path).sort()).toEqual([
        "bins[0].densityCeiling.per",
        "bins[0].retiredOn",
        "plantings[0].rule.amount.per",
      ]);
  });
});
