/**
 * Local rules as data: a rule set per jurisdiction, one row per rule, each with its threshold, what it
 * requires, its kind (law, guideline, or defer: "check local law") and its published source.
 * The tests that read a row live in ./evaluate-rules.ts; the rows never hold code.
 */
import type { LicenceCategory, TrailerType } from "../input";
import type { CheckResult, CheckStatus, MissingField, Quantity } from "../types";

/** law: the product decides and cites it. guideline: advice, never "over" on its own. defer: "check local law", never "within". */
export type RuleKind = "law" | "guideline" | "defer";

export type RuleTopic = "brakes" | "licence" | "coupling" | "matching" | "towball" | "weights";

export type MassUnit = "kg" | "lb";

export interface RuleSource {
  /** The regulation, statute or government page, as it names itself. */
  title: string;
  /** Section, article or page part. */
  ref?: string;
  url?: string;
  /** H: a regulation or government text; M: a secondary source (handbook, trade body, state summary); L: memory. */
  trust: "H" | "M" | "L";
  /** Where the figure was taken from memory rather than read, or another caveat. */
  note?: string;
}

export interface Threshold {
  value: number;
  unit: MassUnit;
  /** "above": applies to more than the value; "at-or-above": to the value and more. */
  applies: "above" | "at-or-above";
  /**
   * What is weighed: the loaded trailer ("laden"), or the gross trailer mass on its own axles when hitched
   * ("gtm": the loaded trailer less the towball mass).
   */
  of: "laden" | "gtm";
}

/** What a licence category allows. Masses are maximum authorised masses (plates), in the rule's unit. */
export interface LicenceAllowance {
  unit: MassUnit;
  /** The towing vehicle's MAM may not exceed this. */
  vehicleMax: number;
  /** A trailer up to this MAM is allowed whatever the combination weighs. */
  trailerFreeUpTo?: number;
  /** Above `trailerFreeUpTo`, the combination's MAM (vehicle + trailer) may not exceed this. */
  combinationMax?: number;
  /** The trailer's MAM may never exceed this. */
  trailerMax?: number;
}

interface RuleBase {
  /** Stable id, stored in saved results: never rename one. */
  id: string;
  kind: RuleKind;
  topic: RuleTopic;
  /** Short name in the place's words. */
  title: string;
  /** What the rule requires, in the place's words. */
  requires: string;
  source: RuleSource;
  /** Only these trailer types (travel = a caravan, a trailer coach). */
  trailerTypes?: readonly TrailerType[];
}

export type RuleRow =
  /** Brakes (any kind) when the trailer is over the threshold. */
  | (RuleBase & { test: "brakes"; threshold: Threshold })
  /** A brake on every wheel over the threshold. */
  | (RuleBase & { test: "brakes-all-wheels"; threshold: Threshold })
  /** A breakaway device over the threshold. */
  | (RuleBase & { test: "breakaway"; threshold: Threshold })
  /** Surge (over-ride, over-run) brakes not allowed over the threshold. */
  | (RuleBase & { test: "no-surge"; threshold: Threshold })
  /** Licence categories and what each allows; a category left out (or "other") is "check the licence". */
  | (RuleBase & { test: "licence"; categories: Partial<Record<LicenceCategory, LicenceAllowance>> })
  /** The coupling's marked D value against D = g·T·R/(T+R) (UN Regulation No. 55). */
  | (RuleBase & { test: "coupling-d"; g: number })
  /** The tow ball's S value against the noseweight. */
  | (RuleBase & { test: "ball-s" })
  /** The caravan's laden weight against a share of the car's kerb weight (a guideline). */
  | (RuleBase & { test: "caravan-match"; advised: number; ceiling: number })
  /** A noseweight share band that replaces the core's tongue-weight band for its trailer types. */
  | (RuleBase & { test: "noseweight-band"; band: { min: number; max: number } })
  /** The towball mass against the vehicle maker's towball limit. */
  | (RuleBase & { test: "towball-limit" })
  /** The loaded combination against the vehicle's gross train weight (GCWR). */
  | (RuleBase & { test: "train-weight" })
  /** The loaded trailer against its own plated maximum. */
  | (RuleBase & { test: "trailer-plate" })
  /** A rule the product does not decide: always "check local law". An optional threshold says from when. */
  | (RuleBase & {
      test: "defer";
      threshold?: Threshold;
      /** The defer stops at this value (in the threshold's unit), where a law row decides. */
      below?: number;
    });

export type RuleTest = RuleRow["test"];

export interface RuleSet {
  /** Stable id, e.g. "gb". */
  id: string;
  /** Changes whenever a row changes; saved results keep the version they were computed with. */
  version: string;
  /** The place in its own words, e.g. "Great Britain (England, Scotland and Wales)". */
  title: string;
  /** The glossary this place speaks (./glossary.ts). */
  glossary: GlossaryId;
  /** The unit system forms start in. */
  defaultUnits: "imperial" | "metric";
  /** Unit systems the place uses in practice (tests check both). */
  unitsInUse: ReadonlyArray<"imperial" | "metric">;
  /** One line on what the set covers and what it leaves to local law. */
  scope: string;
  rules: readonly RuleRow[];
}

export type GlossaryId = "us" | "ca" | "gb" | "eu" | "au";

/** The place a check is run for: a country and, where rules differ, a state or province. */
export interface Place {
  country: string;
  region?: string;
}

export interface RuleFinding {
  ruleId: string;
  kind: RuleKind;
  topic: RuleTopic;
  title: string;
  requires: string;
  source: RuleSource;
  status: CheckStatus;
  /** One plain sentence: what the law (or guideline) asks of this rig and whether it is met. */
  message: string;
  /** True for a defer row: the product does not decide, "check local law". */
  deferred?: true;
  /** A guideline well past its advice: a caution, though never "over" on its own. */
  caution?: true;
  actual?: Quantity;
  limit?: Quantity;
  missing?: MissingField[];
}

export interface AppliedRules {
  place: Place;
  placeLabel: string;
  ruleSetId: string;
  ruleSetVersion: string;
  title: string;
  glossary: GlossaryId;
}

export interface LocalRulesResult extends CheckResult {
  id: "local-rules";
  rules: AppliedRules;
  findings: RuleFinding[];
  /** Rows that do not apply to this rig (under a threshold, another trailer type, no trailer). */
  notApplicable: string[];
}
