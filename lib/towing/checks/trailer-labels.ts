/**
 * The trailer's own labels: its GVWR (the plated maximum mass, `trailer.mam`) against its gross weight, and its
 * axles' ratings (GAWR per axle × axles) against the load they carry.
 *
 * Physics: statics, vertical balance of the trailer standing hitched: its axles carry the gross trailer weight
 * less what rests on the hitch, W_ax = GTW − TW. Weight distribution hands part of the hitch load back to the
 * trailer's axles (neglected by the statics: a caution says so). Either label exceeded is a rating: over.
 */
import { fW, iN, iW, NO_STEPS, NO_TEXT, qW, rW, statusOf, withMissing, worst, type Ctx, keepTightestWeight } from "../context";
import { needTongueWeight, tongueWeightNote, type Derived } from "../derive";
import { need } from "../missing";
import type { CheckStatus, MissingField, Step, TrailerLabelsResult } from "../types";

const CAUTIONS = [
  "The trailer's GVWR and axle ratings are on its own plate or label (often on the tongue or the front of the frame): the lowest figure that applies governs.",
  "Load the trailer evenly side to side and keep the heavy items over or just ahead of its axles.",
];

/** When two tongue-weight figures disagree, the trailer's axles are judged with the lighter one: said once. */
export function lighterNote(d: Derived, c: Ctx): string | undefined {
  if (d.twLow === undefined || d.tw === undefined || d.twLow === d.tw) return undefined;
  return `The tongue-weight figures disagree (${fW(c, d.twLow)} and ${fW(c, d.tw)}): the trailer's own axles and tyres are judged with the lighter, which leaves more on them, until it is weighed again.`;
}

