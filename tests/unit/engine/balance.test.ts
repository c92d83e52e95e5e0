import { computeBalance } from "@/lib/engine/balance";
import { EngineInputError } from "@/lib/engine/errors";
import type { BalanceInput } from "@/lib/engine/balance-types";
import { collect, harvest, want } from "./balance-fixtures";

const run = (over: Partial<BalanceInput> & { from?: string; months?: number }) =>
  computeBalance({
    supply: over.supply ?? [],
    demand: over.demand ?? [],
    blocked: over.blocked,
    openingLots: over.openingLots,
    options: { from: over.from ?? "2026-03", months: over.months ?? 1, ...over.options },
  });

describe("computeBalance — conservation and ageing", () => {
  it("opening + harvested − fed − aged out = closing, and says so in words", () => {
    // Shelf life 60 days (Harit et al. 2014): a lot made 2026-01-15 is last usable
    // 2026-03-15, so its 1.2 kg ages out in March. 11.2 + 1.2 = 12.4 kg opening.
    const r = run({
      openingLots: [
        { id: "old", material: "castings", madeOn: "2026-01-15", amount: 1.2 },
        { id: "feb", material: "castings", madeOn: "2026-02-20", amount: 11.2 },
      ],
      supply: [harvest("2026-03-10", 20.3)],
      demand: [want("tomato", "2026-03-20", 9.8)],
    });
    const m = r.castings[0]!;
    expect(m.opening).toBeCloseTo(12.4, 9);
    expect(m.supplied).toBeCloseTo(20.3, 9);
    expect(m.allocated).toBeCloseTo(9.8, 9);
    expect(m.agedOut).toBeCloseTo(1.2, 9);
    expect(m.closing).toBeCloseTo(12.4 + 20.3 - 9.8 - 1.2, 9);
    expect(m.explanation.text).toBe(
      "2026-03: opening 12.4 kg + 20.3 kg harvested − 9.8 kg fed − 1.2 kg aged out = 21.7 kg; wanted 9.8 kg, all covered",
    );
    expect(m.harvests[0]?.explanation.text).toBe("test harvest 20.3 kg");
    expect(r.totals.castings.explanation?.text).toBe(
      "1 month: opening 12.4 kg + 20.3 kg in − 9.8 kg fed − 1.2 kg aged out or unused = 21.7 kg; 0.0 kg short in all",
    );
  });

  it("uses the oldest usable lot first, so the younger one is carried", () => {
    const r = run({
      months: 3,
      from: "2026-03",
      openingLots: [{ id: "feb", material: "castings", madeOn: "2026-02-01", amount: 5 }],
      supply: [harvest("2026-03-05", 5)],
      demand: [want("a", "2026-03-10", 5)],
    });
    // Feb lot (5 kg) is fed on 03-10; the 03-05 lot (5 kg) lasts until 2026-05-03
    // (60 days) so it is still stock at the end of April and ages out in May.
    expect(r.castings[0]?.closing).toBeCloseTo(5, 9);
    expect(r.castings[1]?.agedOut).toBe(0);
    expect(r.castings[2]?.agedOut).toBeCloseTo(5, 9);
    expect(r.surplus.castingsKg).toBeCloseTo(5, 9);
  });

  it("drops opening stock that is already past its shelf life", () => {
    const r = run({
      openingLots: [{ id: "x", material: "castings", madeOn: "2025-12-01", amount: 4 }],
    });
    expect(r.castings[0]?.opening).toBe(0);
    expect(r.notes.length).toBe(1);
  });
});

