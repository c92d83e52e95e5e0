import "server-only";
import { and, asc, count, eq } from "drizzle-orm";
import { getDb, type Db } from "@/db";
import { gardens, memberships, users } from "@/db/schema";
import type { Role } from "@/lib/auth/roles";
import { forgetCheckedSessionsAndRoles } from "@/lib/auth/gate-cache";

export type MembershipDto = { gardenId: string; userId: string; role: Role };

export async function getMembership({
  gardenId,
  userId,
}: {
  gardenId: string;
  userId: string;
}): Promise<MembershipDto | null> {
  const db = await getDb();
  const [row] = await db
    .select({ gardenId: memberships.gardenId, userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.gardenId, gardenId), eq(memberships.userId, userId)))
    .limit(1);
  return row ?? null;
}

export async function listGardensForUser({ userId }: { userId: string }) {
  const db = await getDb();
  return db
    .select({ id: gardens.id, name: gardens.name, role: memberships.role })
    .from(memberships)
    .innerJoin(gardens, eq(gardens.id, memberships.gardenId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(gardens.name));
}

export async function listMembers({ gardenId }: { gardenId: string }) {
  const db = await getDb();
  return db
    .select({
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      since: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.gardenId, gardenId))
    .orderBy(asc(users.name));
}

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

export async function countOwners(tx: Tx, gardenId: string): Promise<number> {
  const [row] = await tx
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.gardenId, gardenId), eq(memberships.role, "owner")));
  return row?.n ?? 0;
}

export type MemberChangeOutcome = { ok: true } | { ok: false; reason: "not_member" | "last_owner" };

/**
 * Role changes and removals run in one transaction that locks the garden's
 * memberships, so two owners demoting each other at once cannot leave the
 * garden with none.
 */
export async function changeMemberRole(input: {
  gardenId: string;
  userId: string;
  role: Role;
}): Promise<MemberChangeOutcome> {
  const db = await getDb();
  const outcome = await db.transaction(async (tx): Promise<MemberChangeOutcome> => {
    const rows = await lockMemberships(tx, input.gardenId);
    const target = rows.find((r) => r.userId === input.userId);
    if (!target) return { ok: false, reason: "not_member" } as const;
    const owners = rows.filter((r) => r.role === "owner").length;
    if (target.role === "owner" && input.role !== "owner" && owners <= 1)
      return { ok: false, reason: "last_owner" } as const;
    await tx
      .update(memberships)
      .set({ role: input.role })
      .where(and(eq(memberships.gardenId, input.gardenId), eq(memberships.userId, input.userId)));
    return { ok: true } as const;
  });
  forgetCheckedSessionsAndRoles(); // after commit: the next request reads the new role
  return outcome;
}

export async function removeMember(input: {
  gardenId: string;
  userId: string;
}): Promise<MemberChangeOutcome> {
  const db = await getDb();
  const outcome = await db.transaction(async (tx): Promise<MemberChangeOutcome> => {
    const rows = await lockMemberships(tx, input.gardenId);
    const target = rows.find((r) => r.userId === input.userId);
    if (!target) return { ok: false, reason: "not_member" } as const;
    const owners = rows.filter((r) => r.role === "owner").length;
    if (target.role === "owner" && owners <= 1) return { ok: false, reason: "last_owner" } as const;
    await tx
      .delete(memberships)
      .where(and(eq(memberships.gardenId, input.gardenId), eq(memberships.userId, input.userId)));
    return { ok: true } as const;
  });
  forgetCheckedSessionsAndRoles(); // after commit: the next request reads the new role
  return outcome;
}

async function lockMemberships(tx: Tx, gardenId: string) {
  return tx
    .select({ userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.gardenId, gardenId))
    .for("update");
}
