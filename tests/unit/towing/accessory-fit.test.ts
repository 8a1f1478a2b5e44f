import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig, type AccessoryFitResult, type RigInput } from "@/lib/towing";
import { check, rig } from "./helpers";

/** An invented hatchback with a two-bike platform rack. */
function rackRig(over: { vehicle?: object; hitch?: object; accessory?: object; extender?: object } = {}): RigInput {
  return rig({
    units: "imperial",
    vehicle: { tongueWeightLimit: 200, wheelbase: 104, rearAxleToHitch: 30, departureAngle: 18, ...over.vehicle },
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
    expect(part(res, "ground").status).toBe("over");
    expect(res.advice.join(" ")).toMatch(/4 in of shank rise/);
  });

  it("checks the fold clearance against a 5.5 in pin-to-fascia", () => {
    // Common practice, no published source: pin-to-fascia about 5.5 in matters for racks that fold up
    expect(part(af(rackRig({ accessory: { foldClearance: 6 } })), "fold").status).toBe("over");
    expect(part(af(rackRig({ accessory: { foldClearance: 5 } })), "fold").status).toBe("tight"); // 0.5 of 5.5 in is 9 %
    expect(part(af(rackRig({ accessory: { foldClearance: 4 } })), "fold").status).toBe("within");
    // Physics: geometry, an extender moves the pin back: 5.5 + 4 = 9.5 in of room
    expect(part(af(rackRig({ accessory: { foldClearance: 6 }, extender: { length: 4 } })), "fold").limit?.value).toBe(9.5);
  });

  it("advises a raised shank for a receiver 12 in from the ground", () => {
    const res = af(rackRig({ hitch: { receiverHeight: 12 } }));
    // Common practice, no published source: a receiver about 12 in from the ground calls for a raised shank
    expect(res.advice.some((a) => a.includes("raised shank"))).toBe(true);
    expect(af(rackRig({ hitch: { receiverHeight: 20 } })).advice.some((a) => a.includes("raised shank"))).toBe(false);
  });

  it("weighs the load's distance from the pin by its moment", () => {
    const near = af(rackRig());
    // Physics: moment about the receiver pin; at the 10 in reference arm the load counts as itself (110 lb)
    expect(part(near, "load").actual?.value).toBeCloseTo(110, 9);
    const far = af(rackRig({ accessory: { loadCenterFromPin: 20 } }));
    // Physics: moment about the receiver pin, twice the arm doubles the moment: 220 lb
    expect(part(far, "load").actual?.value).toBeCloseTo(220, 9);
    expect(part(far, "load").status).toBe("over");
    const ext = af(rackRig({ extender: { length: 5 } }));
    // Physics: moment about the receiver pin, (10 + 5) / 10 × 110 = 165 lb
    expect(part(ext, "load").actual?.value).toBeCloseTo(165, 9);
  });

  it("goes by the lowest of the vehicle's and the hitch's tongue figures", () => {
    const res = af(rackRig({ accessory: { loadCenterFromPin: 20 } }));
    // Common practice, no published source: go by the lowest of the vehicle's (200 lb) and the hitch's (350 lb) numbers
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

  it("is over when the lowest point touches the ground", () => {
    const res = af(rackRig({ accessory: { lowestPointBelowShankTop: 16 } }));
    // Physics: geometry, 16 − 16 = 0 in of clearance
    expect(part(res, "ground").status).toBe("over");
  });
});
