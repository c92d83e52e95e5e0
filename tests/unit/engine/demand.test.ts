import {
  expandDemand,
  expandPlanting,
  preHarvestBlockStart,
  type BedInput,
  type PlantingInput,
} from "@/lib/engine/demand/demand";
import { EngineInputError } from "@/lib/engine/core/errors";
import {
  DEFAULT_BED_TOPDRESS_RULE,
  DEFAULT_TEA_RULE,
  defaultRuleFor,
} from "@/lib/engine/demand/feeding-rules";
import { fromSi, toSi } from "@/lib/units";

// Invented garden ("Hollis Street Garden"): frost-free from Apr 15 to Oct 15.
const season = { lastSpringFrost: "04-15", firstFallFrost: "10-15" };
const range = { from: "2027-01-01", to: "2027-12-31" };
const bed: BedInput = { id: "bed-1", areaM2: toSi(32, "ft2") }; // 8 × 4 ft raised bed
const pot: BedInput = { id: "pot-1", containerVolumeL: toSi(5, "gal"), indoor: true };
const CUP_L = 0.2365882365; // NIST Handbook 44 App. C

const planting = (over: Partial<PlantingInput> = {}): PlantingInput => ({
  id: "tomatoes",
  bedId: "bed-1",
  feederClass: "heavy",
  plantCount: 6,
  startDate: "2027-05-01",
  endDate: "2027-09-30",
  ...over,
});

describe("feeder-class defaults (common practice)", () => {
  it("heavy: 1 cup castings per plant monthly, cups → kg through 0.7 kg/L", () => {
    const r = expandPlanting(planting(), bed, { range, season });
    expect(r.occurrences.map((o) => o.date)).toEqual([
      "2027-05-01",
      "2027-06-01",
      "2027-07-01",
      "2027-08-01",
      "2027-09-01",
    ]);
    // 6 plants × 236.5882365 mL (NIST cup) × 0.7 kg/L (India FCO; Agnew & Leonard 2003)
    for (const o of r.occurrences) expect(o.amount).toBeCloseTo(6 * CUP_L * 0.7, 12);
    expect(r.occurrences[0]).toMatchObject({
      material: "castings",
      method: "top-dress",
      feederClass: "heavy",
      bedId: "bed-1",
    });
    expect(r.occurrences[0]?.explanation.text).toBe(
      "6 plants × 0.237 L × 0.7 kg/L = 0.994 kg castings",
    );
  });

  it("medium ½ cup monthly, light ½ cup every two months", () => {
    expect(defaultRuleFor("medium")).toMatchObject({
      amount: CUP_L / 2,
      recurrence: "FREQ=MONTHLY",
    });
    const light = expandPlanting(planting({ feederClass: "light", plantCount: 1 }), bed, {
      range,
      season,
    });
    expect(light.occurrences.map((o) => o.date)).toEqual([
      "2027-05-01",
      "2027-07-01",
      "2027-09-01",
    ]);
    expect(fromSi((light.occurrences[0]?.amount as number) / 0.7, "cup")).toBeCloseTo(0.5, 12);
  });

  it("tea: 100 mL per plant weekly (Arancon)", () => {
    const r = expandPlanting(
      planting({ plantCount: 4, rule: DEFAULT_TEA_RULE, endDate: "2027-05-31" }),
      bed,
      { range, season },
    );
    expect(r.occurrences.map((o) => o.date)).toEqual([
      "2027-05-01",
      "2027-05-08",
      "2027-05-15",
      "2027-05-22",
      "2027-05-29",
    ]);
    expect(r.occurrences[0]).toMatchObject({ material: "tea", method: "drench" });
    expect(r.occurrences[0]?.amount).toBeCloseTo(0.4, 12);
  });

  it("bed top-dressed ¼ in deep: 32 ft² × ¼ in = ⅔ ft³ = 18.88 L → 13.2 kg", () => {
    // Cumberland County SWCD ¼–⅜ in; 1 ft³ = 28.316846592 L (NIST); 0.7 kg/L bulk density.
    const r = expandPlanting(planting({ rule: DEFAULT_BED_TOPDRESS_RULE }), bed, { range, season });
    expect(r.occurrences).toHaveLength(1);
    expect(r.occurrences[0]?.amount).toBeCloseTo((32 / 48) * 28.316846592 * 0.7, 9);
  });
});

