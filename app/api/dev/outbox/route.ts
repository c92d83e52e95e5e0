import { requireUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { refuseOtherMethods, route } from "@/lib/http";
import { isOutboxEnabled, readOutboxFor } from "@/services/mailer";

export const dynamic = "force-dynamic";

// Same switch as the page: absent (404) unless mail is caught locally outside production.
// Signed out → 401; signed in → only mail addressed to the signed-in account.
export const GET = route(async (request) => {
  if (!isOutboxEnabled()) throw new AppError("not_found");
  const user = await requireUser(request);
  return Response.json({ messages: await readOutboxFor(user.email) });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods({ GET });
