import { readFileSync } from "node:fs";
import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-hardening-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
  process.env.DEV_MAILBOX = "on";
  process.env.UPLOAD_DIR = `${process.env.TMPDIR ?? "/tmp"}/towmargin-hardening-uploads-${process.pid}`;
  process.env.AUTH_LIMIT_PER_ACCOUNT = "6";
  process.env.AUTH_LIMIT_PER_ADDRESS = "5";
  process.env.EVALUATE_LIMIT_PER_MINUTE = "100000";
  process.env.MAIL_LIMIT_PER_MEMBER_PER_HOUR = "3";
  process.env.MAIL_LIMIT_PER_ORGANISATION_PER_HOUR = "5";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

/** Every mail the server hands to the relay, kept here instead of sent. */
const outbox = vi.hoisted(() => [] as Array<{ to: string; subject: string; text: string }>);
vi.mock("@/lib/server/mail", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/server/mail")>();
  return {
    ...real,
    sendMail: async (mail: { to: string; subject: string; text: string }) => {
      outbox.push(mail);
      return true;
    },
    sendMailInBackground: (mail: { to: string; subject: string; text: string }) => {
      outbox.push(mail);
    },
  };
});

/** Counts the hashes the server computes, so a test can tell whether a request got as far as hashing. */
const hashing = vi.hoisted(() => ({ calls: 0 }));
vi.mock("@/lib/auth/password-hash", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/auth/password-hash")>();
  return {
    ...real,
    hashPassword: async (password: string) => {
      hashing.calls++;
      return real.hashPassword(password);
    },
  };
});

import { createHash } from "node:crypto";
import { and, count, eq } from "drizzle-orm";
import { createLinkAction } from "@/app/(workspace)/checks/[id]/actions";
import { saveSettings } from "@/app/(workspace)/settings/actions";
import { invite } from "@/app/(workspace)/team/actions";
import { askForReset } from "@/app/(public)/forgot-password/actions";
import { acceptAsNewMember } from "@/app/(public)/invite/[token]/actions";
import { chooseNewPassword } from "@/app/(public)/reset-password/[token]/actions";
import { signIn } from "@/app/(public)/sign-in/actions";
import { finishSignup, signUp } from "@/app/(public)/sign-up/actions";
import { POST as postCheck } from "@/app/api/v1/checks/route";
import { POST as evaluate } from "@/app/api/v1/evaluate/route";
import { POST as uploadDocument } from "@/app/api/v1/fleet/documents/route";
import { POST as importFleet } from "@/app/api/v1/fleet/import/route";
import { databaseHandle, getDb } from "@/db/client";
import { capturedMail, memberships, passwordResets, sessions, shareLinks, signupRequests, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password-hash";
import type { AccessContext } from "@/lib/server/access";
import { isPasswordResetUsable, requestPasswordReset, resetPassword, verifyCredentials } from "@/lib/server/accounts";
import { getCapturedMail, listCapturedMail } from "@/lib/server/mailbox";
import { resetRateLimits } from "@/lib/server/rate-limit";
import { getLucia } from "@/lib/server/session";
import { createShareLink, emailShareLink } from "@/lib/server/share-links";
import { changeRole, removeMember } from "@/lib/server/team";
import { hashToken, newId } from "@/lib/server/tokens";
import { saveCheck } from "@/lib/server/checks";
import { initialFormState } from "@/lib/validation/form-state";
import { OWNER_OF_A } from "./support/access-matrix";
import { actAs, buildFixture, form, ORG_A, ORG_B, PEOPLE } from "./support/fixture";
import { cookieJar, NavigationSignal, requestHeaders, resetRequestHeaders } from "./support/next-mocks";

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));
const APP_ORIGIN = "http://localhost:3000";
const DAY = 86_400_000;
const sha256 = (value: string) => createHash("sha256").update(value).digest("hex");

const OWNER_OF_B: AccessContext = {
  ...OWNER_OF_A,
  user: { id: PEOPLE.ownerB.id, email: "ownerb@example.com", name: "ownerB" },
  organisation: { id: ORG_B, name: "Birchmoor Fleet", kind: "fleet", units: "imperial", tightMarginRatio: 0.1, frontAxleLossRatio: 0.1, country: null, region: null },
  memberships: [{ organisationId: ORG_B, organisationName: "Birchmoor Fleet", role: "owner" }],
};

