import "server-only";
import { z } from "zod";
import { getEnv } from "@/lib/env";
import { LOCAL_BUCKET, localS3Directory, startLocalS3 } from "./local-s3";
import { createS3Storage } from "./s3-storage";
import type { ObjectStorage } from "./types";

export { StorageUnavailableError, type ObjectStorage } from "./types";
export { stopLocalS3 } from "./local-s3";

// S3_ENDPOINT set → that service (AWS or any S3-compatible one). Unset → a
// local fake S3 server in this process, files under S3_LOCAL_DIR (default: beside
// the database directory, see localS3Directory).
const storageEnv = z.object({
  S3_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().min(1).default("us-east-1"),
  S3_BUCKET: z.string().min(3).optional(),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).optional(),
  S3_LOCAL_DIR: z.string().optional(),
});

let storage: Promise<ObjectStorage> | null = null;

export function getStorage(): Promise<ObjectStorage> {
  storage ??= openStorage();
  return storage;
}

async function openStorage(): Promise<ObjectStorage> {
  const blank = (v: string | undefined) => (v === "" ? undefined : v);
  const env = storageEnv.parse(
    Object.fromEntries(Object.entries(process.env).map(([k, v]) => [k, blank(v)])),
  );
  if (env.S3_ENDPOINT) {
    if (!env.S3_BUCKET || !env.S3_ACCESS_KEY_ID || !env.S3_SECRET_ACCESS_KEY)
      throw new Error(
        "S3_ENDPOINT is set: set S3_BUCKET, S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY too",
      );
    return createS3Storage({
      endpoint: env.S3_ENDPOINT,
      region: env.S3_REGION,
      bucket: env.S3_BUCKET,
      accessKeyId: env.S3_ACCESS_KEY_ID,
      secretAccessKey: env.S3_SECRET_ACCESS_KEY,
      forcePathStyle: env.S3_FORCE_PATH_STYLE !== "false",
    });
  }
  const endpoint = await startLocalS3(
    localS3Directory({ s3LocalDir: env.S3_LOCAL_DIR, pgliteDir: getEnv().PGLITE_DIR }),
  );
  // s3rver accepts any key pair; these name the fake, they are not secrets.
  return createS3Storage({
    endpoint,
    region: env.S3_REGION,
    bucket: LOCAL_BUCKET,
    accessKeyId: "S3RVER",
    secretAccessKey: "S3RVER",
    forcePathStyle: true,
  });
}
