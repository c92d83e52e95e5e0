// Shared shapes between the engine's parts. Internal units are SI: litres for
// volume, kilograms for mass, square metres for area, days for durations.
// Calendar days are floating all-day dates written "YYYY-MM-DD" (no time zone),
// so that a feeding due "on the 1st" never drifts with DST or the server's zone.

export type IsoDate = string; // "YYYY-MM-DD", a floating calendar day

export type Material = "castings" | "leachate" | "tea";
export type Method = "top-dress" | "side-dress" | "soil-mix" | "drench";
export type Basis = "per-plant" | "per-area" | "per-container-volume" | "percent-of-mix";
export type FeederClass = "heavy" | "medium" | "light";

/** One explanation line: how a number was reached, in words a grower can read. */
export interface Explanation {
  text: string;
  /** Optional named inputs so the UI can format them in the garden's units. */
  inputs?: Record<string, number | string>;
}

/**
 * Something a bin is forecast (or logged) to produce on a day.
 * castings in kilograms; leachate in litres of undiluted liquid.
 */
export interface SupplyEvent {
  binId: string;
  date: IsoDate;
  material: "castings" | "leachate";
  amount: number; // kg for castings, L for leachate
  /** true when it came from a log, false when forecast */
  actual: boolean;
  /** Bin feedstock includes manure → pre-harvest interval applies to what is fed from it. */
  manureFeedstock: boolean;
  explanation: Explanation;
}

/**
 * One dated application the plan wants. Amount in SI of the material as applied:
 * castings kg, leachate L of undiluted leachate, tea L of brewed tea.
 */
export interface DemandOccurrence {
  plantingId: string;
  bedId: string;
  date: IsoDate;
  material: Material;
  method: Method;
  amount: number;
  /** Lower number = fed first when stock is short. */
  priority: number;
  feederClass: FeederClass;
  explanation: Explanation;
}

/** A date the schedule refused, with the reason (pre-harvest interval, out of season…). */
export interface BlockedOccurrence {
  plantingId: string;
  date: IsoDate;
  reason: string;
}
