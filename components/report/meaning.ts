/**
 * What a finding means for the customer, in the statuses the core gives: a rating exceeded (do not tow), a
 * set-up to adjust, little room left, room to spare, or not confirmed yet. The core itself tells a set-up to
 * adjust (a share outside its band, a trailer riding off level, weight distribution to fit or re-set, a rack
 * that meets a ramp) from a rating exceeded; these words follow its status. Type-only imports from the core.
 */
import type { AnyCheckResult, CheckId, VerdictResult } from "@/lib/towing/types";
import { STATUS_MEANING } from "@/lib/glossary";

export type MeaningKey = keyof typeof STATUS_MEANING;

/** The status key of one check, as the customer should read it. */
export function checkMeaningKey(check: AnyCheckResult): MeaningKey {
  const status: string = check.status;
  return (status in STATUS_MEANING ? status : "incomplete") as MeaningKey;
}

/** The verdict's key, from the core's level. */
export function verdictMeaningKey(verdict: VerdictResult): MeaningKey {
  const level: string = verdict.level;
  // A result saved before "not confirmed" had its own level read "tight" with data missing.
  if (level === "incomplete" || (!verdict.complete && verdict.levelFromCheckedOnly === "within")) return "incomplete";
  return (level in STATUS_MEANING ? level : "tight") as MeaningKey;
}

/** What a set-up finding asks for, per check. */
const ADJUST_WORDS: Partial<Record<CheckId, string>> = {
  "tongue-share": "The weight on the hitch is outside its band: the trailer needs loading differently (then weighing again) before you tow.",
  "ball-mount": "The trailer would not ride level: a ball mount with another rise or drop is needed before you tow.",
  "weight-distribution": "The weight-distribution hitch needs fitting or re-setting, as its maker's instructions say, before you tow.",
  "accessory-fit": "The rack or carrier needs a different set-up before you drive: see what to do.",
  "hardware-fit": "A part of the hitch is not the right size for the others (the ball, its shank, the ball mount's hole or the hitch pin): it needs changing before you tow.",
};

/** One plain line on what this check's finding means for the customer. */
export function checkMeaning(check: AnyCheckResult): string {
  const key = checkMeaningKey(check);
  if (key === "adjust") return ADJUST_WORDS[check.id] ?? STATUS_MEANING.adjust.check;
  return STATUS_MEANING[key].check;
}

/**
 * The page's towing words, said for a rack or carrier, which is carried, not towed. Applied to the report's own
 * sentences (headings, meanings, advice) when nothing is towed.
 */
export function carriedWords(text: string): string {
  return text
    .replace(/do not tow like this/g, "do not drive with it loaded like this")
    .replace(/before you tow/g, "before you drive")
    .replace(/Before you tow/g, "Before you drive")
    .replace(/before towing/g, "before driving")
    .replace(/Towing check/g, "Hitch load check");
}
