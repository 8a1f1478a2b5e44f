import { readdirSync } from "node:fs";
import { join } from "node:path";
import { afterEach, describe, expect, it, vi } from "vitest";

/** Every file under app/ whose name marks it as a page only a test build routes. */
function fixturePages(dir = "app"): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return fixturePages(path);
    return /^page\.fixture\.tsx$/.test(entry.name) ? [path] : [];
  });
}

async function loadConfig(testRoutes: boolean) {
  vi.resetModules();
  vi.stubEnv("TOWMARGIN_TEST_ROUTES", testRoutes ? "1" : "");
  vi.stubEnv("NEXT_DIST_DIR", "");
  return (await import("@/next.config")).default;
}

describe("pages only the tests visit", () => {
  afterEach(() => vi.unstubAllEnvs());

  it("the bare yardstick page is a fixture page, not a product page", () => {
    expect(fixturePages()).toEqual([join("app", "(public)", "bare", "page.fixture.tsx")]);
  });

  it("the product build does not route fixture pages; a test build does, into its own folder", async () => {
    const product = await loadConfig(false);
    expect(product.pageExtensions).toEqual(["tsx", "ts"]);
    expect(product.distDir).toBe(".next");
    const test = await loadConfig(true);
    expect(test.pageExtensions).toContain("fixture.tsx");
    expect(test.distDir).toBe(".next-test");
  });
});
