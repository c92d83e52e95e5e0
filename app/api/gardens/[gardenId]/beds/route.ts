import { z } from "zod";
import { createBed, listBeds } from "@/db/queries/beds";
import { requireRole } from "@/lib/auth/require-role";
import { parseJson, parseParams, parseWith, route } from "@/lib/http";
import { createBedSchema, listBedsQuerySchema } from "@/lib/validation/bed";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

// GET ?kind=bed|container&indoors=true|false&q=name&limit=&offset=
export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  const url = new URL(request.url);
  const query = parseWith(listBedsQuerySchema, Object.fromEntries(url.searchParams));
  const { beds, total } = await listBeds({ gardenId, query });
  return Response.json({ beds, total, limit: query.limit, offset: query.offset });
});

export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(params, paramsSchema);
  await requireRole(request, gardenId, "grower");
  const input = await parseJson(request, createBedSchema);
  const bed = await createBed({ gardenId, input });
  return Response.json({ bed }, { status: 201 });
});
