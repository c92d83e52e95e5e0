import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { computePlan, type ExplainValue, type GardenPlan } from "@/lib/engine";
import { scenarioToInputs } from "@/lib/scenario/to-inputs";
import { parseScenario } from "@/lib/validation/scenario";
import { toSi } from "@/lib/units";

// The demo garden (tests/fixtures/scenarios/hollis-street-garden.json, invented).
// Its history runs to 2026-12-01 (settings.asOf); the first block replays it only to
// 2026-07-31 (later logs left out, as the database adapter does) and plans the twelve
// months after, where the July → August hand computations below hold.
const LB = toSi(1, "lb"); // 0.45359237 kg exactly, NIST Handbook 44 Appendix C
const JULY = "2026-07-31";

function hollis(asOf?: string) {
  const parsed = parseScenario(
    JSON.parse(readFileSync("tests/fixtures/scenarios/hollis-street-garden.json", "utf8")),
  );
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return { scenario: parsed.scenario, inputs: scenarioToInputs(parsed.scenario, { asOf }) };
}

const row = (plan: GardenPlan, month: string, pool: "castings" | "leachate") =>
  plan.rows.find((r) => r.month === month && r.pool === pool)!;

describe("Hollis Street Garden — history replayed to 31 July 2026", () => {
  const { inputs } = hollis(JULY);
  const plan = computePlan(inputs);

  it("plans the twelve months after asOf", () => {
    expect(plan.months[0]).toBe("2026-08");
    expect(plan.months).toHaveLength(12);
  });

  it("opens August with what the replay leaves of the 1 July harvest: 44 − 2.2 − 1.5 = 40.3 lb", () => {
    // Hand computation from the fixture's logs:
    // - 1 July harvest: 44 lb (lot wood-stack:harvest:2026-07-01, usable to 29 Aug: 60-day shelf life, Harit et al. 2014).
    // - 10 July: tomato-north 2.2 lb and pepper-north 1.5 lb, both logged as drawn from that lot.
    // - 20 July squash (1.1 lb) and the four July tea brews (0.5 L × 0.1 × 0.7 kg/L each) name no lot,
    //   so they draw oldest first: the 1 June lot (46 lb, usable to 30 July), not the July one.
    // - The 1 June lot ages out on 31 July and the 2 May lot on 1 July, both before August.
    // So August opens with 44 − 2.2 − 1.5 = 40.3 lb = 40.3 × 0.45359237 kg.
    expect(row(plan, "2026-08", "castings").opening).toBeCloseTo(40.3 * LB, 9);
  });

  it("feeds every August castings application: the shelf is not empty", () => {
    const aug = plan.feedings.filter(
      (f) => f.date.startsWith("2026-08") && f.material === "castings",
    );
    expect(aug.length).toBeGreaterThan(0);
    for (const f of aug) expect(f.coveragePct).toBeCloseTo(100, 6);
  });

  it("reports the 31 July tray as due, not logged, and counts it from 1 August", () => {
    // Forecast schedule: start 1 Feb + T 90 days = 2 May, then every max(P 30, T/trays 22.5) = 30 days:
    // 1 Jun, 1 Jul, 31 Jul (PRODUCT.md "Output forecast"). 31 Jul has no log.
    const due = plan.warnings.filter((w) => w.kind === "harvest-not-logged");
    expect(due.map((w) => [w.binId, w.date])).toEqual([["wood-stack", "2026-07-31"]]);
    expect(row(plan, "2026-08", "castings").supplied).toBeGreaterThan(40 * LB);
  });

  it("covers kale's weekly drench from the week's drainage, not one day's drip", () => {
    // 6 plants × 1 cup (236.588 mL, NIST HB 44) of 1:10 solution = 1.42 L → 0.129 L leachate a week
    // (Arthur et al., HortScience: 1 part to 10 water); the bins drain about 0.7 L a week.
    const kale = plan.feedings.filter((f) => f.plantingId === "kale-east");
    expect(kale.length).toBeGreaterThan(5);
    for (const f of kale) {
      expect(f.need).toBeCloseTo((6 * toSi(1, "cup")) / 11, 9);
      expect(f.coveragePct).toBeCloseTo(100, 6);
    }
  });

  it("has at least one month short and one with castings to spare", () => {
    const castings = plan.rows.filter((r) => r.pool === "castings");
    expect(castings.some((r) => r.shortfall > 0)).toBe(true);
    expect(castings.some((r) => r.agedOut > 0 && r.shortfall === 0)).toBe(true);
  });

  it("never gives the manure-fed bin's castings to an edible crop inside its window (7 CFR 205.203(c)(1))", () => {
    // Chard and lettuce (harvest 15 Oct, 90 days) may have no manure-fed castings from 18 Jul;
    // the plastic bin's first tray (12 Sep) is manure-fed, the wooden stack's are clean.
    const inWindow = plan.feedings.filter(
      (f) => f.explanation.kind === "pre-harvest-clean-lots" && f.date >= "2026-09-12",
    );
    expect(inWindow.length).toBeGreaterThan(0);
    for (const f of inWindow) {
      expect(f.coveragePct).toBeCloseTo(100, 6);
      for (const d of f.draws) expect(d.lotId.startsWith("plastic-pair")).toBe(false);
    }
  });

  it("runs the split bin's worms from the logged move of 600", () => {
    const pair = plan.bins.find((b) => b.binId === "plastic-pair")!;
    expect(pair.months[0]!.worms).toBeGreaterThan(600);
  });

  it("explains every figure as data: no text with a unit baked in", () => {
    const strings: string[] = [];
    const walk = (v: unknown) => {
      if (v && typeof v === "object") {
        const e = v as Record<string, unknown>;
        if ("kind" in e && "inputs" in e) {
          for (const x of Object.values(e.inputs as Record<string, ExplainValue>))
            if ("text" in x) strings.push(x.text);
        }
        Object.values(e).forEach(walk);
      }
    };
    walk(plan);
    expect(strings.length).toBeGreaterThan(0);
    for (const s of strings) expect(s).not.toMatch(/\d\s*(kg|lb|L|gal|g|oz|mL)\b/);
    for (const r of plan.rows) expect(r.explanation.kind).toBe("pool-month");
  });

  it("keeps every planned feeding's id across a recompute", () => {
    const again = computePlan(hollis(JULY).inputs);
    expect(again.feedings.map((f) => f.id)).toEqual(plan.feedings.map((f) => f.id));
    expect(again.bins.flatMap((b) => b.tasks.map((t) => t.id))).toEqual(
      plan.bins.flatMap((b) => b.tasks.map((t) => t.id)),
    );
  });
});

