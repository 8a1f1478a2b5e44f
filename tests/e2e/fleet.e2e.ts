import { createClient } from "@libsql/client";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inject } from "vitest";
import { DESKTOP, openBrowser, PHONE, screenshot, signIn } from "./support/browser";

type Session = Awaited<ReturnType<typeof openBrowser>>;

async function count(sql: string, args: string[] = []): Promise<number> {
  const client = createClient({ url: inject("databaseUrl") });
  try {
    return Number((await client.execute({ sql, args })).rows[0]!.n);
  } finally {
    client.close();
  }
}

// Invented trucks for the import; the third row carries kg in an imperial row and must be refused.
const CSV = [
  "name,units,gvwr,curb_weight,gawr_front,gawr_rear,gcwr,tow_max,tongue_max,hitch_class,receiver_opening,hitch_gtw,hitch_tw,receiver_height,pin_to_fascia",
  "Imported truck 21,imperial,9900,6400,4800,6000,18000,9000,900,4,2,10000,1000,20.5,5",
  "Imported truck 22,imperial,9900,6450,4800,6000,18000,9000,900,4,2,10000,1000,20,5",
  "Imported truck 23,imperial,4490 kg,6400,4800,6000,18000,9000,900,4,2,10000,1000,20.5,5",
].join("\n");

const PNG = Buffer.from(
  "89504e470d0a1a0a0000000d4948445200000001000000010802000000907753de0000000c4944415408d763f8cfc000000301010018dd8db00000000049454e44ae426082".replace(/\s/g, ""),
  "hex",
);

