/**
 * Fifth-wheel and gooseneck rigs: the hitch point in the bed, over or ahead of the rear axle; the pin weight
 * against its own band and the payload; no ball mount, receiver or weight-distribution checks.
 */
import { describe, expect, it } from "vitest";
import {
  evaluateRig,
  parseRig,
  type AxleLoadsResult,
  type CheckResult,
  type FrontAxleLossResult,
  type TongueShareResult,
  type WeakestLinkResult,
} from "@/lib/towing";
import { check, rig } from "./helpers";

/** An invented heavy pickup with a fifth wheel in the bed, 4 in ahead of the rear axle, and a travel trailer. */
function fifthWheel(over: Record<string, Record<string, unknown> | undefined> = {}) {
  const base: Record<string, Record<string, unknown> | string> = {
    units: "imperial",
    vehicle: {
      towRating: 12000,
      towRatingBed: 14000,
      tongueWeightLimit: 1000,
      gvwr: 10000,
      curbWeight: 7000,
      gcwr: 24000,
      gawrFront: 5000,
      gawrRear: 6000,
      axleWeights: { front: 4200, rear: 3300 },
      wheelbase: 160,
      rearAxleToBedHitch: -4,
    },
    hitch: { bedGtwRating: 16000, bedPinRating: 4000, gtwRating: 5000, twRating: 500 },
    trailer: { type: "travel", hitchType: "fifth-wheel", grossTrailerWeight: 10000, tongueWeight: 2000, tongueWeightBasis: "measured", couplerRating: 16000, brakes: "electric" },
    load: { occupants: 300, cargo: 100, hitchHardware: 200 },
  };
  for (const [k, v] of Object.entries(over)) {
    if (v === undefined) delete base[k];
    else base[k] = { ...(base[k] as object), ...v };
  }
  return rig(base);
}

