/**
 * The trailer's own ratings: its GVWR (the plated maximum mass, `trailer.mam`) against its gross weight, and its
 * axle ratings × axles against the load on its axles. Statics: vertical balance of the trailer standing hitched,
 * the axles carry W_ax = GTW − TW. Either rating exceeded is over.
 */
import { describe, expect, it } from "vitest";
import { evaluateRig, type TrailerLabelsResult } from "@/lib/towing";
import { check, pickupRig, rig } from "./helpers";

const labels = (r: ReturnType<typeof pickupRig>) => check<TrailerLabelsResult>(evaluateRig(r), "trailer-labels");

describe("the trailer's own ratings", () => {
  it("compares the gross weight with the GVWR and the axles' load with their ratings", () => {
    const c = labels(pickupRig());
    // Statics: W_ax = 4,000 − 500 = 3,500 lb on the axles; 2 × 3,500 = 7,000 lb of axle ratings
    expect(c.axleLoad!.value).toBe(3500);
    expect(c.axleCapacity!.value).toBe(7000);
    expect(c.steps.find((s) => s.id === "trailer-axle-load")!.formula).toBe("GTW - TW");
    expect(c.steps.find((s) => s.id === "trailer-axle-room")!.result.value).toBe(3500);
    // Arithmetic: GVWR 5,200 − 4,000 = 1,200 lb (23.1 %), less room than the axles' 50 %: the GVWR governs
    expect(c.governing!.id).toBe("trailer.mam");
    expect(c.margin!.value).toBe(1200);
    expect(c.margin!.ratio).toBeCloseTo(1200 / 5200, 12);
    expect(c.status).toBe("within");
  });

  it("is over when the loaded trailer is heavier than its own GVWR", () => {
    // Arithmetic: 3,800 − 4,000 = −200 lb
    const c = labels(pickupRig({ trailer: { mam: 3800 } }));
    expect(c.status).toBe("over");
    expect(c.margin!.value).toBe(-200);
    expect(c.message).toBe("The trailer weighs 4,000 lb, over its own GVWR of 3,800 lb.");
    expect(c.advice[0]).toMatch(/^Take 200 lb or more out of the trailer/);
  });

  it("is over when its axles carry more than they are rated for, even with room on the GVWR", () => {
    // Statics: one axle rated 3,000 lb carries 4,000 − 500 = 3,500 lb: 500 lb over
    const c = labels(pickupRig({ trailer: { axleCount: 1, axleRating: 3000 } }));
    expect(c.status).toBe("over");
    expect(c.governing!.id).toBe("trailer.axleRating");
    expect(c.margin!.value).toBe(-500);
    expect(c.message).toBe("The trailer's axles carry 3,500 lb, over their 3,000 lb together.");
  });

  it("lists what the plate gives when it is missing, and keeps a known over", () => {
    const c = labels(pickupRig({ trailer: { mam: undefined, axleRating: undefined, axleCount: undefined } }));
    expect(c.status).toBe("incomplete");
    expect(c.missing!.map((m) => m.field)).toEqual(["trailer.mam", "trailer.axleRating", "trailer.axleCount"]);
    expect(c.missing!.find((m) => m.field === "trailer.mam")!.what).toMatch(/GVWR/);
    // Statics as above: 3,500 lb on one 3,000 lb axle is over whatever else is missing
    const over = labels(pickupRig({ trailer: { mam: undefined, axleCount: 1, axleRating: 3000 } }));
    expect(over.status).toBe("over");
  });

  it("a fifth wheel's axles carry the trailer less its pin weight", () => {
    // Statics: 10,000 − 2,000 = 8,000 lb on two axles of 5,200 lb (10,400 lb): 2,400 lb left
    const r = evaluateRig(
      rig({
        units: "imperial",
        vehicle: { rearAxleToBedHitch: -4 },
        hitch: { bedGtwRating: 16000, bedPinRating: 4000 },
        trailer: { type: "travel", hitchType: "fifth-wheel", grossTrailerWeight: 10000, tongueWeight: 2000, tongueWeightBasis: "measured", mam: 12000, axleRating: 5200, axleCount: 2 },
      }),
    );
    const c = check<TrailerLabelsResult>(r, "trailer-labels");
    expect(c.axleLoad!.value).toBe(8000);
    expect(c.steps.find((s) => s.id === "trailer-axle-room")!.result.value).toBe(2400);
    expect(c.steps.find((s) => s.id === "trailer-axle-load")!.inputs[1]!.label).toBe("Pin weight");
  });

  it("says weight distribution hands some load back to the trailer's axles", () => {
    const c = labels(pickupRig({ weightDistribution: { used: true, tongueRating: 800 } }));
    expect(c.cautions.join(" ")).toMatch(/hands part of the hitch load back to the trailer's axles/);
  });

  it("metric: kilograms throughout", () => {
    // Statics: 2,000 − 200 = 1,800 kg on two 1,000 kg axles (2,000 kg): 200 kg left, 10 %.
    // Arithmetic: GVWR 2,200 − 2,000 = 200 kg, 9.1 %: under the 10 % threshold, tight, and it governs.
    const r = evaluateRig(
      rig({
        units: "metric",
        vehicle: {},
        trailer: { type: "utility", grossTrailerWeight: 2000, tongueWeight: 200, tongueWeightBasis: "measured", mam: 2200, axleRating: 1000, axleCount: 2 },
      }),
    );
    const c = check<TrailerLabelsResult>(r, "trailer-labels");
    expect(c.axleLoad!.unit).toBe("kg");
    expect(c.axleLoad!.value).toBeCloseTo(1800, 9);
    expect(c.axleCapacity!.value).toBeCloseTo(2000, 9);
    expect(c.governing!.id).toBe("trailer.mam");
    expect(c.margin!.value).toBeCloseTo(200, 9);
    expect(c.status).toBe("tight");
    expect(c.message).toBe("The trailer's GVWR has the least room: 2,000 kg of 2,200 kg.");
  });
});
