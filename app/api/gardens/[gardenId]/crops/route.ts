import { z } from "zod";
import { createCrop, listCrops } from "@/db/queries/crops";
import { requireRole } from "@/lib/auth/require-role";
import { parseJson, parseParams, parseWith, refuseOtherMethods, route } from "@/lib/http";
import { createCropSchema, listCropsQuerySchema } from "@/lib/validation/crop";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

// GET ?q=&feederClass=&limit=&offset=: the garden's own crops and the shared list.
export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const url = new URL(request.url);
  const query = parseWith(listCropsQuerySchema, Object.fromEntries(url.searchParams));
  const { crops, total } = await listCrops({ gardenId, query });
  return Response.json({ crops, total, limit: query.limit, offset: query.offset });
});

export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, createCropSchema);
  const crop = await createCrop({ gardenId, input });
  return Response.json({ crop }, { status: 201 });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
