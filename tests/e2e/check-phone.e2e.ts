import type { ConsoleMessage } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowser, pickProfile, screenshot, startSession } from "./support/browser";
import { waitForHydration } from "./support/csp";

type Session = Awaited<ReturnType<typeof openBrowser>>;

const PHONE_390 = { width: 390, height: 844 };

/**
 * The check screen on a phone: typing redraws the verdict (its sheet closed, so the charts have no size) without a
 * console warning or error, and the weakest-link table fits its sheet with the status column in view.
 */
describe("the check screen on a 390 px phone", () => {
  let session: Session;
  const messages: string[] = [];

  beforeAll(async () => {
    session = await openBrowser(PHONE_390);
    session.page.on("console", (message: ConsoleMessage) => {
      if (message.type() === "warning" || message.type() === "error") messages.push(`${message.type()}: ${message.text()}`);
    });
    session.page.on("pageerror", (error) => messages.push(`page error: ${error.message}`));
    await startSession(session.page, "owner@quillfield.example.com");
  });
  afterAll(async () => session.close());

  it("types in the form with no warning or error from the charts, sheet closed or open", async () => {
    const { page } = session;
    await page.goto("/check");
    await waitForHydration(page);
    await pickProfile(page, "Saved vehicle", { label: "Harrow Rookfield 2500 pickup" });
    await pickProfile(page, "Saved trailer", { label: "Bramblecote 24 travel trailer" });
    const verdict = page.getByTestId("verdict-level").first();
    await expect.poll(() => verdict.getAttribute("data-level")).toBe("within");
    messages.length = 0;

    // Keystroke by keystroke, the verdict sheet closed (the charts' frame has no size then).
    const gross = page.getByLabel("Gross trailer weight", { exact: true });
    await gross.fill("");
    await gross.pressSequentially("6350", { delay: 40 });
    await page.getByLabel("Tongue weight", { exact: true }).pressSequentially("5", { delay: 40 });
    await expect.poll(() => page.getByTestId("verdict-panel").first().getAttribute("data-evaluated-at")).not.toBeNull();
    await page.waitForTimeout(300);
    expect(messages.filter((m) => /width|height|chart/i.test(m))).toEqual([]);

    // Open the sheet: the charts draw now, at the sheet's width.
    await page.locator("button[aria-controls='workbench-verdict']").click();
    const sheet = page.locator("#workbench-verdict");
    await sheet.locator(".recharts-surface").first().waitFor();
    // Closed again and typed again.
    await page.locator("button[aria-controls='workbench-verdict']").click();
    await gross.pressSequentially("0", { delay: 40 });
    await gross.press("Backspace");
    await page.waitForTimeout(300);

    expect(messages.filter((m) => /width|height|chart/i.test(m))).toEqual([]);
    expect(messages).toEqual([]);
  });

  it("fits the weakest-link table in the sheet: every status in view, no sideways scroll", async () => {
    const { page } = session;
    await page.locator("button[aria-controls='workbench-verdict']").click();
    const sheet = page.locator("#workbench-verdict");
    const table = sheet.getByTestId("links-table").first();
    await table.scrollIntoViewIfNeeded();
    const fit = await table.evaluate((wrapper) => {
      const box = wrapper.getBoundingClientRect();
      const badges = [...wrapper.querySelectorAll("tbody tr td:last-child")].map((cell) => cell.getBoundingClientRect().right);
      return { scroll: wrapper.scrollWidth, client: wrapper.clientWidth, right: box.right, badges, viewport: window.innerWidth };
    });
    expect(fit.badges.length).toBeGreaterThan(3);
    expect(fit.scroll).toBeLessThanOrEqual(fit.client + 1);
    for (const right of fit.badges) expect(right).toBeLessThanOrEqual(Math.min(fit.right, fit.viewport) + 1);
    await table.screenshot({ path: "test-results/screens/check-weakest-link-phone.png" });
    await screenshot(page, "check-verdict-sheet-phone");
  });
});
