// GardenInputs: everything the engine needs to plan one garden, in SI.
//
// Two adapters build it: lib/scenario (a scenario file in the grower's units)
// and db/queries (database rows, already SI). The engine reads nothing else.
//
// Units: length m, area m², volume L, mass kg, durations whole days, money in
// the garden's currency (no conversion). Calendar days are floating all-day
// dates "YYYY-MM-DD". A `null` engine parameter means "use the engine default"
// (see lib/engine/defaults.ts for every default and its source): adapters never
// copy a default into the inputs, so a later change of default reaches every garden.
import type { Basis, FeederClass, IsoDate, Material, Method } from "@/lib/engine/core/types";

export type UnitSystem = "us" | "metric";

/** A day of the year without a year, e.g. { month: 4, day: 15 }; applied to every year the plan covers. */
export interface MonthDay {
  month: number; // 1–12
  day: number; // 1–31, a real day of that month (29 February is allowed and falls on 1 March in other years)
}

export interface GardenSettings {
  /** How the UI shows quantities; the engine itself never converts. */
  unitSystem: UnitSystem;
  /** IANA zone, e.g. "America/Chicago"; decides what "today" is for the garden, not the plan's dates. */
  timeZone: string;
  /** Growing season for outdoor beds: last spring frost → first fall frost, every year. */
  lastSpringFrost: MonthDay;
  firstFallFrost: MonthDay;
  /** Castings shelf life in days; null = 60 (Harit et al. 2014, J. Applied Horticulture 16(2)). */
  shelfLifeDays: number | null;
  /** Leachate (collected or drained) is discarded after this many days; null = 7 (from memory). */
  liquidMaxAgeDays: number | null;
  /** Purchase price of castings per kg, garden's currency; null = $1.00 per lb (common retail, from memory). */
  castingsPricePerKg: number | null;
  /** Tea recipe: litres of castings per litre of water; null = 0.1 (10 %, Arancon). Rules may override. */
  teaCastingsPerWater: number | null;
}

/** Inside of one tray (every tray of a bin is the same). Volume = L × W × D; worm surface = L × W. */
export interface TrayInput {
  insideLengthM: number;
  insideWidthM: number;
  insideDepthM: number;
}

export interface BinInput {
  id: string;
  name: string;
  startDate: IsoDate;
  /** Trays in the stack when full (the bottom one is harvested, a new one goes on top). */
  trays: number;
  tray: TrayInput;
  /** Days between trays added; null = 30 (common practice). */
  rotationIntervalDays: number | null;
  /** Days a tray processes before harvest; null = 90 (MSU Extension; Oregon State EM 9034). */
  processingDays: number | null;
  /** Fill of a finished tray 0–1; null = 0.9 (common practice). */
  fillFraction: number | null;
  /** Castings bulk density kg/L; null = 0.7 (India FCO; Agnew & Leonard 2003). */
  bulkDensityKgPerL: number | null;
  /** Months 1–12 with no processing and no harvest (outdoor bin in winter). */
  dormantMonths: number[];
  /** Feedstock includes manure: its lots carry the pre-harvest interval (7 CFR 205.203(c)(1)). */
  manureFeedstock: boolean;
  /** Worms put in on startDate (an integer count). Later additions/removals are worm moves. */
  startingWorms: number;
  /** Leachate estimate before any drain is logged, L/week; null = 0.5 (from memory). */
  leachateEstimateLPerWeek: number | null;
  /** Food intake, fraction of worm mass per day; null = 0.25 (Alabama Extension). */
  intakeFractionPerDay: number | null;
  /** Density ceiling of worms, kg per m² of occupied tray surface; null = 2 lb/ft² (common practice). */
  densityCeilingKgPerM2: number | null;
  /** Last day in use; no supply and no tasks after it. */
  retiredOn: IsoDate | null;
}

export interface BedInput {
  id: string;
  name: string;
  kind: "bed" | "container";
  /** Indoor beds and containers are fed all year, ignoring frost dates. */
  indoor: boolean;
  /** kind "bed": growing area, m². */
  areaM2: number | null;
  /** kind "container": soil volume, L. */
  containerVolumeL: number | null;
}

/**
 * What a planting is fed and how often. `amount` is SI per unit of basis, and
 * `measure` says what it measures:
 * - per-plant: kg per plant (mass) or L per plant (volume);
 * - per-area: kg per m² (mass) or L per m² (volume; 1 L/m² is a 1 mm layer);
 * - per-container-volume: L per L of container soil (volume);
 * - percent-of-mix: percent 0–100 of the container's volume (measure "percent-of-mix", castings only).
 * Liquids (leachate, tea) are always "volume": litres as applied (diluted solution or brewed tea).
 */
export interface FeedingRuleInput {
  material: Material;
  method: Method;
  basis: Basis;
  measure: "mass" | "volume" | "percent-of-mix";
  amount: number;
  /** RRULE (RFC 5545) body, e.g. "FREQ=MONTHLY"; anchored on the planting's first day. */
  recurrence: string;
  /** Leachate: parts water per part leachate; null = 10 (Arthur et al., HortScience); 0 = undiluted. */
  dilutionWaterParts: number | null;
  /** Tea: litres of castings per litre of water; null = the garden's setting. */
  teaCastingsPerWater: number | null;
}

