import "@/tests/support/integration/env";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { sql } from "drizzle-orm";
import { afterAll, afterEach, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { resetEnvCache } from "@/lib/env";

// The probe: PGLITE_DIR pointing at a symlink made PGlite's WebAssembly file
// system fail with "errno 44" (ENOENT in Emscripten), naming no path.

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "castline-symlink-"));

function pointAt(dir: string) {
  process.env.PGLITE_DIR = dir;
  resetEnvCache();
}

afterEach(closeDb);
afterAll(() => {
  pointAt("memory://");
  fs.rmSync(tmp, { recursive: true, force: true });
});

describe("PGLITE_DIR", () => {
  it("may be a symlink to the real directory", async () => {
    const real = path.join(tmp, "real-data");
    const link = path.join(tmp, "linked-data");
    fs.mkdirSync(real);
    fs.symlinkSync(real, link);
    pointAt(link);
    const db = await getDb();
    await db.execute(sql`create table probe (n int)`);
    await db.execute(sql`insert into probe values (7)`);
    await closeDb();
    // The data went to the real directory, and the lock sits beside it and is gone again.
    expect(fs.readdirSync(real).length).toBeGreaterThan(0);
    expect(fs.existsSync(`${real}.lock`)).toBe(false);
    pointAt(link);
    const again = (await (await getDb()).execute(sql`select n from probe`)) as unknown as {
      rows: { n: number }[];
    };
    expect(again.rows).toEqual([{ n: 7 }]);
  });

  it("may sit under a symlinked parent that does not hold it yet", async () => {
    const realParent = path.join(tmp, "real-parent");
    fs.mkdirSync(realParent);
    fs.symlinkSync(realParent, path.join(tmp, "linked-parent"));
    pointAt(path.join(tmp, "linked-parent", "pgdata"));
    await getDb();
    expect(fs.existsSync(path.join(realParent, "pgdata.lock"))).toBe(true);
    await closeDb();
    expect(fs.existsSync(path.join(realParent, "pgdata.lock"))).toBe(false);
  });

  it("that cannot be opened fails with a message naming the path", async () => {
    const file = path.join(tmp, "not-a-directory");
    fs.writeFileSync(file, "plain file");
    const dangling = path.join(tmp, "dangling");
    fs.symlinkSync(path.join(tmp, "gone"), dangling);
    for (const dir of [file, dangling]) {
      pointAt(dir);
      const message = await getDb().then(
        () => "opened",
        (error: Error) => error.message,
      );
      expect(message).toContain(dir);
      expect(message).not.toMatch(/^errno \d+$/);
    }
  });
});
