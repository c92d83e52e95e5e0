import { AppError } from "@/lib/errors";
import { route } from "@/lib/http";
import { getLocalOutbox } from "@/services/mail";
import { isOutboxEnabled } from "@/services/mailer";

export const dynamic = "force-dynamic";

// Same switch as the page: absent (404) unless mail is caught locally outside production.
export const GET = route(async () => {
  if (!isOutboxEnabled()) throw new AppError("not_found");
  return Response.json({ messages: (await getLocalOutbox()) ?? [] });
});
