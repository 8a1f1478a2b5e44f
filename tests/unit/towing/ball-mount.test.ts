import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig, type BallMountResult } from "@/lib/towing";
import { nearestCommonDrop } from "@/lib/towing/checks/ball-mount";
import { check, pickupRig } from "./helpers";

const bm = (r: ReturnType<typeof pickupRig>) => check<BallMountResult>(evaluateRig(r), "ball-mount");

describe("ball mount", () => {
  it("receiver 26 in and coupler 20 in need a 6 in drop", () => {
    const res = bm(pickupRig());
    // Source: boating publication how-to; the formula is geometry: 26 − 20 = 6 in drop
    expect(res.dropNeeded?.value).toBe(6);
    expect(res.nearestCommonDrop?.value).toBe(6);
    expect(res.status).toBe("within");
  });

  it("a low receiver needs a rise", () => {
    const res = bm(pickupRig({ hitch: { receiverHeight: 18 }, ballMount: { drop: -2 } }));
    // Source: boating publication how-to (negative: a rise): 18 − 20 = −2 in
    expect(res.dropNeeded?.value).toBe(-2);
    expect(res.status).toBe("within");
  });

  it("allows for rear squat", () => {
    const res = bm(pickupRig({ ballMount: { squatAllowance: 1 } }));
    // Physics: geometry, the receiver sits 1 in lower when hitched: 26 − 1 − 20 = 5 in
    expect(res.dropNeeded?.value).toBe(5);
    // Common practice, no published source: within about 1 in of level; the 6 in drop is exactly 1 in off, no room left
    expect(res.status).toBe("tight");
    // A tight fit says how far off it rides and which drop would level it, rather than reading as fine.
    expect(res.message).toContain("1 in off level, nose-down, at the edge of the 1 in allowed; a 5 in drop would level it");
    expect(res.advice[0]).toBe("Use a ball mount with a 5 in drop (nearest common size).");
  });

  it("picks the nearest common size", () => {
    // Common practice, no published source: whole-inch rises and drops up to 12 in
    expect(nearestCommonDrop(5.6)).toBe(6);
    expect(nearestCommonDrop(-3.2)).toBe(-3); // Common practice, no published source
    expect(nearestCommonDrop(14)).toBe(12); // Common practice, no published source
  });

  it("asks to adjust the set-up when the trailer rides well off level", () => {
    const res = bm(pickupRig({ ballMount: { drop: 2 } }));
    // Source: boating publication how-to: 6 in needed, 2 in fitted → 4 in off level; the 1 in allowance is
    // common practice, no published source, and a ball mount to change is a set-up to adjust, never "over"
    expect(res.actual?.value).toBe(4);
    expect(res.status).toBe("adjust");
    expect(res.advice[0]).toContain("6 in drop");
  });

  it("works in millimetres", () => {
    const res = bm(convertRig(pickupRig(), "metric"));
    // Source: boating publication how-to: 660.4 − 508 = 152.4 mm (6 in)
    expect(res.dropNeeded?.value).toBeCloseTo(152.4, 9);
    expect(res.dropNeeded?.unit).toBe("mm");
  });

  it("asks for the ball mount's drop", () => {
    const res = bm(pickupRig({ ballMount: { drop: undefined } }));
    expect(res.status).toBe("incomplete");
    expect(res.message).toContain("6 in drop");
  });
});
