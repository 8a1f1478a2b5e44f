import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

// A browser test that asks about the page at one instant passes or fails with the machine's load: the page may
// not have drawn yet. Every such question waits (locator.waitFor, expect.poll) instead.
const E2E = join(process.cwd(), "tests", "e2e");

const INSTANT_CHECKS: Array<[RegExp, string]> = [
  [/\.isVisible\(\)/, "isVisible() answers at once: use locator.waitFor()"],
  [/\.isHidden\(\)/, "isHidden() answers at once: use locator.waitFor({ state: \"hidden\" })"],
  [/\.(innerText|textContent|getAttribute|isChecked)\([^)]*\)\)\.resolves/, "a page read compared at once: use expect.poll"],
  [/expect\(await [^;]*\.(innerText|textContent)\(\)\)\.(toBe|toContain|toMatch|toEqual)\(/, "a page read compared at once: use expect.poll"],
];

function e2eFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory() ? e2eFiles(join(dir, entry.name)) : entry.name.endsWith(".ts") ? [join(dir, entry.name)] : [],
  );
}

describe("browser tests wait for the page", () => {
  it("no browser test checks the page at one instant", () => {
    const found: string[] = [];
    for (const file of e2eFiles(E2E)) {
      readFileSync(file, "utf8")
        .split("\n")
        .forEach((line, index) => {
          for (const [pattern, why] of INSTANT_CHECKS) if (pattern.test(line)) found.push(`${file.slice(E2E.length + 1)}:${index + 1}: ${why}`);
        });
    }
    expect(found).toEqual([]);
  });
});
