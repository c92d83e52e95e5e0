// Shapes of the balance's input and result. Amounts are SI: castings in kg,
// leachate in litres of undiluted leachate, tea in litres of brewed tea.
import type {
  BlockedOccurrence,
  DemandOccurrence,
  Explanation,
  IsoDate,
  Material,
  SupplyEvent,
} from "@/lib/engine/core/types";
import type { StockLot } from "@/lib/engine/balance/lots";

/** Stock pools: tea has none of its own, it is brewed from castings on the day. */
export type Pool = "castings" | "leachate";

export interface BalanceOptions {
  /** First month of the plan, "YYYY-MM". */
  from: string;
  months: number;
  /** Castings shelf life; default 60 days (Harit et al. 2014, J. Applied Horticulture 16(2)). */
  shelfLifeDays?: number;
  /** Days leachate keeps; default 1 = used on the day it is collected. */
  leachateKeepDays?: number;
  /** Purchase price of castings per lb; default $1.00 (common retail, from memory). */
  pricePerLb?: number;
  /** kg of castings steeped per litre of brewed tea; required when tea is wanted. */
  teaCastingsKgPerLitre?: number;
}

export interface BalanceInput {
  supply: readonly SupplyEvent[];
  demand: readonly DemandOccurrence[];
  blocked?: readonly BlockedOccurrence[];
  openingLots?: readonly StockLot[];
  options: BalanceOptions;
}

export interface PoolMonth {
  month: string; // "YYYY-MM"
  opening: number;
  supplied: number;
  demand: number;
  allocated: number;
  agedOut: number;
  closing: number;
  shortfall: number;
  explanation: Explanation;
}

export interface CastingsMonth extends PoolMonth {
  /** Brewed tea wanted this month, litres. */
  teaLitres: number;
  /** Castings that tea needs / got, kg (already inside demand / allocated). */
  teaCastingsDemand: number;
  teaCastingsAllocated: number;
  /** The bins' harvests that made up `supplied`, each with its own explanation. */
  harvests: readonly SupplyEvent[];
}

export interface OccurrenceResult {
  plantingId: string;
  bedId: string;
  date: IsoDate;
  material: Material;
  pool: Pool;
  /** As applied: kg castings, L leachate, L tea. */
  amount: number;
  /** In pool units (tea: kg castings to brew it). */
  need: number;
  allocated: number;
  coveragePct: number;
  explanation: Explanation;
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

export interface PoolTotals {
  supplied: number;
  demand: number;
  allocated: number;
  agedOut: number;
  shortfall: number;
  closing: number;
  /** Opening stock of the first month is the horizon's opening. */
  explanation?: Explanation;
}

export interface BalanceResult {
  months: string[];
  castings: CastingsMonth[];
  leachate: PoolMonth[];
  occurrences: OccurrenceResult[];
  coverage: PlantingCoverage[];
  firstShortfall: { castings: IsoDate | null; leachate: IsoDate | null; any: IsoDate | null };
  totals: { castings: PoolTotals; leachate: PoolTotals };
  /** Castings the plan does not use: aged out during the horizon + stock left at the end. */
  surplus: { castingsKg: number; value: number; pricePerLb: number; explanation: Explanation };
  /** What the horizon's castings harvests would cost to buy. */
  outputValue: { castingsKg: number; value: number; explanation: Explanation };
  blocked: { items: BlockedOccurrence[]; byMonth: Record<string, number> };
  notes: Explanation[];
}
