/**
 * Entry points: evaluateRig (full, with steps and texts) and evaluateRigFast (statuses, governing items and
 * margins, no steps, for the fleet matrix). Both run the same check functions; evaluateRigFast switches off
 * steps and texts through the context.
 */
import { toCanonical } from "./convert-rig";
import { type Ctx } from "./context";
import { derive } from "./derive";
import type { RigInput } from "./input";
import { checkAccessoryFit } from "./checks/accessory-fit";
import { checkAxleLoads } from "./checks/axle-loads";
import { checkBallMount } from "./checks/ball-mount";
import { checkCombinedWeight } from "./checks/combined-weight";
import { checkEnvelope } from "./checks/envelope";
import { checkFrontAxleLoss } from "./checks/front-axle-loss";
import { checkHardwareFit } from "./checks/hardware-fit";
import { checkTrailerLabels } from "./checks/trailer-labels";
import { checkTyres } from "./checks/tyres";
import { checkPayload } from "./checks/payload";
import { checkTongueMeasure } from "./checks/tongue-measure";
import { checkTongueShare } from "./checks/tongue-share";
import { buildVerdict, GENERAL_CAUTIONS } from "./checks/verdict";
import { checkWeakestLink } from "./checks/weakest-link";
import { checkWeightDistribution } from "./checks/weight-distribution";
import type { AnyCheckResult, CheckId, EvaluateOptions, FastCheck, FastRigResult, RigResult, RigSummary } from "./types";
import type { LocalRulesResult } from "./rules/types";
import { CHECK_IDS } from "./types";
import { lengthIn, unitSet } from "./units";
import { CORE_VERSION } from "./version";
import { checkLocalRules, type RulesContext } from "./rules/check";
import { localiseDeep } from "./rules/glossary";
import { ruleSetFor } from "./rules/places";
import type { Derived } from "./derive";

/** Default tight threshold: 10 % of the limit. */
export const DEFAULT_TIGHT_MARGIN_RATIO = 0.1;
/** Default accessory reference arm, inches. Common practice, no published source. */
export const DEFAULT_REFERENCE_ARM_IN = 10;
/**
 * Default share of the front axle's unhitched load it may lose before the front-axle check reads tight.
 * Common practice, no published source; the organisation can set its own.
 */
export const DEFAULT_FRONT_AXLE_LOSS_LIMIT = 0.1;

type CheckFn = (d: Derived, c: Ctx) => AnyCheckResult | null;

/** The checks in their stable order. To add a check, add its id to CHECK_IDS and its function here. */
const CHECKS: ReadonlyArray<[CheckId, CheckFn]> = [
  ["weakest-link", checkWeakestLink],
  ["tongue-share", checkTongueShare],
  ["tongue-measure", checkTongueMeasure],
  ["payload", checkPayload],
  ["combined-weight", checkCombinedWeight],
  ["axle-loads", checkAxleLoads],
  ["front-axle-loss", checkFrontAxleLoss],
  ["trailer-labels", checkTrailerLabels],
  ["tyres", checkTyres],
  ["weight-distribution", checkWeightDistribution],
  ["ball-mount", checkBallMount],
  ["hardware-fit", checkHardwareFit],
  ["accessory-fit", checkAccessoryFit],
  ["envelope", checkEnvelope],
];

function context(rig: RigInput, options: EvaluateOptions | undefined, detail: boolean): Ctx {
  const u = unitSet(rig.units);
  const t = options?.tightMarginRatio;
  const arm = options?.accessoryReferenceArm;
  const loss = options?.frontAxleLossLimit;
  return {
    u,
    detail,
    tight: typeof t === "number" && Number.isFinite(t) ? Math.min(0.5, Math.max(0, t)) : DEFAULT_TIGHT_MARGIN_RATIO,
    referenceArm: typeof arm === "number" && Number.isFinite(arm) && arm > 0 ? Math.max(0.1, lengthIn(arm, u)) : DEFAULT_REFERENCE_ARM_IN,
    frontLossLimit: typeof loss === "number" && Number.isFinite(loss) ? Math.min(0.5, Math.max(0.01, loss)) : DEFAULT_FRONT_AXLE_LOSS_LIMIT,
  };
}

