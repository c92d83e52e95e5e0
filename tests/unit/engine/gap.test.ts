import { computeBalance } from "@/lib/engine/balance";
import type { BalanceInput } from "@/lib/engine/balance-types";
import { closeGap } from "@/lib/engine/gap";
import type { GapContext } from "@/lib/engine/gap-types";
import { addDays } from "@/lib/engine/dates";
import { harvest, want } from "./balance-fixtures";

// Shelf life 60 days (Harit et al. 2014) throughout; amounts are invented.
const base = (over: Partial<BalanceInput> = {}): BalanceInput => ({
  supply: [],
  demand: [want("tomato", "2026-05-15", 5), want("tomato", "2026-06-15", 5)],
  openingLots: [],
  options: { from: "2026-03", months: 4 },
  ...over,
});

const monthlyBin = (start: string) =>
  [0, 30, 60, 90].map((k) => harvest(addDays(start, 30 + k), 10, "bin-2"));

const ctx = (b: BalanceInput): GapContext => ({
  base: b,
  tray: { binId: "bin-a", kgPerTray: 4, processingDays: 30, manureFeedstock: false },
  secondBin: { binId: "bin-a", supplyFrom: monthlyBin },
});

describe("closeGap", () => {
  it("says no fix is needed when nothing is short", () => {
    const report = closeGap(ctx(base({ demand: [] })));
    expect(report.needed).toBe(false);
    expect(report.suggestions).toEqual([]);
  });

  it("finds the fewest extra trays: 10 kg wanted at 4 kg a tray needs 3 (⌈10/4⌉)", () => {
    const report = closeGap(ctx(base()));
    const trays = report.suggestions.find((s) => s.kind === "extra-trays");
    expect(trays?.kind).toBe("extra-trays");
    if (trays?.kind !== "extra-trays") return;
    expect(trays.trays).toBe(Math.ceil(10 / 4));
    expect(trays.proof.totals.castings.shortfall).toBe(0);
    // Each tray needs its 30 processing days before its harvest.
    expect(trays.harvests[0]).toEqual({ startBy: "2026-04-15", harvestOn: "2026-05-15", kg: 4 });
    // Applied independently, the trays leave nothing short.
    const applied = computeBalance({
      ...base(),
      supply: trays.harvests.map((h) => harvest(h.harvestOn, h.kg)),
    });
    expect(applied.firstShortfall.castings).toBeNull();
  });

  it("finds the latest start for a second bin: first harvest 30 days after start must land by 05-15", () => {
    const report = closeGap(ctx(base()));
    const bin = report.suggestions.find((s) => s.kind === "second-bin");
    if (bin?.kind !== "second-bin") throw new Error("expected a second-bin suggestion");
    expect(bin.latestStart).toBe("2026-04-15");
    expect(bin.proof.firstShortfall.castings).toBeNull();
    const dayLater = computeBalance({ ...base(), supply: monthlyBin("2026-04-16") });
    expect(dayLater.firstShortfall.castings).not.toBeNull();
  });

  it("finds the smallest rate cut on lower-priority plantings: 6 kg for 4 + 4 wanted → cut the low one 50 %", () => {
    const b = base({
      openingLots: [{ id: "s", material: "castings", madeOn: "2026-02-28", amount: 6 }],
      demand: [
        want("top", "2026-03-10", 4, { priority: 1 }),
        want("low", "2026-03-10", 4, { priority: 2 }),
      ],
    });
    const report = closeGap(ctx(b));
    const cut = report.suggestions.find((s) => s.kind === "rate-cut");
    if (cut?.kind !== "rate-cut") throw new Error("expected a rate-cut suggestion");
    expect(cut.cutPct).toBeCloseTo(50, 9); // (4 − (6 − 4)) / 4
    expect(cut.plantingIds).toEqual(["low"]);
    expect(cut.proof.totals.castings.shortfall).toBe(0);
  });

  it("says so when no fix can close the gap within its bounds", () => {
    // Short on 03-02: no tray started now is done (30 days), no bin started now
    // harvests in time, and the only planting is top priority.
    const b = base({ demand: [want("top", "2026-03-02", 4)] });
    const report = closeGap(ctx(b));
    expect(report.needed).toBe(true);
    expect(report.suggestions.map((s) => s.kind)).toEqual(["rate-cut"]);
    const kinds = report.unavailable.map((u) => u.kind);
    expect(kinds).toEqual(["extra-trays", "second-bin"]);
    expect(report.unavailable[0]?.explanation.text).toContain("2026-03-02");
  });

  it("reports a rate cut as unavailable when top-priority plantings alone are short", () => {
    const b = base({
      demand: [
        want("top", "2026-03-02", 4, { priority: 1 }),
        want("low", "2026-03-02", 4, { priority: 2 }),
      ],
    });
    const report = closeGap(ctx(b));
    expect(report.suggestions).toEqual([]);
    expect(report.unavailable.map((u) => u.kind)).toContain("rate-cut");
  });
});
