/**
 * Check 3, tongue-weight measuring: works out the tongue weight from the rig's measurements (scale, beam or
 * public scale) and says whether the figure the checks use was weighed.
 */
import { EPS, fP, fW, NO_STEPS, NO_TEXT, qW, type Ctx } from "../context";
import { tongueWeightNote, type Derived } from "../derive";
import { tongueWeightByBeam, tongueWeightByPublicScale, tongueWeightByScale } from "../measure";
import { CHOCK_CAUTION } from "../advice";
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
    result.actual = qW(c, d.tw ?? measured);
    result.status = "within";
    if (entered !== undefined && t.tongueWeightBasis !== "estimated") {
      // Two figures said to be weighed should agree; a gap beyond the tight threshold is flagged (the checks use the larger).
      const gap = Math.abs(entered - measured);
      const ref = Math.max(entered, measured);
      const ratio = gap <= EPS * Math.max(1, ref) ? 0 : gap / ref;
      if (ratio > c.tight + EPS) result.status = "tight";
    }
  } else if (d.twMeasureMissing.length) {
    // A half-entered beam measurement is no measurement: it never becomes a number.
    result.missing = d.twMeasureMissing.map(need);
    if (entered !== undefined && t.tongueWeightBasis === "measured") {
      result.method = "entered";
      result.actual = qW(c, entered);
    }
  } else if (entered !== undefined && t.tongueWeightBasis === "measured") {
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
    cautions.unshift(CHOCK_CAUTION);
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
    advice.push(`The entered tongue weight (${fW(c, entered)}) and the measurement (${fW(c, measured)}) disagree: weigh again and enter the measured figure. Until then every check uses the larger.`);
  if (d.twMeasureMissing.length)
    advice.push("Measure both beam distances (block to jack, and jack to scale): with only one, the reading is not the tongue weight.");
  else if (result.status === "incomplete") advice.push(HOW_TO);
  if (result.status === "incomplete") cautions.unshift(CHOCK_CAUTION);
  const note = tongueWeightNote(d, c);
  if (note) cautions.push(note);
  result.advice = advice;

  result.message = d.twMeasureMissing.length
    ? `The beam measurement lacks a distance (${d.twMeasureMissing.map((f) => (f.endsWith("jackToScale") ? "jack to scale" : "block to jack")).join(", ")}): the scale reading alone is not the tongue weight.`
    : result.status === "incomplete"
      ? entered !== undefined
        ? t.tongueWeightBasis === "estimated"
          ? `The tongue weight of ${fW(c, entered)} is an estimate; weigh it to be sure.`
          : `The tongue weight of ${fW(c, entered)} was not marked as weighed, so it is taken as an estimate; weigh it to be sure.`
        : "The tongue weight has not been weighed."
      : measured !== undefined
        ? `Measured tongue weight: ${fW(c, measured)}` +
          (entered !== undefined && result.status === "tight"
            ? `, ${fP(Math.abs(entered - measured) / Math.max(entered, measured))} away from the ${fW(c, entered)} entered; the checks use ${fW(c, d.tw!)}.`
            : entered !== undefined && t.tongueWeightBasis === "estimated"
              ? `; the checks use it rather than the ${fW(c, entered)} estimate.`
              : ".")
        : `Tongue weight entered as weighed: ${fW(c, entered ?? 0)}.`;
  return result;
}
