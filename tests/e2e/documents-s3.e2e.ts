import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seededDatabase, startApp, type AppDatabase, type AppServer } from "../load/support/app-server";
import { filesUnder } from "../support/files";
import { FAKE_S3_CREDENTIALS, startFakeS3, type FakeS3 } from "../support/fake-s3";
import { DESKTOP, openBrowser, screenshot, signIn } from "./support/browser";

// A 1×1 PNG: a photo by its content.
const PNG = Buffer.from(
  "89504e470d0a1a0a0000000d4948445200000001000000010802000000907753de0000000c4944415408d763f8cfc000000301010018dd8db00000000049454e44ae426082",
  "hex",
);

/**
 * The app with its documents in S3: a second production server of the same build, over its own seeded
 * database, pointed at the local S3 fake (path-style, as for any S3-compatible store). The suite's own server
 * keeps the folder driver.
 */
describe("label photos kept in S3", () => {
  let fake: FakeS3;
  let database: AppDatabase;
  let server: AppServer;
  let uploadDir: string;

  beforeAll(async () => {
    fake = await startFakeS3();
    database = seededDatabase("towmargin-s3-e2e-");
    uploadDir = mkdtempSync(join(tmpdir(), "towmargin-s3-e2e-uploads-"));
    server = await startApp(database.url, {
      S3_BUCKET: fake.bucket,
      S3_ENDPOINT: fake.endpoint,
      S3_FORCE_PATH_STYLE: "on",
      S3_ACCESS_KEY_ID: FAKE_S3_CREDENTIALS.accessKeyId,
      S3_SECRET_ACCESS_KEY: FAKE_S3_CREDENTIALS.secretAccessKey,
      // Watched below: with a bucket set, nothing may land in the folder.
      UPLOAD_DIR: uploadDir,
    });
  });
  afterAll(async () => {
    await server?.stop();
    await fake?.close();
    database?.remove();
    rmSync(uploadDir, { recursive: true, force: true });
  });

  it("uploads a label photo on a vehicle and downloads the same bytes back through the app", async () => {
    const browser = await openBrowser(DESKTOP, server.baseURL);
    try {
      const { page } = browser;
      await signIn(page, "fleet@fernhollow.example.com");
      await page.goto("/fleet/vehicles");
      await page.getByRole("link", { name: "Crew truck 01 · Tallow 2500", exact: true }).click();
      await page.getByLabel("Photo or PDF").setInputFiles({ name: "door label.png", mimeType: "image/png", buffer: PNG });
      await page.getByRole("button", { name: "Upload" }).click();
      const link = page.getByRole("link", { name: "door label.png" });
      await link.waitFor();
      await screenshot(page, "fleet-vehicle-s3-desktop");

      // The object sits in the bucket under the documents' prefix, and the local folder stays empty.
      const objects = fake.objects();
      expect(objects).toHaveLength(1);
      expect(objects[0]).toMatch(new RegExp(`^${fake.bucket}/vehicle-documents/org-fernhollow/[A-Za-z0-9_-]+\\.png$`));
      expect(fake.read(objects[0]!)).toEqual(PNG);
      expect(filesUnder(uploadDir)).toEqual([]);

      // Opened as a person would: the link opens the photo in a new tab, streamed from the bucket by the app.
      const [opened] = await Promise.all([
        browser.context.waitForEvent("response", (response) => response.url().includes("/api/v1/fleet/documents/")),
        link.click(),
      ]);
      expect(opened.status()).toBe(200);
      expect(opened.headers()["content-type"]).toBe("image/png");
      expect(opened.headers()["content-disposition"]).toMatch(/^inline; filename="door label.png"/);
      expect(await opened.body()).toEqual(PNG);

      // And saved as a file: without ?view=1 the same address answers with an attachment.
      const saved = await page.request.get(opened.url().replace("?view=1", ""));
      expect(saved.headers()["content-disposition"]).toMatch(/^attachment; filename="door label.png"/);
      expect(await saved.body()).toEqual(PNG);
    } finally {
      await browser.close();
    }
  });
});