async function signedInAs(userId: string): Promise<string> {
  const lucia = await getLucia();
  const session = await lucia.createSession(userId, { organisationId: ORG_A });
  return session.id;
}

async function expectRedirect(run: () => Promise<unknown>): Promise<string> {
  try {
    const value = await run();
    throw new Error(`expected a redirect, got ${JSON.stringify(value)}`);
  } catch (error) {
    if (error instanceof NavigationSignal && error.kind === "redirect") return error.url!;
    throw error;
  }
}

/** A body of `total` bytes in chunks, counting what the server pulled from it. */
function countedStream(total: number, chunk = 16 * 1024) {
  const counter = { pulled: 0 };
  let sent = 0;
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (sent >= total) return controller.close();
      const size = Math.min(chunk, total - sent);
      sent += size;
      counter.pulled += size;
      controller.enqueue(new Uint8Array(size).fill(0x20));
    },
  });
  return { stream, counter };
}

const streamed = (path: string, body: ReadableStream<Uint8Array>, contentType: string) =>
  new Request(`http://t${path}`, { method: "POST", body, headers: { "content-type": contentType }, duplex: "half" } as RequestInit);

beforeAll(async () => {
  await buildFixture();
  const db = await getDb();
  await db.update(users).set({ passwordHash: await hashPassword("the right passphrase") }).where(eq(users.id, PEOPLE.staffA.id));
});

beforeEach(async () => {
  await resetRateLimits();
  resetRequestHeaders();
  outbox.length = 0;
});

describe("the captured-mail page", () => {
  it("shows an owner only the mail of their own organisation's members and invitees", async () => {
    const db = await getDb();
    const rows = await db
      .insert(capturedMail)
      .values([
        { envelopeFrom: "no-reply@towmargin.example.com", envelopeTo: "staffa@example.com", subject: "For a member of A", text: "a" },
        { envelopeFrom: "no-reply@towmargin.example.com", envelopeTo: "newcomer@example.com", subject: "For an invitee of A", text: "b" },
        { envelopeFrom: "no-reply@towmargin.example.com", envelopeTo: "ownerb@example.com", subject: "Reset link of B's owner", text: "c" },
        { envelopeFrom: "no-reply@towmargin.example.com", envelopeTo: "stranger@example.com", subject: "For nobody's member", text: "d" },
      ])
      .returning({ id: capturedMail.id, subject: capturedMail.subject });
    const seenByA = (await listCapturedMail(OWNER_OF_A)).map((mail) => mail.subject);
    expect(seenByA).toContain("For a member of A");
    expect(seenByA).toContain("For an invitee of A");
    expect(seenByA).not.toContain("Reset link of B's owner");
    expect(seenByA).not.toContain("For nobody's member");
    const ofB = rows.find((row) => row.subject === "Reset link of B's owner")!;
    expect(await getCapturedMail(OWNER_OF_A, ofB.id)).toBeUndefined();
    expect((await getCapturedMail(OWNER_OF_B, ofB.id))?.subject).toBe("Reset link of B's owner");
  });
});

describe("request bodies", () => {
  it("a body with no declared length is read only up to the limit on every route that reads one", async () => {
    await actAs("ownerA");
    const cases: Array<{ name: string; limit: number; run: (body: ReadableStream<Uint8Array>) => Promise<Response> }> = [
      { name: "evaluate", limit: 64 * 1024, run: (body) => evaluate(streamed("/api/v1/evaluate", body, "application/json")) },
      { name: "save a check", limit: 64 * 1024, run: (body) => postCheck(streamed("/api/v1/checks", body, "application/json")) },
      { name: "fleet import", limit: 2 * 1024 * 1024 + 64 * 1024, run: (body) => importFleet(streamed("/api/v1/fleet/import", body, "multipart/form-data; boundary=x")) },
      { name: "label upload", limit: 8 * 1024 * 1024 + 64 * 1024, run: (body) => uploadDocument(streamed("/api/v1/fleet/documents", body, "multipart/form-data; boundary=x")) },
    ];
    for (const { name, limit, run } of cases) {
      const { stream, counter } = countedStream(limit * 4);
      const response = await run(stream);
      expect(response.status, name).toBe(413);
      expect(counter.pulled, name).toBeLessThanOrEqual(limit + 2 * 16 * 1024);
      const body = (await response.json()) as { fieldErrors?: Record<string, string[]> };
      expect(Object.keys(body.fieldErrors ?? {}).length, name).toBeGreaterThan(0);
    }
  });
});

