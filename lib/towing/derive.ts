/**
 * Quantities several checks share, computed once per evaluation from the canonical (lb, in) rig.
 */
import { fW, lessOrEqual, type Ctx } from "./context";
import { need } from "./missing";
import { BED_HITCH_BAND, TONGUE_BANDS } from "./reference";
import type { MissingField } from "./types";
import type { HitchType, RigInput } from "./input";

export interface Derived {
  rig: RigInput;
  hasTrailer: boolean;
  hasAccessory: boolean;
  /** How the trailer hitches (receiver when not given). */
  hitchType: HitchType;
  /** A fifth wheel or gooseneck in the bed: no ball mount, receiver, extender or weight distribution applies. */
  bedHitch: boolean;
  /** Weight distribution engaged: only on a receiver rig (it does not apply to a bed hitch). */
  wdUsed: boolean;
  gtw?: number;
  /**
   * Tongue weight every check uses. Weighed beats estimated: the measurement when the entered figure is an
   * estimate; the larger of the two when both claim to be weighed or the entered figure's basis is not given.
   */
  tw?: number;
  /**
   * The lighter tongue weight the figures allow: what the trailer's own axles and tyres are judged with (a lighter
   * tongue leaves more on them). The same as `tw` except when two figures disagree and `tw` is the larger.
   */
  twLow?: number;
  /** True when `tw` is an estimate (entered as one, or entered without saying it was weighed, and not weighed). */
  twEstimated: boolean;
  /** Where `tw` comes from. */
  twSource?: "entered" | "measured" | "larger";
  /** Tongue weight from the rig's measurements, if any. */
  twMeasured?: number;
  twMethod?: "scale" | "beam" | "public-scale";
  /** Fields a started measurement still lacks (one beam distance without the other): it gives no number. */
  twMeasureMissing: string[];
  /** Fields that would give a tongue weight: the measurement's missing distance, else the tongue weight. */
  twNeed: string[];
  band: { min: number; max: number; source: "vehicle" | "trailer-type" | "place" | "hitch-type" };
  /** Vertical load on the hitch: the tongue weight, or accessory + its load. */
  hitchLoad?: number;
  hitchLoadEstimated: boolean;
  hardware: number;
  hardwareKnown: boolean;
  curb?: number;
  /** Payload capacity and where it comes from. */
  payloadCapacity?: number;
  payloadSource?: "label" | "gvwr-curb";
  weighedTotal?: number;
  /** Vehicle weight as loaded, unhitched. */
  loadedVehicle?: number;
  /** Rear axle to the receiver pin hole (the installer's measured figure), when known. */
  pin?: number;
  /**
   * Rear axle to the point where the hitch load acts: the ball (pin + extender + ball mount), the accessory's
   * load, or the bed hitch (signed: negative ahead of the rear axle).
   */
  overhang?: number;
  /** How the overhang was reached: from the pin, the ball's own figure from an older input, or the bed hitch's figure. */
  overhangFrom?: "pin" | "ball-as-measured" | "bed-hitch";
  /** Fields the overhang still needs. */
  overhangNeed: string[];
  /** Per-evaluation memo for figures several checks share (rating set, restoration). */
  cache: { ratingSet?: unknown; wdState?: unknown; axles?: DrivenAxles | null };
}

/**
 * Each vehicle axle's load as the axle-loads check compares it with the GAWRs (canonical lb): the front the larger
 * of unhitched and hitched, the rear as driven (with weight distribution unmeasured, the heaviest, and the lightest
 * it could be beside it). The tyres check reads the same figures.
 */
export interface DrivenAxles {
  front: number;
  rear: number;
  rearLightest?: number;
  estimated: boolean;
  /** "weighed": the hitched figures were weighed; "statics": worked from the unhitched weighing. */
  basis: "weighed" | "statics";
}