export interface PlantingInput {
  id: string;
  bedId: string;
  crop: string | null;
  feederClass: FeederClass;
  /** Whole plants (an integer ≥ 1). */
  plantCount: number;
  startDate: IsoDate;
  /** Last day in the ground; null = the first fall frost on or after startDate (outdoor) — indoor needs one unless the rule ends. */
  endDate: IsoDate | null;
  /** Harvest day for the pre-harvest interval; null = endDate. */
  harvestDate: IsoDate | null;
  /** Lower is fed first when stock is short; null = 3. Priority 1 plantings are never cut by gap-closing. */
  priority: number | null;
  edible: boolean;
  /** Edible part touches soil: 120-day rather than 90-day window (7 CFR 205.203(c)(1)). */
  edibleTouchesSoil: boolean;
  /**
   * What the planting is fed, in order; each rule expands into its own feedings
   * (castings monthly and tea every two weeks). Empty = the feeder class default
   * (see DEFAULTS). Adapters resolve inheritance: a planting with no rules of its
   * own gets its crop's.
   */
  rules: FeedingRuleInput[];
}

/** Stock not made by a logged harvest or drain: bought castings, stock from before the garden used Castline. */
export interface StockLotInput {
  id: string;
  /** Bin it came from, or null (bought). */
  binId: string | null;
  material: "castings" | "leachate";
  madeOn: IsoDate;
  /** As made (kg castings, L leachate); what is left is derived by replaying the applications. */
  amount: number;
  /** null = the bin's flag (false when binId is null). */
  manureFeedstock: boolean | null;
}

/** A bottom tray harvested. Becomes a castings lot with id = this id. */
export interface HarvestLog {
  id: string;
  binId: string;
  date: IsoDate;
  castingsKg: number;
  /** What the forecast said for that harvest, kg; null = the bin's uncalibrated tray. Used for calibration. */
  predictedKg: number | null;
}

/** Liquid drained from a bin's base. Becomes a leachate lot with id = this id (same max age as collected liquid). */
export interface DrainLog {
  id: string;
  binId: string;
  date: IsoDate;
  litres: number;
}

/** Part of an application taken from one lot (a stock lot, harvest log or drain log id). */
export interface LotDraw {
  lotId: string;
  /** Pool units: kg castings (for tea, the castings steeped), L undiluted leachate. */
  amount: number;
}

/** A feeding actually done. Replaces the planned occurrence it fulfils. */
export interface ApplicationLog {
  id: string;
  plantingId: string;
  date: IsoDate;
  material: Material;
  method: Method;
  /** As applied: kg castings, L of diluted leachate solution, L of tea. */
  amount: number;
  /** Stable id of the planned feeding it fulfils (see PlannedFeeding.id), or null (unplanned). */
  plannedFeedingId: string | null;
  /** Lots it drew from. Empty: the engine draws oldest first (clean lots first for edible crops). */
  draws: LotDraw[];
}

/** Worms moved: bought (from null), split to another bin, removed or lost (to null). */
export interface WormMove {
  id: string;
  date: IsoDate;
  fromBinId: string | null;
  toBinId: string | null;
  /** Integer count moved. */
  worms: number;
}

/** Something seen at a bin. A worm count resets the population model to that count on that day. */
export interface ObservationLog {
  id: string;
  binId: string;
  date: IsoDate;
  wormCount: number | null;
  temperatureC: number | null;
  moisturePercent: number | null;
  note: string | null;
}

/**
 * A lot changed by hand (spilled, given away, found, reweighed): applied on its own date,
 * after that day's applications, so the lot's earlier days keep their stock.
 */
export interface StockAdjustmentLog {
  id: string;
  /** A stock lot, harvest log or drain log id. */
  lotId: string;
  date: IsoDate;
  /** Pool units (kg castings, L leachate); negative takes away. */
  amount: number;
  /** spilled | given-away | spoiled | correction (the engine only reports it). */
  reason: string;
  note: string | null;
}

export interface GardenLogs {
  harvests: HarvestLog[];
  drains: DrainLog[];
  applications: ApplicationLog[];
  adjustments: StockAdjustmentLog[];
  wormMoves: WormMove[];
  observations: ObservationLog[];
}

export interface GardenInputs {
  garden: { id: string; name: string };
  settings: GardenSettings;
  bins: BinInput[];
  beds: BedInput[];
  plantings: PlantingInput[];
  stockLots: StockLotInput[];
  logs: GardenLogs;
  /** Last day of history ("today" in the garden's zone): replayed up to and including it, forecast after. */
  asOf: IsoDate;
}

/** What to plan: months from `from` ("YYYY-MM"; default: asOf's month). */
export interface PlanOptions {
  from?: string;
  /** Default 12. */
  months?: number;
  /** Compute gap-closing suggestions; default true. */
  suggestions?: boolean;
}
