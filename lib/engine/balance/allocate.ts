// Who gets stock when there is not enough. Order: planting priority (lower
// number first), then feeder class (heavy > medium > light), then due date.
// Claims equal on all three form a tier, and a tier that cannot be filled is
// split pro rata to need, so no planting in it is favoured by input order.
import type { FeederClass } from "@/lib/engine/core/types";

export const FEEDER_RANK: Record<FeederClass, number> = { heavy: 0, medium: 1, light: 2 };

export interface Claim {
  /** Caller's index, so grants can be written back. */
  ref: number;
  priority: number;
  feederClass: FeederClass;
  day: number;
  need: number;
}

function compareClaims(a: Claim, b: Claim): number {
  return (
    a.priority - b.priority ||
    FEEDER_RANK[a.feederClass] - FEEDER_RANK[b.feederClass] ||
    a.day - b.day ||
    a.ref - b.ref
  );
}

function sameTier(a: Claim, b: Claim): boolean {
  return a.priority === b.priority && a.feederClass === b.feederClass && a.day === b.day;
}

/** Claims grouped into tiers in allocation order. O(n log n). */
export function orderIntoTiers(claims: readonly Claim[]): Claim[][] {
  const sorted = [...claims].sort(compareClaims);
  const tiers: Claim[][] = [];
  let current: Claim[] = [];
  for (const claim of sorted) {
    const head = current[0];
    if (head && !sameTier(head, claim)) {
      tiers.push(current);
      current = [];
    }
    current.push(claim);
  }
  if (current.length > 0) tiers.push(current);
  return tiers;
}

/**
 * Splits `available` over one tier: everyone in full when it suffices,
 * otherwise each gets need × available / tierNeed. Returns grants in tier order.
 */
export function splitTier(tier: readonly Claim[], available: number): number[] {
  let totalNeed = 0;
  for (const c of tier) totalNeed += c.need;
  if (totalNeed <= 0) return tier.map(() => 0);
  const share = Math.max(0, Math.min(1, available / totalNeed));
  return tier.map((c) => c.need * share);
}

/**
 * Allocates a whole set of claims against a supply that is the same for all of
 * them (e.g. one day's leachate). Used by tests and by the balance's daily pools.
 */
export function allocateByTiers(claims: readonly Claim[], available: number): Map<number, number> {
  const grants = new Map<number, number>();
  let left = Math.max(0, available);
  for (const tier of orderIntoTiers(claims)) {
    const split = splitTier(tier, left);
    tier.forEach((c, i) => {
      const g = split[i] ?? 0;
      grants.set(c.ref, g);
      left -= g;
    });
    left = Math.max(0, left);
  }
  return grants;
}

/**
 * Grants for one month of one pool, honouring the tier order while keeping
 * every grant deliverable from lots on hand on its date.
 *
 * Lots are sorted by the day they were made, so the lots usable on a day form
 * a contiguous run [lo, hi). The claims then form a convex bipartite graph,
 * for which Hall's condition reduces to runs: grants are deliverable iff for
 * every run [p, q) of lots, the grants whose usable lots lie inside it do not
 * exceed the run's stock. A tier gets the smallest slack over the runs that
 * contain its own. Only runs bounded by some claim's lo and hi matter, and
 * claims on the same day share one run, so the work per tier is bounded by
 * the days in the month, not by the number of plantings.
 *
 * Which lot each grant physically comes from is settled afterwards by drawing
 * in date order, oldest lot first; that order delivers every deliverable set
 * of grants (earliest-expiry-first is optimal for point-to-interval matching).
 */
export function grantMonth(
  lots: readonly { madeDay: number; remaining: number }[],
  keepDays: number,
  tiers: readonly Claim[][],
): Map<number, number> {
  const made = lots.map((l) => l.madeDay);
  const prefix = new Float64Array(lots.length + 1);
  lots.forEach((l, i) => (prefix[i + 1] = (prefix[i] as number) + l.remaining));
  const firstAfter = (day: number) => {
    let lo = 0;
    let hi = made.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((made[mid] as number) <= day) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  const runOf = new Map<number, [number, number]>();
  for (const tier of tiers) {
    const day = (tier[0] as Claim).day;
    if (!runOf.has(day)) runOf.set(day, [firstAfter(day - keepDays), firstAfter(day)]);
  }
  const P = [...new Set([...runOf.values()].map((r) => r[0]))].sort((a, b) => a - b);
  const Q = [...new Set([...runOf.values()].map((r) => r[1]))].sort((a, b) => a - b);
  const slack = new Float64Array(P.length * Q.length);
  P.forEach((p, i) =>
    Q.forEach(
      (q, j) =>
        (slack[i * Q.length + j] = q > p ? (prefix[q] as number) - (prefix[p] as number) : 0),
    ),
  );

  const grants = new Map<number, number>();
  for (const tier of tiers) {
    const [lo, hi] = runOf.get((tier[0] as Claim).day) as [number, number];
    let room = 0;
    const pMax = P.indexOf(lo);
    const qMin = Q.indexOf(hi);
    if (hi > lo) {
      room = Infinity;
      for (let i = 0; i <= pMax; i++) {
        for (let j = qMin; j < Q.length; j++)
          room = Math.min(room, slack[i * Q.length + j] as number);
      }
    }
    const split = splitTier(tier, Math.max(0, room));
    let total = 0;
    tier.forEach((c, k) => {
      const g = split[k] ?? 0;
      grants.set(c.ref, g);
      total += g;
    });
    if (total > 0) {
      for (let i = 0; i <= pMax; i++) {
        for (let j = qMin; j < Q.length; j++)
          slack[i * Q.length + j] = (slack[i * Q.length + j] as number) - total;
      }
    }
  }
  return grants;
}
