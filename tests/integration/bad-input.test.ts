import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-bad-input-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
  process.env.AUTH_LIMIT_PER_ACCOUNT = "100000";
  process.env.AUTH_LIMIT_PER_ADDRESS = "100000";
  process.env.EVALUATE_LIMIT_PER_MINUTE = "100000";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { switchTo } from "@/app/(workspace)/actions";
import { saveCheckAction, saveVehicleProfileAction } from "@/app/(workspace)/check/actions";
import { createLinkAction, emailLinkAction, revokeLinkAction } from "@/app/(workspace)/checks/[id]/actions";
import { saveSettings } from "@/app/(workspace)/settings/actions";
import { invite, remove, revoke, setRole } from "@/app/(workspace)/team/actions";
import { askForReset } from "@/app/(public)/forgot-password/actions";
import { acceptAsNewMember, acceptAsSignedIn } from "@/app/(public)/invite/[token]/actions";
import { chooseNewPassword } from "@/app/(public)/reset-password/[token]/actions";
import { signIn } from "@/app/(public)/sign-in/actions";
import { finishSignup, signUp } from "@/app/(public)/sign-up/actions";
import { changePasswordAction } from "@/app/(workspace)/account/actions";
import { GET as getCheck } from "@/app/api/v1/checks/[id]/route";
import { GET as listChecks, POST as postCheck } from "@/app/api/v1/checks/route";
import { POST as evaluate } from "@/app/api/v1/evaluate/route";
import { getDb } from "@/db/client";
import { savedChecks } from "@/db/schema";
import { initialFormState } from "@/lib/validation/form-state";
import { CORPUS_SIZE } from "./support/bad-input-corpus";
import { BYPASS_FORMS } from "../support/redirect-bypass";
import { users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password-hash";
import { eq } from "drizzle-orm";
import { NavigationSignal } from "./support/next-mocks";
import { fromAction, fromResponse, jsonRequest, runCorpus, toForm, type FieldSpec, type Target } from "./support/bad-input-harness";
import { snapshotAll, STACK_TRACE } from "./support/tables";
import { actAs, buildFixture, INVITATION_A, ORG_A, sessionOrganisation } from "./support/fixture";

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));

/** The rig's fields worth breaking, under a prefix ("rig." inside a save, "" for a bare rig). */
function rigFields(prefix: string): FieldSpec[] {
  return [
    { path: `${prefix}units`, kind: "enum", required: true },
    { path: `${prefix}vehicle`, kind: "object", required: true },
    { path: `${prefix}vehicle.gvwr`, kind: "measure" },
    { path: `${prefix}trailer.grossTrailerWeight`, kind: "measure" },
    { path: `${prefix}hitch.receiverHeight`, kind: "measure" },
    { path: `${prefix}trailer.type`, kind: "enum", required: true },
    { path: `${prefix}name`, kind: "optionalText" },
    { path: `${prefix}trailer.mam`, kind: "measure" },
    { path: `${prefix}hitch.dValue`, kind: "measure" },
    { path: `${prefix}driver.licence`, kind: "enum" },
    { path: `${prefix}vehicle.tyreLoadRear`, kind: "measure" },
    { path: `${prefix}hitch.pinDiameter`, kind: "enum" },
    { path: `${prefix}trailer.axleRating`, kind: "measure" },
  ];
}

let checkId = "";
let linkId = "";
let linkToken = "";

