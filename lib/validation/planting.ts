import { z } from "zod";
import {
  checkOwnRules,
  ownRulesFields,
  recurrenceWithoutDates,
} from "@/lib/validation/feeding-rule";
import { quantitySchema } from "@/lib/validation/scenario-quantity";

// A planting: crop × count in a bed or container, its dates and priority, and
// optionally its own feeding rules (replacing the crop's).

export const isoDay = (label: string) =>
  z
    .string({ error: `Enter the ${label}.` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `Enter the ${label} as a date.`)
    // Round-trip: "2026-02-30" must be refused, not rolled over to 2 March.
    .refine((d) => {
      const parsed = new Date(`${d}T00:00:00Z`);
      return !Number.isNaN(parsed.getTime()) && parsed.toISOString().slice(0, 10) === d;
    }, `The ${label} is not a real date.`);

export const prioritySchema = z.enum(["high", "normal", "low"], {
  error: "Choose high, normal or low.",
});
export type Priority = z.infer<typeof prioritySchema>;

/** More plants than this in one planting is a typing slip. */
export const MAX_PLANTS = 100_000;

const plantingFields = z.object({
  bedId: z.uuid("Choose a bed or container."),
  cropId: z.uuid("Choose a crop."),
  plantCount: z
    .number({ error: "Enter how many plants." })
    .int("Plants are counted whole.")
    .min(1, "At least one plant.")
    .max(MAX_PLANTS, `At most ${MAX_PLANTS.toLocaleString("en-US")} plants.`),
  /** Share of the bed it covers, for per-area rules; null = the whole bed. */
  area: quantitySchema("area", 10_000).nullish(),
  plantedOn: isoDay("planting date"),
  expectedHarvestOn: isoDay("expected harvest date").nullish(),
  endedOn: isoDay("end date").nullish(),
  priority: prioritySchema.default("normal"),
  /** Its own rules (`rules`, or one `rule`); none = the crop's rules. */
  ...ownRulesFields,
  notes: z.string().trim().max(1000, "Use at most 1,000 characters.").nullish(),
  /** The grower saw the crowding warning and plants them anyway. */
  confirmCrowded: z.boolean().optional(),
});

type PlantingFields = Partial<z.infer<typeof plantingFields>>;

function checkDates(p: PlantingFields, ctx: z.RefinementCtx): void {
  if (!p.plantedOn) return;
  if (p.endedOn && p.endedOn < p.plantedOn)
    ctx.addIssue({
      code: "custom",
      path: ["endedOn"],
      message: "The end date must not be before the planting date.",
    });
  if (p.expectedHarvestOn && p.expectedHarvestOn < p.plantedOn)
    ctx.addIssue({
      code: "custom",
      path: ["expectedHarvestOn"],
      message: "The harvest date must not be before the planting date.",
    });
  // Each own rule must give dates from the planting day (an UNTIL before it gives none).
  const own: { rule: { recurrence: string }; path: (string | number)[] }[] = [
    ...(p.rules ?? []).map((rule, i) => ({ rule, path: ["rules", i] })),
    ...(p.rule ? [{ rule: p.rule, path: ["rule"] }] : []),
  ];
  for (const { rule, path } of own) {
    const why = recurrenceWithoutDates(rule.recurrence, p.plantedOn);
    if (why) ctx.addIssue({ code: "custom", path: [...path, "recurrence"], message: why });
  }
}

export const createPlantingSchema = plantingFields.superRefine((p, ctx) => {
  checkDates(p, ctx);
  checkOwnRules(p, ctx);
});
export type CreatePlantingInput = z.infer<typeof createPlantingSchema>;

export const updatePlantingSchema = plantingFields.partial().superRefine(checkOwnRules);
export type UpdatePlantingInput = z.infer<typeof updatePlantingSchema>;
export { checkDates as checkPlantingDates };

/** "6 tomato, 4 pepper" into one bed on one day: one planting per entry, in one transaction. */
export const quickPlantingSchema = z.object({
  bedId: z.uuid("Choose a bed or container."),
  plantedOn: isoDay("planting date"),
  quick: z
    .string({ error: 'Type what you planted, e.g. "6 tomato, 4 pepper".' })
    .trim()
    .min(1, 'Type what you planted, e.g. "6 tomato, 4 pepper".')
    .max(500, "Use at most 500 characters."),
  priority: prioritySchema.default("normal"),
  confirmCrowded: z.boolean().optional(),
});
export type QuickPlantingInput = z.infer<typeof quickPlantingSchema>;

export const listPlantingsQuerySchema = z.object({
  bedId: z.uuid().optional(),
  cropId: z.uuid().optional(),
  /** true: still in the ground (not ended before today). */
  active: z
    .enum(["true", "false"])
    .transform((v) => v === "true")
    .optional(),
  /** true: only archived plantings; otherwise only those not archived. */
  archived: z
    .enum(["true", "false"])
    .transform((v) => v === "true")
    .optional(),
  limit: z.coerce.number().int().min(1).max(200, "At most 200 a page.").default(100),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});

export const plantingIdParamsSchema = z.object({ gardenId: z.uuid(), plantingId: z.uuid() });

/** Engine priority (lower is fed first; null = 3): high 1 is never cut by gap-closing. */
export const PRIORITY_RANK: Record<Priority, number | null> = { high: 1, normal: null, low: 5 };
export function priorityFromRank(rank: number | null): Priority {
  if (rank === null || rank === 3) return "normal";
  return rank < 3 ? "high" : "low";
}
