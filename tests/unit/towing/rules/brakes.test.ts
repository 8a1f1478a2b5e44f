/**
 * Brakes by law: each threshold with a case on each side, in the units the place uses.
 * Expected statuses are read from the cited text; "not over" sides may read tight when close to the threshold.
 */
import { describe, expect, it } from "vitest";
import { finding, hasFinding, lb, local, run, trailerRig } from "./support";

const GB = { country: "GB", region: "ENG" };
const AU = { country: "AU", region: "VIC" };

describe("Great Britain: brakes over 750 kg", () => {
  // Source: gov.uk "Towing with a car": a trailer weighing over 750 kg, including its load, must have a working brake system.
  it("an unbraked 600 kg trailer is within; 751 kg unbraked is over; 751 kg braked is within", () => {
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 600, brakes: "none" }), GB), "gb.brakes.over-750").status).toBe("within");
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 751, brakes: "none" }), GB), "gb.brakes.over-750").status).toBe("over");
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 751, brakes: "surge" }), GB), "gb.brakes.over-750").status).toBe("within");
  });
  it("750 kg exactly is not over (the law says over 750 kg), but close: tight", () => {
    // Source: gov.uk "Towing with a car" ("over 750 kg").
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 750, brakes: "none" }), GB), "gb.brakes.over-750").status).toBe("tight");
  });
  it("cites its source in the finding", () => {
    const f = finding(run(trailerRig("metric", { grossTrailerWeight: 751, brakes: "none" }), GB), "gb.brakes.over-750");
    expect(f.kind).toBe("law");
    expect(f.source.title).toBe("gov.uk, Towing with a car");
    expect(f.message).toContain("gov.uk, Towing with a car");
  });
  it("brakes not given over the threshold: incomplete, never within", () => {
    const f = finding(run(trailerRig("metric", { grossTrailerWeight: 900 }), GB), "gb.brakes.over-750");
    expect(f.status).toBe("incomplete");
    expect(f.missing?.map((m) => m.field)).toEqual(["trailer.brakes"]);
  });
});

describe("EU: service brake over 750 kg (category O2)", () => {
  // From memory: UN Regulation No. 13, category O1 up to 0.75 t needs no service brake, O2 over 0.75 t does.
  it("700 kg unbraked within-or-tight; 800 kg unbraked over", () => {
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 600, brakes: "none" }), { country: "EU" }), "eu.brakes.over-750").status).toBe("within");
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 800, brakes: "none" }), { country: "EU" }), "eu.brakes.over-750").status).toBe("over");
  });
});

describe("Australia: brake tiers by GTM (ATM less the towball mass)", () => {
  // Source: ADR 38 and VSB 1 as summarised by state transport departments: up to 750 kg GTM no brakes; over 750 kg
  // brakes on at least one axle, over-ride allowed up to 2,000 kg; over 2,000 kg brakes on all wheels, worked from
  // the driver's seat, and a breakaway system.
  it("ATM 800 kg with a 60 kg towball mass is GTM 740 kg: no brakes required", () => {
    // Statics: GTM = 800 − 60 = 740 kg, under 750 kg.
    const f = finding(run(trailerRig("metric", { grossTrailerWeight: 800, tongueWeight: 60, brakes: "none" }), AU), "au.brakes.over-750");
    expect(f.status).not.toBe("over");
    expect(f.actual?.value).toBeCloseTo(740, 6);
  });
  it("ATM 900 kg with an 80 kg towball mass is GTM 820 kg: unbraked is over", () => {
    // Statics: GTM = 900 − 80 = 820 kg, over 750 kg.
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 900, tongueWeight: 80, brakes: "none" }), AU), "au.brakes.over-750").status).toBe("over");
  });
  it("over-ride brakes: allowed at GTM 1,950 kg, not at GTM 2,050 kg", () => {
    // Statics: 2,100 − 150 = 1,950 kg; 2,200 − 150 = 2,050 kg.
    const under = run(trailerRig("metric", { grossTrailerWeight: 2100, tongueWeight: 150, brakes: "surge" }), AU);
    const over = run(trailerRig("metric", { grossTrailerWeight: 2200, tongueWeight: 150, brakes: "surge", brakesAllWheels: true, breakaway: true }), AU);
    expect(finding(under, "au.brakes.no-over-ride-over-2000").status).not.toBe("over");
    expect(finding(over, "au.brakes.no-over-ride-over-2000").status).toBe("over");
  });
  it("over 2,000 kg GTM: brakes on all wheels and a breakaway system, each on either side", () => {
    const heavy = { grossTrailerWeight: 2400, tongueWeight: 200, brakes: "electric" };
    // Statics: GTM = 2,400 − 200 = 2,200 kg, over 2,000 kg.
    const none = run(trailerRig("metric", { ...heavy, brakesAllWheels: false, breakaway: false }), AU);
    expect(finding(none, "au.brakes.all-wheels-over-2000").status).toBe("over");
    expect(finding(none, "au.breakaway.over-2000").status).toBe("over");
    const both = run(trailerRig("metric", { ...heavy, brakesAllWheels: true, breakaway: true }), AU);
    expect(finding(both, "au.brakes.all-wheels-over-2000").status).toBe("within");
    expect(finding(both, "au.breakaway.over-2000").status).toBe("within");
    expect(finding(both, "au.brakes.no-over-ride-over-2000").status).toBe("within");
    // A light trailer (GTM 1,000 kg) needs neither.
    const light = run(trailerRig("metric", { grossTrailerWeight: 1080, tongueWeight: 80, brakes: "surge", brakesAllWheels: false, breakaway: false }), AU);
    expect(finding(light, "au.brakes.all-wheels-over-2000").status).toBe("within");
    expect(finding(light, "au.breakaway.over-2000").status).toBe("within");
  });
  it("the towball mass unknown: the ATM is an upper bound of the GTM", () => {
    // Statics: GTM ≤ ATM, so an ATM of 700 kg is under 750 kg whatever the towball mass.
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 700, brakes: "none" }), AU), "au.brakes.over-750").status).toBe("within");
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 900, brakes: "none" }), AU), "au.brakes.over-750").status).toBe("incomplete");
  });
});

