/**
 * Tongue-weight measuring helpers for the little calculator in the UI. Standalone: every value is in the
 * unit system given (lb & in, or kg & mm); the answer comes back in the same system with its steps.
 * Never throws: bad input gives `{ ok: false, message }`.
 */
import type { Quantity, Step } from "./types";
import { KG_PER_LB, type UnitSystem } from "./units";

export type MeasureResult<T> = ({ ok: true; tongueWeight: Quantity; steps: Step[]; cautions: string[] } & T) | { ok: false; message: string };

const okNum = (n: unknown): n is number => typeof n === "number" && Number.isFinite(n);

/** A bathroom scale read directly is good to about 300 lb. Source: several published how-to guides. */
export const DIRECT_SCALE_LIMIT_LB = 300;

/**
 * Direct method: the coupler rests on a scale at towing height. TW = reading.
 */
export function tongueWeightByScale(input: { scaleReading: number; units: UnitSystem }): MeasureResult<{ withinScaleRange: boolean }> {
  const { scaleReading, units } = input;
  if (!okNum(scaleReading) || scaleReading < 0) return { ok: false, message: "Enter the scale reading as a number of zero or more." };
  const wu = units === "metric" ? "kg" : "lb";
  const limit = units === "metric" ? DIRECT_SCALE_LIMIT_LB * KG_PER_LB : DIRECT_SCALE_LIMIT_LB;
  const withinScaleRange = scaleReading <= limit;
  return {
    ok: true,
    tongueWeight: { value: scaleReading, unit: wu },
    withinScaleRange,
    steps: [
      {
        id: "scale-direct",
        title: "Read the scale",
        formulaWords: "The tongue weight is the scale reading with the coupler on the scale at towing height",
        formula: "S",
        inputs: [{ symbol: "S", label: "Scale reading", value: scaleReading, unit: wu }],
        result: { symbol: "TW", value: scaleReading, unit: wu },
      },
    ],
    // Common practice, no published source: chocking before the tongue comes off the ball.
    cautions: withinScaleRange
      ? ["Chock the trailer's wheels before lifting the tongue off the ball.", "Keep the coupler at its towing height and the trailer loaded as it will travel."]
      : ["Chock the trailer's wheels before lifting the tongue off the ball.", "This is more than a bathroom scale reads reliably; use the beam method or a public scale."],
  };
}

/**
 * Beam (lever) method: a beam lies with one end on a block and the other on the scale; the jack stands on the
 * beam between them. Moments about the block: TW · a = S · (a + b), so TW = S · (a + b) ÷ a,
 * with a = block to jack and b = jack to scale.
 */
export function tongueWeightByBeam(input: {
  scaleReading: number;
  blockToJack: number;
  jackToScale: number;
  units: UnitSystem;
}): MeasureResult<{ multiplier: number }> {
  const { scaleReading, blockToJack, jackToScale, units } = input;
  if (!okNum(scaleReading) || scaleReading < 0) return { ok: false, message: "Enter the scale reading as a number of zero or more." };
  if (!okNum(blockToJack) || blockToJack <= 0) return { ok: false, message: "Enter the distance from the block to the jack; it must be more than zero." };
  if (!okNum(jackToScale) || jackToScale < 0) return { ok: false, message: "Enter the distance from the jack to the scale as zero or more." };
  const wu = units === "metric" ? "kg" : "lb";
  const lu = units === "metric" ? "mm" : "in";
  const multiplier = (blockToJack + jackToScale) / blockToJack;
  const tw = scaleReading * multiplier;
  return {
    ok: true,
    tongueWeight: { value: tw, unit: wu },
    multiplier,
    steps: [
      {
        id: "beam-ratio",
        title: "Lever ratio of the beam",
        formulaWords: "Whole span (block to scale) divided by the distance from the block to the jack",
        formula: "(a + b) / a",
        inputs: [
          { symbol: "a", label: "Block to jack", value: blockToJack, unit: lu },
          { symbol: "b", label: "Jack to scale", value: jackToScale, unit: lu },
        ],
        result: { symbol: "k", value: multiplier, unit: "" },
      },
      {
        id: "beam-tongue-weight",
        title: "Tongue weight from the reading",
        formulaWords: "Scale reading times the lever ratio",
        formula: "S * k",
        inputs: [
          { symbol: "S", label: "Scale reading", value: scaleReading, unit: wu },
          { symbol: "k", label: "Lever ratio", value: multiplier, unit: "" },
        ],
        result: { symbol: "TW", value: tw, unit: wu },
        // The block stands on the ground; only the pipe and the beam's end rest on the scale.
        note: "Subtract nothing if the scale was zeroed with the pipe and the beam's end resting on it; otherwise take off what it read with them alone.",
      },
    ],
    // Common practice, no published source: chocking and keeping clear of a jacked tongue.
    cautions: [
      "Chock the trailer's wheels before lifting the tongue off the ball, and keep hands and feet from under the tongue.",
      "Release the weight distribution before you measure.",
      "Keep the beam level and the coupler at its towing height.",
    ],
  };
}