describe("Hollis Street Garden — the live demo, history replayed to 1 December 2026", () => {
  const { scenario, inputs } = hollis();
  const plan = computePlan(inputs, { from: "2026-08", months: 12 });

  it("is planned as of the fixture's own asOf, 2026-12-01", () => {
    expect(scenario.settings.asOf).toBe("2026-12-01");
    expect(inputs.asOf).toBe("2026-12-01");
  });

  it("has no harvest due but not logged before November: every tray up to then is in the log", () => {
    // Logged harvests: wood stack 1 Aug, 31 Aug, 30 Sep, 30 Oct, 29 Nov (30-day cadence);
    // plastic bin 12 Sep, 27 Oct (45-day cadence). Next due: 29 Dec and 11 Dec, after asOf.
    const early = plan.warnings.filter(
      (w) => w.kind === "harvest-not-logged" && (w.date ?? "") < "2026-11-01",
    );
    expect(early).toEqual([]);
  });

  it("opens August 2026 with the July harvest's remainder: 44 − 2.2 − 1.5 = 40.3 lb", () => {
    // Same hand computation as the July replay: the 1 July harvest (44 lb) less the two
    // 10 July feedings logged against it (tomato-north 2.2 lb, pepper-north 1.5 lb); the
    // unnamed July draws take the older 1 June lot first, and the 2 May and 1 June lots
    // age out (60 days, Harit et al. 2014) on 1 July and 31 July. The August logs (harvest
    // 1 Aug, feedings from 10 Aug) come after the opening and do not change it.
    expect(row(plan, "2026-08", "castings").opening).toBeCloseTo(40.3 * LB, 9);
  });

  it("replays August as logged: castings in are the 1 and 31 August harvests, 43.5 + 45 lb", () => {
    // Two castings lots are made in August, both logged wood-stack harvests: 1 Aug 43.5 lb
    // and 31 Aug 45 lb = 88.5 lb. The plastic bin's first tray is logged on 12 Sep.
    expect(row(plan, "2026-08", "castings").supplied).toBeCloseTo((43.5 + 45) * LB, 9);
  });
});
