import "server-only";
import { and, eq, gt, lt } from "drizzle-orm";
import { getDb } from "@/db";
import { sessions, users } from "@/db/schema";
import type { UserDto } from "./users";

// The session allow-list: a session exists exactly as long as its row does.

export async function createSession(input: {
  sessionId: string;
  userId: string;
  expiresAt: Date;
}): Promise<void> {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx
      .insert(sessions)
      .values({ id: input.sessionId, userId: input.userId, expiresAt: input.expiresAt });
    // Rows past their expiry can never be used again; keep the table small.
    await tx.delete(sessions).where(lt(sessions.expiresAt, new Date()));
  });
}

/** The user of a live session, or null when the row is gone, expired or names someone else. */
export async function getSessionUser(input: {
  sessionId: string;
  userId: string;
}): Promise<UserDto | null> {
  const db = await getDb();
  const [row] = await db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(
      and(
        eq(sessions.id, input.sessionId),
        eq(sessions.userId, input.userId),
        gt(sessions.expiresAt, new Date()),
      ),
    )
    .limit(1);
  return row ?? null;
}

export async function deleteSession({ sessionId }: { sessionId: string }): Promise<void> {
  const db = await getDb();
  await db.delete(sessions).where(eq(sessions.id, sessionId));
}

/** "Sign out everywhere": every session of this user ends. */
export async function deleteUserSessions({ userId }: { userId: string }): Promise<void> {
  const db = await getDb();
  await db.delete(sessions).where(eq(sessions.userId, userId));
}
