/**
 * A rule that defers ("check local law") never produces within for what it defers on, whatever the rig; a
 * rule set made only of defers never lets the rig read within. Guidelines are never over on their own.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateRig, evaluateRigFast, RULE_SETS, type Place } from "@/lib/towing";
import { fixPropertySeed } from "../property-seed";
import { local, trailerRig } from "./support";

fixPropertySeed();

const PLACES: Place[] = [
  { country: "US", region: "CA" },
  { country: "US", region: "FL" },
  { country: "US", region: "TX" },
  { country: "US", region: "OTHER" },
  { country: "US" },
  { country: "CA", region: "ON" },
  { country: "CA", region: "OTHER" },
  { country: "GB", region: "ENG" },
  { country: "GB", region: "NIR" },
  { country: "EU" },
  { country: "AU", region: "NSW" },
];

const trailerArb = fc.record({
  type: fc.constantFrom("utility", "travel", "boat", "other"),
  grossTrailerWeight: fc.integer({ min: 100, max: 4000 }),
  tongueWeight: fc.option(fc.integer({ min: 0, max: 400 }), { nil: undefined }),
  mam: fc.option(fc.integer({ min: 100, max: 4500 }), { nil: undefined }),
  brakes: fc.option(fc.constantFrom("none", "surge", "electric", "other"), { nil: undefined }),
  brakesAllWheels: fc.option(fc.boolean(), { nil: undefined }),
  breakaway: fc.option(fc.boolean(), { nil: undefined }),
});
const extraArb = fc.record({
  gvwr: fc.option(fc.integer({ min: 1000, max: 4000 }), { nil: undefined }),
  curbWeight: fc.option(fc.integer({ min: 800, max: 2500 }), { nil: undefined }),
  licence: fc.option(fc.constantFrom("B", "B96", "BE", "other"), { nil: undefined }),
  dValue: fc.option(fc.integer({ min: 1, max: 30 }), { nil: undefined }),
  sValue: fc.option(fc.integer({ min: 20, max: 200 }), { nil: undefined }),
});

function build(t: Record<string, unknown>, x: Record<string, unknown>) {
  const clean = (o: Record<string, unknown>) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined));
  // A tongue weight above the gross trailer weight is no rig at all (a field error): keep it within.
  const tw = t.tongueWeight as number | undefined;
  const trailer = tw === undefined ? t : { ...t, tongueWeight: Math.min(tw, t.grossTrailerWeight as number) };
  return trailerRig("metric", clean(trailer), {
    vehicle: clean({ gvwr: x.gvwr, curbWeight: x.curbWeight }),
    hitch: clean({ dValue: x.dValue, sValue: x.sValue }),
    ...(x.licence ? { driver: { licence: x.licence } } : {}),
  });
}

describe("deferring rules", () => {
  it("every defer row, on every rig it concerns, reads incomplete with 'Check local law', never within", () => {
    fc.assert(
      fc.property(trailerArb, extraArb, fc.constantFrom(...PLACES), (t, x, place) => {
        const res = evaluateRig(build(t, x), { place });
        for (const f of local(res).findings) {
          if (f.kind !== "defer") continue;
          expect(f.status).toBe("incomplete");
          expect(f.deferred).toBe(true);
          expect(f.message.startsWith("Check local law")).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });
  it("a rule set that only defers (another US state, another province) never lets a trailer rig read within", () => {
    fc.assert(
      fc.property(trailerArb, fc.constantFrom<Place>({ country: "US", region: "OTHER" }, { country: "CA", region: "OTHER" }), (t, place) => {
        const r = build(t, {});
        const full = evaluateRig(r, { place });
        expect(local(full).status).toBe("incomplete");
        expect(full.verdict.level).not.toBe("within");
        expect(evaluateRigFast(r, { place }).level).not.toBe("within");
      }),
      { numRuns: 200 },
    );
  });
  it("guideline rows are never over on their own", () => {
    fc.assert(
      fc.property(trailerArb, extraArb, fc.constantFrom(...PLACES), (t, x, place) => {
        const res = evaluateRig(build(t, x), { place });
        for (const f of local(res).findings) if (f.kind === "guideline") expect(f.status).not.toBe("over");
      }),
      { numRuns: 300 },
    );
  });
  it("a missing licence is never a pass", () => {
    const r = build({ type: "utility", grossTrailerWeight: 500, brakes: "none" }, { gvwr: 1800 });
    for (const place of [{ country: "GB", region: "ENG" }, { country: "EU" }]) {
      const lic = local(evaluateRig(r, { place })).findings.find((f) => f.topic === "licence")!;
      expect(lic.status).toBe("incomplete");
      expect(evaluateRig(r, { place }).verdict.level).not.toBe("within");
    }
  });
});

describe("the rule sets as data", () => {
  it("every row has an id unique across sets, a kind, what it requires and a source title", () => {
    const ids = new Set<string>();
    for (const set of Object.values(RULE_SETS)) {
      expect(set.version).toMatch(/^\d{4}\.\d{1,2}\.\d+$/);
      for (const row of set.rules) {
        expect(ids.has(row.id)).toBe(false);
        ids.add(row.id);
        expect(["law", "guideline", "defer"]).toContain(row.kind);
        expect(row.requires.length).toBeGreaterThan(10);
        expect(row.source.title.length).toBeGreaterThan(3);
        if (row.kind === "defer") expect(row.test).toBe("defer");
      }
    }
  });
  it("guidelines are marked as guidelines: the caravan match and the noseweight band", () => {
    for (const set of Object.values(RULE_SETS))
      for (const row of set.rules) if (row.test === "caravan-match" || row.test === "noseweight-band") expect(row.kind).toBe("guideline");
  });
});

describe("the rules note", () => {
  it("docs/local-rules.md names every rule and every set's version", async () => {
    const { readFileSync } = await import("node:fs");
    const text = readFileSync("docs/local-rules.md", "utf8");
    for (const set of Object.values(RULE_SETS)) {
      expect(text).toContain(`\`${set.id}\`, version ${set.version}`);
      for (const row of set.rules) expect(text).toContain(`\`${row.id}\``);
    }
  });
});
