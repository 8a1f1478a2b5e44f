/** California. Imperial; the US trade's words. */
import type { RuleSet } from "../types";

export const US_CA_RULES: RuleSet = {
  id: "us-ca",
  version: "2026.12.1",
  title: "California",
  glossary: "us",
  defaultUnits: "imperial",
  unitsInUse: ["imperial"],
  scope: "When a trailer needs brakes. Breakaway devices, camp trailers and everything else are for the California Vehicle Code.",
  rules: [
    {
      id: "us-ca.brakes.3000",
      kind: "law",
      topic: "brakes",
      test: "brakes",
      title: "Trailer brakes",
      requires: "A trailer of 3,000 lb gross or more must have brakes on at least two wheels.",
      threshold: { value: 3000, unit: "lb", applies: "at-or-above", of: "laden" },
      source: { title: "California Vehicle Code", ref: "§ 26302", trust: "H" },
    },
    {
      id: "us-ca.camp-trailer.1500",
      kind: "defer",
      topic: "brakes",
      test: "defer",
      title: "Camp trailer brakes",
      requires: "A camp trailer needs brakes from 1,500 lb gross: whether this trailer counts as one is for the Vehicle Code.",
      trailerTypes: ["travel", "other"],
      threshold: { value: 1500, unit: "lb", applies: "at-or-above", of: "laden" },
      below: 3000,
      source: { title: "California Vehicle Code", ref: "§ 26303", trust: "H" },
    },
    {
      id: "us-ca.breakaway",
      kind: "defer",
      topic: "brakes",
      test: "defer",
      title: "Breakaway device",
      requires: "Whether this trailer needs a breakaway device is for the California Vehicle Code.",
      threshold: { value: 3000, unit: "lb", applies: "at-or-above", of: "laden" },
      source: { title: "California Vehicle Code", trust: "L", note: "The product does not decide this rule." },
    },
  ],
};
