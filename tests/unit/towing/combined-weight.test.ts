import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig } from "@/lib/towing";
import { check, pickupRig } from "./helpers";

const cw = (r: ReturnType<typeof pickupRig>) => check(evaluateRig(r), "combined-weight");

describe("combined weight", () => {
  it("adds the loaded vehicle and the whole trailer", () => {
    const res = cw(pickupRig({ vehicle: { axleWeights: undefined } }));
    // Physics: combined weight = loaded vehicle (5,100 + 300 + 100 + 30) + trailer 4,000 = 9,530 lb
    expect(res.actual?.value).toBe(9530);
    expect(res.limit?.value).toBe(14000); // Source: GM (Cadillac) owner's manuals (must not exceed GCWR)
    expect(res.steps.at(-2)?.formula).toBe("W_veh + GTW");
  });

  it("never counts the tongue weight twice", () => {
    const a = cw(pickupRig());
    const b = cw(pickupRig({ trailer: { tongueWeight: 600 } }));
    // Physics: the tongue weight is already part of the trailer's weight
    expect(b.actual?.value).toBe(a.actual?.value);
    // Physics: weighed vehicle 3,000 + 2,500 plus trailer 4,000 = 9,500 lb
    expect(a.actual?.value).toBe(9500);
  });

  it("is over above GCWR", () => {
    const res = cw(pickupRig({ vehicle: { gcwr: 9000 } }));
    // Source: GM (Cadillac) owner's manuals: 9,500 lb > 9,000 lb GCWR
    expect(res.status).toBe("over");
    expect(res.margin?.value).toBe(-500);
  });

  it("is tight under 10 % of GCWR left", () => {
    // Common practice, no published source: 10 % tight threshold; 9,500 of 10,000 lb leaves 5 %
    expect(cw(pickupRig({ vehicle: { gcwr: 10000 } })).status).toBe("tight");
  });

  it("reminds of brake law for an unbraked heavy trailer", () => {
    const res = cw(pickupRig({ trailer: { brakes: "none", grossTrailerWeight: 3200, tongueWeight: 400 } }));
    // Source: California Vehicle Code 26302; Fla. Stat. 316.261; gov.uk (750 kg) — examples only, check local law
    expect(res.cautions.join(" ")).toMatch(/check local law/);
  });

  it("agrees in metric", () => {
    const met = cw(convertRig(pickupRig(), "metric"));
    // Physics: 9,500 lb × 0.45359237 kg/lb (the exact definition of the pound) = 4,309.127515 kg
    expect(met.actual?.value).toBeCloseTo(4309.127515, 6);
    expect(met.status).toBe("within");
  });

  it("needs the GCWR", () => {
    const res = cw(pickupRig({ vehicle: { gcwr: undefined } }));
    expect(res.status).toBe("incomplete");
    expect(res.missing?.[0]?.where).toMatch(/Owner's manual/);
  });
});
