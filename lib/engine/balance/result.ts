// The balance's closing figures: first shortfall, surplus and its value, blocked dates.
import { AMOUNT_EPSILON } from "@/lib/engine/balance/lots";
import { explainSurplus, fmt } from "@/lib/engine/balance/explain";
import { summariseCoverage } from "@/lib/engine/balance/coverage";
import { KG_PER_LB, type Resolved } from "@/lib/engine/balance/options";
import type {
  BalanceResult,
  CastingsMonth,
  OccurrenceResult,
  Pool,
  PoolTotals,
  PoolMonth,
} from "@/lib/engine/balance/types";
import type { BlockedOccurrence, Explanation } from "@/lib/engine/core/types";

export function finish(a: {
  spans: { month: string }[];
  castings: CastingsMonth[];
  leachate: PoolMonth[];
  occurrences: OccurrenceResult[];
  totals: BalanceResult["totals"];
  notes: Explanation[];
  opts: Resolved;
  blocked: readonly BlockedOccurrence[];
}): BalanceResult {
  const first: Record<Pool, string | null> = { castings: null, leachate: null };
  for (const occ of a.occurrences) {
    if (occ.need - occ.allocated <= Math.max(AMOUNT_EPSILON, occ.need * 1e-9)) continue;
    const cur = first[occ.pool];
    if (cur === null || occ.date < cur) first[occ.pool] = occ.date;
  }
  const any =
    [first.castings, first.leachate].filter((d): d is string => d !== null).sort()[0] ?? null;
  const tc = a.totals.castings;
  const pricePerKg = a.opts.pricePerLb / KG_PER_LB;
  const surplusKg = tc.agedOut + tc.closing;
  const surplusValue = surplusKg * pricePerKg;
  const byMonth: Record<string, number> = {};
  for (const b of a.blocked) byMonth[b.date.slice(0, 7)] = (byMonth[b.date.slice(0, 7)] ?? 0) + 1;
  return {
    months: a.spans.map((s) => s.month),
    castings: a.castings,
    leachate: a.leachate,
    occurrences: a.occurrences,
    coverage: summariseCoverage(a.occurrences),
    firstShortfall: { castings: first.castings, leachate: first.leachate, any },
    totals: {
      castings: {
        ...a.totals.castings,
        explanation: explainTotals("kg", a.spans.length, a.castings, a.totals.castings),
      },
      leachate: {
        ...a.totals.leachate,
        explanation: explainTotals("L", a.spans.length, a.leachate, a.totals.leachate),
      },
    },
    surplus: {
      castingsKg: surplusKg,
      value: surplusValue,
      pricePerLb: a.opts.pricePerLb,
      explanation: explainSurplus(tc.agedOut, tc.closing, a.opts.pricePerLb, surplusValue),
    },
    outputValue: {
      castingsKg: tc.supplied,
      value: tc.supplied * pricePerKg,
      explanation: {
        text: `${fmt(tc.supplied)} kg harvested × ${fmt(a.opts.pricePerLb, 2)} per lb (1 lb = 0.45359237 kg) = ${fmt(tc.supplied * pricePerKg, 2)}`,
        inputs: { harvestedKg: tc.supplied, pricePerLb: a.opts.pricePerLb },
      },
    },
    blocked: { items: [...a.blocked], byMonth },
    notes: a.notes,
  };
}

function explainTotals(
  unit: "kg" | "L",
  months: number,
  rows: readonly PoolMonth[],
  t: PoolTotals,
): Explanation {
  const opening = rows[0]?.opening ?? 0;
  return {
    text:
      `${months} month${months === 1 ? "" : "s"}: opening ${fmt(opening)} ${unit} + ${fmt(t.supplied)} ${unit} in − ${fmt(t.allocated)} ${unit} fed` +
      ` − ${fmt(t.agedOut)} ${unit} aged out or unused = ${fmt(t.closing)} ${unit}; ${fmt(t.shortfall)} ${unit} short in all`,
    inputs: {
      opening,
      supplied: t.supplied,
      allocated: t.allocated,
      agedOut: t.agedOut,
      closing: t.closing,
      shortfall: t.shortfall,
    },
  };
}
