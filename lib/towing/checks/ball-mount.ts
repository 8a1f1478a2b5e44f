/**
 * Check 8, ball mount: the rise or drop that keeps the trailer level.
 * Drop = receiver height (top of the opening) − allowance for rear squat − coupler height (bottom, trailer
 * level); negative is a rise. Source: boating publication how-to; the formula is geometry.
 */
import { fL, iL, lessOrEqual, marginL, NO_STEPS, NO_TEXT, qL, rL, statusOf, type Ctx } from "../context";
import type { Derived } from "../derive";
import { need } from "../missing";
import { COMMON_DROPS_IN } from "../reference";
import type { BallMountResult, MissingField, Step } from "../types";

/** How far off level is still fine: about 1 in at the coupler. Common practice, no published source. */
export const LEVEL_TOLERANCE_IN = 1;

/** The common size nearest to a needed drop (inches, negative for a rise). */
export function nearestCommonDrop(dropIn: number): number {
  const mag = Math.abs(dropIn);
  let best = 0;
  for (const s of COMMON_DROPS_IN) if (Math.abs(s - mag) < Math.abs(best - mag) - 1e-9) best = s;
  return dropIn < 0 ? -best : best;
}

function wordFor(c: Ctx, x: number): string {
  return x < 0 ? `${fL(c, -x)} rise` : `${fL(c, x)} drop`;
}

const CAUTIONS = [
  "Measure on level ground with the vehicle loaded as it will travel and the trailer level.",
  "A trailer that rides nose-up or nose-down loads its axles unevenly and can sway or brake badly.",
  "A drop mount turned over becomes a rise mount only if its maker allows it.",
];

export function checkBallMount(d: Derived, c: Ctx): BallMountResult | null {
  // A fifth wheel or gooseneck has no ball mount: the check does not apply.
  if (!d.hasTrailer || d.bedHitch) return null;
  const { rig } = d;
  const recv = rig.hitch?.receiverHeight;
  const coupler = rig.trailer!.couplerHeight;
  const squat = rig.ballMount?.squatAllowance ?? 0;
  const drop = rig.ballMount?.drop;
  const missing: MissingField[] = [];
  if (recv === undefined) missing.push(need("hitch.receiverHeight"));
  if (coupler === undefined) missing.push(need("trailer.couplerHeight"));
  if (drop === undefined) missing.push(need("ballMount.drop"));
  const result: BallMountResult = {
    id: "ball-mount",
    title: "Ball mount rise or drop",
    status: "incomplete",
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    steps: NO_STEPS,
  };
  const steps: Step[] = [];
  let needed: number | undefined;
  if (recv !== undefined && coupler !== undefined) {
    needed = recv - squat - coupler;
    result.dropNeeded = qL(c, needed);
    result.nearestCommonDrop = qL(c, nearestCommonDrop(needed));
    if (c.detail)
      steps.push({
        id: "drop-needed",
        title: "Drop needed to ride level",
        formulaWords: "Receiver height minus the expected squat minus the coupler height (negative means a rise)",
        formula: "H_r - s - H_c",
        inputs: [iL(c, "H_r", "Receiver height", recv), iL(c, "s", "Expected squat", squat), iL(c, "H_c", "Coupler height", coupler)],
        result: rL(c, "D", needed),
      });
    if (drop !== undefined) {
      const off = Math.abs(drop - needed);
      result.actual = qL(c, off);
      result.limit = qL(c, LEVEL_TOLERANCE_IN);
      result.margin = marginL(c, off, LEVEL_TOLERANCE_IN);
      result.governing = { id: "level.tolerance", label: "Off-level allowance at the coupler", value: qL(c, LEVEL_TOLERANCE_IN).value, unit: c.u.length };
      // Off level is a set-up to adjust (a ball mount with another drop), never a rating exceeded.
      result.status = statusOf(off, LEVEL_TOLERANCE_IN, c.tight, "adjust");
      if (c.detail)
        steps.push({
          id: "level-error",
          title: "How far off level",
          formulaWords: "Difference between the ball mount's drop and the drop needed",
          formula: "abs(D_mount - D)",
          inputs: [iL(c, "D_mount", "Ball mount drop", drop), iL(c, "D", "Drop needed", needed)],
          result: rL(c, "e", off),
        });
    }
  }
  if (missing.length) result.missing = missing;
  if (!c.detail) return result;
  result.steps = steps;
  result.cautions = CAUTIONS;
  const advice: string[] = [];
  const word = (x: number) => wordFor(c, x);
  // Too little drop leaves the ball high and the trailer nose-up; too much, nose-down.
  const tilt = needed !== undefined && drop !== undefined ? (drop < needed ? "nose-up" : "nose-down") : "";
  if (needed !== undefined && (drop === undefined || !lessOrEqual(Math.abs(drop - needed), LEVEL_TOLERANCE_IN) || result.status === "tight")) {
    // Advise only a size that this same check would pass; say so when no common size does.
    const common = nearestCommonDrop(needed);
    const commonStatus = statusOf(Math.abs(common - needed), LEVEL_TOLERANCE_IN, c.tight, "adjust");
    if (commonStatus === "within" && (drop === undefined || Math.abs(common - drop) > 1e-9))
      advice.push(`Use a ball mount with a ${word(common)} (nearest common size).`);
    else if (commonStatus === "within")
      advice.push(`A ${word(needed)} would level the trailer exactly; the ${word(common)} fitted is the nearest common size.`);
    else
      advice.push(
        `No common ball mount levels this trailer: a ${word(needed)} is needed and the nearest common size, a ${word(common)}, still leaves it ${fL(c, Math.abs(common - needed))} off level. Use an adjustable ball mount, or change the coupler's or the receiver's height.`,
      );
  }
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  result.message =
    needed === undefined
      ? "Measure the receiver height and the coupler height to size the ball mount."
      : drop === undefined
        ? `A ${word(needed)} keeps the trailer level; the nearest common size is a ${word(nearestCommonDrop(needed))}.`
        : result.status === "adjust"
          ? `The ball mount's ${word(drop)} leaves the trailer ${fL(c, Math.abs(drop - needed))} off level, ${tilt}; a ${word(needed)} is needed.`
          : result.status === "tight"
            ? `The ball mount's ${word(drop)} leaves the trailer ${fL(c, Math.abs(drop - needed))} off level, ${tilt}, at the edge of the ${fL(c, LEVEL_TOLERANCE_IN)} allowed; a ${word(needed)} would level it.`
          : Math.abs(drop - needed) < 0.05
            ? `The ball mount's ${word(drop)} keeps the trailer level.`
            : `The ball mount's ${word(drop)} keeps the trailer within ${fL(c, Math.abs(drop - needed))} of level.`;
  return result;
}
