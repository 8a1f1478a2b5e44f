import { describe, expect, it } from "vitest";
import { parseEvaluateRequest } from "@/lib/towing";

describe("the evaluate request (command and HTTP)", () => {
  const rig = { units: "imperial", vehicle: { gvwr: 7000 } };

  it("takes a bare rig or { rig, options }", () => {
    expect(parseEvaluateRequest(rig)).toMatchObject({ ok: true, options: {} });
    expect(parseEvaluateRequest({ rig, options: { tightMarginRatio: 0.15 } })).toMatchObject({ ok: true, options: { tightMarginRatio: 0.15 } });
  });

  it("names the field of a bad option or a bad rig", () => {
    expect(parseEvaluateRequest({ rig, options: { tightMarginRatio: 2 } })).toEqual({ ok: false, fieldErrors: { "options.tightMarginRatio": ["Enter a number from 0 to 0.5."] } });
    expect(parseEvaluateRequest({ rig, options: { frontAxleLossLimit: 0.08 } })).toMatchObject({ ok: true, options: { frontAxleLossLimit: 0.08 } });
    for (const bad of [0, 0.6, "0.1", Number.NaN])
      expect(parseEvaluateRequest({ rig, options: { frontAxleLossLimit: bad } })).toEqual({ ok: false, fieldErrors: { "options.frontAxleLossLimit": ["Enter a number from 0.01 to 0.5."] } });
    expect(parseEvaluateRequest({ rig, options: [] })).toEqual({ ok: false, fieldErrors: { options: ["Options must be an object."] } });
    const bad = parseEvaluateRequest({ units: "imperial", vehicle: { gvwr: "7000" } });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(Object.keys(bad.fieldErrors)).toEqual(["vehicle.gvwr"]);
    expect(parseEvaluateRequest(null).ok).toBe(false);
    expect(parseEvaluateRequest([rig]).ok).toBe(false);
  });
});
