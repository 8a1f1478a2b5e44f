import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-checks-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { saveCheckAction, saveVehicleProfileAction } from "@/app/(workspace)/check/actions";
import { createLinkAction, emailLinkAction, revokeLinkAction } from "@/app/(workspace)/checks/[id]/actions";
import { GET as listChecksRoute } from "@/app/api/v1/checks/route";
import { GET as checkRoute } from "@/app/api/v1/checks/[id]/route";
import { POST as evaluateRoute } from "@/app/api/v1/evaluate/route";
import { eq } from "drizzle-orm";
import { databaseHandle, getDb } from "@/db/client";
import { savedChecks, shareLinks, vehicleProfiles } from "@/db/schema";
import { resolveShareToken } from "@/lib/server/share-links";
import { initialFormState } from "@/lib/validation/form-state";
import { actAs, buildFixture, form, type Person } from "./support/fixture";

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));

async function tableCounts() {
  const db = await getDb();
  return {
    checks: (await db.select().from(savedChecks)).length,
    links: (await db.select().from(shareLinks)).length,
    revoked: (await db.select().from(shareLinks)).filter((l) => l.revokedAt).length,
    profiles: (await db.select().from(vehicleProfiles)).length,
  };
}

let checkOfA = "";
let tokenOfA = "";

beforeAll(async () => {
  await buildFixture();
  await actAs("staffA");
  const saved = await saveCheckAction({ rig: camper, customerName: "Perpetua Lindgard", note: "Wants to add a kayak rack later." });
  expect(saved.ok).toBe(true);
  checkOfA = saved.checkId!;
  const link = await createLinkAction(initialFormState, form({ checkId: checkOfA, expiresInDays: "30" }));
  expect(link.ok).toBe(true);
  tokenOfA = link.token!;
});

describe("saving a check", () => {
  it("stores the server's own evaluation with the core version, whatever the client claims", async () => {
    const db = await getDb();
    const row = (await db.select().from(savedChecks)).find((r) => r.id === checkOfA)!;
    const result = row.result as { coreVersion: string; verdict: { level: string } };
    expect(row.coreVersion).toBe(result.coreVersion);
    expect(row.level).toBe(result.verdict.level);
    expect(row.customerName).toBe("Perpetua Lindgard");
    expect(row.vehicleLabel).toBe(camper.name);
  });

  it("keeps the result deflated, and still reads a result stored as plain JSON", async () => {
    const db = await getDb();
    const { client } = databaseHandle();
    const stored = (await client.execute({ sql: "SELECT typeof(result) AS kind, length(result) AS bytes FROM saved_checks WHERE id = ?", args: [checkOfA] })).rows[0]!;
    const row = (await db.select().from(savedChecks).where(eq(savedChecks.id, checkOfA)))[0]!;
    expect(stored.kind).toBe("blob");
    expect(Number(stored.bytes)).toBeLessThan(JSON.stringify(row.result).length / 2);
    // A row from before the result was deflated.
    await client.execute({ sql: "UPDATE saved_checks SET result = ? WHERE id = ?", args: [JSON.stringify(row.result), checkOfA] });
    const plain = (await db.select().from(savedChecks).where(eq(savedChecks.id, checkOfA)))[0]!;
    expect(plain.result).toEqual(row.result);
  });

  it("refuses bad input with field errors and stores nothing", async () => {
    await actAs("staffA");
    const before = await tableCounts();
    const state = await saveCheckAction({ rig: { ...camper, vehicle: { ...camper.vehicle, gvwr: -5 } }, customerName: "x".repeat(500) });
    expect(state.ok).toBe(false);
    expect(Object.keys(state.fieldErrors ?? {}).sort()).toEqual(["customerName", "rig.vehicle.gvwr"]);
    expect(await saveCheckAction("not an object")).toMatchObject({ ok: false });
    expect(await tableCounts()).toEqual(before);
  });
});

