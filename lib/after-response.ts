import { logError } from "@/lib/log";
// Work that must not make a response slower or faster depending on what it finds, such
// as the mail after a password-reset request (whether the address has an account would
// otherwise show in the response time). It starts after the current turn of the event
// loop, never throws into the request, and is logged when it fails. The server is a
// long-running Node process, so the promise runs to completion after the response.

const pending = new Set<Promise<void>>();

export function afterResponse(label: string, task: () => Promise<unknown>): void {
  const run: Promise<void> = new Promise<void>((resolve) => setImmediate(resolve))
    .then(task)
    .then(
      () => undefined,
      (error: unknown) => logError(`${label} failed`, error),
    )
    .finally(() => pending.delete(run));
  pending.add(run);
}

/** Resolves once all work started so far has finished (for shutdown and tests). */
export async function settleAfterResponseWork(): Promise<void> {
  while (pending.size > 0) await Promise.allSettled([...pending]);
}