describe("potting mix by percent of volume (Atiyeh et al. 2000)", () => {
  const mix = (percent: number) =>
    expandPlanting(
      planting({
        bedId: "pot-1",
        rule: {
          material: "castings",
          method: "soil-mix",
          basis: "percent-of-mix",
          amount: percent,
          recurrence: "FREQ=DAILY;COUNT=1",
        },
      }),
      pot,
      { range, season },
    );

  it("10 % of a 5-gallon pot is 1.89 L of castings", () => {
    const r = mix(10);
    expect(r.occurrences[0]?.amount).toBeCloseTo(0.1 * 5 * 3.785411784 * 0.7, 12);
    expect(r.warnings).toEqual([]);
  });

  it("warns above 20 %", () => {
    expect(mix(25).warnings[0]?.text).toMatch(/25 % castings is above the 20 %/);
    expect(mix(20).warnings).toEqual([]);
  });
});

describe("growing season", () => {
  const tea = planting({
    rule: DEFAULT_TEA_RULE,
    plantCount: 1,
    startDate: "2027-03-06",
    endDate: "2027-11-27",
  });

  it("outdoors, only between last spring frost and first fall frost; the rest are blocked with a reason", () => {
    const r = expandPlanting(tea, bed, { range, season });
    expect(r.occurrences[0]?.date).toBe("2027-04-17");
    expect(r.occurrences.at(-1)?.date).toBe("2027-10-09");
    expect(r.blocked[0]).toEqual({
      plantingId: "tomatoes",
      date: "2027-03-06",
      reason: "outside the growing season (04-15 → 10-15); the bed is outdoors",
    });
    expect(r.occurrences.length + r.blocked.length).toBe(39); // weekly from Mar 6 to Nov 27
  });

  it("indoors, all year", () => {
    const r = expandPlanting(tea, { ...bed, indoor: true }, { range, season });
    expect(r.blocked).toEqual([]);
    expect(r.occurrences).toHaveLength(39);
  });

  it("frost dates out of order are an error naming the field", () => {
    expect(() =>
      expandPlanting(tea, bed, {
        range,
        season: { lastSpringFrost: "10-15", firstFallFrost: "04-15" },
      }),
    ).toThrow(expect.objectContaining({ field: "season.firstFallFrost" }));
  });
});

describe("pre-harvest interval for manure-fed bins (7 CFR 205.203(c)(1), USDA NOP)", () => {
  const carrots = planting({
    id: "carrots",
    startDate: "2027-04-15",
    endDate: "2027-09-30",
    edibleTouchesSoil: true,
  });

  it("120 days when the edible part touches soil: harvest 2027-09-30 → last allowed day 2027-06-02", () => {
    expect(preHarvestBlockStart(carrots)).toBe("2027-06-03");
    const r = expandPlanting(carrots, bed, { range, season, manureFeedstock: true });
    expect(r.occurrences.map((o) => o.date)).toEqual(["2027-04-15", "2027-05-15"]);
    expect(r.blocked.map((b) => b.date)).toEqual([
      "2027-06-15",
      "2027-07-15",
      "2027-08-15",
      "2027-09-15",
    ]);
    expect(r.blocked[0]?.reason).toMatch(/within 120 days before harvest on 2027-09-30/);
  });

  it("90 days otherwise: last allowed day 2027-07-02", () => {
    const r = expandPlanting({ ...carrots, edibleTouchesSoil: false }, bed, {
      range,
      season,
      manureFeedstock: true,
    });
    expect(r.occurrences.map((o) => o.date)).toEqual(["2027-04-15", "2027-05-15", "2027-06-15"]);
  });

  it("no interval without manure, nor for non-edible plantings", () => {
    expect(expandPlanting(carrots, bed, { range, season }).blocked).toEqual([]);
    expect(
      expandPlanting({ ...carrots, edible: false }, bed, { range, season, manureFeedstock: true })
        .blocked,
    ).toEqual([]);
  });
});

