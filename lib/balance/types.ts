// The JSON bodies of the Balance API, in one place: the route handlers build
// them and the Balance UI reads them (import type only; nothing here runs).
//
//   GET  /api/gardens/{gardenId}/balance?from=YYYY-MM&months=N   → BalanceBody
//   GET  …/balance?…&format=csv                                   → the month table as CSV (BALANCE_CSV_COLUMNS)
//   POST /api/gardens/{gardenId}/what-if  body WhatIfRequest     → WhatIfBody
//   GET  /api/gardens/{gardenId}/export                           → the scenario JSON (lib/validation/scenario.ts)
//   POST /api/gardens/import  body = scenario JSON                → ImportBody (201)
//
// Every quantity inside `plan` is SI (kg castings, L liquid, m², days); the UI
// turns it into the garden's units with lib/format-quantity.ts and the
// `settings` below. Errors are the usual { error: { code, message, fields? } }.
import type { GardenPlan, IsoDate, PoolName } from "@/lib/engine";
import type { DisplayUnits, UnitSystem } from "@/lib/units";

/** The months asked for: `from` "YYYY-MM", `months` 3–24 (default 12; from defaults to this month in the garden's zone). */
export interface BalanceRange {
  from: string;
  months: number;
}

/** What the UI needs to format and label the plan. */
export interface BalanceSettings {
  unitSystem: UnitSystem;
  /** IANA zone; "today" for the garden. */
  timeZone: string;
  /** Units each kind of amount is shown in (lib/units displayUnits for unitSystem). */
  units: DisplayUnits;
  /** ISO 4217 code for money figures (surplus value, buying castings). */
  currency: string;
  /** Growing season (month and day, every year). */
  lastSpringFrost: { month: number; day: number };
  firstFallFrost: { month: number; day: number };
}

export interface BalanceBody {
  range: BalanceRange;
  settings: BalanceSettings;
  /** computePlan(inputs, { from, months, suggestions: true }): gap is always filled in. */
  plan: GardenPlan;
  /** The garden's "today" the plan replays up to (same as plan.asOf). */
  asOf: IsoDate;
  /**
   * The garden's inputs version (bumped by every write that changes bins, beds,
   * plantings, lots, logs or settings). Useful as part of a client cache key.
   */
  inputsVersion: number;
}

// ---------------------------------------------------------------- what-if

/**
 * One change to try. SI throughout, like the engine (the UI converts the grower's
 * units before sending). Ids are the garden's bin / planting ids.
 * Validated by lib/validation/what-if.ts (the zod schema is the source of truth;
 * this type mirrors it and a compile-time check keeps the two equal).
 */
export type WhatIfChange =
  | { kind: "bin-trays"; binId: string; trays: number }
  | { kind: "bin-rotation"; binId: string; rotationIntervalDays: number }
  | { kind: "bin-start"; binId: string; startDate: IsoDate }
  /**
   * Extra trays the size of `binId`'s, one harvested on each date (the extra-trays
   * suggestion's harvestDates), each making that bin's forecast per-harvest amount.
   */
  | { kind: "extra-trays"; binId: string; harvestDates: IsoDate[] }
  /** amount in the planting's rule measure (kg or L per plant, per m², per L of container; % of mix). */
  | { kind: "planting-amount"; plantingId: string; amount: number }
  /** Add a bin built like `likeBinId`, started on startDate with `startingWorms` (default: the original's). */
  | {
      kind: "add-bin";
      likeBinId: string;
      startDate: IsoDate;
      trays?: number;
      startingWorms?: number;
      name?: string;
    };

export interface WhatIfRequest {
  /** Same meaning as the balance query; defaults likewise. */
  from?: string;
  months?: number;
  /** 1–20 changes, applied in order. */
  changes: WhatIfChange[];
}

/** Per month and pool: changed minus current (SI). */
export interface WhatIfMonthDiff {
  month: string;
  pool: PoolName;
  supplied: number;
  allocated: number;
  closing: number;
  shortfall: number;
}

/**
 * Design choice: both full balances (so the UI shows "today" and "with changes"
 * side by side with the same components) plus a small per-month diff for the
 * highlight. Nothing is written; `changed.inputsVersion` equals `current.inputsVersion`.
 */
export interface WhatIfBody {
  changes: WhatIfChange[];
  current: BalanceBody;
  changed: BalanceBody;
  diff: WhatIfMonthDiff[];
}

// ---------------------------------------------------------------- import

export interface ImportBody {
  garden: { id: string; name: string };
}

// ---------------------------------------------------------------- CSV
//
// `format=csv` (lib/balance/csv.ts): one line per month, columns per material with
// the unit in the header, e.g. "Month", "Castings opening (lb)", … "Castings
// coverage (%)", "Leachate opening (gal)", …; numbers rounded by
// lib/format-quantity.ts like the table; formula-looking cells neutralised.
