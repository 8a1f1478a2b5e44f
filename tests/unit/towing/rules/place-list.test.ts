import { describe, expect, it } from "vitest";
import { COUNTRIES, glossaryFor, ruleSetIdFor } from "@/lib/towing/rules/place-list";
import { RULE_SETS, ruleSetFor } from "@/lib/towing/rules/places";

describe("the place list the check form loads first", () => {
  it("names a known rule set for every country and region, with the same words as that rule set", () => {
    for (const country of COUNTRIES) {
      for (const place of [{ country: country.code }, ...country.regions.map((r) => ({ country: country.code, region: r.code }))]) {
        const id = ruleSetIdFor(place);
        expect(id && RULE_SETS[id], `${JSON.stringify(place)}`).toBeTruthy();
        expect(glossaryFor(place)).toBe(ruleSetFor(place)!.glossary);
      }
    }
  });

  it("uses the US words when no place is chosen or the place is unknown", () => {
    expect(glossaryFor(null)).toBe("us");
    expect(glossaryFor({ country: "ZZ" })).toBe("us");
    expect(ruleSetIdFor({ country: "US", region: "ZZ" })).toBeUndefined();
  });
});
