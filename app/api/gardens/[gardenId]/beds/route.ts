import { z } from "zod";
import { createBed, listBeds } from "@/db/queries/beds";
import { requireRole } from "@/lib/auth/require-role";
import { parseJson, parseParams, parseWith, refuseOtherMethods, route } from "@/lib/http";
import { createBedSchema, listBedsQuerySchema } from "@/lib/validation/bed";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

// GET ?kind=bed|container&indoors=true|false&q=name&limit=&offset=
export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const url = new URL(request.url);
  const query = parseWith(listBedsQuerySchema, Object.fromEntries(url.searchParams));
  const { beds, total } = await listBeds({ gardenId, query });
  return Response.json({ beds, total, limit: query.limit, offset: query.offset });
});

export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, createBedSchema);
  const bed = await createBed({ gardenId, input });
  return Response.json({ bed }, { status: 201 });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