describe("California: brakes at 3,000 lb gross and more", () => {
  const CA = { country: "US", region: "CA" };
  // Source: California Vehicle Code 26302: brakes on at least two wheels at 3,000 lb gross and more.
  it("2,000 lb unbraked within; 3,000 lb unbraked over (the code says 3,000 lb or more)", () => {
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: 2000, brakes: "none" }), CA), "us-ca.brakes.3000").status).toBe("within");
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: 2999, brakes: "none" }), CA), "us-ca.brakes.3000").status).toBe("tight");
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: 3000, brakes: "none" }), CA), "us-ca.brakes.3000").status).toBe("over");
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: 3000, brakes: "electric" }), CA), "us-ca.brakes.3000").status).toBe("within");
  });
  // Source: California Vehicle Code 26303: camp trailers need brakes from 1,500 lb. The product defers on whether a trailer is one.
  it("a travel trailer from 1,500 lb to under 3,000 lb: check local law (deferred, never within)", () => {
    const f = finding(run(trailerRig("imperial", { type: "travel", grossTrailerWeight: 1600, brakes: "none" }), CA), "us-ca.camp-trailer.1500");
    expect(f.kind).toBe("defer");
    expect(f.status).toBe("incomplete");
    expect(f.message.startsWith("Check local law")).toBe(true);
    expect(hasFinding(run(trailerRig("imperial", { type: "travel", grossTrailerWeight: 1400, brakes: "none" }), CA), "us-ca.camp-trailer.1500")).toBe(false);
    expect(hasFinding(run(trailerRig("imperial", { type: "travel", grossTrailerWeight: 3200, brakes: "electric" }), CA), "us-ca.camp-trailer.1500")).toBe(false);
  });
});

describe("Florida: over 3,000 lb, brakes on all wheels and a breakaway device", () => {
  const FL = { country: "US", region: "FL" };
  // Source: Fla. Stat. 316.261.
  it("3,000 lb unbraked is not over; 3,001 lb needs brakes on all wheels and a breakaway device", () => {
    const at = run(trailerRig("imperial", { grossTrailerWeight: 3000, brakes: "none" }), FL);
    for (const id of ["us-fl.brakes.3000", "us-fl.all-wheels.3000", "us-fl.breakaway.3000"]) expect(finding(at, id).status).not.toBe("over");
    const bare = run(trailerRig("imperial", { grossTrailerWeight: 3001, brakes: "electric", brakesAllWheels: false, breakaway: false }), FL);
    expect(finding(bare, "us-fl.brakes.3000").status).toBe("within");
    expect(finding(bare, "us-fl.all-wheels.3000").status).toBe("over");
    expect(finding(bare, "us-fl.breakaway.3000").status).toBe("over");
    const full = run(trailerRig("imperial", { grossTrailerWeight: 3001, brakes: "electric", brakesAllWheels: true, breakaway: true }), FL);
    expect(local(full).status).toBe("within");
  });
});

describe("Texas: brakes over 4,500 lb", () => {
  const TX = { country: "US", region: "TX" };
  // Source: Tex. Transp. Code 547.402 (4,500 lb; From memory: "more than").
  it("4,000 lb unbraked within; 4,501 lb unbraked over", () => {
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: 4000, brakes: "none" }), TX), "us-tx.brakes.4500").status).not.toBe("over");
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: 4501, brakes: "none" }), TX), "us-tx.brakes.4500").status).toBe("over");
  });
});

describe("Ontario: brakes at 1,360 kg, in both unit systems", () => {
  const ON = { country: "CA", region: "ON" };
  // Source: Ontario MTO, "Pulling a Trailer Safely": 1,360 kg (From memory: "or more").
  it("metric: 1,000 kg unbraked within; 1,360 kg unbraked over", () => {
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 1000, brakes: "none" }), ON), "ca-on.brakes.1360").status).toBe("within");
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 1359, brakes: "none" }), ON), "ca-on.brakes.1360").status).toBe("tight");
    expect(finding(run(trailerRig("metric", { grossTrailerWeight: 1360, brakes: "none" }), ON), "ca-on.brakes.1360").status).toBe("over");
  });
  it("imperial: 2,996 lb (1,359.0 kg) is not over; 3,000 lb (1,360.8 kg) is over", () => {
    // Source: Ontario MTO (1,360 kg); 2,996 lb × 0.45359237 = 1,358.96 kg; 3,000 lb = 1,360.78 kg.
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: 2996, brakes: "none" }), ON), "ca-on.brakes.1360").status).toBe("tight");
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: 3000, brakes: "none" }), ON), "ca-on.brakes.1360").status).toBe("over");
  });
  it("the exact threshold lands on the same side in both systems", () => {
    // 1,360 kg = 2,998.28 lb (÷ 0.45359237).
    expect(finding(run(trailerRig("imperial", { grossTrailerWeight: lb(1360), brakes: "none" }), ON), "ca-on.brakes.1360").status).toBe("over");
  });
});
