// The plan's feedings: the planned and logged ones in the plan's months, with their stable ids,
// what the ledger gave each and why, in date-then-id order. A stage of computePlan of its own,
// so the optimiser compiles (and, should it need to, recompiles) it apart from the others.
import { AMOUNT_EPSILON, type LedgerResult } from "@/lib/engine/balance/ledger";
import type { PlanContext } from "@/lib/engine/plan/context";
import {
  feedingId,
  feedingIdPrefix,
  type LoggedClaim,
  type PlannedClaim,
} from "@/lib/engine/plan/demand";
import type { GardenInputs } from "@/lib/engine/plan/inputs";
import type { ExplainValue, Explanation, PlannedFeeding } from "@/lib/engine/plan/results";

/** The draws of a feeding that drew nothing: one shared, frozen empty list (the plan is read-only). */
const NO_DRAWS: PlannedFeeding["draws"] = Object.freeze([]) as unknown as PlannedFeeding["draws"];

/** What a rule's feedings inside a pre-harvest interval share in their explanations. */
interface CleanParts {
  need: number;
  quantity: ExplainValue;
  parts: Explanation[];
  /** The explanation of a feeding served in full (the same for every such date). */
  whole?: Explanation;
}

/** Why a feeding inside a pre-harvest interval got what it did: clean lots only. */
function cleanLotsExplanation(
  c: PlannedClaim,
  got: number,
  refused: number,
  shared: CleanParts,
  refs: PlantingRefs,
): Explanation {
  const unit = c.pool === "castings" ? "kg" : "L";
  return {
    kind: "pre-harvest-clean-lots",
    inputs: {
      planting: refs.of(c.plantingId),
      need: shared.quantity,
      fromCleanLots: { unit, value: got },
      manureStockRefused: { unit, value: refused },
    },
    parts: shared.parts,
  };
}

/** One reference object per planting, shared by every explanation that names it. */
export class PlantingRefs {
  private readonly refs = new Map<string, { ref: "planting"; id: string }>();
  of(id: string): { ref: "planting"; id: string } {
    let r = this.refs.get(id);
    if (!r) this.refs.set(id, (r = { ref: "planting", id }));
    return r;
  }
}

export interface PlanFeedings {
  /** By date, then id. */
  feedings: PlannedFeeding[];
  /** Day number of each feeding. */
  days: Int32Array;
  /** Index in inputs.plantings of each feeding's planting. */
  plantingOf: Int32Array;
  /** Per planting: the dates a pre-harvest interval kept manure-fed stock from, and how much. */
  blockedByPlanting: Map<string, { dates: string[]; kg: number }>;
}

