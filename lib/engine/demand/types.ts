import type { DateRange } from "@/lib/engine/core/dates";
import type { FeedingRule } from "@/lib/engine/demand/feeding-rules";
import type {
  BlockedOccurrence,
  DemandOccurrence,
  FeederClass,
  IsoDate,
} from "@/lib/engine/core/types";

export interface BedInput {
  id: string;
  /** Indoor beds and containers are fed all year, ignoring frost dates. */
  indoor?: boolean;
  areaM2?: number;
  containerVolumeL?: number;
}

export interface PlantingInput {
  id: string;
  bedId: string;
  feederClass: FeederClass;
  plantCount: number;
  startDate: IsoDate;
  /** Last day in the ground; also the harvest day unless harvestDate is set. */
  endDate: IsoDate;
  harvestDate?: IsoDate;
  /** Lower is fed first when stock is short. */
  priority?: number;
  /** Edible crop (pre-harvest interval applies). Default true. */
  edible?: boolean;
  /** Edible part touches the soil (120-day rather than 90-day interval). Default false. */
  edibleTouchesSoil?: boolean;
  /** Overrides the crop's rule; without it the feeder-class default applies. */
  rule?: FeedingRule;
  /** Part of the bed this planting occupies, if not all of it. */
  areaM2?: number;
  containerVolumeL?: number;
}

/** Growing season as month-days "MM-DD" (a "YYYY-MM-DD" is read by its month-day), every year. */
export interface GardenSeason {
  lastSpringFrost: string;
  firstFallFrost: string;
}

export interface DemandOptions {
  range: DateRange;
  season: GardenSeason;
  /** Some source bin's feedstock includes manure: apply the pre-harvest interval. */
  manureFeedstock?: boolean;
  bulkDensityKgPerL?: number;
  /** false: skip the words of each amount's explanation (the plan writes its own). */
  explain?: boolean;
}

export interface DemandWarning {
  plantingId: string;
  field: string;
  text: string;
}

export interface DemandResult {
  occurrences: DemandOccurrence[];
  blocked: BlockedOccurrence[];
  warnings: DemandWarning[];
}
