import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { evaluateRig, evaluateRigSummary, GENERAL_CAUTIONS, parseEvaluateRequest, parseRig } from "@/lib/towing";

const fixtures = ["camper-on-pickup.json", "boat-on-suv.json", "bike-rack-on-small-car.json"];

function load(name: string) {
  const parsed = parseRig(JSON.parse(readFileSync(`tests/fixtures/rigs/${name}`, "utf8")));
  if (!parsed.ok) throw new Error(name);
  return parsed.rig;
}

describe('the compact evaluate answer ("detail": "summary")', () => {
  it.each(fixtures)("%s: the same verdict and the same figures per check as the full answer, without steps or texts", (name) => {
    const rig = load(name);
    const full = evaluateRig(rig);
    const summary = evaluateRigSummary(rig);
    expect(summary.detail).toBe("summary");
    expect(summary.coreVersion).toBe(full.coreVersion);
    expect(summary.notApplicable).toEqual(full.notApplicable);
    expect(summary.verdict).toEqual({
      level: full.verdict.level,
      levelFromCheckedOnly: full.verdict.levelFromCheckedOnly,
      complete: full.verdict.complete,
      incomplete: full.verdict.incomplete,
      governing: full.verdict.governing,
      tightMarginRatio: full.verdict.tightMarginRatio,
      cautions: GENERAL_CAUTIONS,
    });
    expect(summary.checks).toEqual(
      full.checks.map((check) => ({ id: check.id, status: check.status, limit: check.limit, actual: check.actual, margin: check.margin, governing: check.governing })),
    );
    const text = JSON.stringify(summary);
    expect(text).not.toContain('"steps"');
    // A fraction of the full answer's bytes.
    expect(text.length * 4).toBeLessThan(JSON.stringify(full).length);
  });

  it("keeps the options, and carries the usual cautions", () => {
    const rig = load("camper-on-pickup.json");
    const summary = evaluateRigSummary(rig, { tightMarginRatio: 0.4 });
    expect(summary.verdict.tightMarginRatio).toBe(0.4);
    expect(summary.verdict.level).toBe(evaluateRig(rig, { tightMarginRatio: 0.4 }).verdict.level);
    expect(summary.verdict.cautions.join(" ")).toMatch(/lowest rating/i);
  });

  it("is asked for with detail in the wrapped request; anything else is a field error", () => {
    const rig = { units: "imperial", vehicle: { gvwr: 7000 } };
    expect(parseEvaluateRequest(rig)).toMatchObject({ ok: true, detail: "full" });
    expect(parseEvaluateRequest({ rig, detail: "summary" })).toMatchObject({ ok: true, detail: "summary" });
    expect(parseEvaluateRequest({ rig, detail: "full" })).toMatchObject({ ok: true, detail: "full" });
    expect(parseEvaluateRequest({ rig, detail: "short" })).toEqual({ ok: false, fieldErrors: { detail: ['Choose "full" or "summary".'] } });
    expect(parseEvaluateRequest({ rig, detail: null })).toEqual({ ok: false, fieldErrors: { detail: ['Choose "full" or "summary".'] } });
  });
});
