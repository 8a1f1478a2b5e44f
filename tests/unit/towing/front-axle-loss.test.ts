/**
 * Front-axle load loss: the load the hitch lifts off the steering axle, against the organisation's limit.
 * The statics are REFERENCES.md's ("Axle loads from a tongue load TW applied OH behind the rear axle … front
 * axle − TW·OH/WB"); the limit is common practice, no published source, so beyond it the check is tight, never
 * over or adjust.
 */
import { describe, expect, it } from "vitest";
import { evaluateRig, evaluateRigFast, type FrontAxleLossResult } from "@/lib/towing";
import { check, pickupRig, rig } from "./helpers";

const loss = (r: ReturnType<typeof evaluateRig>) => check<FrontAxleLossResult>(r, "front-axle-loss");

describe("front-axle load loss", () => {
  it("works the loss by statics and compares it with the default 10 % limit", () => {
    // pickupRig: TW 500 lb, OH 41 in to the pin + 9 in ball mount = 50 in, WB 145 in, front unhitched 3,000 lb.
    const r = evaluateRig(pickupRig());
    const c = loss(r);
    // Statics: L = 500 × 50 / 145 = 172.41 lb
    expect(c.loss!.value).toBeCloseTo(172.41, 2);
    // Statics: 172.41 / 3,000 = 5.75 % of the front axle
    expect(c.share!).toBeCloseTo(0.0575, 4);
    // Common practice, no published source: the default limit is 10 % of the unhitched front axle = 300 lb
    expect(c.limit!.value).toBeCloseTo(300, 6);
    expect(c.margin!.value).toBeCloseTo(127.59, 2);
    expect(c.status).toBe("within");
    expect(c.basis).toBe("statics");
    expect(c.cautions.join(" ")).toMatch(/common practice, with no published source/);
    const step = c.steps.find((s) => s.id === "front-loss")!;
    expect(step.formula).toBe("TW * OH / WB");
  });

  it("reads tight, never over, beyond the limit, and advises weight distribution with what it would leave", () => {
    // TW 675 lb, OH 50 in, WB 145 in, front 2,000 lb (a light front end).
    const r = evaluateRig(pickupRig({ vehicle: { axleWeights: { front: 2000, rear: 3500 } }, trailer: { grossTrailerWeight: 5000, tongueWeight: 675 } }));
    const c = loss(r);
    // Statics: L = 675 × 50 / 145 = 232.76 lb; 232.76 / 2,000 = 11.64 %, beyond the 10 % (200 lb) limit.
    expect(c.loss!.value).toBeCloseTo(232.76, 2);
    expect(c.share!).toBeCloseTo(0.1164, 4);
    expect(c.limit!.value).toBeCloseTo(200, 6);
    // Common practice, no published source: a convention reads tight, never over or adjust.
    expect(c.status).toBe("tight");
    // Beyond the limit no room is shown, so the badge and its figures never disagree.
    expect(c.margin).toBeUndefined();
    // Statics: at the 50 % target (Ram owner's manuals citing SAE J2807) (1 − 0.5) × 232.76 = 116.38 lb left
    expect(c.lossAtWdTarget!.value).toBeCloseTo(116.38, 2);
    expect(c.advice.join(" ")).toMatch(/Weight distribution set to give back 50 % would leave about 116 lb lost \(5\.8 % of the front axle\)/);
    expect(c.advice.join(" ")).toMatch(/raises no GCWR, GVWR or payload/);
    expect(c.message).toMatch(/loses 233 lb \(11\.6 % of its load\), more than the 10 % the organisation allows \(200 lb\)/);
  });

  it("follows the organisation's own limit", () => {
    // Statics as in the first case: L = 172.41 lb = 5.75 % of 3,000 lb. With a 5 % limit (150 lb) it is beyond.
    const tight = loss(evaluateRig(pickupRig(), { frontAxleLossLimit: 0.05 }));
    expect(tight.limit!.value).toBeCloseTo(150, 6);
    expect(tight.status).toBe("tight");
    expect(tight.limitShare).toBe(0.05);
    // With 20 % (600 lb) it has room to spare.
    expect(loss(evaluateRig(pickupRig(), { frontAxleLossLimit: 0.2 })).status).toBe("within");
    // The fast path reads the same limit.
    expect(evaluateRigFast(pickupRig(), { frontAxleLossLimit: 0.05 }).checks.find((x) => x.id === "front-axle-loss")!.status).toBe("tight");
  });

  it("takes the measured restoration of weight distribution off the loss", () => {
    // Fender heights 36, 37.2, 36.6 in: restoration = (37.2 − 36.6) / (37.2 − 36) = 0.5 (Source: Ram owner's
    // manuals citing SAE J2807). Statics: (1 − 0.5) × 172.41 = 86.21 lb left.
    const c = loss(evaluateRig(pickupRig({ weightDistribution: { used: true, tongueRating: 800, fenderUnhitched: 36, fenderHitched: 37.2, fenderWithWd: 36.6 } })));
    expect(c.loss!.value).toBeCloseTo(86.21, 2);
    expect(c.status).toBe("within");
    expect(c.steps.find((s) => s.id === "front-loss-wd")!.formula).toBe("(1 - R) * L_F");
  });

  it("with weight distribution and no fender heights, judges the loss with the bars released", () => {
    // Statics: with the bars released the loss is the full 232.76 lb of 2,000 lb (11.64 %), beyond 10 %; with all
    // of it given back it would be 0: not known until measured, so incomplete and the fender heights are asked for.
    const c = loss(evaluateRig(pickupRig({ vehicle: { axleWeights: { front: 2000, rear: 3500 } }, trailer: { grossTrailerWeight: 5000, tongueWeight: 675 }, weightDistribution: { used: true } })));
    expect(c.status).toBe("incomplete");
    expect(c.estimated).toBe(true);
    expect(c.missing!.map((m) => m.field)).toEqual(["weightDistribution.fenderUnhitched", "weightDistribution.fenderHitched", "weightDistribution.fenderWithWd"]);
    // Within even with the bars released (172.41 of 3,000 lb): no measurement is needed to say so.
    expect(loss(evaluateRig(pickupRig({ weightDistribution: { used: true } }))).status).toBe("within");
  });

  it("uses the weighed axles when the vehicle was weighed hitched", () => {
    // Weighed: front 3,000 lb unhitched, 2,790 lb hitched: L = 3,000 − 2,790 = 210 lb (7 %).
    const c = loss(evaluateRig(pickupRig({ vehicle: { axleWeightsHitched: { front: 2790, rear: 3210 } } })));
    expect(c.basis).toBe("weighed");
    expect(c.loss!.value).toBeCloseTo(210, 6);
    expect(c.share!).toBeCloseTo(0.07, 6);
    expect(c.steps[0]!.formula).toBe("F_0 - F_h");
  });

  it("is incomplete without the unhitched front axle, and says what to weigh", () => {
    const c = loss(evaluateRig(pickupRig({ vehicle: { axleWeights: undefined } })));
    expect(c.status).toBe("incomplete");
    expect(c.missing!.map((m) => m.field)).toEqual(["vehicle.axleWeights"]);
    // Statics: the loss itself is still shown, 500 × 50 / 145 = 172.41 lb
    expect(c.loss!.value).toBeCloseTo(172.41, 2);
    expect(c.message).toMatch(/loses 172 lb; weigh the axles unhitched/);
  });

  it("metric: the same rig in kilograms and millimetres", () => {
    // TW 250 kg, pin 1,000 mm + ball mount 250 mm = 1,250 mm, WB 3,500 mm, front unhitched 1,400 kg.
    // Statics: L = 250 × 1,250 / 3,500 = 89.29 kg; 89.29 / 1,400 = 6.38 %; limit 10 % of 1,400 kg = 140 kg.
    const r = evaluateRig(
      rig({
        units: "metric",
        vehicle: { axleWeights: { front: 1400, rear: 1200 }, wheelbase: 3500, rearAxleToPin: 1000, gawrFront: 1700, gawrRear: 1800 },
        trailer: { type: "travel", grossTrailerWeight: 2200, tongueWeight: 250, tongueWeightBasis: "measured" },
        ballMount: { length: 250 },
      }),
    );
    const c = loss(r);
    expect(c.loss!.unit).toBe("kg");
    expect(c.loss!.value).toBeCloseTo(89.29, 2);
    expect(c.share!).toBeCloseTo(0.0638, 4);
    expect(c.limit!.value).toBeCloseTo(140, 6);
    expect(c.status).toBe("within");
    expect(c.message).toMatch(/loses 89 kg \(6\.4 % of its load\), inside the 10 % limit \(140 kg\)/);
  });

  it("a rack in the receiver lightens the front too", () => {
    // Accessory 60 + 120 lb = 180 lb; OH = 30 in to the pin + 20 in to the load's centre = 50 in; WB 110 in.
    // Statics: L = 180 × 50 / 110 = 81.82 lb; front 2,000 lb: 4.09 %.
    const c = loss(
      evaluateRig(
        rig({
          units: "imperial",
          vehicle: { axleWeights: { front: 2000, rear: 1600 }, wheelbase: 110, rearAxleToPin: 30 },
          accessory: { type: "platform-rack", weight: 60, loadWeight: 120, loadCenterFromPin: 20 },
        }),
      ),
    );
    expect(c.loss!.value).toBeCloseTo(81.82, 2);
    expect(c.share!).toBeCloseTo(0.0409, 4);
    expect(c.status).toBe("within");
  });
});
