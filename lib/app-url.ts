import { getEnv } from "./env";

/**
 * Absolute base for links in e-mails and feeds. AUTH_URL wins. Without it,
 * local and demo use take the Host the browser sent (Next builds request.url
 * from its own hostname, so 127.0.0.1 visitors would get "localhost" links).
 * A production server without AUTH_URL does not trust Host: a forged header
 * would put an attacker's domain into password-reset links.
 */
export function appBaseUrl(request: Request): string {
  const env = getEnv();
  if (env.AUTH_URL) return env.AUTH_URL.replace(/\/+$/, "");
  const fallback = new URL(request.url);
  if (env.NODE_ENV === "production" && !env.CASTLINE_DEMO) return fallback.origin;
  const host = request.headers.get("host");
  if (
    !host ||
    (!/^[a-z0-9.-]+(:\d{1,5})?$/i.test(host) && !/^\[[0-9a-f:]+\](:\d{1,5})?$/i.test(host))
  ) {
    return fallback.origin;
  }
  return `${fallback.protocol}//${host}`;
}
