import "server-only";
import { and, eq, gte, lt, min, count } from "drizzle-orm";
import { getDb } from "@/db";
import { signInAttempts } from "@/db/schema";
import { AppError } from "@/lib/errors";

// Failed sign-ins are counted per account and per client address over a
// sliding 15-minute window. The address limit is higher because a household
// or community garden often shares one address.
export const THROTTLE_WINDOW_MS = 15 * 60 * 1000;
export const MAX_FAILURES_PER_ACCOUNT = 10;
export const MAX_FAILURES_PER_ADDRESS = 50;

export function throttleKeys(email: string, address: string) {
  return [
    { key: `email:${email.trim().toLowerCase()}`, limit: MAX_FAILURES_PER_ACCOUNT },
    { key: `ip:${address}`, limit: MAX_FAILURES_PER_ADDRESS },
  ];
}

export function clientAddress(request: Request): string {
  const forwarded = request.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || request.headers.get("x-real-ip") || "unknown";
}

/** Throws 429 with Retry-After when either key has too many recent failures. */
export async function assertNotThrottled(
  email: string,
  address: string,
  now = new Date(),
): Promise<void> {
  const db = await getDb();
  const since = new Date(now.getTime() - THROTTLE_WINDOW_MS);
  for (const { key, limit } of throttleKeys(email, address)) {
    const [row] = await db
      .select({ n: count(), oldest: min(signInAttempts.attemptedAt) })
      .from(signInAttempts)
      .where(
        and(
          eq(signInAttempts.throttleKey, key),
          eq(signInAttempts.succeeded, false),
          gte(signInAttempts.attemptedAt, since),
        ),
      );
    if ((row?.n ?? 0) >= limit) {
      const oldest = row?.oldest ? new Date(row.oldest).getTime() : now.getTime();
      const retryAfter = Math.max(
        1,
        Math.ceil((oldest + THROTTLE_WINDOW_MS - now.getTime()) / 1000),
      );
      throw new AppError(
        "rate_limited:sign_in",
        `Too many failed sign-ins. Try again in ${Math.ceil(retryAfter / 60)} minute(s).`,
        undefined,
        { "Retry-After": String(retryAfter) },
      );
    }
  }
}

export async function recordSignInAttempt(
  email: string,
  address: string,
  succeeded: boolean,
): Promise<void> {
  const db = await getDb();
  const keys = throttleKeys(email, address);
  await db.transaction(async (tx) => {
    await tx
      .insert(signInAttempts)
      .values(keys.map(({ key }) => ({ throttleKey: key, succeeded })));
    if (succeeded) {
      // The owner proved they know the password: their own account's count starts over.
      await tx
        .delete(signInAttempts)
        .where(
          and(eq(signInAttempts.throttleKey, keys[0]!.key), eq(signInAttempts.succeeded, false)),
        );
    }
    // Keep the table small: nothing older than the window matters.
    await tx
      .delete(signInAttempts)
      .where(lt(signInAttempts.attemptedAt, new Date(Date.now() - 2 * THROTTLE_WINDOW_MS)));
  });
}
