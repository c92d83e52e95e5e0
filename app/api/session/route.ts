import { verifyCredentials } from "@/lib/auth/credentials";
import { issueDeviceCookie } from "@/lib/auth/device-cookie";
import { clearSessionCookie, endRequestSession, issueSessionCookie } from "@/lib/auth/session";
import { parseJson, refuseOtherMethods, route } from "@/lib/http";
import { signInSchema } from "@/lib/validation/auth";

// Sign in: throttled, same answer for unknown e-mail and wrong password. Success also
// gives this browser a device cookie for the account (see lib/auth/device-cookie.ts).
export const POST = route(async (request) => {
  const input = await parseJson(request, signInSchema);
  const user = await verifyCredentials(input.email, input.password, request);
  const headers = new Headers();
  headers.append("Set-Cookie", await issueSessionCookie(user));
  headers.append("Set-Cookie", issueDeviceCookie(user.email));
  return Response.json({ user: { id: user.id, name: user.name, email: user.email } }, { headers });
});

// Sign out of this browser: the session row is deleted, so no copy of the cookie works again.
export const DELETE = route(async (request) => {
  await endRequestSession(request);
  return Response.json({ ok: true }, { headers: { "Set-Cookie": clearSessionCookie() } });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH } = refuseOtherMethods({ POST, DELETE });