describe("password reset", () => {
  it("checks a made-up token before hashing anything", async () => {
    const before = hashing.calls;
    const state = await chooseNewPassword(initialFormState, form({ token: "made-up-token-000000000001", password: "a long enough passphrase", confirmPassword: "a long enough passphrase" }));
    expect(state.message).toBe("This link has been used or has expired. Ask for a new one.");
    expect(hashing.calls).toBe(before);
  });

  it("is limited per client address", async () => {
    const messages: string[] = [];
    for (let i = 0; i < 6; i++) {
      const state = await chooseNewPassword(initialFormState, form({ token: `made-up-token-00000000000${i}`, password: "a long enough passphrase", confirmPassword: "a long enough passphrase" }));
      messages.push(state.message ?? "");
    }
    expect(messages.slice(0, 5)).toEqual(Array(5).fill("This link has been used or has expired. Ask for a new one."));
    expect(messages[5]).toMatch(/^Too many attempts\. Wait \d+ minutes? and try again\.$/);
  });

  it("a successful reset spends every other open link of the account, and a new request spends the older ones", async () => {
    const db = await getDb();
    const expiresAt = new Date(Date.now() + 60_000);
    await db.insert(passwordResets).values([
      { tokenHash: hashToken("reset-older-link-000000001"), userId: PEOPLE.fleetA.id, expiresAt },
      { tokenHash: hashToken("reset-older-link-000000002"), userId: PEOPLE.fleetA.id, expiresAt },
    ]);
    expect(await resetPassword("reset-older-link-000000002", "a brand new passphrase")).toBe(PEOPLE.fleetA.id);
    expect(await isPasswordResetUsable("reset-older-link-000000001")).toBe(false);

    await db.insert(passwordResets).values({ tokenHash: hashToken("reset-older-link-000000003"), userId: PEOPLE.fleetA.id, expiresAt });
    await requestPasswordReset("fleeta@example.com");
    await vi.waitFor(() => expect(outbox.some((mail) => mail.to === "fleeta@example.com")).toBe(true));
    expect(await isPasswordResetUsable("reset-older-link-000000003")).toBe(false);
  });
});

describe("sign-in limits", () => {
  it("once the client address is refused, further attempts do not spend the account's counter", async () => {
    const answers: string[] = [];
    requestHeaders.set("x-towmargin-peer", "198.51.100.10");
    for (let i = 0; i < 8; i++) answers.push((await signIn(initialFormState, form({ email: "nobody-limits@example.com", password: "wrong" }))).message!);
    expect(answers.slice(0, 5)).toEqual(Array(5).fill("That e-mail and password do not match an account."));
    expect(answers[5]).toMatch(/^Too many attempts/);
    // From another address, the account has used five of its six attempts, not eight.
    requestHeaders.set("x-towmargin-peer", "198.51.100.11");
    expect((await signIn(initialFormState, form({ email: "nobody-limits@example.com", password: "wrong" }))).message).toBe("That e-mail and password do not match an account.");
  });

  it("a forwarding header the client made up does not give it a fresh address", async () => {
    const answers: string[] = [];
    for (let i = 0; i < 6; i++) {
      requestHeaders.set("x-forwarded-for", `198.51.100.${100 + i}`);
      answers.push((await signIn(initialFormState, form({ email: `someone-${i}@example.com`, password: "wrong" }))).message!);
    }
    expect(answers[5]).toMatch(/^Too many attempts/);
  });
});

