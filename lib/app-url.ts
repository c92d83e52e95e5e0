import { getEnv } from "./env";

/**
 * Absolute base for links in e-mails and feeds: APP_ORIGIN, else AUTH_URL. Without
 * either, development and demo use http://localhost:${PORT:-3000}. The request's Host
 * header never decides: a forged one would put an attacker's domain into reset links.
 * A production server (not demo) without a configured origin refuses to make links
 * rather than send mail pointing at localhost.
 */
export function appBaseUrl(): string {
  const env = getEnv();
  const configured = env.APP_ORIGIN ?? env.AUTH_URL;
  if (configured) return new URL(configured).origin;
  if (env.NODE_ENV === "production" && !env.CASTLINE_DEMO) {
    throw new Error(
      "Set APP_ORIGIN (or AUTH_URL) to the public origin, e.g. https://garden.example.org",
    );
  }
  return `http://localhost:${env.PORT ?? 3000}`;
}