describe("who may save, share and read", () => {
  const refusedToSave: Array<Person | "anonymous"> = ["anonymous", "trainerA"];
  for (const actor of refusedToSave) {
    it(`${actor} cannot save a check, a profile, or make or withdraw a link`, async () => {
      await actAs(actor);
      const before = await tableCounts();
      expect((await saveCheckAction({ rig: camper })).ok).toBe(false);
      expect((await saveVehicleProfileAction({ name: "Truck", rig: camper })).ok).toBe(false);
      expect((await createLinkAction(initialFormState, form({ checkId: checkOfA }))).ok).toBe(false);
      const db = await getDb();
      const [link] = await db.select().from(shareLinks);
      expect((await revokeLinkAction(initialFormState, form({ linkId: link!.id }))).ok).toBe(false);
      expect((await emailLinkAction(initialFormState, form({ checkId: checkOfA, token: tokenOfA, email: "c@example.com" }))).ok).toBe(false);
      expect(await tableCounts()).toEqual(before);
    });
  }

  it("another organisation's owner can neither link, withdraw, mail nor read A's check", async () => {
    await actAs("ownerB");
    const before = await tableCounts();
    expect((await createLinkAction(initialFormState, form({ checkId: checkOfA }))).ok).toBe(false);
    const db = await getDb();
    const [link] = await db.select().from(shareLinks);
    expect((await revokeLinkAction(initialFormState, form({ linkId: link!.id }))).ok).toBe(false);
    expect((await emailLinkAction(initialFormState, form({ checkId: checkOfA, token: tokenOfA, email: "c@example.com" }))).ok).toBe(false);
    expect(await tableCounts()).toEqual(before);
    expect((await checkRoute(new Request("http://t/"), { params: Promise.resolve({ id: checkOfA }) })).status).toBe(404);
    const list = (await (await listChecksRoute(new Request("http://t/api/v1/checks"))).json()) as { rows: unknown[]; total: number };
    expect(list.total).toBe(0);
  });

  it("signed out, the list and the detail answer 401", async () => {
    await actAs("anonymous");
    expect((await listChecksRoute(new Request("http://t/api/v1/checks"))).status).toBe(401);
    expect((await checkRoute(new Request("http://t/"), { params: Promise.resolve({ id: checkOfA }) })).status).toBe(401);
  });

  it("a trainer of A can read A's checks", async () => {
    await actAs("trainerA");
    const response = await checkRoute(new Request("http://t/"), { params: Promise.resolve({ id: checkOfA }) });
    expect(response.status).toBe(200);
    const body = (await response.json()) as { check: { id: string }; links: Array<{ tokenHint: string }> };
    expect(body.check.id).toBe(checkOfA);
    // The link itself is never served back, only its last characters.
    expect(JSON.stringify(body)).not.toContain(tokenOfA);
  });

  it("the list filters by customer and vehicle and rejects a bad query with 400", async () => {
    await actAs("staffA");
    const hit = (await (await listChecksRoute(new Request("http://t/api/v1/checks?customer=perpetua"))).json()) as { total: number };
    expect(hit.total).toBe(1);
    const miss = (await (await listChecksRoute(new Request("http://t/api/v1/checks?vehicle=%25"))).json()) as { total: number };
    expect(miss.total).toBe(0);
    const bad = await listChecksRoute(new Request("http://t/api/v1/checks?pageSize=100000&sort=drop%20table"));
    expect(bad.status).toBe(400);
    expect(Object.keys(((await bad.json()) as { fieldErrors: object }).fieldErrors).sort()).toEqual(["pageSize", "sort"]);
  });
});

describe("the saved-check filter keeps a set-up to adjust apart from a rating exceeded", () => {
  it("lists a ball mount that needs another drop under adjust, and an over-heavy trailer under over", async () => {
    await actAs("staffA");
    // The camper with a ball mount 4 in deeper than its own 3 in: the trailer sits 4 in nose-down, every rating
    // still holds (geometry: the ball-mount check's level band; the camper fixture reads within as saved).
    const deeper = await saveCheckAction({ rig: { ...camper, ballMount: { ...camper.ballMount, drop: 7 } }, customerName: "Filter Adjust" });
    // The camper at 15,000 lb: above both of the hitch's gross trailer weight ratings (6,000 lb, and 10,000 lb
    // with weight distribution), so over (Source: WAC 204-70-060, the lowest rating governs).
    const heavy = await saveCheckAction({ rig: { ...camper, trailer: { ...camper.trailer, grossTrailerWeight: 15000 } }, customerName: "Filter Over" });
    expect(deeper.ok && heavy.ok).toBe(true);
    const list = async (query: string) =>
      (await (await listChecksRoute(new Request(`http://t/api/v1/checks?customer=filter&${query}`))).json()) as { total: number; rows: Array<{ customerName: string; level: string }> };
    const adjust = await list("level=adjust");
    expect(adjust.rows.map((i) => [i.customerName, i.level])).toEqual([["Filter Adjust", "adjust"]]);
    const over = await list("level=over");
    expect(over.rows.map((i) => [i.customerName, i.level])).toEqual([["Filter Over", "over"]]);
  });
});

