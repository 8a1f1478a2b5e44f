/**
 * The customer's question with a trailer: is it fine without weight distribution, and with it? The same rig read
 * twice by the same checks, once with weight distribution off and once on (its own figures, ratings and fender
 * heights as entered), each with its level and the limit that governs. Pure; the check screen shows both.
 */
import { evaluateRigFast } from "./evaluate";
import type { RigInput } from "./input";
import type { CheckId, EvaluateOptions, FastRigResult, Governing, VerdictLevel } from "./types";

export interface WdSide {
  /** Whether weight distribution is on in this reading. */
  used: boolean;
  /** Whether this side is the set-up the rig was entered with. */
  asEntered: boolean;
  level: VerdictLevel;
  governing?: Governing & { checkId: CheckId };
  over: CheckId[];
  adjust: CheckId[];
  incomplete: CheckId[];
}

export interface WdComparison {
  without: WdSide;
  with: WdSide;
}

function side(result: FastRigResult, used: boolean, asEntered: boolean): WdSide {
  return { used, asEntered, level: result.level, governing: result.governing, over: result.over, adjust: result.adjust, incomplete: result.incomplete };
}

/** Both readings of a trailer rig on a receiver, or null when nothing is towed or the trailer rides on a bed hitch. */
export function compareWeightDistribution(rig: RigInput, options?: EvaluateOptions): WdComparison | null {
  if (!rig.trailer) return null;
  // A fifth wheel or gooseneck sits over the axle: weight distribution is not part of such a rig.
  if (rig.trailer.hitchType && rig.trailer.hitchType !== "receiver") return null;
  const entered = !!rig.weightDistribution?.used;
  const off: RigInput = { ...rig, weightDistribution: { ...rig.weightDistribution, used: false } };
  const on: RigInput = { ...rig, weightDistribution: { ...rig.weightDistribution, used: true } };
  return {
    without: side(evaluateRigFast(off, options), false, !entered),
    with: side(evaluateRigFast(on, options), true, entered),
  };
}
