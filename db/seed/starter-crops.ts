import { isNull } from "drizzle-orm";
import type { Db } from "@/db";
import { crops, feedingRules } from "@/db/schema";

// The crop list every garden starts with. Feeder classes are common practice;
// "edible touches soil" decides the 120- vs 90-day interval for manure-fed
// outputs (7 CFR 205.203(c)(1)). Growers add their own crops per garden.

// 1 US cup = 236.5882365 mL (NIST HB 44 App. C) × 0.7 kg/L default castings
// bulk density (PRODUCT.md) → kg of castings in one cup.
const CUP_OF_CASTINGS_KG = 0.2365882365 * 0.7;

export const defaultRuleByClass = {
  // Common practice: heavy feeders ¾–1 cup per plant per month.
  heavy: { amountSi: CUP_OF_CASTINGS_KG, rrule: "FREQ=MONTHLY;BYMONTHDAY=1" },
  medium: { amountSi: CUP_OF_CASTINGS_KG / 2, rrule: "FREQ=MONTHLY;BYMONTHDAY=1" },
  light: { amountSi: CUP_OF_CASTINGS_KG / 2, rrule: "FREQ=MONTHLY;INTERVAL=2;BYMONTHDAY=1" },
} as const;

type FeederClass = keyof typeof defaultRuleByClass;

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
    for (const crop of starterCrops) {
      const rule = defaultRuleByClass[crop.feederClass];
      const [row] = await tx
        .insert(feedingRules)
        .values({
          gardenId: null,
          material: "castings",
          method: "top-dress",
          basis: "per-plant",
          ...rule,
        })
        .returning({ id: feedingRules.id });
      await tx.insert(crops).values({
        gardenId: null,
        name: crop.name,
        feederClass: crop.feederClass,
        edibleTouchesSoil: crop.touchesSoil,
        edible: crop.edible,
        feedingRuleId: row!.id,
      });
    }
    return starterCrops.length;
  });
}
