import fs from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import { getEnv } from "@/lib/env";
import { acquireDataDirLock, realDataDir } from "./lock";
import * as schema from "./schema";

// The one database client. Which engine backs it is decided here and nowhere
// else: DATABASE_URL → PostgreSQL via node-postgres; otherwise embedded PGlite
// in PGLITE_DIR ("memory://" keeps it in memory, as the tests do).

export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;
export type DbKind = "pglite" | "postgres";
/** The client or a transaction on it: query helpers that must join the caller's transaction take this. */
export type DbOrTx = Db | Parameters<Parameters<Db["transaction"]>[0]>[0];

interface Handle {
  db: Db;
  kind: DbKind;
  close: () => Promise<void>;
}

// Kept on globalThis: Next bundles instrumentation and each route separately,
// and dev hot reload re-evaluates modules; all of them must share one client or
// two PGlite instances would write to one directory.
const globalKey = Symbol.for("castline.db");
type GlobalWithDb = typeof globalThis & { [globalKey]?: Promise<Handle> };

export const migrationsFolder = path.join(process.cwd(), "db", "migrations");

async function openPglite(dataDir: string): Promise<Handle> {
  const { drizzle } = await import("drizzle-orm/pglite");
  const { migrate } = await import("drizzle-orm/pglite/migrator");
  const inMemory = dataDir.startsWith("memory://");
  const release = inMemory ? () => {} : acquireDataDirLock(dataDir);
  try {
    const client = inMemory ? new PGlite(dataDir) : await openPgliteDir(dataDir);
    const db = drizzle({ client, schema });
    await migrate(db, { migrationsFolder });
    return {
      db: db as unknown as Db,
      kind: "pglite",
      close: async () => {
        await client.close();
        release();
      },
    };
  } catch (error) {
    release();
    throw error;
  }
}

// PGlite reports file-system trouble as a bare "errno 44" (Emscripten's ENOENT);
// say which directory and what is wrong with it.
async function openPgliteDir(dataDir: string): Promise<PGlite> {
  const real = realDataDir(dataDir);
  const shown = real === path.resolve(dataDir) ? dataDir : `${dataDir} (→ ${real})`;
  const stat = fs.statSync(real, { throwIfNoEntry: false });
  if (stat && !stat.isDirectory())
    throw new Error(`PGLITE_DIR ${shown} is not a directory. Point PGLITE_DIR at a directory.`);
  if (!stat && fs.lstatSync(real, { throwIfNoEntry: false }))
    throw new Error(
      `PGLITE_DIR ${shown} is a symlink to nothing. Fix the link or point PGLITE_DIR at a directory.`,
    );
  try {
    const client = new PGlite(real);
    await client.waitReady;
    return client;
  } catch (error) {
    const reason = error instanceof Error && error.message ? error.message : String(error);
    throw new Error(`Could not open the PGlite database in ${shown}: ${reason}`, { cause: error });
  }
}

async function openPostgres(url: string): Promise<Handle> {
  const { Pool } = await import("pg");
  const { drizzle } = await import("drizzle-orm/node-postgres");
  const { migrate } = await import("drizzle-orm/node-postgres/migrator");
  const pool = new Pool({ connectionString: url, max: 10 });
  const db = drizzle({ client: pool, schema });
  await migrate(db, { migrationsFolder });
  return { db: db as unknown as Db, kind: "postgres", close: () => pool.end() };
}

function open(): Promise<Handle> {
  const env = getEnv();
  return env.DATABASE_URL ? openPostgres(env.DATABASE_URL) : openPglite(env.PGLITE_DIR);
}

function handle(): Promise<Handle> {
  const g = globalThis as GlobalWithDb;
  if (!g[globalKey]) {
    g[globalKey] = open();
    // A failed open must not be cached, or every later request repeats the stale error.
    g[globalKey].catch(() => {
      delete g[globalKey];
    });
  }
  return g[globalKey];
}

/** The database, opened and migrated on first use. */
export async function getDb(): Promise<Db> {
  return (await handle()).db;
}

export async function getDbKind(): Promise<DbKind> {
  return (await handle()).kind;
}

/** Closes the client (SIGTERM, end of a test file). Safe to call when never opened. */
export async function closeDb(): Promise<void> {
  const g = globalThis as GlobalWithDb;
  const pending = g[globalKey];
  if (!pending) return;
  delete g[globalKey];
  const h = await pending.catch(() => null);
  await h?.close();
}

export { schema };
