import "server-only";
import crypto from "node:crypto";
import { decode, encode } from "next-auth/jwt";
import {
  createSession,
  deleteSession,
  deleteUserSessions,
  getLiveSession,
} from "@/db/queries/sessions";
import type { UserDto } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import { readCookie, SESSION_COOKIE, SESSION_MAX_AGE_SECONDS, serializeCookie } from "./cookies";
import { gateGeneration, recallSessionUser, rememberSessionUser } from "./gate-cache";
import { getAuthSecret } from "./secret";

// Sessions are an allow-list on the server. The cookie is an Auth.js JWT (encrypted,
// HttpOnly) carrying who you are and a random session id (`sid`) — never a role. A
// session is valid only while its row exists in `sessions`, so signing out, changing
// the password or "sign out everywhere" deletes the row and the cookie is dead for good,
// whatever copy of it is left anywhere.

interface SessionClaims {
  sub: string;
  sid: string;
  /** The cookie's own expiry (JWT `exp`), in ms since the epoch. */
  expiresAt: number;
}

export async function issueSessionCookie(user: UserDto): Promise<string> {
  const sessionId = crypto.randomBytes(32).toString("base64url");
  await createSession({
    sessionId,
    userId: user.id,
    expiresAt: new Date(Date.now() + SESSION_MAX_AGE_SECONDS * 1000),
  });
  const token = await encode({
    token: { sub: user.id, sid: sessionId },
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
    if (!payload || typeof payload.sub !== "string" || typeof payload.sid !== "string") return null;
    const expiresAt = typeof payload.exp === "number" ? payload.exp * 1000 : Infinity;
    return { sub: payload.sub, sid: payload.sid, expiresAt };
  } catch {
    return null;
  }
}

/** The signed-in user for a cookie value, or null if signed out, expired or ended. */
export async function userFromSessionToken(token: string | undefined): Promise<UserDto | null> {
  if (!token) return null;
  // A cookie checked moments ago, whose session nothing has ended since (lib/auth/gate-cache.ts).
  const recalled = recallSessionUser(token);
  if (recalled) return recalled;
  const generation = gateGeneration();
  const claims = await claimsFrom(token);
  if (!claims) return null;
  const live = await getLiveSession({ sessionId: claims.sid, userId: claims.sub });
  if (!live) return null;
  const expiresAt = Math.min(claims.expiresAt, live.expiresAt.getTime());
  await rememberSessionUser(token, live.user, { generation, expiresAt });
  return live.user;
}

export function sessionTokenFromRequest(request: Request): string | undefined {
  return readCookie(request.headers.get("cookie"), SESSION_COOKIE);
}

export async function getRequestUser(request: Request): Promise<UserDto | null> {
  return userFromSessionToken(sessionTokenFromRequest(request));
}

/** Ends the session this request carries, on the server as well as in the browser (ASVS 7.4.1). */
export async function endRequestSession(request: Request): Promise<void> {
  const claims = await claimsFrom(sessionTokenFromRequest(request));
  if (claims) await deleteSession({ sessionId: claims.sid });
}

/** Ends every session of the user, this one included (ASVS 7.4.5). */
export async function endAllSessions(userId: string): Promise<void> {
  await deleteUserSessions({ userId });
}

export async function requireUser(request: Request): Promise<UserDto> {
  const user = await getRequestUser(request);
  if (!user) throw new AppError("unauthorized");
  return user;
}
