/** Northern Ireland: its licence and trailer rules differ from Great Britain's; the product defers to them. */
import type { RuleSet } from "../types";

const NI = { title: "Northern Ireland's own rules (nidirect)", trust: "L", note: "The product does not decide these rules." } as const;
const CARAVAN_GUIDES = {
  title: "The Caravan Club towing leaflet (2008); National Caravan Council towing guide",
  trust: "M",
  note: "Trade guidance, not law.",
} as const;

export const GB_NIR_RULES: RuleSet = {
  id: "gb-nir",
  version: "2026.12.1",
  title: "Northern Ireland",
  glossary: "gb",
  defaultUnits: "metric",
  unitsInUse: ["metric"],
  scope:
    "Northern Ireland has different rules from Great Britain: trailer brakes and the licence are for local law. The coupling's D value, the tow ball's S value and the caravan matching guidelines still apply.",
  rules: [
    {
      id: "gb-nir.brakes",
      kind: "defer",
      topic: "brakes",
      test: "defer",
      title: "Trailer brakes",
      requires: "When a trailer needs brakes and a breakaway device in Northern Ireland is for local law.",
      source: NI,
    },
    {
      id: "gb-nir.licence",
      kind: "defer",
      topic: "licence",
      test: "defer",
      title: "Licence",
      requires: "What a Northern Ireland licence allows you to tow is for local law: check the licence.",
      source: NI,
    },
    {
      id: "gb-nir.coupling-d",
      kind: "law",
      topic: "coupling",
      test: "coupling-d",
      title: "Coupling D value",
      requires: "The D value marked on the tow bar and on the coupling head must be at least D = g · T · R / (T + R).",
      g: 9.81,
      source: { title: "UN Regulation No. 55, mechanical coupling components", ref: "Definition of the D value", trust: "H" },
    },
    {
      id: "gb-nir.ball-s",
      kind: "law",
      topic: "coupling",
      test: "ball-s",
      title: "Tow ball S value",
      requires: "The noseweight must not exceed the static vertical load (S value) marked on the tow ball.",
      source: { title: "The S value marked on the tow bar or ball (UN Regulation No. 55 marking)", trust: "M" },
    },
    {
      id: "gb-nir.caravan-match",
      kind: "guideline",
      topic: "matching",
      test: "caravan-match",
      title: "Caravan to car match",
      requires: "A caravan's laden weight should be at most 85 % of the car's kerb weight, and never over 100 %.",
      trailerTypes: ["travel"],
      advised: 0.85,
      ceiling: 1,
      source: CARAVAN_GUIDES,
    },
    {
      id: "gb-nir.noseweight-band",
      kind: "guideline",
      topic: "matching",
      test: "noseweight-band",
      title: "Caravan noseweight",
      requires: "A caravan's noseweight should be 5 to 7 % of its actual laden weight.",
      trailerTypes: ["travel"],
      band: { min: 0.05, max: 0.07 },
      source: CARAVAN_GUIDES,
    },
  ],
};
