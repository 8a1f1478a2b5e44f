/**
 * The counter check's short form: the deciding figures first, the rest in folds by topic, links to the cards,
 * weight distribution in one card with the two-way comparison in the verdict, one still-to-measure list, the
 * phone's verdict bar, and how many actions a walk-in rack check takes from a blank screen to a customer link.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdirSync } from "node:fs";
import type { Page } from "playwright-core";
import { waitForHydration } from "./support/csp";
import { join } from "node:path";
import { openBrowser, pickExample, screenshot, SCREENSHOT_DIR, startSession } from "./support/browser";

type Session = Awaited<ReturnType<typeof openBrowser>>;

const WIDE = { width: 1280, height: 900 };
const PHONE_TALL = { width: 390, height: 844 };
const ACCOUNT = "owner@quillfield.example.com";
const RACK = { label: "Two-bike platform rack on a small crossover" };
const CAMPER = { label: "Travel camper on a full-size pickup" };
const SHOTS = process.env.CHECK_FORM_SHOTS;

async function shoot(page: Page, name: string) {
  await screenshot(page, name);
  if (SHOTS) {
    mkdirSync(SHOTS, { recursive: true });
    await page.screenshot({ path: `${SHOTS}/${name}.png`, fullPage: true });
  }
}

const pageHeight = (page: Page) => page.evaluate(() => document.scrollingElement!.scrollHeight);

/** The order a person gathers figures in, as lib/still-to-measure.ts documents it (its parts, first to last). */
const PARTS_IN_ORDER = ["vehicle", "hitch", "ballMount", "extender", "trailer", "accessory", "weightDistribution", "load", "driver"];

