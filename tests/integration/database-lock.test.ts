import "@/tests/support/integration/env";
import { execFile, spawn } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { users } from "@/db/schema";
import { resetEnvCache } from "@/lib/env";
import { closeHarness } from "@/tests/support/integration/harness";

// PGlite lets two processes open one data directory and silently loses one
// side's writes (see STACK.md), so a second opener must be refused.

const run = promisify(execFile);
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "castline-lock-"));
const dataDir = path.join(tmp, "pgdata");
const script = path.join(process.cwd(), "tests/support/integration/open-db.ts");

/** Runs open-db.ts in a child process; resolves with its exit code and output, never rejects. */
async function openInChild(): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run("npx", ["tsx", script], {
      cwd: process.cwd(),
      env: { ...process.env, PGLITE_DIR: dataDir },
      timeout: 60_000,
    });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code?: number; stdout?: string; stderr?: string };
    return {
      code: typeof e.code === "number" ? e.code : -1,
      stdout: e.stdout ?? "",
      stderr: e.stderr ?? "",
    };
  }
}

beforeAll(async () => {
  process.env.PGLITE_DIR = dataDir;
  resetEnvCache();
  await getDb();
});
afterAll(async () => {
  await closeHarness();
  fs.rmSync(tmp, { recursive: true, force: true });
});

describe("file-backed PGlite data directory", () => {
  it("refuses a second process, naming the directory and the owner's PID; the first keeps working", async () => {
    expect(fs.readFileSync(`${dataDir}.lock`, "utf8").trim()).toBe(String(process.pid));
    const child = await openInChild();
    expect(child.code).not.toBe(0);
    expect(child.stderr).toContain(dataDir);
    expect(child.stderr).toContain(`process ${process.pid}`);
    expect(child.stdout).not.toContain("opened");

    const db = await getDb();
    const email = "lock-holder@example.com";
    await db.insert(users).values({ email, name: "Lock Holder", passwordHash: "not-a-real-hash" });
    const rows = await db.select({ name: users.name }).from(users).where(eq(users.email, email));
    expect(rows).toEqual([{ name: "Lock Holder" }]);
  });

  it("lets the next process in once the first has closed, and keeps the first one's writes", async () => {
    await closeDb();
    expect(fs.existsSync(`${dataDir}.lock`)).toBe(false);
    const child = await openInChild();
    expect(child.code, child.stderr).toBe(0);
    expect(child.stdout).toContain("opened");
    const db = await getDb();
    expect(await db.select({ name: users.name }).from(users)).toEqual([{ name: "Lock Holder" }]);
  });

  it("takes over a lock left by a process that has died", async () => {
    await closeDb();
    const dead = spawn(process.execPath, ["-e", "0"]);
    const pid = dead.pid!;
    await new Promise((resolve) => dead.on("exit", resolve));
    fs.writeFileSync(`${dataDir}.lock`, String(pid));
    await getDb();
    expect(fs.readFileSync(`${dataDir}.lock`, "utf8").trim()).toBe(String(process.pid));
  });
});
