/**
 * Where a rig is driven: the countries and regions the product knows, and the rule set each one reads.
 * A region the product holds no rules for still resolves: to a set that defers ("check local law").
 */
import { z } from "zod";
import { AU_RULES } from "./sets/au";
import { CA_ON_RULES } from "./sets/ca-ontario";
import { CA_OTHER_RULES } from "./sets/ca-other";
import { EU_RULES } from "./sets/eu";
import { GB_RULES } from "./sets/gb";
import { GB_NIR_RULES } from "./sets/gb-northern-ireland";
import { US_CA_RULES } from "./sets/us-california";
import { US_FL_RULES } from "./sets/us-florida";
import { US_OTHER_RULES } from "./sets/us-other";
import { US_TX_RULES } from "./sets/us-texas";
import type { Place, RuleSet } from "./types";

/** Every rule set, by id. */
export const RULE_SETS: Readonly<Record<string, RuleSet>> = {
  [US_CA_RULES.id]: US_CA_RULES,
  [US_FL_RULES.id]: US_FL_RULES,
  [US_TX_RULES.id]: US_TX_RULES,
  [US_OTHER_RULES.id]: US_OTHER_RULES,
  [CA_ON_RULES.id]: CA_ON_RULES,
  [CA_OTHER_RULES.id]: CA_OTHER_RULES,
  [GB_RULES.id]: GB_RULES,
  [GB_NIR_RULES.id]: GB_NIR_RULES,
  [EU_RULES.id]: EU_RULES,
  [AU_RULES.id]: AU_RULES,
};

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
  regions: Region[];
}

const au = (code: string, name: string): Region => ({ code, name, ruleSet: "au" });

/** The countries and regions, in the order the settings form lists them. Codes follow ISO 3166 ("EU" for the Union). */
export const COUNTRIES: readonly Country[] = [
  {
    code: "US",
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
  { code: "EU", name: "European Union", ruleSet: "eu", regions: [] },
  {
    code: "AU",
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

const BY_CODE = new Map(COUNTRIES.map((c) => [c.code, c]));

/** A place as typed or stored; the region must belong to the country. */
export const placeSchema = z
  .object({
    country: z.string({ error: "Country: choose one from the list." }).refine((c) => BY_CODE.has(c), { error: "Country: choose one from the list." }),
    region: z.string().optional(),
  })
  .superRefine((p, ctx) => {
    const country = BY_CODE.get(p.country);
    if (!country || p.region === undefined || p.region === "") return;
    if (!country.regions.some((r) => r.code === p.region))
      ctx.addIssue({ code: "custom", path: ["region"], message: `${country.regionWord ?? "Region"}: choose one from the list.` });
  })
  .transform((p): Place => (p.region ? { country: p.country, region: p.region } : { country: p.country }));

/** The rule set for a place, or undefined for a place the product does not know. */
export function ruleSetFor(place: Place): RuleSet | undefined {
  const country = BY_CODE.get(place.country);
  if (!country) return undefined;
  const region = place.region ? country.regions.find((r) => r.code === place.region) : undefined;
  if (place.region && !region) return undefined;
  return RULE_SETS[region?.ruleSet ?? country.ruleSet];
}

/** "Texas, United States", "Great Britain: Wales", "European Union". */
export function placeLabel(place: Place): string {
  const country = BY_CODE.get(place.country);
  if (!country) return place.country;
  const region = place.region ? country.regions.find((r) => r.code === place.region) : undefined;
  return region ? `${region.name}, ${country.name}` : country.name;
}

/** A place from stored columns (an organisation's setting), or undefined when none is set or it is unknown. */
export function placeFrom(country: string | null | undefined, region?: string | null): Place | undefined {
  if (!country) return undefined;
  const place: Place = region ? { country, region } : { country };
  return ruleSetFor(place) ? place : undefined;
}

/**
 * How a stored result's rule set stands today: the version it was read with, and today's version of the same
 * set when that differs (the stored result never changes; the screen says the rules have moved on).
 */
export function ruleSetStanding(applied: { place: Place; ruleSetId: string; ruleSetVersion: string } | undefined): {
  readWith?: string;
  current?: string;
  changed: boolean;
} {
  if (!applied) return { changed: false };
  const now = RULE_SETS[applied.ruleSetId] ?? ruleSetFor(applied.place);
  return { readWith: applied.ruleSetVersion, current: now?.version, changed: !!now && now.version !== applied.ruleSetVersion };
}
