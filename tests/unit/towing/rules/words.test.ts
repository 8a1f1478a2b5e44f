/** Words follow the place; the calculation stays one. The result records the rule set and its version. */
import { describe, expect, it } from "vitest";
import { evaluateRig, evaluateRigFast, localise, parseEvaluateRequest, placeLabel, ruleSetFor, term } from "@/lib/towing";
import { pickupRig } from "../helpers";

const r = pickupRig();

describe("the glossary", () => {
  it("names each term in each place's words", () => {
    // Source: gov.uk "Towing with a car" (gross train weight, MAM); VSB 1 (ATM, GTM); common UK and Australian trade usage.
    expect(term("gb", "gcwr")).toBe("gross train weight");
    expect(term("gb", "tongueWeight")).toBe("noseweight");
    expect(term("gb", "gvwr")).toBe("MAM");
    expect(term("au", "tongueWeight")).toBe("towball mass");
    expect(term("au", "grossTrailerWeight")).toBe("ATM");
    expect(term("us", "tongueWeight")).toBe("tongue weight");
  });
  it("rewrites a sentence, keeping capitals and hyphenated forms", () => {
    expect(localise("Tongue-weight share of the travel trailer, under the GCWR", "gb")).toBe("Noseweight share of the caravan, under the gross train weight");
    expect(localise("The tongue weight is over the curb weight", "au")).toBe("The towball mass is over the kerb mass");
    expect(localise("GVWR", "us")).toBe("GVWR");
    expect(localise("GCWR", "gb")).toBe("Gross train weight");
    expect(localise("GCWR", "au")).toBe("GCM");
    expect(localise("the GCWR", "gb")).toBe("the gross train weight");
  });
});

describe("one calculation, the place's words", () => {
  it("the same rig gives the same statuses and numbers in Texas, Great Britain and Australia, apart from the local rules", () => {
    const us = evaluateRig(r, { place: { country: "US", region: "TX" } });
    const gb = evaluateRig(r, { place: { country: "GB", region: "ENG" } });
    const au = evaluateRig(r, { place: { country: "AU", region: "QLD" } });
    const plain = evaluateRig(r);
    for (const res of [us, gb, au]) {
      for (const c of plain.checks) {
        const same = res.checks.find((x) => x.id === c.id)!;
        // The caravan noseweight band differs in Great Britain, and the envelope reads the band.
        if ((c.id === "tongue-share" || c.id === "envelope") && res === gb) continue;
        expect(same.status).toBe(c.status);
        expect(same.actual?.value).toBe(c.actual?.value);
      }
    }
    const gcw = gb.checks.find((c) => c.id === "combined-weight")!;
    expect(gcw.message).toContain("gross train weight");
    expect(gcw.message).not.toContain("GCWR");
    expect(gcw.governing?.id).toBe("vehicle.gcwr");
    const auShare = au.checks.find((c) => c.id === "tongue-share")!;
    expect(auShare.title).toBe("Towball mass share");
    expect(us.checks.find((c) => c.id === "tongue-share")!.title).toBe("Tongue-weight share");
  });
  it("records the rule set and its version, on the full and on no other path", () => {
    const res = evaluateRig(r, { place: { country: "GB", region: "ENG" } });
    expect(res.rules).toEqual({
      place: { country: "GB", region: "ENG" },
      placeLabel: "England, United Kingdom",
      ruleSetId: "gb",
      ruleSetVersion: ruleSetFor({ country: "GB" })!.version,
      title: "Great Britain (England, Scotland and Wales)",
      glossary: "gb",
    });
    expect(evaluateRig(r).rules).toBeUndefined();
    expect(evaluateRig(r).checks.some((c) => c.id === "local-rules")).toBe(false);
    expect(evaluateRigFast(r, { place: { country: "GB" } }).checks.some((c) => c.id === "local-rules")).toBe(true);
  });
  it("labels places", () => {
    expect(placeLabel({ country: "US", region: "TX" })).toBe("Texas, United States");
    expect(placeLabel({ country: "EU" })).toBe("European Union");
  });
});

describe("the evaluate request accepts the place", () => {
  it("as an object or a code", () => {
    const a = parseEvaluateRequest({ rig: r, options: { place: { country: "AU", region: "QLD" } } });
    const b = parseEvaluateRequest({ rig: r, options: { place: "au-qld" } });
    expect(a.ok && a.options.place).toEqual({ country: "AU", region: "QLD" });
    expect(b.ok && b.options.place).toEqual({ country: "AU", region: "QLD" });
  });
  it("refuses an unknown country or region with a field message", () => {
    const a = parseEvaluateRequest({ rig: r, options: { place: { country: "ZZ" } } });
    expect(a.ok).toBe(false);
    expect(!a.ok && Object.keys(a.fieldErrors)).toEqual(["options.place.country"]);
    const b = parseEvaluateRequest({ rig: r, options: { place: "US-ZZ" } });
    expect(!b.ok && b.fieldErrors["options.place.region"]).toEqual(["State: choose one from the list."]);
    const c = parseEvaluateRequest({ rig: r, options: { place: 7 } });
    expect(!c.ok && Object.keys(c.fieldErrors)).toEqual(["options.place"]);
  });
});