export function derive(rig: RigInput): Derived {
  const v = rig.vehicle;
  const t = rig.trailer;
  const a = rig.accessory;
  const hasTrailer = !!t;
  const hasAccessory = !!a && !t;
  const hitchType: HitchType = t?.hitchType ?? "receiver";
  const bedHitch = hasTrailer && hitchType !== "receiver";
  const wdUsed = hasTrailer && !bedHitch && !!rig.weightDistribution?.used;

  let twMeasured: number | undefined;
  let twMethod: Derived["twMethod"];
  const twMeasureMissing: string[] = [];
  const m = t?.tongueMeasurement;
  if (m) {
    const hasA = m.blockToJack !== undefined;
    const hasB = m.jackToScale !== undefined;
    if (hasA && hasB) {
      // Physics: statics, moments about the block: TW · a = reading · (a + b)
      twMeasured = (m.scaleReading * (m.blockToJack! + m.jackToScale!)) / m.blockToJack!;
      twMethod = "beam";
    } else if (hasA || hasB) {
      // A beam reading with one distance is not a tongue weight: the reading could be a third of it or less.
      twMeasureMissing.push(hasA ? "trailer.tongueMeasurement.jackToScale" : "trailer.tongueMeasurement.blockToJack");
    } else {
      twMeasured = m.scaleReading;
      twMethod = "scale";
    }
  } else if (v.axleWeights && v.axleWeightsHitched) {
    const diff =
      v.axleWeightsHitched.front + v.axleWeightsHitched.rear - (v.axleWeights.front + v.axleWeights.rear);
    if (diff >= 0) {
      twMeasured = diff;
      twMethod = "public-scale";
    }
  }

  let tw: number | undefined;
  let twSource: Derived["twSource"];
  let twEstimated = false;
  if (hasTrailer) {
    const entered = t!.tongueWeight;
    if (entered === undefined) {
      tw = twMeasured;
      if (tw !== undefined) twSource = "measured";
    } else if (twMeasured === undefined) {
      tw = entered;
      twSource = "entered";
      // Only a figure said to be weighed counts as weighed; without a basis it is taken as an estimate.
      twEstimated = t!.tongueWeightBasis !== "measured";
    } else if (t!.tongueWeightBasis === "estimated") {
      tw = twMeasured;
      twSource = "measured";
    } else if (lessOrEqual(entered, twMeasured) && lessOrEqual(twMeasured, entered)) {
      tw = twMeasured;
      twSource = "measured";
    } else {
      // Two weighings (or a figure of unknown basis) that disagree: judge on the heavier, the safe side.
      tw = Math.max(entered, twMeasured);
      twSource = "larger";
    }
  }
  const twNeed = hasTrailer && tw === undefined ? (twMeasureMissing.length ? twMeasureMissing.slice() : ["trailer.tongueWeight"]) : [];
  // A bed hitch has its own pin-weight band; the vehicle's band entered for a receiver does not apply to it.
  const band: Derived["band"] = bedHitch
    ? { ...BED_HITCH_BAND, source: "hitch-type" }
    : v.tongueShareBand
      ? { min: v.tongueShareBand.min / 100, max: v.tongueShareBand.max / 100, source: "vehicle" }
      : { ...TONGUE_BANDS[t?.type ?? "other"], source: "trailer-type" };

  let hitchLoad: number | undefined;
  if (hasTrailer) hitchLoad = tw;
  else if (hasAccessory && a!.weight !== undefined && a!.loadWeight !== undefined) hitchLoad = a!.weight + a!.loadWeight;

  const hardwareKnown = rig.load?.hitchHardware !== undefined;
  const hardware = rig.load?.hitchHardware ?? 0;

  const curb =
    v.curbWeight ?? (v.gvwr !== undefined && v.payloadLabel !== undefined ? v.gvwr - v.payloadLabel : undefined);
  let payloadCapacity: number | undefined;
  let payloadSource: Derived["payloadSource"];
  const fromCurb = v.gvwr !== undefined && v.curbWeight !== undefined ? v.gvwr - v.curbWeight : undefined;
  // Go by the lower figure when both the label and GVWR − curb are known.
  if (v.payloadLabel !== undefined && (fromCurb === undefined || lessOrEqual(v.payloadLabel, fromCurb))) {
    payloadCapacity = v.payloadLabel;
    payloadSource = "label";
  } else if (fromCurb !== undefined) {
    payloadCapacity = fromCurb;
    payloadSource = "gvwr-curb";
  }

  const weighedTotal = v.axleWeights ? v.axleWeights.front + v.axleWeights.rear : undefined;
  const occ = rig.load?.occupants;
  const cargo = rig.load?.cargo;
  const loadedVehicle =
    weighedTotal ?? (curb !== undefined && occ !== undefined && cargo !== undefined ? curb + occ + cargo + hardware : undefined);

  // Geometry: the ball sits the extender's length and the ball mount's length behind the pin hole.
  const ext = rig.extender?.length ?? 0;
  // An older input's rearAxleToHitch is the pin for an accessory (parseRig migrates it; this covers unparsed input).
  const pin = v.rearAxleToPin ?? (hasAccessory || !hasTrailer ? v.rearAxleToHitch : undefined);
  let overhang: number | undefined;
  let overhangFrom: Derived["overhangFrom"];
  const overhangNeed: string[] = [];
  if (hasAccessory) {
    if (pin === undefined) overhangNeed.push("vehicle.rearAxleToPin");
    if (a!.loadCenterFromPin === undefined) overhangNeed.push("accessory.loadCenterFromPin");
    if (pin !== undefined && a!.loadCenterFromPin !== undefined) {
      overhang = pin + ext + a!.loadCenterFromPin;
      overhangFrom = "pin";
    }
  } else if (bedHitch) {
    // The pin weight acts at the bed hitch itself: no ball mount or extender lies between.
    if (v.rearAxleToBedHitch !== undefined) {
      overhang = v.rearAxleToBedHitch;
      overhangFrom = "bed-hitch";
    } else overhangNeed.push("vehicle.rearAxleToBedHitch");
  } else if (hasTrailer) {
    const len = rig.ballMount?.length;
    if (pin !== undefined && len !== undefined) {
      overhang = pin + ext + len;
      overhangFrom = "pin";
    } else if (v.rearAxleToHitch !== undefined && v.rearAxleToPin === undefined) {
      overhang = v.rearAxleToHitch;
      overhangFrom = "ball-as-measured";
    } else {
      if (pin === undefined) overhangNeed.push("vehicle.rearAxleToPin");
      if (len === undefined) overhangNeed.push("ballMount.length");
    }
  }

  return {
    rig,
    hasTrailer,
    hasAccessory,
    hitchType,
    bedHitch,
    wdUsed,
    gtw: t?.grossTrailerWeight,
    tw,
    twLow: twSource === "larger" && t?.tongueWeight !== undefined && twMeasured !== undefined ? Math.min(t.tongueWeight, twMeasured) : tw,
    twEstimated,
    twSource,
    twMeasured,
    twMethod,
    twMeasureMissing,
    twNeed,
    band,
    hitchLoad,
    hitchLoadEstimated: twEstimated,
    hardware,
    hardwareKnown,
    curb,
    payloadCapacity,
    payloadSource,
    weighedTotal,
    loadedVehicle,
    pin,
    overhang,
    overhangFrom,
    overhangNeed,
    cache: {},
  };
}

