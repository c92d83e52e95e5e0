import { z } from "zod";
import { changeMemberRole, removeMember, type MemberChangeOutcome } from "@/db/queries/memberships";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import { parseJson, parseParams, route, refuseOtherMethods } from "@/lib/http";
import { changeRoleSchema } from "@/lib/validation/garden";

const paramsSchema = z.object({ gardenId: z.uuid(), userId: z.uuid() });
type Params = z.infer<typeof paramsSchema>;

function assertChanged(outcome: MemberChangeOutcome): void {
  if (outcome.ok) return;
  if (outcome.reason === "not_member") throw new AppError("not_found:member");
  throw new AppError(
    "conflict:last_owner",
    "A garden needs at least one owner. Make someone else an owner first.",
  );
}

// Owners change roles.
export const PATCH = route<Params>(async (request, { params }) => {
  const { gardenId, userId } = await parseParams(request, params, paramsSchema);
  await requireRole(request, gardenId, "owner");
  const { role } = await parseJson(request, changeRoleSchema);
  assertChanged(await changeMemberRole({ gardenId, userId, role }));
  return Response.json({ ok: true, role });
});

// Owners remove anyone; any member may remove themselves (leave).
export const DELETE = route<Params>(async (request, { params }) => {
  const { gardenId, userId } = await parseParams(request, params, paramsSchema);
  const member = await requireRole(request, gardenId, "viewer");
  if (member.user.id !== userId && member.role !== "owner") throw new AppError("forbidden:role");
  assertChanged(await removeMember({ gardenId, userId }));
  return Response.json({ ok: true });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, POST, PUT } = refuseOtherMethods({ PATCH, DELETE });
