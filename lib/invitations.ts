import "server-only";
import { getGardenById } from "@/db/queries/gardens";
import { setInvitationMailStatus, type InvitationDto } from "@/db/queries/invitations";
import type { UserDto } from "@/db/queries/users";
import { invitationMail } from "@/services/mail";
import { trySend } from "@/services/mailer";

/**
 * Sends (or resends) an invitation's e-mail after the invitation is saved, and
 * records whether it went. SMTP being down never loses the invitation: the UI
 * says so and offers "resend".
 */
export async function deliverInvitation(input: {
  invitation: InvitationDto;
  token: string;
  inviter: UserDto;
  baseUrl: string;
}): Promise<boolean> {
  const garden = await getGardenById({ gardenId: input.invitation.gardenId });
  if (!garden) return false;
  const mail = invitationMail({
    gardenName: garden.name,
    inviterName: input.inviter.name,
    role: input.invitation.role,
    acceptUrl: `${input.baseUrl}/invitations/${input.token}`,
    expiresAt: input.invitation.expiresAt,
    timeZone: garden.timeZone,
  });
  const result = await trySend({ to: input.invitation.email, ...mail });
  await setInvitationMailStatus({
    invitationId: input.invitation.id,
    status: result.sent ? "sent" : "failed",
  });
  return result.sent;
}
