// The stock ledger: every lot the garden ever had (stock, logged harvests and
// drains, forecast harvests and daily leachate), every logged application and
// every planned one, walked month by month from the first day of history to
// the end of the plan. Replay and forecast are the same walk: before `asOf`
// only logged applications draw, after it only planned ones.
//
// Per month and pool: opening + supplied − allocated − aged out = closing.
// - Logged applications draw first from the lots they name, then oldest first.
// - Planned claims are served in tier order (priority, feeder class, day);
//   a tier that cannot be filled is split pro rata to need.
// - A claim marked cleanOnly (an edible planting inside its pre-harvest
//   interval, 7 CFR 205.203(c)(1)) never draws from a manure-fed lot; other
//   claims draw manure-fed lots first, so clean stock is left for those that need it.
// - A lot is usable from the day it is made until the day before madeDay + keepDays.
// - Adjustments by hand (spilled, given away, found) change a lot on their own day,
//   after that day's logged applications, and are reported per month as `adjusted`.
import type { FeederClass, Material } from "@/lib/engine/core/types";

/** Amounts below this are float dust from pro-rata splits, not stock. */
export const AMOUNT_EPSILON = 1e-9;

/** Heavy feeders before medium before light when priorities tie. */
export const FEEDER_RANK: Record<FeederClass, number> = { heavy: 0, medium: 1, light: 2 };

export type Pool = "castings" | "leachate";

export interface LedgerLot {
  id: string;
  pool: Pool;
  madeDay: number;
  amount: number;
  binId: string | null;
  manure: boolean;
}

export interface LedgerClaim {
  pool: Pool;
  day: number;
  need: number;
  priority: number;
  feederClass: FeederClass;
  cleanOnly: boolean;
}

export interface LedgerLogged {
  pool: Pool;
  day: number;
  need: number;
  draws: { lotId: string; amount: number }[];
}

/** A hand adjustment of one lot on one day (pool units; negative takes away). */
export interface LedgerAdjustment {
  lotId: string;
  day: number;
  amount: number;
}

export interface LedgerSpan {
  month: string;
  startDay: number;
  endDay: number; // exclusive
}

export interface LedgerInput {
  lots: readonly LedgerLot[];
  planned: readonly LedgerClaim[];
  logged: readonly LedgerLogged[];
  keepDays: Record<Pool, number>;
  spans: readonly LedgerSpan[];
  adjustments?: readonly LedgerAdjustment[];
  /** Record which lot each claim on or after this day drew from (for explanations; off in the gap search). */
  recordDrawsFrom?: number;
  /** Return the lots as they stand at the start of this month index (to resume from there). */
  snapshotAtMonth?: number;
}

export interface LedgerRow {
  month: string;
  pool: Pool;
  opening: number;
  supplied: number;
  /** Hand adjustments this month (negative: taken away). opening + supplied + adjusted − allocated − agedOut = closing. */
  adjusted: number;
  demand: number;
  allocated: number;
  agedOut: number;
  closing: number;
  shortfall: number;
}

export interface LedgerResult {
  rows: LedgerRow[]; // spans × [castings, leachate]
  plannedGot: Float64Array;
  loggedGot: Float64Array;
  /** Manure-fed stock a cleanOnly claim could not take although it was on hand (per planned claim). */
  manureRefused: Float64Array;
  plannedDraws?: ({ lotId: string; amount: number }[] | undefined)[];
  loggedDraws?: ({ lotId: string; amount: number }[] | undefined)[];
  /** Every lot that aged out with something left, on the day it expired. */
  agedOut: { lotId: string; pool: Pool; day: number; amount: number; binId: string | null }[];
  /** Logged draws that named an unknown lot or more than it held (taken oldest first instead). */
  overdrawn: { loggedIndex: number; lotId: string; amount: number }[];
  /** Lots still on the shelves (or yet to be made) at the start of `snapshotAtMonth`. */
  snapshot?: LedgerLot[];
}

