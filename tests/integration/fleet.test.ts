import { readFileSync, rmSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  const tmp = process.env.TMPDIR ?? "/tmp";
  process.env.DATABASE_URL = `file:${tmp}/towmargin-fleet-${process.pid}-${Date.now()}.db`;
  process.env.UPLOAD_DIR = `${tmp}/towmargin-fleet-uploads-${process.pid}-${Date.now()}`;
  process.env.SMTP_PORT = "9";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { archiveProfileAction, deleteDocumentAction, saveProfileAction } from "@/app/(workspace)/fleet/actions";
import { GET as listRoute } from "@/app/api/v1/fleet/[kind]/route";
import { GET as profileRoute } from "@/app/api/v1/fleet/[kind]/[id]/route";
import { GET as exportRoute } from "@/app/api/v1/fleet/[kind]/export/route";
import { GET as templateRoute } from "@/app/api/v1/fleet/[kind]/template/route";
import { POST as uploadRoute } from "@/app/api/v1/fleet/documents/route";
import { GET as documentRoute } from "@/app/api/v1/fleet/documents/[id]/route";
import { POST as importRoute } from "@/app/api/v1/fleet/import/route";
import { GET as matrixRoute } from "@/app/api/v1/fleet/matrix/route";
import { evaluatePair, profilePart } from "@/lib/fleet/matrix";
import { getDb } from "@/db/client";
import { accessoryProfiles, trailerProfiles, vehicleDocuments, vehicleProfiles } from "@/db/schema";
import { env } from "@/lib/env";
import { rigFromProfiles } from "@/lib/server/fleet";
import { settledPairRechecks } from "@/lib/server/pair-verdicts";
import { getAccess } from "@/lib/server/access";
import { actAs, buildFixture, ORG_B, type Person } from "./support/fixture";

type Actor = Person | "anonymous";

const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1, 8, 2, 0, 0, 0, 0x90, 0x77, 0x53, 0xde, 0, 0, 0, 0x0c, 0x49, 0x44, 0x41, 0x54, 0x08, 0xd7, 0x63, 0xf8, 0xcf, 0xc0, 0, 0, 0x03, 0x01, 0x01, 0, 0x18, 0xdd, 0x8d, 0xb0, 0, 0, 0, 0, 0x49, 0x45, 0x4e, 0x44, 0xae, 0x42, 0x60, 0x82]);

// Invented figures for an invented truck and trailer; only their validity matters here.
const TRUCK = { name: "Crew truck 1", units: "imperial", vehicle: { gvwr: "9900", curbWeight: "6400", towRating: "9000" }, hitch: { class: "4", gtwRating: "10000", twRating: "1000", receiverHeight: "20.5", pinToFascia: "5" } };
const TRAILER = { name: "Mower trailer 1", units: "imperial", trailer: { type: "utility", grossTrailerWeight: "3000", tongueWeight: "360", couplerHeight: "17.5" } };

async function fleetSnapshot() {
  const db = await getDb();
  return JSON.stringify({
    vehicles: await db.select().from(vehicleProfiles).orderBy(vehicleProfiles.id),
    trailers: await db.select().from(trailerProfiles).orderBy(trailerProfiles.id),
    accessories: await db.select().from(accessoryProfiles).orderBy(accessoryProfiles.id),
    documents: await db.select().from(vehicleDocuments).orderBy(vehicleDocuments.id),
  });
}

const params = <T extends Record<string, string>>(value: T) => ({ params: Promise.resolve(value) });

function importRequest(csv: string | Uint8Array<ArrayBuffer>, fields: Record<string, string>, fileName = "fleet.csv") {
  const body = new FormData();
  for (const [key, value] of Object.entries(fields)) body.set(key, value);
  body.set("file", new File([csv], fileName, { type: "text/csv" }));
  return new Request("http://t/api/v1/fleet/import", { method: "POST", body });
}

function uploadRequest(vehicleId: string, bytes: Uint8Array<ArrayBuffer>, fileName = "label.png", kind = "door-jamb-label") {
  const body = new FormData();
  body.set("vehicleId", vehicleId);
  body.set("kind", kind);
  body.set("file", new File([bytes], fileName, { type: "image/png" }));
  return new Request("http://t/api/v1/fleet/documents", { method: "POST", body });
}

let truckOfA = "";
let trailerOfA = "";
let documentOfA = "";

