// Closing a castings shortfall, computed and then proved by re-running the
// balance with the fix applied. Three kinds of fix:
//
// - Extra trays: one extra tray of the largest bin's geometry yields that
//   bin's kg per harvest. A tray takes T (processing) days, so it can be
//   harvested no sooner than T days after the plan starts. Trays are placed
//   on the first short day (as late as still helps, so each also serves the
//   most later days), enough to cover that day, and the balance re-run; this
//   repeats until nothing is short or the bound is hit.
// - Second bin: a copy of the largest bin (same parameters, no logs yet); the
//   latest start date, on or after the plan's first day, with no shortfall,
//   found by binary search on the start day. The date returned was itself run.
// - Rate cut: one percent cut on every castings and tea application of the
//   low-priority plantings (all but the best priority number present; all
//   plantings when they share one), smallest that balances, found by binary
//   search over whole tenths of a percent; the cut returned was itself run.
import { computeBalance } from "@/lib/engine/balance/balance";
import type { BalanceResult } from "@/lib/engine/balance/types";
import { dayNumber, isoFromDay, monthSpans } from "@/lib/engine/core/dates";
import { fmt } from "@/lib/engine/balance/explain";
import type { DemandOccurrence, SupplyEvent } from "@/lib/engine/core/types";
import type {
  BalanceProof,
  ExtraTraysSuggestion,
  GapContext,
  GapReport,
  GapSuggestion,
  RateCutSuggestion,
  SecondBinSuggestion,
} from "@/lib/engine/gap/types";

type Outcome<T> = { ok: T } | { why: string };

export function toProof(r: BalanceResult): BalanceProof {
  return {
    castings: r.castings.map(({ harvests: _h, ...row }) => row),
    leachate: r.leachate,
    totals: r.totals,
    firstShortfall: { castings: r.firstShortfall.castings, leachate: r.firstShortfall.leachate },
  };
}

const closes = (r: BalanceResult) => r.firstShortfall.castings === null;

function withSupply(ctx: GapContext, extra: SupplyEvent[]): BalanceResult {
  return computeBalance({ ...ctx.base, supply: [...ctx.base.supply, ...extra] });
}

function extraTrays(ctx: GapContext, planStart: number): Outcome<ExtraTraysSuggestion> {
  const tray = ctx.tray;
  if (!tray || !(tray.kgPerTray > 0))
    return { why: "the garden has no bin whose tray could be copied" };
  const max = ctx.maxExtraTrays ?? 60;
  const earliest = planStart + Math.ceil(tray.processingDays);
  const extras: SupplyEvent[] = [];
  for (;;) {
    const r = withSupply(ctx, extras);
    const first = r.firstShortfall.castings;
    if (first === null) {
      const harvests = extras.map((e) => ({
        startBy: isoFromDay(dayNumber(e.date) - Math.ceil(tray.processingDays)),
        harvestOn: e.date,
        kg: e.amount,
      }));
      return {
        ok: {
          kind: "extra-trays",
          trays: extras.length,
          harvests,
          proof: toProof(r),
          explanation: {
            text:
              `${extras.length} extra tray${extras.length === 1 ? "" : "s"} of ${fmt(tray.kgPerTray)} kg each ` +
              `(same size as ${tray.binId}), harvested on the first short days, leave no shortfall`,
            inputs: { trays: extras.length, kgPerTray: tray.kgPerTray },
          },
        },
      };
    }
    const day = dayNumber(first);
    if (day < earliest) {
      return {
        why: `the first short day, ${first}, comes before a tray started now could finish (${fmt(tray.processingDays, 0)} days)`,
      };
    }
    let short = 0;
    for (const o of r.occurrences)
      if (o.pool === "castings" && o.date === first) short += o.need - o.allocated;
    const n = Math.max(1, Math.ceil(short / tray.kgPerTray - 1e-9));
    if (extras.length + n > max) return { why: `more than ${max} extra trays would be needed` };
    for (let i = 0; i < n; i++) {
      extras.push({
        binId: `${tray.binId} (extra tray)`,
        date: first,
        material: "castings",
        amount: tray.kgPerTray,
        actual: false,
        manureFeedstock: tray.manureFeedstock,
        explanation: { text: `extra tray harvested ${first}: ${fmt(tray.kgPerTray)} kg` },
      });
    }
  }
}

