import "server-only";
import { hitThrottleCounter, returnThrottleHit } from "@/db/queries/throttle-counters";
import { getEnv } from "@/lib/env";
import { AppError, type ErrorCode } from "@/lib/errors";

// Every rate limit in one place. Each is a fixed window counted in the database with one
// atomic statement (db/queries/throttle-counters.ts): the count is reserved BEFORE the
// work it guards, so 40 parallel guesses can never all slip under a limit of 10.

const MINUTE = 60_000;
export const SIGN_IN_WINDOW_MS = 15 * MINUTE;

export interface Limit {
  key: string;
  max: number;
  windowMs: number;
}

export const limits = {
  // Sign-in failures. Untrusted clients (no device cookie for the account) share the
  // account's counter; a client with a valid device cookie has its own, so a stranger's
  // guesses cannot lock the owner's own browser out (OWASP "Slow Down Online Guessing
  // Attacks with Device Cookies").
  signInAccount: (email: string): Limit => ({
    key: `signin-account:${normalise(email)}`,
    max: 10,
    windowMs: SIGN_IN_WINDOW_MS,
  }),
  signInDevice: (deviceId: string): Limit => ({
    key: `signin-device:${deviceId}`,
    max: 10,
    windowMs: SIGN_IN_WINDOW_MS,
  }),
  // Higher, because a household or community garden often shares one address.
  signInAddress: (address: string): Limit => ({
    key: `signin-address:${address}`,
    max: 50,
    windowMs: SIGN_IN_WINDOW_MS,
  }),
  // Mail-sending requests: nobody may flood an inbox or our mail server.
  signUpAddress: (address: string): Limit => ({
    key: `signup-address:${address}`,
    max: 20,
    windowMs: 60 * MINUTE,
  }),
  signUpEmail: (email: string): Limit => ({
    key: `signup-email:${normalise(email)}`,
    max: 3,
    windowMs: 60 * MINUTE,
  }),
  resetAddress: (address: string): Limit => ({
    key: `reset-address:${address}`,
    max: 20,
    windowMs: 60 * MINUTE,
  }),
  resetEmail: (email: string): Limit => ({
    key: `reset-email:${normalise(email)}`,
    max: 3,
    windowMs: 60 * MINUTE,
  }),
  inviteGarden: (gardenId: string): Limit => ({
    key: `invite-garden:${gardenId}`,
    max: 20,
    windowMs: 60 * MINUTE,
  }),
  inviteEmail: (email: string): Limit => ({
    key: `invite-email:${normalise(email)}`,
    max: 3,
    windowMs: 60 * MINUTE,
  }),
};

export const INVITE_REFUSAL: { code: ErrorCode; message: string } = {
  code: "rate_limited:invitations",
  message: "Too many invitation e-mails from this garden or to this address.",
};

function normalise(email: string): string {
  return email.trim().toLowerCase();
}

/**
 * The client's address for rate limits. X-Forwarded-For is written by whoever sends the
 * request, so it counts only behind TRUSTED_PROXY_COUNT proxies we run ourselves: each
 * appends the address it saw, and the entry that many places from the right is the one
 * our nearest trusted proxy's chain saw first. With no trusted proxy (the default) Next.js
 * does not tell a route handler the socket's address (it keeps a client's own
 * X-Forwarded-For instead of its peer's), so every client shares the bucket "direct".
 */
export function clientAddress(request: Request): string {
  const proxies = getEnv().TRUSTED_PROXY_COUNT;
  if (proxies === 0) return "direct";
  const chain = (request.headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  if (chain.length >= proxies) return chain[chain.length - proxies]!;
  return chain[0] ?? request.headers.get("x-real-ip")?.trim() ?? "direct";
}

/** Counts one hit against each limit in turn; throws 429 with Retry-After at the first one over. */
export async function consumeLimits(
  list: Limit[],
  refusal: { code: ErrorCode; message: string },
  now = new Date(),
): Promise<void> {
  for (const limit of list) {
    const { hits, windowStartedAt } = await hitThrottleCounter({
      key: limit.key,
      windowMs: limit.windowMs,
      now,
    });
    if (hits > limit.max) {
      const retryAfter = Math.max(
        1,
        Math.ceil((windowStartedAt.getTime() + limit.windowMs - now.getTime()) / 1000),
      );
      throw new AppError(
        refusal.code,
        `${refusal.message} Try again in ${Math.ceil(retryAfter / 60)} minute(s).`,
        undefined,
        { "Retry-After": String(retryAfter) },
      );
    }
  }
}

/** Gives back the hits of a sign-in that succeeded: only failures count. */
export async function returnHits(list: Limit[]): Promise<void> {
  for (const limit of list) await returnThrottleHit({ key: limit.key });
}
