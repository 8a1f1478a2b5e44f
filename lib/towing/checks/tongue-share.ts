/**
 * Check 2, tongue-weight share: TW ÷ GTW against the band for the trailer type (or the vehicle maker's band).
 */
import { EPS, fP, fW, iN, iW, NO_STEPS, NO_TEXT, qP, qW, rN, rW, type Ctx } from "../context";
import { needTongueWeight, tongueWeightNote, type Derived } from "../derive";
import { need } from "../missing";
import type { CheckStatus, MissingField, Step, TongueShareResult } from "../types";

const CAUTIONS = [
  "Too little weight on the tongue lets the trailer sway, and sway can grow until control is lost.",
  "Too much weight on the tongue overloads the vehicle's rear axle and lifts the front, so steering and braking feel light.",
  "Where the vehicle's manual states its own band, that band wins.",
  "Weigh the tongue with the trailer loaded as it will travel and weight distribution released.",
];

/** Said for a fifth wheel or gooseneck: its band, and where the vehicle's own figures come in. */
const BED_BAND_CAUTION =
  "A fifth wheel or gooseneck puts 15 to 25 % of the trailer on the pin, as vehicle makers' owner's manuals give it; a tongue-weight band entered for the vehicle is for a receiver and is not used here. Where the vehicle's manual gives its own pin-weight figures, they win.";

export function checkTongueShare(d: Derived, c: Ctx): TongueShareResult | null {
  if (!d.hasTrailer) return null;
  const { band, gtw, tw } = d;
  const missing: MissingField[] = [];
  if (gtw === undefined) missing.push(need("trailer.grossTrailerWeight"));
  if (tw === undefined) missing.push(...needTongueWeight(d));
  const result: TongueShareResult = {
    id: "tongue-share",
    title: d.bedHitch ? "Pin-weight share" : "Tongue-weight share",
    status: "incomplete",
    band,
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    missing: missing.length ? missing : undefined,
    estimated: d.twEstimated || undefined,
    steps: NO_STEPS,
  };
  const steps: Step[] = [];
  let low = false;
  let high = false;
  if (gtw !== undefined && tw !== undefined) {
    const share = tw / gtw;
    result.share = share;
    low = share < band.min * (1 - EPS);
    high = share > band.max * (1 + EPS);
    // Margin to the nearer edge of the band, as a share of that edge.
    const lowM = (share - band.min) / band.min;
    const highM = (band.max - share) / band.max;
    const nearLow = lowM <= highM;
    const edge = nearLow ? band.min : band.max;
    const ratio = nearLow ? lowM : highM;
    // Outside the band the load must move before the trailer tows: a set-up to adjust, not a rating exceeded.
    // A place's band (a guideline) reads the same way: adjust, never over.
    const status: CheckStatus = low || high ? "adjust" : ratio < c.tight - EPS ? "tight" : "within";
    result.status = status;
    result.actual = qP(share);
    result.limit = qP(edge);
    result.margin = { value: (nearLow ? share - band.min : band.max - share) * 100, unit: "%", ratio };
    result.governing = {
      id: nearLow ? "band.min" : "band.max",
      label: nearLow ? "Lowest tongue-weight share" : "Highest tongue-weight share",
      value: edge * 100,
      unit: "%",
    };
    if (c.detail)
      steps.push({
        id: "tongue-share",
        title: "Share of the trailer on the tongue",
        formulaWords: "Tongue weight divided by gross trailer weight, as a percentage",
        formula: "TW / GTW * 100",
        inputs: [iW(c, "TW", "Tongue weight", tw), iW(c, "GTW", "Gross trailer weight", gtw)],
        result: rN("s", share * 100, "%"),
        note: tongueWeightNote(d, c),
      });
  } else if (gtw !== undefined) {
    result.estimatedTongueWeight = { low: qW(c, gtw * band.min), high: qW(c, gtw * band.max) };
    result.estimated = true;
    if (c.detail)
      steps.push({
        id: "tongue-estimate",
        title: "Estimated tongue weight (not weighed)",
        formulaWords: "Gross trailer weight times the lowest and the highest share of the band",
        formula: "GTW * [s_min, s_max] / 100",
        inputs: [iW(c, "GTW", "Gross trailer weight", gtw), iN("s_min", "Lowest share", band.min * 100, "%"), iN("s_max", "Highest share", band.max * 100, "%")],
        result: rW(c, "TW_est_max", gtw * band.max),
        note: `An estimate, not a measurement: between ${fW(c, gtw * band.min)} and ${fW(c, gtw * band.max)} if the trailer is loaded correctly.`,
      });
  }
  if (!c.detail) return result;
  result.steps = steps;
  const note = tongueWeightNote(d, c);
  const cautions = d.bedHitch ? [...CAUTIONS, BED_BAND_CAUTION] : CAUTIONS.slice();
  if (note) cautions.push(note);
  result.cautions = cautions;
  const bandText = `${fP(band.min)} to ${fP(band.max)}`;
  const advice: string[] = [];
  if (low) advice.push("Move load forward in the trailer, ahead of its axle, until the tongue carries more; then weigh again.");
  if (high) advice.push("Move load back towards the trailer's axle, or carry less ahead of it, until the share is inside the band; then weigh again.");
  if (result.status === "tight") advice.push("The share is near the edge of the band: load the trailer the same way every trip and weigh it.");
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  if (result.share !== undefined) {
    const what = d.bedHitch ? "The pin" : "The tongue";
    result.message = low
      ? `${what} carries ${fP(result.share)} of the trailer, below the ${bandText} band: a sway risk.`
      : high
        ? `${what} carries ${fP(result.share)} of the trailer, above the ${bandText} band: it risks overloading the rear axle and lightening the steering; check the axle loads.`
        : `${what} carries ${fP(result.share)} of the trailer, inside the ${bandText} band.`;
  } else if (result.estimatedTongueWeight && gtw !== undefined) {
    result.message = `Not weighed yet: a tongue weight of about ${fW(c, gtw * band.min)} to ${fW(c, gtw * band.max)} would fit the ${bandText} band.`;
  } else result.message = "Enter the trailer's gross weight and tongue weight.";
  return result;
}