const TARGETS: Target[] = [
  {
    name: "POST /api/v1/evaluate",
    actor: "anonymous",
    transport: "json",
    fields: rigFields(""),
    base: () => structuredClone(camper),
    call: async (body) => fromResponse(await evaluate(jsonRequest("http://t/api/v1/evaluate", body as string))),
  },
  {
    name: "POST /api/v1/evaluate (summary)",
    actor: "anonymous",
    transport: "json",
    // The rig's own fields are covered above (the wrapped form answers the same keys, without "rig.").
    fields: [{ path: "detail", kind: "enum" }],
    base: () => ({ rig: structuredClone(camper), detail: "summary" }),
    call: async (body) => fromResponse(await evaluate(jsonRequest("http://t/api/v1/evaluate", body as string))),
  },
  {
    name: "POST /api/v1/checks",
    actor: "staffA",
    transport: "json",
    fields: [...rigFields("rig."), { path: "customerName", kind: "optionalText" }, { path: "note", kind: "optionalText" }],
    base: () => ({ rig: structuredClone(camper), customerName: "Tamsin Orrery", note: "Fits." }),
    call: async (body) => fromResponse(await postCheck(jsonRequest("http://t/api/v1/checks", body as string))),
  },
  {
    name: "GET /api/v1/checks",
    actor: "staffA",
    transport: "query",
    fields: [
      { path: "pageSize", kind: "formNumber" },
      { path: "sort", kind: "enum" },
      { path: "dir", kind: "enum" },
      { path: "level", kind: "enum", accepts: ["empty string"] },
      { path: "from", kind: "date", accepts: ["empty string"] },
      { path: "customer", kind: "optionalText" },
    ],
    base: () => ({ pageSize: "20", sort: "createdAt", dir: "desc", level: "over", from: "2026-01-01", customer: "orrery" }),
    call: async (query) => fromResponse(await listChecks(new Request(`http://t/api/v1/checks?${query as string}`))),
  },
  {
    name: "GET /api/v1/checks/[id]",
    actor: "staffA",
    transport: "value",
    fields: [{ path: "id", kind: "entityId", required: true }],
    base: () => ({ id: checkId }),
    call: async (input) => fromResponse(await getCheck(new Request("http://t/"), { params: Promise.resolve({ id: String((input as { id?: unknown })?.id) }) })),
    fieldErrors: false,
    wholeBody: (body) => (typeof body === "object" ? body : { id: body }),
  },
  {
    name: "save a check (action)",
    actor: "staffA",
    transport: "value",
    fields: [
      ...rigFields("rig."),
      { path: "customerName", kind: "optionalText" },
      { path: "note", kind: "optionalText" },
      { path: "place.country", kind: "enum", required: true },
      { path: "place.region", kind: "enum", accepts: ["empty string"] },
    ],
    base: () => ({ rig: structuredClone(camper), customerName: "Tamsin Orrery", place: { country: "US", region: "TX" } }),
    call: (input) => fromAction(() => saveCheckAction(input)),
  },
  {
    name: "save a vehicle profile (action)",
    actor: "staffA",
    transport: "value",
    fields: [{ path: "name", kind: "requiredText", required: true }, ...rigFields("rig.")],
    base: () => ({ name: "Counter demo tow vehicle", rig: structuredClone(camper) }),
    call: (input) => fromAction(() => saveVehicleProfileAction(input)),
  },
  {
    name: "make a customer link",
    actor: "staffA",
    transport: "form",
    fields: [
      { path: "checkId", kind: "entityId", required: true },
      { path: "expiresInDays", kind: "formNumber", accepts: ["empty string"] },
    ],
    base: () => ({ checkId, expiresInDays: "30" }),
    call: (input) => fromAction(() => createLinkAction(initialFormState, input as FormData)),
  },
  {
    name: "withdraw a customer link",
    actor: "staffA",
    transport: "form",
    fields: [{ path: "linkId", kind: "entityId", required: true }],
    base: () => ({ linkId }),
    call: (input) => fromAction(() => revokeLinkAction(initialFormState, input as FormData)),
  },
  {
    name: "mail a customer link",
    actor: "staffA",
    transport: "form",
    fields: [
      { path: "checkId", kind: "entityId", required: true },
      { path: "token", kind: "token", required: true },
      { path: "email", kind: "email", required: true },
    ],
    base: () => ({ checkId, token: linkToken, email: "customer@example.com" }),
    call: (input) => fromAction(() => emailLinkAction(initialFormState, input as FormData)),
  },
  {
    name: "invite a member",
    actor: "ownerA",
    transport: "form",
    fields: [
      { path: "email", kind: "email", required: true },
      { path: "role", kind: "enum", required: true },
    ],
    base: () => ({ email: "applicant@example.com", role: "staff" }),
    call: (input) => fromAction(() => invite(initialFormState, input as FormData)),
  },
  {
    name: "change a role",
    actor: "ownerA",
    transport: "form",
    fields: [
      { path: "membershipId", kind: "looseId", required: true },
      { path: "role", kind: "enum", required: true },
    ],
    base: () => ({ membershipId: "m-staffA", role: "trainer" }),
    call: (input) => fromAction(() => setRole(initialFormState, input as FormData)),
  },
  {
    name: "remove a member",
    actor: "ownerA",
    transport: "form",
    fields: [{ path: "membershipId", kind: "looseId", required: true }],
    base: () => ({ membershipId: "m-trainerA" }),
    call: (input) => fromAction(() => remove(initialFormState, input as FormData)),
  },
  {
    name: "withdraw an invitation",
    actor: "ownerA",
    transport: "form",
    fields: [{ path: "invitationId", kind: "looseId", required: true }],
    base: () => ({ invitationId: INVITATION_A.id }),
    call: (input) => fromAction(() => revoke(initialFormState, input as FormData)),
  },
  {
    name: "organisation settings",
    actor: "ownerA",
    transport: "form",
    fields: [
      { path: "name", kind: "requiredText", required: true },
      { path: "units", kind: "enum", required: true },
      { path: "tightMarginPercent", kind: "formNumber", required: true },
      { path: "frontAxleLossPercent", kind: "formNumber", required: true },
      { path: "linkLifetimeDays", kind: "formNumber", required: true },
      { path: "country", kind: "enum", accepts: ["empty string"] },
      { path: "region", kind: "enum", accepts: ["empty string"] },
    ],
    base: () => ({ name: "Alder Lane Hitch", units: "imperial", tightMarginPercent: "10", frontAxleLossPercent: "10", linkLifetimeDays: "180", country: "US", region: "TX" }),
    call: (input) => fromAction(() => saveSettings(initialFormState, input as FormData)),
  },
  {
    name: "sign in",
    actor: "anonymous",
    transport: "form",
    fields: [
      { path: "email", kind: "email", required: true },
      { path: "password", kind: "password", required: true },
      { path: "next", kind: "optionalText" },
    ],
    base: () => ({ email: "staffa@example.com", password: "not the password", next: "/checks" }),
    call: (input) => fromAction(() => signIn(initialFormState, input as FormData)),
  },
  {
    name: "sign up",
    actor: "anonymous",
    transport: "form",
    fields: [
      { path: "name", kind: "requiredText", required: true },
      { path: "email", kind: "email", required: true },
      { path: "organisationName", kind: "requiredText", required: true },
      { path: "organisationKind", kind: "enum", required: true },
    ],
    base: () => ({ name: "Wren Aldous", email: "wren@example.com", organisationName: "Wren Tow Supply", organisationKind: "shop" }),
    call: (input) => fromAction(() => signUp(initialFormState, input as FormData)),
  },
  {
    name: "finish signing up",
    actor: "anonymous",
    transport: "form",
    fields: [
      { path: "token", kind: "token", required: true },
      { path: "password", kind: "newPassword", required: true },
    ],
    base: () => ({ token: "no-such-signup-token-000001", password: "a long enough passphrase", confirmPassword: "a long enough passphrase" }),
    call: (input) => fromAction(() => finishSignup(initialFormState, input as FormData)),
  },
  {
    name: "change my password",
    actor: "staffA",
    transport: "form",
    fields: [
      { path: "currentPassword", kind: "password", required: true },
      { path: "password", kind: "newPassword", required: true },
    ],
    // The current password is wrong here: a case that got past the schema is still refused, at its field.
    base: () => ({ currentPassword: "not the current one", password: "a long enough passphrase", confirmPassword: "a long enough passphrase" }),
    call: (input) => fromAction(() => changePasswordAction(initialFormState, input as FormData)),
  },
  {
    name: "ask for a password reset",
    actor: "anonymous",
    transport: "form",
    fields: [{ path: "email", kind: "email", required: true }],
    base: () => ({ email: "staffa@example.com" }),
    call: (input) => fromAction(() => askForReset(initialFormState, input as FormData)),
  },
  {
    name: "choose a new password",
    actor: "anonymous",
    transport: "form",
    fields: [
      { path: "token", kind: "token", required: true },
      { path: "password", kind: "newPassword", required: true },
    ],
    base: () => ({ token: "no-such-reset-token-000001", password: "a long enough passphrase", confirmPassword: "a long enough passphrase" }),
    call: (input) => fromAction(() => chooseNewPassword(initialFormState, input as FormData)),
  },
  {
    name: "accept an invitation with a new account",
    actor: "anonymous",
    transport: "form",
    fields: [
      { path: "token", kind: "token", required: true },
      { path: "name", kind: "requiredText", required: true },
      { path: "password", kind: "newPassword", required: true },
    ],
    base: () => ({ token: INVITATION_A.token, name: "Newcomer Person", password: "a long enough passphrase" }),
    call: (input) => fromAction(() => acceptAsNewMember(initialFormState, input as FormData)),
  },
  {
    name: "accept an invitation signed in",
    actor: "staffA",
    transport: "form",
    fields: [{ path: "token", kind: "token", required: true }],
    base: () => ({ token: INVITATION_A.token }),
    call: (input) => fromAction(() => acceptAsSignedIn(initialFormState, input as FormData)),
    fieldErrors: false,
  },
  {
    name: "switch organisation",
    actor: "staffA",
    transport: "form",
    fields: [{ path: "organisationId", kind: "looseId", required: true }],
    base: () => ({ organisationId: ORG_A }),
    call: async (input) => {
      const before = await sessionOrganisation();
      const outcome = await fromAction(() => switchTo(input as FormData));
      // The switcher answers with a redirect either way; refused means the session did not move.
      return { ...outcome, refused: !outcome.threw && (await sessionOrganisation()) === before };
    },
    fieldErrors: false,
  },
];

