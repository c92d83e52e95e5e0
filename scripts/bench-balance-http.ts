// npm run bench:http — the Balance endpoint over HTTP against `next start`, beside
// /api/health measured in the same run as the baseline (issue 9, "Speed").
//
//   npm run bench:http            uses the current .next build
//   npm run bench:http -- --build runs `next build` first (and reads the page sizes from it)
//
// The server gets a free loopback port, a throwaway PGLITE_DIR and CASTLINE_DEMO=1;
// the demo owner signs in and the demo garden's Balance is asked for by 20
// concurrent clients (autocannon). Targets are ratios to health's figures, because
// on a 2-core machine health alone shows a p95 near 100 ms at 20 clients.
// On the shared CI box run it under the CPU lock: flock /tmp/castline-cpu.lock npm run bench:http
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import zlib from "node:zlib";
import autocannon from "autocannon";

const root = path.resolve(__dirname, "..");
const nextBin = path.join(root, "node_modules", "next", "dist", "bin", "next");
const CONNECTIONS = 20;
const DURATION_S = Number(process.env.BENCH_HTTP_SECONDS ?? 10);
// The demo owner (db/seed/demo-garden.ts: invented, published demo credentials).
const DEMO_OWNER = { email: "maren@example.com", password: "hollis-owner-2026" };
const BALANCE_PAGE = "/g/[gardenId]/balance";
const OVERVIEW_PAGE = "/g/[gardenId]";

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

/** `next build`; its output is kept in .next/bench-build-output.txt. */
function build(): void {
  const result = spawnSync(process.execPath, [nextBin, "build"], {
    cwd: root,
    encoding: "utf8",
    env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" },
    maxBuffer: 64 * 1024 * 1024,
  });
  const output = `${result.stdout}\n${result.stderr}`;
  fs.writeFileSync(path.join(root, ".next", "bench-build-output.txt"), output);
  if (result.status !== 0) {
    console.error(output);
    throw new Error("next build failed");
  }
}

/**
 * A page's first-load JS from the build's own figures: Next 16 prints no size
 * table, but writes .next/diagnostics/route-bundle-stats.json (uncompressed bytes
 * and chunk paths); gzip is measured here on those chunks, as a browser would fetch them.
 */
function firstLoadJs(route: string): string {
  const stats = path.join(root, ".next", "diagnostics", "route-bundle-stats.json");
  if (!fs.existsSync(stats)) return "n/a (no route-bundle-stats.json in this build)";
  const routes = JSON.parse(fs.readFileSync(stats, "utf8")) as {
    route: string;
    firstLoadUncompressedJsBytes: number;
    firstLoadChunkPaths: string[];
  }[];
  const entry = routes.find((r) => r.route === route);
  if (!entry) return "n/a (no such page in this build)";
  const gzipped = entry.firstLoadChunkPaths.reduce(
    (sum, chunk) => sum + zlib.gzipSync(fs.readFileSync(path.join(root, chunk))).byteLength,
    0,
  );
  const kib = (n: number) => `${(n / 1024).toFixed(0)} KiB`;
  return `${kib(gzipped)} gzipped (${kib(entry.firstLoadUncompressedJsBytes)} uncompressed, ${entry.firstLoadChunkPaths.length} chunks)`;
}

async function startServer(): Promise<{ url: string; child: ChildProcess; dataDir: string }> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "castline-bench-http-"));
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  let log = "";
  const child = spawn(
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
        APP_ORIGIN: url,
        LOCAL_SMTP_PORT: "0",
        SMTP_HOST: "",
      },
      stdio: ["ignore", "pipe", "pipe"],
    },
  );
  child.stdout!.on("data", (d) => (log += d));
  child.stderr!.on("data", (d) => (log += d));
  const deadline = Date.now() + 120_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`next start exited early:\n${log}`);
    try {
      if ((await fetch(`${url}/api/health`)).ok) return { url, child, dataDir };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  child.kill("SIGTERM");
  throw new Error(`server did not become healthy:\n${log}`);
}

