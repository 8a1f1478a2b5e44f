/**
 * The two choice questions every lesson's practice ends with, made from the core's evaluation of the lesson's rig:
 * - "Which limit governs?": the limit the lesson's check names as governing (the envelope's first to bind; the
 *   rig's least-room limit when the check names none), against other limits of the same rig;
 * - "What is the next action?": one of a fixed set of action words, the right one read from the check's status
 *   (over, incomplete, adjust, tight, within) and, for a set-up to adjust, from what the check found.
 * Runs on the server with the evaluation; what it returns is plain data for the practice screen.
 */
import { FIELD_RANGES } from "@/lib/towing";
import type { RigInput } from "@/lib/towing/input";
import type {
  AccessoryFitResult,
  AnyCheckResult,
  CheckId,
  CheckStatus,
  EnvelopeResult,
  Governing,
  RigResult,
  TongueShareResult,
  WeakestLinkResult,
} from "@/lib/towing/types";
import { formatQuantity } from "@/lib/format";
import type { ChoiceOption, ChoiceQuestion } from "./choice-answers";

export const MIN_CHOICES = 3;
export const MAX_CHOICES = 5;

/** The product's action words: the one fixed set every "next action" question draws on, in display order. */
export const NEXT_ACTIONS = [
  { id: "tow-as-set-up", label: "Tow as set up" },
  { id: "tow-with-care", label: "Tow as set up, with care: little room is left" },
  { id: "do-not-tow", label: "Do not tow: a rating is exceeded" },
  { id: "weigh-tongue", label: "Weigh the tongue before going on" },
  { id: "find-missing", label: "Find the missing figures first: read the labels, or weigh" },
  { id: "move-load-forward", label: "Move load forward in the trailer" },
  { id: "move-load-back", label: "Move load back towards the trailer's axle" },
  { id: "more-drop", label: "Choose a ball mount with more drop" },
  { id: "less-drop", label: "Choose a ball mount with less drop (or a rise)" },
  { id: "reset-wd", label: "Re-set the weight-distribution head and spring bars" },
  { id: "fit-wd", label: "Fit weight distribution" },
  { id: "more-rise", label: "Fit a shank with more rise" },
  { id: "fold-clear", label: "Choose an accessory that folds clear of the bumper" },
  { id: "match-ball", label: "Fit the ball size the coupler takes" },
  { id: "adjust-set-up", label: "Change the set-up as the check advises" },
] as const;
export type NextActionId = (typeof NEXT_ACTIONS)[number]["id"];

/** Each family's own set-up changes: the instructive wrong answers (or the right one) beside the status words. */
const FAMILY_ACTIONS: Partial<Record<CheckId, NextActionId[]>> = {
  "weakest-link": ["match-ball"],
  "tongue-share": ["move-load-forward", "move-load-back"],
  payload: ["fit-wd"],
  "combined-weight": ["fit-wd"],
  "weight-distribution": ["reset-wd", "fit-wd"],
  "ball-mount": ["more-drop", "less-drop"],
  "accessory-fit": ["more-rise", "fold-clear"],
  "tongue-measure": ["weigh-tongue"],
};

/** The rig's own rating fields, offered as limits beside the evaluation's own (labels are the input's). */
const RATING_FIELDS = [
  "vehicle.towRating",
  "vehicle.tongueWeightLimit",
  "vehicle.gvwr",
  "vehicle.gcwr",
  "vehicle.gawrFront",
  "vehicle.gawrRear",
  "hitch.gtwRating",
  "hitch.twRating",
  "ballMount.gtwRating",
  "ballMount.twRating",
  "trailer.ballRating",
  "trailer.couplerRating",
  "trailer.safetyChainRating",
  "weightDistribution.tongueRating",
  "vehicle.towRatingWd",
  "vehicle.tongueWeightLimitWd",
  "hitch.gtwRatingWd",
  "hitch.twRatingWd",
] as const;

interface Limit {
  id: string;
  label: string;
  value: number;
  unit: string;
}

const isWeakestLink = (check: AnyCheckResult): check is WeakestLinkResult => check.id === "weakest-link";
const isEnvelope = (check: AnyCheckResult): check is EnvelopeResult => check.id === "envelope";
const isTongueShare = (check: AnyCheckResult): check is TongueShareResult => check.id === "tongue-share";
const isAccessory = (check: AnyCheckResult): check is AccessoryFitResult => check.id === "accessory-fit";

