import { bumpSessionVersion } from "@/db/queries/users";
import { clearSessionCookie, requireUser } from "@/lib/auth/session";
import { route } from "@/lib/http";

// "Sign out everywhere": every token issued before now stops working (ASVS 7.4).
export const POST = route(async (request) => {
  const user = await requireUser(request);
  await bumpSessionVersion({ userId: user.id });
  return Response.json({ ok: true }, { headers: { "Set-Cookie": clearSessionCookie() } });
});
