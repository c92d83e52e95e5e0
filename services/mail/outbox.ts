import { startFakeSmtpServer, type FakeSmtpServer } from "./fake-smtp-server";
import type { ReceivedMail } from "./types";

// Next's dev server re-evaluates modules on every hot reload, so a module-level variable would
// be lost and a second server would try the same port. globalThis survives those reloads.
const REGISTRY_KEY = Symbol.for("castline.mail.localSmtpServer");

type Registry = { port: number; server: Promise<FakeSmtpServer> };
type GlobalWithRegistry = typeof globalThis & { [REGISTRY_KEY]?: Registry };

const holder = globalThis as GlobalWithRegistry;

/**
 * Starts the local fake SMTP server once per process and returns it. Later calls return the
 * same server (the promise is stored before it settles, so concurrent callers share one start).
 * Asking for a different port while one runs is an error rather than a silent second server.
 */
export function ensureLocalSmtpServer(port: number): Promise<FakeSmtpServer> {
  const existing = holder[REGISTRY_KEY];
  if (existing) {
    if (port !== 0 && existing.port !== 0 && existing.port !== port) {
      return Promise.reject(
        new Error(`Local SMTP server already runs on port ${existing.port}, not ${port}`),
      );
    }
    return existing.server;
  }
  const entry: Registry = { port, server: startFakeSmtpServer({ port }) };
  holder[REGISTRY_KEY] = entry;
  entry.server.then(
    (server) => {
      entry.port = server.port;
    },
    () => {
      // A failed start (port taken) must not block a later retry.
      if (holder[REGISTRY_KEY] === entry) delete holder[REGISTRY_KEY];
    },
  );
  return entry.server;
}

/** The running local server, or null when none has been started (or it is still starting). */
async function currentServer(): Promise<FakeSmtpServer | null> {
  const entry = holder[REGISTRY_KEY];
  if (!entry) return null;
  try {
    return await entry.server;
  } catch {
    return null;
  }
}

/** Messages held by the local fake SMTP server, newest first; null when it is not running. */
export async function getLocalOutbox(): Promise<ReceivedMail[] | null> {
  const server = await currentServer();
  return server ? server.messages() : null;
}

export async function clearLocalOutbox(): Promise<void> {
  const server = await currentServer();
  server?.clear();
}

export async function stopLocalSmtpServer(): Promise<void> {
  const entry = holder[REGISTRY_KEY];
  if (!entry) return;
  delete holder[REGISTRY_KEY];
  const server = await entry.server.catch(() => null);
  await server?.stop();
}
