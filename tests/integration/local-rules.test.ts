/**
 * Where the organisation works, end to end on the server: the setting, a check saved under it (and under
 * another place for one check), and a saved check that keeps its rule set and version after the rule file
 * changes.
 */
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-rules-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { eq } from "drizzle-orm";
import { saveCheckAction } from "@/app/(workspace)/check/actions";
import { saveSettings } from "@/app/(workspace)/settings/actions";
import { GET as checkRoute } from "@/app/api/v1/checks/[id]/route";
import { getDb } from "@/db/client";
import { organisations, savedChecks } from "@/db/schema";
import { getAccess } from "@/lib/server/access";
import { getCheck } from "@/lib/server/checks";
import { RULE_SETS, ruleSetStanding, type LocalRulesResult, type RigResult } from "@/lib/towing";
import { initialFormState } from "@/lib/validation/form-state";
import { actAs, buildFixture, form } from "./support/fixture";

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));
const ORG_SETTINGS = { name: "Alder Lane Hitch", units: "metric", tightMarginPercent: "10", frontAxleLossPercent: "10", linkLifetimeDays: "180" };

beforeAll(async () => {
  await buildFixture();
});

async function orgRow() {
  const access = (await getAccess())!;
  const db = await getDb();
  return (await db.select().from(organisations).where(eq(organisations.id, access.organisation.id)).get())!;
}

describe("the organisation's place", () => {
  it("the owner sets Great Britain (England); the row keeps country and region", async () => {
    await actAs("ownerA");
    const state = await saveSettings(initialFormState, form({ ...ORG_SETTINGS, country: "GB", region: "ENG" }));
    expect(state.ok).toBe(true);
    const row = await orgRow();
    expect([row.country, row.region]).toEqual(["GB", "ENG"]);
  });
  it("a region of another country is refused with a field message and changes nothing", async () => {
    await actAs("ownerA");
    const state = await saveSettings(initialFormState, form({ ...ORG_SETTINGS, country: "US", region: "ENG" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors?.region?.[0]).toMatch(/choose one from the list/);
    const row = await orgRow();
    expect([row.country, row.region]).toEqual(["GB", "ENG"]);
  });
  it("an unknown country is refused", async () => {
    await actAs("ownerA");
    const state = await saveSettings(initialFormState, form({ ...ORG_SETTINGS, country: "Atlantis" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors?.country?.[0]).toBe("Country: choose one from the list.");
  });
});

describe("saved checks keep the rules they were read with", () => {
  let gbCheck = "";
  const original = RULE_SETS.gb!.version;
  afterAll(() => {
    (RULE_SETS.gb as { version: string }).version = original;
  });

  it("a check saved in a Great Britain shop is read against the Great Britain rule set, in its words", async () => {
    await actAs("staffA");
    const saved = await saveCheckAction({ rig: camper, customerName: "Odile Farrant" });
    expect(saved.ok).toBe(true);
    gbCheck = saved.checkId!;
    const check = (await getCheck((await getAccess())!, gbCheck))!;
    expect(check.result.rules?.ruleSetId).toBe("gb");
    expect(check.result.rules?.ruleSetVersion).toBe(original);
    const local = check.result.checks.find((c) => c.id === "local-rules") as LocalRulesResult;
    expect(local.findings.map((f) => f.ruleId)).toContain("gb.brakes.over-750");
    expect(check.result.checks.find((c) => c.id === "combined-weight")!.message).toContain("gross train weight");
  });

  it("one check can be read for another place: Texas", async () => {
    await actAs("staffA");
    const saved = await saveCheckAction({ rig: camper, place: { country: "US", region: "TX" } });
    const check = (await getCheck((await getAccess())!, saved.checkId!))!;
    expect(check.result.rules?.ruleSetId).toBe("us-tx");
    expect(check.result.checks.find((c) => c.id === "combined-weight")!.message).toContain("GCWR");
  });

  it("or for no place at all", async () => {
    await actAs("staffA");
    const saved = await saveCheckAction({ rig: camper, place: null });
    const check = (await getCheck((await getAccess())!, saved.checkId!))!;
    expect(check.result.rules).toBeUndefined();
  });

  it("after the rule file changes, the saved check still shows the version it was read with, and says the rules moved on", async () => {
    (RULE_SETS.gb as { version: string }).version = "2099.1.1";
    await actAs("staffA");
    const check = (await getCheck((await getAccess())!, gbCheck))!;
    expect(check.result.rules?.ruleSetVersion).toBe(original);
    expect(ruleSetStanding(check.result.rules)).toEqual({ readWith: original, current: "2099.1.1", changed: true });
    // The JSON the saved-check page and other programs read carries the same.
    const response = await checkRoute(new Request("http://t/"), { params: Promise.resolve({ id: gbCheck }) });
    const body = (await response.json()) as { check: { result: RigResult } };
    expect(body.check.result.rules?.ruleSetVersion).toBe(original);
    // A check saved now reads the new version.
    const again = await saveCheckAction({ rig: camper });
    const db = await getDb();
    const row = (await db.select().from(savedChecks).where(eq(savedChecks.id, again.checkId!)).get())!;
    expect((row.result as RigResult).rules?.ruleSetVersion).toBe("2099.1.1");
  });
});
