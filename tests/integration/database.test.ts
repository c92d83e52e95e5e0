import "@/tests/support/integration/env";
import fs from "node:fs";
import path from "node:path";
import { sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import * as gardens from "@/app/api/gardens/route";
import { getDb, getDbKind, migrationsFolder } from "@/db";
import { demoGarden, demoMembers, neighbourGarden } from "@/db/seed/demo-garden";
import { seedDemoGarden } from "@/db/seed/seed-demo";
import {
  call,
  closeHarness,
  countRows,
  schemaTableNames,
  signIn,
} from "@/tests/support/integration/harness";

afterAll(closeHarness);

async function publicTables(): Promise<string[]> {
  const db = await getDb();
  const res = (await db.execute(
    sql`select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by 1`,
  )) as unknown as { rows: { table_name: string }[] };
  return res.rows.map((r) => r.table_name);
}

describe("migrations", () => {
  it("build every table of the schema in an empty database", async () => {
    expect(await getDbKind()).toBe("pglite");
    const sqlText = fs
      .readdirSync(migrationsFolder)
      .filter((f) => f.endsWith(".sql"))
      .map((f) => fs.readFileSync(path.join(migrationsFolder, f), "utf8"))
      .join("\n");
    // Tables a later migration drops (ended_sessions, sign_in_attempts) do not count.
    const dropped = new Set([...sqlText.matchAll(/DROP TABLE "([a-z_]+)"/g)].map((m) => m[1]!));
    const inMigrations = [...sqlText.matchAll(/CREATE TABLE "([a-z_]+)"/g)]
      .map((m) => m[1]!)
      .filter((t) => !dropped.has(t))
      .sort();
    const inSchema = schemaTableNames();
    expect(inMigrations.length).toBeGreaterThan(10);
    // The migrations and the Drizzle schema describe the same tables, and they all exist.
    expect(inMigrations).toEqual(inSchema);
    expect(await publicTables()).toEqual(inSchema);
  });

  it("record each journal entry as applied", async () => {
    const journal = JSON.parse(
      fs.readFileSync(path.join(migrationsFolder, "meta", "_journal.json"), "utf8"),
    ) as {
      entries: unknown[];
    };
    const db = await getDb();
    const res = (await db.execute(
      sql`select count(*)::int as n from drizzle.__drizzle_migrations`,
    )) as unknown as {
      rows: { n: number }[];
    };
    expect(res.rows[0]!.n).toBe(journal.entries.length);
  });
});

describe("demo seed", () => {
  it("loads once; a second run changes no table's row count", async () => {
    const db = await getDb();
    const tables = await publicTables();
    const counts = async () =>
      Object.fromEntries(await Promise.all(tables.map(async (t) => [t, await countRows(t)])));
    const first = await seedDemoGarden(db);
    expect(first).toEqual({ created: true });
    const afterFirst = await counts();
    // The household plot and its community-garden neighbour (PRODUCT.md demo scenario).
    expect(afterFirst.gardens).toBe(2);
    expect(afterFirst.memberships).toBe(
      demoMembers.length + 1 + Object.keys(neighbourGarden.memberRoles).length,
    );
    expect(afterFirst.bin_events).toBeGreaterThan(0);

    const second = await seedDemoGarden(db);
    expect(second).toEqual({ created: false });
    expect(await counts()).toEqual(afterFirst);
  });

  it("demo accounts sign in with their published passwords and see the demo garden in their role", async () => {
    for (const m of demoMembers) {
      const cookie = await signIn(m.email, m.password);
      const res = await call(gardens.GET, { url: "/api/gardens", cookie });
      const neighbourRole = (neighbourGarden.memberRoles as Record<string, string>)[m.role];
      const expected = [
        expect.objectContaining({ name: demoGarden.name, role: m.role }),
        ...(neighbourRole
          ? [expect.objectContaining({ name: neighbourGarden.name, role: neighbourRole })]
          : []),
      ];
      expect(res.json.gardens).toEqual(expect.arrayContaining(expected));
      expect(res.json.gardens).toHaveLength(expected.length);
    }
  });
});
