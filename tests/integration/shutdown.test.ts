import "@/tests/support/integration/env";
import { spawn } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { afterAll, describe, expect, it } from "vitest";

// SIGTERM while writes are in flight: the server closes PGlite cleanly, releases
// its lock, and every write it reported as committed is there on restart.

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "castline-sigterm-"));
const dataDir = path.join(tmp, "pgdata");
const script = path.join(process.cwd(), "tests/support/integration/serve-and-write.ts");

afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

describe("SIGTERM mid-write", () => {
  it("closes cleanly, frees the directory and keeps every committed write", async () => {
    // One node process (tsx as a loader, not a wrapper) so the signal reaches the
    // script itself; react-server makes "server-only" an empty module, as inside Next.
    const child = spawn(
      process.execPath,
      ["--conditions=react-server", "--import", "tsx", script],
      {
        cwd: process.cwd(),
        env: { ...process.env, PGLITE_DIR: dataDir, CASTLINE_DEMO: "0" },
        stdio: ["ignore", "pipe", "pipe"],
        detached: false,
      },
    );
    let out = "";
    let lastCommitted = 0;
    child.stderr.on("data", (d) => (out += d));
    const enough = new Promise<void>((resolve) => {
      child.stdout.on("data", (d: Buffer) => {
        out += d;
        const counts = [...String(d).matchAll(/committed (\d+)/g)].map((m) => Number(m[1]));
        if (counts.length) lastCommitted = Math.max(lastCommitted, ...counts);
        if (lastCommitted >= 25) resolve();
      });
    });
    const exited = new Promise<number | null>((resolve) =>
      child.once("exit", (code) => resolve(code)),
    );
    await enough;
    child.kill("SIGTERM");
    const code = await exited;
    expect(out).toContain("SIGTERM: closing the database");
    expect(code, out).toBe(0);
    expect(fs.existsSync(`${dataDir}.lock`)).toBe(false);

    const reopened = new PGlite(dataDir);
    const { rows } = await reopened.query<{ n: number }>("select count(*)::int as n from gardens");
    await reopened.close();
    expect(rows[0]!.n).toBeGreaterThanOrEqual(lastCommitted);
  });
});
