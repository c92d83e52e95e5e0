import { z } from "zod";
import { getInvitation, renewInvitationToken } from "@/db/queries/invitations";
import { requireRole } from "@/lib/auth/require-role";
import { consumeLimits, INVITE_REFUSAL, limits } from "@/lib/auth/throttle";
import { createLinkToken } from "@/lib/auth/tokens";
import { appBaseUrl } from "@/lib/app-url";
import { AppError } from "@/lib/errors";
import { parseParams, route, refuseOtherMethods } from "@/lib/http";
import { deliverInvitation } from "@/lib/invitations";

const paramsSchema = z.object({ gardenId: z.uuid(), invitationId: z.uuid() });

export const POST = route<z.infer<typeof paramsSchema>>(async (request, { params }) => {
  const { gardenId, invitationId } = await parseParams(request, params, paramsSchema);
  const member = await requireRole(request, gardenId, "owner");
  // Before the old link is replaced: without a public address the new one cannot be made.
  const baseUrl = appBaseUrl();
  const existing = await getInvitation({ gardenId, invitationId });
  if (!existing || existing.acceptedAt || existing.revokedAt)
    throw new AppError("not_found:invitation");
  // Per invited address first, so sends it refuses do not use up the garden's allowance.
  await consumeLimits(
    [limits.inviteEmail(existing.email), limits.inviteGarden(gardenId)],
    INVITE_REFUSAL,
  );
  const { token, tokenHash } = createLinkToken();
  await renewInvitationToken({ invitationId, tokenHash });
  const invitation = (await getInvitation({ gardenId, invitationId }))!;
  const mailSent = await deliverInvitation({
    invitation,
    token,
    inviter: member.user,
    baseUrl,
  });
  return Response.json({
    mailSent,
    invitation: { ...invitation, mailStatus: mailSent ? "sent" : "failed" },
  });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
