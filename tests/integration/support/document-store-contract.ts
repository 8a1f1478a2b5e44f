import { createHash } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { saveProfileAction } from "@/app/(workspace)/fleet/actions";
import { POST as uploadRoute } from "@/app/api/v1/fleet/documents/route";
import { GET as documentRoute } from "@/app/api/v1/fleet/documents/[id]/route";
import { getDb } from "@/db/client";
import { vehicleDocuments } from "@/db/schema";
import { env } from "@/lib/env";
import { documentStore } from "@/lib/server/storage";
import { actAs, buildFixture } from "./fixture";

/**
 * What a driver's backing holds, seen from outside the driver: every stored object as a path from a root
 * above the store's own folder or prefix (so a key that escaped would show up), and that folder or prefix.
 */
export interface StoreBacking {
  /** The driver the environment should select, checked against documentStore(). */
  driver: "local" | "s3";
  /** Every object a key of this store may become, and nothing else, starts with this. */
  prefix: string;
  objects(): string[];
}

// A 1×1 PNG (its bytes make it a PNG by content).
export const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1, 8, 2, 0, 0, 0, 0x90, 0x77, 0x53, 0xde, 0, 0, 0, 0x0c, 0x49, 0x44, 0x41, 0x54, 0x08, 0xd7, 0x63, 0xf8, 0xcf, 0xc0, 0, 0, 0x03, 0x01, 0x01, 0, 0x18, 0xdd, 0x8d, 0xb0, 0, 0, 0, 0, 0x49, 0x45, 0x4e, 0x44, 0xae, 0x42, 0x60, 0x82]);

/** Keys a caller could be tricked into passing: each must be refused before anything is read or written. */
const ESCAPING_KEYS = [
  "../outside.png",
  "org-a/../../outside.png",
  "org-a/../org-b/x.png",
  "/etc/outside.png",
  "org-a//x.png",
  "./x.png",
  "org-a/./x.png",
  ".hidden.png",
  "org-a\\..\\outside.png",
  "org-a/x.png%2F..%2F..%2Foutside.png",
  "org-a/x.png\u0000",
  "org-a/x .png",
  "",
  `org-a/${"a".repeat(600)}.png`,
];

const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

async function readAll(body: ReadableStream<Uint8Array>): Promise<Uint8Array> {
  return new Uint8Array(await new Response(body).arrayBuffer());
}

function uploadRequest(vehicleId: string, bytes: Uint8Array<ArrayBuffer>, fileName: string) {
  const body = new FormData();
  body.set("vehicleId", vehicleId);
  body.set("kind", "door-jamb-label");
  body.set("file", new File([bytes], fileName, { type: "image/png" }));
  return new Request("http://t/api/v1/fleet/documents", { method: "POST", body });
}

const TRUCK = { name: "Store test truck", units: "imperial", vehicle: { gvwr: "9900", curbWeight: "6400", towRating: "9000" }, hitch: { class: "4", gtwRating: "10000", twRating: "1000", receiverHeight: "20.5", pinToFascia: "5" } };

/**
 * The storage contract every driver keeps, run against the store the environment selects (documentStore())
 * and, for uploads, through the app's own route. The calling test file sets the environment (hoisted) and
 * mocks next/headers, next/navigation and next/cache.
 */
