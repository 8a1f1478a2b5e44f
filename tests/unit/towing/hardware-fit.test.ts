/**
 * Hardware fit: the ball against the trailer's class, the receiver opening against the hitch class, the ball's
 * shank against the ball mount's hole, and the hitch pin against the receiver. The smallest ball by class is
 * 15 CRR-NY 57.5 Table 1 (the classes by gross trailer weight from 15 NYCRR 57.3(c)); the receiver openings and the
 * pins are common practice with no published source, so they may warn or ask for a part to change, never read over.
 */
import { describe, expect, it } from "vitest";
import { evaluateRig, type HardwareFitResult, type WeakestLinkResult } from "@/lib/towing";
import { check, pickupRig, rig } from "./helpers";

const fit = (r: ReturnType<typeof pickupRig>) => check<HardwareFitResult>(evaluateRig(r), "hardware-fit");
const part = (c: HardwareFitResult, id: string) => c.parts.find((p) => p.id === id)!;

describe("hardware fit", () => {
  it("passes a 2 in ball, a 1 in shank in a 1 in hole and a 5/8 in pin in a 2 in receiver", () => {
    const c = fit(pickupRig());
    // Source: 15 CRR-NY 57.5 Table 1: a 4,000 lb trailer is class 3 (over 3,500 up to 5,000 lb), smallest ball 2 in
    const ball = c.steps.find((s) => s.id === "ball-size-room")!;
    expect(ball.inputs.map((i) => i.value)).toEqual([2, 2]);
    expect(ball.result.value).toBe(0);
    expect(ball.formula).toBe("D_ball - D_min");
    // Geometry: 1 − 1 = 0 in round the shank
    expect(c.steps.find((s) => s.id === "shank-gap")!.result.value).toBe(0);
    // Common practice, no published source: a 2 in receiver takes a 5/8 in pin: 0.625 − 0.625 = 0
    expect(c.steps.find((s) => s.id === "pin-gap")!.result.value).toBe(0);
    // Common practice, no published source: a class 3 hitch has a 2 in receiver
    expect(part(c, "receiver-class").status).toBe("within");
    expect(c.parts.map((p) => p.status)).toEqual(["within", "within", "within", "within"]);
    expect(c.status).toBe("within");
    expect(c.cautions.join(" ")).toMatch(/sized together/);
  });

  it("asks for a bigger ball when the trailer's class needs one: a set-up to change, not a rating exceeded", () => {
    // Source: 15 CRR-NY 57.5 Table 1: 3,000 lb is class 2 (over 2,000 up to 3,500 lb): smallest ball 2 in.
    // Geometry: 1.875 − 2 = −0.125 in
    const c = fit(pickupRig({ trailer: { grossTrailerWeight: 3000, tongueWeight: 360, ballSize: "1-7/8", couplerBallSize: "1-7/8" } }));
    expect(c.steps.find((s) => s.id === "ball-size-room")!.result.value).toBeCloseTo(-0.125, 12);
    expect(part(c, "ball-size").status).toBe("adjust");
    expect(c.status).toBe("adjust");
    expect(c.advice[0]).toBe("Fit a ball of at least 2 in, with a coupler to match: a 1-7/8 in ball is too small for a class 2 trailer.");
    expect(c.message).toMatch(/^A part does not fit as it should: ball size for the trailer's class/);
  });

  it("takes a 1-7/8 in ball under a class 1 trailer", () => {
    // Source: 15 CRR-NY 57.5 Table 1: up to 2,000 lb (class 1) the smallest ball is 1-7/8 in: 1.875 − 1.875 = 0
    const c = fit(pickupRig({ trailer: { grossTrailerWeight: 1800, tongueWeight: 200, ballSize: "1-7/8", couplerBallSize: "1-7/8" } }));
    expect(c.steps.find((s) => s.id === "ball-size-room")!.result.value).toBe(0);
    expect(part(c, "ball-size").status).toBe("within");
  });

  it("sets no diameter for a class 4 trailer, and says the coupler's strength decides", () => {
    // Source: 15 CRR-NY 57.5 Table 1: class 4 (over 5,000 up to 10,000 lb): the ball and bolt match the strength the coupler needs
    const c = fit(pickupRig({ trailer: { grossTrailerWeight: 6000, tongueWeight: 700 } }));
    expect(part(c, "ball-size").status).toBe("within");
    expect(c.cautions.join(" ")).toMatch(/Over 5,000 lb \(class 4\) the table sets no ball diameter/);
  });

  it("never lets a heavier trailer take a smaller ball than class 3 needs", () => {
    // Source: 15 CRR-NY 57.5 Table 1: class 3 (up to 5,000 lb) needs at least a 2 in ball; the table sets none above.
    // Geometry: 1.875 − 2 = −0.125 in: a 1-7/8 in ball on a 6,000 lb trailer is below that floor, a part to change.
    const c = fit(pickupRig({ trailer: { grossTrailerWeight: 6000, tongueWeight: 700, ballSize: "1-7/8" } }));
    expect(part(c, "ball-size").status).toBe("adjust");
    expect(c.steps.find((s) => s.id === "ball-size-room")!.result.value).toBe(-0.125);
    expect(c.advice.join(" ")).toMatch(/at least 2 in.*smaller than even a class 3 trailer/);
  });

  it("a shank thicker than the hole does not go in: adjust", () => {
    // Geometry: 1 − 1.25 = −0.25 in: the 1-1/4 in shank does not pass a 1 in hole
    const c = fit(pickupRig({ trailer: { ballShankSize: "1-1/4" } }));
    expect(c.steps.find((s) => s.id === "shank-gap")!.result.value).toBe(-0.25);
    expect(part(c, "shank-hole").status).toBe("adjust");
    expect(c.advice.join(" ")).toMatch(/does not go through the 1 in hole.*Never drill the hole out/);
  });

  it("a thinner shank rocks in the hole until a rated reducer sleeve fills it, and the sleeve becomes a link", () => {
    // Geometry: 1 − 0.75 = 0.25 in of room round a 3/4 in shank in a 1 in hole
    const loose = fit(pickupRig({ trailer: { ballShankSize: "3/4" } }));
    expect(loose.steps.find((s) => s.id === "shank-gap")!.result.value).toBe(0.25);
    expect(loose.status).toBe("adjust");
    expect(loose.advice.join(" ")).toMatch(/fit a reducer sleeve from 1 to 3\/4 in rated for the trailer/);
    const sleeved = evaluateRig(pickupRig({ trailer: { ballShankSize: "3/4" }, ballSleeve: { gtwRating: 5000, twRating: 500 } }));
    const c = check<HardwareFitResult>(sleeved, "hardware-fit");
    expect(part(c, "shank-hole").status).toBe("within");
    expect(c.cautions.join(" ")).toMatch(/reducer sleeve fills the 1 in hole/);
    // Source: Washington WAC 204-70-060 (the weakest component governs): the sleeve's 500 lb tongue rating is a link; TW 500 lb leaves 0
    const wl = check<WeakestLinkResult>(sleeved, "weakest-link");
    expect(wl.links.find((l) => l.id === "ballSleeve.twRating")!.margin!.value).toBe(0);
    expect(wl.links.find((l) => l.id === "ballSleeve.gtwRating")!.rating.value).toBe(5000);
  });

  it("a hitch pin that does not suit the receiver is a part to change, never over", () => {
    // Common practice, no published source: a 2 in receiver takes a 5/8 in pin; 0.625 − 0.5 = 0.125 in loose
    const small = fit(pickupRig({ hitch: { pinDiameter: "1/2" } }));
    expect(small.steps.find((s) => s.id === "pin-gap")!.result.value).toBe(0.125);
    expect(part(small, "pin").status).toBe("adjust");
    expect(small.advice.join(" ")).toMatch(/A 1\/2 in pin is loose in a 2 in receiver: use a 5\/8 in hitch pin/);
    // Common practice, no published source: a 1-1/4 in receiver takes a 1/2 in pin; 0.5 − 0.625 = −0.125 in
    const big = fit(pickupRig({ hitch: { class: 2, receiverSize: "1-1/4", pinDiameter: "5/8" }, trailer: { grossTrailerWeight: 3000, tongueWeight: 330 } }));
    expect(big.steps.find((s) => s.id === "pin-gap")!.result.value).toBe(-0.125);
    expect(part(big, "pin").status).toBe("adjust");
    expect(big.status).not.toBe("over");
  });

  it("an unusual receiver opening for the class is a caution (tight), never over or adjust", () => {
    // Common practice, no published source: a class 3 hitch usually has a 2 in receiver, not 1-1/4 in
    const c = fit(pickupRig({ hitch: { receiverSize: "1-1/4", pinDiameter: "1/2" } }));
    expect(part(c, "receiver-class").status).toBe("tight");
    expect(c.status).toBe("tight");
    expect(c.cautions.join(" ")).toMatch(/A class 3 hitch usually has a 2 in receiver, and this one is entered as 1-1\/4 in/);
  });

  it("says what to measure when the sizes are missing, and never reads within", () => {
    const c = fit(pickupRig({ trailer: { ballShankSize: undefined }, ballMount: { holeSize: undefined }, hitch: { pinDiameter: undefined } }));
    expect(c.status).toBe("incomplete");
    expect(c.missing!.map((m) => m.field)).toEqual(["trailer.ballShankSize", "ballMount.holeSize", "hitch.pinDiameter"]);
    expect(part(c, "shank-hole").waitingFor).toMatch(/shank diameter and the ball mount's hole/);
    expect(c.missing!.find((m) => m.field === "ballMount.holeSize")!.where).toMatch(/Stamped beside the hole/);
    expect(c.advice.join(" ")).toMatch(/The hitch pin's diameter/);
  });

  it("does not apply to a fifth wheel or a rack", () => {
    const fifth = evaluateRig(
      rig({ units: "imperial", vehicle: { rearAxleToBedHitch: -4 }, hitch: { bedGtwRating: 16000, bedPinRating: 4000 }, trailer: { type: "travel", hitchType: "fifth-wheel", grossTrailerWeight: 10000, tongueWeight: 2000 } }),
    );
    expect(fifth.notApplicable).toContain("hardware-fit");
    const rack = evaluateRig(rig({ units: "imperial", vehicle: {}, hitch: { receiverSize: "2" }, accessory: { type: "platform-rack", weight: 50, loadWeight: 60 } }));
    expect(rack.notApplicable).toContain("hardware-fit");
  });

  it("metric: the same sizes in millimetres", () => {
    // 1,500 kg = 3,306.9 lb: class 2 (Source: 15 CRR-NY 57.5 Table 1), smallest ball 2 in = 50.8 mm; a 1-7/8 in
    // ball is 47.625 mm. Geometry: 47.625 − 50.8 = −3.175 mm. The class ends at 3,500 lb × 0.45359237 = 1,587.6 kg.
    const r = evaluateRig(
      rig({
        units: "metric",
        vehicle: { towRating: 2500, tongueWeightLimit: 250 },
        hitch: { class: 3, receiverSize: "2", pinDiameter: "5/8", gtwRating: 2500, twRating: 250 },
        trailer: { type: "utility", grossTrailerWeight: 1500, tongueWeight: 150, tongueWeightBasis: "measured", ballSize: "1-7/8", couplerBallSize: "1-7/8", ballRating: 1600, ballShankSize: "1" },
        ballMount: { holeSize: "1" },
      }),
    );
    const c = check<HardwareFitResult>(r, "hardware-fit");
    const step = c.steps.find((s) => s.id === "ball-size-room")!;
    expect(step.result.unit).toBe("mm");
    expect(step.inputs[0]!.value).toBeCloseTo(47.625, 9);
    expect(step.inputs[1]!.value).toBeCloseTo(50.8, 9);
    expect(step.result.value).toBeCloseTo(-3.175, 9);
    expect(step.note).toMatch(/up to 1,588 kg gross/);
    expect(c.status).toBe("adjust");
    // Geometry: a 1 in shank in a 1 in hole = 25.4 mm in 25.4 mm, no room
    expect(c.steps.find((s) => s.id === "shank-gap")!.result.value).toBeCloseTo(0, 9);
  });
});
