import { z } from "zod";
import { plainLines } from "./text";
import { isoDateSchema } from "./engine-inputs";

// Stock entered by hand: a bought bag of castings, or stock on hand before
// Castline. Harvests and drains make their own lots through the bin log.

export const createLotSchema = z.object({
  reason: z.enum(["bought", "on-hand"], { error: "Say whether it was bought or already on hand." }),
  material: z.enum(["castings", "leachate"], { error: "Choose castings or leachate." }),
  producedOn: isoDateSchema,
  amountSi: z
    .number({ error: "Enter the amount." })
    .finite()
    .positive("The amount must be more than zero.")
    .max(5000, "That looks too large (at most 5,000)."),
  // Bought castings carry no manure flag unless the seller says so.
  manureFeedstock: z.boolean().default(false),
  // What was paid, per kg (the form converts from the garden's units); bought stock only.
  pricePerKg: z.number().finite().nonnegative().max(1000).nullable().optional(),
  note: plainLines().max(300).nullable().optional(),
});
export type CreateLotInput = z.infer<typeof createLotSchema>;

/** Stock that left a lot without a feeding: spilled, given away, or a counting correction. */
export const adjustLotSchema = z.object({
  reason: z.enum(["spilled", "given-away", "spoiled", "correction"], {
    error: "Choose a reason: spilled, given away, spoiled or correction.",
  }),
  /** How much left the lot (kg or L). */
  removeSi: z
    .number({ error: "Enter the amount." })
    .finite()
    .positive("The amount must be more than zero.")
    .max(5000, "That looks too large (at most 5,000)."),
  note: plainLines().max(300).nullable().optional(),
});
export type AdjustLotInput = z.infer<typeof adjustLotSchema>;
