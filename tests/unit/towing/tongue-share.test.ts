import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig, type TongueShareResult } from "@/lib/towing";
import { check, pickupRig } from "./helpers";

const ts = (r: ReturnType<typeof pickupRig>) => check<TongueShareResult>(evaluateRig(r), "tongue-share");

describe("tongue-weight share", () => {
  it("uses 10–15 % for conventional trailers", () => {
    const res = ts(pickupRig());
    // Source: GM and Nissan owner's manuals (conventional trailers 10–15 %)
    expect(res.band.min).toBe(0.1);
    expect(res.band.max).toBe(0.15); // Source: GM and Nissan owner's manuals
    // Physics: arithmetic, 500 ÷ 4,000 = 12.5 %
    expect(res.share).toBeCloseTo(0.125, 12);
    expect(res.status).toBe("within");
  });

  it("calls a light tongue a sway hazard", () => {
    const res = ts(pickupRig({ trailer: { tongueWeight: 350 } }));
    // Source: GM and Nissan owner's manuals: 8.75 % is below the 10 % floor
    expect(res.status).toBe("adjust");
    expect(res.message).toContain("sway");
    expect(res.cautions.join(" ")).toMatch(/sway/);
  });

  it("calls a heavy tongue a rear-overload and light-steering hazard", () => {
    const res = ts(pickupRig({ trailer: { tongueWeight: 700 } }));
    // Source: GM and Nissan owner's manuals: 17.5 % is above the 15 % ceiling
    expect(res.status).toBe("adjust");
    expect(res.message).toMatch(/rear axle.*steering/);
  });

  it("is tight close to an edge", () => {
    // Source: GM and Nissan owner's manuals (15 % ceiling); 14.5 % leaves 0.5 points, 3.3 % of the edge
    const res = ts(pickupRig({ trailer: { tongueWeight: 580 } }));
    expect(res.status).toBe("tight");
    expect(res.governing?.id).toBe("band.max");
  });

  it("uses 7–12 % for boat trailers", () => {
    const within = ts(pickupRig({ trailer: { type: "boat", tongueWeight: 400 } }));
    // Source: BoatUS (an engineering instructor's guidance): boat trailers 7–12 %; "about 10 %" in a Virginia boater course
    expect(within.band).toMatchObject({ min: 0.07, max: 0.12 });
    expect(within.status).toBe("within");
    const light = ts(pickupRig({ trailer: { type: "boat", tongueWeight: 240 } }));
    // Source: BoatUS: 6 % is below 7 %
    expect(light.status).toBe("adjust");
  });

  it("lets the vehicle maker's band win", () => {
    // Source: GM and Nissan owner's manuals ("some makers state 9–11 %: the vehicle's manual wins")
    const res = ts(pickupRig({ vehicle: { tongueShareBand: { min: 9, max: 11 } } }));
    expect(res.band.source).toBe("vehicle");
    expect(res.status).toBe("adjust"); // 12.5 % is above 11 %
  });

  it("estimates an unweighed tongue as a range, labelled as an estimate", () => {
    const res = ts(pickupRig({ trailer: { tongueWeight: undefined, tongueWeightBasis: undefined } }));
    expect(res.status).toBe("incomplete");
    expect(res.estimated).toBe(true);
    // Source: GM and Nissan owner's manuals, 10–15 % of 4,000 lb = 400–600 lb
    expect(res.estimatedTongueWeight?.low.value).toBeCloseTo(400, 9);
    expect(res.estimatedTongueWeight?.high.value).toBeCloseTo(600, 9);
    expect(res.steps[0]?.note).toMatch(/estimate/i);
  });

  it("gives the same share in metric", () => {
    const r = pickupRig({ trailer: { tongueWeight: 580 } });
    const met = ts(convertRig(r, "metric"));
    // Source: GM and Nissan owner's manuals; the share has no unit, so 14.5 % either way
    expect(met.share).toBeCloseTo(0.145, 12);
    expect(met.status).toBe("tight");
  });
});
