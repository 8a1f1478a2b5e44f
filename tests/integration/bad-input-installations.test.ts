import { beforeAll, describe, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-bad-input-inst-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
  process.env.UPLOAD_DIR = `${process.env.TMPDIR ?? "/tmp"}/towmargin-bad-input-inst-uploads-${process.pid}`;
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import * as installations from "@/app/(workspace)/installations/actions";
import { POST as confirmRoute } from "@/app/api/v1/handover/confirm/route";
import * as photoRoute from "@/app/api/v1/installations/photos/[id]/route";
import * as photosRoute from "@/app/api/v1/installations/photos/route";
import { GET as listRoute } from "@/app/api/v1/installations/route";
import { getDb } from "@/db/client";
import { vehicleProfiles } from "@/db/schema";
import { addChecklistItem, saveInstallation } from "@/lib/server/installations";
import { resetRateLimits } from "@/lib/server/rate-limit";
import { createInstallationLink } from "@/lib/server/share-links";
import { OWNER_OF_A } from "./support/access-matrix";
import { fromAction, fromResponse, initialFormState, runCorpus, type FieldSpec, type Target } from "./support/bad-input-harness";
import { buildFixture, ORG_A, PEOPLE } from "./support/fixture";

/** The corpus against installation records: the record form, the hand-over, the checklist, the list, photos and the customer's confirmation. */
let recordId = "";
let token = "";
let itemId = "";

const str = (value: unknown) => (value === undefined ? "" : value !== null && typeof value === "object" ? "[object]" : String(value));
const request = (path: string, init?: RequestInit) => new Request(`http://t${path}`, init);
const params = <T extends Record<string, string>>(values: T) => ({ params: Promise.resolve(values) });

/** Optional figures: empty means "not given", and zero is a real reading for a rating. */
const optionalRating = (path: string): FieldSpec => ({ path, kind: "formNumber", accepts: ["empty string", "whitespace only", "zero", "negative zero", "1e-300"] });
const optionalLength = (path: string): FieldSpec => ({ path, kind: "formNumber", accepts: ["empty string", "whitespace only"] });

const recordBase = () => ({
  id: recordId,
  units: "imperial",
  vehicleProfileId: "veh-corpus",
  customerName: "Corpus Customer",
  customerEmail: "corpus@example.com",
  installerUserId: PEOPLE.staffA.id,
  fittedOn: "2026-11-30",
  state: "fitted",
  hitch: { class: "3", receiverSize: "2", gtwRating: "5000", twRating: "500", gtwRatingWd: "", twRatingWd: "" },
  parts: [{ label: "Ball mount", gtwRating: "6000", twRating: "600" }],
  measurements: { pinToFascia: { value: "5", method: "Level ground", measuredByUserId: PEOPLE.staffA.id }, receiverHeight: { value: "18" }, rearAxleToPin: { value: "40" } },
  checklist: [{ itemId, done: true, value: "" }],
  carrierDepth: "20",
  note: "",
});

const formTarget = (name: string, actor: Target["actor"], run: (form: FormData) => Promise<unknown>, fields: FieldSpec[], base: () => Record<string, unknown>, fieldErrors?: false): Target => ({
  name,
  actor,
  transport: "form",
  fields,
  base,
  call: (input) => fromAction(() => run(input as FormData) as never),
  ...(fieldErrors === false ? { fieldErrors } : {}),
});

const TARGETS: Target[] = [
  {
    name: "save an installation record",
    actor: "staffA",
    transport: "value",
    fields: [
      { path: "units", kind: "enum", required: true },
      { path: "customerName", kind: "requiredText", required: true },
      { path: "customerEmail", kind: "email", accepts: ["empty string"] },
      { path: "installerUserId", kind: "entityId", required: true },
      { path: "vehicleProfileId", kind: "entityId", accepts: ["empty string"] },
      { path: "fittedOn", kind: "date", required: true },
      { path: "state", kind: "enum", required: true },
      { path: "vehicleDescription", kind: "optionalText" },
      optionalRating("hitch.gtwRating"),
      optionalRating("hitch.twRatingWd"),
      { path: "hitch.receiverSize", kind: "enum", accepts: ["empty string"] },
      { path: "hitch", kind: "object", required: true },
      { path: "parts", kind: "object", required: true, accepts: ["empty array"] },
      { path: "parts.0.label", kind: "requiredText", required: true },
      optionalRating("parts.0.twRating"),
      optionalLength("measurements.receiverHeight.value"),
      optionalLength("measurements.rearAxleToPin.value"),
      { path: "measurements.pinToFascia.method", kind: "optionalText" },
      { path: "measurements.pinToFascia.measuredByUserId", kind: "entityId", accepts: ["empty string"] },
      { path: "checklist", kind: "object", required: true, accepts: ["empty array"] },
      { path: "checklist.0.itemId", kind: "entityId", required: true },
      { path: "checklist.0.value", kind: "optionalText" },
      { path: "note", kind: "optionalText" },
    ],
    base: recordBase,
    call: (input) => fromAction(() => installations.saveInstallationAction(input)),
  },
  formTarget(
    "hand an installation over",
    "staffA",
    (f) => installations.handOverAction(initialFormState, f),
    [
      { path: "recordId", kind: "entityId", required: true },
      { path: "email", kind: "email", accepts: ["empty string"] },
      { path: "expiresInDays", kind: "formNumber", accepts: ["empty string"] },
    ],
    () => ({ recordId, email: "corpus@example.com", expiresInDays: "30" }),
  ),
  formTarget("withdraw a hand-over link", "staffA", (f) => installations.revokeInstallationLinkAction(initialFormState, f), [{ path: "linkId", kind: "entityId", required: true }], () => ({ linkId: "no-such-link" })),
  formTarget(
    "add a checklist item",
    "ownerA",
    (f) => installations.addChecklistItemAction(initialFormState, f),
    [
      { path: "label", kind: "requiredText", required: true },
      { path: "valueLabel", kind: "optionalText" },
    ],
    () => ({ label: "Corpus item", valueLabel: "" }),
  ),
  formTarget("remove a checklist item", "ownerA", (f) => installations.removeChecklistItemAction(initialFormState, f), [{ path: "itemId", kind: "entityId", required: true }], () => ({ itemId: "no-such-item" })),
  {
    name: "GET /api/v1/installations",
    actor: "trainerA",
    transport: "query",
    fields: [
      { path: "state", kind: "enum", accepts: ["empty string"] },
      { path: "installer", kind: "entityId", accepts: ["empty string"] },
      { path: "from", kind: "date", accepts: ["empty string"] },
      { path: "to", kind: "date", accepts: ["empty string"] },
    ],
    base: () => ({ state: "fitted" }),
    call: async (query) => fromResponse(await listRoute(request(`/api/v1/installations?${query as string}`))),
    skipBodies: true,
  },
  {
    name: "POST /api/v1/installations/photos",
    actor: "staffA",
    transport: "form",
    fields: [
      { path: "recordId", kind: "entityId", required: true },
      { path: "kind", kind: "enum", required: true },
    ],
    base: () => ({ recordId, kind: "hitch-label" }),
    call: async (form) => {
      const data = form as FormData;
      data.set("file", new File([new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d, 0x31, 0x2e, 0x34, 0x0a])], "label.pdf", { type: "application/pdf" }));
      return fromResponse(await photosRoute.POST(request("/api/v1/installations/photos", { method: "POST", body: data })));
    },
  },
  {
    name: "GET /api/v1/installations/photos/[id]",
    actor: "staffA",
    transport: "value",
    fields: [{ path: "id", kind: "entityId", required: true }],
    base: () => ({ id: "no-such-photo" }),
    call: async (input) => fromResponse(await photoRoute.GET(request("/"), params({ id: str((input as { id?: unknown } | null)?.id) }))),
    fieldErrors: false,
    wholeBody: (body) => ({ id: body }),
  },
  {
    name: "POST /api/v1/handover/confirm",
    actor: "anonymous",
    transport: "json",
    fields: [
      { path: "token", kind: "token", required: true },
      { path: "confirm", kind: "enum", required: true },
    ],
    base: () => ({ token, confirm: "yes" }),
    call: async (body) => {
      // The per-address limit would otherwise answer 429 part-way through the corpus.
      await resetRateLimits();
      const text = body as string;
      return fromResponse(await confirmRoute(request("/api/v1/handover/confirm", { method: "POST", body: text, headers: { origin: "http://localhost:3000", "content-type": "application/json", "content-length": String(Buffer.byteLength(text)) } })));
    },
  },
];

beforeAll(async () => {
  await buildFixture();
  const db = await getDb();
  await db.insert(vehicleProfiles).values({ id: "veh-corpus", organisationId: ORG_A, name: "Corpus crossover", units: "imperial", data: { units: "imperial", vehicle: { towRating: 5000, tongueWeightLimit: 500 } } });
  itemId = await addChecklistItem(OWNER_OF_A, { label: "Fasteners torqued", valueLabel: "Torque from the sheet" });
  const saved = await saveInstallation(OWNER_OF_A, { ...recordBase(), id: undefined, hitch: { class: 3 }, parts: [], measurements: {}, checklist: [], carrierDepth: undefined, note: undefined, customerEmail: undefined } as never);
  if (!saved.ok) throw new Error(saved.message);
  recordId = saved.id;
  token = (await createInstallationLink(OWNER_OF_A, recordId))!.token;
});

describe("the bad-input corpus against installation records", () => {
  for (const target of TARGETS) {
    it(`${target.name}: refused, nothing written, no internals shown`, () => runCorpus(target));
  }
});