interface Live {
  id: string;
  made: number;
  expires: number;
  remaining: number;
  manure: boolean;
  binId: string | null;
}

const CLEAN_ONLY = [false] as const;
const MANURE_FIRST = [true, false] as const;

class Shelf {
  lots: Live[];
  made: Float64Array;
  head = 0;
  /** Every lot in [head, drained) has nothing left (stock is only ever taken, never put back). */
  drained = 0;
  constructor(lots: readonly LedgerLot[], keep: number) {
    this.lots = new Array<Live>(lots.length);
    let sorted = true;
    for (let i = 0; i < lots.length; i++) {
      const l = lots[i]!;
      this.lots[i] = {
        id: l.id,
        made: l.madeDay,
        expires: l.madeDay + keep,
        remaining: l.amount,
        manure: l.manure,
        binId: l.binId,
      };
      if (i > 0 && l.madeDay < lots[i - 1]!.madeDay) sorted = false;
    }
    // Lots mostly come in date order (a bin's days one after another); sort (stable) only when not.
    if (!sorted) this.lots.sort((a, b) => a.made - b.made);
    this.made = new Float64Array(this.lots.length);
    for (let i = 0; i < this.lots.length; i++) this.made[i] = this.lots[i]!.made;
  }
  private firstMadeAfter(day: number): number {
    let lo = this.head;
    let hi = this.lots.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.made[mid]! <= day) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }
  /** Start of the lots usable on `day`: [usableFrom, usableTo) (keep is the same for every lot of a pool). */
  usableFrom(day: number, keep: number): number {
    return this.firstMadeAfter(day - keep);
  }
  /** End (exclusive) of the lots usable on `day`. */
  usableTo(day: number): number {
    return this.firstMadeAfter(day);
  }
  /** `lo` moved past the drained lots at its start: they add nothing to a sum or a draw. */
  skipDrained(lo: number, hi: number): number {
    let i = Math.max(this.drained, this.head);
    while (i < hi && this.lots[i]!.remaining === 0) i++;
    this.drained = i;
    return Math.max(lo, i);
  }
  available(lo: number, hi: number, cleanOnly: boolean): number {
    let s = 0;
    for (let i = this.skipDrained(lo, hi); i < hi; i++) {
      const l = this.lots[i]!;
      if (!cleanOnly || !l.manure) s += l.remaining;
    }
    return s;
  }
  /**
   * Draws oldest first; `manure-first` takes manure-fed lots before clean ones, `clean-only` skips
   * them. With `wanted`, lots no feeding still waiting could use go first (each in that order), so
   * a feeding served early leaves the waiting ones the lots only they can use.
   */
  draw(
    lo: number,
    hi: number,
    amount: number,
    mode: "clean-only" | "manure-first",
    out?: { lotId: string; amount: number }[],
    wanted?: (lot: Live) => boolean,
  ): number {
    let left = amount;
    const passes = mode === "clean-only" ? CLEAN_ONLY : MANURE_FIRST;
    const start = this.skipDrained(lo, hi);
    let flags: Uint8Array | undefined;
    if (wanted) {
      flags = new Uint8Array(hi - start);
      for (let i = start; i < hi; i++) {
        const l = this.lots[i]!;
        flags[i - start] = l.remaining > 0 && wanted(l) ? 1 : 0;
      }
    }
    for (let round = flags ? 0 : 1; round <= 1; round++) {
      for (const wantManure of passes) {
        for (let i = start; i < hi && left > AMOUNT_EPSILON; i++) {
          const l = this.lots[i]!;
          if (l.manure !== wantManure || l.remaining <= 0) continue;
          if (flags && flags[i - start] !== round) continue;
          const take = Math.min(l.remaining, left);
          l.remaining -= take;
          if (l.remaining < AMOUNT_EPSILON) l.remaining = 0;
          left -= take;
          out?.push({ lotId: l.id, amount: take });
        }
      }
    }
    return amount - Math.max(0, left);
  }
  /** Stock made before `day` and still on the shelf. */
  onHand(day: number): number {
    let s = 0;
    for (let i = this.head; i < this.lots.length && this.made[i]! < day; i++)
      s += this.lots[i]!.remaining;
    return s;
  }
  made_in(from: number, to: number): number {
    let s = 0;
    for (let i = this.firstMadeAfter(from - 1); i < this.lots.length && this.made[i]! < to; i++)
      s += this.lots[i]!.remaining;
    return s;
  }
  /** Drops lots expired by `day` (a prefix: expiry is made + keep). */
  ageOut(day: number, pool: Pool, out: LedgerResult["agedOut"]): number {
    let lost = 0;
    while (this.head < this.lots.length && this.lots[this.head]!.expires <= day) {
      const l = this.lots[this.head]!;
      if (l.remaining > AMOUNT_EPSILON) {
        lost += l.remaining;
        out.push({ lotId: l.id, pool, day: l.expires, amount: l.remaining, binId: l.binId });
      }
      this.head++;
    }
    return lost;
  }
}

