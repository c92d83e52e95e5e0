import { createPasswordReset, RESET_TTL_MS } from "@/db/queries/password-resets";
import { getUserByEmail } from "@/db/queries/users";
import { afterResponse } from "@/lib/after-response";
import { appBaseUrl } from "@/lib/app-url";
import { clientAddress, consumeLimits, limits } from "@/lib/auth/throttle";
import { createLinkToken } from "@/lib/auth/tokens";
import { parseJson, refuseOtherMethods, route } from "@/lib/http";
import { RESET_REQUESTED_MESSAGE } from "@/lib/messages";
import { requestResetSchema } from "@/lib/validation/auth";
import { passwordResetMail } from "@/services/mail";
import { trySend } from "@/services/mailer";

const RESET_REFUSAL = {
  code: "rate_limited:password_reset" as const,
  message: "Too many reset requests.",
};

// Always the same answer in the same time: the look-up, the token and the mail all
// happen after the response, so neither words nor timing say whether the address has
// an account. Limited per client address and per target address (no inbox flooding).
export const POST = route(async (request) => {
  const { email } = await parseJson(request, requestResetSchema);
  await consumeLimits(
    [limits.resetAddress(clientAddress(request)), limits.resetEmail(email)],
    RESET_REFUSAL,
  );
  const baseUrl = appBaseUrl();
  afterResponse("password-reset mail", () => sendResetMail(email, baseUrl));
  return Response.json({ ok: true, message: RESET_REQUESTED_MESSAGE }, { status: 202 });
});

async function sendResetMail(email: string, baseUrl: string): Promise<void> {
  const user = await getUserByEmail({ email });
  if (!user) return;
  const { token, tokenHash } = createLinkToken();
  await createPasswordReset({ userId: user.id, tokenHash });
  const mail = passwordResetMail({
    resetUrl: `${baseUrl}/reset-password?token=${token}`,
    expiresInMinutes: RESET_TTL_MS / 60_000,
  });
  await trySend({ to: user.email, ...mail });
}

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
