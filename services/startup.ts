import { settleAfterResponseWork } from "@/lib/after-response";
import { closeDb, getDb } from "@/db";
import { DataDirLockedError, releaseDataDirLock } from "@/db/lock";
import { seedDemoGarden } from "@/db/seed/seed-demo";
import { ensureStarterCrops } from "@/db/seed/starter-crops";
import { beginDraining } from "@/lib/draining";
import { getEnv } from "@/lib/env";
import { logError } from "@/lib/log";
import { startLocalMailIfNeeded } from "@/services/mailer";
import { getStorage } from "@/services/storage";

// Runs once when the Next server process starts (instrumentation.ts): opens the
// database (which takes the data-directory lock and applies migrations), loads
// the starter crops and, in demo mode, the demo garden.

let started = false;

export async function startServer(): Promise<void> {
  if (started) return;
  started = true;
  try {
    const env = getEnv();
    const db = await getDb();
    await ensureStarterCrops(db);
    if (env.CASTLINE_DEMO) {
      const { created } = await seedDemoGarden(db);
      console.log(
        created ? "[castline] demo garden loaded" : "[castline] demo garden already present",
      );
    }
    await startLocalMailIfNeeded();
    // Opens photo storage now: the local fake S3 starts with the app, and a bad S3_* setting stops the start.
    await getStorage();
    installShutdownHandlers();
  } catch (error) {
    // If register() throws, `next start` keeps serving 500s; a refused start must really stop.
    if (error instanceof DataDirLockedError) console.error(`[castline] ${error.message}`);
    else logError("start-up failed", error);
    process.exit(1);
  }
}

// How long a stop waits for requests already inside a handler (a slow mail
// server is the usual reason one takes long), and then for Next to write their
// answers to the socket before the process exits.
const DRAIN_TIMEOUT_MS = 10_000;
const FLUSH_MS = 300;

function installShutdownHandlers(): void {
  let closing = false;
  const shutdown = (signal: NodeJS.Signals) => {
    if (closing) return;
    closing = true;
    console.log(`[castline] ${signal}: finishing requests in flight`);
    // New API requests now get a 503 before touching anything; the ones inside a
    // handler finish and are answered, so no write is saved without its reply.
    beginDraining(DRAIN_TIMEOUT_MS)
      .then(async (stillRunning) => {
        if (stillRunning)
          console.warn(
            `[castline] ${stillRunning} request(s) cut off after ${DRAIN_TIMEOUT_MS / 1000} s`,
          );
        await new Promise((resolve) => setTimeout(resolve, FLUSH_MS));
        // Mail queued after a response (password resets, welcomes) goes out before we close.
        await settleAfterResponseWork();
        console.log(`[castline] ${signal}: closing the database`);
        // PGlite runs one query at a time, so close() waits for the one in flight.
        await closeDb();
      })
      .catch((error) => logError("close failed", error))
      .finally(() => process.exit(0));
  };
  // The start scripts set NEXT_MANUAL_SIG_HANDLE so Next leaves these signals
  // to us; otherwise its own handler exits before PGlite has closed.
  process.once("SIGTERM", shutdown);
  process.once("SIGINT", shutdown);
  // Whatever the way out, do not leave our lock behind for the next start to judge.
  process.once("exit", () => releaseDataDirLock(getEnv().PGLITE_DIR));
}
