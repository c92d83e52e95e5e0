import { z } from "zod";
import { plainText } from "./text";
import { GEOMETRY_LIMITS, nominalBoardNames } from "@/lib/engine/supply/geometry";
import { isoDateSchema } from "./engine-inputs";

// Bin create/edit bodies, in SI (the form converts from the garden's units
// through lib/units). Engine parameters are nullable: null or absent means
// "the engine's default", which the form shows with its source beside it.

export const binKinds = ["stacked-tray", "single", "flow-through"] as const;
export const binKindLabels: Record<(typeof binKinds)[number], string> = {
  "stacked-tray": "Stacked trays",
  single: "Single bin",
  "flow-through": "Flow-through",
};

const positive = (max: number, label: string) =>
  z
    .number({ error: `Enter the ${label}.` })
    .finite()
    .positive(`The ${label} must be more than zero.`)
    .max(max, `The ${label} looks too large (at most ${max}).`);

/** Tray inside size, or the outer size plus the board it is built from (PS 20 entry aid). */
export const traySizeSchema = z.discriminatedUnion(
  "mode",
  [
    z.object({
      mode: z.literal("inside"),
      lengthM: positive(GEOMETRY_LIMITS.traySideM, "inside length"),
      widthM: positive(GEOMETRY_LIMITS.traySideM, "inside width"),
      depthM: positive(GEOMETRY_LIMITS.trayDepthM, "inside depth"),
    }),
    z.object({
      mode: z.literal("outer"),
      outerLengthM: positive(GEOMETRY_LIMITS.traySideM, "outer length"),
      outerWidthM: positive(GEOMETRY_LIMITS.traySideM, "outer width"),
      board: z.enum(nominalBoardNames as [string, ...string[]], {
        error: `Choose a board: ${nominalBoardNames.join(", ")}.`,
      }),
    }),
  ],
  { error: 'Give the tray size as "inside" or "outer" + board.' },
);
export type TraySizeInput = z.infer<typeof traySizeSchema>;

/** Worms as a count or a weight (kg); weight is turned into a count with the engine's worms per lb. */
export const wormAmountSchema = z.union(
  [
    z.object({ count: z.number().int("Count whole worms.").positive().max(1_000_000) }),
    z.object({ kg: positive(500, "worm weight") }),
  ],
  { error: "Give worms as a count or a weight." },
);
export type WormAmountInput = z.infer<typeof wormAmountSchema>;

const nullableParam = (min: number, max: number, label: string, int = false) => {
  let n = z.number({ error: `The ${label} must be a number.` }).finite();
  if (int) n = n.int(`The ${label} must be a whole number.`);
  return n
    .min(min, `The ${label} must be at least ${min}.`)
    .max(max, `The ${label} must be at most ${max}.`)
    .nullable()
    .optional();
};

export const binParamsShape = {
  rotationDays: nullableParam(1, 365, "days between trays", true),
  processingDays: nullableParam(7, 365, "processing days", true),
  fillFraction: nullableParam(0.1, 1, "fill fraction"),
  bulkDensityKgPerL: nullableParam(0.2, 1.5, "bulk density"),
  leachateEstimateLPerWeek: nullableParam(0, 50, "leachate estimate"),
  intakeFractionPerDay: nullableParam(0.05, 1, "food intake"),
  densityCeilingKgPerM2: nullableParam(0.5, 40, "worm density ceiling"),
  drainIntervalDays: nullableParam(1, 90, "days between drains", true),
};

const binFields = z.object({
  name: plainText().min(1, "Give the bin a name.").max(60, "Use at most 60 characters."),
  kind: z.enum(binKinds, { error: "Choose stacked trays, a single bin or flow-through." }),
  trayCount: z
    .number({ error: "Enter the number of trays." })
    .int("Trays come whole.")
    .min(1, "A bin has at least one tray.")
    .max(12, "At most 12 trays."),
  tray: traySizeSchema,
  startedOn: isoDateSchema,
  startingWorms: wormAmountSchema,
  manureFeedstock: z.boolean(),
  indoors: z.boolean(),
  dormantMonths: z
    .array(z.number().int().min(1).max(12), { error: "Months are 1–12." })
    .max(12)
    .refine((m) => new Set(m).size === m.length, "Name each month once."),
  ...binParamsShape,
});

// Defaults only on create: an edit that leaves a flag out must not reset it.
export const createBinSchema = binFields.extend({
  manureFeedstock: binFields.shape.manureFeedstock.default(false),
  indoors: binFields.shape.indoors.default(true),
  dormantMonths: binFields.shape.dormantMonths.default([]),
});
export type CreateBinInput = z.infer<typeof createBinSchema>;

export const updateBinSchema = binFields
  .partial()
  .extend({ retiredOn: isoDateSchema.nullable().optional() })
  .refine((v) => Object.keys(v).length > 0, "Change at least one field.");
export type UpdateBinInput = z.infer<typeof updateBinSchema>;
