import {
  daysToMultiply,
  kgToWorms,
  simulatePopulation,
  wormsToKg,
} from "@/lib/engine/supply/population";
import { toSi } from "@/lib/units";

// Biomass here is live weight: adults at 1/1,000 lb (about 1,000 worms per lb,
// from memory), juveniles growing linearly from hatch to adult weight over the
// 60-day maturation (our assumption), cocoons weightless.
const TRAY_M2 = toSi(357, "in2"); // 21 × 17 in inside a 24 × 20 in 2×6 tray (PRODUCT.md)

describe("worm population model", () => {
  it("1,000 worms weigh 1 lb (from memory)", () => {
    expect(wormsToKg(1000)).toBeCloseTo(0.45359237, 12);
    expect(kgToWorms(0.45359237)).toBeCloseTo(1000, 9);
  });

  it("common practice: a start of 2,000 worms is well past 10,000 after three months, given room", () => {
    // Room matters: the 2 lb/ft² ceiling caps one 24 × 20 in tray (2.48 ft²) at ~4,960 worms,
    // so this check uses 1 m² (10.8 ft², ceiling ~21,500 worms). Measured: ~21,500 at day 90 (the ceiling).
    const run = simulatePopulation({ startWorms: 2000, surfaceM2: 1, days: 90 });
    expect(run.final.worms).toBeGreaterThan(15_000);
  });

  it("UF/IFAS Extension: biomass doubles in roughly 60–90 days — holds on one stacked tray", () => {
    // 2,000 adults (2 lb) on a 2.48 ft² tray: 0.8 lb/ft², inside the 1–2 lb/ft² optimum.
    // Measured with the sourced defaults: live biomass doubles on day 66.
    const run = simulatePopulation({ startWorms: 2000, surfaceM2: TRAY_M2, days: 180 });
    const day = daysToMultiply(run, "biomassKg");
    expect(day).not.toBeNull();
    expect(day as number).toBeGreaterThanOrEqual(60);
    expect(day as number).toBeLessThanOrEqual(90);
  });

  it("UF/IFAS check, honestly: with unlimited room, live biomass doubles faster than 60 days", () => {
    // With the sourced life-cycle figures and no mortality (no source gives one), live
    // biomass doubles by day ~35 once density is not limiting; the 60–90 days then hold
    // only for the breeding adults, which double on day ~85 when the first hatchlings
    // mature (23 + 60 days). We assert both so a change to either shows up.
    const run = simulatePopulation({ startWorms: 2000, surfaceM2: 100, days: 180 });
    const liveDay = daysToMultiply(run, "biomassKg") as number;
    expect(liveDay).toBeGreaterThan(23); // nothing hatches before the 23-day incubation
    expect(liveDay).toBeLessThan(60);
    const adultsDay = run.series.find((d) => d.adults >= 4000)?.day as number;
    expect(adultsDay).toBeGreaterThanOrEqual(60);
    expect(adultsDay).toBeLessThanOrEqual(90);
  });

  it("starting with cocoons already laid (worms from a working bin) speeds the start", () => {
    const plain = simulatePopulation({ startWorms: 2000, surfaceM2: 100, days: 120 });
    const seeded = simulatePopulation({
      startWorms: 2000,
      surfaceM2: 100,
      days: 120,
      start: "adults-with-cocoons",
    });
    expect(daysToMultiply(seeded, "biomassKg") as number).toBeLessThan(
      daysToMultiply(plain, "biomassKg") as number,
    );
  });

  it("density holds the population at ~2 lb per ft² of surface", () => {
    const run = simulatePopulation({ startWorms: 2000, surfaceM2: TRAY_M2, days: 365 });
    const ceilingKg = toSi(2 * 2.479166, "lb"); // 2 lb/ft² × 357 in² (= 2.479 ft²)
    expect(run.ceilingKg).toBeCloseTo(ceilingKg, 3);
    for (const d of run.series) expect(d.biomassKg).toBeLessThanOrEqual(ceilingKg * 1.001);
    expect(run.final.biomassKg).toBeGreaterThan(ceilingKg * 0.99);
  });

  it("a daily step keeps the stages consistent", () => {
    const run = simulatePopulation({ startWorms: 500, surfaceM2: 1, days: 100 });
    for (const d of run.series) {
      expect(d.worms).toBeCloseTo(d.adults + d.juveniles, 6);
      expect(Number.isFinite(d.biomassKg)).toBe(true);
    }
    // The first cocoons are laid on day 1 (the first step) and hatch 23 days later.
    expect(run.series[23]?.juveniles).toBe(0);
    expect(run.series[24]?.juveniles).toBeGreaterThan(0);
    // Adults only grow once those hatchlings mature, 60 days after hatching.
    expect(run.series[83]?.adults).toBe(500);
    expect(run.series[84]?.adults).toBeGreaterThan(500);
  });

  it("a 365-day run is fast", () => {
    const t0 = performance.now();
    for (let i = 0; i < 50; i++) simulatePopulation({ startWorms: 2000, surfaceM2: 1, days: 365 });
    expect((performance.now() - t0) / 50).toBeLessThan(20);
  });

  it("rejects bad input with the field named", () => {
    expect(() => simulatePopulation({ startWorms: -5, surfaceM2: 1, days: 10 })).toThrow(
      /population\.startWorms/,
    );
    expect(() =>
      simulatePopulation({ startWorms: 5, surfaceM2: 1, days: 10, params: { hatchSuccess: 2 } }),
    ).toThrow(/params\.hatchSuccess/);
  });
});
