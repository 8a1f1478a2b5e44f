/**
 * Readings an installer would refuse to sign: each block holds one class of defect that once passed a rig it
 * should not have, with the hand working beside each expected value.
 */
import { describe, expect, it } from "vitest";
import {
  evaluateRig,
  parseRig,
  type AxleLoadsResult,
  type BallMountResult,
  type TongueMeasureResult,
  type WeakestLinkResult,
} from "@/lib/towing";
import { check, pickupRig, rig } from "./helpers";

const twLink = (r: WeakestLinkResult, id: string) => r.links.find((l) => l.id === id);

describe("a half-entered beam reading is no tongue weight", () => {
  it("names the missing distance and never turns the scale reading into the tongue weight", () => {
    const r = evaluateRig(pickupRig({ trailer: { tongueWeight: undefined, tongueWeightBasis: undefined, tongueMeasurement: { scaleReading: 200, blockToJack: 20 } } }));
    const tm = check<TongueMeasureResult>(r, "tongue-measure");
    expect(tm.status).toBe("incomplete");
    expect(tm.measuredTongueWeight).toBeUndefined();
    expect(tm.missing?.map((m) => m.field)).toEqual(["trailer.tongueMeasurement.jackToScale"]);
    const wl = check<WeakestLinkResult>(r, "weakest-link");
    expect(twLink(wl, "hitch.twRating")?.actual).toBeUndefined();
    expect(wl.missing?.map((m) => m.field)).toContain("trailer.tongueMeasurement.jackToScale");
    expect(check(r, "payload").missing?.map((m) => m.field)).toContain("trailer.tongueMeasurement.jackToScale");
    expect(r.verdict.level).toBe("incomplete");
  });

  it("works the beam out once both distances are in", () => {
    const r = evaluateRig(pickupRig({ trailer: { tongueWeight: undefined, tongueWeightBasis: undefined, tongueMeasurement: { scaleReading: 200, blockToJack: 20, jackToScale: 40 } } }));
    // Statics, moments about the block: TW · 20 = 200 · (20 + 40) → TW = 600 lb
    expect(check<TongueMeasureResult>(r, "tongue-measure").measuredTongueWeight?.value).toBeCloseTo(600, 9);
    expect(twLink(check<WeakestLinkResult>(r, "weakest-link"), "hitch.twRating")?.actual?.value).toBeCloseTo(600, 9);
  });
});

describe("a weighed tongue weight is never beaten by an entered one", () => {
  it("judges every check on the measurement when the entered figure is an estimate", () => {
    const r = evaluateRig(pickupRig({ trailer: { tongueWeight: 500, tongueWeightBasis: "estimated", tongueMeasurement: { scaleReading: 640 } } }));
    // Statics: the scale read directly is the tongue weight, 640 lb; the 500 lb estimate is set aside
    expect(twLink(check<WeakestLinkResult>(r, "weakest-link"), "hitch.twRating")?.actual?.value).toBe(640);
    // Source: 49 CFR 567.4(g)(3): weighed vehicle 3,000 + 2,500 = 5,500 lb plus the 640 lb tongue = 6,140 lb of the 7,000 lb GVWR
    expect(check(r, "payload").message).toContain("weighs 6,140 lb of its 7,000 lb GVWR, leaving 860 lb");
    const tm = check<TongueMeasureResult>(r, "tongue-measure");
    expect(tm.message).toMatch(/rather than the 500 lb estimate/);
    expect(check(r, "weakest-link").cautions.join(" ")).toMatch(/use the measured tongue weight \(640 lb\), not the 500 lb estimate/);
  });

  it("takes the larger of two figures that both claim to be weighed, and says so", () => {
    const r = evaluateRig(pickupRig({ trailer: { tongueWeight: 500, tongueWeightBasis: "measured", tongueMeasurement: { scaleReading: 700 } } }));
    // Common practice, no published source: two weighings that disagree are judged on the heavier (700 lb, the safe side)
    const wl = check<WeakestLinkResult>(r, "weakest-link");
    expect(twLink(wl, "hitch.twRating")?.actual?.value).toBe(700);
    // Source: Washington WAC 204-70-060: 700 lb is over the hitch's 675 lb tongue rating
    expect(wl.status).toBe("over");
    // 200 of 700 lb apart is 28.6 %, beyond the 10 % tight threshold
    expect(check(r, "tongue-measure").status).toBe("tight");
    expect(wl.cautions.join(" ")).toMatch(/use the larger, 700 lb/);
  });

  it("treats an entered figure with no basis as an estimate, never as weighed", () => {
    const r = evaluateRig(pickupRig({ trailer: { tongueWeightBasis: undefined } }));
    const tm = check<TongueMeasureResult>(r, "tongue-measure");
    expect(tm.status).toBe("incomplete");
    expect(tm.message).toMatch(/not marked as weighed, so it is taken as an estimate/);
    expect(check(r, "weakest-link").estimated).toBe(true);
    expect(r.verdict.level).toBe("incomplete");
  });
});

