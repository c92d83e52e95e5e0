// Closing a castings shortfall, computed and proved by re-running the ledger
// with the fix applied:
// - extra trays of the largest bin's size, placed on the first short day (as
//   late as still helps), repeated until nothing is short (at most 60);
// - a second bin like the largest one: the latest start date that leaves no
//   shortfall (binary search on the start day, the returned day was itself run);
// - a rate cut on the lower-priority plantings only (never the top priority
//   present), in whole percent below 100, the smallest that balances;
// - with no bins: start one (PS 20 tray from 24 × 20 in outside, 2×6 boards,
//   four trays, 2,000 worms, started the day after asOf);
// - buying the castings that are short, at the garden's price.
import { dflt } from "@/lib/engine/core/defaults";
import { fromDayNumber, toDayNumber } from "@/lib/engine/core/dates";
import {
  AMOUNT_EPSILON,
  runLedger,
  type LedgerInput,
  type LedgerLot,
} from "@/lib/engine/balance/ledger";
import { forecastCastings } from "@/lib/engine/supply/forecast";
import { trayInsideFromOuter, trayInsideVolumeL } from "@/lib/engine/supply/geometry";
import type { PlanContext } from "@/lib/engine/plan/context";
import type { PlannedClaim } from "@/lib/engine/plan/demand";
import type { GardenInputs } from "@/lib/engine/plan/inputs";
import type { GapReport, GapSuggestion, GardenPlan } from "@/lib/engine/plan/results";
import type { BinSupplyInfo, LotInfo } from "@/lib/engine/plan/supply";
import { toSi } from "@/lib/units";

interface GapArgs {
  inputs: GardenInputs;
  ctx: PlanContext;
  ledgerInput: LedgerInput;
  supply: { lots: LotInfo[]; bins: BinSupplyInfo[] };
  demand: { planned: PlannedClaim[] };
  plan: GardenPlan;
}

interface Short {
  kg: number;
  firstDay: number | null;
  /** Castings short on the first short day. */
  firstDayKg: number;
}

