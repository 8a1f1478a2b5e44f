import { describe, expect, it } from "vitest";
import { CORE_VERSION, evaluateRig, evaluateRigFast, GENERAL_CAUTIONS } from "@/lib/towing";
import { pickupRig } from "./helpers";

describe("verdict", () => {
  it("is within when every check passes with room", () => {
    const res = evaluateRig(pickupRig({ vehicle: { axleWeightsHitched: undefined } }));
    const v = res.verdict;
    expect(v.level).toBe("within");
    expect(v.complete).toBe(true);
    expect(v.incomplete).toEqual([]);
    expect(res.coreVersion).toBe(CORE_VERSION);
    expect(res.notApplicable).toEqual(["accessory-fit"]);
  });

  it("always carries the general cautions", () => {
    const v = evaluateRig(pickupRig()).verdict;
    expect(v.cautions).toEqual(GENERAL_CAUTIONS);
    const text = v.cautions.join(" ");
    expect(text).toMatch(/vehicle maker and the labels/);
    expect(text).toMatch(/lowest rating/);
    expect(text).toMatch(/Weigh the loaded rig/);
    expect(text).toMatch(/torque values/);
    expect(text).toMatch(/local law and a qualified installer have the last word/);
    expect(text).toMatch(/does the arithmetic/);
    expect(text).not.toMatch(/licensed installer/);
  });

  it("is tight when a margin is under 10 % of its limit", () => {
    // Common practice, no published source (the product's default): 10 % tight threshold; 4,300 of 4,500 lb leaves 4.4 %
    const v = evaluateRig(pickupRig({ trailer: { grossTrailerWeight: 4300, tongueWeight: 520 } })).verdict;
    expect(v.level).toBe("tight");
    expect(v.governing?.id).toBe("hitch.gtwRating");
    expect(v.actions.some((a) => a.checkId === "weakest-link")).toBe(true);
  });

  it("lets the organisation set the tight threshold", () => {
    // 4,000 of 4,500 lb leaves 11.1 %: within at 10 %, tight at 20 %
    const r = pickupRig();
    expect(evaluateRig(r).verdict.level).toBe("within");
    const strict = evaluateRig(r, { tightMarginRatio: 0.2 }).verdict;
    expect(strict.level).toBe("tight");
    expect(strict.tightMarginRatio).toBe(0.2);
  });

  it("is over when any check is over, and lists what to do first", () => {
    const v = evaluateRig(pickupRig({ trailer: { grossTrailerWeight: 4800, tongueWeight: 600 } })).verdict;
    expect(v.level).toBe("over");
    expect(v.actions[0]?.status).toBe("over");
    expect(v.message.startsWith("Over:")).toBe(true);
  });

  it("never reads within only because data is missing", () => {
    const v = evaluateRig(pickupRig({ vehicle: { gcwr: undefined } })).verdict;
    expect(v.levelFromCheckedOnly).toBe("within");
    expect(v.level).toBe("incomplete");
    expect(v.complete).toBe(false);
    expect(v.incomplete).toContain("combined-weight");
    expect(v.incomplete).toEqual(["combined-weight", "envelope"]);
    expect(v.message).toMatch(/^Not confirmed: .*2 checks still lack data/);
  });

  it("evaluateRigFast agrees with the full evaluation", () => {
    const r = pickupRig({ trailer: { grossTrailerWeight: 4300, tongueWeight: 520 } });
    const full = evaluateRig(r);
    const fast = evaluateRigFast(r);
    expect(fast.level).toBe(full.verdict.level);
    expect(fast.checks.map((c) => [c.id, c.status])).toEqual(full.checks.map((c) => [c.id, c.status]));
    expect(fast.governing).toEqual(full.verdict.governing);
  });
});

describe("the headline and the governing line agree", () => {
  it("speaks of the check that governs when several are tight", () => {
    // Common practice, no published source: the 10 % tight threshold. Invented figures. The hitch's rating
    // leaves 300 of 4,500 lb (6.7 %). Statics: the rear axle carries 2,500 + 500 × (145 + 50) / 145 = 3,172.4 lb
    // of its 3,350 lb GAWR, 5.3 % left: the rear axle governs, and the headline speaks of it, not of the hitch.
    const result = evaluateRig(pickupRig({ trailer: { grossTrailerWeight: 4200 }, vehicle: { gawrRear: 3350 } }));
    expect(result.verdict.level).toBe("tight");
    expect(result.checks.find((c) => c.id === "weakest-link")!.status).toBe("tight");
    const governing = result.verdict.governing!;
    expect(governing.checkId).toBe("axle-loads");
    expect(governing.id).toBe("vehicle.gawrRear");
    const governs = result.checks.find((c) => c.id === "axle-loads")!;
    expect(governs.margin!.value).toBeCloseTo(177.6, 1);
    const first = governs.message.charAt(0).toLowerCase() + governs.message.slice(1);
    expect(result.verdict.message).toBe(`Tight: ${first}`);
  });
});