describe("signing up", () => {
  it("asks for no password; the password is chosen on the confirmation page", async () => {
    const state = await signUp(initialFormState, form({ name: "Perrin Vale", email: "perrin@example.com", organisationName: "Vale Tow Gear", organisationKind: "shop" }));
    expect(state.fieldErrors?.password).toBeUndefined();
    expect(state.ok).toBe(true);
    const db = await getDb();
    const token = "signup-token-chosen-at-confirm-1";
    await db.insert(signupRequests).values({ tokenHash: hashToken(token), email: "perrin2@example.com", name: "Perrin Vale", organisationName: "Vale Tow Gear", organisationKind: "shop", expiresAt: new Date(Date.now() + DAY) });
    const missing = await finishSignup(initialFormState, form({ token }));
    expect(missing.fieldErrors?.password?.length).toBeGreaterThan(0);
    const common = await finishSignup(initialFormState, form({ token, password: "password1234", confirmPassword: "password1234" }));
    expect(common.fieldErrors?.password?.[0]).toMatch(/common/);
    expect(await expectRedirect(() => finishSignup(initialFormState, form({ token, password: "perrin's chosen passphrase", confirmPassword: "perrin's chosen passphrase" })))).toMatch(/^\/overview/);
    expect(await verifyCredentials("perrin2@example.com", "perrin's chosen passphrase")).not.toBeNull();
  });
});

describe("the last owner", () => {
  it("two owners demoting or removing each other at once leave at least one owner", async () => {
    const db = await getDb();
    await db.insert(users).values({ id: "u-owner-a2", email: "ownera2@example.com", name: "Second owner", passwordHash: "not-a-real-hash" });
    await db.insert(memberships).values({ id: "m-ownerA2", userId: "u-owner-a2", organisationId: ORG_A, role: "owner" });
    const second: AccessContext = { ...OWNER_OF_A, user: { id: "u-owner-a2", email: "ownera2@example.com", name: "Second owner" } };
    const owners = async () =>
      (await db.select({ n: count() }).from(memberships).where(and(eq(memberships.organisationId, ORG_A), eq(memberships.role, "owner"))).get())!.n;

    await Promise.all([changeRole(OWNER_OF_A, "m-ownerA2", "staff"), changeRole(second, "m-ownerA", "staff")]);
    expect(await owners()).toBeGreaterThanOrEqual(1);
    await db.update(memberships).set({ role: "owner" }).where(eq(memberships.organisationId, ORG_A));
    await db.update(memberships).set({ role: "staff" }).where(eq(memberships.id, "m-staffA"));
    await db.update(memberships).set({ role: "trainer" }).where(eq(memberships.id, "m-trainerA"));
    await db.update(memberships).set({ role: "fleet_manager" }).where(eq(memberships.id, "m-fleetA"));
    // Only the two owners left as owners: each removes the other.
    await Promise.all([removeMember(OWNER_OF_A, "m-ownerA2"), removeMember(second, "m-ownerA")]);
    expect(await owners()).toBeGreaterThanOrEqual(1);
    await db.insert(memberships).values({ id: "m-ownerA-back", userId: PEOPLE.ownerA.id, organisationId: ORG_A, role: "owner" }).onConflictDoNothing();
  });
});

describe("custom POST routes", () => {
  it("refuse another site's Origin and a body that is not JSON where JSON is expected", async () => {
    await actAs("ownerA");
    const send = (path: string, headers: Record<string, string>, body: BodyInit) => new Request(`http://t${path}`, { method: "POST", headers, body });
    const json = JSON.stringify(camper);
    for (const [name, run] of [
      ["evaluate", (h: Record<string, string>, b: BodyInit) => evaluate(send("/api/v1/evaluate", h, b))],
      ["save a check", (h: Record<string, string>, b: BodyInit) => postCheck(send("/api/v1/checks", h, JSON.stringify({ rig: JSON.parse(b as string) })))],
    ] as const) {
      expect((await run({ "content-type": "application/json", origin: "https://evil.example.com" }, json)).status, name).toBe(403);
      expect((await run({ "content-type": "application/json", origin: "null" }, json)).status, name).toBe(403);
      expect((await run({ "content-type": "application/json", "sec-fetch-site": "cross-site" }, json)).status, name).toBe(403);
      const plain = await run({ "content-type": "text/plain" }, json);
      expect(plain.status, name).toBe(415);
      expect(Object.keys(((await plain.json()) as { fieldErrors?: object }).fieldErrors ?? {}).length, name).toBeGreaterThan(0);
      expect((await run({ "content-type": "application/json", origin: APP_ORIGIN }, json)).status, name).toBeLessThan(300);
      expect((await run({ "content-type": "application/json; charset=utf-8" }, json)).status, name).toBeLessThan(300);
    }
    const upload = new FormData();
    upload.set("kind", "vehicles");
    upload.set("units", "imperial");
    upload.set("mode", "preview");
    upload.set("file", new File(["name,units\nVan,imperial\n"], "fleet.csv", { type: "text/csv" }));
    expect((await importFleet(new Request("http://t/api/v1/fleet/import", { method: "POST", headers: { origin: "https://evil.example.com" }, body: upload }))).status).toBe(403);
    expect((await uploadDocument(new Request("http://t/api/v1/fleet/documents", { method: "POST", headers: { origin: "https://evil.example.com" }, body: upload }))).status).toBe(403);
  });
});