beforeAll(async () => {
  await buildFixture();
  await actAs("fleetA");
  const truck = await saveProfileAction({ kind: "vehicles", values: TRUCK });
  expect(truck).toMatchObject({ ok: true });
  truckOfA = truck.id!;
  const trailer = await saveProfileAction({ kind: "trailers", values: TRAILER });
  expect(trailer.ok).toBe(true);
  trailerOfA = trailer.id!;
  const upload = await uploadRoute(uploadRequest(truckOfA, PNG));
  expect(upload.status).toBe(201);
  documentOfA = ((await upload.json()) as { document: { id: string } }).document.id;
});

afterAll(() => {
  rmSync(env.UPLOAD_DIR, { recursive: true, force: true });
});

describe("profiles: create, edit, archive", () => {
  it("stores a profile as the core's rig parts, in its units", async () => {
    const db = await getDb();
    const row = (await db.select().from(vehicleProfiles)).find((r) => r.id === truckOfA)!;
    expect(row.organisationId).toBe("org-a");
    expect(row.data).toEqual({
      units: "imperial",
      vehicle: { towRating: 9000, gvwr: 9900, curbWeight: 6400 },
      hitch: { class: 4, gtwRating: 10000, twRating: 1000, receiverHeight: 20.5, pinToFascia: 5 },
    });
  });

  it("edits, refuses a name already used, and archives and restores", async () => {
    await actAs("ownerA");
    expect((await saveProfileAction({ kind: "vehicles", id: truckOfA, values: { ...TRUCK, vehicle: { ...TRUCK.vehicle, gvwr: "10000" } } })).ok).toBe(true);
    const clash = await saveProfileAction({ kind: "trailers", values: { ...TRAILER, name: "mower TRAILER 1" } });
    expect(clash.ok).toBe(false);
    expect(clash.fieldErrors).toHaveProperty("name");
    expect((await archiveProfileAction({ kind: "trailers", id: trailerOfA, archived: true })).ok).toBe(true);
    const list = (await (await listRoute(new Request("http://t/api/v1/fleet/trailers"), params({ kind: "trailers" }))).json()) as { profiles: unknown[] };
    expect(list.profiles).toHaveLength(0);
    expect((await archiveProfileAction({ kind: "trailers", id: trailerOfA, archived: false })).ok).toBe(true);
  });

  it("bad input gets field errors and writes nothing", async () => {
    await actAs("fleetA");
    const before = await fleetSnapshot();
    const state = await saveProfileAction({ kind: "vehicles", values: { ...TRUCK, name: "", vehicle: { gvwr: "heavy" }, hitch: { receiverHeight: "900" } } });
    expect(state.ok).toBe(false);
    expect(Object.keys(state.fieldErrors ?? {}).sort()).toEqual(["hitch.receiverHeight", "name", "vehicle.gvwr"]);
    expect((await saveProfileAction({ kind: "boats", values: TRUCK })).fieldErrors).toHaveProperty("kind");
    expect((await saveProfileAction("not an object")).ok).toBe(false);
    expect((await archiveProfileAction({ kind: "vehicles", id: "../../x", archived: true })).ok).toBe(false);
    expect(await fleetSnapshot()).toEqual(before);
  });

  it("the check screen's start from two profiles composes one rig, only from the organisation's own", async () => {
    await actAs("staffA");
    const access = (await getAccess())!;
    const rig = await rigFromProfiles(access, { vehicle: truckOfA, trailer: trailerOfA });
    expect(rig).toMatchObject({ units: "imperial", name: "Crew truck 1", vehicle: { gvwr: 10000 }, trailer: { type: "utility" } });
    await actAs("ownerB");
    expect(await rigFromProfiles((await getAccess())!, { vehicle: truckOfA, trailer: trailerOfA })).toBeUndefined();
  });
});

describe("actions refuse who may not edit, and write nothing", () => {
  const refused: Actor[] = ["anonymous", "staffA", "trainerA", "ownerB"];
  for (const actor of refused) {
    it(`${actor}: save, edit, archive, remove a document`, async () => {
      await actAs(actor);
      const before = await fleetSnapshot();
      if (actor !== "ownerB") expect((await saveProfileAction({ kind: "vehicles", values: { ...TRUCK, name: "Sneaky truck" } })).ok).toBe(false);
      expect((await saveProfileAction({ kind: "vehicles", id: truckOfA, values: { ...TRUCK, name: "Renamed" } })).ok).toBe(false);
      expect((await archiveProfileAction({ kind: "vehicles", id: truckOfA, archived: true })).ok).toBe(false);
      expect((await deleteDocumentAction({ id: documentOfA })).ok).toBe(false);
      // B's owner may edit B's own fleet: for A's records the answer is "not in this organisation".
      expect(await fleetSnapshot()).toEqual(before);
    });
  }
});