export function closePlanGap(a: GapArgs): GapReport {
  const { ctx } = a;
  const castingsRows = a.plan.rows.filter((r) => r.pool === "castings");
  const leachateRows = a.plan.rows.filter((r) => r.pool === "leachate");
  const report: GapReport = {
    needed: a.plan.firstShortfall.castings !== null,
    shortfallKg: castingsRows.reduce((s, r) => s + r.shortfall, 0),
    firstShortfall: a.plan.firstShortfall.castings,
    suggestions: [],
    unavailable: [],
    leachateShortfallL: leachateRows.reduce((s, r) => s + r.shortfall, 0),
  };
  if (!report.needed) return report;

  // Only the claims a fix could reach: castings and tea, after asOf, up to the plan's end.
  const planned = a.demand.planned;
  const inReach = planned.map(
    (c) => c.pool === "castings" && c.day > ctx.asOfDay && c.day <= ctx.planEndDay,
  );
  const shortOf = (lots: LedgerLot[], scale?: (c: PlannedClaim) => number): Short => {
    const r = runLedger({
      ...a.ledgerInput,
      lots,
      planned: scale ? planned.map((c) => ({ ...c, need: c.need * scale(c) })) : planned,
    });
    let kg = 0;
    let firstDay: number | null = null;
    let firstDayKg = 0;
    planned.forEach((c, i) => {
      if (!inReach[i] || c.day < ctx.planStartDay) return;
      const need = scale ? c.need * scale(c) : c.need;
      const gap = need - r.plannedGot[i]!;
      if (gap <= Math.max(AMOUNT_EPSILON, need * 1e-9)) return;
      kg += gap;
      if (firstDay === null || c.day < firstDay) {
        firstDay = c.day;
        firstDayKg = 0;
      }
      if (c.day === firstDay) firstDayKg += gap;
    });
    return { kg, firstDay, firstDayKg };
  };
  const baseLots = [...a.ledgerInput.lots];
  const largest = [...a.supply.bins].sort((x, y) => y.perHarvestKg - x.perHarvestKg)[0];
  const addUnavailable = (kind: GapSuggestion["kind"], why: string) =>
    report.unavailable.push({
      kind,
      explanation: { kind: "gap-unavailable", inputs: { why: { text: why } } },
    });

  if (largest) {
    // Extra trays.
    const T = largest.bin.processingDays ?? dflt("processingDays");
    const earliest = Math.max(ctx.asOfDay + 1, ctx.planStartDay) + Math.ceil(T);
    const extras: LedgerLot[] = [];
    let outcome: string | null = null;
    for (;;) {
      const s = shortOf([...baseLots, ...extras]);
      if (s.firstDay === null) break;
      if (s.firstDay < earliest) {
        outcome = `the first short day, ${fromDayNumber(s.firstDay)}, comes before a tray started now could finish (${T} days)`;
        break;
      }
      const n = Math.max(1, Math.ceil(s.firstDayKg / largest.perHarvestKg - 1e-9));
      if (extras.length + n > 60) {
        outcome = "more than 60 extra trays would be needed";
        break;
      }
      for (let i = 0; i < n; i++)
        extras.push({
          id: `extra-tray-${extras.length + 1}`,
          pool: "castings",
          madeDay: s.firstDay,
          amount: largest.perHarvestKg,
          binId: largest.bin.id,
          manure: largest.bin.manureFeedstock,
        });
    }
    if (outcome) addUnavailable("extra-trays", outcome);
    else
      report.suggestions.push({
        kind: "extra-trays",
        trays: extras.length,
        harvestDates: extras.map((e) => fromDayNumber(e.madeDay)),
        remainingShortfallKg: 0,
        explanation: {
          kind: "gap-extra-trays",
          inputs: {
            trays: { unit: "count", value: extras.length },
            perTray: { unit: "kg", value: largest.perHarvestKg },
            like: { ref: "bin", id: largest.bin.id },
            firstStartBy: {
              date: fromDayNumber(Math.min(...extras.map((e) => e.madeDay)) - Math.ceil(T)),
            },
          },
        },
      });

    // Second bin like the largest, latest start with no shortfall.
    const copy = (startDay: number): LedgerLot[] =>
      forecastCastings(
        {
          ...largest.forecastInput,
          binId: `${largest.bin.id}-copy`,
          startDate: fromDayNumber(startDay),
          asOf: undefined,
        },
        { from: fromDayNumber(startDay), to: fromDayNumber(ctx.planEndDay) },
      ).events.map((e, i) => ({
        id: `second-bin-${i}`,
        pool: "castings",
        madeDay: toDayNumber(e.date),
        amount: e.amount,
        binId: null,
        manure: largest.bin.manureFeedstock,
      }));
    let lo = ctx.asOfDay + 1;
    let hi = ctx.planEndDay;
    if (shortOf([...baseLots, ...copy(lo)]).firstDay !== null) {
      addUnavailable(
        "second-bin",
        `even a second bin started on ${fromDayNumber(lo)} leaves a shortfall`,
      );
    } else {
      while (lo < hi) {
        const mid = Math.ceil((lo + hi) / 2);
        if (shortOf([...baseLots, ...copy(mid)]).firstDay === null) lo = mid;
        else hi = mid - 1;
      }
      report.suggestions.push({
        kind: "second-bin",
        startDate: fromDayNumber(lo),
        remainingShortfallKg: 0,
        explanation: {
          kind: "gap-second-bin",
          inputs: {
            like: { ref: "bin", id: largest.bin.id },
            startBy: { date: fromDayNumber(lo) },
          },
        },
      });
    }
  } else {
    // No bins: start one now.
    const box = trayInsideFromOuter({
      outerLengthM: toSi(24, "in"),
      outerWidthM: toSi(20, "in"),
      board: "2x6",
    });
    const trays = dflt("startBinTrays");
    const worms = dflt("startBinWorms");
    const start = ctx.asOfDay + 1;
    const events = forecastCastings(
      {
        binId: "new-bin",
        startDate: fromDayNumber(start),
        trays,
        trayInsideVolumeL: trayInsideVolumeL(box),
      },
      { from: fromDayNumber(start), to: fromDayNumber(ctx.planEndDay) },
    ).events;
    const lots: LedgerLot[] = events.map((e, i) => ({
      id: `new-bin-${i}`,
      pool: "castings",
      madeDay: toDayNumber(e.date),
      amount: e.amount,
      binId: null,
      manure: false,
    }));
    const left = shortOf([...baseLots, ...lots]);
    report.suggestions.push({
      kind: "start-bin",
      startDate: fromDayNumber(start),
      tray: { insideLengthM: box.lengthM, insideWidthM: box.widthM, insideDepthM: box.depthM },
      traysInStack: trays,
      worms,
      remainingShortfallKg: left.kg,
      explanation: {
        kind: "gap-start-bin",
        inputs: {
          startOn: { date: fromDayNumber(start) },
          trays: { unit: "count", value: trays },
          worms: { unit: "count", value: worms },
          firstHarvest: events[0] ? { date: events[0].date } : { text: "after the plan" },
          stillShort: { unit: "kg", value: left.kg },
        },
      },
    });
  }

  // Rate cut on lower-priority plantings.
  let best = Infinity;
  planned.forEach((c, i) => inReach[i] && (best = Math.min(best, c.priority)));
  const low = new Set<string>();
  planned.forEach((c, i) => inReach[i] && c.priority > best && low.add(c.plantingId));
  if (low.size === 0) {
    addUnavailable(
      "rate-cut",
      "every planting fed castings or tea has the top priority, and those are never cut",
    );
  } else {
    const cut = (pct: number) => (c: PlannedClaim) => (low.has(c.plantingId) ? 1 - pct / 100 : 1);
    if (shortOf(baseLots, cut(99)).firstDay !== null) {
      addUnavailable(
        "rate-cut",
        "cutting the lower-priority plantings by 99 % still leaves the top priority short",
      );
    } else {
      let lo = 1;
      let hi = 99;
      while (lo < hi) {
        const mid = Math.floor((lo + hi) / 2);
        if (shortOf(baseLots, cut(mid)).firstDay === null) hi = mid;
        else lo = mid + 1;
      }
      const ids = [...low].sort();
      report.suggestions.push({
        kind: "rate-cut",
        cutPct: hi,
        plantingIds: ids,
        remainingShortfallKg: 0,
        explanation: {
          kind: "gap-rate-cut",
          inputs: {
            cut: { unit: "percent", value: hi },
            plantings: { unit: "count", value: ids.length },
          },
        },
      });
    }
  }

  // Buy what is short.
  report.suggestions.push({
    kind: "buy-castings",
    castingsKg: report.shortfallKg,
    cost: report.shortfallKg * ctx.pricePerKg,
    startDate: report.firstShortfall ?? undefined,
    remainingShortfallKg: 0,
    explanation: {
      kind: "gap-buy-castings",
      inputs: {
        castings: { unit: "kg", value: report.shortfallKg },
        price: { unit: "money/kg", value: ctx.pricePerKg },
        cost: { unit: "money", value: report.shortfallKg * ctx.pricePerKg },
        by: report.firstShortfall ? { date: report.firstShortfall } : { text: "—" },
      },
    },
  });
  return report;
}
