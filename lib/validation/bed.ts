import { z } from "zod";
import { plainLines, plainText } from "./text";
import { quantitySchema } from "@/lib/validation/scenario-quantity";

// A bed or container as a grower enters it: sizes in their own units
// ({ value, unit }), turned into SI by db/queries/beds.ts. One schema for the
// form and the route handler.

export const bedKindSchema = z.enum(["bed", "container"], {
  error: "Choose a bed or a container.",
});

/** A bed or container as stored and shown back: sizes in SI (a bed has length × width, a container its volume). */
export interface BedShape {
  name: string;
  kind: "bed" | "container";
  indoors: boolean;
  lengthM: number | null;
  widthM: number | null;
  depthM: number | null;
  containerVolumeL: number | null;
  notes: string | null;
}

// Bounds that catch typing slips, in SI: a 100 m long bed or a 5,000 L pot is a mistake.
const MAX_SIDE_M = 100;
const MAX_DEPTH_M = 3;
const MAX_CONTAINER_L = 5_000;

/**
 * An optional size. A form's blank number field arrives as { value: NaN } (or
 * undefined): that means "not given", the same as leaving it out of the JSON.
 */
function optionalSize(kind: "length" | "volume", maxSi: number) {
  return z.preprocess((v) => {
    if (v && typeof v === "object" && "value" in v) {
      const value = (v as { value: unknown }).value;
      if (value === undefined || value === "" || (typeof value === "number" && Number.isNaN(value)))
        return null;
    }
    return v;
  }, quantitySchema(kind, maxSi).nullish());
}

const bedFields = z.object({
  name: plainText().min(1, "Give it a name.").max(80, "Use at most 80 characters."),
  kind: bedKindSchema,
  indoors: z.boolean().default(false),
  length: optionalSize("length", MAX_SIDE_M),
  width: optionalSize("length", MAX_SIDE_M),
  depth: optionalSize("length", MAX_DEPTH_M),
  volume: optionalSize("volume", MAX_CONTAINER_L),
  diameter: optionalSize("length", MAX_DEPTH_M),
  notes: plainLines().max(1000, "Use at most 1,000 characters.").nullish(),
});

type BedFields = z.infer<typeof bedFields>;

/** A bed needs length × width; a container needs a volume or diameter × depth. */
function checkSize(bed: Partial<BedFields>, ctx: z.RefinementCtx): void {
  const need = (path: string, message: string) =>
    ctx.addIssue({ code: "custom", path: [path], message });
  if (bed.kind === "bed") {
    if (!bed.length) need("length", "Enter the bed's length.");
    if (!bed.width) need("width", "Enter the bed's width.");
  } else if (bed.kind === "container" && !bed.volume) {
    if (!bed.diameter && !bed.depth)
      need("volume", "Enter the container's volume, or its diameter and depth.");
    else if (!bed.diameter) need("diameter", "Enter the diameter too, or give the volume.");
    else if (!bed.depth) need("depth", "Enter the depth too, or give the volume.");
  }
}

export const createBedSchema = bedFields.superRefine(checkSize);
export type CreateBedInput = z.infer<typeof createBedSchema>;

/** Partial update; the handler checks the merged result with createBedSchema. */
export const updateBedSchema = bedFields.partial();
export type UpdateBedInput = z.infer<typeof updateBedSchema>;

export const MAX_PAGE = 100;

const booleanParam = z.enum(["true", "false"]).transform((v) => v === "true");

/** GET …/beds?kind=&indoors=&q=&limit=&offset= (search params are strings). */
export const listBedsQuerySchema = z.object({
  kind: bedKindSchema.optional(),
  indoors: booleanParam.optional(),
  /** true: only archived beds; otherwise only beds in use. */
  archived: booleanParam.optional(),
  q: z.string().trim().max(80).optional(),
  limit: z.coerce.number().int().min(1).max(MAX_PAGE, `At most ${MAX_PAGE} a page.`).default(50),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});
export type ListBedsQuery = z.infer<typeof listBedsQuerySchema>;

export const bedIdParamsSchema = z.object({ gardenId: z.uuid(), bedId: z.uuid() });