export function checkTrailerLabels(d: Derived, c: Ctx): TrailerLabelsResult | null {
  if (!d.hasTrailer) return null;
  const t = d.rig.trailer!;
  const missing: MissingField[] = [];
  const steps: Step[] = [];
  const statuses: CheckStatus[] = [];
  const result: TrailerLabelsResult = {
    id: "trailer-labels",
    title: "Trailer's own ratings",
    status: "incomplete",
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    estimated: d.twEstimated || undefined,
    steps: NO_STEPS,
  };
  if (d.gtw === undefined) missing.push(need("trailer.grossTrailerWeight"));
  if (t.mam === undefined) missing.push(need("trailer.mam"));
  if (t.axleRating === undefined) missing.push(need("trailer.axleRating"));
  if (t.axleCount === undefined) missing.push(need("trailer.axleCount"));
  if (d.tw === undefined) missing.push(...needTongueWeight(d));

  const keepTightest = keepTightestWeight(c, result);
  const compare = (id: string, label: string, actual: number, limit: number) => {
    statuses.push(statusOf(actual, limit, c.tight));
    keepTightest(id, label, actual, limit);
  };

  const gtw = d.gtw;
  const pinLabel = d.bedHitch ? "Pin weight" : "Tongue weight";
  if (gtw !== undefined && t.mam !== undefined) {
    compare("trailer.mam", "Trailer GVWR", gtw, t.mam);
    if (c.detail)
      steps.push({
        id: "trailer-gvwr-room",
        title: "Room left on the trailer's GVWR",
        formulaWords: "The trailer's GVWR (its plated maximum) minus its gross weight",
        formula: "GVWR_t - GTW",
        inputs: [iW(c, "GVWR_t", "Trailer GVWR", t.mam), iW(c, "GTW", "Gross trailer weight", gtw)],
        result: rW(c, "M_GVWR_t", t.mam - gtw),
      });
  }
  let onAxles: number | undefined;
  // The lighter tongue weight the figures allow leaves the most on the trailer's axles: the safe side here.
  const tw = d.twLow;
  if (gtw !== undefined && tw !== undefined) {
    onAxles = gtw - tw;
    result.axleLoad = qW(c, onAxles);
    if (c.detail)
      steps.push({
        id: "trailer-axle-load",
        title: "Load on the trailer's axles",
        formulaWords: `Gross trailer weight minus the ${pinLabel.toLowerCase()} resting on the hitch`,
        formula: "GTW - TW",
        inputs: [iW(c, "GTW", "Gross trailer weight", gtw), iW(c, "TW", pinLabel, tw)],
        result: rW(c, "W_ax", onAxles),
        note: lighterNote(d, c) ?? tongueWeightNote(d, c),
      });
  }
  if (t.axleRating !== undefined && t.axleCount !== undefined) {
    const capacity = t.axleRating * t.axleCount;
    result.axleCapacity = qW(c, capacity);
    if (c.detail)
      steps.push({
        id: "trailer-axle-capacity",
        title: "What the trailer's axles are rated for",
        formulaWords: "Each axle's rating times the number of axles",
        formula: "n_ax * GAWR_t",
        inputs: [iN("n_ax", "Trailer axles", t.axleCount, ""), iW(c, "GAWR_t", "Trailer axle rating (each axle)", t.axleRating)],
        result: rW(c, "C_ax", capacity),
      });
    if (onAxles !== undefined) {
      compare("trailer.axleRating", "Trailer axle ratings", onAxles, capacity);
      if (c.detail)
        steps.push({
          id: "trailer-axle-room",
          title: "Room left on the trailer's axles",
          formulaWords: "The axles' ratings together minus the load on them",
          formula: "C_ax - W_ax",
          inputs: [iW(c, "C_ax", "Trailer axle ratings together", capacity), iW(c, "W_ax", "Load on the trailer's axles", onAxles)],
          result: rW(c, "M_ax", capacity - onAxles),
        });
    }
  }
  result.status = withMissing(statuses.length ? worst(statuses) : "incomplete", missing);
  if (missing.length) result.missing = missing;
  if (!c.detail) return result;
  result.steps = steps;

  const cautions = CAUTIONS.slice();
  if (d.wdUsed) cautions.push("Weight distribution hands part of the hitch load back to the trailer's axles: they carry a little more than worked out here. Weigh the trailer's axles hitched, bars set, to be sure.");
  if (t.axleCount !== undefined && t.axleCount > 1) cautions.push("Several axles share the load only when the trailer rides level: a nose-up or nose-down trailer loads one axle more than the other.");
  const note = lighterNote(d, c) ?? tongueWeightNote(d, c);
  if (note) cautions.push(note);
  result.cautions = cautions;

  const advice: string[] = [];
  const overGvwr = gtw !== undefined && t.mam !== undefined && statusOf(gtw, t.mam, c.tight) === "over";
  const capacity = t.axleRating !== undefined && t.axleCount !== undefined ? t.axleRating * t.axleCount : undefined;
  const overAxles = onAxles !== undefined && capacity !== undefined && statusOf(onAxles, capacity, c.tight) === "over";
  if (overGvwr) advice.push(`Take ${fW(c, gtw! - t.mam!)} or more out of the trailer: its own GVWR is a limit no hitch or vehicle can raise.`);
  if (overAxles) advice.push(`The trailer's axles carry ${fW(c, onAxles! - capacity!)} more than they are rated for: lighten the trailer (moving load forward onto the tongue only shifts it onto the vehicle, within the tongue-share band at most).`);
  if (result.status === "tight") advice.push("Little room is left on the trailer's own ratings: weigh it loaded before each trip.");
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;

  const g = result.governing;
  result.message =
    !g || !result.actual || !result.limit
      ? "Enter the trailer's GVWR and its axle rating and count, from its plate, to check the trailer's own limits."
      : result.status === "over"
        ? overGvwr
          ? `The trailer weighs ${fW(c, gtw!)}, over its own GVWR of ${fW(c, t.mam!)}.`
          : `The trailer's axles carry ${fW(c, onAxles!)}, over their ${fW(c, capacity!)} together.`
        : `${g.label === "Trailer GVWR" ? "The trailer's GVWR has" : "The trailer's axles have"} the least room: ${fW(c, result.actual.value / c.u.weightFactor)} of ${fW(c, result.limit.value / c.u.weightFactor)}.` +
          (result.status === "incomplete" ? " Some figures are missing." : "");
  return result;
}