describe("an extender on a trailer rig counts", () => {
  it("is a link whose missing rating keeps the check open", () => {
    const r = evaluateRig(pickupRig({ extender: { length: 6 } }));
    const wl = check<WeakestLinkResult>(r, "weakest-link");
    expect(wl.missing?.map((m) => m.field)).toContain("extender.twRating");
    expect(wl.status).toBe("incomplete");
    // Common practice, no published source: makers derate or forbid extenders
    expect(wl.cautions.join(" ")).toMatch(/derate their ratings with an extender, or do not allow one/);
  });

  it("adds its length to the lever arm behind the rear axle", () => {
    const r = evaluateRig(pickupRig({ extender: { length: 6, twRating: 600 } }));
    const ax = check<AxleLoadsResult>(r, "axle-loads");
    // Statics: overhang 41 (pin) + 6 (extender) + 9 (ball mount) = 56 in; rear gains 500 × (145 + 56) / 145 = 693.10 lb
    expect(ax.rearChange?.value).toBeCloseTo(693.1, 1);
    // Statics: front loses 500 × 56 / 145 = 193.10 lb
    expect(ax.frontChange?.value).toBeCloseTo(-193.1, 1);
    // Source: Washington WAC 204-70-060: the extender's 600 lb is now the lowest tongue rating below 675 lb
    expect(check<WeakestLinkResult>(r, "weakest-link").governingTongueWeight?.id).toBe("extender.twRating");
  });

  it("warns that weight distribution through an extender is usually forbidden", () => {
    const r = evaluateRig(pickupRig({ extender: { length: 6, twRating: 600 }, weightDistribution: { used: true, tongueRating: 800 } }));
    expect(check(r, "weakest-link").cautions.join(" ")).toMatch(/forbid weight distribution through an extender/);
  });
});

describe("the weighed payload message says the weight, the GVWR and the room", () => {
  it("prints the weighed weight, not the payload used", () => {
    const p = check(evaluateRig(pickupRig()), "payload");
    // Source: 49 CFR 567.4(g)(3): 3,000 + 2,500 weighed + 500 tongue = 6,000 lb of 7,000 lb, 1,000 lb left
    expect(p.message).toBe("Loaded and hitched, the vehicle weighs 6,000 lb of its 7,000 lb GVWR, leaving 1,000 lb.");
  });
});

