/** Licences: Great Britain since 16 December 2021, the EU's B, B with code 96 and BE. A missing licence is never a pass. */
import { describe, expect, it } from "vitest";
import { finding, lb, run, trailerRig } from "./support";

const GB = { country: "GB", region: "WLS" };
const EU = { country: "EU" };
const combo = (units: "metric" | "imperial", vehicleMam: number, trailerMam: number, licence?: string) =>
  trailerRig(units, { grossTrailerWeight: units === "metric" ? 700 : lb(700), mam: trailerMam, brakes: "electric" }, {
    vehicle: { gvwr: vehicleMam },
    ...(licence ? { driver: { licence } } : {}),
  });

describe("Great Britain: category B since 16 December 2021", () => {
  // Source: gov.uk "Towing with a car", DVLA notice of the December 2021 change: a car (B) licence tows trailers up to 3,500 kg MAM.
  it("a 2,000 kg MAM car with a 2,000 kg MAM trailer is within", () => {
    expect(finding(run(combo("metric", 2000, 2000, "B"), GB), "gb.licence.car").status).toBe("within");
  });
  it("a trailer of 3,600 kg MAM is over", () => {
    expect(finding(run(combo("metric", 2000, 3600, "B"), GB), "gb.licence.car").status).toBe("over");
  });
  it("3,500 kg MAM exactly is allowed (up to 3,500 kg), close: tight, not over", () => {
    expect(finding(run(combo("metric", 2000, 3500, "B"), GB), "gb.licence.car").status).toBe("tight");
  });
  it("a vehicle over 3,500 kg MAM is not a category B vehicle: over", () => {
    expect(finding(run(combo("metric", 3600, 1000, "B"), GB), "gb.licence.car").status).toBe("over");
  });
  it("no licence given: check the licence, incomplete, never within", () => {
    const f = finding(run(combo("metric", 2000, 1000), GB), "gb.licence.car");
    expect(f.status).toBe("incomplete");
    expect(f.message.startsWith("Check the licence")).toBe(true);
    expect(f.missing?.[0]?.field).toBe("driver.licence");
  });
  it("another licence: check the licence", () => {
    expect(finding(run(combo("metric", 2000, 1000, "other"), GB), "gb.licence.car").status).toBe("incomplete");
  });
  it("Northern Ireland defers the licence", () => {
    // Source: gov.uk "Towing with a car": Northern Ireland has different rules.
    const f = finding(run(combo("metric", 2000, 1000, "B"), { country: "GB", region: "NIR" }), "gb-nir.licence");
    expect(f.kind).toBe("defer");
    expect(f.status).toBe("incomplete");
  });
});

describe("EU: Directive 2006/126/EC, Article 4(4)(b) and (c)", () => {
  // Source: Directive 2006/126/EC Art. 4(4)(b): B tows up to 750 kg MAM, or more when the combination is at most
  // 3,500 kg MAM; code 96 up to 4,250 kg; (c) BE: a trailer up to 3,500 kg MAM.
  it("B: a 750 kg MAM trailer behind a 3,000 kg MAM car is within (combination 3,750 kg does not matter)", () => {
    expect(finding(run(combo("metric", 3000, 750, "B"), EU), "eu.licence").status).toBe("within");
  });
  it("B: 2,000 + 1,000 = 3,000 kg is within; 2,600 + 1,000 = 3,600 kg is over", () => {
    expect(finding(run(combo("metric", 2000, 1000, "B"), EU), "eu.licence").status).toBe("within");
    expect(finding(run(combo("metric", 2600, 1000, "B"), EU), "eu.licence").status).toBe("over");
  });
  it("B96: 3,600 kg is within; 2,600 + 1,700 = 4,300 kg is over", () => {
    expect(finding(run(combo("metric", 2600, 1000, "B96"), EU), "eu.licence").status).toBe("within");
    expect(finding(run(combo("metric", 2600, 1700, "B96"), EU), "eu.licence").status).toBe("over");
  });
  it("BE: a 2,500 kg MAM trailer is within; 3,600 kg is over", () => {
    expect(finding(run(combo("metric", 2500, 2500, "BE"), EU), "eu.licence").status).toBe("within");
    expect(finding(run(combo("metric", 2500, 3600, "BE"), EU), "eu.licence").status).toBe("over");
  });
  it("the same combinations in pounds land on the same side", () => {
    // 2,600 kg = 5,732.0 lb; 1,000 kg = 2,204.6 lb (÷ 0.45359237).
    expect(finding(run(combo("imperial", lb(2000), lb(1000), "B"), EU), "eu.licence").status).toBe("within");
    expect(finding(run(combo("imperial", lb(2600), lb(1000), "B"), EU), "eu.licence").status).toBe("over");
  });
  it("without the trailer's plate, a laden weight already over the limit is a known over", () => {
    // The laden weight is a lower bound of the MAM: 3,700 kg laden > 3,500 kg for BE.
    const r = trailerRig("metric", { grossTrailerWeight: 3700, brakes: "electric" }, { vehicle: { gvwr: 2500 }, driver: { licence: "BE" } });
    expect(finding(run(r, EU), "eu.licence").status).toBe("over");
    const unknown = trailerRig("metric", { grossTrailerWeight: 1000, brakes: "electric" }, { vehicle: { gvwr: 2500 }, driver: { licence: "BE" } });
    expect(finding(run(unknown, EU), "eu.licence").status).toBe("incomplete");
  });
});
