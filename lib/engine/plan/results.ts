// What computePlan returns: everything the Balance, Bins, Beds and Calendar
// screens show. All quantities SI (kg castings, L leachate / tea, m², days);
// no text with a unit baked in: every figure carries an Explanation whose
// inputs are tagged SI values, rendered by the UI in the garden's units.
import type { IsoDate, Material, Method } from "@/lib/engine/core/types";

/** A tagged value inside an explanation. The UI converts `unit` to the garden's units. */
export type ExplainValue =
  | {
      unit:
        | "kg"
        | "L"
        | "m"
        | "m2"
        | "kg/m2"
        | "L/m2"
        | "kg/day"
        | "kg/week"
        | "L/day"
        | "L/week"
        | "money"
        | "money/kg"
        | "percent"
        | "ratio"
        | "days"
        | "count";
      value: number;
    }
  | { date: IsoDate }
  | { ref: "bin" | "bed" | "planting" | "lot"; id: string }
  | { text: string }
  | { default: string; source: string };

export type ExplanationKind =
  | "pool-month" // opening + in − allocated − aged out = closing, short
  | "castings-forecast" // tray volume × fill × density × calibration
  | "harvest-logged"
  | "harvest-forecast"
  | "harvest-due-not-logged"
  | "leachate-rate" // trailing mean of drains, or estimate
  | "leachate-collected"
  | "drain-logged"
  | "liquid-aged-out"
  | "castings-aged-out"
  | "opening-stock" // what the replay leaves on the first day
  | "lot-opening"
  | "application-logged"
  | "demand-amount" // rule amount × basis
  | "tea-brewed" // tea L × castings per water × density
  | "coverage"
  | "pre-harvest-block"
  | "pre-harvest-clean-lots"
  | "capacity-intake"
  | "capacity-surface"
  | "population"
  | "surplus"
  | "output-value"
  | "totals"
  | "gap-extra-trays"
  | "gap-second-bin"
  | "gap-rate-cut"
  | "gap-start-bin"
  | "gap-buy-castings"
  | "gap-unavailable"
  | "out-of-season"
  | "mix-above-limit";

export interface Explanation {
  kind: ExplanationKind;
  inputs: Record<string, ExplainValue>;
  /** Sub-steps, e.g. each harvest inside a month's supply. */
  parts?: Explanation[];
}

export type WarningKind =
  | "capacity-intake"
  | "capacity-surface"
  | "harvest-not-logged"
  | "pre-harvest-block"
  | "aged-out"
  | "mix-above-limit"
  | "out-of-season"
  | "shortfall";

export interface PlanWarning {
  kind: WarningKind;
  /** What it concerns. */
  binId?: string;
  plantingId?: string;
  lotId?: string;
  date?: IsoDate;
  explanation: Explanation;
}

export type PoolName = "castings" | "leachate";

/** One row of the month × material table. Tea is shown as castings drawn (it has no stock). */
export interface MonthRow {
  month: string; // "YYYY-MM"
  pool: PoolName;
  opening: number;
  /** Harvests (castings) or collected/drained leachate. */
  supplied: number;
  /** Hand adjustments (spills, gifts; negative takes away): opening + supplied + adjusted − allocated − aged out = closing. */
  adjusted: number;
  demand: number;
  allocated: number;
  agedOut: number;
  closing: number;
  shortfall: number;
  /** Castings only: part of demand/allocated that is tea brewed on the day, kg castings; teaLitres of tea. */
  tea?: { litres: number; castingsDemandKg: number; castingsAllocatedKg: number };
  /** True when the month lies wholly or partly on or before asOf (replayed, not forecast). */
  replayed: boolean;
  explanation: Explanation;
}

export interface BinMonth {
  month: string;
  castingsKg: number;
  leachateL: number;
  /** Worms at the end of the month (adults + juveniles). */
  worms: number;
  wormMassKg: number;
}

/** One bin task on the calendar. id = `${binId}:${kind}:${date}`, stable while that occurrence is unchanged. */
export interface BinTask {
  id: string;
  binId: string;
  kind: "add-tray" | "harvest-tray" | "drain";
  date: IsoDate;
  /** Expected castings (harvest, kg) or liquid (drain, L). */
  amount: number | null;
  logged: boolean;
  explanation: Explanation;
}

export interface BinSupply {
  binId: string;
  name: string;
  perHarvestKg: number;
  harvestIntervalDays: number;
  calibration: { factor: number; harvestsUsed: number };
  leachateLPerDay: number;
  months: BinMonth[];
  tasks: BinTask[];
  explanation: Explanation;
}

/**
 * One planned (or logged) application. id = `${plantingId}:${material}:${date}`: one
 * rule per planting, so planting + material + date names the occurrence; it
 * survives a recompute when that occurrence did not change.
 */
export interface PlannedFeeding {
  id: string;
  plantingId: string;
  bedId: string;
  date: IsoDate;
  material: Material;
  method: Method;
  /** As applied: kg castings, L diluted leachate, L tea. */
  amount: number;
  /** In pool units: kg castings (tea: castings to brew it), L undiluted leachate. */
  need: number;
  allocated: number;
  coveragePct: number;
  /** "logged": from the applications log; "planned": forecast; "blocked": pre-harvest interval, nothing served. */
  status: "logged" | "planned" | "blocked";
  /** Lots it drew from (pool units). */
  draws: { lotId: string; amount: number }[];
  explanation: Explanation;
}

export interface BedDemand {
  bedId: string;
  months: {
    month: string;
    castingsKg: number;
    leachateL: number;
    teaL: number;
    coveragePct: number;
  }[];
}

export interface PlantingCoverage {
  plantingId: string;
  month: string;
  material: Material;
  need: number;
  allocated: number;
  coveragePct: number;
  explanation: Explanation;
}

export interface GapSuggestion {
  kind: "extra-trays" | "second-bin" | "rate-cut" | "start-bin" | "buy-castings";
  /** extra-trays: trays; rate-cut: percent (< 100) and plantings; start-bin: size, worms, start; buy: kg and cost. */
  trays?: number;
  /** extra-trays: the day each extra tray's castings are ready (what the check assumed). */
  harvestDates?: IsoDate[];
  cutPct?: number;
  plantingIds?: string[];
  startDate?: IsoDate;
  tray?: TrayShape;
  traysInStack?: number;
  worms?: number;
  castingsKg?: number;
  cost?: number;
  /** Castings shortfall left after the suggestion (0 when it closes the gap). */
  remainingShortfallKg: number;
  explanation: Explanation;
}

export interface TrayShape {
  insideLengthM: number;
  insideWidthM: number;
  insideDepthM: number;
}

export interface GapReport {
  needed: boolean;
  shortfallKg: number;
  firstShortfall: IsoDate | null;
  suggestions: GapSuggestion[];
  unavailable: { kind: GapSuggestion["kind"]; explanation: Explanation }[];
  leachateShortfallL: number;
}

export interface GardenPlan {
  garden: { id: string; name: string };
  asOf: IsoDate;
  range: { from: IsoDate; to: IsoDate };
  months: string[];
  /** months × pools, in month order then castings before leachate. */
  rows: MonthRow[];
  bins: BinSupply[];
  beds: BedDemand[];
  feedings: PlannedFeeding[];
  coverage: PlantingCoverage[];
  firstShortfall: { castings: IsoDate | null; leachate: IsoDate | null };
  surplus: { castingsKg: number; value: number; explanation: Explanation };
  outputValue: { castingsKg: number; value: number; explanation: Explanation };
  warnings: PlanWarning[];
  /** null when suggestions were not asked for. */
  gap: GapReport | null;
}