describe("one measured figure: rear axle to the receiver pin hole", () => {
  it("reaches the ball by adding the ball mount's length", () => {
    const ax = check<AxleLoadsResult>(evaluateRig(pickupRig()), "axle-loads");
    // Statics: 41 in + 9 in = 50 in; REFERENCES example WB 145 in, OH 50 in, TW 800 lb → +1,075.86 lb, so for
    // 500 lb: 500 × 195 / 145 = 672.41 lb on the rear, −500 × 50 / 145 = −172.41 lb on the front
    expect(ax.rearChange?.value).toBeCloseTo(672.41, 2);
    expect(ax.frontChange?.value).toBeCloseTo(-172.41, 2);
    expect(ax.steps.find((s) => s.id === "front-change")?.note).toBe("Rear axle to ball: 41 in to the pin hole + 0 in extender + 9 in ball mount = 50 in.");
  });

  it("asks for the ball mount's length when it is not given", () => {
    const ax = check<AxleLoadsResult>(evaluateRig(pickupRig({ ballMount: { length: undefined } })), "axle-loads");
    expect(ax.status).toBe("incomplete");
    expect(ax.missing?.map((m) => m.field)).toContain("ballMount.length");
  });

  it("reads older inputs: the ball's figure becomes the pin's where the ball mount's length is known", () => {
    const base = { units: "imperial", vehicle: { rearAxleToHitch: 50 }, trailer: { type: "utility" } };
    // Geometry: 50 in to the ball − 9 in ball mount − 4 in extender = 37 in to the pin
    const migrated = rig({ ...base, ballMount: { length: 9 }, extender: { length: 4 } });
    expect(migrated.vehicle.rearAxleToPin).toBe(37);
    expect(migrated.vehicle.rearAxleToHitch).toBeUndefined();
    // Without the length the old figure is kept and read as the ball's position
    const kept = rig(base);
    expect(kept.vehicle.rearAxleToHitch).toBe(50);
    const ax = check<AxleLoadsResult>(evaluateRig(rig({ ...base, vehicle: { rearAxleToHitch: 50, wheelbase: 145 }, trailer: { type: "utility", tongueWeight: 500, tongueWeightBasis: "measured", grossTrailerWeight: 4000 } })), "axle-loads");
    // Statics: 500 × (145 + 50) / 145 = 672.41 lb
    expect(ax.rearChange?.value).toBeCloseTo(672.41, 2);
    // An accessory's old figure was already to the pin
    const acc = rig({ units: "imperial", vehicle: { rearAxleToHitch: 30 }, accessory: { type: "platform-rack" } });
    expect(acc.vehicle.rearAxleToPin).toBe(30);
  });
});

describe("weight distribution with no fender heights is an estimate", () => {
  const wdRig = (gawrRear: number) => evaluateRig(pickupRig({ vehicle: { gawrRear }, weightDistribution: { used: true, tongueRating: 800 } }));

  it("flags the axle loads as estimated and says what to measure", () => {
    const ax = check<AxleLoadsResult>(wdRig(4000), "axle-loads");
    expect(ax.estimated).toBe(true);
    expect(ax.advice.join(" ")).toMatch(/Measure the front fender height/);
    // Statics, bars released (the heaviest): 2,500 + 672.41 = 3,172.41 lb against 4,000 lb
    expect(ax.steps.find((s) => s.id === "rear-unmeasured-wd")?.result.value).toBeCloseTo(3172.41, 2);
  });

  it("is not over on an assumption, but over when no restoration could save it", () => {
    // Statics: released 3,172.41 lb > 3,100 lb, but with all the lost load given back 2,500 + 500 = 3,000 lb ≤ 3,100 lb
    const open = check<AxleLoadsResult>(wdRig(3100), "axle-loads");
    expect(open.status).toBe("incomplete");
    expect(open.missing?.map((m) => m.field)).toContain("weightDistribution.fenderWithWd");
    // Statics: even at 3,000 lb the rear is over a 2,900 lb GAWR
    expect(check(wdRig(2900), "axle-loads").status).toBe("over");
    // The envelope reads the same: not over at 3,100 lb, over at 2,900 lb
    expect(check(wdRig(3100), "envelope").status).not.toBe("over");
    expect(check(wdRig(2900), "envelope").status).toBe("over");
  });
});

describe("an empty rig is not confirmed", () => {
  it("never reads within or tight with nothing checked", () => {
    const v = evaluateRig(rig({ units: "imperial", vehicle: {} })).verdict;
    expect(v.level).toBe("incomplete");
    expect(v.complete).toBe(false);
    expect(v.message).toMatch(/^Not confirmed/);
    const t = evaluateRig(rig({ units: "metric", vehicle: {}, trailer: { type: "boat" } })).verdict;
    expect(t.level).toBe("incomplete");
  });
});

