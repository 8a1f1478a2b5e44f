import { eq } from "drizzle-orm";
import { randomBytes } from "node:crypto";
import type { Database } from "./client";
import { installationChecklistItems, installationRecords, vehicleProfiles } from "./schema";

type Tx = Pick<Database, "insert" | "update">;
const newId = () => randomBytes(15).toString("base64url");

/** The demo shop's fitting checklist: its own items (no maker's values; the installer types them). */
export const DEMO_CHECKLIST = [
  { label: "Fasteners torqued to the maker's instruction", valueLabel: "Torque read from the instruction sheet" },
  { label: "Trim panels and heat shields refitted" },
  { label: "Exhaust hangers back in place" },
  { label: "Lights tested through the new wiring" },
];

/**
 * One invented installation, fitted three days ago to the shop's crossover: the record, and the profile
 * updated from it as the app would (hitch as fitted, measured figures, where each came from).
 */
export async function seedDemoInstallations(tx: Tx, shop: string, vehicleId: string, installerId: string, profileData: Record<string, unknown>) {
  const items = DEMO_CHECKLIST.map((item, i) => ({ id: newId(), organisationId: shop, label: item.label, valueLabel: item.valueLabel ?? null, position: i + 1 }));
  await tx.insert(installationChecklistItems).values(items);
  const id = newId();
  const fittedOn = new Date(Date.now() - 3 * 86_400_000).toISOString().slice(0, 10);
  const method = "Vehicle unloaded on level ground, tyres at the door-label pressures";
  const measurements = {
    pinToFascia: { value: 4.75, method, measuredByUserId: installerId },
    receiverHeight: { value: 13.5, method, measuredByUserId: installerId },
    rearAxleToPin: { value: 38, method, measuredByUserId: installerId },
  };
  const hitch = { class: 2, receiverSize: "2", gtwRating: 3500, twRating: 350 };
  await tx.insert(installationRecords).values({
    id,
    organisationId: shop,
    units: "imperial",
    vehicleProfileId: vehicleId,
    vehicleDescription: "Corvane Tessel crossover",
    customerName: "Mirela Oakhurst",
    customerEmail: "mirela.oakhurst@example.com",
    installerUserId: installerId,
    fittedOn,
    state: "fitted",
    hitch,
    parts: [
      { label: "Ball mount, 2 in drop", gtwRating: 5000, twRating: 500 },
      { label: "Pin and clip" },
      { label: "Wiring harness, 4-way flat" },
    ],
    measurements,
    checklist: items.map((item) => ({ itemId: item.id, label: item.label, ...(item.valueLabel ? { valueLabel: item.valueLabel, value: "Value from the sheet (demo)" } : {}), done: true })),
    carrierDepth: 22,
    note: "Customer asked about a cargo carrier for camping trips.",
    appliedToProfileAt: new Date(),
    createdByUserId: installerId,
  });
  const data = profileData as { vehicle?: Record<string, unknown>; hitch?: Record<string, unknown> };
  const source = (kind: "measured" | "label") => ({ recordId: id, fittedOn, kind, ...(kind === "measured" ? { method, measuredBy: "Rowan Teague" } : {}) });
  await tx
    .update(vehicleProfiles)
    .set({
      data: { ...data, vehicle: { ...data.vehicle, rearAxleToPin: 38 }, hitch: { ...data.hitch, ...hitch, receiverHeight: 13.5, pinToFascia: 4.75 } },
      figureSources: {
        "hitch.pinToFascia": source("measured"),
        "hitch.receiverHeight": source("measured"),
        "vehicle.rearAxleToPin": source("measured"),
        "hitch.class": source("label"),
        "hitch.receiverSize": source("label"),
        "hitch.gtwRating": source("label"),
        "hitch.twRating": source("label"),
      },
    })
    .where(eq(vehicleProfiles.id, vehicleId));
}
