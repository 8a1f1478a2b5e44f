import { createClient } from "@libsql/client";
import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { expect, inject } from "vitest";
import { sessionCookieFor } from "../../load/support/app-server";
import { CHROMIUM_PATH } from "./chromium";

export const baseURL = () => inject("baseURL");

export const DESKTOP = { width: 1280, height: 860 };
export const PHONE = { width: 375, height: 760 };

export const SCREENSHOT_DIR = join(process.cwd(), "test-results", "screens");

/**
 * A fresh browser profile (its own cookies), so each person in a test is really a different visitor. It opens
 * the suite's server unless given another one's address.
 */
export async function openBrowser(viewport = DESKTOP, appURL = baseURL()): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void> }> {
  const profile = mkdtempSync(join(tmpdir(), "towmargin-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    viewport,
    baseURL: appURL,
    args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, email: string, password = "towmargin-demo") {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/overview/);
}

/**
 * A seeded person's session started straight in the test database, as signing in would leave it: for the tests
 * that are not about signing in, so the per-account sign-in limit (8 in 15 minutes, as shipped and tested by
 * security.e2e.ts) is spent only where the sign-in form is the subject.
 */
export async function startSession(page: Page, email: string) {
  const cookie = await sessionCookieFor(inject("databaseUrl"), email);
  // A __Host- cookie takes no Domain, which the browser's cookie API always sets: the page itself sets it
  // (http://localhost counts as a secure origin, so Secure holds).
  await page.goto("/sign-in");
  await page.evaluate((value) => (document.cookie = `${value}; Path=/; Secure; SameSite=Lax`), cookie);
  await page.goto("/overview");
  await page.waitForURL(/\/overview/);
}

export async function navLabels(page: Page): Promise<string[]> {
  return page.getByRole("navigation", { name: "Sections" }).getByRole("link").allInnerTexts();
}

/** The newest captured message to this address, read from the test database. */
/** The newest mail to the address (with this subject, when given), waiting for it: some mail leaves after the answer. */
export async function latestMailTo(address: string, timeoutMs = 10_000, subject?: string): Promise<{ subject: string; text: string; html: string | null }> {
  const client = createClient({ url: inject("databaseUrl") });
  const deadline = Date.now() + timeoutMs;
  try {
    while (Date.now() < deadline) {
      const result = await client.execute({
        sql: `SELECT subject, text, html FROM captured_mail WHERE envelope_to = ?${subject ? " AND subject = ?" : ""} ORDER BY id DESC LIMIT 1`,
        args: subject ? [address, subject] : [address],
      });
      const row = result.rows[0];
      if (row) return { subject: String(row.subject), text: String(row.text), html: row.html === null ? null : String(row.html) };
      await new Promise((resolve) => setTimeout(resolve, 150));
    }
  } finally {
    client.close();
  }
  throw new Error(`No mail reached ${address} within ${timeoutMs} ms.`);
}

export function firstLink(text: string, pathPart: string): string {
  const match = text.match(new RegExp(`https?://[^\\s]*${pathPart}[^\\s]*`));
  if (!match) throw new Error(`No link containing ${pathPart} in:\n${text}`);
  return match[0];
}

/**
 * Picks a saved profile on the check screen and waits for its "Filled from…" notice. A choice made before the
 * workbench has hydrated is lost, so the pick is made again until the notice shows.
 */
export async function pickProfile(page: Page, label: string, choice: { label: string } | { index: number }) {
  const notice = "label" in choice ? page.getByText(`Filled from the saved profile “${choice.label}”`) : page.getByText(/Filled from the saved profile/);
  await expect
    .poll(
      async () => {
        await page.getByLabel(label).selectOption(choice);
        return notice.count();
      },
      { timeout: 30_000, interval: 500 },
    )
    .toBeGreaterThan(0);
}

/** Loads one of the check screen's example rigs and waits for its notice, choosing again until the screen takes it. */
export async function pickExample(page: Page, choice: { label: string } | { index: number }) {
  await expect
    .poll(
      async () => {
        await page.getByLabel("Try an example").selectOption(choice);
        return page.getByText(/^Example loaded: /).count();
      },
      { timeout: 30_000, interval: 500 },
    )
    .toBeGreaterThan(0);
}
