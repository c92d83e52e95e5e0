import fs from "node:fs";
import os from "node:os";
import path from "node:path";

/**
 * Where a browser test saves the screenshots a developer opens to look at a screen:
 * E2E_SHOTS_DIR when set, else the system's temp folder (never a path outside it that a
 * clean machine may not have).
 */
export function shotsDir(name: string): string {
  const dir = path.join(process.env.E2E_SHOTS_DIR ?? os.tmpdir(), "castline-shots", name);
  fs.mkdirSync(dir, { recursive: true });
  return dir;
}
