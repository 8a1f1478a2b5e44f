/**
 * The words of each place: one glossary, so that labels, messages and the customer's page speak the place's
 * terms while the calculation stays one. The core writes its texts in the US trade's words; `localise` turns
 * them into the place's. Pure strings only: safe for the browser and the customer's page.
 */
import type { GlossaryId } from "./types";

/** A term the core uses, in the US trade's words, and what each place calls it. */
export interface Term {
  key: TermKey;
  /** The US trade's word, as the core writes it. */
  us: string;
  /** What the term means, in a line. */
  meaning: string;
  words: Record<GlossaryId, string>;
}

export type TermKey =
  | "gcwr"
  | "gvwr"
  | "tongueWeight"
  | "curbWeight"
  | "grossTrailerWeight"
  | "travelTrailer"
  | "surgeBrakes"
  | "hitchBall"
  | "coupler";

/** One row per term. The US wording is the core's own; the others are the place's usual terms. */
export const TERMS: readonly Term[] = [
  {
    key: "gcwr",
    us: "GCWR",
    meaning: "The most the loaded vehicle and the loaded trailer may weigh together.",
    words: { us: "GCWR", ca: "GCWR", gb: "gross train weight", eu: "maximum combination mass", au: "GCM" },
  },
  {
    key: "gvwr",
    us: "GVWR",
    meaning: "The most the loaded vehicle may weigh.",
    words: { us: "GVWR", ca: "GVWR", gb: "MAM", eu: "maximum permissible mass", au: "GVM" },
  },
  {
    key: "tongueWeight",
    us: "tongue weight",
    meaning: "The weight the trailer puts on the hitch ball.",
    words: { us: "tongue weight", ca: "tongue weight", gb: "noseweight", eu: "vertical load", au: "towball mass" },
  },
  {
    key: "curbWeight",
    us: "curb weight",
    meaning: "The empty vehicle's weight, ready to drive.",
    words: { us: "curb weight", ca: "curb weight", gb: "kerb weight", eu: "kerb mass", au: "kerb mass" },
  },
  {
    key: "grossTrailerWeight",
    us: "gross trailer weight",
    meaning: "The loaded trailer's weight.",
    words: { us: "gross trailer weight", ca: "gross trailer weight", gb: "trailer's laden weight", eu: "trailer's laden mass", au: "ATM" },
  },
  {
    key: "travelTrailer",
    us: "travel trailer",
    meaning: "A trailer to live in on the road.",
    words: { us: "travel trailer", ca: "travel trailer", gb: "caravan", eu: "caravan", au: "caravan" },
  },
  {
    key: "surgeBrakes",
    us: "surge brakes",
    meaning: "Trailer brakes worked by the trailer pushing on its coupling.",
    words: { us: "surge brakes", ca: "surge brakes", gb: "over-run brakes", eu: "over-run brakes", au: "over-ride brakes" },
  },
  {
    key: "hitchBall",
    us: "hitch ball",
    meaning: "The ball the trailer's coupling sits on.",
    words: { us: "hitch ball", ca: "hitch ball", gb: "tow ball", eu: "coupling ball", au: "towball" },
  },
  {
    key: "coupler",
    us: "coupler",
    meaning: "The trailer's part that locks onto the ball.",
    words: { us: "coupler", ca: "coupler", gb: "coupling head", eu: "coupling head", au: "coupling" },
  },
];

/** The place's word for a term. */
export function term(glossary: GlossaryId, key: TermKey): string {
  return TERMS.find((t) => t.key === key)!.words[glossary];
}

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

interface Replacement {
  pattern: RegExp;
  to: string;
}

/** Variants of a US term as the core writes it: "tongue weight", "tongue-weight", "Tongue weight". */
function variants(us: string): string[] {
  const hyphen = us.replace(/ /g, "-");
  const list = [us, hyphen];
  if (us !== us.toUpperCase()) list.push(...[us, hyphen].map((w) => w[0]!.toUpperCase() + w.slice(1)));
  return [...new Set(list)];
}

const CACHE = new Map<GlossaryId, Replacement[]>();

function replacements(glossary: GlossaryId): Replacement[] {
  let list = CACHE.get(glossary);
  if (list) return list;
  list = [];
  // Longest terms first, so "gross trailer weight" is replaced before any shorter term inside it.
  const terms = [...TERMS].sort((a, b) => b.us.length - a.us.length);
  for (const t of terms) {
    const to = t.words[glossary];
    if (to === t.us) continue;
    for (const v of variants(t.us)) {
      const capital = v[0] !== v[0]!.toLowerCase() && v !== v.toUpperCase();
      list.push({ pattern: new RegExp(`\\b${escape(v)}\\b`, "g"), to: capital ? to[0]!.toUpperCase() + to.slice(1) : to });
    }
  }
  CACHE.set(glossary, list);
  return list;
}

/** A text in the place's words. The US glossary returns the text unchanged. */
export function localise(text: string, glossary: GlossaryId): string {
  if (glossary === "us" || !text) return text;
  let out = text;
  for (const r of replacements(glossary)) out = out.replace(r.pattern, r.to);
  // A label or sentence that began with a capital still does ("GCWR" → "Gross train weight").
  const first = text[0]!;
  if (first !== first.toLowerCase() && out[0] !== out[0]!.toUpperCase()) out = out[0]!.toUpperCase() + out.slice(1);
  return out;
}

/** Keys whose values are identifiers, units or formulas: never reworded. */
const KEEP = new Set([
  "id",
  "field",
  "unit",
  "symbol",
  "formula",
  "checkId",
  "coreVersion",
  "units",
  "status",
  "level",
  "levelFromCheckedOnly",
  "method",
  "kind",
  "limits",
  "ruleId",
  "topic",
  "source",
  "rules",
  "regionUnit",
]);

/** A deep copy of a result (or any plain value) with every text in the place's words. */
export function localiseDeep<T>(value: T, glossary: GlossaryId): T {
  if (glossary === "us") return value;
  const walk = (v: unknown): unknown => {
    if (typeof v === "string") return localise(v, glossary);
    if (Array.isArray(v)) return v.map(walk);
    if (v && typeof v === "object") {
      const out: Record<string, unknown> = {};
      for (const [k, x] of Object.entries(v as Record<string, unknown>)) out[k] = KEEP.has(k) ? x : walk(x);
      return out;
    }
    return v;
  };
  return walk(value) as T;
}
