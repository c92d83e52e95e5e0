// The engine's one public entry: import from "@/lib/engine", never from its folders.
//   core/     shared types, dates, errors, the defaults table with sources
//   supply/   what bins make: tray geometry, castings forecast, leachate, worms, capacity
//   demand/   what plantings want: feeding rules, RRULE expansion, amounts
//   balance/  the stock ledger: lots, allocation, the month-by-month walk
//   gap/      how to close a shortfall
//   plan/     GardenInputs → computePlan → GardenPlan
export type * from "@/lib/engine/plan/inputs";
export type * from "@/lib/engine/plan/results";
export { computePlan } from "@/lib/engine/plan/compute-plan";
export { feedingId } from "@/lib/engine/plan/demand";
export type { IsoDate, Material, Method, Basis, FeederClass } from "@/lib/engine/core/types";
export { EngineInputError } from "@/lib/engine/core/errors";
export * from "@/lib/engine/core/dates";
export { DEFAULTS, dflt, type DefaultName, type Sourced } from "@/lib/engine/core/defaults";
export * from "@/lib/engine/supply/geometry";
export { forecastCastings, harvestDates, calibrate } from "@/lib/engine/supply/forecast";
export {
  simulatePopulation,
  wormsToKg,
  kgToWorms,
  daysToMultiply,
} from "@/lib/engine/supply/population";
export { checkCapacity } from "@/lib/engine/supply/capacity";
export {
  dilute,
  leachateForSolution,
  leachateRate,
  teaCastingsNeeded,
} from "@/lib/engine/supply/liquid";
export { expandRecurrence, isBoundedRule, parseRecurrence } from "@/lib/engine/demand/recurrence";
export { defaultRuleFor } from "@/lib/engine/demand/feeding-rules";
export { runLedger, type LedgerClaim, type LedgerLot } from "@/lib/engine/balance/ledger";
