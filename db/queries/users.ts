import "server-only";
import { eq, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { users } from "@/db/schema";

// Public shape of a user: never carries the password hash.
export type UserDto = { id: string; email: string; name: string; sessionVersion: number };

const publicColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  sessionVersion: users.sessionVersion,
};

export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function getUserById({ userId }: { userId: string }): Promise<UserDto | null> {
  const db = await getDb();
  const [row] = await db.select(publicColumns).from(users).where(eq(users.id, userId)).limit(1);
  return row ?? null;
}

export async function getUserByEmail({ email }: { email: string }): Promise<UserDto | null> {
  const db = await getDb();
  const [row] = await db
    .select(publicColumns)
    .from(users)
    .where(eq(users.email, normalizeEmail(email)))
    .limit(1);
  return row ?? null;
}

/** Only for checking a password: the hash never leaves the auth module. */
export async function getCredentialsByEmail({ email }: { email: string }) {
  const db = await getDb();
  const [row] = await db
    .select({ ...publicColumns, passwordHash: users.passwordHash })
    .from(users)
    .where(eq(users.email, normalizeEmail(email)))
    .limit(1);
  return row ?? null;
}

export async function getPasswordHash({ userId }: { userId: string }): Promise<string | null> {
  const db = await getDb();
  const [row] = await db.select({ h: users.passwordHash }).from(users).where(eq(users.id, userId));
  return row?.h ?? null;
}

export async function createUser(input: {
  email: string;
  name: string;
  passwordHash: string;
}): Promise<UserDto> {
  const db = await getDb();
  const [row] = await db
    .insert(users)
    .values({ ...input, email: normalizeEmail(input.email) })
    .onConflictDoNothing({ target: users.email })
    .returning(publicColumns);
  if (!row) throw new EmailTakenError();
  return row;
}

export class EmailTakenError extends Error {}

/** Ends every other session: tokens carry the version they were issued with. */
export async function bumpSessionVersion({ userId }: { userId: string }): Promise<number> {
  const db = await getDb();
  const [row] = await db
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId))
    .returning({ v: users.sessionVersion });
  return row?.v ?? 0;
}
