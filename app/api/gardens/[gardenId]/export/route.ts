import { z } from "zod";
import { exportGardenScenario } from "@/db/queries/garden-scenario";
import { getGardenById } from "@/db/queries/gardens";
import { todayIn } from "@/lib/balance/range";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseParams, route, refuseOtherMethods } from "@/lib/http";

export const dynamic = "force-dynamic";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

/** A file name from the garden's name: letters, digits and dashes only (nothing to escape in the header). */
function fileName(name: string, asOf: string): string {
  const slug = name
    .normalize("NFKD")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);
  return `${slug || "garden"}-${asOf}.json`;
}

// The whole garden as a scenario file (lib/validation/scenario.ts), history up to today.
export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const garden = await getGardenById({ gardenId });
  if (!garden) throw new AppError("not_found:garden");
  const asOf = todayIn(garden.timeZone);
  const scenario = await exportGardenScenario({ gardenId, asOf });
  return new Response(JSON.stringify(scenario, null, 2), {
    headers: {
      "Content-Type": "application/json; charset=utf-8",
      "Content-Disposition": `attachment; filename="${fileName(garden.name, asOf)}"`,
      "Cache-Control": "private, no-store",
    },
  });
});

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods({ GET });
