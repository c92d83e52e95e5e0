import "@/tests/support/integration/env";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { resetEnvCache } from "@/lib/env";
import { getStorage, stopLocalS3 } from "@/services/storage";
import { LOCAL_BUCKET, localS3Directory, startLocalS3 } from "@/services/storage/local-s3";
import { createS3Storage } from "@/services/storage/s3-storage";

// Issue 11, demo mode: the local fake S3 used to keep photos in a fresh temp
// directory per start, so a reboot lost the files while the database kept
// their rows. By default they now sit beside the database directory.

const root = fs.mkdtempSync(path.join(os.tmpdir(), "castline-s3dir-"));
const pgliteDir = path.join(root, "data", "pglite");

beforeAll(() => {
  // Only the storage reads this; no database is opened in this file.
  process.env.PGLITE_DIR = pgliteDir;
  delete process.env.S3_LOCAL_DIR;
  delete process.env.S3_ENDPOINT;
  resetEnvCache();
});
afterAll(async () => {
  await stopLocalS3();
  fs.rmSync(root, { recursive: true, force: true });
});

describe("where the local fake S3 keeps photos", () => {
  it("a photo put with the defaults is on disk beside the database and readable after a restart", async () => {
    const body = Buffer.from("a stand-in for a JPEG: the fake stores bytes as given");
    await (await getStorage()).put("photos/restart-check", body, "image/jpeg");
    await stopLocalS3();

    const dir = path.join(root, "data", "s3");
    expect(fs.existsSync(path.join(dir, LOCAL_BUCKET))).toBe(true);

    // A new server process: same settings, same directory, the same bytes back.
    const endpoint = await startLocalS3(localS3Directory({ pgliteDir }));
    const again = createS3Storage({
      endpoint,
      region: "us-east-1",
      bucket: LOCAL_BUCKET,
      accessKeyId: "S3RVER",
      secretAccessKey: "S3RVER",
      forcePathStyle: true,
    });
    expect((await again.get("photos/restart-check")).equals(body)).toBe(true);
  });

  it("S3_LOCAL_DIR wins; an in-memory database gets a throwaway temp directory", () => {
    expect(localS3Directory({ s3LocalDir: "/srv/photos", pgliteDir })).toBe("/srv/photos");
    const temp = localS3Directory({ pgliteDir: "memory://" });
    expect(temp.startsWith(os.tmpdir())).toBe(true);
    fs.rmSync(temp, { recursive: true, force: true });
  });

  it("a symlinked PGLITE_DIR puts the photos beside the real directory", () => {
    const real = path.join(root, "disk", "pglite");
    fs.mkdirSync(real, { recursive: true });
    const link = path.join(root, "pglite-link");
    fs.symlinkSync(real, link);
    expect(localS3Directory({ pgliteDir: link })).toBe(
      path.join(fs.realpathSync(path.join(root, "disk")), "s3"),
    );
  });
});
