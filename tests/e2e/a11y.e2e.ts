import AxeBuilder from "@axe-core/playwright";
import { readFileSync } from "node:fs";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DESKTOP, openBrowser, PHONE, pickExample, signIn } from "./support/browser";
import { waitForHydration } from "./support/csp";

type Session = Awaited<ReturnType<typeof openBrowser>>;

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));

interface Finding {
  id: string;
  impact: string;
  help: string;
  targets: string[];
}

/** axe-core's WCAG 2.x A and AA rules on the page as it stands; the serious and critical findings. */
async function seriousFindings(page: Page): Promise<Finding[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
  return results.violations
    .filter((violation) => violation.impact === "serious" || violation.impact === "critical")
    .map((violation) => ({ id: violation.id, impact: violation.impact!, help: violation.help, targets: violation.nodes.slice(0, 5).map((node) => node.target.join(" ")) }));
}

/**
 * Findings on pages this suite does not own, reported to their owners and tolerated here until fixed: a
 * finding not listed still fails, and so does any finding on every other page.
 */
const KNOWN_ELSEWHERE: Record<string, string[]> = {};

function describeFindings(findings: Finding[]): string {
  return findings.map((f) => `${f.impact} ${f.id}: ${f.help}\n    ${f.targets.join("\n    ")}`).join("\n");
}

describe("accessibility: no serious or critical axe findings on the main pages", () => {
  let visitor: Session;
  let staff: Session;
  let owner: Session;
  let fleet: Session;
  let trainer: Session;
  let checkPath = "";
  let linkPath = "";

  beforeAll(async () => {
    [visitor, staff, owner, fleet, trainer] = await Promise.all([openBrowser(PHONE), openBrowser(DESKTOP), openBrowser(DESKTOP), openBrowser(DESKTOP), openBrowser(DESKTOP)]);
    await signIn(staff.page, "counter2@quillfield.example.com");
    await signIn(owner.page, "owner@quillfield.example.com");
    await signIn(fleet.page, "fleet@fernhollow.example.com");
    await signIn(trainer.page, "trainer@quillfield.example.com");
    const saved = await staff.page.request.post("/api/v1/checks", { data: { rig: camper, customerName: "Axe Customer" } });
    checkPath = `/checks/${((await saved.json()) as { id: string }).id}`;
    await staff.page.goto(checkPath);
    await staff.page.getByRole("button", { name: "Make a customer link" }).click();
    const field = staff.page.getByLabel("Customer link", { exact: true });
    await field.waitFor();
    linkPath = new URL(await field.inputValue()).pathname;
  });
  afterAll(async () => {
    await Promise.all([visitor, staff, owner, fleet, trainer].map((session) => session.close()));
  });

  const audit = async (session: Session, path: string, prepare?: (page: Page) => Promise<void>) => {
    const page = await session.context.newPage();
    try {
      const response = await page.goto(path);
      expect(response?.status(), path).toBeLessThan(400);
      await waitForHydration(page);
      if (prepare) await prepare(page);
      await page.waitForLoadState("networkidle");
      const all = await seriousFindings(page);
      const known = all.filter((finding) => KNOWN_ELSEWHERE[path]?.includes(finding.id));
      if (known.length) console.log(`known findings on ${path} (left to the page's owners):\n${describeFindings(known)}`);
      const findings = all.filter((finding) => !known.includes(finding));
      expect(findings, `${path}\n${describeFindings(findings)}`).toEqual([]);
    } finally {
      await page.close();
    }
  };

  it("landing", () => audit(visitor, "/"));
  it("sign-in", () => audit(visitor, "/sign-in"));
  it("sign-in with its error messages showing", () =>
    audit(visitor, "/sign-in", async (page) => {
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.getByText(/Enter an e-mail address|Enter your password/).first().waitFor();
    }));
  it("sign-up", () => audit(visitor, "/sign-up"));
  it("quick check with an example rig", () =>
    audit(visitor, "/quick-check", async (page) => {
      await pickExample(page, { index: 1 });
      await expect.poll(() => page.getByTestId("verdict-level").first().getAttribute("data-level")).toMatch(/within|tight|adjust|over/);
    }));
  it("customer's link page", () => audit(visitor, linkPath));
  it("overview", () => audit(staff, "/overview"));
  it("check, with a verdict and its charts", () =>
    audit(staff, "/check", async (page) => {
      await page.getByLabel("Saved vehicle").selectOption({ index: 1 });
      await page.getByLabel("Saved trailer").selectOption({ index: 1 });
      await page.locator(".recharts-surface").first().waitFor();
    }));
  it("saved checks", () => audit(staff, "/checks"));
  it("saved check detail, with a customer link made", () =>
    audit(staff, checkPath, async (page) => {
      await page.getByRole("button", { name: "Make a customer link" }).click();
      await page.getByLabel("Customer link", { exact: true }).waitFor();
    }));
  it("team", () => audit(owner, "/team"));
  it("settings", () => audit(owner, "/settings"));
  it("mailbox", () => audit(owner, "/mailbox"));
  it("fleet", () => audit(fleet, "/fleet"));
  it("fleet vehicles", () => audit(fleet, "/fleet/vehicles"));
  it("fleet pairings", () => audit(fleet, "/fleet/matrix"));
  it("fleet import", () => audit(fleet, "/fleet/import"));
  it("training", () => audit(trainer, "/training"));
  it("training library", () => audit(trainer, "/training/library"));
  it("training results", () => audit(trainer, "/training/results"));
  it("new training lesson", () => audit(trainer, "/training/lessons/new"));
});
