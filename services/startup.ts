import { closeDb, getDb } from "@/db";
import { DataDirLockedError, releaseDataDirLock } from "@/db/lock";
import { seedDemoGarden } from "@/db/seed/seed-demo";
import { ensureStarterCrops } from "@/db/seed/starter-crops";
import { getEnv } from "@/lib/env";
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
    else console.error("[castline] start-up failed", error);
    process.exit(1);
  }
}

function installShutdownHandlers(): void {
  let closing = false;
  const shutdown = (signal: NodeJS.Signals) => {
    if (closing) return;
    closing = true;
    console.log(`[castline] ${signal}: closing the database`);
    // PGlite runs one query at a time, so close() waits for the one in flight and
    // nothing is torn mid-write.
    closeDb()
      .catch((error) => console.error("[castline] close failed", error))
      .finally(() => process.exit(0));
  };
  // The start scripts set NEXT_MANUAL_SIG_HANDLE so Next leaves these signals
  // to us; otherwise its own handler exits before PGlite has closed.
  process.once("SIGTERM", shutdown);
  process.once("SIGINT", shutdown);
  // Whatever the way out, do not leave our lock behind for the next start to judge.
  process.once("exit", () => releaseDataDirLock(getEnv().PGLITE_DIR));
}
