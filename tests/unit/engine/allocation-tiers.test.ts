import { describe, expect, it } from "vitest";
import { runLedger, toDayNumber, type LedgerClaim, type LedgerLot } from "@/lib/engine";

// Within a month, higher-priority feedings are served first, but they draw from the lots that the
// feedings still waiting cannot use, so serving them first does not lower the month's total
// coverage. Hand-worked cases on one month (June 2026) of castings; shelf life 60 days (the
// engine's default, Harit et al. 2014, see lib/engine/core/defaults.ts), so a lot made on
// 2026-04-27 is usable up to and including 2026-06-25 (27 Apr + 60 days = 26 Jun, exclusive).
const KEEP = { castings: 60, leachate: 7 };
const JUNE = [
  { month: "2026-06", startDay: toDayNumber("2026-06-01"), endDay: toDayNumber("2026-07-01") },
];
const castingsLot = (id: string, madeOn: string, kg: number, manure = false): LedgerLot => ({
  id,
  pool: "castings",
  madeDay: toDayNumber(madeOn),
  amount: kg,
  binId: null,
  manure,
});
const claim = (date: string, priority: number, need: number, cleanOnly = false): LedgerClaim => ({
  pool: "castings",
  day: toDayNumber(date),
  need,
  priority,
  feederClass: "heavy",
  cleanOnly,
});
const run = (lots: LedgerLot[], planned: LedgerClaim[]) =>
  runLedger({ lots, planned, logged: [], keepDays: KEEP, spans: JUNE, recordDrawsFrom: 0 });

describe("allocation across priority tiers within a month", () => {
  it("a later high-priority feeding takes the new lot, leaving the old one to the earlier low-priority feeding", () => {
    // old: 1 kg made 27 Apr (usable 5 Jun and 25 Jun); new: 1 kg made 20 Jun (usable 25 Jun only).
    // high (priority 1) on 25 Jun needs 1 kg; low (priority 3) on 5 Jun needs 1 kg.
    // Only `old` can serve the 5 Jun feeding, so high must take `new`: both get 1 kg, 2 of 2 kg.
    // (Oldest first, high took `old` and the low feeding got nothing.)
    const r = run(
      [castingsLot("old", "2026-04-27", 1), castingsLot("new", "2026-06-20", 1)],
      [claim("2026-06-05", 3, 1), claim("2026-06-25", 1, 1)],
    );
    expect(r.plannedGot[1]).toBeCloseTo(1, 12);
    expect(r.plannedGot[0]).toBeCloseTo(1, 12);
    expect(r.plannedDraws?.[1]).toEqual([{ lotId: "new", amount: 1 }]);
    expect(r.plannedDraws?.[0]).toEqual([{ lotId: "old", amount: 1 }]);
    expect(r.rows[0]!.shortfall).toBe(0);
  });

  it("manure-first gives way to a clean lot nobody else this month can use", () => {
    // m-old: 1 kg manure-fed, made 27 Apr; c-new: 1 kg clean, made 20 Jun.
    // high (not edible, may take either) on 25 Jun; low (not edible) on 5 Jun can use only m-old.
    // Taking manure first would leave the 5 Jun feeding short; taking c-new serves both.
    const r = run(
      [castingsLot("m-old", "2026-04-27", 1, true), castingsLot("c-new", "2026-06-20", 1)],
      [claim("2026-06-05", 3, 1), claim("2026-06-25", 1, 1)],
    );
    expect(r.plannedGot[1]).toBeCloseTo(1, 12);
    expect(r.plannedGot[0]).toBeCloseTo(1, 12);
    expect(r.plannedDraws?.[0]).toEqual([{ lotId: "m-old", amount: 1 }]);
  });

  it("an edible feeding inside its pre-harvest window keeps the clean lot; the others take manure", () => {
    // c-old: 1 kg clean, made 27 Apr; m-old: 1 kg manure-fed, made 28 Apr (both usable all month).
    // high (not edible) on 25 Jun; low edible inside its interval on 5 Jun (clean lots only,
    // 7 CFR 205.203(c)(1)). high takes m-old, low gets c-old: both served.
    const r = run(
      [castingsLot("c-old", "2026-04-27", 1), castingsLot("m-old", "2026-04-28", 1, true)],
      [claim("2026-06-05", 3, 1, true), claim("2026-06-25", 1, 1)],
    );
    expect(r.plannedDraws?.[1]).toEqual([{ lotId: "m-old", amount: 1 }]);
    expect(r.plannedGot[0]).toBeCloseTo(1, 12);
  });

  it("when stock is short the high-priority feeding is still served first", () => {
    // One lot of 1 kg usable on both days; high needs 1 kg, low needs 1 kg: high gets it all.
    const r = run(
      [castingsLot("old", "2026-04-27", 1)],
      [claim("2026-06-05", 3, 1), claim("2026-06-25", 1, 1)],
    );
    expect(r.plannedGot[1]).toBeCloseTo(1, 12);
    expect(r.plannedGot[0]).toBe(0);
  });
});
