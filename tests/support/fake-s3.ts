import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import S3rver from "@20minutes/s3rver";
import { filesUnder } from "./files";

/** The fake's one account: s3rver checks request signatures against this key pair. */
export const FAKE_S3_CREDENTIALS = { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" };

const OBJECT = "._S3rver_object";

export interface FakeS3 {
  /** http://127.0.0.1:<port>: point S3_ENDPOINT here, with path-style addressing. */
  endpoint: string;
  bucket: string;
  /** Where the fake keeps the bucket's objects on disk (a temporary folder). */
  directory: string;
  /**
   * Every object the fake holds, as "<bucket>/<key>", read from its folder rather than through the S3 API, so
   * an object written outside the bucket (a key that climbed out with "..") shows up too.
   */
  objects(): string[];
  /** The bytes of one object, by the same "<bucket>/<key>" name. */
  read(object: string): Buffer;
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
    // s3rver keeps each object as "<key>._S3rver_object", beside its metadata and checksum files.
    objects: () => filesUnder(directory).filter((path) => path.endsWith(OBJECT)).map((path) => path.slice(0, -OBJECT.length)),
    read: (object) => readFileSync(join(directory, `${object}${OBJECT}`)),
    close: async () => {
      await server.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
