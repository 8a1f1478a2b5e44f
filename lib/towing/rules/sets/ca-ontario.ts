/** Ontario. Metric by law, pounds at many counters: both unit systems are in use. */
import type { RuleSet } from "../types";

export const CA_ON_RULES: RuleSet = {
  id: "ca-on",
  version: "2026.12.1",
  title: "Ontario",
  glossary: "ca",
  defaultUnits: "metric",
  unitsInUse: ["metric", "imperial"],
  scope: "When a trailer needs brakes. Breakaway devices and everything else are for the Highway Traffic Act.",
  rules: [
    {
      id: "ca-on.brakes.1360",
      kind: "law",
      topic: "brakes",
      test: "brakes",
      title: "Trailer brakes",
      requires: "A trailer with a gross weight of 1,360 kg (3,000 lb) or more must have brakes.",
      threshold: { value: 1360, unit: "kg", applies: "at-or-above", of: "laden" },
      source: {
        title: "Ontario Ministry of Transportation, Pulling a Trailer Safely",
        trust: "H",
        note: "From memory: \"or more\".",
      },
    },
    {
      id: "ca-on.breakaway",
      kind: "defer",
      topic: "brakes",
      test: "defer",
      title: "Breakaway device",
      requires: "Whether this trailer needs a breakaway device is for the Highway Traffic Act.",
      threshold: { value: 1360, unit: "kg", applies: "at-or-above", of: "laden" },
      source: { title: "Ontario Highway Traffic Act", trust: "L", note: "The product does not decide this rule." },
    },
  ],
};
