import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import S3rver from "@20minutes/s3rver";

/** The fake's one account: s3rver checks request signatures against this key pair. */
export const FAKE_S3_CREDENTIALS = { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" };

export interface FakeS3 {
  /** http://127.0.0.1:<port>: point S3_ENDPOINT here, with path-style addressing. */
  endpoint: string;
  bucket: string;
  /** Where the fake keeps the bucket's objects on disk (a temporary folder). */
  directory: string;
  close(): Promise<void>;
}

/**
 * A local S3-compatible server (s3rver, in this process) on a free loopback port, keeping objects in a
 * temporary folder, with the bucket already made. Nothing leaves the machine.
 */
export async function startFakeS3(bucket = "towmargin-test-documents"): Promise<FakeS3> {
  const directory = mkdtempSync(join(tmpdir(), "towmargin-s3-"));
  const server = new S3rver({
    address: "127.0.0.1",
    port: 0,
    silent: true,
    directory,
    // Path-style only: a virtual-host name (bucket.127.0.0.1) does not resolve on the loopback address.
    vhostBuckets: false,
    configureBuckets: [{ name: bucket }],
  });
  const address = await server.run();
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    bucket,
    directory,
    close: async () => {
      await server.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
