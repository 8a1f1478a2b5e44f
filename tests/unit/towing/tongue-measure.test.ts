import { describe, expect, it } from "vitest";
import { evaluateRig, tongueWeightByBeam, tongueWeightByPublicScale, tongueWeightByScale, type TongueMeasureResult } from "@/lib/towing";
import { check, pickupRig } from "./helpers";

describe("tongue-weight measuring helpers", () => {
  it("beam method: jack 1 ft from the block and 2 ft from the scale triples the reading", () => {
    const r = tongueWeightByBeam({ scaleReading: 250, blockToJack: 12, jackToScale: 24, units: "imperial" });
    if (!r.ok) throw new Error(r.message);
    // Source: several published how-to guides; WAC 204-70-040(5); the formula is statics: TW = 3 × reading
    expect(r.multiplier).toBeCloseTo(3, 12);
    // Source: several published how-to guides: 250 lb reads as 750 lb
    expect(r.tongueWeight.value).toBeCloseTo(750, 9);
    expect(r.steps.map((s) => s.formula)).toEqual(["(a + b) / a", "S * k"]);
  });

  it("beam method in metric", () => {
    const r = tongueWeightByBeam({ scaleReading: 113.4, blockToJack: 305, jackToScale: 610, units: "metric" });
    if (!r.ok) throw new Error(r.message);
    // Physics: statics, moments about the block: 113.4 kg × 915 / 305 = 340.2 kg
    expect(r.tongueWeight.value).toBeCloseTo(340.2, 9);
    expect(r.tongueWeight.unit).toBe("kg");
  });

  it("direct scale reads to about 300 lb", () => {
    const ok = tongueWeightByScale({ scaleReading: 280, units: "imperial" });
    const big = tongueWeightByScale({ scaleReading: 320, units: "imperial" });
    // Source: several published how-to guides (a bathroom scale directly up to about 300 lb)
    expect(ok.ok && ok.withinScaleRange).toBe(true);
    expect(big.ok && big.withinScaleRange).toBe(false); // Source: several published how-to guides
  });

  it("public scale: axle changes hitched and unhitched give the tongue load and its sharing", () => {
    const r = tongueWeightByPublicScale({
      unhitched: { front: 3000, rear: 2500 },
      hitched: { front: 3000 - 275.862068965517, rear: 2500 + 1075.862068965517 },
      units: "imperial",
    });
    if (!r.ok) throw new Error(r.message);
    // Physics: statics, moments about the rear axle (WB 145 in, OH 50 in, TW 800 lb)
    expect(r.tongueWeight.value).toBeCloseTo(800, 6);
    expect(r.frontChange.value).toBeCloseTo(-275.86, 2); // Physics: statics, front −275.86 lb
    expect(r.rearChange.value).toBeCloseTo(1075.86, 2); // Physics: statics, rear +1,075.86 lb
  });

  it("refuses bad input without throwing", () => {
    expect(tongueWeightByBeam({ scaleReading: 100, blockToJack: 0, jackToScale: 10, units: "imperial" }).ok).toBe(false);
    expect(tongueWeightByScale({ scaleReading: Number.NaN, units: "metric" }).ok).toBe(false);
    expect(tongueWeightByPublicScale({ unhitched: { front: 3000, rear: 2500 }, hitched: { front: 2900, rear: 2500 }, units: "imperial" }).ok).toBe(false);
  });
});

describe("tongue-measure check", () => {
  it("takes the tongue weight from a beam measurement when none is entered", () => {
    const r = pickupRig({ trailer: { tongueWeight: undefined, tongueWeightBasis: undefined, tongueMeasurement: { scaleReading: 170, blockToJack: 12, jackToScale: 24 } } });
    const res = evaluateRig(r);
    const tm = check<TongueMeasureResult>(res, "tongue-measure");
    // Source: several published how-to guides; the formula is statics: 170 lb × 3 = 510 lb
    expect(tm.measuredTongueWeight?.value).toBeCloseTo(510, 9);
    expect(tm.method).toBe("beam");
    expect(tm.status).toBe("within");
    // The measured figure feeds the other checks: 510 ÷ 4,000 = 12.75 % (Physics: arithmetic)
    expect(check<{ share?: number } & TongueMeasureResult>(res, "tongue-share").share).toBeCloseTo(0.1275, 12);
  });

  it("flags an entered figure that disagrees with the measurement", () => {
    const r = pickupRig({ trailer: { tongueWeight: 400, tongueMeasurement: { scaleReading: 170, blockToJack: 12, jackToScale: 24 } } });
    const tm = check<TongueMeasureResult>(evaluateRig(r), "tongue-measure");
    expect(tm.status).toBe("tight");
  });

  it("says how to weigh when the tongue was not weighed", () => {
    const tm = check<TongueMeasureResult>(evaluateRig(pickupRig({ trailer: { tongueWeightBasis: "estimated" } })), "tongue-measure");
    expect(tm.status).toBe("incomplete");
    expect(tm.advice[0]).toMatch(/beam/);
    expect(tm.missing?.[0]?.field).toBe("trailer.tongueWeight");
  });

  it("uses a public-scale weighing of the vehicle", () => {
    const r = pickupRig({ trailer: { tongueWeight: undefined, tongueWeightBasis: undefined }, vehicle: { axleWeightsHitched: { front: 2800, rear: 3200 } } });
    const tm = check<TongueMeasureResult>(evaluateRig(r), "tongue-measure");
    // Physics: the vehicle's gain, (2,800 + 3,200) − (3,000 + 2,500) = 500 lb
    expect(tm.measuredTongueWeight?.value).toBeCloseTo(500, 9);
    expect(tm.method).toBe("public-scale");
  });
});
