// Object storage as the app sees it: put, get, and a short-lived signed link.
// Drivers: the S3 API (any S3-compatible service) and, locally, the same
// driver pointed at an in-process fake S3 server (s3rver).

export interface ObjectStorage {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer>;
  /** A presigned GET URL valid for `seconds`. */
  signedUrl(key: string, seconds: number): Promise<string>;
}

/** Storage did not answer (or refused us): the caller keeps its own write and offers a retry. */
export class StorageUnavailableError extends Error {
  constructor(cause: unknown) {
    super("object storage is unavailable", { cause });
    this.name = "StorageUnavailableError";
  }
}
