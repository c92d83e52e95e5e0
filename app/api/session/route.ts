import { verifyCredentials } from "@/lib/auth/credentials";
import { clearSessionCookie, endRequestSession, issueSessionCookie } from "@/lib/auth/session";
import { clientAddress } from "@/lib/auth/throttle";
import { parseJson, route } from "@/lib/http";
import { signInSchema } from "@/lib/validation/auth";

// Sign in: throttled, same answer for unknown e-mail and wrong password.
export const POST = route(async (request) => {
  const input = await parseJson(request, signInSchema);
  const user = await verifyCredentials(input.email, input.password, clientAddress(request));
  return Response.json(
    { user: { id: user.id, name: user.name, email: user.email } },
    { headers: { "Set-Cookie": await issueSessionCookie(user) } },
  );
});

// Sign out of this browser: the token stops working on the server too, even if copied.
export const DELETE = route(async (request) => {
  await endRequestSession(request);
  return Response.json({ ok: true }, { headers: { "Set-Cookie": clearSessionCookie() } });
});