describe("the short counter form on a desktop", () => {
  let staff: Session;
  beforeAll(async () => {
    staff = await openBrowser(WIDE);
    await startSession(staff.page, ACCOUNT);
  });
  afterAll(async () => {
    await staff.close();
  });

  it("leads each card with the deciding figures and folds the rest by topic, counting what is inside", async () => {
    const { page } = staff;
    await page.goto("/check");
    await waitForHydration(page);
    const vehicle = page.locator("#workbench-vehicle");
    await vehicle.getByLabel("Tow rating", { exact: true }).waitFor();
    await vehicle.getByLabel("GCWR", { exact: true }).waitFor();
    await vehicle.getByLabel("Front GAWR").waitFor({ state: "hidden" });
    const folds = page.getByTestId("more-section");
    const titles = await folds.evaluateAll((els) => els.map((el) => el.getAttribute("data-title")));
    expect(titles).toContain("Axle ratings, weights and wheelbase");
    expect(titles).toContain("Ball mount and heights");
    expect(titles).toContain("Fender readings and front restoration");
    // A blank check waits for the axle figures: the closed fold says so, and stays closed.
    const axles = page.locator('[data-testid="more-section"][data-title="Axle ratings, weights and wheelbase"]');
    await expect.poll(() => axles.locator(":scope > summary").innerText()).toMatch(/needs \d+ figures?/);
    expect(await axles.getAttribute("open")).toBeNull();
    const blank = await pageHeight(page);

    await pickExample(page, RACK);
    // The example gives both axle ratings, the wheelbase, rear axle to pin and the two unhitched axle loads:
    // 6 of the fold's 8 figures (the hitched axle loads are not weighed).
    await expect.poll(() => axles.locator(":scope > summary").innerText()).toMatch(/6 of 8 entered/);
    expect(await axles.getAttribute("open")).toBeNull();
    const rack = await pageHeight(page);
    console.log(`check form height at 1280×900: blank ${blank} px, rack example ${rack} px`);
  });

  it("opens a fold by itself when a field inside it has an error", async () => {
    const { page } = staff;
    await page.goto("/check");
    await waitForHydration(page);
    await pickExample(page, RACK);
    const fold = page.locator('[data-testid="more-section"][data-title="Distances from the pin"]');
    expect(await fold.getAttribute("open")).toBeNull();
    // The field is set while folded (as a profile or a pasted value would), then the error opens the fold.
    await page.evaluate(() => {
      const input = document.querySelector<HTMLInputElement>('input[name="accessory.foldClearance"]')!;
      Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")!.set!.call(input, "9999");
      input.dispatchEvent(new Event("input", { bubbles: true }));
    });
    await expect.poll(() => fold.getAttribute("open")).not.toBeNull();
    await expect.poll(() => fold.locator(":scope > summary").innerText()).toMatch(/1 to fix/);
    await page.getByLabel("Fold clearance needed").waitFor();
  });

  it("jumps between the cards from the sticky links", async () => {
    const { page } = staff;
    // From a rack example with its verdict shown, not from the field the test before left in error.
    await page.goto("/check");
    await waitForHydration(page);
    await pickExample(page, RACK);
    await page.getByTestId("verdict-level").first().waitFor();
    const nav = page.getByRole("navigation", { name: "Parts of the rig" });
    await expect.poll(() => nav.getByRole("link").allInnerTexts()).toEqual(["Vehicle", "Hitch", "Rack or carrier", "Save"]);
    await nav.getByRole("link", { name: "Save" }).click();
    const saveTop = () => page.locator("#workbench-save").evaluate((el) => Math.round(el.getBoundingClientRect().top));
    await expect.poll(saveTop).toBeLessThan(WIDE.height - 200);
    expect(await saveTop()).toBeGreaterThanOrEqual(0);
    // Still in view after the scroll: the links themselves and the compact verdict beside the form.
    await nav.waitFor();
    const navBox = await nav.boundingBox();
    expect(navBox!.y).toBeGreaterThanOrEqual(0);
    // The panel's headline, or (when the panel is pushed up at the foot of the form) its compact line.
    const verdictInView = () =>
      page.evaluate((height) => {
        const inView = (el: Element | null) => {
          if (!el) return false;
          const box = el.getBoundingClientRect();
          return box.height > 0 && box.top >= 0 && box.bottom <= height && getComputedStyle(el).visibility !== "hidden";
        };
        const compact = document.querySelector('[data-testid="verdict-compact"][data-shown]');
        return inView(document.querySelector('#workbench-verdict [data-testid="verdict-level"]')) || inView(compact) ? "in view" : "out of view";
      }, WIDE.height);
    await expect.poll(verdictInView).toBe("in view");
    await page.screenshot({ path: join(SCREENSHOT_DIR, "check-save-card-verdict-desktop.png") });
    await nav.getByRole("link", { name: "Hitch" }).click();
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("workbench-hitch-title");
    const hitchTop = () => page.locator("#workbench-hitch").evaluate((el) => Math.round(el.getBoundingClientRect().top));
    await expect.poll(hitchTop).toBeLessThan(200);
    await expect.poll(hitchTop).toBeGreaterThanOrEqual(Math.floor(navBox!.height));
  });

  it("holds every weight-distribution figure in one card and shows the rig both ways, each with its governing limit", async () => {
    const { page } = staff;
    await page.goto("/check");
    await waitForHydration(page);
    await pickExample(page, CAMPER);
    const wd = page.locator("#workbench-wd");
    expect(await wd.getByLabel("Weight distribution is used").isChecked()).toBe(true);
    for (const label of ["Tow rating with weight distribution", "Tongue-weight limit with weight distribution", "Hitch GTW rating with WD", "Hitch TW rating with WD", "WD tongue rating", "Fender height, unhitched"]) {
      expect(await wd.getByLabel(label, { exact: true }).count()).toBe(1);
    }
    // Nowhere else: not in the vehicle, hitch or trailer cards.
    for (const card of ["#workbench-vehicle", "#workbench-hitch", "#workbench-hitched"]) {
      expect(await page.locator(card).getByLabel(/with weight distribution|with WD|Weight distribution is used|Fender height/).count()).toBe(0);
    }
    const compare = page.getByTestId("wd-compare").first();
    await compare.waitFor();
    const without = compare.getByTestId("wd-without");
    const withWd = compare.getByTestId("wd-with");
    // Arithmetic on the example's invented figures: without weight distribution the 780 lb tongue is over the
    // 500 lb weight-carrying tongue limit by 280 / 500 = 56 %, further over than the 6,100 lb camper is over the
    // 5,000 lb tow rating (1,100 / 5,000 = 22 %): the tongue limit governs.
    await expect.poll(() => without.getAttribute("data-level")).toBe("over");
    await expect.poll(() => without.innerText()).toMatch(/Governs: Vehicle tongue-weight limit \(500 lb\)/);
    // With it, the lowest room is the 7,000 lb chain against the 6,100 lb camper: 900 / 7,000 = 12.9 %, just
    // under the tongue's 120 / 900 = 13.3 % against the 900 lb limit with weight distribution.
    await expect.poll(() => withWd.getAttribute("data-level")).toBe("within");
    await expect.poll(() => withWd.innerText()).toMatch(/Governs: Safety chain rating \(each chain\) \(7,000 lb\)/);
    await expect.poll(() => withWd.innerText()).toMatch(/As entered/);
    await expect.poll(() => without.innerText()).not.toMatch(/As entered/);
    await shoot(page, "check-form-trailer-wd-desktop");
  });

  it("takes a tongue weight marked neither weighed nor estimated as an estimate, and says so", async () => {
    const { page } = staff;
    await page.goto("/check");
    await waitForHydration(page);
    await page.getByLabel("Gross trailer weight", { exact: true }).fill("5000");
    await page.getByLabel("Tongue weight", { exact: true }).fill("600");
    await page.getByText("Neither chosen: the checks take it as an estimate until it is marked as weighed.").waitFor();
    const row = page.getByTestId("check-tongue-measure").first();
    await expect.poll(() => row.getAttribute("data-status")).toBe("incomplete");
    await expect.poll(() => row.innerText()).toMatch(/was not marked as weighed, so it is taken as an estimate/);
    await page.getByLabel("Weighed", { exact: true }).check();
    await expect.poll(() => row.getAttribute("data-status")).toBe("within");
    expect(await page.getByText(/^Neither chosen:/).count()).toBe(0);
  });

  it("lists the figures still to measure once, in the order they are gathered, not again under each check", async () => {
    const { page } = staff;
    await page.goto("/check");
    await waitForHydration(page);
    const panel = page.getByTestId("verdict-panel").first();
    const list = panel.getByTestId("still-to-measure");
    await list.waitFor();
    expect(await panel.getByTestId("still-to-measure").count()).toBe(1);
    const fields = await list.locator("li[data-field]").evaluateAll((els) => els.map((el) => el.getAttribute("data-field")!));
    expect(fields.length).toBeGreaterThan(3);
    expect(new Set(fields).size).toBe(fields.length);
    const ranks = fields.map((f) => PARTS_IN_ORDER.indexOf(f.split(".")[0]!));
    expect(ranks.every((r) => r >= 0)).toBe(true);
    expect([...ranks].sort((a, b) => a - b)).toEqual(ranks);
    // A figure several checks wait for is named once in the panel; each check points to the list instead.
    const first = (await list.locator("li[data-field]").first().locator("span").first().innerText()).trim();
    expect(await panel.getByText(first, { exact: true }).count()).toBe(1);
    expect(await panel.getByTestId("waits-for").count()).toBeGreaterThan(1);
    await shoot(page, "check-form-blank-desktop");
  });

  it("takes a walk-in rack check from a blank screen to a customer link in a few actions", async () => {
    const { page } = staff;
    await page.goto("/check");
    await waitForHydration(page);
    let actions = 0;
    const act = async (step: () => Promise<unknown>) => {
      actions += 1;
      await step();
    };
    await act(() => page.getByText("A rack or carrier", { exact: true }).click());
    await act(() => page.getByLabel("Tongue-weight limit", { exact: true }).fill("200"));
    await act(() => page.getByLabel("Payload on the label", { exact: true }).fill("1050"));
    await act(() => page.getByLabel("Hitch TW rating", { exact: true }).fill("350"));
    await act(() => page.getByLabel("Accessory weight").fill("48"));
    await act(() => page.getByLabel("Load on it").fill("75"));
    await act(() => page.locator('[data-title="Load in the vehicle"] > summary').click());
    await act(() => page.getByLabel("Occupants").fill("320"));
    await act(() => page.getByLabel("Cargo", { exact: true }).fill("60"));
    // Arithmetic: 320 + 60 aboard and 48 + 75 = 123 lb on the hitch make 503 lb of the 1,050 lb payload,
    // 547 lb (52 %) to spare: within.
    await expect.poll(() => page.getByTestId("check-payload").first().getAttribute("data-status")).toBe("within");
    await act(() => page.getByLabel("Customer name (optional)").fill("Perrin Ashgrove"));
    await act(() => page.getByRole("button", { name: "Save check" }).click());
    await act(() => page.getByRole("link", { name: "Open the saved check" }).click());
    await page.waitForURL(/\/checks\/[A-Za-z0-9_-]+$/);
    await act(() => page.getByRole("button", { name: "Make a customer link" }).click());
    const link = page.getByLabel("Customer link", { exact: true });
    await link.waitFor();
    expect(await link.inputValue()).toMatch(/\/r\/[A-Za-z0-9_-]{32}$/);
    console.log(`walk-in rack check, blank screen to customer link: ${actions} actions`);
    expect(actions).toBeLessThanOrEqual(14);
  });

  it("draws the blank check and the rack example at 1280 × 900", async () => {
    const { page } = staff;
    await page.goto("/check");
    await waitForHydration(page);
    await shoot(page, "check-form-blank-wide");
    await pickExample(page, RACK);
    await page.getByTestId("verdict-level").first().waitFor();
    await shoot(page, "check-form-rack-wide");
  });
});