describe("computeBalance — when short", () => {
  it("a harvest cannot feed an application dated before it", () => {
    const r = run({ supply: [harvest("2026-03-10", 10)], demand: [want("a", "2026-03-05", 2)] });
    expect(r.occurrences[0]?.allocated).toBe(0);
    expect(r.firstShortfall.castings).toBe("2026-03-05");
    expect(r.castings[0]?.shortfall).toBe(2);
  });

  it("priority first: a later priority-1 feed is served before an earlier priority-2 one", () => {
    const r = run({
      openingLots: [{ id: "s", material: "castings", madeOn: "2026-02-25", amount: 10 }],
      demand: [
        want("low", "2026-03-05", 6, { priority: 2, feederClass: "heavy" }),
        want("high", "2026-03-20", 6, { priority: 1, feederClass: "light" }),
      ],
    });
    const byId = Object.fromEntries(r.occurrences.map((o) => [o.plantingId, o]));
    expect(byId.high?.allocated).toBe(6);
    expect(byId.low?.allocated).toBeCloseTo(4, 9);
    expect(byId.low?.coveragePct).toBeCloseTo((4 / 6) * 100, 9);
    expect(r.firstShortfall.any).toBe("2026-03-05");
  });

  it("a later high-priority feed does not take stock an earlier feed needs when a later harvest can serve it", () => {
    // 4 kg on hand from Feb; 10 kg harvested 03-10. The priority-3 feed on 03-01
    // can only use the Feb lot; the priority-1 feed on 03-20 can use either.
    const r = run({
      openingLots: [{ id: "feb", material: "castings", madeOn: "2026-02-20", amount: 4 }],
      supply: [harvest("2026-03-10", 10)],
      demand: [
        want("early-low", "2026-03-01", 4, { priority: 3 }),
        want("late-high", "2026-03-20", 4, { priority: 1 }),
      ],
    });
    expect(r.occurrences.map((o) => o.coveragePct)).toEqual([100, 100]);
    expect(r.firstShortfall.any).toBeNull();
  });

  it("then feeder class: heavy before medium before light", () => {
    const r = run({
      openingLots: [{ id: "s", material: "castings", madeOn: "2026-02-25", amount: 3 }],
      demand: [
        want("light", "2026-03-05", 2, { feederClass: "light" }),
        want("medium", "2026-03-05", 2, { feederClass: "medium" }),
        want("heavy", "2026-03-05", 2, { feederClass: "heavy" }),
      ],
    });
    const got = Object.fromEntries(r.occurrences.map((o) => [o.plantingId, o.allocated]));
    expect(got).toEqual({ heavy: 2, medium: 1, light: 0 });
  });

  it("then due date, and a tie is split pro rata", () => {
    const r = run({
      openingLots: [{ id: "s", material: "castings", madeOn: "2026-02-25", amount: 5 }],
      demand: [
        want("later", "2026-03-09", 4),
        want("a", "2026-03-02", 2),
        want("b", "2026-03-02", 6),
      ],
    });
    const got = Object.fromEntries(r.occurrences.map((o) => [o.plantingId, o.allocated]));
    // Tier on 03-02 wants 8 of 5 on hand → each gets 5/8 of its need (arithmetic).
    expect(got.a).toBeCloseTo(2 * (5 / 8), 12);
    expect(got.b).toBeCloseTo(6 * (5 / 8), 12);
    expect(got.later).toBe(0);
  });

  it("reports coverage per planting per month", () => {
    const r = run({
      months: 2,
      openingLots: [{ id: "s", material: "castings", madeOn: "2026-02-25", amount: 3 }],
      demand: [want("a", "2026-03-02", 2), want("a", "2026-03-16", 2), want("a", "2026-04-02", 1)],
    });
    const march = r.coverage.find((c) => c.month === "2026-03" && c.plantingId === "a");
    const april = r.coverage.find((c) => c.month === "2026-04");
    expect(march?.coveragePct).toBeCloseTo(75, 9); // 3 of 4 kg
    expect(april?.coveragePct).toBe(0);
    expect(march?.explanation.text).toContain("2 applications wanted 4.00 kg");
  });
});

describe("computeBalance — liquids and tea", () => {
  it("leachate does not keep: a collection only serves its own day", () => {
    const r = run({
      supply: [collect("2026-03-01", 5), collect("2026-03-02", 1)],
      demand: [
        want("a", "2026-03-01", 3, { material: "leachate" }),
        want("b", "2026-03-02", 3, { material: "leachate" }),
      ],
    });
    const got = Object.fromEntries(r.occurrences.map((o) => [o.plantingId, o.allocated]));
    expect(got).toEqual({ a: 3, b: 1 });
    expect(r.leachate[0]?.agedOut).toBe(2);
    expect(r.leachate[0]?.closing).toBe(0);
    expect(r.firstShortfall.leachate).toBe("2026-03-02");
  });

  it("tea draws castings from stock on the day at the recipe's ratio", () => {
    // 10 % solution (Arancon, via conference notes): taken here as 0.1 kg castings per litre.
    const r = run({
      options: { from: "2026-03", months: 1, teaCastingsKgPerLitre: 0.1 },
      openingLots: [{ id: "s", material: "castings", madeOn: "2026-02-25", amount: 1 }],
      demand: [want("a", "2026-03-03", 4, { material: "tea" })],
    });
    expect(r.castings[0]?.teaLitres).toBe(4);
    expect(r.castings[0]?.teaCastingsDemand).toBeCloseTo(0.4, 12);
    expect(r.castings[0]?.closing).toBeCloseTo(0.6, 12);
  });

  it("asks for the tea recipe rather than guessing it", () => {
    expect(() => run({ demand: [want("a", "2026-03-03", 4, { material: "tea" })] })).toThrow(
      /options\.teaCastingsKgPerLitre/,
    );
  });
});

describe("computeBalance — value, blocked dates, bad input", () => {
  it("values surplus at $1.00/lb by default (1 lb = 0.45359237 kg, NIST HB 44 App. C)", () => {
    const r = run({ supply: [harvest("2026-03-02", 10)] });
    expect(r.surplus.castingsKg).toBe(10);
    expect(r.surplus.value).toBeCloseTo(10 / 0.45359237, 9);
    expect(r.outputValue.value).toBeCloseTo(10 / 0.45359237, 9);
  });

  it("reports pre-harvest-blocked dates and does not allocate to them", () => {
    const blocked = [
      { plantingId: "lettuce", date: "2026-03-14", reason: "within 120 days of harvest" },
    ];
    const r = run({ supply: [harvest("2026-03-02", 10)], blocked });
    expect(r.blocked.items).toEqual(blocked);
    expect(r.blocked.byMonth["2026-03"]).toBe(1);
    expect(r.castings[0]?.allocated).toBe(0);
  });

  it("names the field of a bad amount or date", () => {
    expect(() => run({ demand: [want("a", "2026-03-03", -1)] })).toThrow(EngineInputError);
    expect(() => run({ demand: [want("a", "2026-03-03", -1)] })).toThrow(/demand\[0\]\.amount/);
    expect(() => run({ supply: [harvest("2026-02-30", 1)] })).toThrow(/supply\[0\]\.date/);
    expect(() => run({ from: "2026-13" })).toThrow(/options\.from/);
    expect(() => run({ months: 0 })).toThrow(/months/);
  });
});
