import { z } from "zod";
import { listMembers } from "@/db/queries/memberships";
import { requireRole } from "@/lib/auth/require-role";
import { parseParams, route } from "@/lib/http";

const paramsSchema = z.object({ gardenId: z.uuid() });

export const GET = route<z.infer<typeof paramsSchema>>(async (request, { params }) => {
  const { gardenId } = await parseParams(params, paramsSchema);
  await requireRole(request, gardenId, "viewer");
  return Response.json({ members: await listMembers({ gardenId }) });
});
