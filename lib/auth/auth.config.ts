import type { NextAuthConfig } from "next-auth";
import { SESSION_COOKIE, SESSION_MAX_AGE_SECONDS, sessionCookieOptions } from "./cookies";

// Edge-safe part of the Auth.js set-up (no database, no argon2), shared by
// proxy.ts and the full configuration in ./next-auth.ts.
export const authConfig = {
  trustHost: true,
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS },
  cookies: { sessionToken: { name: SESSION_COOKIE, options: sessionCookieOptions() } },
  pages: { signIn: "/sign-in" },
  providers: [],
  callbacks: {
    jwt({ token, user }) {
      // Only identity and the session version go in the token; never a role.
      if (user && "sessionVersion" in user) token.sv = user.sessionVersion;
      return token;
    },
    session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      return session;
    },
  },
} satisfies NextAuthConfig;
