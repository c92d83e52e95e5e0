import "server-only";
import { eq, lt, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { throttleCounters } from "@/db/schema";

/**
 * Counts one hit against `key` in a fixed window and returns the new count, in ONE
 * statement (INSERT … ON CONFLICT … DO UPDATE … RETURNING), so parallel requests each get
 * their own number and at most `limit` of them can ever see a count within the limit.
 */
export async function hitThrottleCounter(input: {
  key: string;
  windowMs: number;
  now?: Date;
}): Promise<{ hits: number; windowStartedAt: Date }> {
  const db = await getDb();
  const now = input.now ?? new Date();
  const cutoff = new Date(now.getTime() - input.windowMs).toISOString();
  const expired = sql`${throttleCounters.windowStartedAt} <= ${cutoff}::timestamptz`;
  const [row] = await db
    .insert(throttleCounters)
    .values({ key: input.key, windowStartedAt: now, hits: 1 })
    .onConflictDoUpdate({
      target: throttleCounters.key,
      set: {
        hits: sql`case when ${expired} then 1 else ${throttleCounters.hits} + 1 end`,
        windowStartedAt: sql`case when ${expired} then ${now.toISOString()}::timestamptz else ${throttleCounters.windowStartedAt} end`,
      },
    })
    .returning({ hits: throttleCounters.hits, windowStartedAt: throttleCounters.windowStartedAt });
  if (row!.hits === 1) {
    // A new window began: drop counters nobody has touched for a day.
    await db
      .delete(throttleCounters)
      .where(lt(throttleCounters.windowStartedAt, new Date(now.getTime() - 86_400_000)));
  }
  return { hits: row!.hits, windowStartedAt: new Date(row!.windowStartedAt) };
}

/** Takes back one hit (a sign-in that turned out right is not a failure). */
export async function returnThrottleHit({ key }: { key: string }): Promise<void> {
  const db = await getDb();
  await db
    .update(throttleCounters)
    .set({ hits: sql`greatest(${throttleCounters.hits} - 1, 0)` })
    .where(eq(throttleCounters.key, key));
}
