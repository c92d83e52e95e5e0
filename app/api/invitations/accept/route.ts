import { acceptInvitation } from "@/db/queries/invitations";
import { requireUser } from "@/lib/auth/session";
import { hashLinkToken } from "@/lib/auth/tokens";
import { AppError } from "@/lib/errors";
import { parseJson, route, refuseOtherMethods } from "@/lib/http";
import { invitationProblems } from "@/lib/messages";
import { acceptInvitationSchema } from "@/lib/validation/garden";

export const POST = route(async (request) => {
  const user = await requireUser(request);
  const { token } = await parseJson(request, acceptInvitationSchema);
  const outcome = await acceptInvitation({
    tokenHash: hashLinkToken(token),
    userId: user.id,
    userEmail: user.email,
  });
  if (!outcome.ok && outcome.reason === "wrong_account") {
    throw new AppError("forbidden:invitation_wrong_account", invitationProblems.wrong_account);
  }
  if (!outcome.ok)
    throw new AppError(`gone:invitation_${outcome.reason}`, invitationProblems[outcome.reason]);
  return Response.json({ gardenId: outcome.gardenId, role: outcome.role });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