describe("routes: signed out 401, wrong role 403, another organisation sees nothing of A", () => {
  const reads = () => [
    listRoute(new Request("http://t/api/v1/fleet/vehicles"), params({ kind: "vehicles" })),
    profileRoute(new Request("http://t/"), params({ kind: "vehicles", id: truckOfA })),
    exportRoute(new Request("http://t/api/v1/fleet/vehicles/export"), params({ kind: "vehicles" })),
    templateRoute(new Request("http://t/"), params({ kind: "vehicles" })),
    matrixRoute(new Request("http://t/api/v1/fleet/matrix")),
    documentRoute(new Request("http://t/"), params({ id: documentOfA })),
    importRoute(importRequest("name,units\nX,imperial\n", { kind: "vehicles", units: "column", mode: "preview" })),
    importRoute(importRequest("name,units\nX,imperial\n", { kind: "vehicles", units: "column", mode: "valid-rows" })),
    uploadRoute(uploadRequest(truckOfA, PNG)),
  ];

  it("anonymous: every route answers 401 and writes nothing", async () => {
    await actAs("anonymous");
    const before = await fleetSnapshot();
    for (const response of await Promise.all(reads())) {
      expect(response.status).toBe(401);
      expect(((await response.json()) as { error: string }).error).toBe("unauthenticated");
    }
    expect(await fleetSnapshot()).toEqual(before);
  });

  for (const actor of ["staffA", "trainerA"] as const) {
    it(`${actor}: reads the fleet; importing and uploading answer 403 and write nothing`, async () => {
      await actAs(actor);
      const before = await fleetSnapshot();
      const statuses = await Promise.all(reads().map(async (r) => (await r).status));
      expect(statuses).toEqual([200, 200, 200, 200, 200, 200, 200, 403, 403]);
      expect(await fleetSnapshot()).toEqual(before);
    });
  }

  it("ownerB: A's profile and document are not found, lists and the matrix hold none of A's, uploads to A's vehicle are refused", async () => {
    await actAs("ownerB");
    const before = await fleetSnapshot();
    const list = (await (await listRoute(new Request("http://t/api/v1/fleet/vehicles?archived=include"), params({ kind: "vehicles" }))).json()) as { profiles: unknown[] };
    expect(list.profiles).toEqual([]);
    expect((await profileRoute(new Request("http://t/"), params({ kind: "vehicles", id: truckOfA }))).status).toBe(404);
    expect((await documentRoute(new Request("http://t/"), params({ id: documentOfA }))).status).toBe(404);
    const exported = await (await exportRoute(new Request("http://t/api/v1/fleet/vehicles/export?archived=include"), params({ kind: "vehicles" }))).text();
    expect(exported).not.toContain("Crew truck 1");
    const matrix = (await (await matrixRoute(new Request("http://t/api/v1/fleet/matrix"))).json()) as { rows: unknown[]; columns: unknown[] };
    expect(matrix.rows).toEqual([]);
    expect(matrix.columns).toEqual([]);
    const upload = await uploadRoute(uploadRequest(truckOfA, PNG));
    expect(upload.status).toBe(404);
    // Importing names A already uses is B's own business: the duplicate check looks at B only.
    const preview = (await (await importRoute(importRequest("name,units\nCrew truck 1,imperial\n", { kind: "vehicles", units: "column", mode: "preview" }))).json()) as { validCount: number };
    expect(preview.validCount).toBe(1);
    expect(await fleetSnapshot()).toEqual(before);
  });

  it("bad parameters answer 400 or 404 with field errors, never a stack trace", async () => {
    await actAs("fleetA");
    const bad = await matrixRoute(new Request("http://t/api/v1/fleet/matrix?level=purple&pageSize=100000"));
    expect(bad.status).toBe(400);
    expect(Object.keys(((await bad.json()) as { fieldErrors: object }).fieldErrors).sort()).toEqual(["level", "pageSize"]);
    expect((await listRoute(new Request("http://t/"), params({ kind: "boats" }))).status).toBe(404);
    expect((await profileRoute(new Request("http://t/"), params({ kind: "vehicles", id: "../../etc" }))).status).toBe(404);
    const badImport = await importRoute(importRequest("name\nA\n", { kind: "vehicles", units: "furlongs", mode: "now" }));
    expect(badImport.status).toBe(400);
    expect(Object.keys(((await badImport.json()) as { fieldErrors: object }).fieldErrors).sort()).toEqual(["mode", "units"]);
    const notForm = await importRoute(new Request("http://t/api/v1/fleet/import", { method: "POST", body: "hello", headers: { "content-type": "text/plain" } }));
    expect(notForm.status).toBe(400);
  });
});

