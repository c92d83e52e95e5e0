// Run as a separate process by shutdown.test.ts: starts the server's database
// side exactly as instrumentation.ts does (lock, migrations, signal handlers),
// then writes gardens one by one, printing each committed count, until killed.
import { getDb } from "@/db";
import { gardens } from "@/db/schema";
import { startServer } from "@/services/startup";

async function main(): Promise<void> {
  await startServer();
  const db = await getDb();
  for (let n = 1; ; n++) {
    await db.transaction(async (tx) => {
      await tx.insert(gardens).values({
        name: `Shutdown plot ${n}`,
        timeZone: "UTC",
        lastSpringFrost: "2026-04-20",
        firstFallFrost: "2026-10-15",
      });
    });
    console.log(`committed ${n}`);
    // Requests reach a real server through the event loop; yielding here lets
    // the signal in, as it would between requests (PGlite alone never yields).
    await new Promise((resolve) => setImmediate(resolve));
  }
}

void main();