describe("customer links", () => {
  it("expire after the organisation's lifetime by default (180 days), which the owner can change", async () => {
    const { id: checkId } = await saveCheck(OWNER_OF_A, { rig: camper, customerName: "Lifetime Customer", note: undefined });
    const link = (await createShareLink(OWNER_OF_A, checkId))!;
    expect(link.expiresAt).not.toBeNull();
    expect(Math.abs(link.expiresAt!.getTime() - (Date.now() + 180 * DAY))).toBeLessThan(60_000);

    await actAs("ownerA");
    const saved = await saveSettings(initialFormState, form({ name: "Alder Lane Hitch", units: "imperial", tightMarginPercent: "10", frontAxleLossPercent: "10", linkLifetimeDays: "90" }));
    expect(saved.ok).toBe(true);
    const made = await createLinkAction(initialFormState, form({ checkId }));
    expect(Math.abs(new Date(made.expiresAt!).getTime() - (Date.now() + 90 * DAY))).toBeLessThan(60_000);
    const refused = await saveSettings(initialFormState, form({ name: "Alder Lane Hitch", units: "imperial", tightMarginPercent: "10", frontAxleLossPercent: "10", linkLifetimeDays: "0" }));
    expect(refused.fieldErrors?.linkLifetimeDays?.length).toBeGreaterThan(0);
  });

  it("an expired link is not mailed", async () => {
    const { id: checkId } = await saveCheck(OWNER_OF_A, { rig: camper, customerName: "Expired Customer", note: undefined });
    const link = (await createShareLink(OWNER_OF_A, checkId, 7))!;
    const db = await getDb();
    await db.update(shareLinks).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(shareLinks.id, link.id));
    const answer = await emailShareLink(OWNER_OF_A, checkId, link.token, "customer@example.com");
    expect(answer).toEqual({ ok: false, message: "That link is not open any more. Make a new one." });
    expect(outbox).toEqual([]);
  });
});

describe("sessions", () => {
  it("are stored by the hash of their id, never the id the cookie carries", async () => {
    cookieJar.clear();
    await expectRedirect(() => signIn(initialFormState, form({ email: "staffa@example.com", password: "the right passphrase" })));
    const lucia = await getLucia();
    const id = cookieJar.get(lucia.sessionCookieName)!;
    expect(id).toBeTruthy();
    const db = await getDb();
    const stored = (await db.select({ id: sessions.id }).from(sessions)).map((row) => row.id);
    expect(stored).not.toContain(id);
    expect(stored).toContain(sha256(id));
    expect((await lucia.validateSession(id)).session).not.toBeNull();
  });

  it("end at their absolute lifetime even while they are in use", async () => {
    const lucia = await getLucia();
    const id = await signedInAs(PEOPLE.staffA.id);
    expect((await lucia.validateSession(id)).session).not.toBeNull();
    await getDb();
    const { client } = databaseHandle();
    await client.execute({ sql: "UPDATE sessions SET created_at = ? WHERE id = ?", args: [Date.now() - 91 * DAY, sha256(id)] });
    expect((await lucia.validateSession(id)).session).toBeNull();
  });
});

