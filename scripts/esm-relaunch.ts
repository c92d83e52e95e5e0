import { spawnSync } from "node:child_process";

// lib/units.ts uses the `convert` package, which publishes only an "import"
// export. tsx runs these scripts as CommonJS (package.json has no "type"), and
// a CommonJS require of `convert` finds no export. Node 20.19+ can require an
// ES module, so re-running the same command with --conditions=import lets the
// require resolve. Returns true when the caller should go on in this process.
export function relaunchWithImportCondition(): boolean {
  if (process.execArgv.includes("--conditions=import")) return true;
  const r = spawnSync(
    process.execPath,
    ["--conditions=import", ...process.execArgv, ...process.argv.slice(1)],
    {
      stdio: "inherit",
    },
  );
  process.exit(r.status ?? 1);
}
