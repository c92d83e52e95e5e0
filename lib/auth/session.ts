import "server-only";
import { decode, encode } from "next-auth/jwt";
import { endSession, isSessionEnded } from "@/db/queries/sessions";
import { getUserById, type UserDto } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { readCookie, SESSION_COOKIE, SESSION_MAX_AGE_SECONDS, serializeCookie } from "./cookies";
import { getAuthSecret } from "./secret";

// Sessions are Auth.js JWTs (encrypted, in one HttpOnly cookie). They carry who
// you are and the session version they were issued under — never a role: every
// request re-reads membership from the database.

interface SessionClaims {
  sub: string;
  sv: number;
  jti?: string;
  exp?: number;
}

export async function issueSessionCookie(user: UserDto): Promise<string> {
  const token = await encode({
    token: { sub: user.id, email: user.email, name: user.name, sv: user.sessionVersion },
    secret: getAuthSecret(),
    salt: SESSION_COOKIE,
    maxAge: SESSION_MAX_AGE_SECONDS,
  });
  return serializeCookie(SESSION_COOKIE, token, SESSION_MAX_AGE_SECONDS);
}

export function clearSessionCookie(): string {
  return serializeCookie(SESSION_COOKIE, "", 0);
}

async function claimsFrom(token: string | undefined): Promise<SessionClaims | null> {
  if (!token) return null;
  try {
    const payload = await decode({ token, secret: getAuthSecret(), salt: SESSION_COOKIE });
    if (!payload || typeof payload.sub !== "string") return null;
    return {
      sub: payload.sub,
      sv: typeof payload.sv === "number" ? payload.sv : -1,
      jti: typeof payload.jti === "string" ? payload.jti : undefined,
      exp: typeof payload.exp === "number" ? payload.exp : undefined,
    };
  } catch {
    return null;
  }
}

/** The signed-in user for a cookie value, or null if signed out, expired or revoked. */
export async function userFromSessionToken(token: string | undefined): Promise<UserDto | null> {
  const claims = await claimsFrom(token);
  if (!claims) return null;
  // Signed out on this device: the token id was recorded as ended.
  if (!claims.jti || (await isSessionEnded({ tokenId: claims.jti }))) return null;
  const user = await getUserById({ userId: claims.sub });
  // A password change or "sign out everywhere" bumped the version: this token is dead.
  if (!user || user.sessionVersion !== claims.sv) return null;
  return user;
}

export function sessionTokenFromRequest(request: Request): string | undefined {
  return readCookie(request.headers.get("cookie"), SESSION_COOKIE);
}

export async function getRequestUser(request: Request): Promise<UserDto | null> {
  return userFromSessionToken(sessionTokenFromRequest(request));
}

/** Ends the session this request carries, on the server as well as in the browser (ASVS 7.4.1). */
export async function endRequestSession(request: Request): Promise<void> {
  const token = sessionTokenFromRequest(request);
  const claims = await claimsFrom(token);
  // Nothing to end for a token that is already dead (or names a deleted user).
  if (!claims?.jti || !(await userFromSessionToken(token))) return;
  const expiresAt = new Date((claims.exp ?? Date.now() / 1000 + SESSION_MAX_AGE_SECONDS) * 1000);
  await endSession({ tokenId: claims.jti, userId: claims.sub, expiresAt });
}

export async function requireUser(request: Request): Promise<UserDto> {
  const user = await getRequestUser(request);
  if (!user) throw new AppError("unauthorized");
  return user;
}
