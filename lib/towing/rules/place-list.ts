/**
 * The countries and regions the product knows, and which rule set and trade words each uses: plain data, so
 * the check form's place picker and its words load without the rule sets or the schema library (places.ts
 * adds the rule sets and the place's schema).
 */
import type { GlossaryId, Place } from "./types";

interface Region {
  code: string;
  name: string;
  ruleSet: string;
}
interface Country {
  code: string;
  name: string;
  /** What a region is called there, for the form's label. */
  regionWord?: string;
  /** The rule set when no region is chosen (or the country has none). */
  ruleSet: string;
  /** The trade words used there (every rule set of the country uses the same; `towing/rules/places` holds it). */
  glossary: GlossaryId;
  regions: Region[];
}

const au = (code: string, name: string): Region => ({ code, name, ruleSet: "au" });

/** The countries and regions, in the order the settings form lists them. Codes follow ISO 3166 ("EU" for the Union). */
export const COUNTRIES: readonly Country[] = [
  {
    code: "US",
    glossary: "us",
    name: "United States",
    regionWord: "State",
    ruleSet: "us-other",
    regions: [
      { code: "CA", name: "California", ruleSet: "us-ca" },
      { code: "FL", name: "Florida", ruleSet: "us-fl" },
      { code: "TX", name: "Texas", ruleSet: "us-tx" },
      { code: "OTHER", name: "Another state", ruleSet: "us-other" },
    ],
  },
  {
    code: "CA",
    glossary: "ca",
    name: "Canada",
    regionWord: "Province or territory",
    ruleSet: "ca-other",
    regions: [
      { code: "ON", name: "Ontario", ruleSet: "ca-on" },
      { code: "OTHER", name: "Another province or territory", ruleSet: "ca-other" },
    ],
  },
  {
    code: "GB",
    glossary: "gb",
    name: "United Kingdom",
    regionWord: "Nation",
    ruleSet: "gb",
    regions: [
      { code: "ENG", name: "England", ruleSet: "gb" },
      { code: "SCT", name: "Scotland", ruleSet: "gb" },
      { code: "WLS", name: "Wales", ruleSet: "gb" },
      { code: "NIR", name: "Northern Ireland", ruleSet: "gb-nir" },
    ],
  },
  { code: "EU", name: "European Union", ruleSet: "eu", glossary: "eu", regions: [] },
  {
    code: "AU",
    glossary: "au",
    name: "Australia",
    regionWord: "State or territory",
    ruleSet: "au",
    regions: [
      au("NSW", "New South Wales"),
      au("VIC", "Victoria"),
      au("QLD", "Queensland"),
      au("WA", "Western Australia"),
      au("SA", "South Australia"),
      au("TAS", "Tasmania"),
      au("ACT", "Australian Capital Territory"),
      au("NT", "Northern Territory"),
    ],
  },
];

export const BY_CODE = new Map(COUNTRIES.map((c) => [c.code, c]));

/** "Texas, United States", "Great Britain: Wales", "European Union". */
export function placeLabel(place: Place): string {
  const country = BY_CODE.get(place.country);
  if (!country) return place.country;
  const region = place.region ? country.regions.find((r) => r.code === place.region) : undefined;
  return region ? `${region.name}, ${country.name}` : country.name;
}

/** The id of the rule set for a place, or undefined for a place the product does not know. */
export function ruleSetIdFor(place: Place): string | undefined {
  const country = BY_CODE.get(place.country);
  if (!country) return undefined;
  const region = place.region ? country.regions.find((r) => r.code === place.region) : undefined;
  if (place.region && !region) return undefined;
  return region?.ruleSet ?? country.ruleSet;
}

/** The trade words for a place ("us" when the place is unknown or not chosen). */
export function glossaryFor(place: Place | null | undefined): GlossaryId {
  return (place && BY_CODE.get(place.country)?.glossary) || "us";
}
