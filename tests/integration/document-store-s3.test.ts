import { afterAll, vi } from "vitest";

// The fake S3 server starts before any module reads the environment, so documentStore() selects S3.
const fake = await vi.hoisted(async () => {
  const { FAKE_S3_CREDENTIALS, startFakeS3 } = await import("../support/fake-s3");
  const fake = await startFakeS3();
  const tmp = process.env.TMPDIR ?? "/tmp";
  process.env.DATABASE_URL = `file:${tmp}/towmargin-store-s3-${process.pid}-${Date.now()}.db`;
  process.env.UPLOAD_DIR = `${fake.directory}/not-used`;
  process.env.S3_BUCKET = fake.bucket;
  process.env.S3_ENDPOINT = fake.endpoint;
  process.env.S3_FORCE_PATH_STYLE = "on";
  process.env.S3_ACCESS_KEY_ID = FAKE_S3_CREDENTIALS.accessKeyId;
  process.env.S3_SECRET_ACCESS_KEY = FAKE_S3_CREDENTIALS.secretAccessKey;
  process.env.SMTP_PORT = "9";
  return fake;
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { documentStoreContract, filesUnder } from "./support/document-store-contract";

afterAll(() => fake.close());

// s3rver keeps each object as "<bucket>/<key>._S3rver_object" (beside its metadata) under its folder; the
// whole folder is watched, so an object outside the bucket or the prefix would be seen.
const OBJECT = "._S3rver_object";
documentStoreContract({
  driver: "s3",
  prefix: `${fake.bucket}/vehicle-documents/`,
  objects: () => filesUnder(fake.directory).filter((path) => path.endsWith(OBJECT)).map((path) => path.slice(0, -OBJECT.length)),
});
