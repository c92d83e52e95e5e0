import { getEnv } from "./env";
import { AppError } from "./errors";

/**
 * Absolute base for links in e-mails and feeds: APP_ORIGIN, else AUTH_URL. Without
 * either, development and demo use http://localhost:${PORT:-3000}. The request's Host
 * header never decides: a forged one would put an attacker's domain into reset links.
 * A production server (not demo) without a configured origin refuses to make links
 * rather than send mail pointing at localhost: a 503 that says what is missing, thrown
 * before anything is written, so a sign-up or invitation is never half-done.
 */
export function appBaseUrl(): string {
  const env = getEnv();
  const configured = env.APP_ORIGIN ?? env.AUTH_URL;
  if (configured) return new URL(configured).origin;
  if (env.NODE_ENV === "production" && !env.CASTLINE_DEMO) {
    throw new AppError(
      "unavailable:app_origin",
      "The server's public address is not configured, so it cannot make the links this e-mail needs. Whoever runs it should set APP_ORIGIN (or AUTH_URL) to its public origin, e.g. https://garden.example.org.",
    );
  }
  return `http://localhost:${env.PORT ?? 3000}`;
}
