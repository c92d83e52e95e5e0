import { and, eq, isNull } from "drizzle-orm";
import { getDb } from "@/db";
import { createBed } from "@/db/queries/beds";
import { createCrop } from "@/db/queries/crops";
import { createPlantings } from "@/db/queries/plantings";
import { crops } from "@/db/schema";
import { ensureStarterCrops } from "@/db/seed/starter-crops";

// Beds, crops and plantings made straight through db/queries, for tests that
// need one to exist before they call a route.

let seq = 0;

/** An 8 × 4 ft raised bed (PRODUCT.md journey 1). */
export async function makeBed(gardenId: string, name = `Raised bed ${++seq}`) {
  return createBed({
    gardenId,
    input: {
      name,
      kind: "bed",
      indoors: false,
      length: { value: 8, unit: "ft" },
      width: { value: 4, unit: "ft" },
    },
  });
}

export async function starterCropId(name: string): Promise<string> {
  const db = await getDb();
  await ensureStarterCrops(db);
  const [row] = await db
    .select({ id: crops.id })
    .from(crops)
    .where(and(isNull(crops.gardenId), eq(crops.name, name)));
  if (!row) throw new Error(`no starter crop ${name}`);
  return row.id;
}

export async function makeOwnCrop(gardenId: string, name = `Tomatillo ${++seq}`) {
  return createCrop({
    gardenId,
    input: { name, feederClass: "medium", edible: true, edibleTouchesSoil: false },
  });
}

export async function makePlanting(gardenId: string, bedId?: string) {
  const bed = bedId ?? (await makeBed(gardenId)).id;
  const { plantings } = await createPlantings({
    gardenId,
    inputs: [
      {
        bedId: bed,
        cropId: await starterCropId("Tomato"),
        plantCount: 6,
        plantedOn: "2026-05-01",
        priority: "normal",
      },
    ],
  });
  return plantings[0]!;
}