function weightUnit(rig: RigInput) {
  return rig.units === "metric" ? "kg" : "lb";
}

function readPath(rig: RigInput, path: string): unknown {
  return path.split(".").reduce<unknown>((node, key) => (node && typeof node === "object" ? (node as Record<string, unknown>)[key] : undefined), rig);
}

/** The limits this check itself weighs the rig against, besides the one that governs. */
function ownLimits(check: AnyCheckResult): Limit[] {
  if (isWeakestLink(check)) return check.links.map((link) => ({ id: link.id, label: link.label, value: link.rating.value, unit: link.rating.unit }));
  if (isEnvelope(check))
    return check.lines.flatMap((line) => (line.value === undefined ? [] : [{ id: line.id, label: line.label, value: line.value, unit: check.regionUnit }]));
  if (isTongueShare(check))
    return [
      { id: "band.min", label: "Lowest tongue-weight share", value: check.band.min * 100, unit: "%" },
      { id: "band.max", label: "Highest tongue-weight share", value: check.band.max * 100, unit: "%" },
    ];
  if (check.id === "weight-distribution") return [{ id: "restoration.max", label: "All of the lost load (100 %)", value: 100, unit: "%" }];
  return [];
}

/** What governs the lesson: the check's governing limit, the envelope's first to bind, else the rig's least room. */
function governingOf(result: RigResult, check: AnyCheckResult): { limit: Governing; message: string; whole: boolean } | undefined {
  if (check.governing) return { limit: check.governing, message: check.message, whole: false };
  if (isEnvelope(check) && check.binding) return { limit: check.binding, message: check.message, whole: false };
  if (result.verdict.governing) {
    const from = result.checks.find((candidate) => candidate.id === result.verdict.governing!.checkId);
    return { limit: result.verdict.governing, message: from?.message ?? result.verdict.message, whole: true };
  }
  return undefined;
}

const sameFigure = (a: Limit, b: Limit) => a.unit === b.unit && Math.abs(a.value - b.value) <= 1e-9 * Math.max(1, Math.abs(a.value));

/**
 * "Which limit governs?": the answer and up to four other limits of the same rig, first the check's own, then the
 * rig's rating links and rating fields; the other checks' limits only to reach three choices. A limit
 * with the very same figure as the answer is left out (two ratings that tie would both be right).
 */
export function governsQuestion(result: RigResult, rig: RigInput, checkId: string): ChoiceQuestion | null {
  const check = result.checks.find((candidate) => candidate.id === checkId);
  if (!check) return null;
  const governing = governingOf(result, check);
  if (!governing) return null;
  const answer: Limit = { id: governing.limit.id, label: governing.limit.label, value: governing.limit.value, unit: governing.limit.unit };
  const weakest = result.checks.find(isWeakestLink);
  const rigLimits: Limit[] = RATING_FIELDS.flatMap((path) => {
    const value = readPath(rig, path);
    const label = FIELD_RANGES[path]?.label;
    return typeof value === "number" && label ? [{ id: path, label, value, unit: weightUnit(rig) }] : [];
  });
  const main = [...ownLimits(check), ...(weakest && weakest !== check ? ownLimits(weakest) : []), ...rigLimits];
  const spare: Limit[] = result.checks.flatMap((other) => (other.id === check.id ? [] : [...(other.governing ? [other.governing] : []), ...ownLimits(other)]));

  const picked: Limit[] = [answer];
  const take = (candidates: Limit[], upTo: number) => {
    for (const candidate of candidates) {
      if (picked.length >= upTo) return;
      if (picked.some((p) => p.id === candidate.id || p.label === candidate.label)) continue;
      if (sameFigure(candidate, answer)) continue;
      picked.push(candidate);
    }
  };
  take(main, MAX_CHOICES);
  take(spare, MIN_CHOICES);
  if (picked.length < MIN_CHOICES) return null;

  const choices: ChoiceOption[] = picked
    .map((limit) => ({ id: limit.id, label: limit.label, detail: formatQuantity({ value: limit.value, unit: limit.unit as Governing["unit"] }) }))
    .sort((a, b) => a.label.localeCompare(b.label, "en") || a.id.localeCompare(b.id, "en"));
  return {
    id: "governs",
    title: "Which limit governs?",
    prompt: governing.whole
      ? "This check names no limit of its own. Of these limits on the rig, which leaves it the least room?"
      : `Of these limits on the rig, which one sets the result of the ${check.title.toLowerCase()} check?`,
    choices,
    answerId: answer.id,
    why: `${answer.label} (${formatQuantity({ value: answer.value, unit: answer.unit as Governing["unit"] })}) governs. ${governing.message}`,
  };
}

