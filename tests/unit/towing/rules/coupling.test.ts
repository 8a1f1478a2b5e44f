/** Coupling and matching in Great Britain and the EU: D value, S value, the caravan guidelines; Australia's towball limit. */
import { describe, expect, it } from "vitest";
import { dValue } from "@/lib/towing";
import { parse } from "mathjs";
import { finding, lb, local, run, trailerRig } from "./support";

const GB = { country: "GB", region: "SCT" };

describe("D value, UN Regulation No. 55", () => {
  it("D = g · T · R / (T + R): T 2.0 t, R 1.5 t → 8.41 kN", () => {
    // Source: UN Regulation No. 55. By hand: 9.81 × 2.0 × 1.5 / (2.0 + 1.5) = 29.43 / 3.5 = 8.408571… kN.
    expect(dValue(2.0, 1.5)).toBeCloseTo(8.408571, 5);
  });
  it("T 3.5 t, R 3.5 t → 17.17 kN", () => {
    // Statics from the same formula: 9.81 × 3.5 × 3.5 / 7.0 = 17.1675 kN.
    expect(dValue(3.5, 3.5)).toBeCloseTo(17.1675, 6);
  });
  const rig = (units: "metric" | "imperial", marked: number) =>
    units === "metric"
      ? trailerRig("metric", { grossTrailerWeight: 1200, mam: 1500, brakes: "surge" }, { vehicle: { gvwr: 2000 }, hitch: { dValue: marked } })
      : trailerRig("imperial", { grossTrailerWeight: lb(1200), mam: lb(1500), brakes: "surge" }, { vehicle: { gvwr: lb(2000) }, hitch: { dValue: marked } });
  for (const units of ["metric", "imperial"] as const) {
    it(`${units}: a coupling marked 8.0 kN is over the 8.41 kN needed; 10 kN is within`, () => {
      // Source: UN Regulation No. 55 (worked example above, 8.41 kN).
      const over = finding(run(rig(units, 8), GB), "gb.coupling-d");
      expect(over.status).toBe("over");
      expect(over.actual?.value).toBeCloseTo(8.408571, 5);
      expect(over.actual?.unit).toBe("kN");
      expect(finding(run(rig(units, 10), GB), "gb.coupling-d").status).toBe("within");
    });
  }
  it("the lower of the tow bar's and the coupling head's marks governs", () => {
    const r = trailerRig("metric", { grossTrailerWeight: 1200, mam: 1500, brakes: "surge", couplingDValue: 8 }, { vehicle: { gvwr: 2000 }, hitch: { dValue: 12 } });
    expect(finding(run(r, GB), "gb.coupling-d").status).toBe("over");
  });
  it("with no mark: incomplete, naming the D value to look for", () => {
    const r = trailerRig("metric", { grossTrailerWeight: 1200, mam: 1500, brakes: "surge" }, { vehicle: { gvwr: 2000 } });
    const f = finding(run(r, GB), "gb.coupling-d");
    expect(f.status).toBe("incomplete");
    expect(f.message).toContain("8.41 kN");
  });
  it("its step's formula parses and names its inputs", () => {
    const r = run(rig("metric", 10), GB);
    const step = local(r).steps.find((s) => s.id === "d-value-gb.coupling-d")!;
    expect(step.formula).toBe("g * T * R / (T + R)");
    const node = parse(step.formula);
    expect(node.evaluate({ g: 9.81, T: 2, R: 1.5 })).toBeCloseTo(8.408571, 5);
  });
});

describe("Tow ball S value against the noseweight", () => {
  // Source: the S value is the maximum static vertical load in kg stamped on the tow ball (REFERENCES: M).
  const r = (tw: number) => trailerRig("metric", { grossTrailerWeight: 1200, tongueWeight: tw, brakes: "surge" }, { hitch: { sValue: 75 } });
  it("50 kg within, 75 kg at the mark tight, 76 kg over", () => {
    expect(finding(run(r(50), GB), "gb.ball-s").status).toBe("within");
    expect(finding(run(r(75), GB), "gb.ball-s").status).toBe("tight");
    expect(finding(run(r(76), GB), "gb.ball-s").status).toBe("over");
  });
});

