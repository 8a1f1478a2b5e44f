import { describe, expect, it } from "vitest";
import { evaluateRig, type AccessoryFitResult, type RigInput } from "@/lib/towing";
import { ownAdvice, stillToMeasure } from "@/lib/still-to-measure";
import { check, rig } from "./helpers";

/** An invented hatchback with a platform rack, most figures left out. */
function bareRack(accessory: object = {}): RigInput {
  return rig({
    units: "imperial",
    vehicle: { gvwr: 4500 },
    hitch: { class: 2, twRating: 350 },
    accessory: { type: "platform-rack", weight: 50, loadWeight: 60, ...accessory },
  });
}

describe("one list of the figures still to measure", () => {
  it("names each missing figure once, with every check that waits for it", () => {
    const result = evaluateRig(bareRack());
    const list = stillToMeasure(result.checks);
    const fields = list.map((m) => m.field);
    expect(new Set(fields).size).toBe(fields.length);
    // The load's distance from the pin is wanted by the axle loads and by the fit.
    const distance = list.find((m) => m.field === "accessory.loadCenterFromPin")!;
    expect(distance.checks).toEqual(expect.arrayContaining(["axle-loads", "accessory-fit"]));
    // Every figure any check lists is on the one list.
    for (const c of result.checks) for (const m of c.missing ?? []) expect(fields).toContain(m.field);
  });

  it("orders the list as a person gathers figures: the vehicle's papers before the hitch, the hitch before the rack", () => {
    const fields = stillToMeasure(evaluateRig(bareRack()).checks).map((m) => m.field);
    const at = (f: string) => fields.indexOf(f);
    expect(at("vehicle.tongueWeightLimit")).toBeGreaterThanOrEqual(0);
    expect(at("vehicle.tongueWeightLimit")).toBeLessThan(at("hitch.pinToFascia"));
    expect(at("hitch.pinToFascia")).toBeLessThan(at("accessory.loadCenterFromPin"));
  });

  it("leaves in each check's advice only what is not a missing figure", () => {
    for (const c of evaluateRig(bareRack()).checks) {
      const restated = new Set((c.missing ?? []).map((m) => `${m.what}: ${m.where}.`));
      for (const line of ownAdvice(c)) expect(restated.has(line)).toBe(false);
    }
  });
});

describe("a rack's load on the receiver with its distance unknown", () => {
  it("is checked against the ratings it has and says what it still needs", () => {
    const fit = check<AccessoryFitResult>(evaluateRig(bareRack()), "accessory-fit");
    const load = fit.parts.find((p) => p.id === "load")!;
    // Common practice, no published source: the lever effect needs the load's distance; the rating comparison does not.
    expect(load.actual?.value).toBe(110); // 50 lb rack + 60 lb of bikes
    expect(load.limit?.value).toBe(350); // the hitch's tongue rating, the only one entered
    expect(load.status).toBe("incomplete");
    expect(load.waitingFor).toMatch(/distance from the pin hole to the load's centre/);
  });

  it("reads over on the rating alone when the load already exceeds it", () => {
    const fit = check<AccessoryFitResult>(evaluateRig(bareRack({ weight: 90, loadWeight: 300 })), "accessory-fit");
    // 90 + 300 = 390 lb against a 350 lb rating: over whatever the lever effect.
    expect(fit.parts.find((p) => p.id === "load")!.status).toBe("over");
    expect(fit.status).toBe("over");
  });
});
