import { z } from "zod";
import { feederClassSchema } from "@/lib/validation/engine-inputs";
import { checkOwnRules, ownRulesFields } from "@/lib/validation/feeding-rule";
import { quantitySchema } from "@/lib/validation/scenario-quantity";

// A garden's own crop, or its change to a starter crop's default.

const cropFields = z.object({
  name: z.string().trim().min(1, "Give the crop a name.").max(60, "Use at most 60 characters."),
  feederClass: feederClassSchema,
  edible: z.boolean().default(true),
  edibleTouchesSoil: z.boolean().default(false),
  /** Typical days from planting to first harvest: seeds a planting's expected harvest. */
  daysToHarvest: z.number().int().min(1, "At least one day.").max(1000).nullish(),
  /** Distance between plants: the crowding check uses it. */
  spacing: quantitySchema("length", 10).nullish(),
  /** What its plantings inherit (`rules`, or one `rule`); none = the engine's default for the feeder class. */
  ...ownRulesFields,
});

export const createCropSchema = cropFields.superRefine(checkOwnRules);
export type CreateCropInput = z.infer<typeof createCropSchema>;

export const updateCropSchema = cropFields.partial().superRefine(checkOwnRules);
export type UpdateCropInput = z.infer<typeof updateCropSchema>;

export const listCropsQuerySchema = z.object({
  q: z.string().trim().max(60).optional(),
  feederClass: feederClassSchema.optional(),
  limit: z.coerce.number().int().min(1).max(200, "At most 200 a page.").default(200),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});

export const cropIdParamsSchema = z.object({ gardenId: z.uuid(), cropId: z.uuid() });
