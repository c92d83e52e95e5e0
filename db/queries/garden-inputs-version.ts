import "server-only";

// The per-garden inputs version: a counter that every write changing what the
// engine plans from (bins, beds, plantings, rules, lots, logs, garden settings)
// bumps, so cached plans (db/queries/garden-plan.ts) keyed by it go stale at once.
//
// Rules for writers (see DEVELOPERS.md, "Cached plans"):
// - call markGardenInputsChanged(gardenId) AFTER the transaction commits. Bumping
//   inside it lets a concurrent reader see the new version, read the old rows and
//   cache the old plan under the new version.
// - functions that take the caller's `tx` do not bump; their committing caller does.
//
// Kept in memory: exactly one server process owns the database (db/lock.ts). With
// DATABASE_URL and several app instances each instance would only see its own
// writes; the plan cache's time limit bounds how stale another instance can be.

// On globalThis, like the database client (db/index.ts): Next bundles each route
// handler and page separately, so a module-level Map would be one per bundle and a
// bump made by a route handler would never reach a page's cached plan.
const stateKey = Symbol.for("castline.gardenInputsVersions");
type VersionState = {
  versions: Map<string, number>;
  listeners: Set<(gardenId: string) => void>;
};
const g = globalThis as typeof globalThis & { [stateKey]?: VersionState };
const state = (g[stateKey] ??= { versions: new Map(), listeners: new Set() });
const { versions, listeners } = state;

export function gardenInputsVersion(gardenId: string): number {
  return versions.get(gardenId) ?? 0;
}

/** Call after any committed write that changes a garden's plan inputs. */
export function markGardenInputsChanged(gardenId: string): void {
  versions.set(gardenId, gardenInputsVersion(gardenId) + 1);
  for (const listener of listeners) listener(gardenId);
}

/** For caches: hear about a bump (to drop that garden's entries early). */
export function onGardenInputsChanged(listener: (gardenId: string) => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
