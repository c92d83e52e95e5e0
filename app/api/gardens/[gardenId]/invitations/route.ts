import { z } from "zod";
import { createInvitation, listOpenInvitations } from "@/db/queries/invitations";
import { requireRole } from "@/lib/auth/require-role";
import { consumeLimits, INVITE_REFUSAL, limits } from "@/lib/auth/throttle";
import { createLinkToken } from "@/lib/auth/tokens";
import { appBaseUrl } from "@/lib/app-url";
import { parseJson, parseParams, route, refuseOtherMethods } from "@/lib/http";
import { deliverInvitation } from "@/lib/invitations";
import { inviteSchema } from "@/lib/validation/garden";

const paramsSchema = z.object({ gardenId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

export const GET = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "owner");
  return Response.json({ invitations: await listOpenInvitations({ gardenId }) });
});

export const POST = route<Params>(async (request, { params }) => {
  const { gardenId } = await parseParams(request, params, paramsSchema);
  const member = await requireRole(request, gardenId, "owner");
  const input = await parseJson(request, inviteSchema);
  // Per invited address first, so sends it refuses do not use up the garden's allowance.
  await consumeLimits(
    [limits.inviteEmail(input.email), limits.inviteGarden(gardenId)],
    INVITE_REFUSAL,
  );
  const { token, tokenHash } = createLinkToken();
  const invitation = await createInvitation({
    gardenId,
    ...input,
    tokenHash,
    invitedBy: member.user.id,
  });
  const mailSent = await deliverInvitation({
    invitation,
    token,
    inviter: member.user,
    baseUrl: appBaseUrl(),
  });
  return Response.json(
    {
      invitation: { ...invitation, mailStatus: mailSent ? "sent" : "failed" },
      mailSent,
      message: mailSent
        ? `Invitation sent to ${invitation.email}.`
        : `The invitation is saved, but the e-mail to ${invitation.email} could not be sent. Try "Resend" in a moment.`,
    },
    { status: 201 },
  );
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
