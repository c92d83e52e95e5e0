import {
  calibrate,
  forecastCastings,
  harvestDates,
  type BinForecastInput,
} from "@/lib/engine/supply/forecast";
import { trayInsideFromOuter, trayInsideVolumeL } from "@/lib/engine/supply/geometry";
import { fromSi, toSi } from "@/lib/units";

// The 24 × 20 in 2×6 tray of PRODUCT.md: 21 × 17 × 5½ in inside ≈ 32.2 L.
const trayL = trayInsideVolumeL(
  trayInsideFromOuter({ outerLengthM: toSi(24, "in"), outerWidthM: toSi(20, "in"), board: "2x6" }),
);
const bin = (over: Partial<BinForecastInput> = {}): BinForecastInput => ({
  binId: "hollis-stack",
  startDate: "2027-02-01",
  trays: 4,
  trayInsideVolumeL: trayL,
  ...over,
});
const year = { from: "2027-01-01", to: "2027-12-31" };

describe("castings per harvest", () => {
  it("a monthly tray from a 24 × 20 in stack gives about 40–50 lb (common practice)", () => {
    const f = forecastCastings(bin(), year);
    // 32.2 L × 0.9 fill × 0.7 kg/L (India FCO; Agnew & Leonard 2003) = 20.3 kg ≈ 44.7 lb
    expect(f.perHarvestKg).toBeCloseTo(20.27, 1);
    const lb = fromSi(f.perHarvestKg, "lb");
    expect(lb).toBeGreaterThanOrEqual(40);
    expect(lb).toBeLessThanOrEqual(50);
    expect(lb).toBeCloseTo(44.7, 0);
  });

  it("says how it got there", () => {
    const f = forecastCastings(bin(), year);
    expect(f.explanation.text).toBe(
      "9 harvests × 32.2 L × 0.9 × 0.7 kg/L, not calibrated yet (no logged harvests)",
    );
    expect(f.events[0]?.explanation.text).toMatch(/= 20\.3 kg/);
  });
});

describe("stacked-tray cadence (PRODUCT.md: first harvest ≈ start + T, then every max(P, T / trays))", () => {
  it("first harvest 90 days after the start, then every 30 days with 4 trays", () => {
    // T = 90 days (MSU Extension; Oregon State EM 9034), P = 30 days; max(30, 90/4) = 30.
    expect(harvestDates(bin(), year)).toEqual([
      "2027-05-02", // 2027-02-01 + 90 days
      "2027-06-01",
      "2027-07-01",
      "2027-07-31",
      "2027-08-30",
      "2027-09-29",
      "2027-10-29",
      "2027-11-28",
      "2027-12-28",
    ]);
  });

  it("with 2 trays the bottom one sets the pace: every 90 / 2 = 45 days", () => {
    const dates = harvestDates(bin({ trays: 2 }), year);
    expect(dates.slice(0, 3)).toEqual(["2027-05-02", "2027-06-16", "2027-07-31"]);
  });

  it("dormant months pause the processing clock and hold no harvest", () => {
    // Started 2027-10-01, dormant Dec–Feb: Oct (31) + Nov (30) = 61 processing days by
    // Dec 1; the remaining 29 run from Mar 1 → first harvest on Mar 30 (not Dec 30).
    const b = bin({ startDate: "2027-10-01", dormantMonths: [12, 1, 2] });
    const dates = harvestDates(b, { from: "2027-10-01", to: "2028-06-30" });
    expect(dates[0]).toBe("2028-03-30");
    expect(dates.slice(1)).toEqual(["2028-04-29", "2028-05-29", "2028-06-28"]);
    for (const d of dates) expect(["12", "01", "02"]).not.toContain(d.slice(5, 7));
  });

  it("only returns events inside the range", () => {
    const f = forecastCastings(bin(), { from: "2027-06-01", to: "2027-07-31" });
    expect(f.events.map((e) => e.date)).toEqual(["2027-06-01", "2027-07-01", "2027-07-31"]);
    expect(f.events.every((e) => e.material === "castings" && !e.actual)).toBe(true);
  });

  it("every parameter can be overridden per bin", () => {
    const f = forecastCastings(
      bin({
        processingDays: 60,
        rotationIntervalDays: 45,
        fillFraction: 0.8,
        bulkDensityKgPerL: 0.9,
      }),
      year,
    );
    expect(f.events[0]?.date).toBe("2027-04-02"); // 2027-02-01 + 60
    expect(f.events[1]?.date).toBe("2027-05-17"); // + max(45, 60/4)
    expect(f.perHarvestKg).toBeCloseTo(trayL * 0.8 * 0.9, 10);
  });
});

