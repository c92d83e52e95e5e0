import "server-only";
import { asc, eq, isNotNull, and } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { readGardenInputs } from "@/db/queries/garden-inputs";
import { insertGardenInputs } from "@/db/queries/garden-inputs-write";
import { beds, bins, crops, feedingRules, gardens, stockLots } from "@/db/schema";
import { EngineInputError, type GardenInputs } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { emptyRecords, type GardenRecords } from "@/lib/scenario/records";
import { scenarioRecords, scenarioToInputs } from "@/lib/scenario/to-inputs";
import { inputsToScenario } from "@/lib/scenario/to-scenario";
import { parseScenario, type Scenario } from "@/lib/validation/scenario";
import { rulesByOwner } from "./feeding-rules-write";

// A garden's export and import format is the scenario file (lib/validation/scenario.ts).
// Import: file → zod → lib/scenario's adapter (the one owner of unit conversion
// and scenario defaults) → GardenInputs → rows, in one transaction. Export:
// rows → GardenInputs → lib/scenario/to-scenario.ts → file.

const today = () => new Date().toISOString().slice(0, 10);
/** The garden as a scenario file: its history up to `asOf` (default today) and everything planned. */
export async function exportGardenScenario({
  gardenId,
  asOf = today(),
}: {
  gardenId: string;
  asOf?: string;
}): Promise<Scenario> {
  const db = await getDb();
  return db.transaction(
    async (tx) => {
      const inputs = await readGardenInputs(tx, { gardenId, asOf });
      return inputsToScenario(inputs, await readGardenRecords(tx, gardenId));
    },
    { isolationLevel: "repeatable read", accessMode: "read only" },
  );
}

/**
 * What the export carries beyond GardenInputs, from rows (one query per table,
 * scoped by gardenId): location, bed sizes and notes, drain intervals, lot
 * prices and notes, the garden's named crops with their rules, and which
 * plantings hold rules of their own.
 */
async function readGardenRecords(tx: DbOrTx, gardenId: string): Promise<GardenRecords> {
  const records = emptyRecords();
  const [garden] = await tx
    .select({ location: gardens.location })
    .from(gardens)
    .where(eq(gardens.id, gardenId));
  records.location = garden?.location ?? null;
  const bedRows = await tx
    .select({ id: beds.id, lengthM: beds.lengthM, widthM: beds.widthM, notes: beds.notes })
    .from(beds)
    .where(eq(beds.gardenId, gardenId))
    .orderBy(asc(beds.id));
  for (const b of bedRows) {
    if (b.lengthM !== null && b.widthM !== null)
      records.bedSizes.set(b.id, { lengthM: b.lengthM, widthM: b.widthM });
    if (b.notes !== null) records.bedNotes.set(b.id, b.notes);
  }
  const binRows = await tx
    .select({ id: bins.id, drainIntervalDays: bins.drainIntervalDays })
    .from(bins)
    .where(and(eq(bins.gardenId, gardenId), isNotNull(bins.drainIntervalDays)));
  for (const b of binRows) records.binDrainIntervalDays.set(b.id, b.drainIntervalDays!);
  const lotRows = await tx
    .select({ id: stockLots.id, pricePerKg: stockLots.pricePerKg, note: stockLots.note })
    .from(stockLots)
    .where(eq(stockLots.gardenId, gardenId));
  for (const l of lotRows) records.lotDetails.set(l.id, { pricePerKg: l.pricePerKg, note: l.note });
  const ruleRows = await tx
    .select()
    .from(feedingRules)
    .where(eq(feedingRules.gardenId, gardenId))
    .orderBy(asc(feedingRules.position));
  const rulesOf = rulesByOwner(ruleRows);
  const cropRows = await tx
    .select()
    .from(crops)
    .where(and(eq(crops.gardenId, gardenId), isNotNull(crops.name)))
    .orderBy(asc(crops.createdAt), asc(crops.id));
  records.crops = cropRows.map((c) => ({
    name: c.name!,
    feederClass: c.feederClass,
    edible: c.edible,
    edibleTouchesSoil: c.edibleTouchesSoil,
    daysToHarvest: c.daysToHarvest,
    spacingM: c.spacingM,
    rules: rulesOf(c.id) ?? [],
  }));
  for (const r of ruleRows)
    if (r.plantingId !== null) records.ownRules.set(r.plantingId, rulesOf(r.plantingId)!);
  return records;
}

/** Checks a scenario file and turns it into GardenInputs; bad input is a validation error naming the field. */
function scenarioInputs(raw: unknown): { inputs: GardenInputs; records: GardenRecords } {
  const parsed = parseScenario(raw);
  if (!parsed.ok) {
    const fields = Object.fromEntries(parsed.issues.map((i) => [i.path, i.message]));
    throw new AppError("validation:scenario", "The garden file has errors.", fields);
  }
  const scenario = parsed.scenario;
  let inputs: GardenInputs;
  try {
    inputs = scenarioToInputs(scenario, { asOf: scenario.settings.asOf ?? today() });
  } catch (error) {
    if (error instanceof EngineInputError)
      throw new AppError("validation:scenario", "The garden file has errors.", {
        [error.field]: error.message,
      });
    throw error;
  }
  return { inputs, records: scenarioRecords(scenario) };
}

/** importGardenScenario inside the caller's transaction (the demo seed uses it). */
export async function insertGardenScenario(
  tx: DbOrTx,
  { scenario, ownerId, location }: { scenario: unknown; ownerId: string; location?: string | null },
): Promise<{ gardenId: string; ids: Map<string, string> }> {
  const { inputs, records } = scenarioInputs(scenario);
  return insertGardenInputs(tx, { inputs, ownerId, records, location: location ?? undefined });
}

/**
 * A new garden from a scenario file, owned by ownerId; one transaction, so a
 * failure creates nothing. `ids` maps each id in the file to the new row's id.
 */
export async function importGardenScenario({
  scenario,
  ownerId,
}: {
  scenario: unknown;
  ownerId: string;
}): Promise<{ gardenId: string; ids: Map<string, string> }> {
  // Parse and convert before opening the transaction: it holds no locks while we check the file.
  const { inputs, records } = scenarioInputs(scenario);
  const db = await getDb();
  return db.transaction((tx) => insertGardenInputs(tx, { inputs, ownerId, records }));
}
