import { z } from "zod";
import { getDb } from "@/db";
import { listVisibleCrops } from "@/db/queries/crops";
import { createPlantings, listPlantings } from "@/db/queries/plantings";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, parseWith, refuseOtherMethods, route } from "@/lib/http";
import { matchCrop, parseQuickEntry } from "@/lib/plantings/quick-entry";
import {
  createPlantingSchema,
  listPlantingsQuerySchema,
  quickPlantingSchema,
  type CreatePlantingInput,
} from "@/lib/validation/planting";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

// GET ?bedId=&cropId=&active=true|false&limit=&offset=
export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const url = new URL(request.url);
  const query = parseWith(listPlantingsQuerySchema, Object.fromEntries(url.searchParams));
  const { plantings, total } = await listPlantings({ gardenId, query });
  return Response.json({ plantings, total, limit: query.limit, offset: query.offset });
});

/** "6 tomato, 4 pepper" → one planting input per part, or a 400 on `quick` naming every part it cannot use. */
async function quickInputs(gardenId: string, body: unknown): Promise<CreatePlantingInput[]> {
  const quick = parseWith(quickPlantingSchema, body);
  const { parts, errors } = parseQuickEntry(quick.quick);
  const crops = await listVisibleCrops(await getDb(), gardenId);
  const inputs: CreatePlantingInput[] = [];
  for (const part of parts) {
    const crop = matchCrop(part.name, crops);
    if (!crop)
      errors.push(`"${part.name}" is not on this garden's crop list: add it as a crop first.`);
    else
      inputs.push({
        bedId: quick.bedId,
        cropId: crop.id,
        plantCount: part.count,
        plantedOn: quick.plantedOn,
        priority: quick.priority,
        confirmCrowded: quick.confirmCrowded,
      });
  }
  if (errors.length)
    throw new AppError("validation", "Please check: quick.", { quick: errors.join(" ") });
  return inputs;
}

// One planting, or quick entry ({ bedId, plantedOn, quick: "6 tomato, 4 pepper" }) in one transaction.
export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const body = await parseJson(request, z.record(z.string(), z.unknown()));
  const isQuick = "quick" in body;
  const inputs = isQuick
    ? await quickInputs(gardenId, body)
    : [parseWith(createPlantingSchema, body)];
  const result = await createPlantings({
    gardenId,
    inputs,
    countField: isQuick ? "quick" : "plantCount",
  });
  return Response.json(result, { status: 201 });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
