import AxeBuilder from "@axe-core/playwright";
import { createClient } from "@libsql/client";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { DESKTOP, latestMailTo, openBrowser, PHONE, screenshot, signIn } from "./support/browser";

type Session = Awaited<ReturnType<typeof openBrowser>>;

async function one(sql: string, args: string[] = []) {
  const client = createClient({ url: inject("databaseUrl") });
  try {
    return (await client.execute({ sql, args })).rows[0];
  } finally {
    client.close();
  }
}

/** Pages in a PDF: one "/Type /Page" object per page (the page tree is "/Type /Pages"). */
function pageCount(pdf: Buffer): number {
  return (pdf.toString("latin1").match(/\/Type\s*\/Page(?![s\w])/g) ?? []).length;
}

/** axe-core's WCAG 2.x A and AA rules: the serious and critical findings, as text. */
async function seriousFindings(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
  return results.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).slice(0, 3).join(", ")}`);
}

describe("an installation: fitted from a fleet vehicle, measured, ticked, handed over, confirmed on a phone", () => {
  let installer: Session;
  let customer: Session;
  let recordUrl = "";
  let customerUrl = "";

  beforeAll(async () => {
    installer = await openBrowser(DESKTOP);
    customer = await openBrowser(PHONE);
    await signIn(installer.page, "counter@quillfield.example.com");
  });
  afterAll(async () => {
    await installer.close();
    await customer.close();
  });

  it("starts a record from the vehicle's page, measures, ticks the checklist and saves it fitted", async () => {
    const { page } = installer;
    await page.goto("/fleet/vehicles");
    // Open the vehicle by its link's address: a click while the list is still being drawn can land on a row
    // that is replaced the next moment, and the page would never change.
    const vehicleLink = page.getByRole("link", { name: "Stellmark Wendle SUV" });
    await vehicleLink.waitFor();
    await page.goto((await vehicleLink.getAttribute("href"))!);
    await page.getByRole("heading", { name: "Installation records" }).waitFor();
    await page.getByRole("link", { name: "Record an installation" }).click();
    await page.getByRole("heading", { name: "New installation" }).waitFor();
    await expect.poll(() => page.getByLabel("Fleet vehicle").inputValue()).not.toBe("");
    await page.getByLabel("Customer", { exact: true }).fill("Tobiah Marchetti");
    await page.getByLabel("Customer's e-mail").fill("tobiah.marchetti@example.com");
    await page.getByLabel("Hitch class").selectOption("3");
    await page.getByLabel("Receiver size").selectOption("2");
    await page.getByLabel("Label: gross trailer weight", { exact: true }).fill("5000");
    await page.getByLabel("Label: tongue weight", { exact: true }).fill("500");
    await page.getByLabel("Label: gross trailer weight with WD").fill("6000");
    await page.getByLabel("Label: tongue weight with WD").fill("600");
    await page.getByLabel("Pin hole to fascia").fill("5.5");
    await page.getByLabel("Receiver height").fill("17.5");
    await page.getByLabel("Rear axle centre to pin hole").fill("44");
    await page.getByLabel("Fasteners torqued to the maker's instruction").check();
    await page.getByLabel("Torque read from the instruction sheet").fill("Value from the sheet");
    await page.getByLabel("Lights tested through the new wiring").check();
    await page.getByLabel(/A carrier the customer asked about/).fill("22");
    await screenshot(page, "install-form-desktop");
    expect(await seriousFindings(page)).toEqual([]);
    // A figure out of range is refused beside its field before anything is sent.
    await page.getByLabel("Receiver height").fill("75");
    await page.getByRole("button", { name: "Create the record" }).click();
    await page.getByText("Receiver height must be at most 40 in.").waitFor();
    await page.getByLabel("Receiver height").fill("17.5");
    await page.getByRole("button", { name: "Create the record" }).click();
    await page.waitForURL(/\/installations\/[A-Za-z0-9_-]+$/);
    recordUrl = new URL(page.url()).pathname;
    await page.getByTestId("profile-note").getByText("went into the vehicle").waitFor();
    await page.getByRole("heading", { name: "What this hitch allows" }).waitFor();
    await screenshot(page, "install-record-desktop");
    expect(await seriousFindings(page)).toEqual([]);
  });

  it("the vehicle now carries the measured figures, marked with the record they came from", async () => {
    const { page } = installer;
    await page.getByRole("link", { name: "open the vehicle" }).click();
    await page.getByTestId("source-hitch.receiverHeight").waitFor();
    await expect.poll(() => page.getByTestId("source-hitch.receiverHeight").innerText()).toMatch(/^Measured \d{4}-\d{2}-\d{2}/);
    const row = await one("SELECT json_extract(data, '$.hitch.receiverHeight') AS h, json_extract(data, '$.vehicle.rearAxleToPin') AS x FROM vehicle_profiles WHERE name = 'Stellmark Wendle SUV'");
    expect(Number(row!.h)).toBe(17.5);
    expect(Number(row!.x)).toBe(44);
    await screenshot(page, "install-vehicle-sources-desktop");
  });

  it("hands over: a customer link and the mail", async () => {
    const { page } = installer;
    await page.goto(recordUrl);
    await page.getByRole("button", { name: "Hand over" }).click();
    await page.getByTestId("handover-link").waitFor();
    customerUrl = await page.getByRole("textbox", { name: "Customer's hand-over link" }).inputValue();
    expect(customerUrl).toMatch(/\/r\/[A-Za-z0-9_-]{32}$/);
    const mail = await latestMailTo("tobiah.marchetti@example.com");
    expect(mail.subject).toContain("what it allows");
    expect(mail.text).toContain(customerUrl);
    await screenshot(page, "install-handed-over-desktop");
  });

  it("the customer opens the link on a phone, reads what the hitch allows and confirms", async () => {
    const { page } = customer;
    await page.goto(customerUrl);
    await page.getByRole("heading", { name: "What this hitch allows" }).waitFor();
    // The lowest ratings in plain words (vehicle tow rating 5,000 lb vs the 5,000 lb label: the vehicle's figure is named first).
    await expect.poll(() => page.getByTestId("allowance-statements").innerText()).toContain("Without weight distribution, the trailer may weigh at most");
    await page.getByText("The vehicle maker's figures").waitFor();
    await screenshot(page, "install-customer-phone");
    expect(await seriousFindings(page)).toEqual([]);
    await page.getByLabel(/I have read what this hitch allows/).check();
    await page.getByRole("button", { name: "Confirm I have read the limits" }).click();
    await page.getByTestId("confirmed").waitFor();
    await screenshot(page, "install-customer-confirmed-phone");
    const row = await one("SELECT customer_confirmed_at AS at FROM installation_records WHERE customer_name = 'Tobiah Marchetti'");
    expect(row!.at).not.toBeNull();
  });

  it("the installer sees the confirmation on the record, and the list filters by state", async () => {
    const { page } = installer;
    await page.goto("/installations");
    await page.getByLabel("State").selectOption("handed-over");
    await page.getByRole("link", { name: /\d{4}-\d{2}-\d{2}/ }).first().waitFor();
    await expect.poll(() => page.getByRole("row").filter({ hasText: "Tobiah Marchetti" }).count()).toBe(1);
    await expect.poll(() => page.getByRole("row").filter({ hasText: "Mirela Oakhurst" }).count()).toBe(0);
    await screenshot(page, "install-list-desktop");
    await page.goto(recordUrl);
    await expect.poll(() => page.getByTestId("customer-confirmation").innerText()).toMatch(/^The customer confirmed on their page/);
    await page.setViewportSize(PHONE);
    await page.getByRole("heading", { name: "What this hitch allows" }).waitFor();
    await screenshot(page, "install-record-phone");
    await page.setViewportSize(DESKTOP);
  });

  it("the hand-over prints on one sheet, Letter and A4, from the customer's page and the record", async () => {
    for (const { page, url } of [{ page: customer.page, url: customerUrl }, { page: installer.page, url: recordUrl }]) {
      await page.goto(url);
      await page.getByRole("heading", { name: "What this hitch allows" }).waitFor();
      for (const format of ["Letter", "A4"] as const) {
        const pdf = await page.pdf({ format, printBackground: true });
        expect(pageCount(pdf), `${url} on ${format}`).toBe(1);
      }
    }
    await customer.page.emulateMedia({ media: "print" });
    await customer.page.setViewportSize({ width: 816, height: 1056 });
    await screenshot(customer.page, "install-print-letter");
    await customer.page.emulateMedia({ media: "screen" });
    await customer.page.setViewportSize(PHONE);
  });

  it("a withdrawn link shows nothing", async () => {
    const { page } = installer;
    await page.goto(recordUrl);
    await page.getByRole("button", { name: /Withdraw the link ending/ }).click();
    await page.getByText("Link withdrawn").first().waitFor();
    const response = await customer.page.goto(customerUrl);
    expect(response?.status()).toBe(404);
    await expect.poll(() => customer.page.content()).not.toContain("Tobiah");
  });
});
