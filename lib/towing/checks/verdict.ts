/**
 * The verdict of the rig from its checks.
 * - levelFromCheckedOnly: the worst status among checks that have their data (over > adjust > tight > within),
 *   "incomplete" when none has.
 * - level: over when a rating is exceeded; else "incomplete" (not confirmed) when any check lacks data, so a
 *   rig never reads within or tight only because data is missing; else adjust when the set-up needs changing;
 *   else tight or within. `complete`, `incomplete`, `adjust` and `over` say which checks are which.
 */
import { fP, lessThan, NO_TEXT, type Ctx } from "../context";
import type { AnyCheckResult, CheckId, FastCheck, Governing, VerdictAction, VerdictLevel, VerdictResult } from "../types";

function lacking(n: number): string {
  return n === 1 ? "1 check still lacks data" : `${n} checks still lack data`;
}

function lowerFirst(text: string): string {
  return text.length ? text[0]!.toLowerCase() + text.slice(1) : text;
}

/** Cautions every verdict carries. */
export const GENERAL_CAUTIONS = [
  "The ratings come from the vehicle maker and the labels on each part; these results are only as good as the figures entered.",
  "The lowest rating of any part is the limit for the whole rig.",
  "Weigh the loaded rig at a public scale: estimates and brochure figures are not weights.",
  "Follow each maker's fitting instructions and torque values.",
  "Towmargin does the arithmetic on the figures entered and does not decide what the law allows: local law and a qualified installer have the last word.",
];

/**
 * `summary` holds one uniform record per check (same shape, so this loop stays fast); `checks` the full results,
 * read only for the texts when the context asks for them.
 */
export function buildVerdict(summary: FastCheck[], checks: AnyCheckResult[], c: Ctx): VerdictResult {
  // Worst among the checks with data: over > adjust > tight > within.
  let checked: VerdictLevel = "within";
  let anyChecked = false;
  const incomplete: CheckId[] = [];
  const adjust: CheckId[] = [];
  const over: CheckId[] = [];
  let best = Infinity;
  let governing: (Governing & { checkId: CheckId }) | undefined;
  let govCheck: CheckId | undefined;
  let govItem: Governing | undefined;
  for (const ch of summary) {
    if (ch.status === "incomplete") {
      incomplete.push(ch.id);
      continue;
    }
    anyChecked = true;
    if (ch.status === "over") {
      over.push(ch.id);
      checked = "over";
    } else if (ch.status === "adjust") {
      adjust.push(ch.id);
      if (checked !== "over") checked = "adjust";
    } else if (ch.status === "tight" && checked === "within") checked = "tight";
    if (ch.governing && ch.margin && lessThan(ch.margin.ratio, best)) {
      best = ch.margin.ratio;
      govItem = ch.governing;
      govCheck = ch.id;
    }
  }
  if (!anyChecked) checked = "incomplete";
  if (govItem && govCheck) governing = { id: govItem.id, label: govItem.label, value: govItem.value, unit: govItem.unit, checkId: govCheck };
  const complete = incomplete.length === 0 && anyChecked;
  // A rating exceeded stands whatever is missing; otherwise data still missing outranks a set-up to adjust,
  // because the rig cannot be cleared (even after adjusting) until every rating is checked.
  const level: VerdictLevel = checked === "over" ? "over" : !complete ? "incomplete" : checked;
  const verdict: VerdictResult = {
    id: "verdict",
    title: "Verdict",
    level,
    levelFromCheckedOnly: checked,
    complete,
    incomplete,
    adjust,
    over,
    governing,
    message: "",
    actions: [],
    cautions: NO_TEXT,
    tightMarginRatio: c.tight,
  };
  if (!c.detail) return verdict;
  const actions: VerdictAction[] = [];
  for (const ch of checks) if (ch.status !== "within" && ch.advice.length) actions.push({ checkId: ch.id, status: ch.status, advice: ch.advice });
  // Ratings exceeded first, then the set-up to adjust, then tight items, then the data still to collect.
  const order = { over: 0, adjust: 1, tight: 2, incomplete: 3, within: 4 } as const;
  actions.sort((a, b) => order[a.status] - order[b.status]);
  verdict.actions = actions;
  verdict.cautions = GENERAL_CAUTIONS;
  // The headline speaks of the check that governs when it is of the level's kind, so the sentence on top and
  // the governing line under it name the same limit; otherwise of the first such check in the stable order.
  const governsFirst = (list: AnyCheckResult[]) => {
    const at = list.findIndex((ch) => ch.id === governing?.checkId);
    return at > 0 ? [list[at]!, ...list.slice(0, at), ...list.slice(at + 1)] : list;
  };
  const overs = governsFirst(checks.filter((ch) => ch.status === "over"));
  const adjusts = governsFirst(checks.filter((ch) => ch.status === "adjust"));
  const tights = governsFirst(checks.filter((ch) => ch.status === "tight"));
  const alsoAdjust = adjusts.length ? ` The set-up also needs adjusting: ${checks.filter((ch) => ch.status === "adjust").map((ch) => ch.title.toLowerCase()).join(", ")}.` : "";
  const stillLacking = incomplete.length ? ` ${lacking(incomplete.length)}.` : "";
  verdict.message =
    level === "over"
      ? `Over: a rating is exceeded, do not tow like this: ${lowerFirst(overs[0]!.message)}` + alsoAdjust
      : level === "incomplete"
        ? !anyChecked
          ? "Not confirmed: nothing can be checked yet; enter the vehicle's, the hitch's and the load's figures."
          : adjusts.length
            ? `Not confirmed: ${lacking(incomplete.length)}, and the set-up needs adjusting before it tows: ${lowerFirst(adjusts[0]!.message)}`
            : `Not confirmed: the checks with data pass, but ${lacking(incomplete.length)}.`
        : level === "adjust"
          ? `Adjust the set-up before towing: ${lowerFirst(adjusts[0]!.message)}` + (adjusts.length > 1 ? ` (${adjusts.length} set-up items)` : "") + stillLacking
          : level === "tight"
            ? `Tight: ${lowerFirst(tights[0]!.message)}`
            : `Within: every check passes with at least ${fP(c.tight)} to spare.`;
  return verdict;
}
