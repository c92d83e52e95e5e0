import "@/tests/support/integration/env";
import crypto from "node:crypto";
import { Client } from "pg";
import { sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import * as health from "@/app/api/health/route";
import { closeDb, getDb, getDbKind } from "@/db";
import { resetEnvCache } from "@/lib/env";
import {
  call,
  closeHarness,
  gardenInput,
  schemaTableNames,
  signUpUser,
} from "@/tests/support/integration/harness";
import * as gardens from "@/app/api/gardens/route";

// DATABASE_URL selects node-postgres instead of PGlite. CI exports
// TEST_DATABASE_URL (then this must run, and fails if the server is not there);
// on a developer machine we try a local server and otherwise skip, saying why.
const FALLBACK_URL = "postgres://postgres@127.0.0.1:5432/postgres";
const adminUrl = process.env.TEST_DATABASE_URL ?? FALLBACK_URL;

async function reachable(url: string): Promise<string | null> {
  const client = new Client({ connectionString: url, connectionTimeoutMillis: 2_000 });
  try {
    await client.connect();
    await client.query("select 1");
    return null;
  } catch (error) {
    return error instanceof Error ? error.message : String(error);
  } finally {
    await client.end().catch(() => {});
  }
}

const whyNot = process.env.TEST_DATABASE_URL ? null : await reachable(FALLBACK_URL);
if (whyNot)
  console.warn(
    `[database-postgres] skipped: no TEST_DATABASE_URL and ${FALLBACK_URL} refused (${whyNot})`,
  );
const dbName = `castline_test_${crypto.randomBytes(6).toString("hex")}`;

async function admin<T>(fn: (c: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: adminUrl, connectionTimeoutMillis: 5_000 });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

afterAll(async () => {
  await closeHarness();
  if (!whyNot)
    await admin((c) => c.query(`drop database if exists ${dbName} with (force)`)).catch(() => {});
});

describe("PostgreSQL through DATABASE_URL", () => {
  if (whyNot) {
    it.skip(`SKIPPED: TEST_DATABASE_URL is unset and no PostgreSQL answers at ${FALLBACK_URL} (${whyNot})`, () => {});
    return;
  }

  it("applies the migrations to a fresh database and serves requests from it", async () => {
    await admin((c) => c.query(`create database ${dbName}`));
    const url = new URL(adminUrl);
    url.pathname = `/${dbName}`;
    await closeDb();
    process.env.DATABASE_URL = url.toString();
    resetEnvCache();
    expect(await getDbKind()).toBe("postgres");

    const db = await getDb();
    const res = (await db.execute(
      sql`select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by 1`,
    )) as unknown as { rows: { table_name: string }[] };
    const expected = schemaTableNames();
    expect(res.rows.map((r) => r.table_name)).toEqual(expected);

    expect((await call(health.GET, { url: "/api/health" })).json.db).toBe("postgres");
    const owner = await signUpUser("pgowner");
    const made = await call(gardens.POST, {
      url: "/api/gardens",
      cookie: owner.cookie,
      body: gardenInput(),
    });
    expect(made.status).toBe(201);
    const list = await call(gardens.GET, { url: "/api/gardens", cookie: owner.cookie });
    expect(list.json.gardens).toEqual([
      { id: made.json.garden.id, name: "Hollis Street Garden", role: "owner" },
    ]);
  });
});
