import "server-only";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { AddressInfo } from "node:net";
import S3rver from "s3rver";

// A fake S3 server in this process (s3rver), so a local start needs nothing
// else. It does not check signatures: never treat it as proof of signing.

export const LOCAL_BUCKET = "castline-photos";
let running: { server: S3rver; endpoint: string } | null = null;

export async function startLocalS3(directory?: string): Promise<string> {
  if (running) return running.endpoint;
  const dir = directory ?? fs.mkdtempSync(path.join(os.tmpdir(), "castline-s3-"));
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
