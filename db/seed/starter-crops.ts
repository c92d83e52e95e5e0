import { isNull } from "drizzle-orm";
import type { Db } from "@/db";
import { crops } from "@/db/schema";

// The crop list every garden starts with. Feeder classes are common practice;
// "edible touches soil" decides the 120- vs 90-day interval for manure-fed
// outputs (7 CFR 205.203(c)(1)). Growers add their own crops per garden.

// Starter crops carry no feeding rule: null means the engine's default rule
// for the feeder class (lib/engine/defaults.ts), so a change of default reaches
// every crop. A garden copies a starter crop into its own list when it uses it.

type FeederClass = "heavy" | "medium" | "light";

export const starterCrops: {
  name: string;
  feederClass: FeederClass;
  touchesSoil: boolean;
  edible: boolean;
}[] = [
  { name: "Tomato", feederClass: "heavy", touchesSoil: false, edible: true },
  { name: "Pepper", feederClass: "heavy", touchesSoil: false, edible: true },
  { name: "Squash", feederClass: "heavy", touchesSoil: false, edible: true },
  { name: "Cucumber", feederClass: "heavy", touchesSoil: false, edible: true },
  { name: "Sweet corn", feederClass: "heavy", touchesSoil: false, edible: true },
  { name: "Kale", feederClass: "medium", touchesSoil: false, edible: true },
  { name: "Lettuce", feederClass: "medium", touchesSoil: true, edible: true },
  { name: "Strawberry", feederClass: "medium", touchesSoil: true, edible: true },
  { name: "Blueberry", feederClass: "medium", touchesSoil: false, edible: true },
  { name: "Potato", feederClass: "medium", touchesSoil: true, edible: true },
  { name: "Beet", feederClass: "medium", touchesSoil: true, edible: true },
  { name: "Basil", feederClass: "medium", touchesSoil: false, edible: true },
  { name: "Carrot", feederClass: "light", touchesSoil: true, edible: true },
  { name: "Garlic", feederClass: "light", touchesSoil: true, edible: true },
  { name: "Bush bean", feederClass: "light", touchesSoil: false, edible: true },
  { name: "Pea", feederClass: "light", touchesSoil: false, edible: true },
  { name: "Thyme", feederClass: "light", touchesSoil: false, edible: true },
  { name: "Zinnia", feederClass: "medium", touchesSoil: false, edible: false },
  { name: "Dahlia", feederClass: "heavy", touchesSoil: false, edible: false },
  { name: "Sunflower", feederClass: "medium", touchesSoil: false, edible: false },
];

/** Adds the shared crop list once; later calls find it and add nothing. */
export async function ensureStarterCrops(db: Db): Promise<number> {
  return db.transaction(async (tx) => {
    const existing = await tx
      .select({ id: crops.id })
      .from(crops)
      .where(isNull(crops.gardenId))
      .limit(1);
    if (existing.length) return 0;
    await tx.insert(crops).values(
      starterCrops.map((crop) => ({
        gardenId: null,
        name: crop.name,
        feederClass: crop.feederClass,
        edibleTouchesSoil: crop.touchesSoil,
        edible: crop.edible,
      })),
    );
    return starterCrops.length;
  });
}