export function documentStoreContract(backing: StoreBacking) {
  let truck = "";

  beforeAll(async () => {
    await buildFixture();
    await actAs("fleetA");
    const saved = await saveProfileAction({ kind: "vehicles", values: TRUCK });
    expect(saved).toMatchObject({ ok: true });
    truck = saved.id!;
  });

  describe(`the ${backing.driver} driver`, () => {
    it("is the one the environment selects", () => {
      expect(Boolean(env.S3_BUCKET)).toBe(backing.driver === "s3");
    });

    it("puts, gets and deletes an object under its prefix", async () => {
      const store = documentStore();
      await store.put("org-a/contract-put.png", PNG, "image/png");
      expect(backing.objects()).toContain(`${backing.prefix}org-a/contract-put.png`);
      const object = await store.get("org-a/contract-put.png");
      expect(object).not.toBeNull();
      expect(object!.size).toBe(PNG.byteLength);
      expect(await readAll(object!.body)).toEqual(PNG);
      await store.delete("org-a/contract-put.png");
      expect(await store.get("org-a/contract-put.png")).toBeNull();
      expect(backing.objects()).not.toContain(`${backing.prefix}org-a/contract-put.png`);
    });

    it("a missing key reads as nothing, and deleting it is not an error", async () => {
      const store = documentStore();
      expect(await store.get("org-a/never-stored.png")).toBeNull();
      await expect(store.delete("org-a/never-stored.png")).resolves.toBeUndefined();
    });

    it("refuses a key that could leave its prefix, before reading or writing anything", async () => {
      const store = documentStore();
      const before = backing.objects();
      for (const key of ESCAPING_KEYS) {
        await expect(store.put(key, PNG, "image/png"), JSON.stringify(key)).rejects.toThrow("Invalid storage key.");
        await expect(store.get(key), JSON.stringify(key)).rejects.toThrow("Invalid storage key.");
        await expect(store.delete(key), JSON.stringify(key)).rejects.toThrow("Invalid storage key.");
      }
      expect(backing.objects()).toEqual(before);
      for (const object of backing.objects()) expect(object.startsWith(backing.prefix), object).toBe(true);
    });
  });

  describe(`uploads through the app with the ${backing.driver} driver`, () => {
    it("a file of exactly the largest size is stored whole and downloads back byte for byte", async () => {
      await actAs("fleetA");
      const big = new Uint8Array(env.UPLOAD_MAX_BYTES);
      for (let i = PNG.byteLength; i < big.length; i += 4093) big[i] = i % 251;
      big.set(PNG);
      const response = await uploadRoute(uploadRequest(truck, big, "full label.png"));
      expect(response.status).toBe(201);
      const { document } = (await response.json()) as { document: { id: string; sizeBytes: number } };
      expect(document.sizeBytes).toBe(8 * 1024 * 1024); // The shipped limit: 8 MB (lib/env.ts default).

      const db = await getDb();
      const row = (await db.select().from(vehicleDocuments)).find((r) => r.id === document.id)!;
      expect(backing.objects()).toContain(`${backing.prefix}${row.storageKey}`);

      await actAs("trainerA");
      const download = await documentRoute(new Request("http://t/"), { params: Promise.resolve({ id: document.id }) });
      expect(download.status).toBe(200);
      expect(download.headers.get("content-length")).toBe(String(big.byteLength));
      expect(sha256(new Uint8Array(await download.arrayBuffer()))).toBe(sha256(big));
    });

    it("one byte over the largest size, a page of script and a GIF are refused and store nothing", async () => {
      await actAs("fleetA");
      const db = await getDb();
      const rowsBefore = (await db.select().from(vehicleDocuments)).length;
      const before = backing.objects();

      const over = new Uint8Array(env.UPLOAD_MAX_BYTES + 1);
      over.set(PNG);
      const tooLarge = await uploadRoute(uploadRequest(truck, over, "label.png"));
      expect(tooLarge.status).toBe(413);

      const script = await uploadRoute(uploadRequest(truck, new TextEncoder().encode("<html><script>alert(1)</script></html>"), "label.png"));
      expect(script.status).toBe(400);
      expect(((await script.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors.file![0]).toMatch(/photo .* or a PDF/);

      // A real image, but not a type a label is kept as: a GIF (its 6-byte signature and a minimal header).
      const gif = new Uint8Array([0x47, 0x49, 0x46, 0x38, 0x39, 0x61, 1, 0, 1, 0, 0, 0, 0, 0x3b]);
      expect((await uploadRoute(uploadRequest(truck, gif, "label.png"))).status).toBe(400);

      expect((await db.select().from(vehicleDocuments)).length).toBe(rowsBefore);
      expect(backing.objects()).toEqual(before);
    });
  });
}
