import "server-only";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { AddressInfo } from "node:net";
import S3rver from "s3rver";
import { realDataDir } from "@/db/lock";

// A fake S3 server in this process (s3rver), so a local start needs nothing
// else. It does not check signatures: never treat it as proof of signing.

export const LOCAL_BUCKET = "castline-photos";

/**
 * Where the fake keeps its files when S3_LOCAL_DIR is unset: beside the
 * database's directory (`.data/pglite` → `.data/s3`), so photos outlive a
 * reboot exactly as long as the rows that name them. An in-memory database
 * (tests) gets a temp directory, gone with it.
 */
export function localS3Directory({
  s3LocalDir,
  pgliteDir,
}: {
  s3LocalDir?: string;
  pgliteDir: string;
}): string {
  if (s3LocalDir) return path.resolve(/*turbopackIgnore: true*/ s3LocalDir);
  if (pgliteDir.startsWith("memory://"))
    return fs.mkdtempSync(path.join(os.tmpdir(), "castline-s3-"));
  return path.join(path.dirname(realDataDir(pgliteDir)), "s3");
}

let running: { server: S3rver; endpoint: string } | null = null;

export async function startLocalS3(dir: string): Promise<string> {
  if (running) return running.endpoint;
  fs.mkdirSync(dir, { recursive: true });
  const server = new S3rver({
    port: 0,
    address: "127.0.0.1",
    silent: true,
    directory: dir,
    configureBuckets: [{ name: LOCAL_BUCKET, configs: [] }],
  });
  const address = (await server.run()) as AddressInfo;
  running = { server, endpoint: `http://127.0.0.1:${address.port}` };
  return running.endpoint;
}

export async function stopLocalS3(): Promise<void> {
  const r = running;
  running = null;
  if (r) await r.server.close();
}