describe("fleet: import, pairings, a pairing opened", () => {
  let manager: Session;
  let phone: Session;

  beforeAll(async () => {
    manager = await openBrowser(DESKTOP);
    phone = await openBrowser(PHONE);
    await signIn(manager.page, "fleet@fernhollow.example.com");
    await signIn(phone.page, "fleet@fernhollow.example.com");
  });
  afterAll(async () => {
    await manager.close();
    await phone.close();
  });

  it("shows the demo fleet's vehicles with sorting", async () => {
    const { page } = manager;
    await page.goto("/fleet/vehicles");
    await expect.poll(() => page.getByTestId("profile-row").count()).toBe(12);
    const gvwr = page.getByRole("columnheader", { name: "GVWR" });
    await page.getByRole("button", { name: "GVWR" }).click();
    await expect.poll(() => gvwr.getAttribute("aria-sort")).toBe("ascending");
    await page.getByRole("button", { name: "GVWR" }).click();
    await expect.poll(() => gvwr.getAttribute("aria-sort")).toBe("descending");
    // Heaviest first: the dump truck's 16,500 lb GVWR (invented demo figure) leads.
    await expect.poll(() => page.getByTestId("profile-row").first().innerText()).toContain("Dump truck 07");
    await screenshot(page, "fleet-vehicles-desktop");
  });

  it("checks a CSV, lists the bad row's error, and imports the valid rows", async () => {
    const { page } = manager;
    const before = await count("SELECT count(*) AS n FROM vehicle_profiles WHERE organisation_id = 'org-fernhollow'");
    await page.goto("/fleet/import");
    await page.getByLabel("CSV file").setInputFiles({ name: "trucks.csv", mimeType: "text/csv", buffer: Buffer.from(CSV) });
    await page.getByRole("button", { name: "Check the file" }).click();
    await expect.poll(() => page.getByTestId("import-row").count()).toBe(3);
    await page.getByText("in kg but this row is imperial").waitFor();
    await screenshot(page, "fleet-import-preview-desktop");
    // All or nothing refuses the file and writes nothing.
    await page.getByRole("button", { name: "Import only if every row is valid" }).click();
    await page.getByText("Nothing was imported").waitFor();
    expect(await count("SELECT count(*) AS n FROM vehicle_profiles WHERE organisation_id = 'org-fernhollow'")).toBe(before);
    await page.getByRole("button", { name: "Import the 2 valid rows" }).click();
    await page.getByText("Imported 2 vehicles").waitFor();
    expect(await count("SELECT count(*) AS n FROM vehicle_profiles WHERE organisation_id = 'org-fernhollow'")).toBe(before + 2);
  });

  it("shows the pairings, filters them, and opens one as a check with its cautions", async () => {
    const { page } = manager;
    await page.goto("/fleet/matrix");
    await page.getByText("Before anyone hooks up").waitFor();
    await page.getByText("The lowest rating of any part is the limit for the whole rig.").waitFor();
    // Typed again until the grid takes it: what is typed before the grid has hydrated is lost.
    await expect
      .poll(
        async () => {
          await page.getByLabel("Vehicle", { exact: true }).fill("Imported truck 21");
          return page.getByTestId("pairing-row").count();
        },
        { timeout: 30_000, interval: 1_000 },
      )
      .toBe(1);
    await page.getByLabel("Verdict").selectOption("over");
    await page.getByLabel("Vehicle", { exact: true }).fill("");
    await expect.poll(async () => {
      const levels = await page.getByTestId("pairing-cell").evaluateAll((cells) => cells.map((cell) => cell.getAttribute("data-level")));
      return levels.length > 0 && levels.every((level) => level === "over");
    }).toBe(true);
    await page.getByLabel("Verdict").selectOption("");
    await page.getByLabel("Vehicle", { exact: true }).fill("Crew truck 01");
    await expect.poll(() => page.getByTestId("pairing-row").count()).toBe(1);
    await screenshot(page, "fleet-matrix-desktop");
    const cell = page.getByTestId("pairing-cell").first();
    const level = await cell.getAttribute("data-level");
    await cell.click();
    await page.waitForURL(/\/check\?vehicle=.+&(trailer|accessory)=/);
    await page.getByText("Starting from the fleet's profiles: Crew truck 01").waitFor();
    const verdict = page.getByTestId("verdict-level").first();
    await expect.poll(() => verdict.getAttribute("data-level")).toBe(level);
    await screenshot(page, "fleet-pairing-check-desktop");
  });

  it("adds a trailer through the form: a bad figure is named beside its field, then it saves", async () => {
    const { page } = manager;
    await page.goto("/fleet/trailers/new");
    await page.getByLabel("Name").fill("Sod trailer P · 6×12");
    await page.getByLabel("Trailer type").selectOption("utility");
    // Invented figures; 40,000 lb is beyond the core's 30,000 lb gross trailer weight range.
    await page.getByLabel("Gross trailer weight", { exact: true }).fill("40000");
    await page.getByRole("button", { name: "Add trailer" }).click();
    await page.getByText("Gross trailer weight must be at most 30000 lb.").waitFor();
    await screenshot(page, "fleet-trailer-form-error-desktop");
    await page.getByLabel("Gross trailer weight", { exact: true }).fill("3200");
    await page.getByLabel("Tongue weight", { exact: true }).fill("380");
    await page.getByRole("button", { name: "Add trailer" }).click();
    await page.waitForURL(/\/fleet\/trailers\/[A-Za-z0-9_-]+$/);
    await page.getByRole("heading", { name: "Sod trailer P · 6×12" }).waitFor();
    expect(await count("SELECT count(*) AS n FROM trailer_profiles WHERE name = ? AND organisation_id = 'org-fernhollow'", ["Sod trailer P · 6×12"])).toBe(1);
  });

  it("keeps a vehicle's label photo, and the phone views do not scroll sideways", async () => {
    const { page } = manager;
    await page.goto("/fleet/vehicles");
    await page.getByRole("link", { name: "Crew truck 01 · Tallow 2500", exact: true }).click();
    await page.getByLabel("Photo or PDF").setInputFiles({ name: "door label.png", mimeType: "image/png", buffer: PNG });
    await page.getByRole("button", { name: "Upload" }).click();
    await page.getByRole("link", { name: "door label.png" }).waitFor();
    const href = await page.getByRole("link", { name: "door label.png" }).getAttribute("href");
    const response = await page.request.get(href!);
    expect(response.headers()["content-type"]).toBe("image/png");
    expect(response.headers()["x-content-type-options"]).toBe("nosniff");
    await screenshot(page, "fleet-vehicle-desktop");

    for (const [path, name] of [
      ["/fleet/matrix", "fleet-matrix-phone"],
      ["/fleet/matrix?level=over", "fleet-matrix-over-phone"],
      ["/fleet/vehicles", "fleet-vehicles-phone"],
      ["/fleet/import", "fleet-import-phone"],
    ] as const) {
      await phone.page.goto(path);
      await phone.page.waitForLoadState("networkidle");
      await screenshot(phone.page, name);
      const overflow = await phone.page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow, path).toBeLessThanOrEqual(0);
    }
  });
});