function tongueFigure(field: string) {
  return field.startsWith("trailer.tongueWeight") || field.startsWith("trailer.tongueMeasurement");
}

/** The right next step for the check, from its status and, for a set-up to adjust, what it found. */
export function nextActionFor(check: AnyCheckResult, rig: RigInput): NextActionId {
  const status: CheckStatus = check.status;
  if (status === "over") return "do-not-tow";
  if (status === "incomplete") {
    const missing = check.missing ?? [];
    return missing.length > 0 && missing.every((m) => tongueFigure(m.field)) ? "weigh-tongue" : "find-missing";
  }
  if (status === "within") return "tow-as-set-up";
  if (status === "tight") return "tow-with-care";
  // adjust: a set-up to change, read from what the check found rather than from its words.
  if (isTongueShare(check) && check.share !== undefined) return check.share < check.band.min ? "move-load-forward" : "move-load-back";
  if (check.id === "ball-mount") {
    const needed = "dropNeeded" in check && check.dropNeeded ? check.dropNeeded.value : undefined;
    const drop = rig.ballMount?.drop;
    if (needed !== undefined && drop !== undefined) return drop < needed ? "more-drop" : "less-drop";
  }
  if (check.id === "weight-distribution") return rig.weightDistribution?.used ? "reset-wd" : "fit-wd";
  if (isAccessory(check)) {
    if (check.parts.some((part) => part.id === "ground" && part.status === "adjust")) return "more-rise";
    if (check.parts.some((part) => part.id === "fold" && part.status === "adjust")) return "fold-clear";
  }
  if (check.id === "weakest-link") return "match-ball";
  return "adjust-set-up";
}

const STATUS_WHY: Record<CheckStatus, string> = {
  over: "Over: a rating is exceeded, so the rig does not tow as it is.",
  incomplete: "Not confirmed: a figure the check needs is missing, so nothing can be said yet.",
  adjust: "Adjust: no rating is exceeded, but the set-up needs changing before the rig tows.",
  tight: "Tight: within every limit, with little room to spare.",
  within: "Within: every limit holds with room to spare.",
};

/** "What is the next action?": the right action word and up to four others from the fixed set, in its order. */
export function nextActionQuestion(result: RigResult, rig: RigInput, checkId: string): ChoiceQuestion | null {
  const check = result.checks.find((candidate) => candidate.id === checkId);
  if (!check) return null;
  const answer = nextActionFor(check, rig);
  const missingSlot: NextActionId = answer === "weigh-tongue" ? "weigh-tongue" : "find-missing";
  const candidates: NextActionId[] = [...(FAMILY_ACTIONS[check.id] ?? []), "do-not-tow", "tow-as-set-up", "tow-with-care", missingSlot];
  const picked = new Set<NextActionId>([answer]);
  for (const candidate of candidates) if (picked.size < MAX_CHOICES) picked.add(candidate);
  const choices = NEXT_ACTIONS.filter((action) => picked.has(action.id)).map((action) => ({ id: action.id, label: action.label }));
  const advice = check.advice.find((line) => line.trim()) ?? "";
  return {
    id: "next-action",
    title: "What is the next action?",
    prompt: `From what the ${check.title.toLowerCase()} check found, what should happen next?`,
    choices,
    answerId: answer,
    why: [STATUS_WHY[check.status], check.message, advice].filter(Boolean).join(" "),
  };
}

/** Both questions for a lesson, those the rig can carry. */
export function choiceQuestions(result: RigResult, rig: RigInput, checkId: string): ChoiceQuestion[] {
  return [governsQuestion(result, rig, checkId), nextActionQuestion(result, rig, checkId)].filter((q): q is ChoiceQuestion => q !== null);
}
