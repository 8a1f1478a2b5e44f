/** Result types of the core. Every number is unrounded, finite, and in the rig's own unit system. */
import type { UnitString, UnitSystem } from "./units";
import type { AppliedRules, LocalRulesResult, Place } from "./rules/types";

/**
 * A check's status. `over`: a rating is exceeded (do not tow). `adjust`: the set-up needs changing before the
 * rig tows (a ball mount's drop, spring bars to re-set, a raised shank, the trailer's load to move); no rating is
 * exceeded. `tight`: within, with less room than the organisation's threshold (or a common-practice caution).
 * `incomplete`: a figure it needs is missing. Severity: over > incomplete > adjust > tight > within.
 */
export type CheckStatus = "within" | "tight" | "adjust" | "over" | "incomplete";
/**
 * The rig's level. `incomplete` ("not confirmed"): no rating is exceeded and nothing is known to need adjusting
 * on the checks with data, but some checks lack data (or none has any): never read as within or tight.
 */
export type VerdictLevel = "within" | "tight" | "adjust" | "over" | "incomplete";

/** Every level a rig can read, in the order lists and filters show them. */
export const VERDICT_LEVELS = ["within", "tight", "adjust", "over", "incomplete"] as const satisfies readonly VerdictLevel[];

/** Every status from the least to the most severe, as the verdict ranks them. */
export const STATUS_ORDER = ["within", "tight", "adjust", "incomplete", "over"] as const;

export const CHECK_IDS = [
  "weakest-link",
  "tongue-share",
  "tongue-measure",
  "payload",
  "combined-weight",
  "axle-loads",
  "front-axle-loss",
  "trailer-labels",
  "tyres",
  "weight-distribution",
  "ball-mount",
  "hardware-fit",
  "accessory-fit",
  "envelope",
  "local-rules",
] as const;
export type CheckId = (typeof CHECK_IDS)[number];

export interface Quantity {
  value: number;
  unit: UnitString;
}

export interface Margin {
  /** limit − actual, in the check's unit (negative when over). */
  value: number;
  unit: UnitString;
  /** margin ÷ limit (0.1 = 10 % of the limit left). */
  ratio: number;
}

export interface Governing {
  /** Stable id of the item that governs, e.g. "hitch.twRating". */
  id: string;
  label: string;
  value: number;
  unit: UnitString;
}

export interface StepInput {
  symbol: string;
  label: string;
  value: number;
  unit: UnitString;
}

/** One worked step: ready for a trainer to show. `formula` parses with mathjs. */
export interface Step {
  id: string;
  title: string;
  formulaWords: string;
  formula: string;
  inputs: StepInput[];
  result: { symbol: string; value: number; unit: UnitString };
  note?: string;
}

export interface MissingField {
  /** Dotted path of the input field, e.g. "vehicle.gvwr". */
  field: string;
  what: string;
  where: string;
}

export interface CheckResult {
  id: CheckId;
  title: string;
  status: CheckStatus;
  actual?: Quantity;
  limit?: Quantity;
  margin?: Margin;
  governing?: Governing;
  /** One plain sentence. */
  message: string;
  advice: string[];
  cautions: string[];
  missing?: MissingField[];
  /** True when a number in this check is an estimate, not a measurement. */
  estimated?: boolean;
  steps: Step[];
}

export interface Link {
  id: string;
  label: string;
  /** What the link limits: the gross trailer weight or the tongue weight. */
  limits: "gross-trailer-weight" | "tongue-weight";
  rating: Quantity;
  actual?: Quantity;
  margin?: Margin;
  status: CheckStatus;
}

export interface WeakestLinkResult extends CheckResult {
  id: "weakest-link";
  links: Link[];
  governingGrossTrailerWeight?: Governing;
  governingTongueWeight?: Governing;
}

export interface TongueShareResult extends CheckResult {
  id: "tongue-share";
  share?: number;
  /** "place": the band of the place's rule set (a guideline, never over on its own). */
  /** "hitch-type": the fifth-wheel and gooseneck pin-weight band. */
  band: { min: number; max: number; source: "vehicle" | "trailer-type" | "place" | "hitch-type" };
  /** Tongue weight estimated from the band when it was not weighed. */
  estimatedTongueWeight?: { low: Quantity; high: Quantity };
}