describe("mail sent on a member's behalf", () => {
  it("is limited per member and per organisation, and keeps names the visitor chose out of the subject", async () => {
    await actAs("ownerA");
    const answers: string[] = [];
    for (let i = 0; i < 4; i++) answers.push((await invite(initialFormState, form({ email: `invitee-${i}@example.com`, role: "staff" }))).message!);
    expect(answers.slice(0, 3).every((m) => m.startsWith("Invitation sent"))).toBe(true);
    expect(answers[3]).toMatch(/^You have sent a lot of mail/);
    for (const mail of outbox) {
      expect(mail.subject).not.toContain("Alder Lane Hitch");
      expect(mail.subject).not.toContain("ownerA");
    }
    // Another member of the same organisation shares the organisation's five an hour.
    const lucia = await getLucia();
    const { id: checkId } = await saveCheck(OWNER_OF_A, { rig: camper, customerName: "Limit Customer", note: undefined });
    const staff: AccessContext = { ...OWNER_OF_A, user: { id: PEOPLE.staffA.id, email: "staffa@example.com", name: "staffA" }, role: "staff" };
    const results: boolean[] = [];
    for (let i = 0; i < 3; i++) {
      const link = (await createShareLink(staff, checkId))!;
      results.push((await emailShareLink(staff, checkId, link.token, `customer-${i}@example.com`)).ok);
    }
    expect(results).toEqual([true, true, false]);
    const customerMail = outbox.filter((mail) => mail.to.startsWith("customer-"));
    for (const mail of customerMail) expect(mail.subject).not.toContain("Alder Lane Hitch");
    void lucia;
  });
});

describe("changing a password while signed in", () => {
  it("needs the current password, refuses a common one, and ends the account's other sessions", async () => {
    const { changePasswordAction } = await import("@/app/(workspace)/account/actions");
    const lucia = await getLucia();
    const other = await signedInAs(PEOPLE.staffA.id);
    const mine = await signedInAs(PEOPLE.staffA.id);
    cookieJar.clear();
    cookieJar.set(lucia.sessionCookieName, mine);

    const wrong = await changePasswordAction(initialFormState, form({ currentPassword: "not it", password: "staff's next passphrase", confirmPassword: "staff's next passphrase" }));
    expect(wrong.fieldErrors?.currentPassword?.length).toBeGreaterThan(0);
    const common = await changePasswordAction(initialFormState, form({ currentPassword: "the right passphrase", password: "qwertyuiop", confirmPassword: "qwertyuiop" }));
    expect(common.fieldErrors?.password?.[0]).toMatch(/common/);
    const done = await changePasswordAction(initialFormState, form({ currentPassword: "the right passphrase", password: "staff's next passphrase", confirmPassword: "staff's next passphrase" }));
    expect(done.ok).toBe(true);
    expect((await lucia.validateSession(other)).session).toBeNull();
    expect((await lucia.validateSession(cookieJar.get(lucia.sessionCookieName)!)).session).not.toBeNull();
    expect(await verifyCredentials("staffa@example.com", "staff's next passphrase")).not.toBeNull();
    const db = await getDb();
    await db.update(users).set({ passwordHash: await hashPassword("the right passphrase") }).where(eq(users.id, PEOPLE.staffA.id));
  });

  it("a common password is refused when accepting an invitation and when resetting", async () => {
    const db = await getDb();
    const token = `invite-common-${newId()}`;
    await db.insert((await import("@/db/schema")).invitations).values({ id: newId(), organisationId: ORG_A, email: "common-pw@example.com", role: "staff", tokenHash: hashToken(token), expiresAt: new Date(Date.now() + DAY) });
    const accepted = await acceptAsNewMember(initialFormState, form({ token, name: "Common Choice", password: "1234567890" }));
    expect(accepted.fieldErrors?.password?.[0]).toMatch(/common/);
    await db.insert(passwordResets).values({ tokenHash: hashToken("reset-common-000000000001"), userId: PEOPLE.trainerA.id, expiresAt: new Date(Date.now() + 60_000) });
    const reset = await chooseNewPassword(initialFormState, form({ token: "reset-common-000000000001", password: "password123", confirmPassword: "password123" }));
    expect(reset.fieldErrors?.password?.[0]).toMatch(/common/);
    expect(await isPasswordResetUsable("reset-common-000000000001")).toBe(true);
  });

  it("forgot-password answers the same for known and unknown addresses", async () => {
    const known = await askForReset(initialFormState, form({ email: "trainera@example.com" }));
    const unknown = await askForReset(initialFormState, form({ email: "nobody-at-all@example.com" }));
    expect(known).toEqual(unknown);
  });
});