/** The place's rule set, when a known place is given. */
function rulesOf(options: EvaluateOptions | undefined): RulesContext | undefined {
  const place = options?.place;
  if (!place) return undefined;
  const set = ruleSetFor(place);
  return set ? { set, place } : undefined;
}

function run(rig: RigInput, c: Ctx, rules?: RulesContext) {
  const d = derive(toCanonical(rig));
  // A place's noseweight band (caravans: 5–7 %) replaces the trailer type's band; the vehicle maker's still wins.
  if (rules && d.band.source === "trailer-type" && d.hasTrailer) {
    const type = d.rig.trailer!.type;
    for (const row of rules.set.rules)
      if (row.test === "noseweight-band" && (!row.trailerTypes || row.trailerTypes.includes(type))) d.band = { ...row.band, source: "place" };
  }
  const checks: AnyCheckResult[] = [];
  const summary: FastCheck[] = [];
  const notApplicable: CheckId[] = [];
  for (let i = 0; i < CHECKS.length; i++) {
    const [id, fn] = CHECKS[i]!;
    const r = fn(d, c);
    if (r) {
      checks.push(r);
      summary.push({ id: r.id, status: r.status, margin: r.margin, governing: r.governing });
    } else notApplicable.push(id);
  }
  if (rules) {
    const r = checkLocalRules(d, c, rules);
    checks.push(r);
    summary.push({ id: r.id, status: r.status, margin: r.margin, governing: r.governing });
  }
  return { checks, summary, notApplicable, verdict: buildVerdict(summary, checks, c) };
}

/**
 * Evaluate a validated rig (the output of parseRig / rigInputSchema): every applicable check with its steps,
 * cautions and advice, and the verdict. Values come back in the rig's unit system.
 */
export function evaluateRig(input: RigInput, options?: EvaluateOptions): RigResult {
  const rules = rulesOf(options);
  const { checks, notApplicable, verdict } = run(input, context(input, options, true), rules);
  const result: RigResult = { coreVersion: CORE_VERSION, units: input.units, checks, notApplicable, verdict };
  if (!rules) return result;
  const local = checks[checks.length - 1] as LocalRulesResult;
  result.rules = local.rules;
  // One calculation, the place's words: every text of the result in the place's glossary.
  return localiseDeep(result, rules.set.glossary);
}

/** Statuses, margins and governing items without steps or texts: for fleet matrices. */
export function evaluateRigFast(input: RigInput, options?: EvaluateOptions): FastRigResult {
  const { summary, verdict } = run(input, context(input, options, false), rulesOf(options));
  return {
    coreVersion: CORE_VERSION,
    units: input.units,
    level: verdict.level,
    levelFromCheckedOnly: verdict.levelFromCheckedOnly,
    complete: verdict.complete,
    incomplete: verdict.incomplete,
    adjust: verdict.adjust,
    over: verdict.over,
    governing: verdict.governing,
    checks: summary,
  };
}

/**
 * The compact answer (`"detail": "summary"`): the verdict, and each check's status, limit, actual and margin,
 * with no worked steps, messages or advice. The same checks as evaluateRig, run without their texts.
 */
export function evaluateRigSummary(input: RigInput, options?: EvaluateOptions): RigSummary {
  const rules = rulesOf(options);
  const { checks, notApplicable, verdict } = run(input, context(input, options, false), rules);
  const summary: RigSummary = {
    coreVersion: CORE_VERSION,
    units: input.units,
    detail: "summary",
    checks: checks.map((check) => ({
      id: check.id,
      status: check.status,
      limit: check.limit,
      actual: check.actual,
      margin: check.margin,
      governing: check.governing,
    })),
    notApplicable,
    verdict: {
      level: verdict.level,
      levelFromCheckedOnly: verdict.levelFromCheckedOnly,
      complete: verdict.complete,
      incomplete: verdict.incomplete,
      governing: verdict.governing,
      tightMarginRatio: verdict.tightMarginRatio,
      cautions: GENERAL_CAUTIONS,
    },
  };
  // A place's words reach the compact answer too (its governing labels and cautions).
  return rules ? localiseDeep(summary, rules.set.glossary) : summary;
}

export { CHECK_IDS };
