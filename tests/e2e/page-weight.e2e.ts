import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openBrowser, PHONE, signIn } from "./support/browser";
import { firstLoadScripts, scriptSourcesInHtml } from "./support/page-weight";

type Session = Awaited<ReturnType<typeof openBrowser>>;

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));
/** The customer's page may carry at most this much more script than a bare page of the same build. */
const BUDGET_RATIO = 1.3;
/** The counter's check page, signed in, before anything is typed. */
const CHECK_BUDGET_RATIO = 1.5;
// A string only the charting library's own code contains: how its chunk is recognised without its name.
const CHART_LIBRARY_MARK = "recharts-wrapper";

describe("page weight", () => {
  let staff: Session;
  let linkPath = "";
  beforeAll(async () => {
    staff = await openBrowser();
    await signIn(staff.page, "counter2@quillfield.example.com");
    const saved = await staff.page.request.post("/api/v1/checks", { data: { rig: camper, customerName: "Weighed Customer" } });
    const { id } = (await saved.json()) as { id: string };
    await staff.page.goto(`/checks/${id}`);
    await staff.page.getByRole("button", { name: "Make a customer link" }).click();
    const field = staff.page.getByLabel("Customer link", { exact: true });
    await field.waitFor();
    linkPath = new URL(await field.inputValue()).pathname;
  });
  afterAll(async () => staff.close());

  it(`the customer's page loads at most ${BUDGET_RATIO} × the script of a bare page`, async () => {
    const bare = await firstLoadScripts("/bare", PHONE);
    const customer = await firstLoadScripts(linkPath, PHONE);
    const ratio = customer.transferred / bare.transferred;
    console.log(
      `first-load script, transferred (compressed): bare ${bare.transferred} B in ${bare.scripts.length} files, ` +
        `customer page ${customer.transferred} B in ${customer.scripts.length} files, ratio ${ratio.toFixed(3)} ` +
        `(decoded ${bare.decoded} B and ${customer.decoded} B)`,
    );
    expect(bare.transferred).toBeGreaterThan(50_000);
    expect(customer.scripts.some((s) => s.text.includes(CHART_LIBRARY_MARK))).toBe(false);
    expect(ratio).toBeLessThanOrEqual(BUDGET_RATIO);
  });

  it(`the check page loads at most ${CHECK_BUDGET_RATIO} × the script of a bare page before the first keystroke`, async () => {
    // The first-load set is what each page's HTML names; what the check page fetches after it is interactive
    // (the live verdict, the rig's schema, the charts) is counted apart and not held to the budget.
    const firstLoad = async (path: string, context?: Parameters<typeof firstLoadScripts>[2]) => {
      const named = await scriptSourcesInHtml(staff.page, path);
      const loaded = await firstLoadScripts(path, PHONE, context);
      const initial = loaded.scripts.filter((s) => named.has(new URL(s.url).pathname));
      return { initial, bytes: initial.reduce((n, s) => n + s.transferred, 0), later: loaded.transferred - initial.reduce((n, s) => n + s.transferred, 0) };
    };
    const bare = await firstLoad("/bare");
    const check = await firstLoad("/check", staff.context);
    const ratio = check.bytes / bare.bytes;
    console.log(
      `first-load script named by the HTML, transferred (compressed): bare ${bare.bytes} B in ${bare.initial.length} files, ` +
        `check page ${check.bytes} B in ${check.initial.length} files, ratio ${ratio.toFixed(3)}; ` +
        `the check page fetches ${check.later} B more once it is interactive`,
    );
    expect(bare.bytes).toBeGreaterThan(50_000);
    expect(ratio).toBeLessThanOrEqual(CHECK_BUDGET_RATIO);
  });

  it("the check page's charts are not in its first-load scripts: they arrive once there is something to draw", async () => {
    const initialTags = await scriptSourcesInHtml(staff.page, "/check");
    const loaded = await firstLoadScripts("/check", undefined, staff.context);
    const initial = loaded.scripts.filter((s) => initialTags.has(new URL(s.url).pathname));
    expect(initial.length).toBeGreaterThan(0);
    expect(initial.filter((s) => s.text.includes(CHART_LIBRARY_MARK)).map((s) => s.url)).toEqual([]);
    console.log(`check page: ${initial.length} first-load scripts (${initial.reduce((n, s) => n + s.transferred, 0)} B transferred), none with the charts`);

    // Drawing the verdict's charts brings the library in, as its own later chunk.
    const { page } = staff;
    const chartScripts: string[] = [];
    page.on("response", async (response) => {
      if (response.request().resourceType() === "script" && (await response.text().catch(() => "")).includes(CHART_LIBRARY_MARK)) chartScripts.push(response.url());
    });
    await page.goto("/check");
    await page.getByLabel("Saved vehicle").selectOption({ index: 1 });
    await page.getByLabel("Saved trailer").selectOption({ index: 1 });
    await page.locator(".recharts-wrapper").first().scrollIntoViewIfNeeded();
    await page.locator(".recharts-surface").first().waitFor();
    await expect.poll(() => chartScripts.length).toBeGreaterThan(0);
    expect(chartScripts.every((url) => !initialTags.has(new URL(url).pathname))).toBe(true);
  });
});
