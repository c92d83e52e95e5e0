import { checkCapacity } from "@/lib/engine/supply/capacity";
import { toSi } from "@/lib/units";

const lb = (n: number) => toSi(n, "lb");
const ft2 = (n: number) => toSi(n, "ft2");

describe("worm capacity check", () => {
  it("2 lb of worms eat about 1 lb of food a day at the 50 % end (Univ. of Illinois Extension)", () => {
    // Alabama Extension gives 25–50 % of body weight per day; Illinois' figure is the 50 % end.
    const r = checkCapacity({
      wormMassKg: lb(2),
      surfaceM2: ft2(10),
      plannedFoodKgPerWeek: 0,
      intakeFractionPerDay: 0.5,
    });
    expect(r.intakeKgPerDay).toBeCloseTo(lb(1), 12);
  });

  it("defaults to 25 % of body weight a day (Alabama Extension lower bound)", () => {
    const r = checkCapacity({ wormMassKg: lb(2), surfaceM2: ft2(10), plannedFoodKgPerWeek: 0 });
    expect(r.intakeKgPerDay).toBeCloseTo(lb(0.5), 12);
  });

  it("1 ft² per lb of food per week: a 2.48 ft² tray takes 2.48 lb a week (MSU Extension; NC State AG-473-18)", () => {
    const r = checkCapacity({
      wormMassKg: lb(10),
      surfaceM2: ft2(2.48),
      plannedFoodKgPerWeek: lb(2),
    });
    expect(r.surfaceKgPerWeek).toBeCloseTo(lb(2.48), 10);
    expect(r.warnings).toEqual([]);
  });

  it("warns with numbers when planned food exceeds what the worms eat", () => {
    // 1 lb worms × 25 % × 7 days = 1.75 lb a week; 3 lb planned is over.
    const r = checkCapacity({ wormMassKg: lb(1), surfaceM2: ft2(10), plannedFoodKgPerWeek: lb(3) });
    expect(r.warnings.map((w) => w.kind)).toEqual(["intake"]);
    expect(r.warnings[0]?.limitKgPerWeek).toBeCloseTo(lb(1.75), 10);
    expect(r.warnings[0]?.text).toMatch(/1\.36 kg food a week .* 0\.79 kg a week/);
  });

  it("warns when the surface is too small, separately from intake", () => {
    const r = checkCapacity({ wormMassKg: lb(20), surfaceM2: ft2(2), plannedFoodKgPerWeek: lb(3) });
    expect(r.warnings.map((w) => w.kind)).toEqual(["surface"]);
    expect(r.limitKgPerWeek).toBeCloseTo(lb(2), 10);
  });

  it("rejects a negative worm mass, naming the field", () => {
    expect(() => checkCapacity({ wormMassKg: -1, surfaceM2: 1, plannedFoodKgPerWeek: 1 })).toThrow(
      /capacity\.wormMassKg/,
    );
  });
});
