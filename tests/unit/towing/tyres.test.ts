/**
 * Tyres: each axle's load against its tyres' maximum load (per tyre, two per axle, four on a rear axle with dual
 * wheels), the vehicle's axles as the axle-loads check works them out and the trailer's as GTW − TW.
 * Statics: a tongue load TW applied OH behind the rear axle adds TW · (WB + OH) ÷ WB to the rear axle and takes
 * TW · OH ÷ WB off the front (REFERENCES.md, axle loads). A tyre's maximum load is a rating: exceeded is over.
 */
import { describe, expect, it } from "vitest";
import { evaluateRig, type TyresResult } from "@/lib/towing";
import { check, pickupRig, rig } from "./helpers";

const tyres = (r: ReturnType<typeof pickupRig>) => check<TyresResult>(evaluateRig(r), "tyres");
const step = (c: TyresResult, id: string) => c.steps.find((s) => s.id === id)!;

describe("tyres", () => {
  it("compares each axle with its tyres: the rear axle has the least room", () => {
    const c = tyres(pickupRig());
    // Statics: rear = 2,500 + 500 × (145 + 50) / 145 = 3,172.41 lb; front hitched 3,000 − 500 × 50 / 145 = 2,827.59 lb,
    // compared at the larger of that and 3,000 lb unhitched.
    expect(c.vehicleAxles!.rear.value).toBeCloseTo(3172.41, 2);
    expect(c.vehicleAxles!.front.value).toBe(3000);
    // Statics: two tyres of 2,400 lb per axle = 4,800 lb; rear room 4,800 − 3,172.41 = 1,627.59 lb; front 1,800 lb
    expect(step(c, "rear-tyre-capacity").result.value).toBe(4800);
    expect(step(c, "rear-tyre-room").result.value).toBeCloseTo(1627.59, 2);
    expect(step(c, "front-tyre-room").result.value).toBe(1800);
    // Statics: the trailer's four tyres of 2,200 lb = 8,800 lb against 4,000 − 500 = 3,500 lb: 5,300 lb left
    expect(step(c, "trailer-tyre-capacity").result.value).toBe(8800);
    expect(step(c, "trailer-tyre-room").result.value).toBe(5300);
    expect(c.governing!.id).toBe("vehicle.tyreLoadRear");
    expect(c.status).toBe("within");
    expect(c.cautions.join(" ")).toMatch(/at the pressure its maker gives/);
  });

  it("is over when a rear axle's two tyres carry less than it, and dual wheels double them", () => {
    // Statics: 2 × 1,000 = 2,000 lb against 3,172.41 lb: 1,172.41 lb over
    const single = tyres(pickupRig({ vehicle: { tyreLoadRear: 1000 } }));
    expect(single.status).toBe("over");
    expect(single.margin!.value).toBeCloseTo(-1172.41, 2);
    expect(single.message).toBe("Rear tyres carry 3,172 lb, over their 2,000 lb together.");
    // Statics: four tyres (dual wheels) × 1,000 = 4,000 lb: 827.59 lb left
    const dual = tyres(pickupRig({ vehicle: { tyreLoadRear: 1000, dualRearWheels: true } }));
    expect(step(dual, "rear-tyre-capacity").inputs[0]!.value).toBe(4);
    expect(step(dual, "rear-tyre-room").result.value).toBeCloseTo(827.59, 2);
    expect(dual.status).toBe("within");
  });

  it("is over when the trailer's tyres carry less than its axles' load", () => {
    // Statics: one axle, two tyres of 1,600 lb = 3,200 lb against 4,000 − 500 = 3,500 lb: 300 lb over
    const c = tyres(pickupRig({ trailer: { axleCount: 1, axleRating: 4000, tyreLoad: 1600 } }));
    expect(c.status).toBe("over");
    expect(c.governing!.id).toBe("trailer.tyreLoad");
    expect(c.margin!.value).toBe(-300);
  });

  it("reads the hitched weighing when there is one", () => {
    // Weighed hitched: rear 3,210 lb; two tyres of 1,600 lb = 3,200 lb: 10 lb over
    const c = tyres(pickupRig({ vehicle: { axleWeightsHitched: { front: 2790, rear: 3210 }, tyreLoadRear: 1600 } }));
    expect(c.vehicleAxles!.rear.value).toBe(3210);
    expect(step(c, "rear-tyre-room").result.value).toBe(-10);
    expect(c.status).toBe("over");
  });

  it("with weight distribution unmeasured, asks for the fender heights before calling the rear tyres over", () => {
    // Statics: bars released, rear 3,172.41 lb (over 2 × 1,550 = 3,100 lb); all the lost load given back,
    // rear = 2,500 + 500 × 1 = 3,000 lb (under it): not known until measured
    const c = tyres(pickupRig({ vehicle: { tyreLoadRear: 1550 }, weightDistribution: { used: true, tongueRating: 800 } }));
    expect(c.status).toBe("incomplete");
    expect(c.missing!.map((m) => m.field)).toEqual(["weightDistribution.fenderUnhitched", "weightDistribution.fenderHitched", "weightDistribution.fenderWithWd"]);
  });

  it("says what to enter without the tyres' figures, and never reads within", () => {
    const c = tyres(pickupRig({ vehicle: { tyreLoadFront: undefined, tyreLoadRear: undefined }, trailer: { tyreLoad: undefined } }));
    expect(c.status).toBe("incomplete");
    expect(c.missing!.map((m) => m.field)).toEqual(["vehicle.tyreLoadFront", "vehicle.tyreLoadRear", "trailer.tyreLoad"]);
    expect(c.missing![0]!.where).toMatch(/sidewall/);
    expect(c.message).toBe("Enter each tyre's maximum load (moulded on its sidewall) to compare the axle loads with the tyres.");
    // Without the axle weighing the vehicle's tyres wait for it too
    const noScale = tyres(pickupRig({ vehicle: { axleWeights: undefined } }));
    expect(noScale.status).toBe("incomplete");
    expect(noScale.missing!.map((m) => m.field)).toContain("vehicle.axleWeights");
  });

  it("applies to trailer rigs only", () => {
    const rack = evaluateRig(rig({ units: "imperial", vehicle: { tyreLoadRear: 1500 }, accessory: { type: "cargo-carrier", weight: 40, loadWeight: 100 } }));
    expect(rack.notApplicable).toEqual(expect.arrayContaining(["tyres", "trailer-labels", "hardware-fit"]));
  });

  it("metric: kilograms and millimetres", () => {
    // Statics: TW 250 kg, OH 1,000 + 250 = 1,250 mm, WB 3,500 mm: rear = 1,200 + 250 × 4,750 / 3,500 = 1,539.29 kg;
    // two 800 kg tyres = 1,600 kg: 60.71 kg left (3.8 %), tight. Front: 1,400 − 250 × 1,250 / 3,500 = 1,310.71 kg,
    // compared at 1,400 kg unhitched: 200 kg left. Trailer: 2,200 − 250 = 1,950 kg on four 700 kg tyres (2,800 kg).
    const r = evaluateRig(
      rig({
        units: "metric",
        vehicle: { axleWeights: { front: 1400, rear: 1200 }, wheelbase: 3500, rearAxleToPin: 1000, tyreLoadFront: 800, tyreLoadRear: 800 },
        trailer: { type: "travel", grossTrailerWeight: 2200, tongueWeight: 250, tongueWeightBasis: "measured", axleCount: 2, tyreLoad: 700 },
        ballMount: { length: 250 },
      }),
    );
    const c = check<TyresResult>(r, "tyres");
    expect(c.vehicleAxles!.rear.unit).toBe("kg");
    expect(c.vehicleAxles!.rear.value).toBeCloseTo(1539.29, 2);
    expect(step(c, "rear-tyre-room").result.value).toBeCloseTo(60.71, 2);
    expect(step(c, "front-tyre-room").result.value).toBeCloseTo(200, 9);
    expect(step(c, "trailer-tyre-room").result.value).toBeCloseTo(850, 9);
    expect(c.governing!.id).toBe("vehicle.tyreLoadRear");
    expect(c.status).toBe("tight");
  });
});