beforeAll(async () => {
  await buildFixture();
  await actAs("staffA");
  const saved = await saveCheckAction({ rig: camper, customerName: "Tamsin Orrery" });
  checkId = saved.checkId!;
  const link = await createLinkAction(initialFormState, toForm({ checkId }));
  linkToken = link.token!;
  const db = await getDb();
  linkId = (await db.query.shareLinks.findFirst())!.id;
});

describe("the bad-input corpus", () => {
  it(`holds at least 40 inputs (${CORPUS_SIZE})`, () => {
    expect(CORPUS_SIZE).toBeGreaterThanOrEqual(40);
  });

  for (const target of TARGETS) {
    it(`${target.name}: every bad field and body is refused with field errors, writes nothing and shows no internals`, () => runCorpus(target));
  }

  it("a way back after sign-in that would leave the site lands on the app's own page", async () => {
    const db = await getDb();
    await db.update(users).set({ passwordHash: await hashPassword("the bad-input passphrase") }).where(eq(users.id, "u-trainer-a"));
    for (const next of BYPASS_FORMS) {
      await actAs("anonymous");
      let landed = "";
      try {
        await signIn(initialFormState, toForm({ email: "trainera@example.com", password: "the bad-input passphrase", next }));
      } catch (error) {
        if (error instanceof NavigationSignal) landed = error.url ?? "";
      }
      expect(new URL(landed, "https://towmargin.example.com/sign-in").origin, JSON.stringify(next)).toBe("https://towmargin.example.com");
    }
  });

  it("attack forms of a body: chunked with no length, not declared as JSON, or sent from another site", async () => {
    await actAs("staffA");
    const routes = [
      { name: "evaluate", call: (request: Request) => evaluate(request), body: JSON.stringify(camper) },
      { name: "save a check", call: (request: Request) => postCheck(request), body: JSON.stringify({ rig: camper }) },
    ];
    const before = await snapshotAll();
    for (const { name, call, body } of routes) {
      let pulled = 0;
      const endless = new ReadableStream<Uint8Array>({
        pull(controller) {
          pulled += 16 * 1024;
          controller.enqueue(new Uint8Array(16 * 1024).fill(0x20));
        },
      });
      const chunked = await fromResponse(await call(new Request("http://t/", { method: "POST", body: endless, headers: { "content-type": "application/json" }, duplex: "half" } as RequestInit)));
      expect(chunked.status, name).toBe(413);
      expect(Object.keys(chunked.fieldErrors).length, name).toBeGreaterThan(0);
      expect(pulled, name).toBeLessThan(200 * 1024);
      for (const contentType of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", ""]) {
        const outcome = await fromResponse(await call(new Request("http://t/", { method: "POST", body, headers: contentType ? { "content-type": contentType } : {} })));
        expect(outcome.status, `${name} as ${contentType || "no type"}`).toBe(415);
        expect(Object.keys(outcome.fieldErrors).length).toBeGreaterThan(0);
        expect(outcome.text).not.toMatch(STACK_TRACE);
      }
      for (const origin of ["https://evil.example.com", "null", "http://localhost:3000.evil.example.com"]) {
        const outcome = await fromResponse(await call(new Request("http://t/", { method: "POST", body, headers: { "content-type": "application/json", origin } })));
        expect(outcome.status, `${name} from ${origin}`).toBe(403);
      }
    }
    expect(await snapshotAll()).toBe(before);
  });

  it("SQL in a search is a search for that text, and the tables stay", async () => {
    await actAs("staffA");
    for (const fragment of ["' OR '1'='1' --", "%' OR 1=1 --", "x'; DROP TABLE saved_checks; --", "_%_%"]) {
      const response = await listChecks(new Request(`http://t/api/v1/checks?customer=${encodeURIComponent(fragment)}&vehicle=${encodeURIComponent(fragment)}`));
      expect(response.status).toBe(200);
      expect(((await response.json()) as { total: number }).total).toBe(0);
    }
    expect((await (await getDb()).select().from(savedChecks)).length).toBeGreaterThan(0);
  });

  it("unknown keys in a valid save are dropped, never stored", async () => {
    await actAs("staffA");
    const body = JSON.stringify({ rig: { ...camper, secretKey: "s", vehicle: { ...camper.vehicle, turbo: true } }, customerName: "Tamsin Orrery", organisationId: "org-b" });
    const response = await postCheck(jsonRequest("http://t/api/v1/checks", body));
    expect(response.status).toBe(201);
    const { id } = (await response.json()) as { id: string };
    const row = (await (await getDb()).select().from(savedChecks)).find((r) => r.id === id)!;
    expect(row.organisationId).toBe(ORG_A);
    expect(JSON.stringify(row.rig)).not.toMatch(/secretKey|turbo/);
  });
});
