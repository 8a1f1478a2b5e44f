/** Any other US state: the product has no rule set for it and defers to the state's vehicle code. */
import type { RuleSet } from "../types";

const CODE = { title: "The state's vehicle code", trust: "L", note: "The product does not decide these rules." } as const;

export const US_OTHER_RULES: RuleSet = {
  id: "us-other",
  version: "2026.12.1",
  title: "Another US state",
  glossary: "us",
  defaultUnits: "imperial",
  unitsInUse: ["imperial"],
  scope: "The product holds no rules for this state: brakes and breakaway devices are for the state's vehicle code.",
  rules: [
    { id: "us-other.brakes", kind: "defer", topic: "brakes", test: "defer", title: "Trailer brakes", requires: "When a trailer needs brakes is for the state's vehicle code.", source: CODE },
    { id: "us-other.breakaway", kind: "defer", topic: "brakes", test: "defer", title: "Breakaway device", requires: "When a trailer needs a breakaway device is for the state's vehicle code.", source: CODE },
  ],
};