describe("the short counter form on a phone", () => {
  let phone: Session;
  beforeAll(async () => {
    phone = await openBrowser(PHONE_TALL);
    await startSession(phone.page, ACCOUNT);
  });
  afterAll(async () => {
    await phone.close();
  });

  it("brings the whole verdict into view, with the focus, from the bar's Checks button", async () => {
    const { page } = phone;
    await page.goto("/check");
    await waitForHydration(page);
    await shoot(page, "check-form-blank-phone");
    await pickExample(page, RACK);
    await shoot(page, "check-form-rack-phone");
    await pickExample(page, CAMPER);
    await shoot(page, "check-form-trailer-wd-phone");
    await page.screenshot({ path: `${SHOTS ?? "test-results/screens"}/check-form-phone-top-viewport.png` });
    // Far down the form, where the verdict's own place is out of sight.
    await page.locator("#workbench-wd").scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SHOTS ?? "test-results/screens"}/check-form-phone-wd-viewport.png` });
    const checks = page.getByRole("button", { name: /Checks/ });
    await checks.click();
    const aside = page.locator("#workbench-verdict");
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("workbench-verdict");
    const box = await aside.boundingBox();
    expect(box!.y).toBeGreaterThanOrEqual(0);
    expect(box!.y).toBeLessThan(PHONE_TALL.height / 2);
    expect(box!.y + box!.height).toBeLessThanOrEqual(PHONE_TALL.height);
    const level = await aside.getByTestId("verdict-level").boundingBox();
    expect(level!.y).toBeGreaterThanOrEqual(box!.y);
    expect(level!.y).toBeLessThan(PHONE_TALL.height);
    await page.screenshot({ path: `${SHOTS ?? "test-results/screens"}/check-form-phone-checks-open.png` });
    // Escape closes it and gives the focus back to the bar.
    await page.keyboard.press("Escape");
    await expect.poll(() => checks.getAttribute("aria-expanded")).toBe("false");
    expect(await page.evaluate(() => document.activeElement?.textContent)).toMatch(/Checks/);
  });

  it("keeps the links to the cards in reach under the verdict bar", async () => {
    const { page } = phone;
    const nav = page.getByRole("navigation", { name: "Parts of the rig" });
    await nav.getByRole("link", { name: "Trailer" }).click();
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe("workbench-hitched-title");
    const navBox = await nav.boundingBox();
    const heading = await page.locator("#workbench-hitched-title").boundingBox();
    expect(navBox!.y).toBeGreaterThanOrEqual(0);
    expect(heading!.y).toBeGreaterThan(navBox!.y + navBox!.height - 1);
    expect(heading!.y).toBeLessThan(PHONE_TALL.height / 2);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
  });
});
