import { createPasswordReset, RESET_TTL_MS } from "@/db/queries/password-resets";
import { getUserByEmail } from "@/db/queries/users";
import { createLinkToken } from "@/lib/auth/tokens";
import { appBaseUrl } from "@/lib/app-url";
import { parseJson, route, refuseOtherMethods } from "@/lib/http";
import { RESET_REQUESTED_MESSAGE } from "@/lib/messages";
import { requestResetSchema } from "@/lib/validation/auth";
import { passwordResetMail } from "@/services/mail";
import { trySend } from "@/services/mailer";

// Always the same answer, so the form cannot be used to test which e-mails have accounts.
export const POST = route(async (request) => {
  const { email } = await parseJson(request, requestResetSchema);
  const user = await getUserByEmail({ email });
  if (user) {
    const { token, tokenHash } = createLinkToken();
    await createPasswordReset({ userId: user.id, tokenHash });
    const mail = passwordResetMail({
      resetUrl: `${appBaseUrl(request)}/reset-password?token=${token}`,
      expiresInMinutes: RESET_TTL_MS / 60_000,
    });
    await trySend({ to: user.email, ...mail });
  }
  return Response.json({ ok: true, message: RESET_REQUESTED_MESSAGE }, { status: 202 });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
