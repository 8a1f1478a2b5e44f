import { describe, expect, it } from "vitest";
import { hitchAllowance, type HitchAllowanceInput } from "@/lib/towing";

/** An invented pickup after fitting: every figure imperial, chosen so the working is easy by hand. */
function fitted(over: Partial<HitchAllowanceInput> = {}): HitchAllowanceInput {
  return {
    units: "imperial",
    vehicle: { towRating: 7000, towRatingWd: 7500, tongueWeightLimit: 700, tongueWeightLimitWd: 750, departureAngle: 18, ...over.vehicle },
    hitch: { class: 3, receiverSize: "2", gtwRating: 5000, twRating: 500, gtwRatingWd: 6000, twRatingWd: 600, receiverHeight: 16, pinToFascia: 5.5, ...over.hitch },
    rearAxleToPin: 24,
    parts: [{ label: "Ball mount", gtwRating: 8000, twRating: 800 }, { label: "Pin and clip" }],
    carrier: { depth: 6, lowestPointBelowShankTop: 6 },
    ...over,
  };
}

describe("what this hitch allows: the lowest ratings", () => {
  it("takes the lowest of the vehicle's, the hitch label's and the parts' ratings, weight-carrying", () => {
    const a = hitchAllowance(fitted());
    // Source: Washington WAC 204-70-060 (the weakest component governs): min(7,000, 5,000, 8,000) = 5,000 lb, the hitch label
    expect(a.weightCarrying.grossTrailerWeight.value).toEqual({ value: 5000, unit: "lb" });
    expect(a.weightCarrying.grossTrailerWeight.governing?.id).toBe("hitch.gtwRating");
    // Source: Washington WAC 204-70-060: min(700, 500, 800) = 500 lb, the hitch label
    expect(a.weightCarrying.tongueWeight.value?.value).toBe(500);
    expect(a.weightCarrying.tongueWeight.governing?.id).toBe("hitch.twRating");
    // A part with no rating (pin and clip) is not a limit.
    expect(a.weightCarrying.grossTrailerWeight.ratings.map((r) => r.value)).toEqual([5000, 7000, 8000]);
  });

  it("takes the figures with weight distribution, and names the rating that sets each", () => {
    const a = hitchAllowance(fitted());
    // Source: Washington WAC 204-70-060: min(7,500 WD, 6,000 WD, 8,000 ball mount's only figure) = 6,000 lb, the hitch label with WD
    expect(a.withWd.grossTrailerWeight.value?.value).toBe(6000);
    expect(a.withWd.grossTrailerWeight.governing?.id).toBe("hitch.gtwRatingWd");
    // Source: Washington WAC 204-70-060: min(750, 600, 800) = 600 lb
    expect(a.withWd.tongueWeight.value?.value).toBe(600);
    expect(a.statements[2]).toBe("With weight distribution, the trailer may weigh at most 6,000 lb loaded; the hitch label sets this.");
  });

  it("a fitted part lower than the label governs", () => {
    const a = hitchAllowance(fitted({ parts: [{ label: "Ball mount", gtwRating: 4000, twRating: 400 }] }));
    // Source: Washington WAC 204-70-060: min(7,000, 5,000, 4,000) = 4,000 lb, the ball mount
    expect(a.weightCarrying.grossTrailerWeight.governing).toMatchObject({ id: "parts.0.gtwRating", label: "Ball mount", value: 4000 });
    // Source: Washington WAC 204-70-060: the ball mount has no WD figure, its 400 lb stands (the safe side): min(750, 600, 400) = 400 lb
    expect(a.withWd.tongueWeight.governing).toMatchObject({ id: "parts.0.twRating", value: 400 });
    expect(a.withWd.tongueWeight.governing?.note).toMatch(/weight-carrying figure is used/);
  });

  it("a blank WD figure falls back to the weight-carrying one and says so", () => {
    const a = hitchAllowance(fitted({ vehicle: { towRating: 5500, tongueWeightLimit: 550 } }));
    // Source: Washington WAC 204-70-060: min(5,500 vehicle, no WD figure, 6,000 hitch WD, 8,000) = 5,500 lb
    expect(a.withWd.grossTrailerWeight.governing).toMatchObject({ id: "vehicle.towRating", value: 5500 });
    expect(a.withWd.grossTrailerWeight.governing?.note).toBeDefined();
  });

  it("lists what is missing instead of guessing", () => {
    const a = hitchAllowance({ units: "imperial", vehicle: {}, hitch: { twRating: 350 } });
    expect(a.weightCarrying.grossTrailerWeight.value).toBeUndefined();
    expect(a.weightCarrying.tongueWeight.value?.value).toBe(350); // Source: Washington WAC 204-70-060: the one rating entered
    expect(a.weightCarrying.tongueWeight.missing.map((m) => m.id)).toEqual(["vehicle.tongueWeightLimit"]);
    expect(a.statements[1]).toMatch(/may be lower/);
    expect(a.missing.map((m) => m.field)).toEqual(expect.arrayContaining(["vehicle.towRating", "hitch.gtwRating", "hitch.pinToFascia", "hitch.receiverHeight", "rearAxleToPin"]));
  });
});

