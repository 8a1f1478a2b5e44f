import { beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-auth-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
  process.env.AUTH_LIMIT_PER_ACCOUNT = "3";
  process.env.AUTH_LIMIT_PER_ADDRESS = "100";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { eq } from "drizzle-orm";
import { signIn } from "@/app/(public)/sign-in/actions";
import { signUp } from "@/app/(public)/sign-up/actions";
import { getDb } from "@/db/client";
import { passwordResets, signupRequests, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password-hash";
import { resetPassword } from "@/lib/server/accounts";
import { hashToken } from "@/lib/server/tokens";
import { initialFormState } from "@/lib/validation/form-state";
import { buildFixture, form, snapshot } from "./support/fixture";
import { cookieJar, NavigationSignal } from "./support/next-mocks";

beforeAll(async () => {
  await buildFixture();
  const db = await getDb();
  await db.update(users).set({ passwordHash: await hashPassword("the right passphrase") }).where(eq(users.id, "u-staff-a"));
});

describe("sign-in", () => {
  it("signs in with the right password and sets a session cookie", async () => {
    cookieJar.clear();
    await expect(signIn(initialFormState, form({ email: "staffA@example.com", password: "the right passphrase" }))).rejects.toThrow(NavigationSignal);
    expect(cookieJar.get("towmargin_session")).toMatch(/^[a-z0-9]{20,}$/);
  });

  it("gives a new session id at every sign-in (no fixation)", async () => {
    cookieJar.set("towmargin_session", "planted-by-someone-else");
    await expect(signIn(initialFormState, form({ email: "staffA@example.com", password: "the right passphrase" }))).rejects.toThrow(NavigationSignal);
    expect(cookieJar.get("towmargin_session")).not.toBe("planted-by-someone-else");
  });

  it("refuses after the limit per account with one message for known and unknown addresses", async () => {
    const answers: Record<string, string[]> = { known: [], unknown: [] };
    for (let i = 0; i < 4; i++) {
      answers.known!.push((await signIn(initialFormState, form({ email: "trainerA@example.com", password: "wrong" }))).message!);
      answers.unknown!.push((await signIn(initialFormState, form({ email: "nobody@example.com", password: "wrong" }))).message!);
    }
    expect(answers.known).toEqual(answers.unknown);
    expect(answers.known!.slice(0, 3)).toEqual(Array(3).fill("That e-mail and password do not match an account."));
    expect(answers.known![3]).toMatch(/^Too many attempts\. Wait \d+ minutes? and try again\.$/);
  });
});

describe("sign-up", () => {
  it("bad input gets field errors and stores nothing", async () => {
    const before = await snapshot();
    const state = await signUp(initialFormState, form({ name: "", email: "x", organisationName: "", organisationKind: "" }));
    expect(Object.keys(state.fieldErrors ?? {}).sort()).toEqual(["email", "name", "organisationKind", "organisationName"]);
    expect(await snapshot()).toBe(before);
    expect(await (await getDb()).select().from(signupRequests)).toEqual([]);
  });
});

describe("password reset", () => {
  it("a reset link works once, and ends every session of the account", async () => {
    const db = await getDb();
    await db.insert(passwordResets).values({ tokenHash: hashToken("reset-token-0000000001"), userId: "u-fleet-a", expiresAt: new Date(Date.now() + 60_000) });
    expect(await resetPassword("reset-token-0000000001", "a brand new passphrase")).toBe("u-fleet-a");
    expect(await resetPassword("reset-token-0000000001", "yet another passphrase")).toBeNull();
  });

  it("an expired link does nothing", async () => {
    const db = await getDb();
    await db.insert(passwordResets).values({ tokenHash: hashToken("reset-token-0000000002"), userId: "u-fleet-a", expiresAt: new Date(Date.now() - 1) });
    const before = await snapshot();
    expect(await resetPassword("reset-token-0000000002", "a brand new passphrase")).toBeNull();
    expect(await snapshot()).toBe(before);
  });
});
