import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig, type AxleLoadsResult, type EnvelopeResult } from "@/lib/towing";
import { check, pickupRig, rig } from "./helpers";

const env = (r: ReturnType<typeof pickupRig>) => check<EnvelopeResult>(evaluateRig(r), "envelope");

describe("envelope", () => {
  it("is bounded by the class 3 receiver", () => {
    const res = env(pickupRig());
    // Common practice, no published source: class 3 receiver 4,500 lb gross trailer weight
    expect(res.maxGrossTrailerWeight?.value).toBe(4500);
    // Common practice, no published source: class 3 receiver 675 lb tongue weight (15 % of 4,500 lb reaches it exactly)
    expect(res.maxTongueWeight?.value).toBeCloseTo(675, 9);
    expect(res.status).toBe("within");
  });

  it("lets the tongue limit bind through the band's lowest share", () => {
    const res = env(pickupRig({ vehicle: { tongueWeightLimit: 300 }, trailer: { tongueWeight: 290, grossTrailerWeight: 2500 } }));
    // Source: GM and Nissan owner's manuals (at least 10 %): 300 lb ÷ 10 % = 3,000 lb of trailer at most
    expect(res.maxGrossTrailerWeight?.value).toBeCloseTo(3000, 9);
    expect(res.governing?.id).toBe("vehicle.tongueWeightLimit");
  });

  it("lets the GCWR bind", () => {
    const res = env(pickupRig({ vehicle: { gcwr: 9000 } }));
    // Physics: 9,000 − 5,500 (weighed vehicle) = 3,500 lb of trailer
    expect(res.maxGrossTrailerWeight?.value).toBe(3500);
    expect(res.binding?.id).toBe("vehicle.gcwr");
    expect(res.status).toBe("over"); // the 4,000 lb trailer is over it
  });

  it("lets the rear GAWR bind the tongue", () => {
    const res = env(pickupRig({ vehicle: { gawrRear: 3000 } }));
    // Physics: statics, moments about the rear axle: (3,000 − 2,500) × 145 / 195 = 371.79 lb
    expect(res.lines.find((l) => l.id === "vehicle.gawrRear")?.value).toBeCloseTo(371.79, 2);
    expect(res.maxTongueWeight?.value).toBeCloseTo(371.79, 2);
  });

  it("says how much more may go into the vehicle", () => {
    const res = env(pickupRig());
    // Source: 49 CFR 567.4(g)(3) and GM (Cadillac) owner's manuals: GVWR 7,000 − weighed 5,500 − TW 500 = 1,000 lb
    expect(res.vehicleLoadRoom?.value).toBe(1000);
  });

  it("draws the allowed region for a chart", () => {
    const res = env(pickupRig());
    // Physics: corners of {0.10 G ≤ T ≤ min(0.15 G, 675), G ≤ 4,500}
    expect(res.region).toEqual([
      { grossTrailerWeight: 0, tongueWeight: 0 },
      { grossTrailerWeight: 4500, tongueWeight: 675 },
      { grossTrailerWeight: 4500, tongueWeight: 450 },
    ]);
    expect(res.lines.filter((l) => l.kind === "share-min")[0]?.slope).toBe(0.1);
  });

  it("answers how heavy a trailer a vehicle with nothing hitched could take", () => {
    const r = rig({
      units: "imperial",
      vehicle: { towRating: 5000, tongueWeightLimit: 500, gvwr: 6000, curbWeight: 4500, gcwr: 11000, gawrRear: 3500, axleWeights: { front: 2600, rear: 2200 }, wheelbase: 120, rearAxleToPin: 45 },
      hitch: { gtwRating: 5000, twRating: 500 },
      load: { occupants: 300, cargo: 0, hitchHardware: 0 },
    });
    const res = env(r);
    // Physics: GCWR 11,000 − weighed 4,800 = 6,200 lb is above the 5,000 lb rating, so the rating binds
    expect(res.maxGrossTrailerWeight?.value).toBe(5000);
    // Nothing hitched: the envelope answers, but nothing is checked, so it is not a pass
    expect(res.status).toBe("incomplete");
    expect(res.missing?.map((m) => m.field)).toContain("trailer.grossTrailerWeight");
  });

  it("agrees in metric", () => {
    const r = pickupRig({ vehicle: { gcwr: 9000 } });
    const met = env(convertRig(r, "metric"));
    // Source: NIST SP 811 (1 lb = 0.45359237 kg): 3,500 lb = 1,587.573 kg
    expect(met.maxGrossTrailerWeight?.value).toBeCloseTo(1587.573, 3);
    expect(met.binding?.id).toBe("vehicle.gcwr");
    expect(met.regionUnit).toBe("kg");
  });

  it("shows the figures of the comparison its badge comes from", () => {
    // Statics: trailer 4,400 lb (room under 4,500 lb) but tongue 700 lb, over the hitch's 675 lb: the card shows the tongue
    const res = env(pickupRig({ trailer: { grossTrailerWeight: 4400, tongueWeight: 700 } }));
    expect(res.status).toBe("over");
    expect(res.margin!.value).toBeLessThan(0);
    expect(res.actual?.value).toBe(700);
    expect(res.message).toMatch(/on the tongue, the trailer puts 700 lb/);
    expect(res.message).toMatch(/25 lb over/); // 700 − 675 = 25 lb
  });

  it("uses the same weight-distribution state as the axle-loads check", () => {
    // Statics, WD measured at 50 %: rear = 2,500 + TW × (1 + 0.5 × 50 / 145); GAWR 3,050 lb allows
    // TW ≤ 550 / 1.172414 = 469.12 lb. A 480 lb tongue is over in both checks; 460 lb is within in both.
    const wdRig = (tw: number) =>
      pickupRig({ vehicle: { gawrRear: 3050 }, trailer: { tongueWeight: tw }, weightDistribution: { used: true, tongueRating: 1000, fenderUnhitched: 39, fenderHitched: 40, fenderWithWd: 39.5 } });
    const over = evaluateRig(wdRig(480));
    expect(check<EnvelopeResult>(over, "envelope").lines.find((l) => l.id === "vehicle.gawrRear")?.value).toBeCloseTo(469.12, 2);
    expect(check<EnvelopeResult>(over, "envelope").status).toBe("over");
    expect(check<AxleLoadsResult>(over, "axle-loads").status).toBe("over");
    const ok = evaluateRig(wdRig(440));
    expect(check<AxleLoadsResult>(ok, "axle-loads").status).not.toBe("over");
    expect(check<EnvelopeResult>(ok, "envelope").status).not.toBe("over");
  });
});