describe("fifth-wheel and gooseneck rigs", () => {
  it("a hitch point ahead of the rear axle adds load to the front and less than the pin weight to the rear", () => {
    const r = evaluateRig(fifthWheel());
    const axles = check<AxleLoadsResult>(r, "axle-loads");
    // Statics, moments about the rear axle with OH = −4 in (ahead), WB 160 in, pin weight P = 2,000 lb:
    //   front change = −P · OH / WB = −2,000 × (−4) / 160 = +50 lb (the front gains);
    //   rear change  = P · (WB + OH) / WB = 2,000 × 156 / 160 = 1,950 lb; the two add up to the 2,000 lb pin weight.
    expect(axles.frontChange!.value).toBeCloseTo(50, 9);
    expect(axles.rearChange!.value).toBeCloseTo(1950, 9);
    // Statics: hitched front 4,200 + 50 = 4,250 lb; rear 3,300 + 1,950 = 5,250 lb
    expect(axles.hitched!.front.value).toBeCloseTo(4250, 9);
    expect(axles.hitched!.rear.value).toBeCloseTo(5250, 9);
    expect(axles.cautions.join(" ")).toMatch(/carries 50 lb \(1\.2 %\) more than unhitched/);
    const front = check<FrontAxleLossResult>(r, "front-axle-loss");
    expect(front.status).toBe("within");
    // Statics: the "loss" is −50 lb, a gain
    expect(front.loss!.value).toBeCloseTo(-50, 9);
    expect(front.message).toBe("The front axle gains 50 lb: the hitch point sits ahead of the rear axle.");
  });

  it("a gooseneck straight over the axle puts the whole pin weight on the rear axle and nothing off the front", () => {
    // Statics: OH = 0: front change 0; rear change = P · WB / WB = 2,500 lb
    const r = evaluateRig(fifthWheel({ vehicle: { rearAxleToBedHitch: 0 }, trailer: { hitchType: "gooseneck", tongueWeight: 2500, ballRating: 30000 } }));
    const axles = check<AxleLoadsResult>(r, "axle-loads");
    expect(axles.frontChange!.value).toBeCloseTo(0, 9);
    expect(axles.rearChange!.value).toBeCloseTo(2500, 9);
    expect(check<FrontAxleLossResult>(r, "front-axle-loss").message).toBe("The front axle loses nothing: the hitch point sits over the rear axle.");
  });

  it("a gooseneck a little behind the axle lifts a little off the front", () => {
    // Statics: OH = 2 in, P = 2,500 lb, WB 160 in: L = 2,500 × 2 / 160 = 31.25 lb; 31.25 / 4,200 = 0.74 %
    const c = check<FrontAxleLossResult>(evaluateRig(fifthWheel({ vehicle: { rearAxleToBedHitch: 2 }, trailer: { hitchType: "gooseneck", tongueWeight: 2500 } })), "front-axle-loss");
    expect(c.loss!.value).toBeCloseTo(31.25, 9);
    expect(c.share!).toBeCloseTo(0.00744, 5);
    expect(c.status).toBe("within");
  });

  it("judges the pin weight against the 15–25 % band", () => {
    // Source: GM owner's manual (fifth-wheel and gooseneck: 15–25 %). 2,000 / 10,000 = 20 %, inside.
    const inside = check<TongueShareResult>(evaluateRig(fifthWheel()), "tongue-share");
    expect(inside.band).toEqual({ min: 0.15, max: 0.25, source: "hitch-type" });
    expect(inside.share).toBeCloseTo(0.2, 9);
    expect(inside.status).toBe("within");
    expect(inside.title).toBe("Pin-weight share");
    // 1,200 / 10,000 = 12 %: below the band, a load to move (adjust), never over.
    const low = check<TongueShareResult>(evaluateRig(fifthWheel({ trailer: { tongueWeight: 1200 } })), "tongue-share");
    expect(low.status).toBe("adjust");
    expect(low.message).toMatch(/^The pin carries 12 % of the trailer, below the 15 % to 25 % band/);
    // A vehicle band entered for a receiver (10–15 %) is not used for a fifth wheel.
    const vb = check<TongueShareResult>(evaluateRig(fifthWheel({ vehicle: { tongueShareBand: { min: 10, max: 15 } } })), "tongue-share");
    expect(vb.band.source).toBe("hitch-type");
  });

  it("counts the pin weight against the payload once", () => {
    // 49 CFR 567.4(g)(3): payload = GVWR − curb = 10,000 − 7,000 = 3,000 lb. GM (Cadillac) owner's manuals: the
    // tongue (pin) weight counts against payload. Not weighed: 300 occupants + 100 cargo + 2,000 pin + 200 hitch
    // = 2,600 lb.
    const p = check<CheckResult>(evaluateRig(fifthWheel({ vehicle: { axleWeights: undefined } })), "payload");
    expect(p.actual!.value).toBeCloseTo(2600, 9);
    expect(p.limit!.value).toBeCloseTo(3000, 9);
    expect(p.status).toBe("within");
    expect(p.steps.find((s) => s.id === "payload-used")!.inputs.find((i) => i.symbol === "TW")!.label).toBe("Pin weight");
    expect(p.cautions.join(" ")).toMatch(/comes out of the payload once/);
    // Weighed unhitched (4,200 + 3,300 = 7,500 lb, people, cargo and the hitch already aboard): + 2,000 pin =
    // 9,500 lb; payload used = 9,500 − (10,000 − 3,000) = 2,500 lb. The pin weight is added once, the rest not again.
    const weighed = check<CheckResult>(evaluateRig(fifthWheel()), "payload");
    expect(weighed.actual!.value).toBeCloseTo(2500, 9);
    // 2,900 lb of pin weight, weighed: 7,500 + 2,900 = 10,400 lb; used 3,400 of 3,000 lb: over by 400 lb.
    const over = check<CheckResult>(evaluateRig(fifthWheel({ trailer: { tongueWeight: 2900, grossTrailerWeight: 13000 } })), "payload");
    expect(over.status).toBe("over");
    expect(over.margin!.value).toBeCloseTo(-400, 9);
  });

  it("has no ball mount or weight-distribution check, and the receiver's ratings do not apply", () => {
    const r = evaluateRig(fifthWheel({ weightDistribution: { used: true }, ballMount: { drop: 4, length: 10 }, extender: { length: 6, twRating: 300 } }));
    expect(r.notApplicable).toEqual(expect.arrayContaining(["ball-mount", "weight-distribution", "accessory-fit"]));
    expect(r.checks.map((c) => c.id)).not.toContain("ball-mount");
    const wl = check<WeakestLinkResult>(r, "weakest-link");
    // The bed hitch's own ratings and the vehicle's figure for a bed hitch; the receiver's 5,000 / 500 lb, the
    // receiver tongue limit (1,000 lb, which the 2,000 lb pin weight would exceed) and the extender are not links.
    expect(wl.links.map((l) => l.id).sort()).toEqual(["hitch.bedGtwRating", "hitch.bedPinRating", "trailer.couplerRating", "vehicle.towRatingBed"]);
    expect(wl.status).toBe("within");
    expect(wl.cautions.join(" ")).toMatch(/do not apply to it, and their figures are not used/);
    expect(wl.cautions.join(" ")).toMatch(/jaws have closed round the kingpin/);
    // The extender adds nothing to the overhang: still −4 in, so the front still gains 50 lb (statics as above).
    expect(check<AxleLoadsResult>(r, "axle-loads").frontChange!.value).toBeCloseTo(50, 9);
    // No check is incomplete for a ball mount's, a receiver's or weight distribution's figures.
    const asked = r.checks.flatMap((c) => c.missing ?? []).map((m) => m.field);
    expect(asked.filter((f) => /^(ballMount|weightDistribution|extender)\.|^hitch\.(gtw|tw)Rating|receiver/.test(f))).toEqual([]);
  });

  it("asks for the bed hitch's ratings and position when they are missing", () => {
    const r = evaluateRig(fifthWheel({ hitch: { bedGtwRating: undefined, bedPinRating: undefined }, vehicle: { rearAxleToBedHitch: undefined } }));
    const wl = check<WeakestLinkResult>(r, "weakest-link");
    expect(wl.status).toBe("incomplete");
    expect(wl.missing!.map((m) => m.field)).toEqual(expect.arrayContaining(["hitch.bedGtwRating", "hitch.bedPinRating"]));
    expect(check<AxleLoadsResult>(r, "axle-loads").missing!.map((m) => m.field)).toContain("vehicle.rearAxleToBedHitch");
    expect(r.verdict.level).toBe("incomplete");
  });

  it("without a figure for a bed hitch, the vehicle's tow rating is used and said so", () => {
    const wl = check<WeakestLinkResult>(evaluateRig(fifthWheel({ vehicle: { towRatingBed: undefined } })), "weakest-link");
    expect(wl.links.find((l) => l.id === "vehicle.towRating")!.rating.value).toBe(12000);
    expect(wl.steps[0]!.note).toMatch(/may give another figure for a fifth wheel or gooseneck/);
  });

  it("refuses a bed hitch position at or past the front axle", () => {
    const bad = parseRig({ units: "imperial", vehicle: { wheelbase: 50, rearAxleToBedHitch: -55 }, trailer: { type: "travel", hitchType: "gooseneck" } });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.fieldErrors["vehicle.rearAxleToBedHitch"]![0]).toMatch(/reaches the front axle: check the figure and its sign/);
  });

  it("metric: a fifth wheel 100 mm ahead of the rear axle", () => {
    // Statics: OH = −100 mm, WB 4,000 mm, P = 900 kg: front change = −900 × (−100) / 4,000 = +22.5 kg;
    // rear change = 900 × 3,900 / 4,000 = 877.5 kg.
    const r = evaluateRig(
      rig({
        units: "metric",
        vehicle: { wheelbase: 4000, rearAxleToBedHitch: -100, axleWeights: { front: 1900, rear: 1500 } },
        hitch: { bedGtwRating: 7000, bedPinRating: 1800 },
        trailer: { type: "travel", hitchType: "fifth-wheel", grossTrailerWeight: 4500, tongueWeight: 900, tongueWeightBasis: "measured" },
      }),
    );
    const axles = check<AxleLoadsResult>(r, "axle-loads");
    expect(axles.frontChange!.unit).toBe("kg");
    expect(axles.frontChange!.value).toBeCloseTo(22.5, 9);
    expect(axles.rearChange!.value).toBeCloseTo(877.5, 9);
    // Source: GM owner's manual, 15–25 %: 900 / 4,500 = 20 %
    expect(check<TongueShareResult>(r, "tongue-share").share).toBeCloseTo(0.2, 9);
    expect(check<FrontAxleLossResult>(r, "front-axle-loss").message).toBe("The front axle gains 23 kg: the hitch point sits ahead of the rear axle.");
  });
});
