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
  /** Whole day number (toDayNumber). */
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

const CLEAN_ONLY = [false] as const;
const MANURE_FIRST = [true, false] as const;

/** Could a feeding still waiting use a lot usable from `made` to the day before `expires`? */
type Wanted = (made: number, expires: number, manure: boolean) => boolean;

/**
 * One pool's lots in made-day order, kept as parallel arrays (a long history has thousands of
 * daily leachate lots; one object each would be copied by every young-generation collection).
 */
class Shelf {
  /** The lots as given (sorted by made day): ids and bins are read from here, never changed. */
  readonly lots: readonly LedgerLot[];
  // Whole day numbers: read back as small integers, so a snapshot lot has the same shape as the
  // lots it was taken from (a changed field kind sends optimised code back to slow code).
  readonly made: Int32Array;
  readonly expires: Int32Array;
  readonly remaining: Float64Array;
  readonly manure: Uint8Array;
  head = 0;
  /** Every lot in [head, drained) has nothing left (stock is only ever taken, never put back). */
  drained = 0;
  /** Scratch for draw(): which lots a waiting feeding wants. */
  private flags = new Uint8Array(64);
  constructor(lots: LedgerLot[], keep: number) {
    let sorted = true;
    for (let i = 1; i < lots.length && sorted; i++)
      if (lots[i]!.madeDay < lots[i - 1]!.madeDay) sorted = false;
    // Lots mostly come in date order (a bin's days one after another); sort (stable) only when not.
    if (!sorted) lots.sort((a, b) => a.madeDay - b.madeDay);
    this.lots = lots;
    const n = lots.length;
    this.made = new Int32Array(n);
    this.expires = new Int32Array(n);
    this.remaining = new Float64Array(n);
    this.manure = new Uint8Array(n);
    for (let i = 0; i < n; i++) {
      const l = lots[i]!;
      this.made[i] = l.madeDay;
      this.expires[i] = l.madeDay + keep;
      this.remaining[i] = l.amount;
      this.manure[i] = l.manure ? 1 : 0;
    }
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
  /** Start of the lots usable on `day`, [usableFrom, usableTo) (keep is the same for every lot of a pool). */
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
    while (i < hi && this.remaining[i] === 0) i++;
    this.drained = i;
    return Math.max(lo, i);
  }
  available(lo: number, hi: number, cleanOnly: boolean): number {
    let s = 0;
    for (let i = this.skipDrained(lo, hi); i < hi; i++)
      if (!cleanOnly || this.manure[i] === 0) s += this.remaining[i]!;
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
    wanted?: Wanted,
  ): number {
    let left = amount;
    const passes = mode === "clean-only" ? CLEAN_ONLY : MANURE_FIRST;
    const start = this.skipDrained(lo, hi);
    const remaining = this.remaining;
    let flags: Uint8Array | undefined;
    if (wanted) {
      if (this.flags.length < hi - start) this.flags = new Uint8Array(2 * (hi - start));
      flags = this.flags;
      for (let i = start; i < hi; i++)
        flags[i - start] =
          remaining[i]! > 0 && wanted(this.made[i]!, this.expires[i]!, this.manure[i] === 1)
            ? 1
            : 0;
    }
    for (let round = flags ? 0 : 1; round <= 1; round++) {
      for (let p = 0; p < passes.length; p++) {
        const wantManure = passes[p] ? 1 : 0;
        for (let i = start; i < hi && left > AMOUNT_EPSILON; i++) {
          if (this.manure[i] !== wantManure || remaining[i]! <= 0) continue;
          if (flags && flags[i - start] !== round) continue;
          const take = Math.min(remaining[i]!, left);
          remaining[i]! -= take;
          if (remaining[i]! < AMOUNT_EPSILON) remaining[i] = 0;
          left -= take;
          out?.push({ lotId: this.lots[i]!.id, amount: take });
        }
      }
    }
    return amount - Math.max(0, left);
  }
  /** Stock made before `day` and still on the shelf. */
  onHand(day: number): number {
    let s = 0;
    for (let i = this.head; i < this.lots.length && this.made[i]! < day; i++)
      s += this.remaining[i]!;
    return s;
  }
  made_in(from: number, to: number): number {
    let s = 0;
    for (let i = this.firstMadeAfter(from - 1); i < this.lots.length && this.made[i]! < to; i++)
      s += this.remaining[i]!;
    return s;
  }
  /** Drops lots expired by `day` (a prefix: expiry is made + keep). */
  ageOut(day: number, pool: Pool, out: LedgerResult["agedOut"]): number {
    let lost = 0;
    while (this.head < this.lots.length && this.expires[this.head]! <= day) {
      const left = this.remaining[this.head]!;
      if (left > AMOUNT_EPSILON) {
        const l = this.lots[this.head]!;
        lost += left;
        out.push({
          lotId: l.id,
          pool,
          day: this.expires[this.head]!,
          amount: left,
          binId: l.binId,
        });
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
  group: ArrayLike<number>,
  from: number,
  n: number,
  weights: Float64Array,
  out: Float64Array,
  records: LedgerResult["plannedDraws"] | undefined,
  wanted?: Wanted,
): void {
  let total = 0;
  for (let k = 0; k < n; k++) total += weights[k]!;
  if (!(amount > AMOUNT_EPSILON) || !(total > 0)) {
    out.fill(0, 0, n);
    return;
  }
  const lo = shelf.usableFrom(day, keep);
  const hi = shelf.usableTo(day);
  // `records` is given only for groups whose draws are kept (on or after recordDrawsFrom); a
  // claim's list is made when something is drawn for it, at its size.
  const drawn: { lotId: string; amount: number }[] | undefined = records ? [] : undefined;
  const got = shelf.draw(lo, hi, amount, mode, drawn, wanted);
  for (let k = 0; k < n; k++) out[k] = (got * weights[k]!) / total;
  if (!drawn || drawn.length === 0) return;
  // A group of one takes the whole draw (w / w is exactly 1): its list is the records as drawn
  // (after any a log named itself).
  for (let k = 0; k < n; k++) {
    const i = group[from + k]!;
    const part = weights[k]! / total;
    const share = n === 1 ? drawn : drawn.map((d) => ({ lotId: d.lotId, amount: d.amount * part }));
    const list = records![i];
    if (list) list.push(...share);
    else records![i] = share;
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
  wants: Wanted = (made, expires, manure) => {
    const from = Math.max(made, this.startDay);
    const to = Math.min(expires, this.endDay);
    if (to <= from) return false;
    if (this.before(this.any, to) - this.before(this.any, from) > 0) return true;
    return !manure && this.before(this.cleanOnly, to) - this.before(this.cleanOnly, from) > 0;
  };
}

/** A slot for each claim's draw list, all empty until a draw is kept (none when no claim is on or after `from`). */
function drawLists(
  claims: readonly { day: number }[],
  from: number,
): ({ lotId: string; amount: number }[] | undefined)[] | undefined {
  if (!claims.some((c) => c.day >= from)) return undefined;
  return new Array<{ lotId: string; amount: number }[] | undefined>(claims.length).fill(undefined);
}

/**
 * `order` grouped by slot (`slots[k]` is the slot of `order[k]`), each group keeping the order
 * given: slot s is items[start[s]] … items[start[s + 1] − 1]. One flat array, not a list per slot.
 */
function bucketBySlot(
  order: ArrayLike<number>,
  slots: Int32Array,
  slotCount: number,
): { items: Int32Array; start: Int32Array } {
  const start = new Int32Array(slotCount + 1);
  for (let k = 0; k < slots.length; k++) start[slots[k]! + 1]!++;
  for (let s = 1; s <= slotCount; s++) start[s]! += start[s - 1]!;
  const next = start.slice(0, slotCount);
  const items = new Int32Array(order.length);
  for (let k = 0; k < order.length; k++) items[next[slots[k]!]!++] = order[k]!;
  return { items, start };
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
  const inTierOrder = tierOrder(input.planned, (i) => plannedMonth[i]! >= 0);
  const plannedSlots = new Int32Array(inTierOrder.length);
  for (let k = 0; k < inTierOrder.length; k++) {
    const i = inTierOrder[k]!;
    plannedSlots[k] = slot(plannedMonth[i]!, input.planned[i]!.pool);
  }
  const plannedByMonth = bucketBySlot(inTierOrder, plannedSlots, spans.length * 2);
  const tiers = tierCompare(input.planned);
  // Logged claims bucketed by day (a counting sort: days are integers), so each month's list
  // is already in date order.
  let loggedByMonth = bucketBySlot(new Int32Array(0), new Int32Array(0), spans.length * 2);
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
    const slots = new Int32Array(order.length);
    for (let k = 0; k < order.length; k++) {
      const i = order[k]!;
      while (loggedDay[i]! >= spans[m]!.endDay) m++;
      slots[k] = m * 2 + (loggedCastings[i] === 1 ? 0 : 1);
    }
    loggedByMonth = bucketBySlot(order, slots, spans.length * 2);
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
    const { shelf, index: i } = byId().get(adj.lotId)!;
    if (adj.day < shelf.made[i]! || adj.day >= shelf.expires[i]!) return 0;
    const change = Math.max(-shelf.remaining[i]!, adj.amount);
    shelf.remaining[i]! += change;
    if (shelf.remaining[i]! < AMOUNT_EPSILON) shelf.remaining[i] = 0;
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

  const walk: Walk = {
    input,
    result,
    recordFrom: from ?? Infinity,
    byId,
    adjustLot,
    loggedByMonth,
    loggedDay,
    loggedNeed,
    loggedNames,
    plannedByMonth,
    tiers,
    // Scratch for one tier of planned claims: its clean-only claims and the others.
    cleanGroup: new Int32Array(input.planned.length),
    otherGroup: new Int32Array(input.planned.length),
    scratch: newScratch(16),
  };

  for (let m = 0; m < spans.length; m++) {
    const span = spans[m]!;
    if (m === input.snapshotAtMonth) {
      result.snapshot = [];
      for (const pool of pools) {
        const shelf = shelves[pool];
        for (let i = shelf.head; i < shelf.lots.length; i++) {
          const l = shelf.lots[i]!;
          if (shelf.remaining[i]! > 0)
            result.snapshot.push({
              id: l.id,
              pool,
              madeDay: shelf.made[i]!,
              amount: shelf.remaining[i]!,
              binId: l.binId,
              manure: shelf.manure[i] === 1,
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
      const adjustments = adjustByMonth[slot(m, pool)]!;

      const totals: MonthTotals = { demand: 0, allocated: 0, adjusted: 0 };
      const cursor = replayLogged(walk, totals, slot(m, pool), pool, shelf, keep, adjustments);
      // Adjustments are logs too (on or before asOf), so they all come before planned claims.
      for (let a = cursor; a < adjustments.length; a++)
        totals.adjusted += adjustLot(adjustments[a]!);

      servePlanned(walk, totals, slot(m, pool), span, shelf, keep);
      const { demand, allocated, adjusted } = totals;
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

/** What one month and pool of the walk shares (see runLedger). */
interface Walk {
  input: LedgerInput;
  result: LedgerResult;
  /** Draws of claims on or after this day are kept (recordDrawsFrom; Infinity: none). */
  recordFrom: number;
  byId: () => Map<string, { shelf: Shelf; index: number; pool: Pool }>;
  adjustLot: (adj: LedgerAdjustment) => number;
  loggedByMonth: { items: Int32Array; start: Int32Array };
  loggedDay: Int32Array;
  loggedNeed: Float64Array;
  loggedNames: Uint8Array;
  plannedByMonth: { items: Int32Array; start: Int32Array };
  tiers: (a: number, b: number) => number;
  cleanGroup: Int32Array;
  otherGroup: Int32Array;
  scratch: Scratch;
}

/** Running totals of the month and pool being walked, added to in the walk's order. */
interface MonthTotals {
  demand: number;
  allocated: number;
  adjusted: number;
}

/** Scratch for one feeding group at a time: amounts named, weights and shares. */
interface Scratch {
  size: number;
  named: Float64Array;
  weights: Float64Array;
  shares: Float64Array;
}

function newScratch(size: number): Scratch {
  return {
    size,
    named: new Float64Array(size),
    weights: new Float64Array(size),
    shares: new Float64Array(size),
  };
}

function growScratch(scratch: Scratch, n: number): void {
  Object.assign(scratch, newScratch(Math.max(n, scratch.size * 2)));
}

// The month's two steps are functions of their own (not one long loop body), so the optimiser
// compiles each apart and quickly; plain loops, no closures (a total a closure writes to is boxed
// on every add).

/**
 * 1. What was done: a month's logged applications of one pool (slot `at`), in date order, with
 * the hand adjustments dated before each. Returns how many adjustments it applied.
 */
function replayLogged(
  w: Walk,
  totals: MonthTotals,
  at: number,
  pool: Pool,
  shelf: Shelf,
  keep: number,
  adjustments: readonly LedgerAdjustment[],
): number {
  const { input, result, loggedByMonth, loggedDay, loggedNeed, loggedNames, adjustLot, scratch } =
    w;
  let nextAdjustment = 0;
  // Those that name no lot and fall on the same day draw together (oldest first) and share the
  // result in proportion.
  const logged = loggedByMonth.items;
  const loggedEnd = loggedByMonth.start[at + 1]!;
  for (let t = loggedByMonth.start[at]!; t < loggedEnd;) {
    const firstDay = loggedDay[logged[t]!]!;
    while (nextAdjustment < adjustments.length && adjustments[nextAdjustment]!.day < firstDay)
      totals.adjusted += adjustLot(adjustments[nextAdjustment++]!);
    let end = t + 1;
    if (loggedNames[logged[t]!] === 0)
      while (
        end < loggedEnd &&
        loggedDay[logged[end]!] === firstDay &&
        loggedNames[logged[end]!] === 0
      )
        end++;
    const n = end - t;
    if (n > scratch.size) growScratch(scratch, n);
    const { named, weights, shares } = scratch;
    let rest = 0;
    for (let k = 0; k < n; k++) {
      const i = logged[t + k]!;
      const need = loggedNeed[i]!;
      let got = 0;
      if (loggedNames[i] === 1) {
        const keeps = result.loggedDraws !== undefined && loggedDay[i]! >= w.recordFrom;
        for (const d of input.logged[i]!.draws) {
          const found = w.byId().get(d.lotId);
          const lot = found && found.pool === pool ? found.index : -1;
          const take = lot >= 0 ? Math.min(shelf.remaining[lot]!, Math.max(0, d.amount)) : 0;
          if (lot >= 0 && take > 0) {
            shelf.remaining[lot]! -= take;
            if (keeps)
              (result.loggedDraws![i] ??= []).push({ lotId: shelf.lots[lot]!.id, amount: take });
          }
          got += take;
          if (take < d.amount - AMOUNT_EPSILON)
            result.overdrawn.push({ loggedIndex: i, lotId: d.lotId, amount: d.amount - take });
        }
      }
      named[k] = got;
      weights[k] = Math.max(0, need - got);
      rest += Math.max(0, need - got);
      totals.demand += need;
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
      firstDay >= w.recordFrom ? result.loggedDraws : undefined,
    );
    for (let k = 0; k < n; k++) {
      result.loggedGot[logged[t + k]!] = named[k]! + shares[k]!;
      totals.allocated += named[k]! + shares[k]!;
    }
    t = end;
  }

  return nextAdjustment;
}

/**
 * 2. What is planned: a month's planned claims of one pool (slot `at`), tier by tier. Within a
 * tier, clean-only claims draw first (clean lots), then the others (manure-fed lots first); each
 * group draws once and shares pro rata. A group served before others of the month draws first
 * from the lots those cannot use.
 */
function servePlanned(
  w: Walk,
  totals: MonthTotals,
  at: number,
  span: LedgerSpan,
  shelf: Shelf,
  keep: number,
): void {
  const { input, result, plannedByMonth, tiers, cleanGroup, otherGroup, scratch } = w;
  const planned = plannedByMonth.items;
  const plannedFrom = plannedByMonth.start[at]!;
  const plannedEnd = plannedByMonth.start[at + 1]!;
  const waiting = new Waiting(span.startDay, span.endDay);
  for (let k = plannedFrom; k < plannedEnd; k++)
    waiting.add(input.planned[planned[k]!]!.day, input.planned[planned[k]!]!.cleanOnly, 1);
  for (let t = plannedFrom; t < plannedEnd;) {
    const head = input.planned[planned[t]!]!;
    let end = t + 1;
    while (end < plannedEnd && tiers(planned[t]!, planned[end]!) === 0) end++;
    for (let k = t; k < end; k++)
      waiting.add(input.planned[planned[k]!]!.day, input.planned[planned[k]!]!.cleanOnly, -1);
    const wanted = waiting.count > 0 ? waiting.wants : undefined;
    const lo = shelf.usableFrom(head.day, keep);
    const hi = shelf.usableTo(head.day);
    let nClean = 0;
    let nOther = 0;
    let needClean = 0;
    let needOther = 0;
    for (let k = t; k < end; k++) {
      const i = planned[k]!;
      const c = input.planned[i]!;
      if (c.cleanOnly) {
        cleanGroup[nClean++] = i;
        needClean += c.need;
      } else {
        otherGroup[nOther++] = i;
        needOther += c.need;
      }
    }
    const need = needClean + needOther;
    const all = shelf.available(lo, hi, false);
    const clean = needClean > 0 ? shelf.available(lo, hi, true) : 0;
    // Clean-only claims can have at most the clean stock; everyone shares when short.
    const shareClean = needClean > 0 ? Math.min(1, clean / needClean, all / need) : 1;
    const shareAll = Math.min(1, all / need);
    // The clean-only group first, then the others.
    for (let g = 0; g < 2; g++) {
      const group = g === 0 ? cleanGroup : otherGroup;
      const n = g === 0 ? nClean : nOther;
      if (n === 0) continue;
      const groupNeed = g === 0 ? needClean : needOther;
      const share = g === 0 ? shareClean : shareAll;
      const mode = g === 0 ? "clean-only" : "manure-first";
      if (n > scratch.size) growScratch(scratch, n);
      const { weights, shares } = scratch;
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
        head.day >= w.recordFrom ? result.plannedDraws : undefined,
        wanted,
      );
      for (let k = 0; k < n; k++) {
        const i = group[k]!;
        const c = input.planned[i]!;
        const got = shares[k]!;
        result.plannedGot[i] = got;
        if (c.cleanOnly && got < c.need - AMOUNT_EPSILON)
          result.manureRefused[i] = Math.min(c.need - got, all - clean);
        totals.demand += c.need;
        totals.allocated += got;
      }
    }
    t = end;
  }
}

export const POOL_OF: Record<Material, Pool> = {
  castings: "castings",
  tea: "castings",
  leachate: "leachate",
};
