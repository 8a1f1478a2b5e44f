/** The European Union: the rules common to the member states. Each member state adds its own. */
import type { RuleSet } from "../types";

const LICENCE_DIRECTIVE = { title: "Directive 2006/126/EC on driving licences", ref: "Article 4(4)(b) and (c)", trust: "H" } as const;
const CARAVAN_GUIDES = {
  title: "The Caravan Club towing leaflet (2008); National Caravan Council towing guide",
  trust: "M",
  note: "Trade guidance, not law.",
} as const;

export const EU_RULES: RuleSet = {
  id: "eu",
  version: "2026.12.1",
  title: "European Union (rules common to the member states)",
  glossary: "eu",
  defaultUnits: "metric",
  unitsInUse: ["metric"],
  scope:
    "The licence categories B, B with code 96 and BE, the 750 kg unbraked limit, the coupling's D value and the tow ball's S value, and the caravan matching guidelines. Each member state adds its own rules: check local law.",
  rules: [
    {
      id: "eu.brakes.over-750",
      kind: "law",
      topic: "brakes",
      test: "brakes",
      title: "Trailer brakes",
      requires: "A trailer over 750 kg (category O2 and above) must have a service brake.",
      threshold: { value: 750, unit: "kg", applies: "above", of: "laden" },
      source: {
        title: "UN Regulation No. 13, braking of trailers (category O1 up to 0.75 t, O2 over 0.75 t)",
        trust: "L",
        note: "From memory; member states may apply it to the plated mass rather than the laden weight.",
      },
    },
    {
      id: "eu.breakaway",
      kind: "defer",
      topic: "brakes",
      test: "defer",
      title: "Breakaway cable or secondary coupling",
      requires: "How a braked trailer's breakaway cable, or an unbraked trailer's secondary coupling, must be fitted is for local law.",
      threshold: { value: 750, unit: "kg", applies: "above", of: "laden" },
      source: { title: "The member state's road traffic law", trust: "L", note: "The product does not decide this rule." },
    },
    {
      id: "eu.licence",
      kind: "law",
      topic: "licence",
      test: "licence",
      title: "Licence (B, B with code 96, BE)",
      requires:
        "Category B: a car up to 3,500 kg MAM with a trailer up to 750 kg MAM, or a heavier trailer when the combination's MAM is at most 3,500 kg. Code 96: a combination up to 4,250 kg. BE: a trailer up to 3,500 kg MAM.",
      categories: {
        B: { unit: "kg", vehicleMax: 3500, trailerFreeUpTo: 750, combinationMax: 3500 },
        B96: { unit: "kg", vehicleMax: 3500, trailerFreeUpTo: 750, combinationMax: 4250 },
        BE: { unit: "kg", vehicleMax: 3500, trailerMax: 3500 },
      },
      source: LICENCE_DIRECTIVE,
    },
    {
      id: "eu.coupling-d",
      kind: "law",
      topic: "coupling",
      test: "coupling-d",
      title: "Coupling D value",
      requires: "The D value marked on the tow bar and on the coupling head must be at least D = g · T · R / (T + R).",
      g: 9.81,
      source: { title: "UN Regulation No. 55, mechanical coupling components", ref: "Definition of the D value", trust: "H" },
    },
    {
      id: "eu.ball-s",
      kind: "law",
      topic: "coupling",
      test: "ball-s",
      title: "Tow ball S value",
      requires: "The vertical load on the ball must not exceed the static vertical load (S value) marked on it.",
      source: { title: "The S value marked on the tow bar or ball (UN Regulation No. 55 marking)", trust: "M" },
    },
    {
      id: "eu.caravan-match",
      kind: "guideline",
      topic: "matching",
      test: "caravan-match",
      title: "Caravan to car match",
      requires: "A caravan's laden mass should be at most 85 % of the car's kerb mass, and never over 100 %.",
      trailerTypes: ["travel"],
      advised: 0.85,
      ceiling: 1,
      source: CARAVAN_GUIDES,
    },
    {
      id: "eu.noseweight-band",
      kind: "guideline",
      topic: "matching",
      test: "noseweight-band",
      title: "Caravan vertical load",
      requires: "A caravan's vertical load on the ball should be 5 to 7 % of its actual laden mass.",
      trailerTypes: ["travel"],
      band: { min: 0.05, max: 0.07 },
      source: CARAVAN_GUIDES,
    },
  ],
};
