import { createUser, EmailTakenError } from "@/db/queries/users";
import { hashPassword } from "@/lib/auth/password";
import { issueSessionCookie, requireUser } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { parseJson, route, refuseOtherMethods } from "@/lib/http";
import { signUpSchema } from "@/lib/validation/auth";

export const GET = route(async (request) => {
  const user = await requireUser(request);
  return Response.json({ user: { id: user.id, name: user.name, email: user.email } });
});

// Sign up, then signed in straight away.
export const POST = route(async (request) => {
  const input = await parseJson(request, signUpSchema);
  const passwordHash = await hashPassword(input.password);
  try {
    const user = await createUser({ email: input.email, name: input.name, passwordHash });
    return Response.json(
      { user: { id: user.id, name: user.name, email: user.email } },
      { status: 201, headers: { "Set-Cookie": await issueSessionCookie(user) } },
    );
  } catch (error) {
    if (error instanceof EmailTakenError) {
      throw new AppError(
        "conflict:email",
        "An account with that e-mail already exists. Sign in, or reset its password.",
        {
          email: "An account with that e-mail already exists.",
        },
      );
    }
    throw error;
  }
});

// Any other method: a JSON 405 with an Allow header, not Next's empty one.
export const { PUT, PATCH, DELETE } = refuseOtherMethods({ GET, POST });