/**
 * One draw of `amount` for a group of claims on one day (`group[from..from+n)`), shared in
 * proportion to `weights[0..n)` into `out[0..n)` (recorded per claim, split the same way, when the
 * caller records draws). Scratch arrays in and out: this runs once per feeding group.
 */
function drawShared(
  shelf: Shelf,
  keep: number,
  day: number,
  amount: number,
  mode: "clean-only" | "manure-first",
  group: readonly number[],
  from: number,
  n: number,
  weights: Float64Array,
  out: Float64Array,
  records: LedgerResult["plannedDraws"],
  wanted?: (lot: Live) => boolean,
): void {
  let total = 0;
  for (let k = 0; k < n; k++) total += weights[k]!;
  if (!(amount > AMOUNT_EPSILON) || !(total > 0)) {
    out.fill(0, 0, n);
    return;
  }
  const lo = shelf.usableFrom(day, keep);
  const hi = shelf.usableTo(day);
  let recorded = 0;
  if (records !== undefined)
    for (let k = 0; k < n; k++) if (records[group[from + k]!] !== undefined) recorded++;
  // A group of one takes the whole draw (w / w is exactly 1): its list takes the records as drawn.
  const drawn: { lotId: string; amount: number }[] | undefined =
    recorded === 0 ? undefined : n === 1 ? records![group[from]!]! : [];
  const got = shelf.draw(lo, hi, amount, mode, drawn, wanted);
  for (let k = 0; k < n; k++) out[k] = (got * weights[k]!) / total;
  if (drawn && n > 1)
    for (let k = 0; k < n; k++) {
      const list = records![group[from + k]!];
      if (!list) continue;
      const part = weights[k]! / total;
      for (const d of drawn) list.push({ lotId: d.lotId, amount: d.amount * part });
    }
}

/**
 * The planned feedings of one month and pool not served yet, counted per day (Fenwick trees), so
 * a draw can ask whether any of them could use a lot: one usable on some day of the lot's window,
 * and clean-only ones only from clean lots.
 */
class Waiting {
  private readonly any: Int32Array;
  private readonly cleanOnly: Int32Array;
  count = 0;
  constructor(
    private readonly startDay: number,
    private readonly endDay: number,
  ) {
    this.any = new Int32Array(endDay - startDay + 1);
    this.cleanOnly = new Int32Array(endDay - startDay + 1);
  }
  add(day: number, cleanOnly: boolean, delta: 1 | -1): void {
    const tree = cleanOnly ? this.cleanOnly : this.any;
    for (let i = day - this.startDay + 1; i < tree.length; i += i & -i) tree[i]! += delta;
    this.count += delta;
  }
  private before(tree: Int32Array, day: number): number {
    let s = 0;
    for (let i = Math.min(day, this.endDay) - this.startDay; i > 0; i -= i & -i) s += tree[i]!;
    return s;
  }
  /** Could a waiting feeding use `lot` (usable from its made day to the day before it expires)? */
  wants = (lot: Live): boolean => {
    const from = Math.max(lot.made, this.startDay);
    const to = Math.min(lot.expires, this.endDay);
    if (to <= from) return false;
    if (this.before(this.any, to) - this.before(this.any, from) > 0) return true;
    return !lot.manure && this.before(this.cleanOnly, to) - this.before(this.cleanOnly, from) > 0;
  };
}

