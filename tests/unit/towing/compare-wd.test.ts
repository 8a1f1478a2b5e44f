import { describe, expect, it } from "vitest";
import { compareWeightDistribution } from "@/lib/towing";
import { pickupRig, rig } from "./helpers";

/**
 * A class 2 hitch labelled 300 lb tongue weight-carrying and 500 lb weight-distributing, and a trailer with
 * 400 lb on its tongue. Source: the class 2 figures, 300 / 500 lb, follow the table attributed to SAE J684
 * (REFERENCES.md, hitch classes); the trailer is invented.
 */
function classTwoRig(used: boolean) {
  return pickupRig({
    vehicle: { towRatingWd: 7000, tongueWeightLimitWd: 700 },
    hitch: { class: 2, receiverSize: "1-1/4", gtwRating: 3500, twRating: 300, gtwRatingWd: 3500, twRatingWd: 500 },
    trailer: { grossTrailerWeight: 3000, tongueWeight: 400 },
    weightDistribution: { used, tongueRating: 600 },
  });
}

describe("the rig read without and with weight distribution", () => {
  it("exceeds the weight-carrying tongue rating without it and not with it", () => {
    const both = compareWeightDistribution(classTwoRig(false))!;
    // 400 lb on a 300 lb weight-carrying rating: over. On the 500 lb weight-distributing rating: 100 lb to spare.
    expect(both.without.level).toBe("over");
    expect(both.without.over).toContain("weakest-link");
    expect(both.with.over).not.toContain("weakest-link");
    expect(both.with.level).not.toBe("over");
  });

  it("marks the side that is the set-up entered, whichever it is", () => {
    const off = compareWeightDistribution(classTwoRig(false))!;
    expect([off.without.asEntered, off.with.asEntered]).toEqual([true, false]);
    const on = compareWeightDistribution(classTwoRig(true))!;
    expect([on.without.asEntered, on.with.asEntered]).toEqual([false, true]);
    // The same two readings whichever way the rig was entered.
    expect(on.without.level).toBe(off.without.level);
    expect(on.with.level).toBe(off.with.level);
  });

  it("names the limit that governs each side", () => {
    const both = compareWeightDistribution(classTwoRig(false))!;
    expect(both.without.governing?.id).toBe("hitch.twRating");
    expect(both.with.governing?.id).not.toBe("hitch.twRating");
  });

  it("has nothing to compare for a rack, which weight distribution does not apply to", () => {
    const rack = rig({ units: "imperial", vehicle: { gvwr: 4500 }, hitch: { class: 2, twRating: 350 }, accessory: { type: "platform-rack", weight: 50, loadWeight: 60 } });
    expect(compareWeightDistribution(rack)).toBeNull();
  });
});

describe("a bed hitch", () => {
  it("has no weight-distribution comparison: the pin sits over the axle", () => {
    const fifth = pickupRig({ trailer: { hitchType: "fifth-wheel" }, vehicle: { rearAxleToBedHitch: -2 } });
    expect(compareWeightDistribution(fifth)).toBeNull();
  });
});
