/**
 * The organisation's front-axle loss limit, end to end on the server: the owner sets it in the settings, a
 * bad figure is refused and changes nothing, and a check saved afterwards is worked with it.
 */
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-front-axle-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { eq } from "drizzle-orm";
import { saveCheckAction } from "@/app/(workspace)/check/actions";
import { saveSettings } from "@/app/(workspace)/settings/actions";
import { getDb } from "@/db/client";
import { organisations } from "@/db/schema";
import { getAccess } from "@/lib/server/access";
import { getCheck } from "@/lib/server/checks";
import type { FrontAxleLossResult } from "@/lib/towing";
import { initialFormState } from "@/lib/validation/form-state";
import { actAs, buildFixture, form } from "./support/fixture";

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));
const SETTINGS = { name: "Alder Lane Hitch", units: "imperial", tightMarginPercent: "10", linkLifetimeDays: "180" };

beforeAll(async () => {
  await buildFixture();
});

async function ratio() {
  const access = (await getAccess())!;
  const db = await getDb();
  return (await db.select({ r: organisations.frontAxleLossRatio }).from(organisations).where(eq(organisations.id, access.organisation.id)).get())!.r;
}

async function savedLimit() {
  await actAs("staffA");
  const saved = await saveCheckAction({ rig: camper, place: null });
  expect(saved.ok).toBe(true);
  const check = (await getCheck((await getAccess())!, saved.checkId!))!;
  return check.result.checks.find((c) => c.id === "front-axle-loss") as FrontAxleLossResult;
}

describe("the organisation's front-axle loss limit", () => {
  it("starts at 10 %: common practice, no published source", async () => {
    await actAs("ownerA");
    expect(await ratio()).toBe(0.1);
    const c = await savedLimit();
    expect(c.limitShare).toBe(0.1);
    // 10 % of the camper's 3,150 lb front axle, unhitched = 315 lb
    expect(c.limit!.value).toBeCloseTo(315, 9);
  });

  it("the owner sets 5 %, and a check saved afterwards is worked with it", async () => {
    await actAs("ownerA");
    const state = await saveSettings(initialFormState, form({ ...SETTINGS, frontAxleLossPercent: "5" }));
    expect(state.ok).toBe(true);
    expect(await ratio()).toBe(0.05);
    const c = await savedLimit();
    expect(c.limitShare).toBe(0.05);
    // 5 % of 3,150 lb = 157.5 lb
    expect(c.limit!.value).toBeCloseTo(157.5, 9);
  });

  it("a figure out of range is refused beside its field and changes nothing", async () => {
    await actAs("ownerA");
    for (const bad of ["0", "51", "ten", ""]) {
      const state = await saveSettings(initialFormState, form({ ...SETTINGS, frontAxleLossPercent: bad }));
      expect(state.ok, bad).toBe(false);
      expect(state.fieldErrors?.frontAxleLossPercent?.[0], bad).toMatch(/Use at (least 1|most 50) %|Enter a percentage/);
    }
    expect(await ratio()).toBe(0.05);
  });

  it("staff cannot change it", async () => {
    await actAs("staffA");
    const state = await saveSettings(initialFormState, form({ ...SETTINGS, frontAxleLossPercent: "40" }));
    expect(state.ok).toBe(false);
    await actAs("ownerA");
    expect(await ratio()).toBe(0.05);
  });
});