/** An empty draw list for each claim on or after `from`, undefined before it (no lists when none is). */
function drawLists(
  claims: readonly { day: number }[],
  from: number,
): ({ lotId: string; amount: number }[] | undefined)[] | undefined {
  if (!claims.some((c) => c.day >= from)) return undefined;
  const lists = new Array<{ lotId: string; amount: number }[] | undefined>(claims.length);
  for (let i = 0; i < claims.length; i++) lists[i] = claims[i]!.day >= from ? [] : undefined;
  return lists;
}

/**
 * Indices of the planned claims in tier order: priority, feeder class, day, then index. When the
 * keys fit, each claim's order is one exact integer (a typed-array sort, no comparator); otherwise
 * the claims are sorted with the comparison itself. `keep(i)` selects the claims to order.
 */
function tierOrder(claims: readonly LedgerClaim[], keep: (i: number) => boolean): Int32Array {
  const n = claims.length;
  const picked: number[] = [];
  const priorities = new Set<number>();
  let minDay = Infinity;
  let maxDay = -Infinity;
  for (let i = 0; i < n; i++) {
    if (!keep(i)) continue;
    const c = claims[i]!;
    picked.push(i);
    priorities.add(c.priority);
    if (c.day < minDay) minDay = c.day;
    if (c.day > maxDay) maxDay = c.day;
  }
  const ranks = [...priorities].sort((a, b) => a - b);
  const width = maxDay - minDay + 1;
  const out = new Int32Array(picked.length);
  if (ranks.length * 3 * width * n < Number.MAX_SAFE_INTEGER && Number.isInteger(width)) {
    const rankOf = new Map(ranks.map((p, r) => [p, r]));
    const keys = new Float64Array(picked.length);
    picked.forEach((i, k) => {
      const c = claims[i]!;
      const tier = rankOf.get(c.priority)! * 3 + FEEDER_RANK[c.feederClass];
      keys[k] = (tier * width + (c.day - minDay)) * n + i;
    });
    keys.sort();
    for (let k = 0; k < keys.length; k++) out[k] = keys[k]! % n;
    return out;
  }
  const compare = tierCompare(claims);
  picked.sort((a, b) => compare(a, b) || a - b);
  out.set(picked);
  return out;
}

/** Tier comparison of two planned claims by index: priority, feeder class, day. */
function tierCompare(claims: readonly LedgerClaim[]): (a: number, b: number) => number {
  return (a, b) => {
    const x = claims[a]!;
    const y = claims[b]!;
    return (
      x.priority - y.priority ||
      FEEDER_RANK[x.feederClass] - FEEDER_RANK[y.feederClass] ||
      x.day - y.day
    );
  };
}