/** What the checks must still be given to know the tongue weight (the missing beam distance, or the figure itself). */
export function needTongueWeight(d: Derived): MissingField[] {
  return d.twNeed.map(need);
}

/**
 * What the statics of the axles must still be given: the load on the hitch (the tongue weight, or a rack and
 * its load), the wheelbase and the overhang. The axle loads and the front-axle loss ask for the same figures.
 */
export function needHitchLever(d: Derived): MissingField[] {
  const rig = d.rig;
  const missing: MissingField[] = [];
  if (d.hitchLoad === undefined) {
    if (d.hasTrailer) missing.push(...needTongueWeight(d));
    else {
      if (rig.accessory!.weight === undefined) missing.push(need("accessory.weight"));
      if (rig.accessory!.loadWeight === undefined) missing.push(need("accessory.loadWeight"));
    }
  }
  if (rig.vehicle.wheelbase === undefined) missing.push(need("vehicle.wheelbase"));
  for (const f of d.overhangNeed) missing.push(need(f));
  return missing;
}

/** One sentence every check that uses the tongue weight carries: which figure it judges on, and why. */
export function tongueWeightNote(d: Derived, c: Ctx): string | undefined {
  const t = d.rig.trailer;
  if (!t || d.tw === undefined) return undefined;
  const entered = t.tongueWeight;
  if (d.twSource === "larger" && entered !== undefined && d.twMeasured !== undefined)
    return `The entered tongue weight (${fW(c, entered)}) and the measurement (${fW(c, d.twMeasured)}) disagree: the checks use the larger, ${fW(c, d.tw)}, until it is weighed again.`;
  if (d.twSource === "measured" && entered !== undefined && t.tongueWeightBasis === "estimated")
    return `The checks use the measured tongue weight (${fW(c, d.tw)}), not the ${fW(c, entered)} estimate entered.`;
  if (d.twSource === "entered" && d.twEstimated)
    return t.tongueWeightBasis === "estimated"
      ? `The tongue weight of ${fW(c, d.tw)} is an estimate; weigh it to be sure.`
      : `The tongue weight of ${fW(c, d.tw)} was not marked as weighed, so it is taken as an estimate; weigh it to be sure.`;
  return undefined;
}
