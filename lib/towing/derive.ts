/**
 * Quantities several checks share, computed once per evaluation from the canonical (lb, in) rig.
 */
import { lessOrEqual } from "./context";
import type { RigInput, TrailerType } from "./input";

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

export interface Derived {
  rig: RigInput;
  hasTrailer: boolean;
  hasAccessory: boolean;
  wdUsed: boolean;
  gtw?: number;
  /** Tongue weight the checks use: entered, else measured. */
  tw?: number;
  twEstimated: boolean;
  /** Tongue weight from the rig's measurements, if any. */
  twMeasured?: number;
  twMethod?: "scale" | "beam" | "public-scale";
  band: { min: number; max: number; source: "vehicle" | "trailer-type" };
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
  /** Rear axle to the point where the hitch load acts. */
  overhang?: number;
  /** Per-evaluation memo for figures several checks share (rating set, restoration). */
  cache: { ratingSet?: unknown; wdState?: unknown };
}

export function derive(rig: RigInput): Derived {
  const v = rig.vehicle;
  const t = rig.trailer;
  const a = rig.accessory;
  const hasTrailer = !!t;
  const hasAccessory = !!a && !t;
  const wdUsed = hasTrailer && !!rig.weightDistribution?.used;

  let twMeasured: number | undefined;
  let twMethod: Derived["twMethod"];
  const m = t?.tongueMeasurement;
  if (m) {
    if (m.blockToJack !== undefined && m.jackToScale !== undefined && m.jackToScale > 0) {
      // Physics: statics, moments about the block: TW · a = reading · (a + b)
      twMeasured = (m.scaleReading * (m.blockToJack + m.jackToScale)) / m.blockToJack;
      twMethod = "beam";
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

  const tw = hasTrailer ? (t!.tongueWeight ?? twMeasured) : undefined;
  const twEstimated = hasTrailer && t!.tongueWeight !== undefined && t!.tongueWeightBasis === "estimated";
  const band = v.tongueShareBand
    ? { min: v.tongueShareBand.min / 100, max: v.tongueShareBand.max / 100, source: "vehicle" as const }
    : { ...TONGUE_BANDS[t?.type ?? "other"], source: "trailer-type" as const };

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

  let overhang: number | undefined;
  if (v.rearAxleToHitch !== undefined) {
    if (hasAccessory) {
      overhang =
        a!.loadCenterFromPin !== undefined ? v.rearAxleToHitch + (rig.extender?.length ?? 0) + a!.loadCenterFromPin : undefined;
    } else overhang = v.rearAxleToHitch;
  }

  return {
    rig,
    hasTrailer,
    hasAccessory,
    wdUsed,
    gtw: t?.grossTrailerWeight,
    tw,
    twEstimated,
    twMeasured,
    twMethod,
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
    overhang,
    cache: {},
  };
}
