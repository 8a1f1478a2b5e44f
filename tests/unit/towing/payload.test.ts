import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig } from "@/lib/towing";
import { check, pickupRig } from "./helpers";

const noScale = { axleWeights: undefined };
const pl = (r: ReturnType<typeof pickupRig>) => check(evaluateRig(r), "payload");

describe("payload", () => {
  it("capacity is GVWR minus curb weight", () => {
    const res = pl(pickupRig({ vehicle: noScale }));
    // Source: 49 CFR 567.4(g)(3); NHTSA interpretation letters: 7,000 − 5,100 = 1,900 lb
    expect(res.limit?.value).toBe(1900);
    // Source: GM (Cadillac) owner's manuals (tongue weight counts against payload): 300 + 100 + 500 + 30 = 930 lb
    expect(res.actual?.value).toBe(930);
    expect(res.margin?.value).toBe(970);
    expect(res.status).toBe("within");
    expect(res.steps.find((s) => s.id === "payload-capacity")?.formula).toBe("GVWR - W_curb");
  });

  it("goes by the label's payload when it is lower", () => {
    const res = pl(pickupRig({ vehicle: { axleWeights: undefined, payloadLabel: 1500 } }));
    // Common practice, no published source: go by the lowest figure
    expect(res.limit?.value).toBe(1500);
    expect(res.governing?.id).toBe("vehicle.payloadLabel");
  });

  it("counts five occupants at 150 lb each", () => {
    const res = pl(pickupRig({ vehicle: noScale, load: { occupants: 5 * 150, cargo: 0, hitchHardware: 0 } }));
    // Source: 49 CFR 567.4(g)(3): the GVWR covers 150 lb per designated seat; 750 + 500 = 1,250 lb
    expect(res.actual?.value).toBe(1250);
  });

  it("every pound of tongue weight comes out of the payload", () => {
    const a = pl(pickupRig({ vehicle: noScale }));
    const b = pl(pickupRig({ vehicle: noScale, trailer: { tongueWeight: 600 } }));
    // Source: GM (Cadillac) owner's manuals: tongue weight counts against payload (100 lb more, 100 lb less margin)
    expect(a.margin!.value - b.margin!.value).toBeCloseTo(100, 9);
  });

  it("is over when the vehicle carries more than its payload", () => {
    const res = pl(pickupRig({ vehicle: noScale, load: { cargo: 1200 } }));
    // Source: 49 CFR 567.4(g)(3): 300 + 1,200 + 500 + 30 = 2,030 lb > 1,900 lb
    expect(res.status).toBe("over");
    expect(res.margin?.value).toBe(-130);
    expect(res.advice[0]).toContain("130 lb");
  });

  it("uses the scale when the vehicle was weighed", () => {
    const res = pl(pickupRig());
    // Source: GM (Cadillac) owner's manuals (tongue weight counts against GVWR): 3,000 + 2,500 + 500 = 6,000 lb weighed
    expect(res.steps.find((s) => s.id === "gross-vehicle-weight")?.result.value).toBe(6000);
    // Source: 49 CFR 567.4(g)(3): payload = GVWR − curb = 7,000 − 5,100 = 1,900 lb; used as weighed 6,000 − 5,100 = 900 lb
    expect(res.limit?.value).toBe(1900);
    expect(res.actual?.value).toBe(900);
    // Physics: the room left is the same either way, GVWR − weighed GVW = 1,000 lb
    expect(res.margin?.value).toBe(1000);
  });

  it("compares a weighed vehicle with the GVWR itself when no payload capacity is known", () => {
    const res = pl(pickupRig({ vehicle: { curbWeight: undefined } }));
    // Source: GM (Cadillac) owner's manuals (tongue weight counts against GVWR): 6,000 lb weighed against 7,000 lb
    expect(res.actual?.value).toBe(6000);
    expect(res.limit?.value).toBe(7000);
  });

  it("does not guess missing occupants", () => {
    const res = pl(pickupRig({ vehicle: noScale, load: { occupants: undefined } }));
    expect(res.status).toBe("incomplete");
    expect(res.missing?.map((m) => m.field)).toContain("load.occupants");
  });

  it("agrees in metric", () => {
    const r = pickupRig({ vehicle: noScale });
    const met = pl(convertRig(r, "metric"));
    // Source: 49 CFR 567.4(g)(3): 1,900 lb × 0.45359237 kg/lb (the exact definition of the pound) = 861.825503 kg
    expect(met.limit?.value).toBeCloseTo(861.825503, 6);
    expect(met.limit?.unit).toBe("kg");
    expect(met.status).toBe("within");
  });
});
