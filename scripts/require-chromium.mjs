// Makes sure the browser tests can run: Debian's Chromium at /usr/bin/chromium.
// As root (CI, these dev machines) it installs the package itself; otherwise it
// stops with the command to run.
import { spawnSync } from "node:child_process";
import fs from "node:fs";

const path = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
if (!fs.existsSync(path) && process.getuid?.() === 0 && !process.env.CHROMIUM_PATH) {
  console.log("Chromium is missing: installing Debian's chromium package for the browser tests…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  spawnSync("apt-get", ["update", "-qq"], { stdio: "inherit", env });
  spawnSync("apt-get", ["install", "-y", "-qq", "chromium"], { stdio: "inherit", env });
}
if (!fs.existsSync(path)) {
  console.error(
    `Chromium was not found at ${path}. The browser tests drive Debian's Chromium: ` +
      "install it with `sudo apt-get install -y chromium` (or set CHROMIUM_PATH), then run the tests again.",
  );
  process.exit(1);
}