function secondBin(
  ctx: GapContext,
  planStart: number,
  planEnd: number,
): Outcome<SecondBinSuggestion> {
  const sb = ctx.secondBin;
  if (!sb) return { why: "the garden has no bin to copy" };
  const cache = new Map<number, BalanceResult>();
  const run = (day: number) => {
    let r = cache.get(day);
    if (!r) {
      r = withSupply(ctx, sb.supplyFrom(isoFromDay(day)));
      cache.set(day, r);
    }
    return r;
  };
  if (!closes(run(planStart))) {
    return { why: `even a second bin started on ${isoFromDay(planStart)} leaves a shortfall` };
  }
  let lo = planStart;
  let hi = planEnd;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (closes(run(mid))) lo = mid;
    else hi = mid - 1;
  }
  const latest = isoFromDay(lo);
  return {
    ok: {
      kind: "second-bin",
      latestStart: latest,
      proof: toProof(run(lo)),
      explanation: {
        text: `a second bin like ${sb.binId}, started by ${latest}, covers every month`,
        inputs: { latestStart: latest },
      },
    },
  };
}

function lowPriorityIds(demand: readonly DemandOccurrence[]): Set<string> {
  let best = Infinity;
  for (const d of demand) if (d.material !== "leachate") best = Math.min(best, d.priority);
  const low = new Set<string>();
  for (const d of demand) if (d.material !== "leachate" && d.priority > best) low.add(d.plantingId);
  if (low.size === 0) for (const d of demand) if (d.material !== "leachate") low.add(d.plantingId);
  return low;
}

function rateCut(ctx: GapContext): Outcome<RateCutSuggestion> {
  const low = lowPriorityIds(ctx.base.demand);
  const run = (cut: number) =>
    computeBalance({
      ...ctx.base,
      demand: ctx.base.demand.map((d) =>
        d.material !== "leachate" && low.has(d.plantingId)
          ? { ...d, amount: d.amount * (1 - cut) }
          : d,
      ),
    });
  const full = run(1);
  if (!closes(full)) {
    return { why: "top-priority plantings are short even with every low-priority application cut" };
  }
  // Searched in whole tenths of a percent, so the figure is one a grower can apply.
  let lo = 0;
  let hi = 1000;
  let proof = full;
  while (lo < hi) {
    const mid = Math.floor((lo + hi) / 2);
    const r = run(mid / 1000);
    if (closes(r)) {
      hi = mid;
      proof = r;
    } else lo = mid + 1;
  }
  const cut = hi / 1000;
  const ids = [...low].sort();
  return {
    ok: {
      kind: "rate-cut",
      cutPct: cut * 100,
      plantingIds: ids,
      proof: toProof(proof),
      explanation: {
        text: `cutting every castings and tea application of ${ids.length} lower-priority planting${ids.length === 1 ? "" : "s"} by ${fmt(cut * 100)} % balances`,
        inputs: { cutPct: cut * 100, plantings: ids.length },
      },
    },
  };
}

export function closeGap(ctx: GapContext, baseline?: BalanceResult): GapReport {
  const base = baseline ?? computeBalance(ctx.base);
  const report: GapReport = {
    needed: !closes(base),
    shortfallKg: base.totals.castings.shortfall,
    firstShortfall: base.firstShortfall.castings,
    suggestions: [],
    unavailable: [],
    leachateShortfallL: base.totals.leachate.shortfall,
  };
  if (!report.needed) return report;
  const spans = monthSpans(ctx.base.options.from, ctx.base.options.months, "options.from");
  const planStart = spans[0]!.startDay;
  const planEnd = spans[spans.length - 1]!.endDay - 1;
  const tries: [GapSuggestion["kind"], () => Outcome<GapSuggestion>][] = [
    ["extra-trays", () => extraTrays(ctx, planStart)],
    ["second-bin", () => secondBin(ctx, planStart, planEnd)],
    ["rate-cut", () => rateCut(ctx)],
  ];
  for (const [kind, attempt] of tries) {
    const out = attempt();
    if ("ok" in out) report.suggestions.push(out.ok);
    else report.unavailable.push({ kind, explanation: { text: out.why } });
  }
  return report;
}