describe("liquids", () => {
  it("a leachate rule in litres of 1:10 solution asks for 1/11 of it as leachate (Arthur et al.)", () => {
    const r = expandPlanting(
      planting({
        plantCount: 2,
        rule: {
          material: "leachate",
          method: "drench",
          basis: "per-plant",
          amount: 1.1,
          recurrence: "FREQ=MONTHLY",
        },
      }),
      bed,
      { range, season },
    );
    expect(r.occurrences[0]?.amount).toBeCloseTo(0.2, 12);
  });
});

describe("input errors name the field", () => {
  it("an RRULE the library cannot parse", () => {
    const bad = planting({ rule: { ...defaultRuleFor("heavy"), recurrence: "FREQ=FORTNIGHTLY" } });
    expect(() =>
      expandDemand({ plantings: [planting(), bad], beds: [bed], options: { range, season } }),
    ).toThrow(expect.objectContaining({ field: "plantings[1].rule.recurrence" }));
  });

  it("a per-area rule on a bed with no area", () => {
    expect(() =>
      expandPlanting(
        planting({ rule: DEFAULT_BED_TOPDRESS_RULE }),
        { id: "bed-1" },
        { range, season },
      ),
    ).toThrow(expect.objectContaining({ field: "planting.areaM2" }));
  });

  it("an unknown bed, an end before the start", () => {
    expect(() =>
      expandDemand({
        plantings: [planting({ bedId: "nope" })],
        beds: [bed],
        options: { range, season },
      }),
    ).toThrow(EngineInputError);
    expect(() =>
      expandPlanting(planting({ endDate: "2027-04-01" }), bed, { range, season }),
    ).toThrow(/planting\.endDate/);
  });
});

describe("speed", () => {
  it("expands 5,000 plantings quickly", () => {
    const plantings = Array.from({ length: 5000 }, (_, i) =>
      planting({
        id: `p${i}`,
        feederClass: (["heavy", "medium", "light"] as const)[i % 3],
        startDate: `2027-05-${String((i % 28) + 1).padStart(2, "0")}`,
      }),
    );
    const t0 = performance.now();
    const r = expandDemand({
      plantings,
      beds: [bed],
      options: { range, season, manureFeedstock: true },
    });
    const ms = performance.now() - t0;
    expect(r.occurrences.length).toBeGreaterThan(5000);
    expect(ms).toBeLessThan(2000);
  });
});

describe("boundary schemas (lib/validation/engine-inputs)", () => {
  it("accept what the engine accepts and reject what it rejects, per field", async () => {
    const { feedingRuleSchema, gardenSeasonSchema, plantingSchema } =
      await import("@/lib/validation/engine-inputs");
    expect(feedingRuleSchema.safeParse(defaultRuleFor("heavy")).success).toBe(true);
    const tea = feedingRuleSchema.safeParse({ ...DEFAULT_TEA_RULE, basis: "percent-of-mix" });
    expect(tea.success).toBe(false);
    expect(tea.error?.issues[0]?.path).toEqual(["basis"]);
    const frost = gardenSeasonSchema.safeParse({
      lastSpringFrost: "10-15",
      firstFallFrost: "04-15",
    });
    expect(frost.error?.issues[0]?.path).toEqual(["firstFallFrost"]);
    expect(gardenSeasonSchema.safeParse(season).success).toBe(true);
    expect(plantingSchema.safeParse(planting()).success).toBe(true);
    expect(
      plantingSchema.safeParse(planting({ startDate: "2027-02-30" })).error?.issues[0]?.path,
    ).toEqual(["startDate"]);
  });
});

describe("rule fields are checked", () => {
  it("an unknown material or method names the field", () => {
    const rule = { ...defaultRuleFor("heavy"), material: "compost" as "castings" };
    expect(() => expandPlanting(planting({ rule }), bed, { range, season })).toThrow(
      expect.objectContaining({ field: "planting.rule.material" }),
    );
    const rule2 = { ...defaultRuleFor("heavy"), method: "spray" as "drench" };
    expect(() => expandPlanting(planting({ rule: rule2 }), bed, { range, season })).toThrow(
      expect.objectContaining({ field: "planting.rule.method" }),
    );
  });
});