export interface TongueMeasureResult extends CheckResult {
  id: "tongue-measure";
  method?: "scale" | "beam" | "public-scale" | "entered";
  measuredTongueWeight?: Quantity;
}

export interface AxleLoads {
  front: Quantity;
  rear: Quantity;
}

export interface AxleLoadsResult extends CheckResult {
  id: "axle-loads";
  frontChange?: Quantity;
  rearChange?: Quantity;
  unhitched?: AxleLoads;
  hitched?: AxleLoads;
  withWd?: AxleLoads;
}

export interface FrontAxleLossResult extends CheckResult {
  id: "front-axle-loss";
  /** Load the front axle loses as driven (negative: it gains). */
  loss?: Quantity;
  /** The loss as a share of the front axle's unhitched load. */
  share?: number;
  /** The limit as a share of the unhitched front axle (the organisation's setting). */
  limitShare: number;
  /** Where the loss comes from: statics, or the hitched weighing. */
  basis?: "statics" | "weighed";
  /** The loss left at the weight-distribution target, when weight distribution is not used but could be. */
  lossAtWdTarget?: Quantity;
}

export interface TrailerLabelsResult extends CheckResult {
  id: "trailer-labels";
  /** Load on the trailer's axles: the gross trailer weight less the tongue (pin) weight. Statics. */
  axleLoad?: Quantity;
  /** The trailer's axle ratings together: each axle's rating × axles. */
  axleCapacity?: Quantity;
}

export interface TyresResult extends CheckResult {
  id: "tyres";
  /** The vehicle's axle loads the tyres are compared with (the axle-loads check's figures). */
  vehicleAxles?: AxleLoads;
}

export interface HardwareFitResult extends CheckResult {
  id: "hardware-fit";
  /** Each fit: `ball-size`, `receiver-class`, `shank-hole`, `pin`. `waitingFor`: what a part still needs, in words. */
  parts: Array<{ id: string; label: string; status: CheckStatus; actual?: Quantity; limit?: Quantity; waitingFor?: string }>;
}

export interface WeightDistributionResult extends CheckResult {
  id: "weight-distribution";
  restoration?: number;
  target: number;
  targetFenderHeight?: Quantity;
  required: boolean;
  advisable: boolean;
  withWd?: AxleLoads;
}

export interface BallMountResult extends CheckResult {
  id: "ball-mount";
  /** Drop needed to ride level (negative: a rise). */
  dropNeeded?: Quantity;
  nearestCommonDrop?: Quantity;
}

export interface AccessoryFitResult extends CheckResult {
  id: "accessory-fit";
  /** Each part of the fit. `waitingFor`: what a part checked in part still needs, in words (e.g. the load's distance for its lever effect). */
  parts: Array<{ id: string; label: string; status: CheckStatus; actual?: Quantity; limit?: Quantity; margin?: Margin; waitingFor?: string }>;
  accessoryAngle?: Quantity;
  groundClearance?: Quantity;
  shankRiseNeeded?: Quantity;
}

export interface EnvelopeLine {
  id: string;
  label: string;
  /** "gtw-max": GTW = value; "tw-max": TW = value; "share": TW = slope × GTW. */
  kind: "gtw-max" | "tw-max" | "share-min" | "share-max";
  value?: number;
  slope?: number;
}

export interface EnvelopeResult extends CheckResult {
  id: "envelope";
  maxGrossTrailerWeight?: Quantity;
  maxTongueWeight?: Quantity;
  /** The constraint that binds first as the trailer grows. */
  binding?: Governing;
  /** Weight that may still go into the vehicle with this trailer hitched. */
  vehicleLoadRoom?: Quantity;
  /** Lines bounding the allowed (GTW, TW) region, values in the rig's weight unit. */
  lines: EnvelopeLine[];
  /** Corners of the allowed region, in the rig's weight unit, in order. */
  region: Array<{ grossTrailerWeight: number; tongueWeight: number }>;
  regionUnit: UnitString;
}

