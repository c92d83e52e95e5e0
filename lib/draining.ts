// Graceful stop, shared by every route bundle (Next bundles each route
// separately, so the state lives on globalThis like the database client).
// On SIGTERM, services/startup.ts calls beginDraining(): new API requests get a
// 503 before they touch anything, and it waits for the ones already inside a
// handler to finish before closing the database.

interface DrainState {
  inFlight: number;
  draining: boolean;
  idle: Set<() => void>;
}

const key = Symbol.for("castline.draining");
type GlobalWithDrain = typeof globalThis & { [key]?: DrainState };

function state(): DrainState {
  const g = globalThis as GlobalWithDrain;
  g[key] ??= { inFlight: 0, draining: false, idle: new Set() };
  return g[key];
}

/** Counts a request in; returns its "done" callback, or null when the server is stopping. */
export function enterRequest(): (() => void) | null {
  const s = state();
  if (s.draining) return null;
  s.inFlight += 1;
  let left = false;
  return () => {
    if (left) return;
    left = true;
    s.inFlight -= 1;
    if (s.inFlight === 0) for (const wake of s.idle) wake();
  };
}

export function isDraining(): boolean {
  return state().draining;
}

/**
 * Stops admitting requests and resolves once none is in flight, or after
 * `timeoutMs` (a handler stuck on a dead mail server must not hold the stop forever).
 * Resolves to the number still running when it gave up.
 */
export function beginDraining(timeoutMs: number): Promise<number> {
  const s = state();
  s.draining = true;
  if (s.inFlight === 0) return Promise.resolve(0);
  return new Promise((resolve) => {
    const finish = () => {
      clearTimeout(timer);
      s.idle.delete(finish);
      resolve(s.inFlight);
    };
    const timer = setTimeout(finish, timeoutMs);
    s.idle.add(finish);
  });
}
