import "server-only";
import NextAuth, { CredentialsSignin } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { z } from "zod";
import { AppError } from "@/lib/errors";
import { authConfig } from "./auth.config";
import { verifyCredentials } from "./credentials";
import { getAuthSecret } from "./secret";
import { clientAddress } from "./throttle";

const credentialsSchema = z.object({ email: z.email(), password: z.string().min(1).max(1024) });

class ThrottledSignIn extends CredentialsSignin {
  code = "rate_limited";
}

// The Auth.js endpoints (/api/auth/*) use the same credential check, throttle
// and cookie as our own /api/session route, so either way in is equally guarded.
export const { handlers, auth, signOut } = NextAuth({
  ...authConfig,
  secret: getAuthSecret(),
  providers: [
    Credentials({
      credentials: { email: {}, password: {} },
      async authorize(raw, request) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) return null;
        try {
          const user = await verifyCredentials(
            parsed.data.email,
            parsed.data.password,
            clientAddress(request),
          );
          return {
            id: user.id,
            email: user.email,
            name: user.name,
            sessionVersion: user.sessionVersion,
          };
        } catch (error) {
          if (error instanceof AppError && error.kind === "rate_limited")
            throw new ThrottledSignIn();
          return null;
        }
      },
    }),
  ],
});