export function runLedger(input: LedgerInput): LedgerResult {
  const pools: Pool[] = ["castings", "leachate"];
  const shelves: Record<Pool, Shelf> = {
    castings: new Shelf(
      input.lots.filter((l) => l.pool === "castings"),
      input.keepDays.castings,
    ),
    leachate: new Shelf(
      input.lots.filter((l) => l.pool === "leachate"),
      input.keepDays.leachate,
    ),
  };
  // Only logs that name their lots look lots up by id; most replays name none, so build it on demand.
  let byIdMap: Map<string, { shelf: Shelf; index: number; pool: Pool }> | undefined;
  const byId = () => {
    if (byIdMap) return byIdMap;
    byIdMap = new Map();
    for (const pool of pools)
      shelves[pool].lots.forEach((l, index) =>
        byIdMap!.set(l.id, { shelf: shelves[pool], index, pool }),
      );
    return byIdMap;
  };

  const spans = input.spans;
  const monthIndex = (day: number): number => {
    let lo = 0;
    let hi = spans.length - 1;
    if (spans.length === 0 || day < spans[0]!.startDay || day >= spans[hi]!.endDay) return -1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (spans[mid]!.startDay <= day) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  };
  const slot = (m: number, pool: Pool) => m * 2 + (pool === "castings" ? 0 : 1);
  // Planned claims per month and pool, each list in tier order (a sub-list of one sorted whole).
  const plannedMonth = new Int32Array(input.planned.length);
  input.planned.forEach((c, i) => (plannedMonth[i] = c.need > 0 ? monthIndex(c.day) : -1));
  const plannedByMonth: number[][] = Array.from({ length: spans.length * 2 }, () => []);
  const inTierOrder = tierOrder(input.planned, (i) => plannedMonth[i]! >= 0);
  for (let k = 0; k < inTierOrder.length; k++) {
    const i = inTierOrder[k]!;
    plannedByMonth[slot(plannedMonth[i]!, input.planned[i]!.pool)]!.push(i);
  }
  const tiers = tierCompare(input.planned);
  // Logged claims bucketed by day (a counting sort: days are integers), so each month's list
  // is already in date order.
  const loggedByMonth: number[][] = Array.from({ length: spans.length * 2 }, () => []);
  // Day, need and "names its lots" of each logged claim, copied once: the replay reads them in
  // date order, which is not the order the claims were built in.
  const loggedDay = new Int32Array(input.logged.length);
  const loggedNeed = new Float64Array(input.logged.length);
  const loggedNames = new Uint8Array(input.logged.length);
  const loggedCastings = new Uint8Array(input.logged.length);
  for (let i = 0; i < input.logged.length; i++) {
    const c = input.logged[i]!;
    loggedDay[i] = c.day;
    loggedNeed[i] = c.need;
    loggedNames[i] = c.draws.length > 0 ? 1 : 0;
    loggedCastings[i] = c.pool === "castings" ? 1 : 0;
  }
  if (spans.length > 0 && input.logged.length > 0) {
    const first = spans[0]!.startDay;
    const width = spans[spans.length - 1]!.endDay - first;
    const counts = new Int32Array(width + 1);
    const n = input.logged.length;
    for (let i = 0; i < n; i++) {
      const day = loggedDay[i]!;
      if (day >= first && day < first + width) counts[day - first + 1]!++;
    }
    for (let d = 1; d <= width; d++) counts[d]! += counts[d - 1]!;
    const order = new Int32Array(counts[width]!);
    for (let i = 0; i < n; i++) {
      const day = loggedDay[i]!;
      if (day >= first && day < first + width) order[counts[day - first]!++] = i;
    }
    let m = 0;
    for (let k = 0; k < order.length; k++) {
      const i = order[k]!;
      while (loggedDay[i]! >= spans[m]!.endDay) m++;
      loggedByMonth[m * 2 + (loggedCastings[i] === 1 ? 0 : 1)]!.push(i);
    }
  }

  // Adjustments bucketed like logged claims (those before the first span are already in the lots).
  const adjustByMonth: LedgerAdjustment[][] = Array.from({ length: spans.length * 2 }, () => []);
  for (const adj of input.adjustments ?? []) {
    const at = byId().get(adj.lotId);
    const m = monthIndex(adj.day);
    if (at && m >= 0) adjustByMonth[slot(m, at.pool)]!.push(adj);
  }
  for (const list of adjustByMonth) list.sort((a, b) => a.day - b.day);
  /** Applies one adjustment to a lot on the shelf that day; returns the change actually made. */
  const adjustLot = (adj: LedgerAdjustment): number => {
    const at = byId().get(adj.lotId)!;
    const lot = at.shelf.lots[at.index]!;
    if (adj.day < lot.made || adj.day >= lot.expires) return 0;
    const change = Math.max(-lot.remaining, adj.amount);
    lot.remaining += change;
    if (lot.remaining < AMOUNT_EPSILON) lot.remaining = 0;
    return change;
  };

  const from = input.recordDrawsFrom;
  const record = from !== undefined;
  const result: LedgerResult = {
    rows: [],
    plannedGot: new Float64Array(input.planned.length),
    loggedGot: new Float64Array(input.logged.length),
    manureRefused: new Float64Array(input.planned.length),
    plannedDraws: record ? drawLists(input.planned, from) : undefined,
    loggedDraws: record ? drawLists(input.logged, from) : undefined,
    agedOut: [],
    overdrawn: [],
  };

  // Scratch for one feeding group at a time: amounts named, weights and shares.
  let scratchSize = 16;
  let named = new Float64Array(scratchSize);
  let weights = new Float64Array(scratchSize);
  let shares = new Float64Array(scratchSize);
  const grow = (n: number) => {
    scratchSize = Math.max(n, scratchSize * 2);
    named = new Float64Array(scratchSize);
    weights = new Float64Array(scratchSize);
    shares = new Float64Array(scratchSize);
  };

  for (let m = 0; m < spans.length; m++) {
    const span = spans[m]!;
    if (m === input.snapshotAtMonth) {
      result.snapshot = [];
      for (const pool of pools) {
        const shelf = shelves[pool];
        for (let i = shelf.head; i < shelf.lots.length; i++) {
          const l = shelf.lots[i]!;
          if (l.remaining > 0)
            result.snapshot.push({
              id: l.id,
              pool,
              madeDay: l.made,
              amount: l.remaining,
              binId: l.binId,
              manure: l.manure,
            });
        }
      }
    }
    for (const pool of pools) {
      const shelf = shelves[pool];
      const keep = input.keepDays[pool];
      // Anything that expired before this month started was counted in the month it expired.
      const opening = shelf.onHand(span.startDay);
      const supplied = shelf.made_in(span.startDay, span.endDay);
      let demand = 0;
      let allocated = 0;
      const adjustments = adjustByMonth[slot(m, pool)]!;
      let adjusted = 0;
      let nextAdjustment = 0;
      const adjustBefore = (day: number) => {
        for (; nextAdjustment < adjustments.length; nextAdjustment++) {
          const adj = adjustments[nextAdjustment]!;
          if (adj.day >= day) break;
          adjusted += adjustLot(adj);
        }
      };

      // 1. What was done: logged applications, in date order. Those that name no lot and fall
      //    on the same day draw together (oldest first) and share the result in proportion.
      const logged = loggedByMonth[slot(m, pool)]!;
      for (let t = 0; t < logged.length;) {
        const firstDay = loggedDay[logged[t]!]!;
        adjustBefore(firstDay);
        let end = t + 1;
        if (loggedNames[logged[t]!] === 0)
          while (
            end < logged.length &&
            loggedDay[logged[end]!] === firstDay &&
            loggedNames[logged[end]!] === 0
          )
            end++;
        const n = end - t;
        if (n > scratchSize) grow(n);
        let rest = 0;
        for (let k = 0; k < n; k++) {
          const i = logged[t + k]!;
          const need = loggedNeed[i]!;
          let got = 0;
          if (loggedNames[i] === 1) {
            const out = result.loggedDraws?.[i];
            for (const d of input.logged[i]!.draws) {
              const at = byId().get(d.lotId);
              const lot = at && at.pool === pool ? at.shelf.lots[at.index]! : undefined;
              const take = lot ? Math.min(lot.remaining, Math.max(0, d.amount)) : 0;
              if (lot && take > 0) {
                lot.remaining -= take;
                out?.push({ lotId: lot.id, amount: take });
              }
              got += take;
              if (take < d.amount - AMOUNT_EPSILON)
                result.overdrawn.push({ loggedIndex: i, lotId: d.lotId, amount: d.amount - take });
            }
          }
          named[k] = got;
          weights[k] = Math.max(0, need - got);
          rest += Math.max(0, need - got);
          demand += need;
        }
        drawShared(
          shelf,
          keep,
          firstDay,
          rest,
          "manure-first",
          logged,
          t,
          n,
          weights,
          shares,
          result.loggedDraws,
        );
        for (let k = 0; k < n; k++) {
          result.loggedGot[logged[t + k]!] = named[k]! + shares[k]!;
          allocated += named[k]! + shares[k]!;
        }
        t = end;
      }

      // Adjustments are logs too (on or before asOf), so they all come before planned claims.
      adjustBefore(Infinity);

      // 2. What is planned: tier by tier. Within a tier, clean-only claims draw first (clean lots),
      //    then the others (manure-fed lots first); each group draws once and shares pro rata.
      //    A group served before others of the month draws first from the lots those cannot use.
      const planned = plannedByMonth[slot(m, pool)]!;
      const waiting = new Waiting(span.startDay, span.endDay);
      for (let k = 0; k < planned.length; k++)
        waiting.add(input.planned[planned[k]!]!.day, input.planned[planned[k]!]!.cleanOnly, 1);
      for (let t = 0; t < planned.length;) {
        const head = input.planned[planned[t]!]!;
        let end = t + 1;
        while (end < planned.length && tiers(planned[t]!, planned[end]!) === 0) end++;
        for (let k = t; k < end; k++)
          waiting.add(input.planned[planned[k]!]!.day, input.planned[planned[k]!]!.cleanOnly, -1);
        const wanted = waiting.count > 0 ? waiting.wants : undefined;
        const lo = shelf.usableFrom(head.day, keep);
        const hi = shelf.usableTo(head.day);
        const cleanGroup: number[] = [];
        const otherGroup: number[] = [];
        let needClean = 0;
        let needOther = 0;
        for (let k = t; k < end; k++) {
          const i = planned[k]!;
          const c = input.planned[i]!;
          if (c.cleanOnly) {
            cleanGroup.push(i);
            needClean += c.need;
          } else {
            otherGroup.push(i);
            needOther += c.need;
          }
        }
        const need = needClean + needOther;
        const all = shelf.available(lo, hi, false);
        const clean = needClean > 0 ? shelf.available(lo, hi, true) : 0;
        // Clean-only claims can have at most the clean stock; everyone shares when short.
        const shareClean = needClean > 0 ? Math.min(1, clean / needClean, all / need) : 1;
        const shareAll = Math.min(1, all / need);
        const serve = (
          group: number[],
          groupNeed: number,
          share: number,
          mode: "clean-only" | "manure-first",
        ) => {
          const n = group.length;
          if (n === 0) return;
          if (n > scratchSize) grow(n);
          for (let k = 0; k < n; k++) weights[k] = input.planned[group[k]!]!.need;
          drawShared(
            shelf,
            keep,
            head.day,
            groupNeed * share,
            mode,
            group,
            0,
            n,
            weights,
            shares,
            result.plannedDraws,
            wanted,
          );
          for (let k = 0; k < n; k++) {
            const i = group[k]!;
            const c = input.planned[i]!;
            const got = shares[k]!;
            result.plannedGot[i] = got;
            if (c.cleanOnly && got < c.need - AMOUNT_EPSILON)
              result.manureRefused[i] = Math.min(c.need - got, all - clean);
            demand += c.need;
            allocated += got;
          }
        };
        serve(cleanGroup, needClean, shareClean, "clean-only");
        serve(otherGroup, needOther, shareAll, "manure-first");
        t = end;
      }

      const agedOut = shelf.ageOut(span.endDay, pool, result.agedOut);
      const closing = shelf.onHand(span.endDay);
      const gap = demand - allocated;
      result.rows.push({
        month: span.month,
        pool,
        opening,
        supplied,
        adjusted,
        demand,
        allocated,
        agedOut,
        closing,
        shortfall: gap > AMOUNT_EPSILON * Math.max(1, demand) ? gap : 0,
      });
    }
  }
  return result;
}

export const POOL_OF: Record<Material, Pool> = {
  castings: "castings",
  tea: "castings",
  leachate: "leachate",
};
