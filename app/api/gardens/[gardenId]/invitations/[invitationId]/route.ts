import { z } from "zod";
import { revokeInvitation } from "@/db/queries/invitations";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseParams, route, refuseOtherMethods } from "@/lib/http";

const paramsSchema = z.object({ gardenId: z.uuid(), invitationId: z.uuid() });

// Withdraw an invitation that has not been accepted yet.
export const DELETE = route<z.infer<typeof paramsSchema>>(async (request, { params }) => {
  const { gardenId, invitationId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "owner");
  if (!(await revokeInvitation({ gardenId, invitationId })))
    throw new AppError("not_found:invitation");
  return Response.json({ ok: true });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, POST, PUT, PATCH } = refuseOtherMethods({ DELETE });
