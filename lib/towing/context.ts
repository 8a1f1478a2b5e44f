/**
 * What every check shares: the unit set for display, the tight threshold, whether to build steps and texts,
 * and small helpers for quantities, statuses and steps. All inputs to these helpers are canonical (lb, in).
 */
import type { CheckStatus, Governing, Margin, MissingField, Quantity, Step, StepInput } from "./types";
import { lengthOut, weightOut, type UnitSet, type UnitString } from "./units";

/** Relative tolerance for comparisons, so a rig converted between unit systems lands on the same side of a limit. */
export const EPS = 1e-9;

export interface Ctx {
  u: UnitSet;
  /** Build steps, messages, advice and cautions (false for evaluateRigFast and the compact answer). */
  detail: boolean;
  tight: number;
  /** Accessory reference lever arm, canonical inches. */
  referenceArm: number;
  /** Share of the front axle's unhitched load it may lose before the front-axle check reads tight (0.1 = 10 %). */
  frontLossLimit: number;
}

export const NO_TEXT: string[] = [];
export const NO_STEPS: Step[] = [];

// ---- quantities in the rig's units ----
export function qW(c: Ctx, lb: number): Quantity {
  return { value: weightOut(lb, c.u), unit: c.u.weight };
}
export function qL(c: Ctx, inches: number): Quantity {
  return { value: lengthOut(inches, c.u), unit: c.u.length };
}
export function qP(ratio: number): Quantity {
  return { value: ratio * 100, unit: "%" };
}

// ---- formatting for sentences (the UI does its own rounding for numbers it shows) ----
/** A whole number with thousands separators: 12345 → "12,345". */
function group(n: number): string {
  if (n < 0) return "-" + group(-n);
  if (n < 1000 || !Number.isFinite(n)) return String(n);
  const rest = n % 1000;
  return group(Math.floor(n / 1000)) + (rest < 10 ? ",00" : rest < 100 ? ",0" : ",") + rest;
}
export function fW(c: Ctx, lb: number): string {
  return `${group(Math.round(weightOut(lb, c.u)))} ${c.u.weight}`;
}
export function fL(c: Ctx, inches: number): string {
  const v = lengthOut(inches, c.u);
  return c.u.length === "mm" ? `${group(Math.round(v))} mm` : `${Math.round(v * 10) / 10} in`;
}
export function fP(ratio: number): string {
  return `${Math.round(ratio * 1000) / 10} %`;
}
export function fA(deg: number): string {
  return `${Math.round(deg * 10) / 10}°`;
}

// ---- statuses ----
/** a < b by more than the tolerance: used to pick the governing item so that near-ties resolve the same way in both unit systems. */
export function lessThan(a: number, b: number): boolean {
  if (!Number.isFinite(b)) return a < b;
  return a < b - Math.max(TINY, EPS * Math.abs(b));
}

export function lessOrEqual(a: number, b: number): boolean {
  return a <= b + EPS * Math.max(1, Math.abs(b));
}

/**
 * Status of `actual` against an upper `limit`: over below zero margin, tight under the threshold. For a limit
 * that is a set-up allowance rather than a rating, pass `beyond = "adjust"`; for a common-practice convention
 * with no published source, pass `beyond = "tight"` (a convention never makes "over" by itself).
 */
export function statusOf(actual: number, limit: number, tight: number, beyond: "over" | "adjust" | "tight" = "over"): CheckStatus {
  const margin = limit - actual;
  const tol = EPS * Math.max(1, Math.abs(limit), Math.abs(actual));
  if (margin < -tol) return beyond;
  const ratio = limit > TINY ? margin / limit : margin > tol ? 1 : 0;
  if (ratio < tight - EPS) return "tight";
  return "within";
}

/** A limit smaller than this (in lb or in) counts as zero: no ratio is taken against it. */
export const TINY = 1e-9;

/** Bound for margin ratios, so a vanishingly small limit never yields Infinity. */
export const RATIO_FLOOR = -1e6;

export function ratioOf(actual: number, limit: number): number {
  const margin = limit - actual;
  if (limit > TINY) return Math.max(RATIO_FLOOR, margin / limit);
  return margin > EPS ? 1 : margin >= -EPS ? 0 : -1;
}

export function marginW(c: Ctx, actual: number, limit: number): Margin {
  return { value: weightOut(limit - actual, c.u), unit: c.u.weight, ratio: ratioOf(actual, limit) };
}
export function marginL(c: Ctx, actual: number, limit: number): Margin {
  return { value: lengthOut(limit - actual, c.u), unit: c.u.length, ratio: ratioOf(actual, limit) };
}

const RANK: Record<CheckStatus, number> = { within: 0, tight: 1, adjust: 2, incomplete: 3, over: 4 };

/** Severity rank of a status (within 0 … over 4), the order of STATUS_ORDER in types.ts. */
export function rankOf(s: CheckStatus): number {
  return RANK[s];
}

/** Worst of statuses: over beats incomplete beats adjust beats tight beats within. */
export function worst(statuses: CheckStatus[]): CheckStatus {
  let w: CheckStatus = "within";
  for (const s of statuses) if (RANK[s] > RANK[w]) w = s;
  return w;
}

/**
 * A known "over" stands even when data is missing: more data can only add limits. Anything else with data
 * missing is incomplete (a set-up finding is still in the check's advice).
 */
export function withMissing(status: CheckStatus, missing: MissingField[]): CheckStatus {
  if (status === "over") return "over";
  return missing.length ? "incomplete" : status;
}

export function govW(c: Ctx, id: string, label: string, lb: number): Governing {
  return { id, label, value: weightOut(lb, c.u), unit: c.u.weight };
}

/**
 * Keeps the tightest of a check's weight limits on its result: each actual weight against its limit becomes
 * the result's actual, limit, margin and governing item when its margin ratio is the smallest so far.
 */
export function keepTightestWeight(c: Ctx, result: { actual?: Quantity; limit?: Quantity; margin?: Margin; governing?: Governing }) {
  let best = Infinity;
  return (id: string, label: string, actual: number, limit: number): void => {
    const ratio = ratioOf(actual, limit);
    if (!lessThan(ratio, best)) return;
    best = ratio;
    result.actual = qW(c, actual);
    result.limit = qW(c, limit);
    result.margin = marginW(c, actual, limit);
    result.governing = govW(c, id, label, limit);
  };
}

// ---- step inputs ----
export function iW(c: Ctx, symbol: string, label: string, lb: number): StepInput {
  return { symbol, label, value: weightOut(lb, c.u), unit: c.u.weight };
}
export function iL(c: Ctx, symbol: string, label: string, inches: number): StepInput {
  return { symbol, label, value: lengthOut(inches, c.u), unit: c.u.length };
}
export function iN(symbol: string, label: string, value: number, unit: UnitString): StepInput {
  return { symbol, label, value, unit };
}
export function rW(c: Ctx, symbol: string, lb: number) {
  return { symbol, value: weightOut(lb, c.u), unit: c.u.weight };
}
export function rL(c: Ctx, symbol: string, inches: number) {
  return { symbol, value: lengthOut(inches, c.u), unit: c.u.length };
}
export function rN(symbol: string, value: number, unit: UnitString) {
  return { symbol, value, unit };
}

/** Keep a number finite whatever arrives (inputs are validated, but a result must never carry NaN). */
export function finite(n: number): number {
  return Number.isFinite(n) ? n : 0;
}
