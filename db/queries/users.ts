import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db";
import { users } from "@/db/schema";

// Public shape of a user: never carries the password hash.
export type UserDto = { id: string; email: string; name: string };

const publicColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
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

/** Makes an account; null when the address already has one. */
export async function createUser(input: {
  email: string;
  name: string;
  passwordHash: string;
}): Promise<UserDto | null> {
  const db = await getDb();
  const [row] = await db
    .insert(users)
    .values({ ...input, email: normalizeEmail(input.email) })
    .onConflictDoNothing({ target: users.email })
    .returning(publicColumns);
  // null: the address already has an account (the caller must not say so).
  return row ?? null;
}
