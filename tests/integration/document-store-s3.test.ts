import { afterAll, describe, expect, it, vi } from "vitest";

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

import { documentStoreContract, PNG } from "./support/document-store-contract";

afterAll(() => fake.close());

// The fake's whole folder is watched, so an object outside the bucket or the prefix would be seen.
documentStoreContract({ driver: "s3", prefix: `${fake.bucket}/vehicle-documents/`, objects: () => fake.objects() });

describe("the S3 prefix", () => {
  it("is a folder: a prefix given without its slash keeps keys under it, not beside it", async () => {
    const { s3Store } = await import("@/lib/server/storage/s3");
    const { FAKE_S3_CREDENTIALS } = await import("../support/fake-s3");
    const store = s3Store({ bucket: fake.bucket, region: "us-east-1", endpoint: fake.endpoint, forcePathStyle: true, prefix: "label-archive", ...FAKE_S3_CREDENTIALS });
    await store.put("org-a/prefix.png", PNG, "image/png");
    expect(fake.objects()).toContain(`${fake.bucket}/label-archive/org-a/prefix.png`);
    await store.delete("org-a/prefix.png");
    expect(fake.objects()).not.toContain(`${fake.bucket}/label-archive/org-a/prefix.png`);
  });
});
