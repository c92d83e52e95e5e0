// s3rver 3.7.1 ships no types; only what local-s3.ts uses.
declare module "s3rver" {
  import type { AddressInfo } from "node:net";
  interface S3rverOptions {
    port?: number;
    address?: string;
    silent?: boolean;
    directory?: string;
    configureBuckets?: { name: string; configs: unknown[] }[];
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