export function planFeedings(
  inputs: GardenInputs,
  ctx: PlanContext,
  demand: { planned: readonly PlannedClaim[]; logged: readonly LoggedClaim[] },
  ledger: LedgerResult,
  refs: PlantingRefs,
): PlanFeedings {
  // Once per feeding (thousands): plain loops, module values in locals, the plan's window
  // compared inline.
  const EPS = AMOUNT_EPSILON;
  const planStart = ctx.planStartDay;
  const planEnd = ctx.planEndDay;
  const planned = demand.planned;
  const logged = demand.logged;
  // Feedings in the plan's months, planned and logged, with their stable ids.
  // Explanations share the parts that are the same for many rows (a planting's reference; a
  // rule's need and its own explanation): thousands of feedings need not carry copies, and the
  // JSON is the same. The plan is read-only to its callers.
  const cleanParts: (CleanParts | undefined)[] = []; // by rule
  const feedings: PlannedFeeding[] = [];
  // Per feeding, sized for every claim (at most that many feedings): its day number, its
  // planting's index, and the rule of a planned feeding whose id is its rule's prefix + date
  // (-1 otherwise), for the sort below.
  const most = planned.length + logged.length;
  const feedingDays = new Int32Array(most);
  const feedingPlanting = new Int32Array(most);
  const feedingRule = new Int32Array(most);
  const rulePrefix: string[] = []; // by rule
  const blockedByPlanting = new Map<string, { dates: string[]; kg: number }>();
  for (let i = 0; i < planned.length; i++) {
    const c = planned[i]!;
    if (c.day < planStart || c.day > planEnd) continue;
    const got = ledger.plannedGot[i]!;
    const refused = ledger.manureRefused[i]!;
    const blocked = c.cleanOnly && got <= EPS && refused > EPS;
    if (c.cleanOnly && refused > EPS) {
      const b = blockedByPlanting.get(c.plantingId) ?? { dates: [], kg: 0 };
      b.dates.push(c.date);
      b.kg += refused;
      blockedByPlanting.set(c.plantingId, b);
    }
    feedingDays[feedings.length] = c.day;
    feedingPlanting[feedings.length] = c.plantingIndex;
    const prefix = (rulePrefix[c.ruleIndex] ??= feedingIdPrefix(c.plantingId, c.material));
    feedingRule[feedings.length] = c.id.length === prefix.length + c.date.length ? c.ruleIndex : -1;
    let shared = c.cleanOnly ? cleanParts[c.ruleIndex] : undefined;
    if (c.cleanOnly && shared?.need !== c.need) {
      shared = {
        need: c.need,
        quantity: { unit: c.pool === "castings" ? "kg" : "L", value: c.need },
        parts: [c.explanation],
      };
      cleanParts[c.ruleIndex] = shared;
    }
    feedings.push({
      id: c.id,
      plantingId: c.plantingId,
      bedId: c.bedId,
      date: c.date,
      material: c.material,
      method: c.method,
      amount: c.amount,
      need: c.need,
      allocated: got,
      coveragePct: c.need > 0 ? (100 * got) / c.need : 100,
      status: blocked ? "blocked" : "planned",
      draws: ledger.plannedDraws?.[i] ?? NO_DRAWS,
      explanation: !shared
        ? c.explanation
        : got === c.need && refused === 0
          ? // Served in full from clean lots, as most are: the same words for every such date.
            (shared.whole ??= cleanLotsExplanation(c, got, refused, shared, refs))
          : cleanLotsExplanation(c, got, refused, shared, refs),
    });
  }
  const plantingIndexOf = new Map(inputs.plantings.map((p, i) => [p.id, i]));
  for (let i = 0; i < logged.length; i++) {
    const c = logged[i]!;
    if (c.day < planStart || c.day > planEnd) continue;
    const a = inputs.logs.applications[c.index]!;
    const got = ledger.loggedGot[i]!;
    const p = plantingIndexOf.get(a.plantingId)!;
    feedingDays[feedings.length] = c.day;
    feedingPlanting[feedings.length] = p;
    feedingRule[feedings.length] = -1;
    feedings.push({
      id: a.plannedFeedingId ?? feedingId(a.plantingId, a.material, a.date),
      plantingId: a.plantingId,
      bedId: inputs.plantings[p]!.bedId,
      date: a.date,
      material: a.material,
      method: a.method,
      amount: a.amount,
      need: c.need,
      allocated: got,
      coveragePct: c.need > 0 ? (100 * got) / c.need : 100,
      status: "logged",
      draws: ledger.loggedDraws?.[i] ?? NO_DRAWS,
      explanation: {
        kind: "application-logged",
        inputs: {
          planting: refs.of(a.plantingId),
          applied: { unit: a.material === "castings" ? "kg" : "L", value: a.amount },
          drawn: { unit: c.pool === "leachate" ? "L" : "kg", value: c.need },
          drawnFromStock: { unit: c.pool === "leachate" ? "L" : "kg", value: got },
        },
      },
    });
  }
  // By date, then id. Day numbers order exactly as the (checked, YYYY-MM-DD) dates do: the indices
  // are bucketed by day (a counting sort), then each day's run is sorted by id. Ids are unique in
  // practice, and then this is the one order of the comparison below; should two be equal, the
  // whole list is sorted with that comparison instead, as before.
  const byDateThenId = (a: number, b: number) => {
    const da = feedingDays[a]!;
    const db = feedingDays[b]!;
    return da < db ? -1 : da > db ? 1 : feedings[a]!.id < feedings[b]!.id ? -1 : 1;
  };
  const n = feedings.length;
  const idRank = idRanks(feedingRule.subarray(0, n), rulePrefix);
  let order = sortByDayThenId(
    feedingDays.subarray(0, n),
    feedings,
    idRank,
    ctx.planStartDay,
    ctx.planEndDay,
  );
  if (!order) {
    const byComparison = feedings.map((_, i) => i);
    byComparison.sort(byDateThenId);
    order = Int32Array.from(byComparison);
  }
  // Reordered in place through typed arrays, so every run sees the same kinds of arrays (a
  // mixed array here made the optimised plan fall back to slow code again and again).
  const unsorted = feedings.slice(); // (pointers only)
  const days = new Int32Array(order.length);
  const plantingOf = new Int32Array(order.length);
  for (let k = 0; k < order.length; k++) {
    feedings[k] = unsorted[order[k]!]!;
    days[k] = feedingDays[order[k]!]!;
    plantingOf[k] = feedingPlanting[order[k]!]!;
  }

  return { feedings, days, plantingOf, blockedByPlanting };
}