export interface VerdictAction {
  checkId: CheckId;
  status: CheckStatus;
  advice: string[];
}

export interface VerdictResult {
  id: "verdict";
  title: string;
  /**
   * over when any check is over; else incomplete when any check lacks data (or none has any); else adjust when
   * any check is adjust; else the worst of tight and within.
   */
  level: VerdictLevel;
  /** Worst of the checks with data only ("incomplete" only when no check has data). */
  levelFromCheckedOnly: VerdictLevel;
  /** False when any check lacks data. */
  complete: boolean;
  incomplete: CheckId[];
  /** The checks whose set-up needs adjusting (status "adjust"), whatever the level. */
  adjust: CheckId[];
  /** The checks with a rating exceeded (status "over"). */
  over: CheckId[];
  message: string;
  /** The check and item with the least margin. */
  governing?: Governing & { checkId: CheckId };
  actions: VerdictAction[];
  cautions: string[];
  tightMarginRatio: number;
}

export type AnyCheckResult =
  | WeakestLinkResult
  | TongueShareResult
  | TongueMeasureResult
  | AxleLoadsResult
  | FrontAxleLossResult
  | TrailerLabelsResult
  | TyresResult
  | HardwareFitResult
  | WeightDistributionResult
  | BallMountResult
  | AccessoryFitResult
  | EnvelopeResult
  | LocalRulesResult
  | CheckResult;

export interface RigResult {
  coreVersion: string;
  units: UnitSystem;
  /** The checks that apply to this rig, in CHECK_IDS order. */
  checks: AnyCheckResult[];
  /** Checks that do not apply (for instance ball-mount on a rig with a bike rack). */
  notApplicable: CheckId[];
  verdict: VerdictResult;
  /** The place and the rule set (id and version) the "local-rules" check read, when a place was given. */
  rules?: AppliedRules;
}

/** One check in the compact answer: figures only, no steps or texts. */
export interface SummaryCheck {
  id: CheckId;
  status: CheckStatus;
  limit?: Quantity;
  actual?: Quantity;
  margin?: Margin;
  governing?: Governing;
}

/** The compact evaluate answer (`"detail": "summary"`, docs/evaluate.md). */
export interface RigSummary {
  coreVersion: string;
  units: UnitSystem;
  detail: "summary";
  checks: SummaryCheck[];
  notApplicable: CheckId[];
  verdict: Pick<VerdictResult, "level" | "levelFromCheckedOnly" | "complete" | "incomplete" | "governing" | "tightMarginRatio" | "cautions">;
}

export interface FastCheck {
  id: CheckId;
  status: CheckStatus;
  margin?: Margin;
  governing?: Governing;
}

export interface FastRigResult {
  coreVersion: string;
  units: UnitSystem;
  level: VerdictLevel;
  levelFromCheckedOnly: VerdictLevel;
  complete: boolean;
  incomplete: CheckId[];
  adjust: CheckId[];
  over: CheckId[];
  governing?: Governing & { checkId: CheckId };
  checks: FastCheck[];
}

export interface EvaluateOptions {
  /** Margin under this share of the limit makes a check "tight". Default 0.1 (10 %). Range 0–0.5. */
  tightMarginRatio?: number;
  /**
   * Lever arm, pin hole to the point where a hitch's tongue rating is taken to apply, in the rig's length unit.
   * Used to weigh an accessory's moment. Default 10 in (254 mm). Common practice, no published source.
   */
  accessoryReferenceArm?: number;
  /**
   * Where the rig is driven. With a place the rig is also read against that place's rule set (the
   * "local-rules" check), the result records the set and its version, and texts use the place's words.
   */
  place?: Place;
  /**
   * Share of the front axle's unhitched load it may lose to the hitch load before the front-axle check reads
   * tight. Default 0.1 (10 %). Range 0.01–0.5. Common practice, no published source.
   */
  frontAxleLossLimit?: number;
}
