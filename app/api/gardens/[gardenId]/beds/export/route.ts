import { z } from "zod";
import { listBedsForExport } from "@/db/queries/beds-csv";
import { getGardenById } from "@/db/queries/gardens";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseParams, parseWith, refuseOtherMethods, route } from "@/lib/http";
import { bedsCsv, bedsCsvTemplate } from "@/lib/plantings/beds-csv-write";
import { exportBedsCsvQuerySchema } from "@/lib/validation/beds-csv";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

// The garden's beds and plantings as CSV (the import's format), or ?template=1.
export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const query = parseWith(
    exportBedsCsvQuerySchema,
    Object.fromEntries(new URL(request.url).searchParams),
  );
  const garden = await getGardenById({ gardenId });
  if (!garden) throw new AppError("not_found:garden");
  const system = garden.unitSystem;
  const csv = query.template
    ? bedsCsvTemplate(system, new Date().getUTCFullYear() + 1)
    : bedsCsv(await listBedsForExport({ gardenId }), system);
  const name = query.template ? "beds-template.csv" : "beds-and-plantings.csv";
  return new Response(csv, {
    headers: {
      "Cache-Control": "private, no-store",
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${name}"`,
    },
  });
});

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods({ GET });