describe("a set-up to adjust reads apart from a rating exceeded", () => {
  it("a ball mount off level asks to adjust the set-up, not to stop towing for a rating", () => {
    const r = evaluateRig(pickupRig({ ballMount: { drop: 2 } }));
    // Source: boating publication how-to: 26 − 20 = 6 in needed, 2 in fitted
    // Statics: the 2 in drop is 4 in less than the 6 in needed, so the ball sits high and the trailer rides nose-up
    expect(r.verdict.level).toBe("adjust");
    expect(r.verdict.adjust).toEqual(["ball-mount"]);
    expect(r.verdict.over).toEqual([]);
    expect(r.verdict.message).toBe("Adjust the set-up before towing: the ball mount's 2 in drop leaves the trailer 4 in off level, nose-up; a 6 in drop is needed.");
    expect(r.verdict.actions[0]?.status).toBe("adjust");
  });

  it("a rating exceeded stays over, and the set-up item is still named", () => {
    const r = evaluateRig(pickupRig({ ballMount: { drop: 2 }, trailer: { grossTrailerWeight: 4800, tongueWeight: 600 } }));
    // Source: Washington WAC 204-70-060: 4,800 lb over the hitch's 4,500 lb rating
    expect(r.verdict.level).toBe("over");
    expect(r.verdict.over).toContain("weakest-link");
    expect(r.verdict.adjust).toContain("ball-mount");
    expect(r.verdict.message).toMatch(/^Over: a rating is exceeded/);
    // Weight distribution to fit (4,800 lb over the 4,500 lb weight-carrying rating) and the ball mount
    expect(r.verdict.message).toMatch(/set-up also needs adjusting: weight distribution, ball mount rise or drop/);
    // Ratings exceeded come first in what to do
    expect(r.verdict.actions.map((a) => a.status)[0]).toBe("over");
  });
});

describe("advice the same check would pass", () => {
  it("never advises a common drop that still leaves the trailer off level", () => {
    // Geometry: 34 − 20 = 14 in needed; the largest common size, 12 in, leaves 2 in off level (allowance 1 in,
    // common practice, no published source)
    const bm = check<BallMountResult>(evaluateRig(pickupRig({ hitch: { receiverHeight: 34 }, ballMount: { drop: 12 } })), "ball-mount");
    expect(bm.status).toBe("adjust");
    expect(bm.advice.join(" ")).toMatch(/No common ball mount levels this trailer/);
    expect(bm.advice.join(" ")).not.toMatch(/Use a ball mount with a 12 in drop/);
  });
});

describe("impossible inputs are refused", () => {
  it("refuses a tongue weight above the trailer's weight", () => {
    const r = parseRig({ units: "imperial", vehicle: {}, trailer: { type: "utility", grossTrailerWeight: 500, tongueWeight: 600 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fieldErrors["trailer.tongueWeight"]?.[0]).toMatch(/cannot be more than the gross trailer weight/);
    // Statics: beam 200 × (20 + 40) / 20 = 600 kg, above a 500 kg trailer
    const beam = parseRig({ units: "metric", vehicle: {}, trailer: { type: "utility", grossTrailerWeight: 500, tongueMeasurement: { scaleReading: 200, blockToJack: 500, jackToScale: 1000 } } });
    expect(beam.ok).toBe(false);
    if (!beam.ok) expect(Object.keys(beam.fieldErrors)).toEqual(["trailer.tongueMeasurement.scaleReading"]);
  });
});

describe("a weight-carrying-only hitch with weight distribution", () => {
  it("waits for the hitch's figure with weight distribution instead of passing on the weight-carrying one", () => {
    const r = evaluateRig(pickupRig({ hitch: { gtwRatingWd: undefined, twRatingWd: undefined }, weightDistribution: { used: true, tongueRating: 800 } }));
    const wl = check<WeakestLinkResult>(r, "weakest-link");
    expect(wl.missing?.map((m) => m.field)).toEqual(expect.arrayContaining(["hitch.gtwRatingWd", "hitch.twRatingWd"]));
    expect(wl.status).toBe("incomplete");
    expect(wl.steps.map((s) => s.note).join(" ")).toMatch(/weight-carrying only must not be used with weight distribution/);
    // A known over still stands: Source: Washington WAC 204-70-060, 4,800 lb over the 4,500 lb label
    const over = check(evaluateRig(pickupRig({ hitch: { gtwRatingWd: undefined, twRatingWd: undefined }, trailer: { grossTrailerWeight: 4800, tongueWeight: 600 }, weightDistribution: { used: true, tongueRating: 800 } })), "weakest-link");
    expect(over.status).toBe("over");
  });
});
