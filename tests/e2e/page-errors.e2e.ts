import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseURL, openBrowser, signIn } from "./support/browser";
import { waitForHydration } from "./support/csp";

type Session = Awaited<ReturnType<typeof openBrowser>>;

/**
 * Every main page, visited as the person who uses it, loads without a script error, a console error (React's
 * hydration mismatch is one) or a failed request for one of the app's own files (a missing icon is one).
 */
function watch(page: Page) {
  const problems: string[] = [];
  page.on("pageerror", (error) => problems.push(`page error: ${error.message}`));
  page.on("console", (message) => {
    if (message.type() === "error") problems.push(`console error: ${message.text()}`);
  });
  page.on("response", (response) => {
    const url = response.url();
    // The page itself may answer 403/404 on purpose; its own files may not.
    if (url.startsWith(baseURL()) && response.status() >= 400 && response.request().resourceType() !== "document") {
      problems.push(`${response.status()} for ${url.slice(baseURL().length)}`);
    }
  });
  return problems;
}

async function visitAll(session: Session, paths: string[]): Promise<Record<string, string[]>> {
  const found: Record<string, string[]> = {};
  for (const path of paths) {
    const page = await session.context.newPage();
    const problems = watch(page);
    await page.goto(path);
    await waitForHydration(page);
    await page.waitForLoadState("networkidle");
    if (problems.length) found[path] = problems;
    await page.close();
  }
  return found;
}

describe("main pages load without errors", () => {
  let session: Session;
  beforeAll(async () => {
    session = await openBrowser();
  });
  afterAll(async () => session.close());

  it("signed out: the front door, sign-in, sign-up, password help and the quick check", async () => {
    expect(await visitAll(session, ["/", "/sign-in", "/sign-up", "/forgot-password", "/quick-check"])).toEqual({});
  });

  it("counter staff: overview, the check, saved checks, a saved check, its customer page, training", async () => {
    await signIn(session.page, "counter@quillfield.example.com");
    await session.page.goto("/checks");
    const first = session.page.locator("tbody a[href^='/checks/']").first();
    await first.waitFor();
    const checkPath = (await first.getAttribute("href"))!;
    await session.page.goto(checkPath);
    await session.page.getByRole("button", { name: "Make a customer link" }).click();
    const link = session.page.getByLabel("Customer link", { exact: true });
    await link.waitFor();
    const customerPath = new URL(await link.inputValue()).pathname;
    expect(await visitAll(session, ["/overview", "/check", "/checks", checkPath, customerPath, "/training", "/training/library"])).toEqual({});
  });

  it("the owner: team, organisation and mailbox", async () => {
    await session.context.clearCookies();
    await signIn(session.page, "owner@quillfield.example.com");
    expect(await visitAll(session, ["/team", "/settings", "/mailbox"])).toEqual({});
  });

  it("the fleet manager: the fleet, its lists, pairings and import", async () => {
    await session.context.clearCookies();
    await signIn(session.page, "fleet@fernhollow.example.com");
    expect(await visitAll(session, ["/fleet", "/fleet/vehicles", "/fleet/trailers", "/fleet/accessories", "/fleet/matrix", "/fleet/import"])).toEqual({});
  });

  it("the trainer: training, results and a new lesson", async () => {
    await session.context.clearCookies();
    await signIn(session.page, "trainer@quillfield.example.com");
    expect(await visitAll(session, ["/training", "/training/results", "/training/lessons/new"])).toEqual({});
  });
});
