import { z } from "zod";
import {
  createInvitation,
  findInviteeStanding,
  listOpenInvitations,
} from "@/db/queries/invitations";
import { requireRole } from "@/lib/auth/require-role";
import { consumeLimits, INVITE_REFUSAL, limits } from "@/lib/auth/throttle";
import { createLinkToken } from "@/lib/auth/tokens";
import { appBaseUrl } from "@/lib/app-url";
import { AppError } from "@/lib/errors";
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
  // Before anything is written: without a public address the mail's link cannot be made.
  const baseUrl = appBaseUrl();
  // A member needs a role change, not an invitation; an open invitation needs "Resend"
  // (which keeps the per-address mail limit), not a second link.
  const standing = await findInviteeStanding({ gardenId, email: input.email });
  if (standing && "member" in standing) {
    throw new AppError("conflict:already_member", "They are already a member of this garden.", {
      email: "Already a member of this garden: change their role in the member list instead.",
    });
  }
  if (standing) {
    throw new AppError("conflict:already_invited", "They already have an open invitation.", {
      email: "Already invited: resend that invitation instead of making a second one.",
    });
  }
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
    baseUrl,
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
