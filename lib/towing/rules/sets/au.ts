/** Australia: the national vehicle standards. States and territories may add more: the product defers to them. */
import type { RuleSet } from "../types";

const ADR38 = {
  title: "Australian Design Rule 38 and Vehicle Standards Bulletin VSB 1",
  ref: "Trailer brakes, as summarised by state transport departments",
  trust: "M",
} as const;

export const AU_RULES: RuleSet = {
  id: "au",
  version: "2026.12.1",
  title: "Australia (national vehicle standards)",
  glossary: "au",
  defaultUnits: "metric",
  unitsInUse: ["metric"],
  scope:
    "The brake tiers by GTM (750 kg and 2,000 kg) and the breakaway rule, the trailer's ATM and the vehicle maker's towball limit. Licences and each state's or territory's own additions are for local law.",
  rules: [
    {
      id: "au.brakes.over-750",
      kind: "law",
      topic: "brakes",
      test: "brakes",
      title: "Trailer brakes",
      requires: "A trailer over 750 kg GTM must have brakes, on the wheels of at least one axle; up to 2,000 kg GTM over-ride brakes are allowed.",
      threshold: { value: 750, unit: "kg", applies: "above", of: "gtm" },
      source: ADR38,
    },
    {
      id: "au.brakes.all-wheels-over-2000",
      kind: "law",
      topic: "brakes",
      test: "brakes-all-wheels",
      title: "Brakes on all wheels",
      requires: "A trailer over 2,000 kg GTM must have brakes on all wheels.",
      threshold: { value: 2000, unit: "kg", applies: "above", of: "gtm" },
      source: ADR38,
    },
    {
      id: "au.brakes.no-over-ride-over-2000",
      kind: "law",
      topic: "brakes",
      test: "no-surge",
      title: "Brakes worked from the driver's seat",
      requires: "A trailer over 2,000 kg GTM must have brakes worked from the driver's seat: over-ride brakes are not allowed.",
      threshold: { value: 2000, unit: "kg", applies: "above", of: "gtm" },
      source: ADR38,
    },
    {
      id: "au.breakaway.over-2000",
      kind: "law",
      topic: "brakes",
      test: "breakaway",
      title: "Breakaway system",
      requires: "A trailer over 2,000 kg GTM must have a breakaway system that applies its brakes if it comes off.",
      threshold: { value: 2000, unit: "kg", applies: "above", of: "gtm" },
      source: ADR38,
    },
    {
      id: "au.atm",
      kind: "law",
      topic: "weights",
      test: "trailer-plate",
      title: "ATM",
      requires: "The loaded trailer must not weigh more than its ATM (aggregate trailer mass).",
      source: { title: "Vehicle Standards Bulletin VSB 1", ref: "Definitions: ATM, GTM", trust: "M" },
    },
    {
      id: "au.towball-limit",
      kind: "law",
      topic: "towball",
      test: "towball-limit",
      title: "Vehicle maker's towball limit",
      requires: "The towball mass must not exceed the vehicle maker's towball limit.",
      source: {
        title: "The vehicle maker's towball rating (owner's handbook or the tow bar's plate)",
        trust: "M",
        note: "About 10 % of the laden trailer is common advice, not law: the maker's limit governs.",
      },
    },
    {
      id: "au.licence",
      kind: "defer",
      topic: "licence",
      test: "defer",
      title: "Licence",
      requires: "What a car licence allows you to tow is set by each state and territory: check the licence.",
      source: { title: "The state's or territory's transport department", trust: "L", note: "The product does not decide this rule." },
    },
  ],
};
