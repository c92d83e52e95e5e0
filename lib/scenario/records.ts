// What a garden's export carries beyond GardenInputs: facts the engine does not
// plan from but a round trip must keep (where the garden is, bed sizes and notes,
// a bin's drain interval, a lot's price and note, the crop list with its days to
// harvest, spacing and rules, and which plantings have rules of their own rather
// than their crop's). Both adapters fill it: ./to-inputs.ts from a file,
// db/queries/garden-scenario.ts from rows; ./to-scenario.ts writes it out.
import type { FeederClass, FeedingRuleInput } from "@/lib/engine";

/** A bed's length and width, m, when the source knows them (GardenInputs keeps only the area). */
export interface BedSize {
  lengthM: number;
  widthM: number;
}

export interface CropRecord {
  name: string;
  feederClass: FeederClass;
  edible: boolean;
  edibleTouchesSoil: boolean;
  /** null = not known (the crop list's figure applies on screen). */
  daysToHarvest: number | null;
  spacingM: number | null;
  /** What its plantings inherit; empty = the feeder class default. */
  rules: FeedingRuleInput[];
}

export interface GardenRecords {
  location: string | null;
  /** By bed id. */
  bedSizes: Map<string, BedSize>;
  bedNotes: Map<string, string>;
  /** By bin id; absent = the engine's default. */
  binDrainIntervalDays: Map<string, number>;
  /** By stock lot id. */
  lotDetails: Map<string, { pricePerKg: number | null; note: string | null }>;
  crops: CropRecord[];
  /** By planting id: the rules a planting holds itself. A planting not here inherits its crop's. */
  ownRules: Map<string, FeedingRuleInput[]>;
}

export function emptyRecords(): GardenRecords {
  return {
    location: null,
    bedSizes: new Map(),
    bedNotes: new Map(),
    binDrainIntervalDays: new Map(),
    lotDetails: new Map(),
    crops: [],
    ownRules: new Map(),
  };
}
