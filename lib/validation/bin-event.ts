import { z } from "zod";
import { isoDateSchema } from "./engine-inputs";
import { wormAmountSchema } from "./bin";

// One entry in a bin's log. Amounts are SI; the form converts from the
// garden's units. Dates are the garden's calendar days ("YYYY-MM-DD"); the
// route also checks them against the bin's start and today.

export const foodKinds = [
  "vegetable scraps",
  "fruit",
  "coffee grounds",
  "tea leaves",
  "eggshells",
  "grain or bread",
  "citrus",
  "onion or garlic",
  "spicy food",
  "meat or fish",
  "dairy",
  "oily food",
] as const;
export type FoodKind = (typeof foodKinds)[number];

/** Foods worm bins handle badly, with the reason shown to the person logging (common practice). */
export const foodWarnings: Partial<Record<FoodKind, string>> = {
  citrus: "Citrus turns the bedding acid; feed it sparingly, if at all.",
  "onion or garlic": "Onion and garlic are strong; worms avoid them.",
  "spicy food": "Spicy food irritates worms; leave it out.",
  "meat or fish": "Meat and fish rot, smell and draw pests; keep them out.",
  dairy: "Dairy sours and smells; keep it out.",
  "oily food": "Oil coats the bedding and stops air; keep it out.",
};

const note = z.string().trim().max(500, "Use at most 500 characters.").nullable().optional();
const amount = (max: number, label: string) =>
  z
    .number({ error: `Enter the ${label}.` })
    .finite()
    .positive(`The ${label} must be more than zero.`)
    .max(max, `The ${label} looks too large (at most ${max}).`);

const base = { on: isoDateSchema, note };

export const binEventSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({
      kind: z.literal("food-added"),
      ...base,
      foodKg: amount(100, "food weight"),
      foods: z.array(z.enum(foodKinds)).max(foodKinds.length).default([]),
    }),
    z.object({ kind: z.literal("bedding-added"), ...base }),
    z.object({ kind: z.literal("tray-added"), ...base }),
    z
      .object({
        kind: z.literal("tray-harvested"),
        ...base,
        castingsKg: amount(500, "castings weight").optional(),
        castingsL: amount(1000, "castings volume").optional(),
      })
      .refine((v) => v.castingsKg !== undefined || v.castingsL !== undefined, {
        message: "Give the castings weight or volume.",
        path: ["castingsKg"],
      }),
    z.object({ kind: z.literal("liquid-drained"), ...base, litres: amount(200, "liquid volume") }),
    z.object({
      kind: z.literal("worms-moved"),
      ...base,
      worms: wormAmountSchema,
      // Another bin (in this or another garden the person belongs to), or null: out of the system.
      to: z
        .object({ gardenId: z.uuid("Choose a garden."), binId: z.uuid("Choose a bin.") })
        .nullable(),
    }),
    z
      .object({
        kind: z.literal("observation"),
        ...base,
        temperatureC: z
          .number()
          .finite()
          .min(-30, "Too cold to be real.")
          .max(60, "Too hot to be real.")
          .nullable()
          .optional(),
        moisturePercent: z
          .number()
          .finite()
          .min(0, "0–100 %.")
          .max(100, "0–100 %.")
          .nullable()
          .optional(),
        // A head count (or an estimate from a weighed handful): later moves are limited by it.
        wormCount: z.number().int("Count whole worms.").min(0).max(1_000_000).nullable().optional(),
      })
      .refine(
        (v) =>
          v.temperatureC != null ||
          v.moisturePercent != null ||
          v.wormCount != null ||
          (v.note ?? "").length > 0,
        { message: "Note a temperature, moisture or a few words.", path: ["note"] },
      ),
  ],
  { error: "Choose what happened." },
);
export type BinEventInput = z.infer<typeof binEventSchema>;
export type BinEventKind = BinEventInput["kind"];

export const binEventKindLabels: Record<BinEventKind, string> = {
  "food-added": "Food added",
  "bedding-added": "Bedding added",
  "tray-added": "Tray added",
  "tray-harvested": "Tray harvested",
  "liquid-drained": "Liquid drained",
  "worms-moved": "Worms moved",
  observation: "Observation",
};

export const binEventFilterSchema = z.object({
  kind: z.enum(Object.keys(binEventKindLabels) as [BinEventKind, ...BinEventKind[]]).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(100),
});

export function warningsForFoods(foods: readonly FoodKind[]): string[] {
  return foods.flatMap((f) => (foodWarnings[f] ? [foodWarnings[f]!] : []));
}
