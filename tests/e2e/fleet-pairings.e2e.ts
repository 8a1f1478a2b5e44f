import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowser, screenshot, signIn } from "./support/browser";

type Session = Awaited<ReturnType<typeof openBrowser>>;

const WIDE = { width: 1280, height: 900 };
const NARROW = { width: 390, height: 844 };

/** Chooses an option until the grid shows its effect: a choice made before the grid has hydrated is lost. */
async function chooseUntil(page: Page, label: string, value: string, done: () => Promise<boolean>) {
  await expect
    .poll(
      async () => {
        await page.getByLabel(label, { exact: true }).selectOption(value);
        return done();
      },
      { timeout: 30_000, interval: 500 },
    )
    .toBe(true);
}

const columnNames = (page: Page) => page.getByTestId("pairing-column").allInnerTexts();
const columnWeights = (page: Page) => page.getByTestId("pairing-weight").allInnerTexts();
/** "12,500 lb gross" → 12500; a column without a weight reads as none. */
const pounds = (text: string) => (/([\d,]+) lb/.exec(text) ? Number(/([\d,]+) lb/.exec(text)![1]!.replace(/,/g, "")) : undefined);
const selectedName = (page: Page, label: string) => page.getByLabel(label, { exact: true }).evaluate((el) => (el as HTMLSelectElement).selectedOptions[0]?.textContent ?? "");

/** Scrolls the grid to its right edge: the last column must show whole, beside (not under) the held vehicles' column. */
async function lastColumnReachable(page: Page) {
  return page.getByTestId("pairings-scroller").evaluate((scroller) => {
    scroller.scrollLeft = scroller.scrollWidth;
    const box = scroller.getBoundingClientRect();
    const headers = scroller.querySelectorAll("[data-testid=pairing-column]");
    const last = headers[headers.length - 1]!.getBoundingClientRect();
    const held = scroller.querySelector("tbody th")!.getBoundingClientRect();
    const style = getComputedStyle(scroller.querySelector("tbody th")!);
    return {
      inside: last.right <= box.right + 1 && last.left >= held.right - 1,
      heldAtLeft: Math.abs(held.left - box.left) <= 2,
      heldOpaque: style.backgroundColor !== "rgba(0, 0, 0, 0)" && style.position === "sticky",
      pageScrollsSideways: document.documentElement.scrollWidth > window.innerWidth,
    };
  });
}

