import "server-only";
import { getDbKind } from "@/db";
import type { UserDto } from "@/db/queries/users";
import type { Role } from "./roles";

// A short-lived memory of what the auth gate has just checked: which session cookie
// belongs to which live session, and which role a user holds in a garden. On the
// single-threaded embedded database the three steps of the gate (decrypting the
// Auth.js cookie, the `sessions` allow-list query, the membership query) cost a
// signed-in read several times what the work behind it does (issue 9, "Speed").
//
// It must never let a revoked session or a removed member through, so:
// - only positive answers are kept (a refusal is always asked again);
// - every write that ends a session or changes a membership calls
//   forgetCheckedSessionsAndRoles() after it commits, which empties both maps at once
//   (sign-out, "sign out everywhere", password change or reset, role change, removal,
//   invitation accepted, garden deleted): the very next request asks the database;
// - a check that started before such a write cannot store its (old) answer: each
//   store carries the generation read before the query, and a forget bumps it;
// - entries also lapse after TTL_MS and never outlive the session's own expiry.
// Only with PGlite: exactly one process owns that database (db/lock.ts), so every
// write passes through this process. With DATABASE_URL several instances may share
// one PostgreSQL and a write on one would not clear another's memory: no caching there.
//
// On globalThis, like the database client and the plan cache: Next bundles each route
// handler and page separately, and a module-level Map would be one per bundle, so a
// sign-out handled by one bundle would not clear another's entries.

const TTL_MS = 30_000;
const MAX_ENTRIES = 10_000;

interface Entry<T> {
  value: T;
  until: number;
}

interface GateCache {
  generation: number;
  sessions: Map<string, Entry<UserDto>>;
  roles: Map<string, Entry<Role>>;
}

const cacheKey = Symbol.for("castline.authGateCache");
const g = globalThis as typeof globalThis & { [cacheKey]?: GateCache };
const cache = (g[cacheKey] ??= { generation: 0, sessions: new Map(), roles: new Map() });

/** Read before the database check; pass it to remember…() so a forget in between wins. */
export function gateGeneration(): number {
  return cache.generation;
}

/** Call after any committed write that ends a session or changes or removes a membership. */
export function forgetCheckedSessionsAndRoles(): void {
  cache.generation += 1;
  cache.sessions.clear();
  cache.roles.clear();
}

function read<T>(map: Map<string, Entry<T>>, key: string): T | null {
  const hit = map.get(key);
  if (!hit) return null;
  if (hit.until > Date.now()) return hit.value;
  map.delete(key);
  return null;
}

async function store<T>(
  map: Map<string, Entry<T>>,
  key: string,
  value: T,
  generation: number,
  expiresAt: number,
): Promise<void> {
  if ((await getDbKind()) !== "pglite") return;
  if (generation !== cache.generation) return; // a revocation landed while we checked
  if (map.size >= MAX_ENTRIES) map.clear();
  map.set(key, { value, until: Math.min(Date.now() + TTL_MS, expiresAt) });
}

export function recallSessionUser(token: string): UserDto | null {
  return read(cache.sessions, token);
}

export function rememberSessionUser(
  token: string,
  user: UserDto,
  { generation, expiresAt }: { generation: number; expiresAt: number },
): Promise<void> {
  return store(cache.sessions, token, user, generation, expiresAt);
}

const roleKey = (userId: string, gardenId: string) => `${userId}/${gardenId}`;

export function recallRole(userId: string, gardenId: string): Role | null {
  return read(cache.roles, roleKey(userId, gardenId));
}

export function rememberRole(
  userId: string,
  gardenId: string,
  role: Role,
  generation: number,
): Promise<void> {
  return store(cache.roles, roleKey(userId, gardenId), role, generation, Infinity);
}
