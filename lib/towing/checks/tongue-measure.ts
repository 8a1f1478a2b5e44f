/**
 * Check 3, tongue-weight measuring: works out the tongue weight from the rig's measurements (scale, beam or
 * public scale) and says whether the figure the checks use was weighed.
 */
import { EPS, fP, fW, NO_STEPS, NO_TEXT, qW, type Ctx } from "../context";
import type { Derived } from "../derive";
import { tongueWeightByBeam, tongueWeightByPublicScale, tongueWeightByScale } from "../measure";
import { need } from "../missing";
import type { TongueMeasureResult } from "../types";
import { lengthOut, weightOut } from "../units";

const HOW_TO =
  "Weigh the tongue with the trailer loaded as it will travel: a tongue scale; a bathroom scale up to about 300 lb (136 kg); above that a beam on a block and the scale; or a public scale, vehicle hitched and unhitched.";

export function checkTongueMeasure(d: Derived, c: Ctx): TongueMeasureResult | null {
  if (!d.hasTrailer) return null;
  const t = d.rig.trailer!;
  const v = d.rig.vehicle;
  const result: TongueMeasureResult = {
    id: "tongue-measure",
    title: "Tongue-weight measurement",
    status: "incomplete",
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    steps: NO_STEPS,
  };
  const entered = t.tongueWeight;
  const measured = d.twMeasured;
  if (measured !== undefined) {
    result.method = d.twMethod;
    result.measuredTongueWeight = qW(c, measured);
    result.actual = qW(c, measured);
    result.status = "within";
    if (entered !== undefined) {
      // The entered figure and the measurement should agree; a gap beyond the tight threshold is flagged.
      const gap = Math.abs(entered - measured);
      const ref = Math.max(entered, measured);
      const ratio = gap <= EPS * Math.max(1, ref) ? 0 : gap / ref;
      result.limit = qW(c, entered);
      result.margin = { value: weightOut(entered - measured, c.u), unit: c.u.weight, ratio: 1 - ratio };
      if (ratio > c.tight + EPS) result.status = "tight";
    }
  } else if (entered !== undefined && t.tongueWeightBasis !== "estimated") {
    result.method = "entered";
    result.actual = qW(c, entered);
    result.status = "within";
  } else {
    result.missing = [need("trailer.tongueWeight")];
    result.estimated = entered !== undefined || undefined;
  }
  if (!c.detail) return result;

  const u = c.u.system;
  const cautions = ["Release the weight distribution before weighing the tongue.", "Weigh with the trailer loaded as it will travel; the tongue weight changes with every load."];
  const m = t.tongueMeasurement;
  if (result.method === "beam" && m) {
    const r = tongueWeightByBeam({
      scaleReading: weightOut(m.scaleReading, c.u),
      blockToJack: lengthOut(m.blockToJack!, c.u),
      jackToScale: lengthOut(m.jackToScale!, c.u),
      units: u,
    });
    if (r.ok) result.steps = r.steps;
  } else if (result.method === "scale" && m) {
    const r = tongueWeightByScale({ scaleReading: weightOut(m.scaleReading, c.u), units: u });
    if (r.ok) {
      result.steps = r.steps;
      cautions.push(...r.cautions);
    }
  } else if (result.method === "public-scale" && v.axleWeights && v.axleWeightsHitched) {
    const r = tongueWeightByPublicScale({
      unhitched: { front: weightOut(v.axleWeights.front, c.u), rear: weightOut(v.axleWeights.rear, c.u) },
      hitched: { front: weightOut(v.axleWeightsHitched.front, c.u), rear: weightOut(v.axleWeightsHitched.rear, c.u) },
      units: u,
    });
    if (r.ok) result.steps = r.steps;
    cautions.push("Weigh the hitched vehicle with weight distribution released; with it engaged the gain is less than the tongue weight.");
  }
  result.cautions = cautions;
  const advice: string[] = [];
  if (result.status === "tight" && entered !== undefined && measured !== undefined)
    advice.push(`The entered tongue weight (${fW(c, entered)}) and the measurement (${fW(c, measured)}) disagree: weigh again and enter the measured figure.`);
  if (result.status === "incomplete") advice.push(HOW_TO);
  if (t.tongueWeightBasis === undefined && result.method === "entered")
    cautions.push("Make sure the tongue weight entered was weighed, not taken from a brochure.");
  result.advice = advice;

  result.message =
    result.status === "incomplete"
      ? entered !== undefined
        ? `The tongue weight of ${fW(c, entered)} is an estimate; weigh it to be sure.`
        : "The tongue weight has not been weighed."
      : measured !== undefined
        ? `Measured tongue weight: ${fW(c, measured)}` +
          (entered !== undefined && result.status === "tight"
            ? `, ${fP(Math.abs(entered - measured) / Math.max(entered, measured))} away from the ${fW(c, entered)} entered.`
            : ".")
        : `Tongue weight entered as weighed: ${fW(c, entered ?? 0)}.`;
  return result;
}
