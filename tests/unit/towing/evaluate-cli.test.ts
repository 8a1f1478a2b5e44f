import { spawnSync } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { CORE_VERSION, evaluateRig, parseRig } from "@/lib/towing";

const root = join(__dirname, "../../..");
const fixtures = join(root, "tests/fixtures/rigs");

function cli(input: string) {
  return spawnSync(process.execPath, ["--import", "tsx", join(root, "scripts/evaluate.ts")], { input, cwd: root, encoding: "utf8" });
}

describe("example rigs", () => {
  for (const file of readdirSync(fixtures).filter((f) => f.endsWith(".json"))) {
    it(`${file} is valid and evaluates`, () => {
      const parsed = parseRig(JSON.parse(readFileSync(join(fixtures, file), "utf8")));
      expect(parsed.ok).toBe(true);
      if (parsed.ok) expect(evaluateRig(parsed.rig).checks.length).toBeGreaterThan(1);
    });
  }
});

// Each test starts tsx once or twice; on a crowded machine that alone can take longer than the default 20 s.
describe("evaluate command", { timeout: 90_000 }, () => {
  it("prints the full result for a good rig", () => {
    const out = cli(readFileSync(join(fixtures, "boat-on-suv.json"), "utf8"));
    expect(out.status).toBe(0);
    const result = JSON.parse(out.stdout);
    expect(result.coreVersion).toBe(CORE_VERSION);
    expect(result.units).toBe("metric");
    expect(result.verdict.cautions.length).toBe(5);
  });

  it("exits non-zero with field errors as JSON", () => {
    const out = cli(JSON.stringify({ units: "metric", vehicle: { gvwr: -3 } }));
    expect(out.status).toBe(1);
    const body = JSON.parse(out.stdout);
    expect(body.ok).toBe(false);
    expect(body.fieldErrors["vehicle.gvwr"][0]).toMatch(/kg/);
    expect(cli("not json").status).toBe(1);
  });

  it('prints the compact answer for { rig, detail: "summary" }', () => {
    const rig = JSON.parse(readFileSync(join(fixtures, "boat-on-suv.json"), "utf8"));
    const out = cli(JSON.stringify({ rig, detail: "summary" }));
    expect(out.status).toBe(0);
    const result = JSON.parse(out.stdout);
    expect(result.detail).toBe("summary");
    expect(result.verdict.cautions.length).toBe(5);
    expect(out.stdout).not.toContain('"steps"');
  });
});