describe("documents", () => {
  it("serves the file to a member with the stored type, a download name and nosniff", async () => {
    await actAs("trainerA");
    const response = await documentRoute(new Request("http://t/"), params({ id: documentOfA }));
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("image/png");
    expect(response.headers.get("x-content-type-options")).toBe("nosniff");
    expect(response.headers.get("content-disposition")).toMatch(/^attachment; filename="label.png"/);
    expect(new Uint8Array(await response.arrayBuffer())).toEqual(PNG);
  });

  it("judges the type by the content: text named .png, and a file over the limit, are refused", async () => {
    await actAs("fleetA");
    const before = await fleetSnapshot();
    const fake = await uploadRoute(uploadRequest(truckOfA, new TextEncoder().encode("<html><script>alert(1)</script></html>"), "label.png"));
    expect(fake.status).toBe(400);
    expect(((await fake.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors.file![0]).toMatch(/photo .* or a PDF/);
    const big = new Uint8Array(env.UPLOAD_MAX_BYTES + 1);
    big.set(PNG);
    expect((await uploadRoute(uploadRequest(truckOfA, big))).status).toBe(413);
    expect((await uploadRoute(uploadRequest(truckOfA, PNG, "label.png", "selfie"))).status).toBe(400);
    expect(await fleetSnapshot()).toEqual(before);
  });

  it("a PDF is accepted by its bytes whatever its name", async () => {
    await actAs("fleetA");
    const pdf = new TextEncoder().encode("%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n");
    const response = await uploadRoute(uploadRequest(truckOfA, pdf, "hitch label.txt", "hitch-label"));
    expect(response.status).toBe(201);
    const { document } = (await response.json()) as { document: { id: string; contentType: string } };
    expect(document.contentType).toBe("application/pdf");
    expect((await deleteDocumentAction({ id: document.id })).ok).toBe(true);
  });
});

describe("import", () => {
  const header = "name,units,gvwr,curb_weight,gawr_front,gawr_rear,gcwr,tow_max,tongue_max,hitch_class,receiver_opening,hitch_gtw,hitch_tw,receiver_height,pin_to_fascia";
  const rows = (n: number, prefix: string) => Array.from({ length: n }, (_, i) => `${prefix} ${i + 1},imperial,9900,6400,4800,6000,18000,9000,900,4,2,10000,1000,${(19 + (i % 4) * 0.5).toFixed(1)},5`);

  it("all or nothing: one bad row and nothing at all is written", async () => {
    await actAs("fleetA");
    const before = await fleetSnapshot();
    const csv = [header, ...rows(20, "Batch truck"), "Broken truck,imperial,9900 kg,6400,,,,,,,,,,,"].join("\n");
    const response = await importRoute(importRequest(csv, { kind: "vehicles", units: "column", mode: "all-or-nothing" }));
    const body = (await response.json()) as { outcome: string; imported: number; errorCount: number; validCount: number };
    expect(body).toMatchObject({ outcome: "refused", imported: 0, errorCount: 1, validCount: 20 });
    expect(await fleetSnapshot()).toEqual(before);
  });

  it("a file that is not CSV, or too large, is refused before anything is read", async () => {
    await actAs("fleetA");
    const before = await fleetSnapshot();
    const pdf = await importRoute(importRequest(new TextEncoder().encode("%PDF-1.7 binary"), { kind: "vehicles", units: "imperial", mode: "valid-rows" }, "fleet.csv"));
    expect(pdf.status).toBe(400);
    const big = await importRoute(importRequest(new Uint8Array(10 * 1024 * 1024).fill(0x41), { kind: "vehicles", units: "imperial", mode: "valid-rows" }));
    expect(big.status).toBe(413);
    expect(await fleetSnapshot()).toEqual(before);
  });

  it("1,000 valid rows import in one go", async () => {
    await actAs("fleetA");
    const csv = [header, ...rows(1000, "Import truck")].join("\n");
    const started = performance.now();
    const response = await importRoute(importRequest(csv, { kind: "vehicles", units: "column", mode: "valid-rows" }));
    const elapsed = performance.now() - started;
    const body = (await response.json()) as { outcome: string; imported: number };
    console.log(`import of 1,000 vehicle rows: ${elapsed.toFixed(0)} ms`);
    expect(body).toMatchObject({ outcome: "imported", imported: 1000 });
    const db = await getDb();
    expect((await db.select().from(vehicleProfiles)).filter((r) => r.name.startsWith("Import truck"))).toHaveLength(1000);
    // The same file again: every row is now a duplicate of the fleet's names.
    const again = (await (await importRoute(importRequest(csv, { kind: "vehicles", units: "column", mode: "valid-rows" }))).json()) as { outcome: string; errorCount: number };
    expect(again).toMatchObject({ outcome: "nothing-to-import", errorCount: 1000 });
  });
});

describe("the pairing matrix at 500 × 200", () => {
  // Correctness only: how fast a filtered page answers against an unfiltered one is `npm run bench`'s to say.
  it("answers a page, a verdict filter over every pair and a later filtered page, each cell the pair's own verdict", async () => {
    // B gets 500 vehicles and 200 trailers and accessories, written directly (invented figures).
    const db = await getDb();
    const vehicles = Array.from({ length: 500 }, (_, i) => ({
      id: `mv-${i}`,
      organisationId: ORG_B,
      name: `Matrix truck ${String(i).padStart(3, "0")}`,
      units: "imperial" as const,
      data: {
        units: "imperial",
        vehicle: { towRating: 5000 + (i % 10) * 500, tongueWeightLimit: 500 + (i % 10) * 50, gvwr: 7000, curbWeight: 5000, gcwr: 13000 + (i % 5) * 500, gawrFront: 3700, gawrRear: 4000, axleWeights: { front: 3000, rear: 2500 }, wheelbase: 140, rearAxleToHitch: 50 },
        hitch: { class: 3, gtwRating: 6000 + (i % 4) * 1000, twRating: 600 + (i % 4) * 100, receiverHeight: 19 + (i % 5) * 0.5, pinToFascia: 5 },
      },
    }));
    const hitched = Array.from({ length: 160 }, (_, i) => ({
      id: `mt-${i}`,
      organisationId: ORG_B,
      name: `Matrix trailer ${String(i).padStart(3, "0")}`,
      units: "imperial" as const,
      data: { units: "imperial", trailer: { type: "utility", grossTrailerWeight: 2000 + i * 40, tongueWeight: 240 + i * 5, tongueWeightBasis: "measured", couplerHeight: 17 }, ballMount: { drop: 2 } },
    }));
    const racks = Array.from({ length: 40 }, (_, i) => ({
      id: `ma-${i}`,
      organisationId: ORG_B,
      name: `Matrix rack ${String(i).padStart(2, "0")}`,
      units: "imperial" as const,
      data: { units: "imperial", accessory: { type: "cargo-carrier", weight: 50, loadWeight: 100 + i * 10, loadCenterFromPin: 20 } },
    }));
    for (let i = 0; i < vehicles.length; i += 100) await db.insert(vehicleProfiles).values(vehicles.slice(i, i + 100));
    for (let i = 0; i < hitched.length; i += 100) await db.insert(trailerProfiles).values(hitched.slice(i, i + 100));
    await db.insert(accessoryProfiles).values(racks);

    await actAs("ownerB");
    const time = async (url: string) => {
      const started = performance.now();
      const response = await matrixRoute(new Request(url));
      const elapsed = performance.now() - started;
      type Cell = { level: string } | null;
      return { elapsed, body: (await response.json()) as { totalRows: number; totalColumns: number; rows: Array<{ id: string; cells: Cell[] }>; columns: Array<{ id: string }>; counts: { within: number; tight: number; adjust: number; over: number; incomplete: number } | null; evaluated: number; rechecking: boolean } };
    };
    // The first look at a fleet this size starts the recheck of the stored verdicts and answers at once: the
    // page's own cells, worked out for it; no counts, and a verdict filter matches nothing until it is done.
    const page = await time("http://t/api/v1/fleet/matrix?pageSize=25&colPageSize=10");
    const early = await time("http://t/api/v1/fleet/matrix?level=over&pageSize=25&colPageSize=10");
    expect(page.body).toMatchObject({ rechecking: true, counts: null, totalRows: 500, totalColumns: 200, evaluated: 250 });
    expect(page.body.rows).toHaveLength(25);
    expect(page.body.rows[0]!.cells).toHaveLength(10);
    expect(early.body).toMatchObject({ rechecking: true, counts: null, totalRows: 0, rows: [] });
    await settledPairRechecks();
    // Stored and current: every answer is now a query, the counts cover all 100,000 pairs.
    const stored = await time("http://t/api/v1/fleet/matrix?pageSize=25&colPageSize=10");
    const filtered = await time("http://t/api/v1/fleet/matrix?level=over&pageSize=25&colPageSize=10");
    const cached = await time("http://t/api/v1/fleet/matrix?level=within&vehicle=truck%2001&page=1");
    console.log(
      `matrix 500 × 200: first page ${page.elapsed.toFixed(0)} ms (${page.body.evaluated} pairs), stored first page ${stored.elapsed.toFixed(0)} ms, verdict filter over all 100,000 pairs ${filtered.elapsed.toFixed(0)} ms, later filtered page ${cached.elapsed.toFixed(0)} ms`,
    );
    expect(stored.body).toMatchObject({ rechecking: false, evaluated: 0 });
    // The stored cells are the ones the first page worked out alone.
    expect(stored.body.rows.map((row) => row.cells.map((cell) => cell?.level))).toEqual(page.body.rows.map((row) => row.cells.map((cell) => cell?.level)));
    const counts = filtered.body.counts!;
    expect(counts.within + counts.tight + counts.adjust + counts.over + counts.incomplete).toBe(100_000);
    expect(stored.body.counts).toEqual(counts);
    // The filtered page holds only "over" cells (the others blank), and some of them.
    expect(filtered.body.totalRows).toBeGreaterThan(0);
    for (const row of filtered.body.rows) expect(row.cells.every((cell) => cell === null || cell.level === "over")).toBe(true);
    expect(filtered.body.rows.some((row) => row.cells.some((cell) => cell?.level === "over"))).toBe(true);
    // A cell is the verdict of its pair, worked out alone.
    const profiles = new Map([...vehicles, ...hitched, ...racks].map((p) => [p.id, p]));
    const part = (id: string) => profilePart(profiles.get(id)! as { units: "imperial"; data: Record<string, unknown> }, "imperial");
    const first = filtered.body.rows[0]!;
    first.cells.forEach((cell, c) => {
      if (cell) expect(cell.level).toBe(evaluatePair("imperial", part(first.id), part(filtered.body.columns[c]!.id), 0.1).level);
    });
    // The same counts again for the same filter, and the later page only holds trucks named "… 01…".
    const c = cached.body.counts!;
    expect(c.within + c.tight + c.adjust + c.over + c.incomplete).toBe(10 * 200);
    for (const row of cached.body.rows) expect(row.cells.every((cell) => cell === null || cell.level === "within")).toBe(true);
  });
});

describe("the pairing matrix keeps a set-up to adjust apart from a rating exceeded", () => {
  // The camper-on-pickup fixture as a vehicle and two trailers: one on a ball mount 4 in deeper than its own
  // (the trailer sits nose-down: another drop, every rating holds), one loaded to 15,000 lb (above both of the
  // hitch's gross trailer weight ratings, 6,000 lb and 10,000 lb with weight distribution: over; Source:
  // WAC 204-70-060, the lowest rating governs).
  const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));
  beforeAll(async () => {
    const db = await getDb();
    await db.insert(vehicleProfiles).values({
      id: "pv-adjust",
      organisationId: "org-a",
      name: "Setup pickup",
      units: camper.units,
      data: { units: camper.units, vehicle: camper.vehicle, hitch: camper.hitch, load: camper.load },
    });
    const trailerPart = (extra: object) => ({ units: camper.units, trailer: camper.trailer, ballMount: camper.ballMount, weightDistribution: camper.weightDistribution, ...extra });
    await db.insert(trailerProfiles).values([
      { id: "pt-deep", organisationId: "org-a", name: "Setup camper deep", units: camper.units, data: trailerPart({ ballMount: { ...camper.ballMount, drop: 7 } }) },
      { id: "pt-heavy", organisationId: "org-a", name: "Setup camper heavy", units: camper.units, data: trailerPart({ trailer: { ...camper.trailer, grossTrailerWeight: 15000 } }) },
    ]);
  });

  it("reads the deeper ball mount as adjust with the ball mount named, the heavy camper as over, and filters them apart", async () => {
    await actAs("fleetA");
    type Cell = { level: string; adjust?: string[] } | null;
    type Page = { rows: Array<{ name: string; cells: Cell[] }>; columns: Array<{ name: string }> };
    const get = async (query = "") =>
      (await (await matrixRoute(new Request(`http://t/api/v1/fleet/matrix?vehicle=Setup%20pickup&hitched=Setup%20camper${query}`))).json()) as Page;
    const page = await get();
    const cellOf = (p: Page, column: string) => p.rows[0]!.cells[p.columns.findIndex((c) => c.name === column)];
    expect(cellOf(page, "Setup camper deep")).toMatchObject({ level: "adjust", adjust: ["ball-mount"] });
    expect(cellOf(page, "Setup camper heavy")).toMatchObject({ level: "over" });
    const adjustOnly = await get("&level=adjust");
    expect(adjustOnly.rows[0]!.cells.filter(Boolean).map((c) => c!.level)).toEqual(["adjust"]);
    const overOnly = await get("&level=over");
    expect(overOnly.rows[0]!.cells.filter(Boolean).map((c) => c!.level)).toEqual(["over"]);
  });
});

