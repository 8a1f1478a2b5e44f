import { describe, expect, it } from "vitest";
import { parse, unit } from "mathjs";
import { convertRig, evaluateRig, KG_PER_LB, MM_PER_IN, parseRig, rigInputSchema } from "@/lib/towing";
import { parseRig as parseFromValidation } from "@/lib/validation/rig";
import { pickupRig } from "./helpers";

describe("rig input", () => {
  it("writes the conversion factors as the exact definitions, equal to mathjs's units", () => {
    // From memory: the international pound is exactly 0.45359237 kg (1959 agreement)
    expect(KG_PER_LB).toBe(0.45359237);
    // From memory: the inch is exactly 25.4 mm (1959 agreement)
    expect(MM_PER_IN).toBe(25.4);
    // The core keeps no unit library in the browser; mathjs's own unit table must agree with its literals.
    expect(unit(1, "lb").toNumber("kg")).toBeCloseTo(KG_PER_LB, 12);
    expect(unit(1, "inch").toNumber("mm")).toBeCloseTo(MM_PER_IN, 12);
  });

  it("gives field-level messages with dotted paths", () => {
    const r = parseRig({ units: "imperial", vehicle: { gvwr: -5, wheelbase: "long" }, trailer: { type: "travel", grossTrailerWeight: 90000 } });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.fieldErrors["vehicle.gvwr"]?.[0]).toMatch(/GVWR must be at least 1000 lb/);
    expect(r.fieldErrors["vehicle.wheelbase"]?.[0]).toMatch(/Wheelbase: enter a number in in/);
    expect(r.fieldErrors["trailer.grossTrailerWeight"]?.[0]).toMatch(/at most 30000 lb/);
  });

  it("states metric ranges in metric units", () => {
    const r = parseRig({ units: "metric", vehicle: { gvwr: 100 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fieldErrors["vehicle.gvwr"]?.[0]).toMatch(/at least 453.6 kg/);
  });

  it("refuses NaN, Infinity, a missing unit system and a trailer with a rack", () => {
    expect(parseRig({ units: "imperial", vehicle: { gvwr: Number.NaN } }).ok).toBe(false);
    expect(parseRig({ units: "imperial", vehicle: { gvwr: Number.POSITIVE_INFINITY } }).ok).toBe(false);
    const noUnits = parseRig({ vehicle: {} });
    expect(!noUnits.ok && noUnits.fieldErrors.units?.length).toBeTruthy();
    const both = parseRig({ units: "imperial", vehicle: {}, trailer: { type: "utility" }, accessory: { type: "platform-rack" } });
    expect(!both.ok && both.fieldErrors.accessory?.[0]).toMatch(/not both/);
    expect(parseRig(null).ok).toBe(false);
    expect(parseRig("rig").ok).toBe(false);
  });

  it("is re-exported for forms and route handlers", () => {
    expect(parseFromValidation).toBe(parseRig);
    expect(rigInputSchema.safeParse({ units: "metric", vehicle: {} }).success).toBe(true);
  });

  it("converts a rig both ways without loss", () => {
    const r = pickupRig();
    const m = convertRig(r, "metric");
    // From memory: 1 lb = 0.45359237 kg exactly; 4,000 lb = 1,814.37 kg
    expect(m.trailer?.grossTrailerWeight).toBeCloseTo(1814.36948, 5);
    expect(m.hitch?.receiverHeight).toBeCloseTo(660.4, 9); // From memory: 1 in = 25.4 mm exactly
    expect(m.hitch?.class).toBe(3);
    const back = convertRig(m, "imperial");
    expect(back.trailer?.grossTrailerWeight).toBeCloseTo(4000, 9);
    expect(parseRig(m).ok).toBe(true);
  });

  it("writes every step formula so that mathjs can parse it", () => {
    for (const units of ["imperial", "metric"] as const) {
      const res = evaluateRig(convertRig(pickupRig({ weightDistribution: { used: true, fenderUnhitched: 39.5, fenderHitched: 40.6, fenderWithWd: 40 } }), units));
      for (const c of res.checks)
        for (const s of c.steps) {
          expect(() => parse(s.formula), `${c.id}/${s.id}: ${s.formula}`).not.toThrow();
          expect(s.inputs.length).toBeGreaterThan(0);
          expect(Number.isFinite(s.result.value)).toBe(true);
        }
    }
  });
});