/**
 * A rank per feeding that orders same-day ids without comparing them: most ids are their rule's
 * prefix (planting:material:) plus the date, so on one day they order as their prefixes do, and
 * the prefixes (a few hundred) are sorted once instead of thousands of ids. Exact only when no
 * prefix starts another (a planting id with colons could); then null, and ids are compared.
 * Feedings whose id is not of that form get -1 and are compared by id.
 */
function idRanks(feedingRule: Int32Array, rulePrefix: readonly string[]): Int32Array | null {
  const rules: number[] = [];
  for (let r = 0; r < rulePrefix.length; r++) if (rulePrefix[r] !== undefined) rules.push(r);
  rules.sort((a, b) =>
    rulePrefix[a]! < rulePrefix[b]! ? -1 : rulePrefix[a]! > rulePrefix[b]! ? 1 : 0,
  );
  const rankOfRule = new Int32Array(rulePrefix.length).fill(-1);
  let rank = 0;
  for (let k = 0; k < rules.length; k++) {
    const here = rulePrefix[rules[k]!]!;
    const next = k + 1 < rules.length ? rulePrefix[rules[k + 1]!]! : undefined;
    // Sorted, so a prefix that starts any other starts the next different one. Rules with the
    // same prefix (two of one material on a planting) share a rank; their ids are compared.
    if (next !== undefined && next !== here && next.startsWith(here)) return null;
    rankOfRule[rules[k]!] = rank;
    if (next !== here) rank++;
  }
  const ranks = new Int32Array(feedingRule.length);
  for (let i = 0; i < feedingRule.length; i++) {
    const r = feedingRule[i]!;
    ranks[i] = r >= 0 ? rankOfRule[r]! : -1;
  }
  return ranks;
}

/** Indices of `feedings` by day then id, or null when two ids of one day are equal. */
function sortByDayThenId(
  days: Int32Array,
  feedings: readonly { id: string }[],
  idRank: Int32Array | null,
  firstDay: number,
  lastDay: number,
): Int32Array | null {
  const width = lastDay - firstDay + 1;
  if (!(width > 0)) return null;
  const counts = new Int32Array(width + 1);
  for (let i = 0; i < days.length; i++) {
    const d = days[i]!;
    if (d < firstDay || d > lastDay) return null;
    counts[d - firstDay + 1]!++;
  }
  for (let d = 1; d <= width; d++) counts[d]! += counts[d - 1]!;
  const order = new Int32Array(days.length);
  const starts = counts.slice();
  for (let i = 0; i < days.length; i++) order[starts[days[i]! - firstDay]!++] = i;
  let equal = false;
  const byId = (a: number, b: number) => {
    // Both ranked: the ranks order them as their ids would (see idRanks).
    if (idRank !== null) {
      const ra = idRank[a]!;
      const rb = idRank[b]!;
      if (ra >= 0 && rb >= 0 && ra !== rb) return ra < rb ? -1 : 1;
    }
    const ia = feedings[a]!.id;
    const ib = feedings[b]!.id;
    if (ia === ib) equal = true;
    return ia < ib ? -1 : 1;
  };
  for (let d = 0; d < width; d++) {
    const from = counts[d]!;
    const to = counts[d + 1]!;
    if (to - from < 2) continue;
    const run = order.slice(from, to).sort(byId);
    for (let k = 0; k < run.length; k++) order[from + k] = run[k]!;
    if (equal) return null;
  }
  return order;
}
