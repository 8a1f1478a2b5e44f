/**
 * The glossary is the one source of definitions: every symbol a worked step shows and every trade term a label
 * uses must have an entry, so a new hire can look each one up. A new step symbol or label term without an
 * entry fails here.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { CHECK_IDS, evaluateRig, FIELD_RANGES, tongueWeightByBeam, tongueWeightByPublicScale, tongueWeightByScale, type RigInput, type Step } from "@/lib/towing";
import { CHECK_WORDS, SYMBOLS, TERMS, symbolEntry, termsIn } from "@/lib/glossary";
import { FIELDS_BY_KIND } from "@/lib/fleet/fields";
import { LIBRARY, LESSON_FAMILIES } from "@/lib/training/library";
import { SAMPLE_RIGS } from "@/components/check/sample-rigs";
import { pickupRig, rig } from "./towing/helpers";

const ROOT = join(__dirname, "../..");

/** Rigs that between them reach every check and every branch that makes steps. */
function corpus(): RigInput[] {
  const fixtures = readdirSync(join(ROOT, "tests/fixtures/rigs")).map((name) => rig(JSON.parse(readFileSync(join(ROOT, "tests/fixtures/rigs", name), "utf8"))));
  return [
    ...fixtures,
    ...LIBRARY.map((example) => example.rig),
    ...SAMPLE_RIGS.map((sample) => sample.rig),
    pickupRig(),
    pickupRig({ vehicle: { payloadLabel: 1500 } }),
    pickupRig({ vehicle: { curbWeight: undefined, payloadLabel: 1500 } }),
    pickupRig({ weightDistribution: { used: true, tongueRating: 800, fenderUnhitched: 36, fenderHitched: 37.2, fenderWithWd: 36.6 } }),
    pickupRig({ weightDistribution: { used: true, fenderUnhitched: 36, fenderHitched: 37.2 } }),
    pickupRig({ vehicle: { axleWeightsHitched: { front: 2800, rear: 3200 } }, trailer: { tongueWeight: undefined } }),
    pickupRig({ trailer: { tongueWeight: undefined, tongueMeasurement: { scaleReading: 180, blockToJack: 12, jackToScale: 24 } } }),
    pickupRig({ trailer: { tongueWeight: undefined, tongueMeasurement: { scaleReading: 250 } } }),
    pickupRig({ trailer: { tongueWeight: undefined } }),
    pickupRig({ vehicle: { wdRequiredAbove: 3000 } }),
    rig({
      units: "metric",
      vehicle: { tongueWeightLimit: 100, gvwr: 2200, curbWeight: 1600, rearAxleToPin: 900, departureAngle: 20, axleWeights: { front: 900, rear: 800 }, wheelbase: 2700, gawrFront: 1100, gawrRear: 1200 },
      hitch: { twRating: 90, receiverHeight: 450, pinToFascia: 120 },
      extender: { length: 150, twRating: 70 },
      accessory: { type: "platform-rack", weight: 20, loadWeight: 30, loadCenterFromPin: 400, foldClearance: 200, lowestPointBelowShankTop: 80, lowestPointBehindPin: 300, shankRise: 50 },
      load: { occupants: 150, cargo: 40 },
    }),
  ];
}

function allSteps(): Step[] {
  const steps: Step[] = [];
  const seen = new Set<string>();
  for (const r of corpus()) {
    for (const check of evaluateRig(r).checks) {
      if (check.steps.length) seen.add(check.id);
      steps.push(...check.steps);
    }
  }
  // Every check family made steps somewhere in the corpus, so the symbol rule covers them all.
  // The local-rules check runs only where a place is chosen and shows the rules' own words and sources
  // (docs/local-rules.md); it makes no worked steps.
  expect([...seen].sort()).toEqual(CHECK_IDS.filter((id) => id !== "local-rules").sort());
  const scale = tongueWeightByScale({ scaleReading: 250, units: "imperial" });
  const beam = tongueWeightByBeam({ scaleReading: 250, blockToJack: 12, jackToScale: 24, units: "imperial" });
  const publicScale = tongueWeightByPublicScale({ unhitched: { front: 3000, rear: 2500 }, hitched: { front: 2800, rear: 3300 }, units: "imperial" });
  const engaged = tongueWeightByPublicScale({ unhitched: { front: 3000, rear: 2500 }, hitched: { front: 2900, rear: 3100 }, weightDistributionEngaged: true, units: "imperial" });
  for (const m of [scale, beam, publicScale, engaged]) if (m.ok) steps.push(...m.steps);
  return steps;
}

/** The identifiers of a step's formula, less the mathjs functions and constants. */
function formulaSymbols(formula: string): string[] {
  const names = formula.match(/[A-Za-z_][A-Za-z0-9_]*/g) ?? [];
  return names.filter((n) => !["min", "max", "abs", "atan", "tan", "pi"].includes(n));
}

