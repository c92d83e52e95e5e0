import { getPasswordHash, getUserById } from "@/db/queries/users";
import { setPassword } from "@/db/queries/password-resets";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { issueSessionCookie, requireUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { parseJson, route, refuseOtherMethods } from "@/lib/http";
import { changePasswordSchema } from "@/lib/validation/auth";

// Change password: ends every other session, keeps this one with a fresh token.
export const POST = route(async (request) => {
  const user = await requireUser(request);
  const input = await parseJson(request, changePasswordSchema);
  const current = await getPasswordHash({ userId: user.id });
  if (!current || !(await verifyPassword(current, input.currentPassword))) {
    throw new AppError("validation:password", "Your current password is not right.", {
      currentPassword: "That is not your current password.",
    });
  }
  await setPassword({ userId: user.id, passwordHash: await hashPassword(input.newPassword) });
  const fresh = await getUserById({ userId: user.id });
  return Response.json(
    { ok: true },
    { headers: { "Set-Cookie": await issueSessionCookie(fresh!) } },
  );
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