describe("what this hitch allows: folding rack, carrier geometry, raised shank", () => {
  it("a folding rack may need at most the measured pin hole to fascia", () => {
    // Common practice, no published source: the folded rack sits between the pin hole and the fascia, 5.5 in measured
    expect(hitchAllowance(fitted()).foldedDepthMax).toEqual({ value: 5.5, unit: "in" });
  });

  it("a carrier 10 in high and 30 in behind the rear axle sits at 18.43°", () => {
    const a = hitchAllowance(fitted());
    // Geometry: h = 16 − 6 = 10 in; x = 24 + 6 = 30 in; atan(10 / 30) = 18.43° (Source: 49 CFR 523.2 for the departure angle)
    expect(a.carrier?.groundClearance.value).toBe(10);
    expect(a.carrier?.angle?.value).toBeCloseTo(18.43, 2);
    // Geometry: 30 × tan(18°) = 9.75 in < 10 in, so no rise is needed
    expect(a.carrier?.riseNeeded?.value).toBe(0);
    expect(a.carrier?.keepsDepartureAngle).toBe(true);
    expect(a.raisedShank.advisable).toBe(false);
  });

  it("works out the rise that brings a carrier to the departure angle", () => {
    const a = hitchAllowance(fitted({ vehicle: { towRating: 7000, departureAngle: 25.0169 } }));
    // Geometry: atan(14 / 30) = 25.02°, so 30 × tan(25.0169°) = 14.0 in needed, 10 in now: 4.0 in of rise
    expect(a.carrier?.riseNeeded?.value).toBeCloseTo(4, 3);
    expect(a.carrier?.keepsDepartureAngle).toBe(false);
    expect(a.raisedShank.advisable).toBe(true);
    expect(a.raisedShank.reasons.join(" ")).toMatch(/about 4 in more rise/);
  });

  it("a carrier 14 in high sits at 25.02°", () => {
    const a = hitchAllowance(fitted({ carrier: { depth: 6, lowestPointBelowShankTop: 2 } }));
    // Geometry: atan(14 / 30) = 25.02°
    expect(a.carrier?.angle?.value).toBeCloseTo(25.02, 2);
  });

  it("a low receiver makes a raised shank advisable", () => {
    const a = hitchAllowance(fitted({ hitch: { receiverHeight: 11 }, carrier: undefined }));
    // Common practice, no published source: a receiver top about 12 in or less from the ground calls for a raised shank
    expect(a.raisedShank.advisable).toBe(true);
    expect(a.raisedShank.statement).toMatch(/^A raised shank is advisable/);
  });

  it("gives the same geometry in metric", () => {
    const a = hitchAllowance({
      units: "metric",
      vehicle: { departureAngle: 25.0169 },
      hitch: { receiverHeight: 406.4, pinToFascia: 139.7 },
      rearAxleToPin: 609.6,
      carrier: { depth: 152.4, lowestPointBelowShankTop: 152.4 },
    });
    // Geometry: the imperial case × 25.4: h = 254 mm, x = 762 mm, atan(254 / 762) = 18.43°, rise 4 in = 101.6 mm
    expect(a.carrier?.groundClearance.value).toBeCloseTo(254, 6);
    expect(a.carrier?.groundClearance.unit).toBe("mm");
    expect(a.carrier?.angle?.value).toBeCloseTo(18.43, 2);
    expect(a.carrier?.riseNeeded?.value).toBeCloseTo(101.6, 1);
    // Common practice, no published source: 406.4 mm (16 in) is above the 12 in (304.8 mm) mark, the rise is the only reason
    expect(a.raisedShank.reasons).toHaveLength(1);
  });

  it("carries the core's cautions and the deferral to the vehicle maker and local law", () => {
    const a = hitchAllowance(fitted());
    expect(a.cautions.join(" ")).toMatch(/lowest rating/);
    expect(a.cautions.join(" ")).toMatch(/torque values/);
    expect(a.deferral).toMatch(/vehicle maker/);
    expect(a.deferral).toMatch(/local law/);
    for (const s of a.steps) for (const i of s.inputs) expect(Number.isFinite(i.value)).toBe(true);
  });
});
