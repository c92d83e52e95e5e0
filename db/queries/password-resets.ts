import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { getDb } from "@/db";
import { passwordResetTokens, sessions, users } from "@/db/schema";
import { forgetCheckedSessionsAndRoles } from "@/lib/auth/gate-cache";

export const RESET_TTL_MS = 60 * 60 * 1000;

export async function createPasswordReset(input: {
  userId: string;
  tokenHash: string;
  now?: Date;
}) {
  const db = await getDb();
  const now = input.now ?? new Date();
  await db.transaction(async (tx) => {
    // Only the newest link works: asking again retires the earlier ones.
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: now })
      .where(and(eq(passwordResetTokens.userId, input.userId), isNull(passwordResetTokens.usedAt)));
    await tx.insert(passwordResetTokens).values({
      userId: input.userId,
      tokenHash: input.tokenHash,
      expiresAt: new Date(now.getTime() + RESET_TTL_MS),
    });
  });
}

export type ResetOutcome =
  { ok: true; userId: string } | { ok: false; reason: "invalid" | "expired" | "used" };

/** Marks the token used, sets the new hash and deletes every session, all at once. */
export async function consumePasswordReset(input: {
  tokenHash: string;
  newPasswordHash: string;
  now?: Date;
}): Promise<ResetOutcome> {
  const db = await getDb();
  const now = input.now ?? new Date();
  const outcome = await db.transaction(async (tx): Promise<ResetOutcome> => {
    const [row] = await tx
      .select({
        id: passwordResetTokens.id,
        userId: passwordResetTokens.userId,
        expiresAt: passwordResetTokens.expiresAt,
        usedAt: passwordResetTokens.usedAt,
      })
      .from(passwordResetTokens)
      .where(eq(passwordResetTokens.tokenHash, input.tokenHash))
      .for("update")
      .limit(1);
    if (!row) return { ok: false, reason: "invalid" } as const;
    if (row.usedAt) return { ok: false, reason: "used" } as const;
    if (row.expiresAt.getTime() <= now.getTime()) return { ok: false, reason: "expired" } as const;
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: now })
      .where(eq(passwordResetTokens.id, row.id));
    await tx
      .update(users)
      .set({ passwordHash: input.newPasswordHash })
      .where(eq(users.id, row.userId));
    // A new password ends every session, for good (the allow-list rows go).
    await tx.delete(sessions).where(eq(sessions.userId, row.userId));
    return { ok: true, userId: row.userId } as const;
  });
  forgetCheckedSessionsAndRoles(); // after commit: the ended sessions must not linger in the gate
  return outcome;
}

/** Sets a new password and ends every session of the account in the same transaction. */
export async function setPassword(input: { userId: string; passwordHash: string }): Promise<void> {
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx
      .update(users)
      .set({ passwordHash: input.passwordHash })
      .where(eq(users.id, input.userId));
    await tx.delete(sessions).where(eq(sessions.userId, input.userId));
  });
  forgetCheckedSessionsAndRoles();
}

/** What a reset link's page shows before the form: usable, or why not. */
export async function getPasswordResetStatus(input: {
  tokenHash: string;
  now?: Date;
}): Promise<"ok" | "invalid" | "expired" | "used"> {
  const db = await getDb();
  const [row] = await db
    .select({ expiresAt: passwordResetTokens.expiresAt, usedAt: passwordResetTokens.usedAt })
    .from(passwordResetTokens)
    .where(eq(passwordResetTokens.tokenHash, input.tokenHash))
    .limit(1);
  if (!row) return "invalid";
  if (row.usedAt) return "used";
  return row.expiresAt.getTime() <= (input.now ?? new Date()).getTime() ? "expired" : "ok";
}

/** Whose password a reset link would set (for refusing their own e-mail or name). */
export async function getResetAccount(input: {
  tokenHash: string;
}): Promise<{ email: string; name: string } | null> {
  const db = await getDb();
  const [row] = await db
    .select({ email: users.email, name: users.name })
    .from(passwordResetTokens)
    .innerJoin(users, eq(users.id, passwordResetTokens.userId))
    .where(eq(passwordResetTokens.tokenHash, input.tokenHash))
    .limit(1);
  return row ?? null;
}
