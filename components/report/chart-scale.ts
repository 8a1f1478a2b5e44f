/** Small helpers shared by the report's hand-drawn charts. Pure functions, no runtime import from the core. */
import type { CheckStatus } from "@/lib/towing/types";

export interface Scale {
  /** Top of the axis (a round number at or above every value drawn). */
  top: number;
  ticks: number[];
}

/** A zero-based axis with about `count` round steps (1, 2, 2.5 or 5 × a power of ten) covering `max`. */
export function zeroScale(max: number, count = 4): Scale {
  if (!Number.isFinite(max) || max <= 0) return { top: 1, ticks: [0, 1] };
  const raw = max / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const n = raw / power;
  const step = (n <= 1 ? 1 : n <= 2 ? 2 : n <= 2.5 ? 2.5 : n <= 5 ? 5 : 10) * power;
  const top = Math.ceil(max / step - 1e-9) * step;
  const ticks: number[] = [];
  for (let i = 0; i <= Math.round(top / step); i++) ticks.push(i * step);
  return { top, ticks };
}

/** Tone classes per status; always drawn beside a word, never alone. */
export const FILL: Record<CheckStatus, string> = {
  within: "fill-within",
  tight: "fill-tight",
  adjust: "fill-adjust",
  over: "fill-over",
  incomplete: "fill-unknown",
};

/**
 * Status of one load against one limit, for a chart row the core does not grade on its own (an axle):
 * over above the limit, tight when less than `tightRatio` of the limit is left.
 */
export function rowStatus(load: number, limit: number, tightRatio: number): CheckStatus {
  if (!(limit > 0)) return "incomplete";
  const room = (limit - load) / limit;
  if (room < 0) return "over";
  return room < tightRatio ? "tight" : "within";
}

/** Splits a label into lines of at most `maxChars` characters, at spaces. */
export function wrapWords(text: string, maxChars: number): string[] {
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(/\s+/)) {
    if (!line) line = word;
    else if (line.length + 1 + word.length <= maxChars) line += ` ${word}`;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line) lines.push(line);
  return lines;
}

/** Rough width of a line of text in the chart's units (a sans face averages about half an em). */
export function textWidth(text: string, fontSize: number): number {
  return text.length * fontSize * 0.52;
}
