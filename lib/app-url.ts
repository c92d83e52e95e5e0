import { getEnv } from "./env";

/** Absolute base for links in e-mails and feeds: AUTH_URL when set, else the request's own origin. */
export function appBaseUrl(request: Request): string {
  const configured = getEnv().AUTH_URL;
  if (configured) return configured.replace(/\/+$/, "");
  return new URL(request.url).origin;
}
