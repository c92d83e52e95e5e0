import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { afterAll, describe, expect, it } from "vitest";

// SIGTERM to `npm run start` (how the README starts the server) while writes
// are in flight. The probe found the signal never reached next-server (the lock
// stayed held, a restart was refused) and, sent to next-server itself, two
// writes were saved whose clients never got an answer. Uses the build the e2e
// global setup makes.

const root = process.cwd();
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "castline-stop-"));
const dataDir = path.join(tmp, "pgdata");
const lockFile = `${dataDir}.lock`;
const started: ChildProcess[] = [];

afterAll(() => {
  // A server left behind by a failing run: its PID is in our lock file.
  const pid = Number.parseInt(fs.existsSync(lockFile) ? fs.readFileSync(lockFile, "utf8") : "", 10);
  if (Number.isInteger(pid) && pid > 0) {
    try {
      process.kill(pid, "SIGKILL");
    } catch {
      // already gone
    }
  }
  for (const child of started) if (child.exitCode === null) child.kill("SIGKILL");
  fs.rmSync(tmp, { recursive: true, force: true });
});

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
    server.on("error", reject);
  });
}

async function startWithNpm(port: number) {
  const child = spawn("npm", ["run", "start", "--", "--hostname", "127.0.0.1"], {
    cwd: root,
    env: {
      ...process.env,
      PORT: String(port),
      PGLITE_DIR: dataDir,
      // Production makes e-mailed links only from a configured origin (README).
      APP_ORIGIN: `http://127.0.0.1:${port}`,
      CASTLINE_SECRET_FILE: path.join(tmp, "auth-secret"),
      NODE_ENV: "production",
      AUTH_SECRET: "graceful-stop-test-secret-0123456789",
      CASTLINE_DEMO: "0",
      LOCAL_SMTP_PORT: "0",
      SMTP_HOST: "",
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  started.push(child);
  let output = "";
  child.stdout!.on("data", (d) => (output += d));
  child.stderr!.on("data", (d) => (output += d));
  const exited = new Promise<number | null>((resolve) =>
    child.once("exit", (code) => resolve(code)),
  );
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`npm run start exited early:\n${output}`);
    if (Date.now() > deadline) throw new Error(`never healthy:\n${output}`);
    const ok = await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (ok) break;
    await new Promise((r) => setTimeout(r, 300));
  }
  return { child, base, exited, output: () => output };
}

const garden = (name: string) => ({
  name,
  timeZone: "UTC",
  unitSystem: "metric",
  lastSpringFrost: "2026-04-20",
  firstFallFrost: "2026-10-15",
});

describe("stopping the server", () => {
  it("SIGTERM to npm finishes in-flight writes, answers each, frees the lock; a restart works", async () => {
    const port = await freePort();
    const server = await startWithNpm(port);
    const signUp = await fetch(`${server.base}/api/account`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        name: "Stop Tester",
        email: "stop-tester@example.com",
        password: "tidy-worm-castings-2031",
      }),
    });
    // Sign-up answers 202 whether or not the address is new; a new one is signed in.
    expect(signUp.status).toBe(202);
    const cookie = signUp.headers.get("set-cookie")!.split(";")[0]!;

    const acknowledged: string[] = [];
    const refused: number[] = [];
    let next = 0;
    let stopped = false;
    let signalled = false;
    let cut = 0;
    server.exited.then(() => (stopped = true));
    // Twelve writers at once, so several requests are inside a handler when the signal lands.
    const writer = async () => {
      while (!stopped) {
        const name = `Burst ${++next}`;
        const res = await fetch(`${server.base}/api/gardens`, {
          method: "POST",
          headers: { "content-type": "application/json", cookie },
          body: JSON.stringify(garden(name)),
        }).catch(() => null);
        if (res === null) {
          if (signalled) return; // the server is gone: nothing more will be answered
          continue;
        }
        // Acknowledged means the whole answer arrived; a reply cut mid-body is no acknowledgement.
        const body = (await res.json().catch(() => null)) as { garden?: { name?: string } } | null;
        if (res.status === 201 && body?.garden?.name === name) acknowledged.push(name);
        else if (res.status !== 201) refused.push(res.status);
        else cut += 1;
        if (!signalled && acknowledged.length >= 40) {
          signalled = true;
          server.child.kill("SIGTERM"); // the npm process, not next-server
        }
      }
    };
    await Promise.all(Array.from({ length: 12 }, writer));
    const code = await server.exited;
    // The server itself is gone too: nothing listens and the lock is released.
    expect(
      await fetch(`${server.base}/api/health`).then(
        () => "answered",
        () => "closed",
      ),
    ).toBe("closed");
    expect(fs.existsSync(lockFile), server.output()).toBe(false);
    expect(server.output()).toContain("SIGTERM: closing the database");
    expect(code).not.toBeNull();
    // Anything refused during the stop was refused as "restarting", never a 500.
    expect(
      refused.every((s) => s === 503),
      refused.join(","),
    ).toBe(true);

    const db = new PGlite(dataDir);
    const { rows } = await db.query<{ name: string }>(
      "select name from gardens where name like 'Burst %'",
    );
    await db.close();
    const saved = rows.map((r) => r.name);
    console.log(
      `[graceful stop] ${acknowledged.length} acknowledged, ${saved.length} saved, ${refused.length} refused with 503, ${cut} cut mid-answer, ${next} sent`,
    );
    expect(new Set(saved).size, "a write was saved twice").toBe(saved.length);
    expect([...saved].sort(), "saved and acknowledged differ").toEqual([...acknowledged].sort());
    expect(saved.length).toBeGreaterThanOrEqual(40);

    // Restart on the same directory: the lock was released, the data is there.
    const again = await startWithNpm(port);
    const list = await fetch(`${again.base}/api/gardens`, { headers: { cookie } });
    expect(list.status).toBe(200);
    again.child.kill("SIGTERM");
    await again.exited;
    expect(fs.existsSync(lockFile)).toBe(false);
  }, 180_000);
});
