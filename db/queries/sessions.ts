import "server-only";
import { and, eq, gt, lt } from "drizzle-orm";
import { getDb } from "@/db";
import { sessions, users } from "@/db/schema";
import { forgetCheckedSessionsAndRoles } from "@/lib/auth/gate-cache";
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

/** A live session's user and expiry, or null when the row is gone, expired or names someone else. */
export async function getLiveSession(input: {
  sessionId: string;
  userId: string;
}): Promise<{ user: UserDto; expiresAt: Date } | null> {
  const db = await getDb();
  const [row] = await db
    .select({
      user: { id: users.id, email: users.email, name: users.name },
      expiresAt: sessions.expiresAt,
    })
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
  forgetCheckedSessionsAndRoles(); // the gate's memory of this cookie goes too
}

/** "Sign out everywhere": every session of this user ends. */
export async function deleteUserSessions({ userId }: { userId: string }): Promise<void> {
  const db = await getDb();
  await db.delete(sessions).where(eq(sessions.userId, userId));
  forgetCheckedSessionsAndRoles();
}
