import fs from "node:fs";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

// Migrations 0008–0009 turn a garden's frost dates (a date with a year) into
// the usual month and day ("MM-DD"). The data step of 0008 is hand-written; if
// the migration is regenerated without it, 0008 fails on any existing garden
// (NOT NULL with no value) and this test fails.

const folder = path.join(process.cwd(), "db", "migrations");
const db = new PGlite();

async function apply(file: string): Promise<void> {
  const text = fs.readFileSync(path.join(folder, file), "utf8");
  for (const statement of text.split("--> statement-breakpoint"))
    if (statement.trim()) await db.exec(statement);
}

const G = "00000000-0000-4000-8000-0000000000a1";
const LEAP = "00000000-0000-4000-8000-0000000000a2";

beforeAll(async () => {
  const files = fs
    .readdirSync(folder)
    .filter((f) => f.endsWith(".sql"))
    .sort();
  for (const file of files) if (file < "0008") await apply(file);
  // Gardens as the schema of migrations 0000–0007 holds them: frost dates with a year.
  await db.exec(`
    insert into gardens (id, name, time_zone, last_spring_frost, first_fall_frost)
      values ('${G}', 'Hollis Street Garden', 'America/Chicago', '2026-04-22', '2026-10-18'),
             ('${LEAP}', 'Leap Plot', 'UTC', '2024-02-29', '2024-11-05');
  `);
  for (const file of files) if (file >= "0008") await apply(file);
});

afterAll(() => db.close());

describe("frost dates become month and day", () => {
  it("keeps the month and day of every garden's old dates, and drops the year", async () => {
    const { rows } = await db.query<Record<string, string>>(
      `select id, last_spring_frost_md, first_fall_frost_md from gardens order by id`,
    );
    expect(rows).toEqual([
      { id: G, last_spring_frost_md: "04-22", first_fall_frost_md: "10-18" },
      { id: LEAP, last_spring_frost_md: "02-29", first_fall_frost_md: "11-05" },
    ]);
    const columns = await db.query<{ column_name: string }>(
      `select column_name from information_schema.columns
        where table_name = 'gardens' and column_name like '%frost%' order by column_name`,
    );
    expect(columns.rows.map((c) => c.column_name)).toEqual([
      "first_fall_frost_md",
      "last_spring_frost_md",
    ]);
  });

  it("refuses a garden with no frost days", async () => {
    await expect(
      db.exec(`insert into gardens (name, time_zone) values ('No frost', 'UTC')`),
    ).rejects.toThrow(/null value/);
  });
});
