import type { FeederClass } from "@/lib/engine";

// The shared crop list every garden starts with.
//
// Sources, per column:
// - feederClass: common practice (heavy / medium / light feeders as garden guides
//   group them). The default feeding rule per class is the engine's
//   (lib/engine/core/defaults.ts, PRODUCT.md): heavy 1 cup castings per plant
//   monthly, medium ½ cup monthly, light ½ cup every two months — common practice;
//   tea 100 mL of 10 % solution per plant weekly (Arancon, via conference notes).
// - edibleTouchesSoil: decides the 120- vs 90-day pre-harvest interval for
//   manure-fed outputs (7 CFR 205.203(c)(1)); root crops, low leafy crops and
//   fruit lying on the ground (strawberry, melon) touch the soil.
// - daysToHarvest, spacingIn: common practice, from memory (typical seed-packet
//   figures: days from planting out or sowing to first harvest; in-row spacing
//   between plants in a bed, inches). They seed the planting form's expected end
//   and the crowding warning; a grower's own numbers win.

export type CropCategory = "vegetable" | "herb" | "fruit" | "flower";

export interface CropListEntry {
  name: string;
  /** Other names a grower types in quick entry ("6 tomatoes", "4 peppers"). */
  aliases?: string[];
  category: CropCategory;
  feederClass: FeederClass;
  edible: boolean;
  edibleTouchesSoil: boolean;
  daysToHarvest: number;
  spacingIn: number;
}

const v = (
  name: string,
  feederClass: FeederClass,
  edibleTouchesSoil: boolean,
  daysToHarvest: number,
  spacingIn: number,
  aliases?: string[],
): CropListEntry => ({
  name,
  category: "vegetable",
  feederClass,
  edible: true,
  edibleTouchesSoil,
  daysToHarvest,
  spacingIn,
  aliases,
});

export const cropList: CropListEntry[] = [
  // Vegetables
  v("Tomato", "heavy", false, 75, 24, ["tomatoes"]),
  v("Pepper", "heavy", false, 75, 18, ["peppers", "bell pepper", "chili", "chilli"]),
  v("Eggplant", "heavy", false, 80, 24, ["aubergine"]),
  v("Squash", "heavy", false, 60, 36, ["summer squash", "zucchini", "courgette"]),
  v("Winter squash", "heavy", false, 100, 48, ["pumpkin"]),
  v("Cucumber", "heavy", false, 60, 12, ["cucumbers", "cuke"]),
  v("Sweet corn", "heavy", false, 80, 12, ["corn"]),
  v("Cabbage", "heavy", false, 80, 18),
  v("Broccoli", "heavy", false, 70, 18),
  v("Cauliflower", "heavy", false, 75, 18),
  v("Brussels sprouts", "heavy", false, 100, 24),
  v("Celery", "heavy", false, 110, 8),
  v("Leek", "heavy", true, 110, 6, ["leeks"]),
  v("Okra", "heavy", false, 60, 12),
  v("Kale", "medium", false, 55, 18),
  v("Lettuce", "medium", true, 45, 10),
  v("Spinach", "medium", true, 40, 6),
  v("Chard", "medium", false, 55, 12, ["swiss chard"]),
  v("Potato", "medium", true, 90, 12, ["potatoes"]),
  v("Sweet potato", "medium", true, 110, 12, ["sweet potatoes"]),
  v("Beet", "medium", true, 55, 4, ["beets", "beetroot"]),
  v("Onion", "medium", true, 100, 4, ["onions"]),
  v("Carrot", "light", true, 70, 3, ["carrots"]),
  v("Radish", "light", true, 25, 2, ["radishes"]),
  v("Turnip", "light", true, 50, 4, ["turnips"]),
  v("Garlic", "light", true, 240, 6),
  v("Bush bean", "light", false, 55, 4, ["beans", "green bean", "bean"]),
  v("Pole bean", "light", false, 65, 6),
  v("Pea", "light", false, 60, 2, ["peas"]),
  // Herbs
  { ...v("Basil", "medium", false, 60, 12), category: "herb" },
  { ...v("Parsley", "medium", true, 75, 8), category: "herb" },
  { ...v("Cilantro", "light", true, 50, 6, ["coriander"]), category: "herb" },
  { ...v("Dill", "light", false, 60, 12), category: "herb" },
  { ...v("Chives", "light", false, 60, 6), category: "herb" },
  { ...v("Mint", "light", false, 90, 18), category: "herb" },
  { ...v("Thyme", "light", false, 90, 12), category: "herb" },
  { ...v("Rosemary", "light", false, 120, 24), category: "herb" },
  { ...v("Oregano", "light", false, 90, 12), category: "herb" },
  // Fruit
  { ...v("Strawberry", "medium", true, 90, 12, ["strawberries"]), category: "fruit" },
  { ...v("Blueberry", "medium", false, 365, 48, ["blueberries"]), category: "fruit" },
  { ...v("Raspberry", "medium", false, 365, 24, ["raspberries"]), category: "fruit" },
  { ...v("Melon", "heavy", true, 85, 36, ["cantaloupe", "melons"]), category: "fruit" },
  { ...v("Watermelon", "heavy", true, 90, 48), category: "fruit" },
  // Flowers (not eaten: no pre-harvest interval applies)
  ...(
    [
      ["Zinnia", "medium", 60, 12],
      ["Dahlia", "heavy", 90, 18],
      ["Sunflower", "medium", 80, 18],
      ["Marigold", "light", 50, 10],
      ["Nasturtium", "light", 50, 12],
      ["Cosmos", "light", 70, 12],
      ["Sweet pea", "medium", 75, 6],
    ] as const
  ).map(([name, feederClass, daysToHarvest, spacingIn]): CropListEntry => ({
    name,
    category: "flower",
    feederClass,
    edible: false,
    edibleTouchesSoil: false,
    daysToHarvest,
    spacingIn,
  })),
];

const byName = new Map<string, CropListEntry>();
for (const crop of cropList) {
  byName.set(crop.name.toLowerCase(), crop);
  for (const alias of crop.aliases ?? []) byName.set(alias.toLowerCase(), crop);
}

/** The list entry for a crop name or alias, case-insensitive; undefined for a garden's own crop. */
export function findListedCrop(name: string | null | undefined): CropListEntry | undefined {
  if (!name) return undefined;
  return byName.get(name.trim().toLowerCase());
}
