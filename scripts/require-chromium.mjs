// Fails fast, with the fix, when the browser tests cannot run on this machine.
import fs from "node:fs";

const path = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
if (!fs.existsSync(path)) {
  console.error(
    `Chromium was not found at ${path}. The browser tests drive Debian's Chromium: ` +
      "install it with `sudo apt-get install -y chromium` (or set CHROMIUM_PATH), then run the tests again.",
  );
  process.exit(1);
}
