import { isNull } from "drizzle-orm";
import type { Db } from "@/db";
import { crops } from "@/db/schema";
import { cropList } from "@/lib/crops/crop-list";

// The shared crop list every garden starts with: the rows of lib/crops/crop-list.ts
// (which names its sources). Starter crops carry no feeding rule: null means the
// engine's default rule for the feeder class (lib/engine/core/defaults.ts), so a
// change of default reaches every crop. A garden copies a starter crop into its
// own list when it plants or changes it.

export const starterCrops = cropList.map((crop) => ({
  name: crop.name,
  feederClass: crop.feederClass,
  touchesSoil: crop.edibleTouchesSoil,
  edible: crop.edible,
}));

/** Adds the list entries not yet in the shared list (by name); later calls add nothing. */
export async function ensureStarterCrops(db: Db): Promise<number> {
  return db.transaction(async (tx) => {
    const existing = await tx
      .select({ name: crops.name })
      .from(crops)
      .where(isNull(crops.gardenId));
    const have = new Set(existing.map((c) => c.name?.toLowerCase()));
    const missing = starterCrops.filter((c) => !have.has(c.name.toLowerCase()));
    if (!missing.length) return 0;
    await tx.insert(crops).values(
      missing.map((crop) => ({
        gardenId: null,
        name: crop.name,
        feederClass: crop.feederClass,
        edibleTouchesSoil: crop.touchesSoil,
        edible: crop.edible,
      })),
    );
    return missing.length;
  });
}