describe("the pairing matrix's order", () => {
  // Correctness only. Invented profiles of A, named so the name filters keep them apart from the rest of A's fleet.
  const truck = (id: string, name: string, vehicle: Record<string, number>, hitch: Record<string, number>, units: "imperial" | "metric" = "imperial") => ({
    id,
    organisationId: "org-a",
    name,
    units,
    data: { units, vehicle: { gvwr: units === "metric" ? 4000 : 9000, ...vehicle }, hitch },
  });
  const trailer = (id: string, name: string, trailerPart: Record<string, unknown>, units: "imperial" | "metric" = "imperial") => ({
    id,
    organisationId: "org-a",
    name,
    units,
    data: { units, trailer: { type: "utility", ...trailerPart } },
  });
  type Page = {
    totalRows: number;
    totalColumns: number;
    vehicleSort: string;
    hitchedSort: string;
    rows: Array<{ name: string; capacity?: { value: number; unit: string; setBy: string; missing: string[] }; cells: unknown[] }>;
    columns: Array<{ name: string; kind: string; weight?: { value: number; unit: string; basis: string } }>;
  };
  const get = async (query: string) => {
    const response = await matrixRoute(new Request(`http://t/api/v1/fleet/matrix?vehicle=Sort%20truck&hitched=Sort%20load&pageSize=5&colPageSize=4&${query}`));
    expect(response.status).toBe(200);
    return (await response.json()) as Page;
  };
  const letters = (names: string[]) => names.map((name) => name.split(" ").at(-1)).join("");

  beforeAll(async () => {
    const db = await getDb();
    await db.insert(vehicleProfiles).values([
      truck("sv-a", "Sort truck A", { towRating: 7000 }, { gtwRating: 6000 }),
      truck("sv-b", "Sort truck B", { towRating: 12000 }, { gtwRating: 14000 }),
      truck("sv-c", "Sort truck C", { towRating: 9000 }, {}),
      truck("sv-d", "Sort truck D", {}, {}),
      truck("sv-e", "Sort truck E", { towRating: 3000 }, { gtwRating: 3500 }, "metric"),
      truck("sv-f", "Sort truck F", { towRating: 10000 }, { gtwRating: 10000 }),
    ]);
    await db.insert(trailerProfiles).values([
      trailer("st-p", "Sort load trailer P", { grossTrailerWeight: 5200, tongueWeight: 600 }),
      trailer("st-q", "Sort load trailer Q", { grossTrailerWeight: 9800, tongueWeight: 1100 }),
      trailer("st-r", "Sort load trailer R", { grossTrailerWeight: 2000, tongueWeight: 240 }, "metric"),
      trailer("st-s", "Sort load trailer S", { tongueWeight: 300 }),
    ]);
    await db.insert(accessoryProfiles).values([
      { id: "sa-t", organisationId: "org-a", name: "Sort load rack T", units: "imperial", data: { units: "imperial", accessory: { type: "cargo-carrier", weight: 60, loadWeight: 250 } } },
      { id: "sa-u", organisationId: "org-a", name: "Sort load rack U", units: "imperial", data: { units: "imperial", accessory: { type: "cargo-carrier", weight: 50 } } },
    ]);
  });

  it("sorts vehicles by the lowest of their tow and hitch ratings, before paging, a vehicle without one last", async () => {
    await actAs("fleetA");
    // Each capacity is min(vehicle tow rating, hitch label), worked by hand from the invented figures above:
    // B min(12000, 14000) = 12000; F min(10000, 10000) = 10000 (the vehicle's named first when equal);
    // C 9000 (no hitch label); E min(3000 kg, 3500 kg) = 3000 kg = 3000 / 0.45359237 = 6613.868 lb
    // (Source: NIST SP 811, 1 lb = 0.45359237 kg exactly); A min(7000, 6000) = 6000; D none on record.
    const desc = await get("vehicleSort=capacity-desc");
    expect(desc.vehicleSort).toBe("capacity-desc");
    expect(desc.totalRows).toBe(6);
    expect(letters(desc.rows.map((row) => row.name))).toBe("BFCEA");
    expect(letters((await get("vehicleSort=capacity-desc&page=2")).rows.map((row) => row.name))).toBe("D");
    expect(letters((await get("vehicleSort=capacity-asc")).rows.map((row) => row.name))).toBe("AECFB");
    expect(letters((await get("vehicleSort=capacity-asc&page=2")).rows.map((row) => row.name))).toBe("D");
    expect(letters((await get("vehicleSort=name")).rows.map((row) => row.name))).toBe("ABCDE");

    const byName = Object.fromEntries(desc.rows.map((row) => [row.name.at(-1), row.capacity]));
    expect(byName.B).toEqual({ value: 12000, unit: "lb", setBy: "Vehicle tow rating", missing: [] });
    expect(byName.A).toEqual({ value: 6000, unit: "lb", setBy: "Hitch label", missing: [] });
    expect(byName.C).toEqual({ value: 9000, unit: "lb", setBy: "Vehicle tow rating", missing: ["Hitch label"] });
    expect(byName.E!.value).toBeCloseTo(6613.868, 2);
    expect(byName.E!.unit).toBe("lb");
    expect((await get("vehicleSort=capacity-desc&page=2")).rows[0]!.capacity).toBeUndefined();
  });

  it("sorts trailers and accessories by gross or loaded weight, before paging, one without a weight last", async () => {
    await actAs("fleetA");
    // Weights worked by hand: Q 9800 lb, P 5200 lb, R 2000 kg = 2000 / 0.45359237 = 4409.245 lb (Source: NIST
    // SP 811), rack T 60 + 250 = 310 lb loaded; trailer S has no gross weight, rack U no load: both last, trailers first.
    const desc = await get("hitchedSort=weight-desc");
    expect(desc.totalColumns).toBe(6);
    expect(letters(desc.columns.map((column) => column.name))).toBe("QPRT");
    expect(desc.rows[0]!.cells).toHaveLength(4);
    expect(letters((await get("hitchedSort=weight-desc&colPage=2")).columns.map((column) => column.name))).toBe("SU");
    expect(letters((await get("hitchedSort=weight-asc")).columns.map((column) => column.name))).toBe("TRPQ");
    expect(letters((await get("hitchedSort=weight-asc&colPage=2")).columns.map((column) => column.name))).toBe("SU");
    expect(letters((await get("hitchedSort=name")).columns.map((column) => column.name))).toBe("PQRS");
    expect(desc.columns[0]!.weight).toEqual({ value: 9800, unit: "lb", basis: "gross" });
    expect(desc.columns[2]!.weight!.value).toBeCloseTo(4409.245, 2);
    expect(desc.columns[3]!.weight).toEqual({ value: 310, unit: "lb", basis: "loaded" });
    expect((await get("hitchedSort=weight-desc&colPage=2")).columns.every((column) => column.weight === undefined)).toBe(true);
  });

  it("keeps the verdict filter with an order, and both orders together", async () => {
    await actAs("fleetA");
    const both = await get("vehicleSort=capacity-desc&hitchedSort=weight-desc");
    expect(both.rows[0]!.name).toBe("Sort truck B");
    expect(both.columns[0]!.name).toBe("Sort load trailer Q");
    const over = await get("level=over&vehicleSort=capacity-asc&hitchedSort=weight-desc");
    for (const row of over.rows) expect(row.cells.every((cell) => cell === null || (cell as { level: string }).level === "over")).toBe(true);
    const capacities = over.rows.map((row) => row.capacity?.value ?? Infinity);
    expect(capacities).toEqual([...capacities].sort((a, b) => a - b));
  });

  it("an unknown order is a field error naming it; an empty one is by name", async () => {
    await actAs("fleetA");
    const bad = await matrixRoute(new Request("http://t/api/v1/fleet/matrix?vehicleSort=heaviest&hitchedSort=1"));
    expect(bad.status).toBe(400);
    const { fieldErrors } = (await bad.json()) as { fieldErrors: Record<string, string[]> };
    expect(Object.keys(fieldErrors).sort()).toEqual(["hitchedSort", "vehicleSort"]);
    expect(fieldErrors.vehicleSort![0]).toMatch(/^Order of the vehicles/);
    const empty = await get("vehicleSort=&hitchedSort=");
    expect([empty.vehicleSort, empty.hitchedSort]).toEqual(["name", "name"]);
  });
});
