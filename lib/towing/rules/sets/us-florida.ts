/** Florida. Imperial; the US trade's words. */
import type { RuleSet } from "../types";

const FLA = { title: "Florida Statutes", ref: "§ 316.261", trust: "H" } as const;

export const US_FL_RULES: RuleSet = {
  id: "us-fl",
  version: "2026.12.1",
  title: "Florida",
  glossary: "us",
  defaultUnits: "imperial",
  unitsInUse: ["imperial"],
  scope: "When a trailer needs brakes on all wheels and a breakaway device. Everything else is for the Florida Statutes.",
  rules: [
    {
      id: "us-fl.brakes.3000",
      kind: "law",
      topic: "brakes",
      test: "brakes",
      title: "Trailer brakes",
      requires: "A trailer over 3,000 lb must have brakes.",
      threshold: { value: 3000, unit: "lb", applies: "above", of: "laden" },
      source: FLA,
    },
    {
      id: "us-fl.all-wheels.3000",
      kind: "law",
      topic: "brakes",
      test: "brakes-all-wheels",
      title: "Brakes on all wheels",
      requires: "A trailer over 3,000 lb must have brakes on all wheels.",
      threshold: { value: 3000, unit: "lb", applies: "above", of: "laden" },
      source: FLA,
    },
    {
      id: "us-fl.breakaway.3000",
      kind: "law",
      topic: "brakes",
      test: "breakaway",
      title: "Breakaway device",
      requires: "A trailer over 3,000 lb must have a breakaway device that applies its brakes if it comes off.",
      threshold: { value: 3000, unit: "lb", applies: "above", of: "laden" },
      source: FLA,
    },
  ],
};
