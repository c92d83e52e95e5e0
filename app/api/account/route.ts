import { createUser, getUserByEmail } from "@/db/queries/users";
import { afterResponse } from "@/lib/after-response";
import { appBaseUrl } from "@/lib/app-url";
import { issueDeviceCookie } from "@/lib/auth/device-cookie";
import { hashPassword } from "@/lib/auth/password";
import { issueSessionCookie, requireUser } from "@/lib/auth/session";
import { clientAddress, consumeLimits, limits } from "@/lib/auth/throttle";
import { parseJson, refuseOtherMethods, route } from "@/lib/http";
import { SIGN_UP_REQUESTED_MESSAGE } from "@/lib/messages";
import { signUpSchema } from "@/lib/validation/auth";
import { signUpAttemptMail, welcomeMail } from "@/services/mail";
import { trySend } from "@/services/mailer";

export const GET = route(async (request) => {
  const user = await requireUser(request);
  return Response.json({ user: { id: user.id, name: user.name, email: user.email } });
});

const SIGN_UP_REFUSAL = { code: "rate_limited:sign_up" as const, message: "Too many sign-ups." };

// Sign up. The status and body are the same whether or not the address already has an
// account, and both cost one argon2 hash and one insert; both addresses get an e-mail
// after the response (a welcome, or "someone tried to sign up with your address").
// Only a new address is signed in, with a session cookie (see README, "Accounts").
export const POST = route(async (request) => {
  const input = await parseJson(request, signUpSchema);
  await consumeLimits(
    [limits.signUpAddress(clientAddress(request)), limits.signUpEmail(input.email)],
    SIGN_UP_REFUSAL,
  );
  const baseUrl = appBaseUrl();
  const passwordHash = await hashPassword(input.password);
  const user = await createUser({ email: input.email, name: input.name, passwordHash });
  const headers = new Headers();
  if (user) {
    headers.append("Set-Cookie", await issueSessionCookie(user));
    headers.append("Set-Cookie", issueDeviceCookie(user.email));
    afterResponse("welcome mail", () =>
      trySend({
        to: user.email,
        ...welcomeMail({ name: user.name, signInUrl: `${baseUrl}/sign-in` }),
      }),
    );
  } else {
    afterResponse("sign-up attempt mail", async () => {
      const existing = await getUserByEmail({ email: input.email });
      if (!existing) return;
      const mail = signUpAttemptMail({
        signInUrl: `${baseUrl}/sign-in`,
        resetUrl: `${baseUrl}/forgot-password`,
      });
      await trySend({ to: existing.email, ...mail });
    });
  }
  return Response.json({ ok: true, message: SIGN_UP_REQUESTED_MESSAGE }, { status: 202, headers });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
