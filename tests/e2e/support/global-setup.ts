import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";

// Builds the app once and serves it with `next start` on a free port, with a
// throwaway data directory and the demo garden, exactly as a user would run it.

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

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

async function waitForHealth(url: string, child: ChildProcess, log: () => string): Promise<void> {
  const deadline = Date.now() + 90_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`next start exited early:\n${log()}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`Server did not become healthy:\n${log()}`);
}

let server: ChildProcess | undefined;

export async function setup(project: TestProject) {
  const root = path.resolve(__dirname, "../../..");
  if (process.env.E2E_SKIP_BUILD !== "1") {
    const build = spawnSync("npx", ["next", "build"], {
      cwd: root,
      stdio: "inherit",
      env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" },
    });
    if (build.status !== 0) throw new Error("next build failed");
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "castline-e2e-"));
  const port = await freePort();
  let output = "";
  // Node runs Next directly (not through npx) so SIGTERM reaches the server itself.
  const nextBin = path.join(root, "node_modules", "next", "dist", "bin", "next");
  server = spawn(
    process.execPath,
    [nextBin, "start", "--port", String(port), "--hostname", "127.0.0.1"],
    {
      cwd: root,
      env: {
        ...process.env,
        NODE_ENV: "production",
        NEXT_TELEMETRY_DISABLED: "1",
        NEXT_MANUAL_SIG_HANDLE: "true",
        PGLITE_DIR: path.join(dataDir, "pglite"),
        CASTLINE_SECRET_FILE: path.join(dataDir, "auth-secret"),
        CASTLINE_DEMO: "1",
        // E-mailed links use the configured origin, never the Host header (README, "E-mail").
        APP_ORIGIN: `http://127.0.0.1:${port}`,
        LOCAL_SMTP_PORT: "0",
        // Mail goes to the in-process catcher, whatever the developer's shell says.
        SMTP_HOST: "",
      },
      stdio: ["ignore", "pipe", "pipe"],
    },
  );
  server.stdout?.on("data", (d) => (output += d));
  server.stderr?.on("data", (d) => (output += d));
  const baseUrl = `http://127.0.0.1:${port}`;
  try {
    await waitForHealth(baseUrl, server, () => output);
  } catch (error) {
    server.kill("SIGKILL");
    throw error;
  }
  project.provide("baseUrl", baseUrl);
  return async () => {
    server?.kill("SIGTERM");
    await new Promise((r) => server?.once("exit", r));
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
}
