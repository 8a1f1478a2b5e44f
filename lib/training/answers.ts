/**
 * Marking a learner's answer to one step. Pure and light (no mathjs), so the practice screen marks each step as
 * it is answered and the server marks the whole attempt again with the same function before storing it.
 *
 * An answer may carry its own unit ("488 kg" for a step in lb) and thousands separators ("1,075.86",
 * "1 044"); a true minus sign or a hyphen both read as negative. It is right when it lies within the step's
 * tolerance: the larger of an absolute allowance per unit (what rounding to the shown figure, or a share to a whole percent, loses) and
 * 0.25 % of the expected value (what rounding an earlier step loses).
 */

/** Exact by definition: the international pound is 0.45359237 kg, the inch 25.4 mm. */
export const KG_PER_LB_EXACT = 0.45359237;
export const MM_PER_IN_EXACT = 25.4;

export const RELATIVE_TOLERANCE = 0.0025;

/** Absolute allowance per step unit. */
export const ABSOLUTE_TOLERANCE: Record<string, number> = {
  lb: 1,
  kg: 0.5,
  in: 0.05,
  mm: 1,
  "%": 0.5,
  "°": 0.05,
  "": 0.005,
};

type Kind = "mass" | "length" | "percent" | "angle" | "none";

/** Units a learner may type, with their kind and their size in the kind's base (lb, in). */
const TYPED_UNITS: Record<string, { kind: Kind; factor: number; canonical: string }> = {
  lb: { kind: "mass", factor: 1, canonical: "lb" },
  lbs: { kind: "mass", factor: 1, canonical: "lb" },
  pound: { kind: "mass", factor: 1, canonical: "lb" },
  pounds: { kind: "mass", factor: 1, canonical: "lb" },
  kg: { kind: "mass", factor: 1 / KG_PER_LB_EXACT, canonical: "kg" },
  kgs: { kind: "mass", factor: 1 / KG_PER_LB_EXACT, canonical: "kg" },
  in: { kind: "length", factor: 1, canonical: "in" },
  inch: { kind: "length", factor: 1, canonical: "in" },
  inches: { kind: "length", factor: 1, canonical: "in" },
  '"': { kind: "length", factor: 1, canonical: "in" },
  ft: { kind: "length", factor: 12, canonical: "ft" },
  mm: { kind: "length", factor: 1 / MM_PER_IN_EXACT, canonical: "mm" },
  cm: { kind: "length", factor: 10 / MM_PER_IN_EXACT, canonical: "cm" },
  m: { kind: "length", factor: 1000 / MM_PER_IN_EXACT, canonical: "m" },
  "%": { kind: "percent", factor: 1, canonical: "%" },
  "°": { kind: "angle", factor: 1, canonical: "°" },
  deg: { kind: "angle", factor: 1, canonical: "°" },
  degrees: { kind: "angle", factor: 1, canonical: "°" },
};

const KIND_WORDS: Record<Kind, string> = { mass: "a weight", length: "a length", percent: "a share", angle: "an angle", none: "a plain number" };

function stepUnit(unit: string) {
  return TYPED_UNITS[unit] ?? { kind: "none" as Kind, factor: 1, canonical: unit };
}

export type ParsedAnswer = { ok: true; value: number; typedUnit?: string } | { ok: false; error: string };

// Digits with optional thousands groups (comma, space, no-break or thin space, apostrophe) and a decimal point.
const NUMBER = /^(\d{1,3}(?:[,\u0020\u00a0\u2009\u202f']\d{3})+|\d+)?(\.\d+)?$/;

/**
 * Reads what the learner typed as a number in the step's unit. Never throws. The error says what to fix, in
 * words a learner understands.
 */
export function parseAnswer(raw: string, unit: string): ParsedAnswer {
  let text = raw.normalize("NFKC").trim().replace(/[\u2212\u2012\u2013\u2014]/g, "-");
  if (!text) return { ok: false, error: "Enter your answer as a number." };
  let sign = 1;
  if (text.startsWith("-") || text.startsWith("+")) {
    if (text.startsWith("-")) sign = -1;
    text = text.slice(1).trim();
  }
  const match = /^([\d.,\u0020\u00a0\u2009\u202f']*\d|\.\d+)\s*(.*)$/.exec(text);
  if (!match) return { ok: false, error: "Start the answer with a number, like 1,076 or −275.9." };
  const digits = match[1]!.trim();
  const typed = match[2]!.trim().toLowerCase();
  if (/^\d+,\d{1,2}$/.test(digits) || /^\d+,\d{4,}$/.test(digits)) {
    return { ok: false, error: "Use a point for decimals (1075.9); commas only group thousands (1,075.9)." };
  }
  if (!NUMBER.test(digits)) return { ok: false, error: "That number is not written clearly: use digits, a point for decimals and commas for thousands." };
  let value = sign * Number(digits.replace(/[,\u0020\u00a0\u2009\u202f']/g, ""));
  if (!Number.isFinite(value)) return { ok: false, error: "Enter your answer as a number." };
  if (!typed) return { ok: true, value };

  const given = TYPED_UNITS[typed];
  const expected = stepUnit(unit);
  if (!given) return { ok: false, error: `“${typed}” is not a unit this step knows. Answer in ${unit || "a plain number"}.` };
  if (given.kind !== expected.kind) {
    return { ok: false, error: `This step asks for ${KIND_WORDS[expected.kind]}${unit ? ` (${unit})` : ""}; ${given.canonical} is ${KIND_WORDS[given.kind]}.` };
  }
  value = (value * given.factor) / expected.factor;
  return { ok: true, value, typedUnit: given.canonical };
}

export function toleranceFor(expected: number, unit: string): number {
  return Math.max(ABSOLUTE_TOLERANCE[unit] ?? 0.005, Math.abs(expected) * RELATIVE_TOLERANCE);
}

export type AnswerMark =
  | { status: "right" | "wrong"; value: number; expected: number; tolerance: number; typedUnit?: string }
  | { status: "invalid"; error: string };

/** Right or wrong within the step's tolerance, or why the answer could not be read. */
export function markAnswer(raw: string, expected: number, unit: string): AnswerMark {
  const parsed = parseAnswer(raw, unit);
  if (!parsed.ok) return { status: "invalid", error: parsed.error };
  const tolerance = toleranceFor(expected, unit);
  // A hair of slack so a tolerance edge is not lost to binary fractions.
  const right = Math.abs(parsed.value - expected) <= tolerance * (1 + 1e-9);
  return { status: right ? "right" : "wrong", value: parsed.value, expected, tolerance, typedUnit: parsed.typedUnit };
}
