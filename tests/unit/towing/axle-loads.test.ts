import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig, type AxleLoadsResult } from "@/lib/towing";
import { axleLoadChange } from "@/lib/towing/checks/axle-loads";
import { check, pickupRig, rig } from "./helpers";

const al = (r: ReturnType<typeof pickupRig>) => check<AxleLoadsResult>(evaluateRig(r), "axle-loads");

describe("axle loads", () => {
  it("follows the statics of a tongue load behind the rear axle", () => {
    const ch = axleLoadChange(800, 145, 50);
    // Physics: statics, moments about the rear axle: WB 145 in, OH 50 in, TW 800 lb → front −275.86 lb
    expect(ch.front).toBeCloseTo(-275.86, 2);
    // Physics: statics, moments about the rear axle → rear +1,075.86 lb
    expect(ch.rear).toBeCloseTo(1075.86, 2);
    // Physics: statics, vertical balance: the two changes add up to the tongue weight
    expect(ch.front + ch.rear).toBeCloseTo(800, 9);
  });

  it("compares the hitched rear axle with the rear GAWR", () => {
    const res = al(pickupRig({ trailer: { tongueWeight: 800, grossTrailerWeight: 6000 } }));
    // Physics: statics, 2,500 + 1,075.86 = 3,575.86 lb on the rear axle
    expect(res.hitched?.rear.value).toBeCloseTo(3575.86, 2);
    expect(res.hitched?.front.value).toBeCloseTo(2724.14, 2); // Physics: statics, 3,000 − 275.86
    expect(res.governing?.id).toBe("vehicle.gawrRear");
    // Source: GM (Cadillac) owner's manuals (must not exceed rear GAWR): 3,575.86 of 4,000 lb leaves 10.6 %
    expect(res.status).toBe("within");
  });

  it("is over when the rear axle exceeds its GAWR", () => {
    const res = al(pickupRig({ vehicle: { gawrRear: 3400 }, trailer: { tongueWeight: 800, grossTrailerWeight: 6000 } }));
    // Source: GM (Cadillac) owner's manuals: 3,575.86 lb > 3,400 lb rear GAWR
    expect(res.status).toBe("over");
    expect(res.margin?.value).toBeCloseTo(3400 - 3575.862068965517, 9);
  });

  it("puts an accessory's weight at its load centre", () => {
    const r = rig({
      units: "imperial",
      vehicle: { wheelbase: 100, rearAxleToHitch: 30, axleWeights: { front: 1800, rear: 1400 }, gawrFront: 2000, gawrRear: 1800 },
      accessory: { type: "cargo-carrier", weight: 40, loadWeight: 110, loadCenterFromPin: 20 },
    });
    const res = al(r);
    // Physics: statics, 150 lb at 30 + 20 = 50 in behind a 100 in wheelbase: front −75 lb, rear +225 lb
    expect(res.frontChange?.value).toBeCloseTo(-75, 9);
    expect(res.rearChange?.value).toBeCloseTo(225, 9);
  });

  it("prefers a weighed hitched vehicle over the calculation", () => {
    const res = al(pickupRig({ vehicle: { axleWeightsHitched: { front: 2750, rear: 3300 } } }));
    // Common practice, no published source: a public scale beats a calculation
    expect(res.hitched?.rear.value).toBe(3300);
  });

  it("answers for the front axle's unhitched load too", () => {
    const res = al(pickupRig({ vehicle: { gawrFront: 2950, gawrRear: 6000 } }));
    // Physics: the vehicle also drives unhitched; 3,000 lb on the front > 2,950 lb front GAWR
    expect(res.status).toBe("over");
    expect(res.governing?.id).toBe("vehicle.gawrFront");
  });

  it("agrees in metric", () => {
    const r = pickupRig({ trailer: { tongueWeight: 800, grossTrailerWeight: 6000 } });
    const met = al(convertRig(r, "metric"));
    // Physics: statics, 800 × (145 + 50) / 145 = 1,075.862 lb × 0.45359237 kg/lb = 488.0028 kg
    expect(met.rearChange?.value).toBeCloseTo(488.0028, 4);
    expect(met.rearChange?.unit).toBe("kg");
    expect(met.status).toBe("within");
  });

  it("asks for the scale when the axles were not weighed", () => {
    const res = al(pickupRig({ vehicle: { axleWeights: undefined } }));
    expect(res.status).toBe("incomplete");
    expect(res.missing?.[0]?.where).toMatch(/public axle scale/);
    expect(res.message).toMatch(/adds/);
  });
});
