/** Any other Canadian province or territory: the product defers to its own law. */
import type { RuleSet } from "../types";

const LAW = { title: "The province's or territory's highway law", trust: "L", note: "The product does not decide these rules." } as const;

export const CA_OTHER_RULES: RuleSet = {
  id: "ca-other",
  version: "2026.12.1",
  title: "Another Canadian province or territory",
  glossary: "ca",
  defaultUnits: "metric",
  unitsInUse: ["metric", "imperial"],
  scope: "The product holds no rules for this province or territory: brakes and breakaway devices are for its own law.",
  rules: [
    { id: "ca-other.brakes", kind: "defer", topic: "brakes", test: "defer", title: "Trailer brakes", requires: "When a trailer needs brakes is for the province's law.", source: LAW },
    { id: "ca-other.breakaway", kind: "defer", topic: "brakes", test: "defer", title: "Breakaway device", requires: "When a trailer needs a breakaway device is for the province's law.", source: LAW },
  ],
};