describe("Caravan to car: 85 %, never over 100 % (a guideline)", () => {
  // Source: The Caravan Club leaflet (2008); National Caravan Council towing guide.
  const r = (caravan: number) => trailerRig("metric", { type: "travel", grossTrailerWeight: caravan, tongueWeight: caravan * 0.06, brakes: "surge" }, { vehicle: { curbWeight: 1500 } });
  it("1,200 kg behind a 1,500 kg car (80 %) is within", () => {
    const f = finding(run(r(1200), GB), "gb.caravan-match");
    expect(f.kind).toBe("guideline");
    expect(f.status).toBe("within");
    expect(f.actual?.value).toBeCloseTo(80, 9);
  });
  it("1,350 kg (90 %) is tight, not over", () => {
    expect(finding(run(r(1350), GB), "gb.caravan-match").status).toBe("tight");
  });
  it("1,600 kg (106.7 %) is a caution, still never over on its own", () => {
    const f = finding(run(r(1600), GB), "gb.caravan-match");
    expect(f.status).toBe("tight");
    expect(f.caution).toBe(true);
  });
});

describe("Caravan noseweight 5–7 % in place of 10–15 %", () => {
  // Source: The Caravan Club leaflet (2008); National Caravan Council: 5–7 % of the caravan's actual laden weight.
  const caravan = (tw: number) => trailerRig("metric", { type: "travel", grossTrailerWeight: 1200, tongueWeight: tw, brakes: "surge" });
  it("72 kg on a 1,200 kg caravan (6 %) is inside the band in Great Britain", () => {
    const res = run(caravan(72), GB);
    expect(finding(res, "gb.noseweight-band").status).toBe("within");
    const share = res.checks.find((c) => c.id === "tongue-share") as { band: { min: number; max: number; source: string }; status: string };
    expect(share.band).toEqual({ min: 0.05, max: 0.07, source: "place" });
    expect(share.status).toBe("within");
  });
  it("48 kg (4 %) is outside: the guideline reads tight, the load reads as a set-up to adjust, never over", () => {
    const res = run(caravan(48), GB);
    expect(finding(res, "gb.noseweight-band").status).toBe("tight");
    expect(res.checks.find((c) => c.id === "tongue-share")!.status).toBe("adjust");
  });
  it("where the place does not use it, the 10–15 % band stands: 6 % reads as a set-up to adjust in Texas", () => {
    // Source: GM and Nissan owner's manuals (conventional trailers 10–15 %).
    const res = run(caravan(72), { country: "US", region: "TX" });
    expect(res.checks.find((c) => c.id === "tongue-share")!.status).toBe("adjust");
  });
});

describe("Australia: the vehicle maker's towball limit", () => {
  // Source: the vehicle maker's towball rating governs; about 10 % is common advice, not law.
  const r = (tw: number) => trailerRig("metric", { grossTrailerWeight: 1500, tongueWeight: tw, brakes: "electric" }, { vehicle: { tongueWeightLimit: 150 } });
  it("120 kg within a 150 kg limit; 160 kg over", () => {
    expect(finding(run(r(120), { country: "AU" }), "au.towball-limit").status).toBe("within");
    expect(finding(run(r(160), { country: "AU" }), "au.towball-limit").status).toBe("over");
  });
});

describe("Great Britain: gross train weight and the trailer's MAM", () => {
  // Source: gov.uk "Towing with a car": neither the car's gross train weight nor the trailer's MAM may be exceeded.
  const r = (trailer: number, plate: number) =>
    trailerRig("metric", { grossTrailerWeight: trailer, mam: plate, brakes: "surge" }, { vehicle: { gcwr: 3500, axleWeights: { front: 1000, rear: 900 } } });
  it("1,900 kg car + 1,400 kg trailer = 3,300 kg of 3,500 kg: not over; + 1,700 kg = 3,600 kg: over", () => {
    // Statics: 1,000 + 900 = 1,900 kg loaded car.
    expect(finding(run(r(1400, 1500), GB), "gb.train-weight").status).not.toBe("over");
    expect(finding(run(r(1700, 1800), GB), "gb.train-weight").status).toBe("over");
  });
  it("a 1,400 kg trailer plated 1,500 kg is within; plated 1,300 kg it is over", () => {
    expect(finding(run(r(1400, 1800), GB), "gb.trailer-mam").status).toBe("within");
    expect(finding(run(r(1400, 1300), GB), "gb.trailer-mam").status).toBe("over");
  });
});
