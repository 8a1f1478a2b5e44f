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
import { BY_CODE, COUNTRIES, placeLabel, ruleSetIdFor } from "./place-list";
import type { Place, RuleSet } from "./types";

export { COUNTRIES, placeLabel };

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
  const id = ruleSetIdFor(place);
  return id ? RULE_SETS[id] : undefined;
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
