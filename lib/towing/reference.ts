/**
 * The trade's tables the core reads: each row with its source beside it. Single figures that belong to one
 * check (a tolerance, a default target) stay beside that check; docs/sources.md says what each source is.
 */
import type { TrailerType } from "./input";

/** Tongue-weight share bands by trailer type, as ratios. */
export const TONGUE_BANDS: Record<TrailerType, { min: number; max: number }> = {
  // Source: GM and Nissan owner's manuals (conventional trailers 10–15 %)
  utility: { min: 0.1, max: 0.15 },
  "enclosed-cargo": { min: 0.1, max: 0.15 },
  travel: { min: 0.1, max: 0.15 },
  "car-hauler": { min: 0.1, max: 0.15 },
  "horse-livestock": { min: 0.1, max: 0.15 },
  other: { min: 0.1, max: 0.15 },
  // Source: BoatUS (an engineering instructor's guidance), boat trailers 7–12 %
  boat: { min: 0.07, max: 0.12 },
};

/** Pin (kingpin) weight share for a fifth wheel or gooseneck, as ratios. */
export const BED_HITCH_BAND = {
  // Source: GM owner's manual (fifth-wheel and gooseneck: 15–25 %)
  min: 0.15,
  max: 0.25,
} as const;

/** Maximum gross trailer weight (lb) by hitch class. */
export const CLASS_MAX_GTW: Record<number, number> = {
  // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684), every row
  1: 2000,
  2: 3500,
  3: 5000,
  4: 10000,
};

/** Ball mounts come in whole-inch rises and drops up to about 12 in. Common practice, no published source. */
export const COMMON_DROPS_IN = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12];

/** Nominal sizes named as the trade stamps them, in inches (for comparing one size with another). */
export const SIZE_IN: Record<string, number> = {
  "1/2": 0.5,
  "5/8": 0.625,
  "3/4": 0.75,
  "1": 1,
  "1-1/4": 1.25,
  "1-7/8": 1.875,
  "2": 2,
  "2-1/2": 2.5,
  "2-5/16": 2.3125,
  "3": 3,
};

/**
 * Smallest ball diameter (a BALL_SIZES name) by trailer class, the class read from the trailer's gross weight
 * (CLASS_MAX_GTW). Class 4 sets no diameter: its ball and bolt must match the strength its coupler needs.
 */
export const MIN_BALL_BY_CLASS: Record<number, string | undefined> = {
  // Source: 15 CRR-NY 57.5 Table 1 (minimum ball diameter, inches, where a ball-type hitch is used), every row
  1: "1-7/8",
  2: "2",
  3: "2",
  4: undefined,
};

/** Receiver openings a hitch class usually has. Common practice, no published source (SAE J684 sets no opening). */
export const RECEIVERS_BY_CLASS: Record<number, readonly string[]> = {
  1: ["1-1/4"],
  2: ["1-1/4", "2"],
  3: ["2"],
  4: ["2", "2-1/2"],
  5: ["2", "2-1/2", "3"],
};

/** The hitch pin that goes through each receiver opening. Common practice, no published source. */
export const PIN_FOR_RECEIVER: Record<string, string> = {
  "1-1/4": "1/2",
  "2": "5/8",
  "2-1/2": "5/8",
  "3": "5/8",
};
