// Stock kept as dated lots so that ageing and "oldest first" are exact rather
// than averaged. One shelf per pool: castings (keeps `keepDays`, default 60)
// and leachate (keeps one day: it is collected and used, never stored).
import type { IsoDate } from "@/lib/engine/core/types";

/** Amounts below this are float dust from pro-rata splits, not stock. */
export const AMOUNT_EPSILON = 1e-9;

/** A lot on hand when the plan starts (already net of past use). */
export interface StockLot {
  id: string;
  material: "castings" | "leachate";
  /** Day it was harvested or collected; it ages from here. */
  madeOn: IsoDate;
  amount: number; // kg castings, L leachate
  binId?: string;
  manureFeedstock?: boolean;
}

export interface LiveLot {
  id: string;
  madeDay: number;
  /** First day on which the lot may no longer be used. */
  expiresDay: number;
  remaining: number;
  binId: string | undefined;
  manure: boolean;
}

export class LotShelf {
  readonly keepDays: number;
  /** Sorted by madeDay (ties keep insertion order), so oldest first = lowest index. */
  private lots: LiveLot[] = [];

  constructor(keepDays: number) {
    this.keepDays = keepDays;
  }

  /** Adds a lot; lots arrive roughly in date order, so insertion is near the end. */
  add(lot: Omit<LiveLot, "expiresDay" | "remaining"> & { amount: number }): void {
    if (!(lot.amount > AMOUNT_EPSILON)) return;
    const live: LiveLot = {
      id: lot.id,
      madeDay: lot.madeDay,
      expiresDay: lot.madeDay + this.keepDays,
      remaining: lot.amount,
      binId: lot.binId,
      manure: lot.manure,
    };
    let i = this.lots.length;
    while (i > 0 && (this.lots[i - 1] as LiveLot).madeDay > live.madeDay) i--;
    this.lots.splice(i, 0, live);
  }

  /** Index range [lo, hi) of lots usable on `day`: made on or before it and not yet aged out. */
  private usableRange(day: number): [number, number] {
    const hi = this.firstMadeAfter(day);
    const lo = this.firstMadeAfter(day - this.keepDays);
    return [lo, hi];
  }

  private firstMadeAfter(day: number): number {
    let lo = 0;
    let hi = this.lots.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((this.lots[mid] as LiveLot).madeDay <= day) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }

  available(day: number): number {
    const [lo, hi] = this.usableRange(day);
    let sum = 0;
    for (let i = lo; i < hi; i++) sum += (this.lots[i] as LiveLot).remaining;
    return sum;
  }

  /** Takes up to `amount` from usable lots, oldest first; returns what was taken. */
  draw(day: number, amount: number): number {
    const [lo, hi] = this.usableRange(day);
    let left = amount;
    for (let i = lo; i < hi && left > AMOUNT_EPSILON; i++) {
      const lot = this.lots[i] as LiveLot;
      const take = Math.min(lot.remaining, left);
      lot.remaining -= take;
      left -= take;
      if (lot.remaining < AMOUNT_EPSILON) lot.remaining = 0;
    }
    return amount - Math.max(0, left);
  }

  /** Removes every lot that can no longer be used on or after `day`; returns the amount lost. */
  ageOutBefore(day: number): number {
    let lost = 0;
    const kept: LiveLot[] = [];
    for (const lot of this.lots) {
      if (lot.expiresDay <= day) lost += lot.remaining;
      else if (lot.remaining > 0) kept.push(lot);
    }
    this.lots = kept;
    return lost;
  }

  total(): number {
    let sum = 0;
    for (const lot of this.lots) sum += lot.remaining;
    return sum;
  }

  /** Read-only view for explanations and tests. */
  snapshot(): readonly Readonly<LiveLot>[] {
    return this.lots.map((l) => ({ ...l }));
  }
}
