/**
 * The advice and cautions several checks share, in one place so each rule reads the same wherever it fires:
 * - A vehicle's own rating cannot be bought past: the advice is a lighter load or another vehicle; a stronger
 *   part is advice only for a part.
 * - Weight distribution is advised only when the ratings with weight distribution hold, and always with what it
 *   does not change.
 * - "Take weight out" always keeps the tongue share inside its band (moving load rearward invites sway).
 * - Brake cautions fire when the brakes are none or not known, above the lowest common threshold.
 * - The hands-on cautions (common practice, no published source) where their step is shown.
 * Texts only: nothing here changes a status.
 */
import { fW, lessOrEqual, type Ctx } from "./context";
import type { Derived } from "./derive";
import { KG_PER_LB } from "./units";

/** True for the vehicle maker's own ratings (tow rating, tongue-weight limit, GVWR, GAWR, GCWR): no part raises them. */
export function isVehicleRating(id: string): boolean {
  return id.startsWith("vehicle.");
}

/** Advice for a rating link that is exceeded. */
export function overLinkAdvice(c: Ctx, id: string, label: string, limits: "gross-trailer-weight" | "tongue-weight", needed: number): string {
  if (id === "vehicle.towRatingUnbraked")
    return `${label} is exceeded: no part can raise the vehicle's own rating. Tow a lighter trailer, a trailer with brakes (within the vehicle's braked rating), or use a vehicle rated for at least ${fW(c, needed)} unbraked.`;
  if (isVehicleRating(id))
    return limits === "tongue-weight"
      ? `${label} is exceeded: no part can raise the vehicle's own rating. Take weight out of the trailer, keeping the tongue share inside its band, or use a vehicle rated for it.`
      : `${label} is exceeded: no part can raise the vehicle's own rating. Tow a lighter trailer or use a vehicle rated for at least ${fW(c, needed)}.`;
  return `${label} is exceeded: fit a part rated for at least ${fW(c, needed)}, provided the vehicle's own ratings allow it, or lighten the trailer.`;
}

/** What weight distribution does not change: said wherever it is advised. */
export const WD_DOES_NOT_CHANGE =
  "Weight distribution raises no GCWR, GVWR or payload limit and takes no load off the ball: those still have to hold.";

export type WdRatingsState = "hold" | "exceeded" | "unknown";

/**
 * Whether the ratings that apply with weight distribution cover this trailer: the vehicle's and the hitch's
 * figures with weight distribution, the weight-distribution system's own, and the parts it does not relieve
 * (ball, coupler, chains). "unknown" when the vehicle's figures with weight distribution are not entered.
 */
export function wdRatingsState(d: Derived): WdRatingsState {
  const { rig, gtw, tw } = d;
  const v = rig.vehicle;
  const h = rig.hitch;
  const t = rig.trailer;
  const onGtw = [v.towRatingWd, h?.gtwRatingWd, t?.ballRating, t?.couplerRating, t?.safetyChainRating, rig.receiverAdapter?.gtwRating, rig.ballSleeve?.gtwRating, t?.brakes === "none" ? v.towRatingUnbraked : undefined];
  const onTw = [v.tongueWeightLimitWd, h?.twRatingWd, rig.weightDistribution?.tongueRating, rig.extender?.twRating, rig.receiverAdapter?.twRating, rig.ballSleeve?.twRating];
  for (const r of onGtw) if (r !== undefined && gtw !== undefined && !lessOrEqual(gtw, r)) return "exceeded";
  for (const r of onTw) if (r !== undefined && tw !== undefined && !lessOrEqual(tw, r)) return "exceeded";
  if (v.towRatingWd === undefined || v.tongueWeightLimitWd === undefined || gtw === undefined || tw === undefined) return "unknown";
  return "hold";
}

/** Advice to fit (or keep) weight distribution, worded by what the ratings with it say; none when they are exceeded. */
export function wdAdvice(d: Derived, why: string): string[] {
  const state = wdRatingsState(d);
  if (state === "exceeded")
    return [`Weight distribution will not do it: this trailer is over the ratings that apply with it as well. ${why} needs a lighter trailer or another vehicle.`];
  if (state === "unknown")
    return [
      `Weight distribution may help only if the vehicle's and the hitch's ratings with weight distribution (owner's manual, hitch label) cover this trailer: enter them to check. ${WD_DOES_NOT_CHANGE}`,
    ];
  return [`Fit weight distribution rated for this tongue weight: the ratings with it cover this trailer. ${WD_DOES_NOT_CHANGE}`];
}

/** The way to lighten a hitch load without inviting sway. */
export const TAKE_WEIGHT_OUT = "take weight out of the trailer, keeping the tongue share inside its band (shifting load rearward instead invites sway)";

/** 750 kg: the lowest brake threshold among the examples the product cites (Source: gov.uk; Australian Design Rule 38). */
export const BRAKE_NOTE_LB = 750 / KG_PER_LB;

/**
 * Brake cautions for a trailer above the lowest common threshold whose brakes are none or not entered, and the
 * hands-on ones for electric brakes. The legal thresholds themselves are local law: the product cites examples.
 */
export function brakeCautions(d: Derived): string[] {
  const t = d.rig.trailer;
  if (!t || d.gtw === undefined) return [];
  const examples = "for example 3,000 lb in California and Florida, 750 kg in the UK";
  const heavy = d.gtw >= BRAKE_NOTE_LB;
  if (heavy && t.brakes === "none")
    return [
      `This trailer has no brakes. Many places require them at this weight (${examples}), with a brake controller in the vehicle for electric brakes and a breakaway device that sets them if the trailer comes off: check local law.`,
    ];
  if (heavy && t.brakes === undefined)
    return [
      `The trailer's brakes were not entered. Many places require brakes at this weight (${examples}), with a brake controller in the vehicle for electric brakes and a breakaway device that sets them if the trailer comes off: check what it has, and local law.`,
    ];
  // Common practice, no published source.
  if (t.brakes === "electric")
    return ["Set the brake controller's gain for the loaded trailer, and clip the breakaway cable to the vehicle, never to a safety chain."];
  return [];
}

/** Hands-on cautions for hitching up (common practice, no published source). */
export const HITCHING_CAUTIONS = [
  "Close the coupler's latch fully on the ball and put its pin or lock through it.",
  "Attach the breakaway cable, when the trailer has one, to the vehicle on its own point, not to a safety chain.",
  "Test the trailer's lights (tail, brake, turn) with someone watching before moving off.",
  "Recheck the coupler, chains, pins and bolts after the first few miles, then at every stop.",
];

/** Hands-on caution for spring bars (common practice, no published source). */
export const SPRING_BAR_CAUTION =
  "Spring bars under tension store a great deal of force: set and release them only with the maker's handle, and keep hands, feet and face out of the bar's path.";

/** Said wherever more rise is advised for a rack or carrier (common practice, no published source). */
export const RISE_CAUTION =
  "More shank rise (or a riser) often lowers the rack maker's rating and can hide the lights or the number plate: check the rack's label and that both stay in view.";

/** Said wherever jacking a trailer's tongue is part of the step (common practice, no published source). */
export const CHOCK_CAUTION = "Chock the trailer's wheels before lifting the tongue off the ball, and keep hands and feet from under the tongue.";
