import { clearSessionCookie, endAllSessions, requireUser } from "@/lib/auth/session";
import { route } from "@/lib/http";

// "Sign out everywhere": every session row of this account is deleted (ASVS 7.4.5).
export const POST = route(async (request) => {
  const user = await requireUser(request);
  await endAllSessions(user.id);
  return Response.json({ ok: true }, { headers: { "Set-Cookie": clearSessionCookie() } });
});
