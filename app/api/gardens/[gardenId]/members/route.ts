import { z } from "zod";
import { listMembers } from "@/db/queries/memberships";
import { requireRole } from "@/lib/auth/require-role";
import { parseParams, route, refuseOtherMethods } from "@/lib/http";

const paramsSchema = z.object({ gardenId: z.uuid() });

export const GET = route<z.infer<typeof paramsSchema>>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  return Response.json({ members: await listMembers({ gardenId }) });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods({ GET });
