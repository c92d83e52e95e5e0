// Shapes of the gap-closing suggestions. Every suggestion carries `proof`: the
// balance re-run with the suggestion applied, whose castings shortfall is 0.
import type {
  BalanceInput,
  CastingsMonth,
  PoolMonth,
  PoolTotals,
} from "@/lib/engine/balance/types";
import type { Explanation, IsoDate, SupplyEvent } from "@/lib/engine/core/types";

export interface GapContext {
  base: BalanceInput;
  /** The tray that extra trays copy: the largest bin's (kg per harvested tray, T days to finish). */
  tray?: { binId: string; kgPerTray: number; processingDays: number; manureFeedstock: boolean };
  /** Supply of a second bin with the largest bin's parameters, started on `startDate`. */
  secondBin?: { binId: string; supplyFrom: (startDate: IsoDate) => SupplyEvent[] };
  /** Upper bound on extra trays searched; default 60. */
  maxExtraTrays?: number;
}

export interface BalanceProof {
  castings: Omit<CastingsMonth, "harvests">[];
  leachate: PoolMonth[];
  totals: { castings: PoolTotals; leachate: PoolTotals };
  firstShortfall: { castings: IsoDate | null; leachate: IsoDate | null };
}

export interface ExtraTraysSuggestion {
  kind: "extra-trays";
  trays: number;
  /** Each extra tray: when it must be started and when it is harvested. */
  harvests: { startBy: IsoDate; harvestOn: IsoDate; kg: number }[];
  proof: BalanceProof;
  explanation: Explanation;
}

export interface SecondBinSuggestion {
  kind: "second-bin";
  latestStart: IsoDate;
  proof: BalanceProof;
  explanation: Explanation;
}

export interface RateCutSuggestion {
  kind: "rate-cut";
  /** Percent cut on every castings and tea application of `plantingIds`. */
  cutPct: number;
  plantingIds: string[];
  proof: BalanceProof;
  explanation: Explanation;
}

export type GapSuggestion = ExtraTraysSuggestion | SecondBinSuggestion | RateCutSuggestion;

export interface GapReport {
  /** False when the balance already has no castings shortfall. */
  needed: boolean;
  shortfallKg: number;
  firstShortfall: IsoDate | null;
  suggestions: GapSuggestion[];
  /** Kinds of fix that cannot close the gap within their bounds, and why. */
  unavailable: { kind: GapSuggestion["kind"]; explanation: Explanation }[];
  /** Leachate short days are reported here; only less leachate demand can close them. */
  leachateShortfallL: number;
}
