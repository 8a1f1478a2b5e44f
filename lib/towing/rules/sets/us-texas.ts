/** Texas. Imperial; the US trade's words. */
import type { RuleSet } from "../types";

export const US_TX_RULES: RuleSet = {
  id: "us-tx",
  version: "2026.12.1",
  title: "Texas",
  glossary: "us",
  defaultUnits: "imperial",
  unitsInUse: ["imperial"],
  scope: "When a trailer needs brakes. Breakaway devices and everything else are for the Texas Transportation Code.",
  rules: [
    {
      id: "us-tx.brakes.4500",
      kind: "law",
      topic: "brakes",
      test: "brakes",
      title: "Trailer brakes",
      requires: "A trailer of more than 4,500 lb gross must have brakes.",
      threshold: { value: 4500, unit: "lb", applies: "above", of: "laden" },
      source: { title: "Texas Transportation Code", ref: "§ 547.402", trust: "H", note: "From memory: \"more than\" 4,500 lb." },
    },
    {
      id: "us-tx.breakaway",
      kind: "defer",
      topic: "brakes",
      test: "defer",
      title: "Breakaway device",
      requires: "Whether this trailer needs a breakaway device is for the Texas Transportation Code.",
      threshold: { value: 4500, unit: "lb", applies: "above", of: "laden" },
      source: { title: "Texas Transportation Code", trust: "L", note: "The product does not decide this rule." },
    },
  ],
};