describe("calibration from logged harvests", () => {
  const logs = [
    { date: "2027-05-02", actualKg: 30, predictedKg: 20 }, // oldest: outside the last 4
    { date: "2027-06-01", actualKg: 19, predictedKg: 20 },
    { date: "2027-07-01", actualKg: 18, predictedKg: 20 },
    { date: "2027-07-31", actualKg: 18.6, predictedKg: 20 },
    { date: "2027-08-30", actualKg: 18.8, predictedKg: 20 },
  ];

  it("uses the mean actual / predicted of the most recent 4", () => {
    // (0.95 + 0.9 + 0.93 + 0.94) / 4 = 0.93
    expect(calibrate(logs)).toEqual({ factor: expect.closeTo(0.93, 10), used: 4 });
  });

  it("scales the forecast and says how many harvests it used", () => {
    const f = forecastCastings(bin({ harvestLogs: logs }), {
      from: "2027-09-01",
      to: "2027-12-31",
    });
    expect(f.perHarvestKg).toBeCloseTo(trayL * 0.9 * 0.7 * 0.93, 10);
    expect(f.explanation.text).toBe(
      "4 harvests × 32.2 L × 0.9 × 0.7 kg/L, calibrated ×0.93 from 4 logged harvests",
    );
  });

  it("with asOf, returns logged harvests as actual and forecasts only after", () => {
    const f = forecastCastings(bin({ harvestLogs: logs, asOf: "2027-08-31" }), year);
    const actual = f.events.filter((e) => e.actual);
    expect(actual.map((e) => [e.date, e.amount])).toEqual([
      ["2027-05-02", 30],
      ["2027-06-01", 19],
      ["2027-07-01", 18],
      ["2027-07-31", 18.6],
      ["2027-08-30", 18.8],
    ]);
    expect(f.events.filter((e) => !e.actual).every((e) => e.date > "2027-08-31")).toBe(true);
  });

  it("a window of 2 uses only the two latest", () => {
    expect(calibrate(logs, 2)).toEqual({ factor: expect.closeTo((18.6 + 18.8) / 40, 10), used: 2 });
  });
});

describe("bad bin input", () => {
  it("names the field", () => {
    expect(() => forecastCastings(bin({ trayInsideVolumeL: -3 }), year, "bins[1]")).toThrow(
      /bins\[1\]\.trayInsideVolumeL/,
    );
    expect(() => forecastCastings(bin({ dormantMonths: [13] }), year)).toThrow(
      /bin\.dormantMonths\[0\]/,
    );
    expect(() => forecastCastings(bin({ startDate: "2027-02-30" }), year)).toThrow(
      /bin\.startDate/,
    );
    expect(() => forecastCastings(bin(), { from: "2027-12-31", to: "2027-01-01" })).toThrow(
      /range\.to/,
    );
  });

  it("never returns NaN", () => {
    const f = forecastCastings(
      bin({ harvestLogs: [{ date: "2027-05-02", actualKg: 5, predictedKg: 0 }] }),
      year,
    );
    expect(f.events.every((e) => Number.isFinite(e.amount))).toBe(true);
    expect(f.calibration.used).toBe(0);
  });
});
