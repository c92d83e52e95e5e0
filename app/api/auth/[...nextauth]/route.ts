import { clearSessionCookie, endRequestSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { refuseOtherMethods, route } from "@/lib/http";

// Auth.js's own endpoints are switched off: the UI signs in and out through
// /api/session, whose sessions live in our server-side allow-list. Left on, Auth.js
// would re-issue cookies for ended sessions (GET /api/auth/session) and answer
// configuration errors with a 500. Only sign-out stays, and it ends the session on
// the server like DELETE /api/session; everything else is a JSON 404.
type Params = { nextauth?: string[] };

export const GET = route<Params>(async () => {
  throw new AppError("not_found");
});

export const POST = route<Params>(async (request, { params }) => {
  const path = (await params).nextauth ?? [];
  if (path.length !== 1 || path[0] !== "signout") throw new AppError("not_found");
  await endRequestSession(request);
  return Response.json({ ok: true }, { headers: { "Set-Cookie": clearSessionCookie() } });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
