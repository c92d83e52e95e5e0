import { getPasswordHash } from "@/db/queries/users";
import { setPassword } from "@/db/queries/password-resets";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { issueSessionCookie, requireUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { parseJson, route, refuseOtherMethods } from "@/lib/http";
import { changePasswordSchema } from "@/lib/validation/auth";
import { accountPasswordProblem } from "@/lib/validation/password";

// Change password: ends every session of the account; this browser gets a new one.
export const POST = route(async (request) => {
  const user = await requireUser(request);
  const input = await parseJson(request, changePasswordSchema);
  const problem = accountPasswordProblem(input.newPassword, user);
  if (problem) throw new AppError("validation:password", problem, { newPassword: problem });
  const current = await getPasswordHash({ userId: user.id });
  if (!current || !(await verifyPassword(current, input.currentPassword))) {
    throw new AppError("validation:password", "Your current password is not right.", {
      currentPassword: "That is not your current password.",
    });
  }
  // Every session ends with the old password, this one included; this browser gets a new one.
  await setPassword({ userId: user.id, passwordHash: await hashPassword(input.newPassword) });
  return Response.json({ ok: true }, { headers: { "Set-Cookie": await issueSessionCookie(user) } });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
