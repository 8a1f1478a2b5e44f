import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig, type AccessoryFitResult, type RigInput } from "@/lib/towing";
import { check, rig } from "./helpers";

/** An invented hatchback with a two-bike platform rack. */
function rackRig(over: { vehicle?: object; hitch?: object; accessory?: object; extender?: object } = {}): RigInput {
  return rig({
    units: "imperial",
    vehicle: { tongueWeightLimit: 200, wheelbase: 104, rearAxleToPin: 30, departureAngle: 18, ...over.vehicle },
    hitch: { class: 2, receiverSize: "2", gtwRating: 3500, twRating: 350, receiverHeight: 16, pinToFascia: 5.5, ...over.hitch },
    accessory: { type: "platform-rack", weight: 50, loadWeight: 60, loadCenterFromPin: 10, foldClearance: 4, lowestPointBelowShankTop: 6, lowestPointBehindPin: 0, shankRise: 0, ...over.accessory },
    ...(over.extender ? { extender: over.extender } : {}),
  });
}
const af = (r: RigInput) => check<AccessoryFitResult>(evaluateRig(r), "accessory-fit");
const part = (r: AccessoryFitResult, id: string) => r.parts.find((p) => p.id === id)!;

describe("accessory fit", () => {
  it("angle of a lowest point 10 in high and 30 in behind the tyre", () => {
    const res = af(rackRig());
    // Source: 49 CFR 523.2 (departure angle); geometry: atan(10 / 30) = 18.43°
    expect(res.accessoryAngle?.value).toBeCloseTo(18.43, 2);
    expect(res.groundClearance?.value).toBe(10); // Physics: geometry, 16 − 6 = 10 in
  });

  it("angle of a lowest point 14 in high", () => {
    const res = af(rackRig({ accessory: { lowestPointBelowShankTop: 2 } }));
    // Source: 49 CFR 523.2; geometry: atan(14 / 30) = 25.02°
    expect(res.accessoryAngle?.value).toBeCloseTo(25.02, 2);
  });

  it("works out the shank rise that keeps the vehicle's departure angle", () => {
    const res = af(rackRig({ vehicle: { departureAngle: 25.0169 } }));
    // Physics: geometry, 30 × tan(25.02°) = 14 in needed, 10 in now: 4 in of rise
    expect(res.shankRiseNeeded?.value).toBeCloseTo(4, 3);
    // A raised shank to fit is a set-up to adjust, not a rating exceeded
    expect(part(res, "ground").status).toBe("adjust");
    expect(res.status).toBe("adjust");
    expect(res.advice.join(" ")).toMatch(/4 in of shank rise/);
  });

  it("checks the fold clearance against a 5.5 in pin-to-fascia", () => {
    // Common practice, no published source: pin-to-fascia about 5.5 in matters for racks that fold up
    expect(part(af(rackRig({ accessory: { foldClearance: 6 } })), "fold").status).toBe("adjust");
    expect(part(af(rackRig({ accessory: { foldClearance: 5 } })), "fold").status).toBe("tight"); // 0.5 of 5.5 in is 9 %
    expect(part(af(rackRig({ accessory: { foldClearance: 4 } })), "fold").status).toBe("within");
    // Physics: geometry, an extender moves the pin back: 5.5 + 4 = 9.5 in of room
    expect(part(af(rackRig({ accessory: { foldClearance: 6 }, extender: { length: 4 } })), "fold").limit?.value).toBe(9.5);
  });

  it("advises more shank rise for a receiver 12 in from the ground", () => {
    const res = af(rackRig({ hitch: { receiverHeight: 12 } }));
    // Common practice, no published source: a receiver about 12 in from the ground calls for more shank rise
    expect(res.advice.some((a) => a.includes("more shank rise keeps the accessory clear"))).toBe(true);
    expect(af(rackRig({ hitch: { receiverHeight: 20 } })).advice.some((a) => a.includes("more shank rise keeps the accessory clear"))).toBe(false);
  });

  it("compares the load itself with the ratings, and its moment only as a caution", () => {
    const near = af(rackRig());
    // Statics: 50 lb rack + 60 lb of bikes = 110 lb on the receiver, against the lowest rating, 200 lb
    expect(part(near, "load").actual?.value).toBeCloseTo(110, 9);
    expect(part(near, "load").status).toBe("within");
    const far = af(rackRig({ accessory: { loadCenterFromPin: 20 }, vehicle: { departureAngle: 15 } }));
    // Statics: moment about the pin, twice the 10 in reference arm counts as 2 × 110 = 220 lb, over the 200 lb limit;
    // the reference arm is common practice, no published source, so it makes the part tight, never over
    expect(far.steps.find((s) => s.id === "accessory-equivalent")?.result.value).toBeCloseTo(220, 9);
    expect(part(far, "load").actual?.value).toBeCloseTo(110, 9);
    expect(part(far, "load").status).toBe("tight");
    expect(far.cautions.join(" ")).toMatch(/common practice, no published source/);
    const ext = af(rackRig({ extender: { length: 5, twRating: 300 } }));
    // Statics: (10 + 5) / 10 × 110 = 165 lb equivalent
    expect(ext.steps.find((s) => s.id === "accessory-equivalent")?.result.value).toBeCloseTo(165, 9);
  });

  it("is over only when a rating is exceeded by the load itself", () => {
    const heavy = af(rackRig({ accessory: { weight: 60, loadWeight: 150 } }));
    // Statics: 60 + 150 = 210 lb on the receiver, over the vehicle's 200 lb tongue-weight limit (a rating)
    expect(part(heavy, "load").status).toBe("over");
    expect(heavy.status).toBe("over");
    expect(heavy.message).toMatch(/rating is exceeded/);
  });

  it("never derates an extender's own label a second time", () => {
    // Statics: 110 lb on the receiver; the extender's label (120 lb) already allows for its own 8 in length.
    // Lever convention on the vehicle's 200 lb: (10 + 8) / 10 × 110 = 198 lb, tight at most. Common practice, no published source.
    const r = af(rackRig({ extender: { length: 8, twRating: 120 }, vehicle: { departureAngle: 15 } }));
    expect(part(r, "load").limit?.value).toBe(120);
    expect(part(r, "load").status).not.toBe("over");
    expect(r.cautions.join(" ")).toMatch(/derate their ratings with an extender, or do not allow one/);
  });

  it("lists a missing extender rating as a link to enter", () => {
    const r = af(rackRig({ extender: { length: 4 } }));
    expect(r.missing?.map((m) => m.field)).toContain("extender.twRating");
    expect(r.status).toBe("incomplete");
  });

  it("goes by the lowest of the vehicle's and the hitch's tongue figures", () => {
    const res = af(rackRig({ accessory: { loadCenterFromPin: 20 }, vehicle: { departureAngle: 15 } }));
    // Source: Washington WAC 204-70-060 (the weakest component governs): the vehicle's 200 lb below the hitch's 350 lb
    expect(part(res, "load").limit?.value).toBe(200);
    expect(res.governing?.id).toBe("vehicle.tongueWeightLimit");
  });

  it("agrees in metric", () => {
    const r = rackRig();
    const met = af(convertRig(r, "metric"));
    // Source: 49 CFR 523.2; geometry: the angle has no unit, 18.43° either way
    expect(met.accessoryAngle?.value).toBeCloseTo(18.43, 2);
    expect(met.groundClearance?.value).toBeCloseTo(254, 9); // Physics: 10 in = 254 mm
    expect(met.status).toBe(af(r).status);
  });

  it("asks to adjust the set-up when the lowest point touches the ground", () => {
    const res = af(rackRig({ accessory: { lowestPointBelowShankTop: 16 } }));
    // Geometry: 16 − 16 = 0 in of clearance; a raised shank is a set-up to adjust, not a rating exceeded
    expect(part(res, "ground").status).toBe("adjust");
  });
});