async function signIn(url: string): Promise<string> {
  const res = await fetch(`${url}/api/session`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: url },
    body: JSON.stringify(DEMO_OWNER),
  });
  if (!res.ok) throw new Error(`demo sign-in failed: ${res.status} ${await res.text()}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

async function demoGardenId(url: string, cookie: string): Promise<string> {
  const res = await fetch(`${url}/api/gardens`, { headers: { cookie } });
  const body = (await res.json()) as { gardens: { id: string; name: string }[] };
  const garden = body.gardens.find((g) => g.name.startsWith("Hollis Street")) ?? body.gardens[0];
  if (!garden) throw new Error("the demo owner has no garden");
  return garden.id;
}

async function timeOne(url: string, headers: Record<string, string>): Promise<number> {
  const start = performance.now();
  const res = await fetch(url, { headers });
  await res.arrayBuffer();
  if (!res.ok) throw new Error(`${url} answered ${res.status}`);
  return performance.now() - start;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

interface Load {
  rps: number;
  p50: number;
  p95: number;
  errors: number;
}

async function load(url: string, headers: Record<string, string>): Promise<Load> {
  const result = await autocannon({
    url,
    connections: CONNECTIONS,
    duration: DURATION_S,
    headers,
  });
  const latency = result.latency as unknown as Record<string, number>;
  return {
    rps: result.requests.average,
    p50: latency.p50 ?? result.latency.average,
    // autocannon reports p97.5 and p99, not p95: p97_5 is the nearest at or above it.
    p95: latency.p95 ?? latency.p97_5 ?? result.latency.p99,
    errors: result.errors + result.non2xx,
  };
}

async function main(): Promise<void> {
  if (process.argv.includes("--build")) build();
  if (!fs.existsSync(path.join(root, ".next", "BUILD_ID")))
    throw new Error("no .next build: run with --build");
  const { url, child, dataDir } = await startServer();
  try {
    const cookie = await signIn(url);
    const gardenId = await demoGardenId(url, cookie);
    const balanceUrl = `${url}/api/gardens/${gardenId}/balance`;
    const auth = { cookie };

    const cold = await timeOne(balanceUrl, auth); // computes and caches the plan
    const single: number[] = [];
    for (let i = 0; i < 20; i++) single.push(await timeOne(balanceUrl, auth));
    const healthSingle: number[] = [];
    for (let i = 0; i < 20; i++) healthSingle.push(await timeOne(`${url}/api/health`, {}));

    const health = await load(`${url}/api/health`, {});
    // A signed-in read with the same session and role checks (answered from the gate's
    // short memory once warm, lib/auth/gate-cache.ts) plus one garden query: what the
    // auth every garden route pays looks like beside the balance.
    const gardenRead = await load(`${url}/api/gardens/${gardenId}`, auth);
    const balance = await load(balanceUrl, auth);
    const bodyBytes = (await (await fetch(balanceUrl, { headers: auth })).arrayBuffer()).byteLength;

    const f = (n: number) => n.toFixed(1);
    const ok = (pass: boolean) => (pass ? "ok" : "MISSED");
    console.log(
      `\nBalance API over HTTP (next start, demo garden, ${CONNECTIONS} clients, ${DURATION_S} s each)`,
    );
    console.log(`                 req/s     p50 ms   p95 ms   errors`);
    console.log(
      `  /api/health  ${f(health.rps).padStart(7)}  ${f(health.p50).padStart(8)} ${f(health.p95).padStart(8)}   ${health.errors}`,
    );
    console.log(
      `  garden GET   ${f(gardenRead.rps).padStart(7)}  ${f(gardenRead.p50).padStart(8)} ${f(gardenRead.p95).padStart(8)}   ${gardenRead.errors}   (signed-in reference, not a target)`,
    );
    console.log(
      `  balance      ${f(balance.rps).padStart(7)}  ${f(balance.p50).padStart(8)} ${f(balance.p95).padStart(8)}   ${balance.errors}`,
    );
    console.log(`  balance body: ${(bodyBytes / 1024).toFixed(0)} KiB of JSON`);
    console.log(`\nTargets`);
    console.log(
      `  req/s ≥ 0.5 × health (${f(0.5 * health.rps)}): ${f(balance.rps)} = ${(balance.rps / health.rps).toFixed(2)} ×  ${ok(balance.rps >= 0.5 * health.rps)}`,
    );
    console.log(
      `  p95 ≤ 2 × health (${f(2 * health.p95)} ms): ${f(balance.p95)} ms = ${(balance.p95 / health.p95).toFixed(2)} ×  ${ok(balance.p95 <= 2 * health.p95)}`,
    );
    console.log(
      `  single request ≤ 30 ms: median of 20 warm ${f(median(single))} ms  ${ok(median(single) <= 30)}` +
        ` (first, computing the plan: ${f(cold)} ms; health alone ${f(median(healthSingle))} ms)`,
    );
    console.log(`  errors: ${ok(health.errors + gardenRead.errors + balance.errors === 0)}`);
    console.log(`\nFirst-load JS, Balance page: ${firstLoadJs(BALANCE_PAGE)}`);
    console.log(`First-load JS, overview page (for comparison): ${firstLoadJs(OVERVIEW_PAGE)}`);
  } finally {
    child.kill("SIGTERM");
    await new Promise((r) => child.once("exit", r));
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