/** Abbreviations in a label: two or more capitals (GVWR, TW, WD). */
function abbreviations(text: string): string[] {
  return text.match(/\b[A-Z][A-Z0-9]+\b/g) ?? [];
}

/** Trade words a label may use; each must have a glossary entry that names it. */
const TRADE_WORDS = [
  "weight-carrying",
  "weight distribution",
  "gross trailer weight",
  "tongue weight",
  "tongue-weight share",
  "payload",
  "curb weight",
  "fascia",
  "ball platform",
  "ball mount",
  "squat",
  "restoration",
  "surge",
  "hitch class",
  "receiver",
  "shank",
  "shank rise",
  "coupler",
  "safety chain",
  "spring bars",
  "extender",
  "departure angle",
  "wheelbase",
  "fender height",
  "pin hole",
  "weakest link",
  "breakaway",
  "brake controller",
];

function labels(): string[] {
  const out: string[] = [];
  for (const range of Object.values(FIELD_RANGES)) out.push(range.label);
  for (const fields of Object.values(FIELDS_BY_KIND)) for (const f of fields) out.push(f.label);
  for (const family of LESSON_FAMILIES) out.push(family.label);
  for (const words of Object.values(CHECK_WORDS)) out.push(words.title);
  for (const r of corpus()) {
    for (const check of evaluateRig(r).checks) {
      out.push(check.title);
      if (check.governing) out.push(check.governing.label);
      for (const step of check.steps) out.push(step.title, ...step.inputs.map((i) => i.label));
      if ("links" in check) for (const link of check.links) out.push(link.label);
      if ("parts" in check) for (const part of check.parts) out.push(part.label);
    }
  }
  // The check screen's own field labels.
  const cards = readFileSync(join(ROOT, "components/check/rig-cards.tsx"), "utf8");
  for (const m of cards.matchAll(/\blabel="([^"]+)"/g)) out.push(m[1]!);
  return [...new Set(out)];
}

describe("the glossary", () => {
  it("defines every symbol a worked step shows, in its inputs, its result and its formula", () => {
    const undefinedSymbols = new Set<string>();
    for (const step of allSteps()) {
      const symbols = [step.result.symbol, ...step.inputs.map((i) => i.symbol), ...formulaSymbols(step.formula)];
      for (const symbol of symbols) if (!symbolEntry(symbol)) undefinedSymbols.add(`${symbol} (step ${step.id})`);
    }
    expect([...undefinedSymbols]).toEqual([]);
  });

  it("defines every abbreviation and trade word used in a label", () => {
    const missing = new Set<string>();
    for (const label of labels()) {
      for (const abbreviation of abbreviations(label)) {
        if (!TERMS.some((t) => (t.names as readonly string[]).includes(abbreviation))) missing.add(`${abbreviation} in "${label}"`);
      }
      for (const word of TRADE_WORDS) {
        if (!new RegExp(`\\b${word}`, "i").test(label)) continue;
        const found = termsIn([word]);
        if (!found.length) missing.add(`${word} in "${label}"`);
      }
    }
    expect([...missing]).toEqual([]);
  });

  it("fails on a term it does not know: the checks above are not empty", () => {
    // A made-up symbol and abbreviation are caught, so the two rules cannot pass by reading nothing.
    expect(symbolEntry("Q_nowhere")).toBeUndefined();
    expect(TERMS.some((t) => (t.names as readonly string[]).includes("XQZR"))).toBe(false);
    expect(labels().length).toBeGreaterThan(80);
    expect(allSteps().length).toBeGreaterThan(40);
  });

  it("covers the words a new hire meets first, each in one plain sentence", () => {
    for (const word of ["weight-carrying", "weight distribution", "GTW", "TW", "GVWR", "GAWR", "GCWR", "payload", "fascia", "ball platform", "squat", "restoration", "surge", "hitch class"]) {
      expect(termsIn([word]).length, word).toBeGreaterThan(0);
    }
    for (const t of TERMS) {
      expect(t.definition.length, t.id).toBeLessThan(260);
      expect(t.definition.trim().endsWith("."), t.id).toBe(true);
    }
    for (const [symbol, entry] of Object.entries(SYMBOLS)) expect(entry.meaning.length, symbol).toBeGreaterThan(2);
    expect(new Set(TERMS.map((t) => t.id)).size).toBe(TERMS.length);
  });

  it("says a class is a ceiling, not a rating, and that Class 5 is trade usage", () => {
    const cls = TERMS.find((t) => t.id === "hitch-class")!;
    // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684): J684 covers trailers up to 10,000 lb; "Class 5" is trade usage
    expect(cls.definition).toMatch(/ceiling/);
    expect(cls.definition).toMatch(/Class 5.*trade usage/);
  });

  it("finds terms on whole words only", () => {
    expect(termsIn(["a classic tweed"]).map((t) => t.id)).toEqual([]);
    expect(termsIn(["Hitch class 3, GVWR 7,000 lb"]).map((t) => t.id)).toEqual(expect.arrayContaining(["hitch-class", "gvwr"]));
  });
});