describe("the customer's link", () => {
  it("opens the snapshot and the shop's name, and nothing once withdrawn", async () => {
    const open = await resolveShareToken(tokenOfA);
    expect(open.status).toBe("ok");
    if (open.status === "ok") {
      expect(open.shopName).toBe("Alder Lane Hitch");
      expect(open.customerName).toBe("Perpetua Lindgard");
      expect(Object.keys(open).sort()).toEqual(["createdAt", "customerName", "result", "rig", "shopName", "status"]);
    }
    await actAs("staffA");
    const db = await getDb();
    const link = (await db.select().from(shareLinks)).find((l) => l.savedCheckId === checkOfA)!;
    expect((await revokeLinkAction(initialFormState, form({ linkId: link.id }))).ok).toBe(true);
    expect(await resolveShareToken(tokenOfA)).toEqual({ status: "gone", reason: "revoked" });
  });

  it("an expired link and a made-up token open nothing", async () => {
    await actAs("staffA");
    const link = await createLinkAction(initialFormState, form({ checkId: checkOfA, expiresInDays: "1" }));
    const db = await getDb();
    await db.update(shareLinks).set({ expiresAt: new Date(Date.now() - 1000) });
    expect(await resolveShareToken(link.token!)).toEqual({ status: "gone", reason: "expired" });
    expect(await resolveShareToken("A".repeat(32))).toEqual({ status: "gone", reason: "not-found" });
    expect(await resolveShareToken("../../etc/passwd")).toEqual({ status: "gone", reason: "not-found" });
  });

  it("tokens carry at least 128 bits: 32 URL-safe characters, all different", async () => {
    await actAs("staffA");
    const tokens = new Set<string>();
    for (let i = 0; i < 20; i++) tokens.add((await createLinkAction(initialFormState, form({ checkId: checkOfA }))).token!);
    expect(tokens.size).toBe(20);
    for (const token of tokens) expect(token).toMatch(/^[A-Za-z0-9_-]{32}$/); // 32 × 6 bits = 192 bits
  });
});

describe("POST /api/v1/evaluate", () => {
  const post = (body: string, headers: Record<string, string> = {}) =>
    evaluateRoute(new Request("http://t/api/v1/evaluate", { method: "POST", body, headers: { "content-type": "application/json", ...headers } }));

  it("answers the core's result for a valid rig, with no account", async () => {
    await actAs("anonymous");
    const response = await post(JSON.stringify(camper));
    expect(response.status).toBe(200);
    const body = (await response.json()) as { coreVersion: string; verdict: { level: string }; checks: unknown[] };
    expect(body.coreVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(["within", "tight", "over"]).toContain(body.verdict.level);
  });

  it('answers the compact result for "detail": "summary": verdict and figures, no worked steps', async () => {
    await actAs("anonymous");
    const response = await post(JSON.stringify({ rig: camper, detail: "summary" }));
    expect(response.status).toBe(200);
    const body = (await response.json()) as { detail: string; verdict: { level: string; cautions: string[] }; checks: Array<Record<string, unknown>> };
    expect(body.detail).toBe("summary");
    expect(["within", "tight", "over"]).toContain(body.verdict.level);
    expect(body.verdict.cautions.length).toBeGreaterThan(0);
    expect(body.checks.length).toBeGreaterThan(0);
    for (const check of body.checks) expect(check).not.toHaveProperty("steps");
    const wrong = await post(JSON.stringify({ rig: camper, detail: "everything" }));
    expect(wrong.status).toBe(400);
    expect(((await wrong.json()) as { fieldErrors: object }).fieldErrors).toEqual({ detail: ['Choose "full" or "summary".'] });
  });

  it("answers 400 with field errors for bad input, and 413 for a huge body", async () => {
    const bad = await post(JSON.stringify({ ...camper, trailer: { ...camper.trailer, grossTrailerWeight: "heavy" } }));
    expect(bad.status).toBe(400);
    expect(Object.keys(((await bad.json()) as { fieldErrors: object }).fieldErrors)).toEqual(["trailer.grossTrailerWeight"]);
    expect((await post("{not json")).status).toBe(400);
    expect((await post("x".repeat(70_000))).status).toBe(413);
  });
});
