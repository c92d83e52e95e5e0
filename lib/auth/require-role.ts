import "server-only";
import { z } from "zod";
import { getMembership } from "@/db/queries/memberships";
import type { UserDto } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { gateGeneration, recallRole, rememberRole } from "./gate-cache";
import { roleAtLeast, type Role } from "./roles";
import { requireUser } from "./session";

export const gardenIdSchema = z.uuid();

export interface Member {
  user: UserDto;
  gardenId: string;
  role: Role;
}

/**
 * The one gate for garden data. Signed out → 401. Not a member (or a garden
 * that does not exist) → 404, so ids of other people's gardens reveal nothing.
 * A member below the needed role → 403. Role is read from the database (or its
 * memory of a moment ago, cleared by every membership write), never from the token.
 */
export async function requireRole(
  request: Request,
  gardenId: string,
  minimum: Role,
): Promise<Member> {
  const user = await requireUser(request);
  return requireMembership(user, gardenId, minimum);
}

export async function requireMembership(
  user: UserDto,
  gardenId: string,
  minimum: Role,
): Promise<Member> {
  if (!gardenIdSchema.safeParse(gardenId).success) throw new AppError("not_found:garden");
  const role = await roleInGarden(user.id, gardenId);
  if (!role) throw new AppError("not_found:garden");
  if (!roleAtLeast(role, minimum)) throw new AppError("forbidden:role");
  return { user, gardenId, role };
}

/** From the database, or from the gate's memory of a moment ago (lib/auth/gate-cache.ts). */
async function roleInGarden(userId: string, gardenId: string): Promise<Role | null> {
  const recalled = recallRole(userId, gardenId);
  if (recalled) return recalled;
  const generation = gateGeneration();
  const membership = await getMembership({ gardenId, userId });
  if (!membership) return null;
  await rememberRole(userId, gardenId, membership.role, generation);
  return membership.role;
}