describe("fleet pairings: sorted by weight and capacity, opened as a check", () => {
  let manager: Session;

  beforeAll(async () => {
    manager = await openBrowser(WIDE);
    await signIn(manager.page, "fleet@fernhollow.example.com");
  });
  afterAll(async () => {
    await manager.close();
  });

  it("sorts the columns heaviest first and the vehicles by the most they may pull, across pages and a reload", async () => {
    const { page } = manager;
    await page.setViewportSize(WIDE);
    await page.goto("/fleet/matrix");
    await page.getByText("Before anyone hooks up").waitFor();
    // Invented demo figures (db/demo-fleet.ts): the deck-over flatbed's 12,500 lb gross is the fleet's heaviest.
    await chooseUntil(page, "Sort trailers and accessories", "weight-desc", async () => (await columnNames(page))[0]?.includes("Deck-over flatbed J") ?? false);
    const weights = (await columnWeights(page)).map(pounds);
    expect(weights[0]).toBe(12500);
    expect(weights.every((w) => w !== undefined)).toBe(true);
    expect(weights).toEqual([...weights].sort((a, b) => b! - a!));
    expect(await page.getByRole("rowheader", { name: "Weight" }).getAttribute("aria-sort")).toBe("descending");

    // Crew trucks 05 and 06: tow rating 14,000 lb under a 16,000 lb hitch, so the vehicle's rating sets it (demo figures).
    await chooseUntil(page, "Sort vehicles", "capacity-desc", async () => (await page.getByTestId("pairing-row").first().innerText()).includes("Crew truck 05"));
    const first = await page.getByTestId("pairing-row").first().getByRole("rowheader").innerText();
    expect(first).toContain("14,000 lb");
    expect(first).toContain("by the vehicle tow rating");
    expect(await page.getByRole("columnheader", { name: /^Vehicle/ }).getAttribute("aria-sort")).toBe("descending");
    await expect.poll(() => page.url()).toContain("hitchedSort=weight-desc");
    expect(page.url()).toContain("vehicleSort=capacity-desc");

    // The next columns carry on where the first page stopped: none heavier than its lightest.
    await page.getByRole("button", { name: "Next columns" }).click();
    await expect.poll(async () => (await columnNames(page))[0]?.includes("Deck-over flatbed J")).toBe(false);
    const next = (await columnWeights(page)).map(pounds).filter((w): w is number => w !== undefined);
    expect(Math.max(...next)).toBeLessThanOrEqual(weights.at(-1)!);
    await page.getByRole("button", { name: "Previous columns" }).click();

    // The address holds the order: a reload shows the same grid.
    await page.reload();
    await expect.poll(async () => (await columnNames(page))[0]).toContain("Deck-over flatbed J");
    expect(await page.getByLabel("Sort trailers and accessories").inputValue()).toBe("weight-desc");

    const wide = await lastColumnReachable(page);
    expect(wide).toEqual({ inside: true, heldAtLeft: true, heldOpaque: true, pageScrollsSideways: false });
    await screenshot(page, "fleet-pairings-sorted-scrolled-desktop");

    await page.setViewportSize(NARROW);
    await page.waitForTimeout(300);
    const narrow = await lastColumnReachable(page);
    expect(narrow).toEqual({ inside: true, heldAtLeft: true, heldOpaque: true, pageScrollsSideways: false });
    await screenshot(page, "fleet-pairings-sorted-scrolled-phone");
    await page.setViewportSize(WIDE);
  });

  it("an unknown order in the address falls back to by name", async () => {
    const { page } = manager;
    await page.goto("/fleet/matrix?hitchedSort=sideways&vehicleSort=");
    await page.getByText("Before anyone hooks up").waitFor();
    expect(await page.getByLabel("Sort trailers and accessories").inputValue()).toBe("name");
    expect((await columnNames(page))[0]).toContain("Chipper I");
  });

  it("opens a pairing as a check with both pickers naming the saved profiles", async () => {
    const { page } = manager;
    await page.goto("/fleet/matrix?vehicleSort=capacity-desc&hitchedSort=weight-desc");
    await expect.poll(async () => (await columnNames(page))[0]).toContain("Deck-over flatbed J");
    await page.getByTestId("pairing-row").first().getByTestId("pairing-cell").first().click();
    await page.waitForURL(/\/check\?vehicle=.+&trailer=/);
    await page.getByText("Starting from the fleet's profiles: Crew truck 05").waitFor();
    expect(await selectedName(page, "Saved vehicle")).toBe("Crew truck 05 · Brackwater 3500 dually");
    expect(await selectedName(page, "Saved trailer")).toBe("Deck-over flatbed J · 8×20");
    await page.getByText("The lowest rating of any part is the limit for the whole rig.").first().waitFor();
    await screenshot(page, "fleet-pairing-check-pickers-desktop");

    // An accessory's pairing names the rack in its own picker.
    await page.goto("/fleet/matrix?hitched=Tool%20basket%20K");
    await expect.poll(async () => (await columnNames(page)).length).toBe(1);
    await page.getByTestId("pairing-cell").first().click();
    await page.waitForURL(/\/check\?vehicle=.+&accessory=/);
    await page.getByLabel("Saved rack or carrier").waitFor();
    expect(await selectedName(page, "Saved rack or carrier")).toBe("Tool basket K · 60 in");
    expect(await selectedName(page, "Saved vehicle")).not.toBe("Choose a saved profile…");
  });
});
