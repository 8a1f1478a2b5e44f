/**
 * Towmargin's calculation core. Pure TypeScript: no React, no Next.js, no database, no server code.
 * See docs/core.md.
 */
export { CORE_VERSION } from "./version";
export { evaluateRig, evaluateRigFast, evaluateRigSummary, DEFAULT_TIGHT_MARGIN_RATIO, DEFAULT_REFERENCE_ARM_IN, DEFAULT_FRONT_AXLE_LOSS_LIMIT } from "./evaluate";
export {
  rigInputSchema,
  parseRig,
  FIELD_RANGES,
  TRAILER_TYPES,
  ACCESSORY_TYPES,
  RECEIVER_SIZES,
  BALL_SIZES,
  BRAKE_TYPES,
  SHANK_SIZES,
  PIN_SIZES,
  type ShankSize,
  type PinSize,
  HITCH_TYPES,
  type HitchType,
  LICENCE_CATEGORIES,
  type LicenceCategory,
  type RigInput,
  type VehicleInput,
  type TrailerInput,
  type AccessoryInput,
  type ParseRigResult,
  type TrailerType,
  type AccessoryType,
} from "./input";
export { convertRig } from "./convert-rig";
export { compareWeightDistribution, type WdComparison, type WdSide } from "./compare-wd";
export { parseEvaluateRequest, parsePlace, type EvaluateRequest, type EvaluateDetail } from "./request";
export { tongueWeightByScale, tongueWeightByBeam, tongueWeightByPublicScale, DIRECT_SCALE_LIMIT_LB, type MeasureResult, type AxlePair } from "./measure";
export { GENERAL_CAUTIONS } from "./checks/verdict";
export { TONGUE_BANDS, BED_HITCH_BAND, CLASS_MAX_GTW, COMMON_DROPS_IN, MIN_BALL_BY_CLASS, RECEIVERS_BY_CLASS, PIN_FOR_RECEIVER } from "./reference";
export { KG_PER_LB, MM_PER_IN, type UnitSystem, type UnitString } from "./units";
export * from "./types";
export {
  hitchAllowance,
  type HitchAllowance,
  type HitchAllowanceInput,
  type HitchAllowanceRatings,
  type AllowanceLimit,
  type AllowanceRating,
} from "./hitch-allowance";
export * from "./rules";
