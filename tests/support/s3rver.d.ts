// The parts of the fake S3 server the tests use (the package ships no types).
declare module "@20minutes/s3rver" {
  import type { AddressInfo } from "node:net";

  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    directory?: string;
    vhostBuckets?: boolean;
    configureBuckets?: { name: string }[];
  }

  export default class S3rver {
    constructor(options?: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
