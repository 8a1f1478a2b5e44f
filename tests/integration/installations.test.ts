import { beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-installations-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
  process.env.UPLOAD_DIR = `${process.env.TMPDIR ?? "/tmp"}/towmargin-installation-uploads-${process.pid}`;
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { eq } from "drizzle-orm";
import {
  addChecklistItemAction,
  handOverAction,
  revokeInstallationLinkAction,
  saveInstallationAction,
} from "@/app/(workspace)/installations/actions";
import { POST as confirmRoute } from "@/app/api/v1/handover/confirm/route";
import { GET as listRoute } from "@/app/api/v1/installations/route";
import { getDb } from "@/db/client";
import { accessoryProfiles, installationLinks, installationRecords, vehicleProfiles } from "@/db/schema";
import { getAccess } from "@/lib/server/access";
import { rigFromProfiles } from "@/lib/server/fleet";
import { handOverByToken, listChecklistItems, type FigureSources } from "@/lib/server/installations";
import { evaluateRig, type AccessoryFitResult } from "@/lib/towing";
import { initialFormState } from "@/lib/validation/form-state";
import { actAs, buildFixture, form, ORG_A } from "./support/fixture";

const VEHICLE = "veh-install-a";
const RACK = "rack-install-a";
let itemIds: string[] = [];
let recordId = "";
let token = "";

/** An invented compact SUV with no hitch yet, and a platform rack, in organisation A. */
async function seedProfiles() {
  const db = await getDb();
  await db.insert(vehicleProfiles).values({
    id: VEHICLE,
    organisationId: ORG_A,
    name: "Dunmore Wayfarer (blue)",
    units: "imperial",
    data: { units: "imperial", vehicle: { towRating: 3500, towRatingWd: 3500, tongueWeightLimit: 350, departureAngle: 18, wheelbase: 106, rearAxleToPin: 40 }, hitch: { receiverHeight: 20, pinToFascia: 3 } },
  });
  await db.insert(accessoryProfiles).values({
    id: RACK,
    organisationId: ORG_A,
    name: "Two-bike platform",
    units: "imperial",
    data: { units: "imperial", accessory: { type: "platform-rack", weight: 45, loadWeight: 60, loadCenterFromPin: 12, foldClearance: 5, lowestPointBelowShankTop: 6, lowestPointBehindPin: 6 } },
  });
}

function record(over: Record<string, unknown> = {}) {
  return {
    units: "imperial",
    vehicleProfileId: VEHICLE,
    customerName: "Ottoline Brask",
    customerEmail: "ottoline@example.com",
    installerUserId: "u-staff-a",
    fittedOn: "2026-11-30",
    state: "fitted",
    hitch: { class: "2", receiverSize: "2", gtwRating: "3500", twRating: "300", gtwRatingWd: "", twRatingWd: "" },
    parts: [{ label: "Ball mount, 2 in drop", gtwRating: "5000", twRating: "500" }, { label: "Pin and clip" }],
    measurements: {
      pinToFascia: { value: "5.5", method: "Vehicle unloaded on level ground", measuredByUserId: "u-staff-a" },
      receiverHeight: { value: "16", method: "Vehicle unloaded on level ground", measuredByUserId: "u-staff-a" },
      rearAxleToPin: { value: "24", method: "Vehicle unloaded on level ground", measuredByUserId: "u-staff-a" },
    },
    checklist: itemIds.map((itemId) => ({ itemId, done: true, value: itemId === itemIds[0] ? "110 N·m" : "" })),
    carrierDepth: "6",
    ...over,
  };
}

beforeAll(async () => {
  await buildFixture();
  await seedProfiles();
  await actAs("ownerA");
  for (const values of [{ label: "Fasteners torqued to the maker's instruction", valueLabel: "Torque from the instruction sheet" }, { label: "Lights tested through the new wiring" }]) {
    expect((await addChecklistItemAction(initialFormState, form(values as Record<string, string>))).ok).toBe(true);
  }
  itemIds = (await listChecklistItems((await getAccess())!)).map((item) => item.id);
  await actAs("staffA");
});

describe("an installation record", () => {
  it("a planned record leaves the vehicle profile alone", async () => {
    const saved = await saveInstallationAction(record({ state: "planned" }));
    expect(saved.ok).toBe(true);
    expect(saved.appliedToProfile).toBe(false);
    const db = await getDb();
    const profile = await db.select().from(vehicleProfiles).where(eq(vehicleProfiles.id, VEHICLE)).get();
    expect((profile!.data as { hitch: { receiverHeight: number } }).hitch.receiverHeight).toBe(20);
    recordId = saved.id!;
  });

  it("once fitted, updates the vehicle profile's hitch and measurements, with the date and the record they came from", async () => {
    const saved = await saveInstallationAction(record({ id: recordId }));
    expect(saved).toMatchObject({ ok: true, appliedToProfile: true });
    const db = await getDb();
    const profile = (await db.select().from(vehicleProfiles).where(eq(vehicleProfiles.id, VEHICLE)).get())!;
    const data = profile.data as { vehicle: Record<string, number>; hitch: Record<string, unknown> };
    expect(data.hitch).toMatchObject({ class: 2, receiverSize: "2", gtwRating: 3500, twRating: 300, receiverHeight: 16, pinToFascia: 5.5 });
    expect(data.vehicle.rearAxleToPin).toBe(24);
    expect(data.vehicle.towRating).toBe(3500);
    const sources = profile.figureSources as FigureSources;
    expect(sources["hitch.receiverHeight"]).toMatchObject({ recordId, fittedOn: "2026-11-30", kind: "measured", measuredBy: "staffA" });
    expect(sources["vehicle.rearAxleToPin"]).toMatchObject({ recordId, kind: "measured" });
    expect(sources["hitch.gtwRating"]).toMatchObject({ recordId, kind: "label" });
    const stored = (await db.select().from(installationRecords).where(eq(installationRecords.id, recordId)).get())!;
    expect(stored.checklist).toEqual([
      { itemId: itemIds[0], label: "Fasteners torqued to the maker's instruction", valueLabel: "Torque from the instruction sheet", done: true, value: "110 N·m" },
      { itemId: itemIds[1], label: "Lights tested through the new wiring", done: true },
    ]);
  });

  it("a later check of that vehicle uses the measured figures without typing them again", async () => {
    const rig = (await rigFromProfiles((await getAccess())!, { vehicle: VEHICLE, accessory: RACK }))!;
    expect(rig.hitch).toMatchObject({ receiverHeight: 16, pinToFascia: 5.5 });
    const fit = evaluateRig(rig).checks.find((c) => c.id === "accessory-fit") as AccessoryFitResult;
    // Geometry: 16 in receiver − 6 in below the shank top = 10 in; atan(10 / (24 + 6)) = 18.43°
    expect(fit.groundClearance?.value).toBe(10);
    expect(fit.accessoryAngle?.value).toBeCloseTo(18.43, 2);
    // Fold: 5 in needed against the measured 5.5 in (the old 3 in would not have fitted)
    expect(fit.parts.find((p) => p.id === "fold")?.status).not.toBe("over");
  });

  it("refuses an installer or a vehicle from another organisation, and changes nothing", async () => {
    const db = await getDb();
    const before = JSON.stringify(await db.select().from(installationRecords));
    expect(await saveInstallationAction(record({ installerUserId: "u-owner-b" }))).toMatchObject({ ok: false, fieldErrors: { installerUserId: [expect.any(String)] } });
    expect(await saveInstallationAction(record({ vehicleProfileId: "no-such-vehicle" }))).toMatchObject({ ok: false, fieldErrors: { vehicleProfileId: [expect.any(String)] } });
    expect(await saveInstallationAction(record({ measurements: { pinToFascia: { value: "30" } } }))).toMatchObject({ ok: false, fieldErrors: { "measurements.pinToFascia.value": ["Pin hole to fascia must be at most 24 in."] } });
    expect(JSON.stringify(await db.select().from(installationRecords))).toBe(before);
  });

  it("lists records with filters for state, installer and date", async () => {
    const free = await saveInstallationAction(record({ vehicleProfileId: "", vehicleDescription: "Customer's grey hatchback", vehicle: { towRating: "2000", tongueWeightLimit: "200" }, fittedOn: "2026-10-02", state: "planned", installerUserId: "u-owner-a" }));
    expect(free.ok).toBe(true);
    const list = async (query: string) => (await (await listRoute(new Request(`http://t/api/v1/installations?${query}`))).json()) as { rows: Array<{ id: string }>; total: number };
    expect((await list("")).total).toBe(2);
    expect((await list("state=fitted")).rows.map((r) => r.id)).toEqual([recordId]);
    expect((await list("installer=u-owner-a")).rows.map((r) => r.id)).toEqual([free.id]);
    expect((await list("from=2026-11-01&to=2026-11-30")).rows.map((r) => r.id)).toEqual([recordId]);
    // A fleet manager sees the fleet's own vehicles' records only.
    await actAs("fleetA");
    expect((await list("")).rows.map((r) => r.id)).toEqual([recordId]);
    await actAs("staffA");
  });
});

describe("the hand-over", () => {
  it("makes a customer link that shows the record and what the hitch allows", async () => {
    const handed = await handOverAction(initialFormState, form({ recordId, email: "", expiresInDays: "" }));
    expect(handed.ok).toBe(true);
    token = handed.url!.split("/r/")[1]!;
    const view = (await handOverByToken(token))!;
    expect(view.record.state).toBe("handed-over");
    expect(view.shopName).toBe("Alder Lane Hitch");
    // Source: Washington WAC 204-70-060: min(3,500 vehicle, 3,500 hitch, 5,000 ball mount) = 3,500 lb; tongue min(350, 300, 500) = 300 lb
    expect(view.allowance.weightCarrying.grossTrailerWeight.value?.value).toBe(3500);
    expect(view.allowance.weightCarrying.tongueWeight.governing).toMatchObject({ id: "hitch.twRating", value: 300 });
    // Geometry: a 6 in carrier with its lowest point level with the shank top: h = 16 in, x = 24 + 6 = 30 in, atan(16 / 30) = 28.07°
    expect(view.allowance.carrier?.angle?.value).toBeCloseTo(28.07, 2);
    expect(view.allowance.foldedDepthMax?.value).toBe(5.5);
  });

  it("the customer confirms they have read the limits; the record keeps when", async () => {
    const post = (body: string, headers: Record<string, string> = {}) =>
      confirmRoute(new Request("http://t/api/v1/handover/confirm", { method: "POST", body, headers: { origin: "http://localhost:3000", "content-type": "application/x-www-form-urlencoded", ...headers } }));
    expect((await post(`token=${token}&confirm=yes`, { origin: "https://elsewhere.example.com" })).status).toBe(403);
    // A page with no-referrer sends "Origin: null": only a same-origin fetch marker lets that through.
    expect((await post(`token=${token}&confirm=yes`, { origin: "null", "sec-fetch-site": "cross-site" })).status).toBe(403);
    expect((await post(`token=${token}`)).status).toBe(400);
    const db = await getDb();
    expect((await db.select().from(installationRecords).where(eq(installationRecords.id, recordId)).get())!.customerConfirmedAt).toBeNull();
    const answer = await post(`token=${token}&confirm=yes`);
    expect(answer.status).toBe(303);
    expect(answer.headers.get("location")).toBe(`/r/${token}?confirmed=1`);
    const first = (await db.select().from(installationRecords).where(eq(installationRecords.id, recordId)).get())!.customerConfirmedAt;
    expect(first).toBeInstanceOf(Date);
    await post(`token=${token}&confirm=yes`);
    expect((await db.select().from(installationRecords).where(eq(installationRecords.id, recordId)).get())!.customerConfirmedAt).toEqual(first);
  });

  it("a withdrawn link shows nothing and confirms nothing", async () => {
    const db = await getDb();
    const link = (await db.select().from(installationLinks).where(eq(installationLinks.installationRecordId, recordId)).get())!;
    expect(link.tokenHash).not.toContain(token);
    expect((await revokeInstallationLinkAction(initialFormState, form({ linkId: link.id }))).ok).toBe(true);
    expect(await handOverByToken(token)).toBeUndefined();
    const answer = await confirmRoute(new Request("http://t/api/v1/handover/confirm", { method: "POST", body: JSON.stringify({ token, confirm: "yes" }), headers: { origin: "http://localhost:3000", "content-type": "application/json" } }));
    expect(answer.status).toBe(404);
    expect(await answer.text()).not.toContain("Ottoline");
  });
});
