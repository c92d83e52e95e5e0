// npm run bench: time computePlan on invented gardens of 50, 500 and 5,000 plantings,
// then loading the demo garden's inputs from PGlite, then the Balance endpoint over HTTP
// against `next start` beside /api/health (issue 9 "Speed": its targets are printed there).
// The HTTP part needs a production build: with none it says how to get one; a build
// older than the newest source file is used but called out, since its figures may be stale.
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { benchDbLoad, formatDbLoad } from "./bench-db-load";
import { main } from "./bench-run";

const root = path.resolve(__dirname, "..");

/** Newest modification time of the sources a build is made from (ms). */
function newestSource(): number {
  let newest = 0;
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else newest = Math.max(newest, fs.statSync(full).mtimeMs);
    }
  };
  for (const dir of ["app", "components", "lib", "db", "services"]) walk(path.join(root, dir));
  return newest;
}

function benchHttp(): void {
  const buildId = path.join(root, ".next", "BUILD_ID");
  if (!fs.existsSync(buildId)) {
    console.log(
      "\nBalance API over HTTP: not measured, there is no production build.\n" +
        "  Run `npm run bench:http -- --build` (builds, then measures), or `npm run build` and\n" +
        "  `npm run bench` again. On the shared 2-core box: flock /tmp/castline-cpu.lock npm run bench",
    );
    return;
  }
  if (fs.statSync(buildId).mtimeMs < newestSource())
    console.log(
      "\nNote: the .next build is older than the sources; `npm run bench:http -- --build` for fresh figures.",
    );
  const result = spawnSync(
    process.execPath,
    [path.join(root, "node_modules", "tsx", "dist", "cli.mjs"), "scripts/bench-balance-http.ts"],
    { cwd: root, stdio: "inherit" },
  );
  if (result.status !== 0) process.exitCode = 1;
}

main();
benchDbLoad()
  .then((figures) => process.stdout.write(formatDbLoad(figures) + "\n"))
  .then(benchHttp)
  .catch((error: unknown) => {
    console.error("database load bench failed:", error);
    process.exitCode = 1;
  });
