/**
 * Shops in Great Britain, Australia and Texas check the same rig and each reads its own rules, words and
 * sources: on the counter screen, on the saved check and on the customer's printed sheet.
 */
import { describe, it } from "vitest";
import { join } from "node:path";
import { DESKTOP, firstLink, latestMailTo, openBrowser, PHONE, pickExample, screenshot, SCREENSHOT_DIR, signIn } from "./support/browser";

type Session = Awaited<ReturnType<typeof openBrowser>>;

const PLACES = [
  {
    name: "gb",
    shop: "Pennyroyal Towbars",
    email: "owner@pennyroyal-towbars.example.com",
    country: "United Kingdom",
    regionLabel: "Nation",
    region: "England",
    heading: /Rules applied: Great Britain/,
    tongueLabel: "Noseweight",
    rule: "gb.brakes.over-750",
    source: "gov.uk, Towing with a car",
  },
  {
    name: "au",
    shop: "Wattlebrook Trailers",
    email: "owner@wattlebrook-trailers.example.com",
    country: "Australia",
    regionLabel: "State or territory",
    region: "Queensland",
    heading: /Rules applied: Australia/,
    tongueLabel: "Towball mass",
    rule: "au.brakes.over-750",
    source: "Australian Design Rule 38 and Vehicle Standards Bulletin VSB 1",
  },
  {
    name: "us-tx",
    shop: "Mesquite Bend Hitch",
    email: "owner@mesquite-bend.example.com",
    country: "United States",
    regionLabel: "State",
    region: "Texas",
    heading: /Rules applied: Texas/,
    tongueLabel: "Tongue weight",
    rule: "us-tx.brakes.4500",
    source: "Texas Transportation Code",
  },
];

const PASSWORD = "a long enough passphrase";

/** A new shop of its own for each place, so no other browser test sees its setting. */
async function signUpShop(page: Session["page"], shop: string, email: string) {
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill(`Owner of ${shop}`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Shop or fleet name").fill(shop);
  await page.getByRole("button", { name: "Create my organisation" }).click();
  await page.getByText(`Check your inbox at ${email}`).waitFor();
  const mail = await latestMailTo(email);
  await page.goto(firstLink(mail.text, "/sign-up/confirm/"));
  // The password is chosen on the page the confirmation link opens.
  await page.getByLabel("Choose a password").fill(PASSWORD);
  await page.getByLabel("The same again").fill(PASSWORD);
  await page.getByRole("button", { name: "Finish signing up" }).click();
  await page.waitForURL(/\/overview/);
}

describe("the rules where the rig is driven", () => {
  for (const place of PLACES) {
    it(`a shop set to ${place.region} reads its own rules, terms and sources`, async () => {
      const owner = await openBrowser(DESKTOP);
      const phone = await openBrowser(PHONE);
      try {
        await run(owner, phone, place);
      } finally {
        await owner.close();
        await phone.close();
      }
    }, 300_000);
  }
});

async function run(owner: Session, phone: Session, place: (typeof PLACES)[number]) {
  const { page } = owner;
  await signUpShop(page, place.shop, place.email);
  await page.goto("/settings");
  await page.getByLabel("Where you work").selectOption({ label: place.country });
  await page.getByLabel(place.regionLabel).selectOption({ label: place.region });
  await page.getByTestId("settings-rule-set").waitFor();
  await page.getByRole("button", { name: "Save settings" }).click();
  await page.getByText("Settings saved.").waitFor();
  await screenshot(page, `rules-settings-${place.name}`);

  await page.goto("/check");
  await pickExample(page, { label: "Small boat on a mid-size SUV (metric)" });
  const rules = page.getByTestId("applied-rules").first();
  await rules.getByRole("heading", { name: place.heading }).waitFor();
  await rules.locator(`[data-rule="${place.rule}"]`).getByText(`Source: ${place.source}`, { exact: false }).waitFor();
  await page.getByLabel(place.tongueLabel, { exact: true }).waitFor();
  await screenshot(page, `rules-check-${place.name}`);
  await rules.screenshot({ path: join(SCREENSHOT_DIR, `rules-panel-${place.name}.png`) });
  await page.locator("#workbench-vehicle").screenshot({ path: join(SCREENSHOT_DIR, `rules-vehicle-card-${place.name}.png`) }).catch(() => undefined);

  // The customer's sheet: the saved check prints as the customer's report, with the rules and their sources.
  await page.getByLabel("Customer name").fill(`Rules check ${place.name}`);
  await page.getByRole("button", { name: "Save check" }).click();
  await page.getByRole("link", { name: "Open the saved check" }).click();
  await page.waitForURL(/\/checks\/[^/]+$/);
  await page.locator("[data-testid=applied-rules]:visible").first().getByRole("heading", { name: place.heading }).waitFor();
  await page.emulateMedia({ media: "print" });
  const report = page.getByRole("heading", { name: /The rules where you drive: / });
  await report.waitFor();
  await screenshot(page, `rules-report-${place.name}`);
  await page.locator("[data-testid=applied-rules]:visible").first().screenshot({ path: join(SCREENSHOT_DIR, `rules-report-panel-${place.name}.png`) });
  await page.emulateMedia({ media: "screen" });

  // A phone at the same shop sees the same rules.
  await signIn(phone.page, place.email, PASSWORD);
  await phone.page.goto("/check");
  await pickExample(phone.page, { label: "Small boat on a mid-size SUV (metric)" });
  await phone.page.getByRole("button", { name: /Checks/ }).first().click();
  await phone.page.getByTestId("applied-rules").first().getByRole("heading", { name: place.heading }).waitFor();
  await screenshot(phone.page, `rules-check-${place.name}-phone`);
  await phone.page.getByLabel(place.tongueLabel, { exact: true }).waitFor();
}
