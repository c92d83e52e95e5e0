import { z } from "zod";

// The beds-and-plantings CSV import: the file's text travels as JSON
// ({ csv }), so the route keeps the JSON-only rule every write route has.

/** The import route's body limit. 5,000 rows of the template run about 0.5 MB; a 10 MB file is refused. */
export const BEDS_CSV_MAX_BYTES = 2_000_000;

export const importBedsCsvSchema = z
  .object({
    csv: z.string({ error: "Send the file's text as csv." }).min(1, "The file is empty."),
  })
  .strict();

export const exportBedsCsvQuerySchema = z.object({
  /** "1": the empty template (header and example rows) instead of the garden's beds. */
  template: z.enum(["1"]).optional(),
});
