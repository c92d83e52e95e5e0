// Run as a separate process by database-lock.test.ts: opens the database named
// by PGLITE_DIR the way the server does, and exits non-zero with the lock's
// message when another process owns the directory.
import { closeDb, getDb } from "@/db";

async function main(): Promise<void> {
  try {
    await getDb();
  } catch (error) {
    console.error(error instanceof Error ? error.message : String(error));
    process.exit(1);
  }
  await closeDb();
  console.log("opened");
}

void main();
