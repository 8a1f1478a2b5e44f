import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { join } from "node:path";
import type { Locator, Page } from "playwright-core";
import { DESKTOP, openBrowser, PHONE, pickExample, screenshot, SCREENSHOT_DIR, signIn } from "./support/browser";

/** Load the first example rig once the page is ready to take it. */
async function loadExample(page: Page) {
  await expect
    .poll(async () => {
      await pickExample(page, { index: 1 });
      return page.getByText(/Example loaded:/).count();
    })
    .toBeGreaterThan(0);
}

async function shot(locator: Locator, name: string) {
  await locator.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`) });
}

type Session = Awaited<ReturnType<typeof openBrowser>>;

describe("words a new hire understands: the check screen's help and a lesson", () => {
  let desk: Session;
  let phone: Session;

  beforeAll(async () => {
    desk = await openBrowser(DESKTOP);
    phone = await openBrowser(PHONE);
    // The trainer: counter staff sign in in many browser files, and the per-account sign-in limit counts them all.
    await signIn(desk.page, "trainer@quillfield.example.com");
    await signIn(phone.page, "trainer@quillfield.example.com");
  });
  afterAll(async () => {
    await desk.close();
    await phone.close();
  });

  it("a field's help opens the glossary's definition in place, and a step symbol opens its entry", async () => {
    const { page } = desk;
    await page.goto("/check");
    await loadExample(page);
    await page.getByText("What is GVWR?").first().click();
    await page.getByText(/The most the vehicle may weigh loaded/).first().waitFor();
    await screenshot(page, "glossary-field-help-desktop");
    await shot(page.locator("#workbench-vehicle"), "glossary-vehicle-card-desktop");
    // Open one check's worked steps and follow a symbol to its definition.
    const payload = page.getByTestId("check-payload").first();
    await payload.getByText(/How it is worked out/).click();
    const symbol = payload.locator('a[href^="#sym-"]').first();
    await symbol.waitFor();
    const href = (await symbol.getAttribute("href"))!;
    await symbol.click();
    await expect.poll(() => page.locator("#glossary").evaluate((el) => (el as HTMLDetailsElement).open)).toBe(true);
    await page.locator(href).waitFor({ state: "visible" });
    await screenshot(page, "glossary-check-desktop");
    await shot(payload, "glossary-steps-desktop");
    await shot(page.locator("#glossary"), "glossary-list-desktop");
  });

  it("reads the same on a phone", async () => {
    const { page } = phone;
    await page.goto("/check");
    await loadExample(page);
    await page.getByText("What is GCWR?").first().click();
    await page.getByText(/The most the whole rig may weigh/).first().waitFor();
    await screenshot(page, "glossary-field-help-phone");
    await shot(page.locator("#workbench-vehicle"), "glossary-vehicle-card-phone");
  });

  it("a lesson defines the words and symbols it uses, with the hands-on cautions of its step", async () => {
    for (const [session, name] of [
      [desk, "desktop"],
      [phone, "phone"],
    ] as const) {
      const { page } = session;
      await page.goto("/training/library/weighing-a-heavy-tongue");
      const words = page.getByRole("region", { name: "Words and symbols in this lesson" });
      await words.getByText("Tongue weight (TW)", { exact: true }).first().waitFor();
      await page.locator("#sym-k").waitFor();
      await page.getByTestId("lesson-cautions").getByText(/Chock the trailer's wheels/).first().waitFor();
      await screenshot(page, `glossary-lesson-${name}`);
      await shot(words, `glossary-lesson-words-${name}`);
    }
  });
});
