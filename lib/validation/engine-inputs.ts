import { z } from "zod";
import { nominalBoardNames } from "@/lib/engine";
import { GEOMETRY_LIMITS } from "@/lib/engine";
import { unitNames, unitSystems } from "@/lib/units";

// Boundary schemas for the engine's inputs (scenario files, API bodies, forms).
// Numbers are SI: litres, kilograms, square metres, metres, days. The engine
// checks again on its own (it is called directly by tests and the bench), so
// these schemas are about friendly per-field messages at the edge.

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export const isoDateSchema = z
  .string()
  .regex(ISO_DATE, "use a date written YYYY-MM-DD")
  .refine((s) => {
    const [y, m, d] = s.split("-").map(Number) as [number, number, number];
    const dt = new Date(Date.UTC(y, m - 1, d));
    return dt.getUTCFullYear() === y && dt.getUTCMonth() === m - 1 && dt.getUTCDate() === d;
  }, "not a calendar day");

export const monthDaySchema = z
  .string()
  .regex(/^(\d{4}-)?\d{2}-\d{2}$/, "use a month and day written MM-DD")
  .refine((s) => {
    const [m, d] = s.slice(-5).split("-").map(Number) as [number, number];
    const dt = new Date(Date.UTC(2024, m - 1, d));
    return m >= 1 && m <= 12 && dt.getUTCMonth() === m - 1 && dt.getUTCDate() === d;
  }, "not a calendar day");

const positive = (max: number) => z.number().finite().positive().max(max);
const nonNegative = (max: number) => z.number().finite().nonnegative().max(max);
const id = z.string().min(1).max(100);
const month = z.number().int().min(1).max(12);

export const unitNameSchema = z.enum(unitNames);
export const unitSystemSchema = z.enum(unitSystems);
export const nominalBoardSchema = z.enum(nominalBoardNames as [string, ...string[]]);
export const materialSchema = z.enum(["castings", "leachate", "tea"]);
export const methodSchema = z.enum(["top-dress", "side-dress", "soil-mix", "drench"]);
export const basisSchema = z.enum([
  "per-plant",
  "per-area",
  "per-container-volume",
  "percent-of-mix",
]);
export const feederClassSchema = z.enum(["heavy", "medium", "light"]);

/** An RRULE as text; whether the library can expand it is checked by the engine (EngineInputError). */
export const recurrenceSchema = z
  .string()
  .trim()
  .min(5)
  .max(500)
  .regex(/FREQ=/i, "an RRULE needs FREQ=…");

export const trayBoxSchema = z.object({
  lengthM: positive(GEOMETRY_LIMITS.traySideM),
  widthM: positive(GEOMETRY_LIMITS.traySideM),
  depthM: positive(GEOMETRY_LIMITS.trayDepthM),
});

export const harvestLogSchema = z.object({
  date: isoDateSchema,
  actualKg: nonNegative(10_000),
  predictedKg: nonNegative(10_000),
});

export const leachateCollectionSchema = z.object({
  date: isoDateSchema,
  litres: nonNegative(1000),
});

/** A stacked-tray bin as forecastCastings / forecastLeachate take it. */
export const binParametersSchema = z.object({
  binId: id,
  startDate: isoDateSchema,
  trays: z.number().int().min(1).max(20),
  trayInsideVolumeL: positive(2000),
  rotationIntervalDays: positive(365).optional(),
  processingDays: positive(730).optional(),
  fillFraction: positive(1).optional(),
  bulkDensityKgPerL: positive(2).optional(),
  dormantMonths: z.array(month).max(11).optional(),
  manureFeedstock: z.boolean().optional(),
  harvestLogs: z.array(harvestLogSchema).max(1000).optional(),
  calibrationHarvests: z.number().int().min(1).max(100).optional(),
  asOf: isoDateSchema.optional(),
  leachateCollections: z.array(leachateCollectionSchema).max(5000).optional(),
  leachateEstimateLPerWeek: nonNegative(1000).optional(),
  wormCount: nonNegative(10_000_000).optional(),
});

export const feedingRuleSchema = z
  .object({
    material: materialSchema,
    method: methodSchema,
    basis: basisSchema,
    amount: nonNegative(1000),
    amountUnit: z.enum(["L", "kg"]).optional(),
    recurrence: recurrenceSchema,
    dilutionWaterParts: nonNegative(1000).optional(),
  })
  .superRefine((rule, ctx) => {
    if (rule.basis === "percent-of-mix" && rule.material !== "castings") {
      ctx.addIssue({
        code: "custom",
        path: ["basis"],
        message: "percent-of-mix applies to castings only",
      });
    }
    if (rule.basis === "percent-of-mix" && rule.amount > 100) {
      ctx.addIssue({ code: "custom", path: ["amount"], message: "a percentage is at most 100" });
    }
    if (rule.amountUnit === "kg" && rule.material !== "castings") {
      ctx.addIssue({
        code: "custom",
        path: ["amountUnit"],
        message: "liquids are measured in litres",
      });
    }
  });

export const bedSchema = z.object({
  id,
  indoor: z.boolean().optional(),
  areaM2: positive(10_000).optional(),
  containerVolumeL: positive(GEOMETRY_LIMITS.containerVolumeL).optional(),
});

export const plantingSchema = z
  .object({
    id,
    bedId: id,
    feederClass: feederClassSchema,
    plantCount: positive(100_000),
    startDate: isoDateSchema,
    endDate: isoDateSchema,
    harvestDate: isoDateSchema.optional(),
    priority: z.number().finite().min(0).max(100).optional(),
    edible: z.boolean().optional(),
    edibleTouchesSoil: z.boolean().optional(),
    rule: feedingRuleSchema.optional(),
    areaM2: positive(10_000).optional(),
    containerVolumeL: positive(GEOMETRY_LIMITS.containerVolumeL).optional(),
  })
  .refine((p) => p.endDate >= p.startDate, {
    path: ["endDate"],
    message: "must not be before startDate",
  });

export const gardenSeasonSchema = z
  .object({ lastSpringFrost: monthDaySchema, firstFallFrost: monthDaySchema })
  .refine((s) => s.firstFallFrost.slice(-5) > s.lastSpringFrost.slice(-5), {
    path: ["firstFallFrost"],
    message: "must come after the last spring frost",
  });

export const dateRangeSchema = z
  .object({ from: isoDateSchema, to: isoDateSchema })
  .refine((r) => r.to >= r.from, { path: ["to"], message: "must not be before from" });

export type BinParameters = z.infer<typeof binParametersSchema>;
export type FeedingRuleInput = z.infer<typeof feedingRuleSchema>;
export type BedSchemaInput = z.infer<typeof bedSchema>;
export type PlantingSchemaInput = z.infer<typeof plantingSchema>;
export type GardenSeasonInput = z.infer<typeof gardenSeasonSchema>;
