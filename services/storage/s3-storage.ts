import "server-only";
import { GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { StorageUnavailableError, type ObjectStorage } from "./types";

export interface S3Config {
  endpoint?: string;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  forcePathStyle: boolean;
}

/** The official AWS SDK v3 against any S3-compatible endpoint. */
export function createS3Storage(config: S3Config): ObjectStorage {
  const client = new S3Client({
    endpoint: config.endpoint,
    region: config.region,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    forcePathStyle: config.forcePathStyle,
    // Checksums only when the operation needs them: fakes and some S3-compatible services reject the newer defaults.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    maxAttempts: 2,
  });
  const wrap = async <T>(fn: () => Promise<T>): Promise<T> => {
    try {
      return await fn();
    } catch (error) {
      throw new StorageUnavailableError(error);
    }
  };
  return {
    put: (key, body, contentType) =>
      wrap(async () => {
        // A Buffer body: streams and Blobs fail the SDK's hashing on Node 20.
        await client.send(
          new PutObjectCommand({
            Bucket: config.bucket,
            Key: key,
            Body: body,
            ContentType: contentType,
          }),
        );
      }),
    get: (key) =>
      wrap(async () => {
        const res = await client.send(new GetObjectCommand({ Bucket: config.bucket, Key: key }));
        return Buffer.from(await res.Body!.transformToByteArray());
      }),
    signedUrl: (key, seconds) =>
      getSignedUrl(client, new GetObjectCommand({ Bucket: config.bucket, Key: key }), {
        expiresIn: seconds,
      }),
  };
}
