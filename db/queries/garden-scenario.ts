import "server-only";
import { asc, eq } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db";
import { readGardenInputs } from "@/db/queries/garden-inputs";
import { insertGardenInputs } from "@/db/queries/garden-inputs-write";
import { beds } from "@/db/schema";
import { EngineInputError, type GardenInputs } from "@/lib/engine";
import { AppError } from "@/lib/errors";
import { scenarioToInputs } from "@/lib/scenario/to-inputs";
import { inputsToScenario, type BedSize } from "@/lib/scenario/to-scenario";
import { parseScenario, type Scenario } from "@/lib/validation/scenario";
import { si } from "@/lib/validation/scenario-quantity";

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
      const sizes = await tx
        .select({ id: beds.id, lengthM: beds.lengthM, widthM: beds.widthM })
        .from(beds)
        .where(eq(beds.gardenId, gardenId))
        .orderBy(asc(beds.id));
      const bedSizes = new Map<string, BedSize>();
      for (const b of sizes)
        if (b.lengthM !== null && b.widthM !== null)
          bedSizes.set(b.id, { lengthM: b.lengthM, widthM: b.widthM });
      return inputsToScenario(inputs, bedSizes);
    },
    { isolationLevel: "repeatable read", accessMode: "read only" },
  );
}

/** Checks a scenario file and turns it into GardenInputs; bad input is a validation error naming the field. */
function scenarioInputs(raw: unknown): { inputs: GardenInputs; bedSizes: Map<string, BedSize> } {
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
  const bedSizes = new Map<string, BedSize>();
  for (const b of scenario.beds)
    if (b.kind === "bed") bedSizes.set(b.id, { lengthM: si(b.length), widthM: si(b.width) });
  return { inputs, bedSizes };
}

/** importGardenScenario inside the caller's transaction (the demo seed uses it). */
export async function insertGardenScenario(
  tx: DbOrTx,
  { scenario, ownerId, location }: { scenario: unknown; ownerId: string; location?: string | null },
): Promise<{ gardenId: string; ids: Map<string, string> }> {
  const { inputs, bedSizes } = scenarioInputs(scenario);
  return insertGardenInputs(tx, { inputs, ownerId, bedSizes, location });
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
  const { inputs, bedSizes } = scenarioInputs(scenario);
  const db = await getDb();
  return db.transaction((tx) => insertGardenInputs(tx, { inputs, ownerId, bedSizes }));
}
