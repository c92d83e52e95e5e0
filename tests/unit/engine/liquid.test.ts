import {
  dilute,
  forecastLeachate,
  leachateForSolution,
  leachateRate,
  teaCastingsNeeded,
} from "@/lib/engine/supply/liquid";
import { toSi } from "@/lib/units";

describe("leachate rate", () => {
  it("before any log, uses the grower's estimate per week", () => {
    const r = leachateRate({ binId: "b", estimateLPerWeek: 1.4 });
    expect(r).toMatchObject({ source: "estimate", collectionsUsed: 0 });
    expect(r.litresPerDay).toBeCloseTo(0.2, 12);
  });

  it("from logs, the trailing mean over the last 60 days", () => {
    // Collections on days 0, 7, 14, 21 of 1, 0.7, 0.7, 0.7 L: each holds what drained since the
    // one before, so 2.1 L over 21 days = 0.1 L/day. A collection 90 days back is outside the window.
    const r = leachateRate({
      binId: "b",
      collections: [
        { date: "2027-03-01", litres: 9 },
        { date: "2027-06-01", litres: 1 },
        { date: "2027-06-08", litres: 0.7 },
        { date: "2027-06-15", litres: 0.7 },
        { date: "2027-06-22", litres: 0.7 },
      ],
    });
    expect(r.source).toBe("logs");
    expect(r.collectionsUsed).toBe(4);
    expect(r.litresPerDay).toBeCloseTo(0.1, 12);
    expect(r.explanation.text).toMatch(
      /^0\.1 L\/day: 2\.1 L over 21 days from 4 logged collections/,
    );
  });
});

describe("leachate supply events", () => {
  const input = {
    binId: "hollis-stack",
    estimateLPerWeek: 0.7,
    dormantMonths: [1],
    collections: [{ date: "2026-12-20", litres: 0.5 }],
    asOf: "2026-12-31",
  };

  it("emits one forecast event a day after asOf, none in dormant months", () => {
    const { events } = forecastLeachate(input, { from: "2026-12-15", to: "2027-02-03" });
    const forecast = events.filter((e) => !e.actual);
    expect(forecast[0]?.date).toBe("2027-02-01");
    expect(forecast).toHaveLength(3);
    for (const e of forecast) expect(e.amount).toBeCloseTo(0.1, 12);
    expect(events.filter((e) => e.actual).map((e) => [e.date, e.amount])).toEqual([
      ["2026-12-20", 0.5],
    ]);
  });

  it("can group days into one event per collection", () => {
    const { events } = forecastLeachate(
      { binId: "b", estimateLPerWeek: 0.7, everyDays: 7 },
      { from: "2027-05-01", to: "2027-05-21" },
    );
    expect(events.map((e) => e.date)).toEqual(["2027-05-01", "2027-05-08", "2027-05-15"]);
    for (const e of events) expect(e.amount).toBeCloseTo(0.7, 12);
  });
});

describe("dilution and tea", () => {
  it("leachate diluted 1 part to 10 parts water by volume (Arthur et al., HortScience)", () => {
    expect(dilute(1)).toBe(11);
    expect(leachateForSolution(toSi(1, "gal"))).toBeCloseTo(3.785411784 / 11, 12); // NIST gallon
  });

  it("castings for tea: 10 L of a 10 % brew needs 1 L of castings = 0.7 kg", () => {
    // 10 % solution (Arancon); 0.7 kg/L bulk density (India FCO; Agnew & Leonard 2003)
    expect(teaCastingsNeeded(10)).toBeCloseTo(0.7, 12);
    expect(teaCastingsNeeded(10, { castingsPerWater: 0.2, bulkDensityKgPerL: 0.8 })).toBeCloseTo(
      1.6,
      12,
    );
  });

  it("rejects bad numbers, naming the field", () => {
    expect(() => teaCastingsNeeded(Number.NaN)).toThrow(/teaLitres/);
    expect(() =>
      leachateRate({ binId: "b", collections: [{ date: "2027-01-01", litres: -1 }] }),
    ).toThrow(/leachate\.collections\[0\]\.litres/);
  });
});
