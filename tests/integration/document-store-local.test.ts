import { mkdirSync, rmSync } from "node:fs";
import { afterAll, vi } from "vitest";

const root = vi.hoisted(() => {
  const tmp = process.env.TMPDIR ?? "/tmp";
  const root = `${tmp}/towmargin-store-local-${process.pid}-${Date.now()}`;
  process.env.DATABASE_URL = `file:${root}.db`;
  process.env.UPLOAD_DIR = `${root}/uploads`;
  delete process.env.S3_BUCKET;
  process.env.SMTP_PORT = "9";
  return root;
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { filesUnder } from "../support/files";
import { documentStoreContract } from "./support/document-store-contract";

// The folder's parent is watched too, so a key that climbed out of the folder would be seen.
mkdirSync(`${root}/uploads`, { recursive: true });
afterAll(() => rmSync(root, { recursive: true, force: true }));

documentStoreContract({ driver: "local", prefix: "uploads/", objects: () => filesUnder(root) });