export interface AxlePair {
  front: number;
  rear: number;
}

/**
 * Public-scale method: weigh the vehicle's axles unhitched and hitched. The gain on the vehicle is the tongue
 * load it carries; the per-axle changes show how it is shared (the front usually loses weight).
 * With weight distribution released the gain is the tongue weight; with it engaged, part of the tongue
 * weight goes to the trailer's axles and the gain is the share the vehicle carries.
 */
export function tongueWeightByPublicScale(input: {
  unhitched: AxlePair;
  hitched: AxlePair;
  weightDistributionEngaged?: boolean;
  units: UnitSystem;
}): MeasureResult<{ frontChange: Quantity; rearChange: Quantity; vehicleShare: Quantity }> {
  const { unhitched, hitched, units } = input;
  const vals = [unhitched?.front, unhitched?.rear, hitched?.front, hitched?.rear];
  if (!vals.every((v) => okNum(v) && v >= 0)) return { ok: false, message: "Enter all four axle weights as numbers of zero or more." };
  const wu = units === "metric" ? "kg" : "lb";
  const df = hitched.front - unhitched.front;
  const dr = hitched.rear - unhitched.rear;
  const tw = df + dr;
  if (tw < 0) return { ok: false, message: "The hitched vehicle weighs less than unhitched; weigh again with the same load and fuel." };
  const wd = !!input.weightDistributionEngaged;
  return {
    ok: true,
    tongueWeight: { value: tw, unit: wu },
    frontChange: { value: df, unit: wu },
    rearChange: { value: dr, unit: wu },
    vehicleShare: { value: tw, unit: wu },
    steps: [
      {
        id: "public-scale-front",
        title: "Change on the front axle",
        formulaWords: "Front axle hitched minus front axle unhitched",
        formula: "F_h - F_u",
        inputs: [
          { symbol: "F_h", label: "Front axle, hitched", value: hitched.front, unit: wu },
          { symbol: "F_u", label: "Front axle, unhitched", value: unhitched.front, unit: wu },
        ],
        result: { symbol: "dF", value: df, unit: wu },
      },
      {
        id: "public-scale-rear",
        title: "Change on the rear axle",
        formulaWords: "Rear axle hitched minus rear axle unhitched",
        formula: "R_h - R_u",
        inputs: [
          { symbol: "R_h", label: "Rear axle, hitched", value: hitched.rear, unit: wu },
          { symbol: "R_u", label: "Rear axle, unhitched", value: unhitched.rear, unit: wu },
        ],
        result: { symbol: "dR", value: dr, unit: wu },
      },
      {
        id: "public-scale-tongue",
        title: wd ? "Load the vehicle carries from the trailer" : "Tongue weight",
        formulaWords: "Sum of the two axle changes",
        formula: "dF + dR",
        inputs: [
          { symbol: "dF", label: "Change on the front axle", value: df, unit: wu },
          { symbol: "dR", label: "Change on the rear axle", value: dr, unit: wu },
        ],
        result: { symbol: wd ? "W_veh" : "TW", value: tw, unit: wu },
        note: wd ? "With weight distribution engaged, part of the tongue weight rests on the trailer's axles: weigh again with it released for the tongue weight itself." : undefined,
      },
    ],
    cautions: ["Weigh both times with the same people, cargo and fuel aboard.", wd ? "Weight distribution was engaged: this is not the whole tongue weight." : "Weight distribution released: the gain is the tongue weight."],
  };
}
