/**
 * Advice a person could act on and get hurt by: for each rule, the case that used to produce the unsafe
 * sentence, and the check that it no longer appears (with what is said instead). The rigs are invented; the
 * figures beside each case are worked by hand.
 */
import { describe, expect, it } from "vitest";
import { evaluateRig, type AnyCheckResult, type RigResult } from "@/lib/towing";
import { LIBRARY } from "@/lib/training/library";
import { check, pickupRig, rig } from "./helpers";

function allAdvice(result: RigResult): string[] {
  return [...result.checks.flatMap((c) => c.advice), ...result.verdict.actions.flatMap((a) => a.advice)];
}
function texts(c: AnyCheckResult): string {
  return [c.message, ...c.advice, ...c.cautions, ...c.steps.map((s) => `${s.title} ${s.note ?? ""}`)].join("\n");
}

describe("a vehicle's own rating cannot be bought past", () => {
  // Vehicle tow rating 4,000 lb, trailer 4,400 lb: 400 lb over. Every part is rated 6,000 lb or more.
  const r = evaluateRig(
    pickupRig({ vehicle: { towRating: 4000 }, hitch: { gtwRating: 8000, twRating: 800 }, trailer: { grossTrailerWeight: 4400, tongueWeight: 500 } }),
  );

  it("gives no 'fit a part' advice for a vehicle rating", () => {
    const weakest = check(r, "weakest-link");
    expect(weakest.status).toBe("over");
    const advice = weakest.advice.join("\n");
    expect(advice).not.toMatch(/Vehicle tow rating is exceeded: (lighten the trailer or )?fit a part/);
    expect(advice).toMatch(/no part can raise the vehicle's own rating/);
    expect(advice).toMatch(/lighter trailer or use a vehicle rated for at least 4,400 lb/);
  });

  it("gives no 'fit a part' advice for the vehicle's tongue-weight limit either", () => {
    // Tongue-weight limit 450 lb, tongue 500 lb: 50 lb over
    const t = evaluateRig(pickupRig({ vehicle: { tongueWeightLimit: 450 }, hitch: { gtwRating: 8000, twRating: 800 } }));
    const advice = check(t, "weakest-link").advice.join("\n");
    expect(advice).not.toMatch(/Vehicle tongue-weight limit is exceeded: .*fit a part/);
    expect(advice).toMatch(/keeping the tongue share inside its band/);
  });

  it("still advises a stronger part when a part is what is exceeded", () => {
    // Ball rated 3,500 lb under a 4,400 lb trailer (the vehicle's own 7,000 lb holds)
    const b = evaluateRig(pickupRig({ trailer: { grossTrailerWeight: 4400, tongueWeight: 500, ballRating: 3500 }, hitch: { gtwRating: 8000, twRating: 800 } }));
    expect(check(b, "weakest-link").advice.join("\n")).toMatch(/Ball rating is exceeded: fit a part rated for at least 4,400 lb/);
  });
});

describe("weight distribution is advised only when its own ratings hold", () => {
  const wdVehicle = { towRating: 5000, towRatingWd: 6000, tongueWeightLimit: 500, tongueWeightLimitWd: 700 };
  const strongHitch = { gtwRating: 6000, twRating: 600, gtwRatingWd: 10000, twRatingWd: 1000 };

  it("an over-the-WD-ratings rig gets no 'fit weight distribution'", () => {
    // 6,500 lb over the 6,000 lb tow rating with WD; 800 lb over the 700 lb tongue limit with WD
    const r = evaluateRig(pickupRig({ vehicle: wdVehicle, hitch: strongHitch, trailer: { grossTrailerWeight: 6500, tongueWeight: 800, ballRating: 10000, couplerRating: 10000, safetyChainRating: 10000 } }));
    const advice = allAdvice(r).join("\n");
    expect(advice).not.toMatch(/Fit weight distribution|use weight distribution|worth fitting/i);
    expect(check(r, "weight-distribution").advice.join("\n")).toMatch(/will not do it.*lighter trailer or another vehicle/);
  });

  it("advises it, with what it does not change, when the ratings with it hold", () => {
    // 5,500 lb is over the 5,000 lb weight-carrying tow rating but within the 6,000 lb with WD; 650 lb within 700 lb
    const r = evaluateRig(pickupRig({ vehicle: wdVehicle, hitch: strongHitch, trailer: { grossTrailerWeight: 5500, tongueWeight: 650, ballRating: 10000, couplerRating: 10000, safetyChainRating: 10000 } }));
    const advice = check(r, "weight-distribution").advice.join("\n");
    expect(advice).toMatch(/Fit weight distribution rated for this tongue weight/);
    expect(advice).toMatch(/raises no GCWR, GVWR or payload limit and takes no load off the ball/);
  });

  it("says it may help only if the ratings with it cover the trailer, when they are not entered", () => {
    const r = evaluateRig(pickupRig({ vehicle: { towRating: 5000, tongueWeightLimit: 500 }, hitch: strongHitch, trailer: { grossTrailerWeight: 5500, tongueWeight: 650, ballRating: 10000, couplerRating: 10000, safetyChainRating: 10000 } }));
    const advice = check(r, "weight-distribution").advice.join("\n");
    expect(advice).toMatch(/may help only if the vehicle's and the hitch's ratings with weight distribution/);
    expect(advice).not.toMatch(/^Fit weight distribution/m);
  });

  it("an overloaded rear axle gets no 'use weight distribution' when the WD ratings are exceeded", () => {
    // Rear axle hitched: 2,500 + 800 × (145 + 50) ÷ 145 = 3,575.9 lb, over a 3,300 lb rear GAWR (statics)
    const r = evaluateRig(pickupRig({ vehicle: { ...wdVehicle, gawrRear: 3300 }, hitch: strongHitch, trailer: { grossTrailerWeight: 6500, tongueWeight: 800, ballRating: 10000, couplerRating: 10000, safetyChainRating: 10000 } }));
    const axles = check(r, "axle-loads");
    expect(axles.status).toBe("over");
    expect(axles.advice.join("\n")).not.toMatch(/weight distribution/i);
  });
});

describe("the envelope states its figure at the trailer's own share", () => {
  it("works the tongue limit at the trailer's share, not at the lowest share where sway starts", () => {
    // Tongue limit 675 lb (hitch); trailer 4,000 lb with 500 lb = 12.5 %. Gross limits: ball, coupler, chains 6,000 lb.
    // At 12.5 %: 675 ÷ 0.125 = 5,400 lb. At the band's lowest 10 % it would read 6,000 lb (min(6,000, 6,750)).
    const r = evaluateRig(pickupRig({ hitch: { gtwRating: 8000, gtwRatingWd: 8000 } }));
    const env = check(r, "envelope");
    expect(env.message).toContain("5,400 lb");
    expect(env.message).toContain("12.5 %");
    expect(env.message).not.toMatch(/up to 6,000 lb/);
  });

  it("uses the middle of the band when no trailer is given", () => {
    // The Marrowbys' truck: tongue limit 800 lb, band 10–15 % (GM and Nissan owner's manuals), middle 12.5 %: 800 ÷ 0.125 = 6,400 lb
    const env = check(evaluateRig(LIBRARY.find((e) => e.slug === "how-heavy-a-trailer")!.rig), "envelope");
    expect(env.message).toContain("6,400 lb");
    expect(env.message).not.toMatch(/up to 7,550 lb with up to 800 lb/);
  });
});

describe("lightening the hitch load never means moving load rearward", () => {
  it("payload over: take weight out, keeping the tongue share inside its band", () => {
    // Payload 7,000 − 5,100 = 1,900 lb; carried 300 + 1,200 + 500 + 30 = 2,030 lb: 130 lb over (49 CFR 567.4(g)(3))
    const r = evaluateRig(pickupRig({ vehicle: { axleWeights: undefined }, load: { cargo: 1200 } }));
    const payload = check(r, "payload");
    expect(payload.status).toBe("over");
    const advice = payload.advice.join("\n");
    expect(advice).not.toMatch(/lighten what rides on the hitch|lighten the tongue/i);
    expect(advice).toMatch(/keeping the tongue share inside its band/);
  });

  it("rear axle over: no 'lighten the tongue'", () => {
    // Rear axle hitched: 2,500 + 500 × 195 ÷ 145 = 3,172.4 lb, over a 3,100 lb rear GAWR (statics)
    const axles = check(evaluateRig(pickupRig({ vehicle: { gawrRear: 3100 } })), "axle-loads");
    expect(axles.status).toBe("over");
    expect(axles.advice.join("\n")).not.toMatch(/lighten the tongue/i);
    expect(axles.advice.join("\n")).toMatch(/keeping the tongue share inside its band/);
  });
});

describe("brake cautions", () => {
  const brakeText = (r: RigResult) => r.checks.flatMap((c) => c.cautions).filter((t) => /brakes/.test(t)).join("\n");

  it("fire when the brakes are not entered, above the lowest common threshold, naming the controller and the breakaway", () => {
    // 4,000 lb is above 750 kg = 1,653.5 lb (Source: gov.uk, trailers over 750 kg must have brakes)
    const text = brakeText(evaluateRig(pickupRig({ trailer: { brakes: undefined } })));
    expect(text).toMatch(/brakes were not entered/);
    expect(text).toMatch(/brake controller/);
    expect(text).toMatch(/breakaway/);
  });

  it("fire when the trailer has none", () => {
    const text = brakeText(evaluateRig(pickupRig({ trailer: { brakes: "none" } })));
    expect(text).toMatch(/no brakes/);
    expect(text).toMatch(/breakaway/);
  });

  it("stay quiet for a light trailer", () => {
    // 1,000 lb (about 454 kg) is under the lowest cited threshold, 750 kg (gov.uk)
    const r = evaluateRig(pickupRig({ trailer: { grossTrailerWeight: 1000, tongueWeight: 120, brakes: undefined } }));
    expect(brakeText(r)).not.toMatch(/not entered|no brakes/);
  });
});

describe("hands-on cautions where their step is shown (common practice, no published source)", () => {
  it("spring bars: use the handle, keep hands clear", () => {
    const r = evaluateRig(pickupRig({ weightDistribution: { used: true, fenderUnhitched: 36, fenderHitched: 37.2, fenderWithWd: 36.6 } }));
    expect(check(r, "weight-distribution").cautions.join("\n")).toMatch(/handle.*hands/);
  });

  it("chock the trailer when measuring with jack and beam", () => {
    const r = evaluateRig(pickupRig({ trailer: { tongueWeight: undefined, tongueMeasurement: { scaleReading: 180, blockToJack: 12, jackToScale: 24 } } }));
    expect(check(r, "tongue-measure").cautions.join("\n")).toMatch(/Chock the trailer's wheels/);
  });

  it("coupler latch pinned, breakaway cable attached, lights tested, recheck after the first miles", () => {
    const cautions = check(evaluateRig(pickupRig()), "weakest-link").cautions.join("\n");
    expect(cautions).toMatch(/latch.*pin/);
    expect(cautions).toMatch(/breakaway cable/);
    expect(cautions).toMatch(/lights/);
    expect(cautions).toMatch(/first few miles/);
  });

  it("a rise is never advised without its caution on the rack's rating and the lights", () => {
    const rack = LIBRARY.find((e) => e.slug === "rack-that-scrapes")!.rig;
    const fit = check(evaluateRig(rack), "accessory-fit");
    // Geometry: 30 × tan 21° − 10 = 1.52 in of extra rise is advised
    expect(fit.advice.join("\n")).toMatch(/shank rise/);
    expect(fit.advice.join("\n")).toMatch(/lowers the rack maker's rating and can hide the lights or the number plate/);
  });
});

describe("words that read wrong", () => {
  it("a share above the band risks overloading the rear axle; it does not say it is overloaded", () => {
    // 700 lb on 4,000 lb = 17.5 %, above the 10–15 % band (GM and Nissan owner's manuals)
    const share = check(evaluateRig(pickupRig({ trailer: { tongueWeight: 700 } })), "tongue-share");
    expect(share.message).not.toMatch(/the rear axle is overloaded/);
    expect(share.message).toMatch(/risks overloading the rear axle.*; check the axle loads/);
  });

  it("spring bars are adjusted as the weight-distribution maker's instructions say, not 'tightened'", () => {
    // Restoration (37.2 − 37.0) ÷ (37.2 − 36) = 16.7 %, under the 50 % target (Ram owner's manuals, citing SAE J2807)
    const wd = check(evaluateRig(pickupRig({ weightDistribution: { used: true, fenderUnhitched: 36, fenderHitched: 37.2, fenderWithWd: 37.0 } })), "weight-distribution");
    expect(wd.advice.join("\n")).not.toMatch(/Tighten the spring bars/);
    expect(wd.advice.join("\n")).toMatch(/as the weight-distribution maker's instructions say/);
  });

  it("off level says nose-up or nose-down", () => {
    // Needed drop 26 − 20 = 6 in (geometry): a 3 in drop leaves the ball 3 in high (nose-up), a 9 in drop 3 in low (nose-down)
    expect(check(evaluateRig(pickupRig({ ballMount: { drop: 3 } })), "ball-mount").message).toMatch(/nose-up/);
    expect(check(evaluateRig(pickupRig({ ballMount: { drop: 9 } })), "ball-mount").message).toMatch(/nose-down/);
  });

  it("GCWR caps everything: no 'assumes only a driver'", () => {
    const cautions = check(evaluateRig(pickupRig()), "combined-weight").cautions.join("\n");
    expect(cautions).not.toMatch(/assumes .*driver/);
    expect(cautions).toMatch(/everyone and everything in it/);
  });

  it("a hitch class is a ceiling; the label gives the rating", () => {
    // Class 3 ≤ 5,000 lb (New York 15 NYCRR 57.3(c), adopting SAE J684); trailer 5,400 lb
    const weakest = check(evaluateRig(pickupRig({ trailer: { grossTrailerWeight: 5400, tongueWeight: 650 } })), "weakest-link");
    expect(weakest.cautions.join("\n")).toMatch(/ceiling/);
  });

  it("the front axle is lightened, not lifted, and one word for rise", () => {
    const axles = check(evaluateRig(pickupRig()), "axle-loads");
    expect(texts(axles)).not.toMatch(/lifted|lifts the front/);
    const low = rig({
      units: "imperial",
      vehicle: { tongueWeightLimit: 200, rearAxleToPin: 22, departureAngle: 21 },
      hitch: { twRating: 200, receiverHeight: 11, pinToFascia: 6 },
      accessory: { type: "cargo-carrier", weight: 40, loadWeight: 60, loadCenterFromPin: 12, lowestPointBelowShankTop: 3, lowestPointBehindPin: 8 },
    });
    const fit = check(evaluateRig(low), "accessory-fit");
    expect(texts(fit)).not.toMatch(/raised shank/);
    expect(fit.advice.join("\n")).toMatch(/shank rise/);
  });
});
