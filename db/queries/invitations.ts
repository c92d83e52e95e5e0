import "server-only";
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { gardens, invitations, memberships, users } from "@/db/schema";
import type { Role } from "@/lib/auth/roles";
import { roleAtLeast } from "@/lib/auth/roles";
import { forgetCheckedSessionsAndRoles } from "@/lib/auth/gate-cache";

export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

const invitationColumns = {
  id: invitations.id,
  gardenId: invitations.gardenId,
  email: invitations.email,
  role: invitations.role,
  expiresAt: invitations.expiresAt,
  acceptedAt: invitations.acceptedAt,
  revokedAt: invitations.revokedAt,
  mailStatus: invitations.mailStatus,
  createdAt: invitations.createdAt,
};

export type InvitationDto = {
  id: string;
  gardenId: string;
  email: string;
  role: Role;
  expiresAt: Date;
  acceptedAt: Date | null;
  revokedAt: Date | null;
  mailStatus: "pending" | "sent" | "failed";
  createdAt: Date;
};

export async function createInvitation(input: {
  gardenId: string;
  email: string;
  role: Role;
  tokenHash: string;
  invitedBy: string;
  now?: Date;
}): Promise<InvitationDto> {
  const db = await getDb();
  const now = input.now ?? new Date();
  const [row] = await db
    .insert(invitations)
    .values({
      gardenId: input.gardenId,
      email: input.email.trim().toLowerCase(),
      role: input.role,
      tokenHash: input.tokenHash,
      invitedBy: input.invitedBy,
      expiresAt: new Date(now.getTime() + INVITATION_TTL_MS),
    })
    .returning(invitationColumns);
  return row!;
}

export async function listOpenInvitations({
  gardenId,
}: {
  gardenId: string;
}): Promise<InvitationDto[]> {
  const db = await getDb();
  return db
    .select(invitationColumns)
    .from(invitations)
    .where(
      and(
        eq(invitations.gardenId, gardenId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .orderBy(desc(invitations.createdAt))
    .limit(200);
}

/**
 * Who an address already is in this garden, if anyone: a member, or someone with an
 * invitation still open (not accepted, not withdrawn; an expired one counts too, since
 * "Resend" renews it). Addresses are stored trimmed and lower-cased.
 */
export async function findInviteeStanding({
  gardenId,
  email,
}: {
  gardenId: string;
  email: string;
}): Promise<{ member: true } | { invitationId: string } | null> {
  const db = await getDb();
  const address = email.trim().toLowerCase();
  const [member] = await db
    .select({ userId: memberships.userId })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.gardenId, gardenId), eq(sql`lower(${users.email})`, address)))
    .limit(1);
  if (member) return { member: true };
  const [open] = await db
    .select({ id: invitations.id })
    .from(invitations)
    .where(
      and(
        eq(invitations.gardenId, gardenId),
        eq(invitations.email, address),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .orderBy(desc(invitations.createdAt))
    .limit(1);
  return open ? { invitationId: open.id } : null;
}

export async function getInvitation({
  gardenId,
  invitationId,
}: {
  gardenId: string;
  invitationId: string;
}) {
  const db = await getDb();
  const [row] = await db
    .select(invitationColumns)
    .from(invitations)
    .where(and(eq(invitations.gardenId, gardenId), eq(invitations.id, invitationId)))
    .limit(1);
  return row ?? null;
}

/** A resend gets a fresh token and a fresh 7 days; the old link stops working. */
export async function renewInvitationToken(input: {
  invitationId: string;
  tokenHash: string;
  now?: Date;
}) {
  const db = await getDb();
  const now = input.now ?? new Date();
  await db
    .update(invitations)
    .set({
      tokenHash: input.tokenHash,
      expiresAt: new Date(now.getTime() + INVITATION_TTL_MS),
      mailStatus: "pending",
    })
    .where(eq(invitations.id, input.invitationId));
}

export async function setInvitationMailStatus(input: {
  invitationId: string;
  status: "sent" | "failed";
}) {
  const db = await getDb();
  await db
    .update(invitations)
    .set({ mailStatus: input.status })
    .where(eq(invitations.id, input.invitationId));
}

export async function revokeInvitation({
  gardenId,
  invitationId,
}: {
  gardenId: string;
  invitationId: string;
}) {
  const db = await getDb();
  const rows = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(invitations.gardenId, gardenId),
        eq(invitations.id, invitationId),
        isNull(invitations.acceptedAt),
      ),
    )
    .returning({ id: invitations.id });
  return rows.length > 0;
}

/** What an invitation link shows before it is accepted. */
export async function getInvitationPreview({ tokenHash }: { tokenHash: string }) {
  const db = await getDb();
  const [row] = await db
    .select({ ...invitationColumns, gardenName: gardens.name })
    .from(invitations)
    .innerJoin(gardens, eq(gardens.id, invitations.gardenId))
    .where(eq(invitations.tokenHash, tokenHash))
    .limit(1);
  return row ?? null;
}

export type AcceptOutcome =
  | { ok: true; gardenId: string; role: Role }
  | {
      ok: false;
      reason: "invalid" | "expired" | "used" | "revoked" | "wrong_account";
      invitedEmail?: string;
    };

/**
 * Single use, inside one transaction: the row is locked, checked, marked used
 * and the membership written together. Only the invited address may accept.
 * An existing member keeps the higher of their current role and the invited one.
 */
export async function acceptInvitation(input: {
  tokenHash: string;
  userId: string;
  userEmail: string;
  now?: Date;
}): Promise<AcceptOutcome> {
  const db = await getDb();
  const now = input.now ?? new Date();
  const outcome = await db.transaction(async (tx): Promise<AcceptOutcome> => {
    const [inv] = await tx
      .select(invitationColumns)
      .from(invitations)
      .where(eq(invitations.tokenHash, input.tokenHash))
      .for("update")
      .limit(1);
    if (!inv) return { ok: false, reason: "invalid" } as const;
    if (inv.revokedAt) return { ok: false, reason: "revoked" } as const;
    if (inv.acceptedAt) return { ok: false, reason: "used" } as const;
    if (inv.expiresAt.getTime() <= now.getTime()) return { ok: false, reason: "expired" } as const;
    // A forwarded or leaked link must not let another account join (least of all as owner).
    if (inv.email !== input.userEmail.trim().toLowerCase()) {
      return { ok: false, reason: "wrong_account", invitedEmail: inv.email } as const;
    }

    const [current] = await tx
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.gardenId, inv.gardenId), eq(memberships.userId, input.userId)));
    let role: Role = inv.role;
    if (current) {
      role = roleAtLeast(current.role, inv.role) ? current.role : inv.role;
      await tx
        .update(memberships)
        .set({ role })
        .where(and(eq(memberships.gardenId, inv.gardenId), eq(memberships.userId, input.userId)));
    } else {
      await tx.insert(memberships).values({ gardenId: inv.gardenId, userId: input.userId, role });
    }
    await tx
      .update(invitations)
      .set({ acceptedAt: now, acceptedBy: input.userId })
      .where(eq(invitations.id, inv.id));
    return { ok: true, gardenId: inv.gardenId, role };
  });
  forgetCheckedSessionsAndRoles(); // a role may have changed
  return outcome;
}
