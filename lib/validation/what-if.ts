import { z } from "zod";
import type { WhatIfChange, WhatIfRequest } from "@/lib/balance/types";
import { monthSchema, monthsSchema } from "@/lib/balance/range";
import { isoDateSchema } from "@/lib/validation/engine-inputs";

// A what-if: changes tried on a copy of the garden's inputs, never saved.
// Amounts are SI (the UI converts from the grower's units before sending).
// Bounds that depend on the garden (a planting's rule measure, which ids exist)
// are checked against its inputs in lib/balance/what-if.ts.

const id = z.string().min(1).max(100);

const changeSchema = z.discriminatedUnion("kind", [
  z
    .object({
      kind: z.literal("bin-trays"),
      binId: id,
      // A stack of 1–20 trays: the same limit as a bin in a scenario file.
      trays: z.number().int("must be a whole number of trays").min(1).max(20),
    })
    .strict(),
  z
    .object({
      kind: z.literal("bin-rotation"),
      binId: id,
      rotationIntervalDays: z.number().int("must be whole days").min(1).max(365),
    })
    .strict(),
  z.object({ kind: z.literal("bin-start"), binId: id, startDate: isoDateSchema }).strict(),
  z
    .object({
      kind: z.literal("extra-trays"),
      binId: id,
      // The engine's own search stops at 60 extra trays.
      harvestDates: z.array(isoDateSchema).min(1, "give at least one harvest date").max(60),
    })
    .strict(),
  z
    .object({
      kind: z.literal("planting-amount"),
      plantingId: id,
      amount: z.number().finite().nonnegative(),
    })
    .strict(),
  z
    .object({
      kind: z.literal("add-bin"),
      likeBinId: id,
      startDate: isoDateSchema,
      trays: z.number().int("must be a whole number of trays").min(1).max(20).optional(),
      startingWorms: z.number().int().min(0).max(1_000_000).optional(),
      name: z.string().trim().min(1).max(80).optional(),
    })
    .strict(),
]);

export const whatIfRequestSchema = z
  .object({
    from: monthSchema.optional(),
    months: monthsSchema.optional(),
    changes: z.array(changeSchema).min(1, "give at least one change").max(20),
  })
  .strict();

// The zod schema and the published type must say the same thing.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const changeTypesAgree: Same<z.infer<typeof changeSchema>, WhatIfChange> = true;
const requestTypesAgree: Same<z.infer<typeof whatIfRequestSchema>, WhatIfRequest> = true;
void changeTypesAgree;
void requestTypesAgree;
