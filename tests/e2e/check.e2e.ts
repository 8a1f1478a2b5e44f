import { waitForHydration } from "./support/csp";
import { createClient } from "@libsql/client";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inject } from "vitest";
import { DESKTOP, firstLink, latestMailTo, openBrowser, PHONE, pickExample, pickProfile, screenshot, signIn } from "./support/browser";

type Session = Awaited<ReturnType<typeof openBrowser>>;

async function countSavedChecks(): Promise<number> {
  const client = createClient({ url: inject("databaseUrl") });
  try {
    return Number((await client.execute("SELECT count(*) AS n FROM saved_checks")).rows[0]!.n);
  } finally {
    client.close();
  }
}

function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

describe("the counter check, saved, shared and withdrawn", () => {
  let staff: Session;
  let customer: Session;
  let checkUrl = "";
  let linkUrl = "";

  beforeAll(async () => {
    staff = await openBrowser(DESKTOP);
    customer = await openBrowser(PHONE);
    await signIn(staff.page, "counter@quillfield.example.com");
  });
  afterAll(async () => {
    await staff.close();
    await customer.close();
  });

  it("fills a rig from saved profiles and the verdict follows a changed number", async () => {
    const { page } = staff;
    await page.goto("/check");
    // A choice made before the page's scripts run is lost: wait until it is live, then for each fill's notice.
    await waitForHydration(page);
    await pickProfile(page, "Saved vehicle", { label: "Harrow Rookfield 2500 pickup" });
    await pickProfile(page, "Saved trailer", { label: "Bramblecote 24 travel trailer" });
    const verdict = page.getByTestId("verdict-level").first();
    await expect.poll(() => verdict.getAttribute("data-level")).toBe("within");
    await screenshot(page, "check-desktop");

    const gross = page.getByLabel("Gross trailer weight", { exact: true });
    await gross.fill("11500");
    await expect.poll(() => verdict.getAttribute("data-level")).toBe("over");
    await expect.poll(() => page.getByTestId("check-weakest-link").first().getAttribute("data-status")).toBe("over");
    await gross.fill("6200");
    await expect.poll(() => verdict.getAttribute("data-level")).not.toBe("over");
  });

  it("updates the verdict within one frame of a keystroke (p95 over 40 changes)", async () => {
    const { page } = staff;
    // One round: `count` changes of the gross trailer weight, each timed from the input event to the verdict
    // panel's stamp of the new result (a layout effect, before paint).
    const round = (count: number) =>
      page.evaluate(async (count) => {
        const input = [...document.querySelectorAll("label")].find((l) => l.textContent?.trim().startsWith("Gross trailer weight"));
        const field = document.getElementById(input!.htmlFor) as HTMLInputElement;
        const panel = () => document.querySelector("[data-evaluated-at]") as HTMLElement;
        const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")!.set!;
        const results: number[] = [];
        for (let i = 0; i < count; i++) {
          const before = Number(panel().dataset.evaluatedAt);
          const started = performance.now();
          setter.call(field, String(5000 + i * 37));
          field.dispatchEvent(new Event("input", { bubbles: true }));
          while (Number(panel().dataset.evaluatedAt) === before) await new Promise((r) => setTimeout(r, 0));
          results.push(Number(panel().dataset.evaluatedAt) - started);
        }
        return results;
      }, count);
    // Warm-up first: the first changes run code the browser has not optimised yet, and a person types more than
    // ten numbers. Then up to three rounds: a busy machine can only add time, never take it away, so one round
    // under the budget shows the page can keep it; a page that is slow is slow in every round.
    await round(10);
    const p95s: number[] = [];
    for (let attempt = 1; attempt <= 3; attempt++) {
      const latencies = await round(40);
      const p95 = percentile(latencies, 95);
      p95s.push(p95);
      console.log(`input → verdict latency, round ${attempt} of 40 changes: p50 ${percentile(latencies, 50).toFixed(2)} ms, p95 ${p95.toFixed(2)} ms`);
      if (p95 < 16) break;
    }
    expect(Math.min(...p95s)).toBeLessThan(16);
  });

  it("shows a ball mount that leaves the trailer off level as a set-up to adjust, not a rating exceeded", async () => {
    const { page } = staff;
    await page.getByLabel("Gross trailer weight", { exact: true }).fill("6200");
    const verdict = page.getByTestId("verdict-level").first();
    await expect.poll(() => verdict.getAttribute("data-level")).toBe("within");
    // Geometry: the demo pickup's receiver and the camper's coupler need a small drop; a 12 in drop is far off level
    // (the drop sits in the hitch card's "Ball mount and heights" fold).
    await page.locator('[data-testid="more-section"][data-title="Ball mount and heights"] > summary').click();
    await page.getByLabel("Drop (negative for a rise)").fill("12");
    await expect.poll(() => verdict.getAttribute("data-level")).toBe("adjust");
    await expect.poll(() => page.getByTestId("check-ball-mount").first().getAttribute("data-status")).toBe("adjust");
    await expect.poll(() => page.getByTestId("check-weakest-link").first().getAttribute("data-status")).not.toBe("over");
    await page.getByTestId("verdict-meaning").first().filter({ hasText: "the set-up needs adjusting before you tow" }).waitFor();
    await screenshot(page, "check-adjust-desktop");
  });

  it("saves the check with the customer's name", async () => {
    const { page } = staff;
    await page.getByLabel("Gross trailer weight", { exact: true }).fill("6200");
    const before = await countSavedChecks();
    await page.getByLabel("Customer name (optional)").fill("Hollis Ambersmith");
    await page.getByRole("button", { name: "Save check" }).click();
    await page.getByRole("link", { name: "Open the saved check" }).click();
    await page.waitForURL(/\/checks\/[A-Za-z0-9_-]+$/);
    checkUrl = page.url();
    expect(await countSavedChecks()).toBe(before + 1);
    await page.getByText("for Hollis Ambersmith").filter({ visible: true }).first().waitFor();
    await page.goto("/checks");
    await page.getByRole("cell", { name: "Hollis Ambersmith" }).waitFor();
    await page.getByLabel("Customer").fill("ambersmith");
    await expect.poll(() => page.locator("tbody tr").count()).toBe(1);
    // The saved-check filter tells a set-up to adjust apart from a rating exceeded.
    await page.getByLabel("Verdict").selectOption({ label: "Adjust the set-up" });
    await expect.poll(() => page.locator("tbody tr").count()).toBe(1);
    await page.getByLabel("Verdict").selectOption({ label: "Over: do not tow" });
    await expect.poll(() => page.getByRole("cell", { name: "Hollis Ambersmith" }).count()).toBe(0);
    await page.getByLabel("Verdict").selectOption({ label: "Any" });
    await screenshot(page, "saved-checks-desktop");
  });

  it("makes a customer link with a QR code and mails it", async () => {
    const { page } = staff;
    await page.goto(checkUrl);
    await page.getByRole("button", { name: "Make a customer link" }).click();
    const link = page.getByLabel("Customer link", { exact: true });
    await link.waitFor();
    linkUrl = await link.inputValue();
    expect(linkUrl).toMatch(/\/r\/[A-Za-z0-9_-]{32}$/);
    await page.getByRole("img", { name: "QR code of the customer link" }).locator("svg").waitFor();
    await page.getByLabel("Customer's e-mail").fill("hollis@ambersmith.example.com");
    await page.getByRole("button", { name: "E-mail the link" }).click();
    const mail = await latestMailTo("hollis@ambersmith.example.com");
    expect(mail.subject).toBe("Your towing check result from Towmargin");
    expect(firstLink(mail.text, "/r/")).toBe(linkUrl);
    expect(mail.html).toContain(linkUrl);
    await screenshot(page, "saved-check-desktop");
  });

  it("opens signed out on a phone: the shop, the verdict and the cautions, not indexed", async () => {
    const { page } = customer;
    const response = await page.goto(linkUrl);
    expect(response?.status()).toBe(200);
    expect(response?.headers()["x-robots-tag"]).toContain("noindex");
    await page.getByText("Quillfield Hitch & Trailer").first().waitFor();
    await page.getByText("Hollis Ambersmith").first().waitFor();
    await page.getByText(/lowest one governs|lowest rating/i).first().waitFor();
    // No way into the shop's data from here.
    expect(await page.getByRole("link", { name: /saved checks|team|overview/i }).count()).toBe(0);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    // The set-up to adjust reads as such, never as a rating exceeded.
    await page.getByText("Set-up to adjust. No rating is exceeded, but the set-up needs adjusting before you tow. See what to do under each check.").waitFor();
    await expect.poll(() => page.getByText(/Rating exceeded\. A rating is exceeded/).count()).toBe(0);
    await screenshot(page, "customer-link-phone");
    await staff.page.goto(linkUrl);
    await staff.page.getByText(/No rating is exceeded, but the set-up needs adjusting before you tow/).first().waitFor();
    await screenshot(staff.page, "customer-link-adjust-desktop");
  });

  it("withdrawn, the link shows a clear page with a 404 and no data", async () => {
    await staff.page.goto(checkUrl);
    await staff.page.getByRole("button", { name: /Withdraw the link ending/ }).first().click();
    await staff.page.getByRole("cell", { name: "Withdrawn" }).waitFor();
    const response = await customer.page.goto(linkUrl);
    expect(response?.status()).toBe(404);
    // Absence means something only once the page has drawn its own words.
    await customer.page.getByRole("heading", { name: "This link does not lead to a report" }).waitFor();
    expect(await customer.page.getByText("Hollis Ambersmith").count()).toBe(0);
    expect(await customer.page.getByText("Quillfield Hitch & Trailer").count()).toBe(0);
    await screenshot(customer.page, "customer-link-gone-phone");
  });
});

describe("the quick check, signed out", () => {
  it("gives a verdict in the browser and saves nothing", async () => {
    const session = await openBrowser(PHONE);
    try {
      const { page } = session;
      const before = await countSavedChecks();
      await page.goto("/quick-check");
      await pickExample(page, { index: 1 });
      await expect.poll(() => page.getByTestId("verdict-level").first().getAttribute("data-level")).toMatch(/within|tight|adjust|over|incomplete/);
      expect(await page.getByRole("button", { name: "Save check" }).count()).toBe(0);
      await screenshot(page, "quick-check-phone");
      expect(await countSavedChecks()).toBe(before);
    } finally {
      await session.close();
    }
  });
});
