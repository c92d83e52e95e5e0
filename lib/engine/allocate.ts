// Who gets stock when there is not enough. Order: planting priority (lower
// number first), then feeder class (heavy > medium > light), then due date.
// Claims equal on all three form a tier, and a tier that cannot be filled is
// split pro rata to need, so no planting in it is favoured by input order.
import type { FeederClass } from "@/lib/engine/types";

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
