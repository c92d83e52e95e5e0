import { consumePasswordReset, getResetAccount } from "@/db/queries/password-resets";
import { hashPassword } from "@/lib/auth/password";
import { hashLinkToken } from "@/lib/auth/tokens";
import { AppError } from "@/lib/errors";
import { parseJson, route, refuseOtherMethods } from "@/lib/http";
import { resetProblems } from "@/lib/messages";
import { confirmResetSchema } from "@/lib/validation/auth";
import { accountPasswordProblem } from "@/lib/validation/password";

export const POST = route(async (request) => {
  const input = await parseJson(request, confirmResetSchema);
  const tokenHash = hashLinkToken(input.token);
  const account = await getResetAccount({ tokenHash });
  const problem = account ? accountPasswordProblem(input.newPassword, account) : null;
  if (problem) throw new AppError("validation:password", problem, { newPassword: problem });
  const outcome = await consumePasswordReset({
    tokenHash,
    newPasswordHash: await hashPassword(input.newPassword),
  });
  if (!outcome.ok)
    throw new AppError(`gone:reset_${outcome.reason}`, resetProblems[outcome.reason]);
  return Response.json({
    ok: true,
    message: "Your password is changed. Sign in with the new one.",
  });
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods({ POST });
