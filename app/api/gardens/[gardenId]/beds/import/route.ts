import { z } from "zod";
import { importBedsCsv, loadBedsCsvContext } from "@/db/queries/beds-csv";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, refuseOtherMethods, route } from "@/lib/http";
import { readBedsCsv } from "@/lib/plantings/beds-csv-read";
import { BEDS_CSV_MAX_BYTES, importBedsCsvSchema } from "@/lib/validation/beds-csv";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

/** Problems listed in the answer; the rest are counted. */
const SHOWN = 20;

// { csv }: beds and plantings from the template's format. The text is read again
// here, row by row, exactly as the preview read it; one problem anywhere → 400
// naming row and column, and nothing is written (one transaction otherwise).
export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const { csv } = await parseJson(request, importBedsCsvSchema, { maxBytes: BEDS_CSV_MAX_BYTES });
  const read = readBedsCsv(csv, await loadBedsCsvContext({ gardenId }));
  if (read.problems.length) {
    const lines = read.problems
      .slice(0, SHOWN)
      .map((p) => `Row ${p.row}, ${p.column}: ${p.message}`);
    const more = read.problems.length - lines.length;
    throw new AppError(
      "validation",
      `Nothing was imported. ${lines[0]}${read.problems.length > 1 ? ` (and ${read.problems.length - 1} more)` : ""}`,
      { csv: lines.join("\n") + (more > 0 ? `\n…and ${more} more.` : "") },
    );
  }
  if (!read.newBeds.length && !read.plantings.length)
    throw new AppError("validation", "The file has no rows to import.", {
      csv: "The file has a header but no rows.",
    });
  const imported = await importBedsCsv({ gardenId, read });
  return Response.json({ imported }, { status: 201 });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
