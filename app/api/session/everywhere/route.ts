import { clearSessionCookie, endAllSessions, requireUser } from "@/lib/auth/session";
import { refuseOtherMethods, route } from "@/lib/http";

// "Sign out everywhere": every session row of this account is deleted (ASVS 7.4.5).
export const POST = route(async (request) => {
  const user = await requireUser(request);
  await endAllSessions(user.id);
  return Response.json({ ok: true }, { headers: { "Set-Cookie": clearSessionCookie() } });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
