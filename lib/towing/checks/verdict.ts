/**
 * Check 10, the verdict of the rig from its checks.
 * - levelFromCheckedOnly: the worst status among checks that have their data (over > tight > within).
 * - level: the same, raised to at least "tight" when any check is incomplete, so a rig never reads "within"
 *   only because data is missing. `complete` and `incomplete` say which checks lack data.
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
  "Local law and a licensed installer have the last word.",
];

/**
 * `summary` holds one uniform record per check (same shape, so this loop stays fast); `checks` the full results,
 * read only for the texts when the context asks for them.
 */
export function buildVerdict(summary: FastCheck[], checks: AnyCheckResult[], c: Ctx): VerdictResult {
  let checked: VerdictLevel = "within";
  const incomplete: CheckId[] = [];
  let best = Infinity;
  let governing: (Governing & { checkId: CheckId }) | undefined;
  let govCheck: CheckId | undefined;
  let govItem: Governing | undefined;
  for (const ch of summary) {
    if (ch.status === "incomplete") incomplete.push(ch.id);
    else if (ch.status === "over") checked = "over";
    else if (ch.status === "tight" && checked === "within") checked = "tight";
    if (ch.governing && ch.margin && ch.status !== "incomplete" && lessThan(ch.margin.ratio, best)) {
      best = ch.margin.ratio;
      govItem = ch.governing;
      govCheck = ch.id;
    }
  }
  if (govItem && govCheck) governing = { id: govItem.id, label: govItem.label, value: govItem.value, unit: govItem.unit, checkId: govCheck };
  const complete = incomplete.length === 0;
  const level: VerdictLevel = checked === "within" && !complete ? "tight" : checked;
  const verdict: VerdictResult = {
    id: "verdict",
    title: "Verdict",
    level,
    levelFromCheckedOnly: checked,
    complete,
    incomplete,
    governing,
    message: "",
    actions: [],
    cautions: NO_TEXT,
    tightMarginRatio: c.tight,
  };
  if (!c.detail) return verdict;
  const actions: VerdictAction[] = [];
  for (const ch of checks) if (ch.status !== "within" && ch.advice.length) actions.push({ checkId: ch.id, status: ch.status, advice: ch.advice });
  // Problems first, then tight items, then the data still to collect.
  const order = { over: 0, tight: 1, incomplete: 2, within: 3 } as const;
  actions.sort((a, b) => order[a.status] - order[b.status]);
  verdict.actions = actions;
  verdict.cautions = GENERAL_CAUTIONS;
  const overs = checks.filter((ch) => ch.status === "over");
  const tights = checks.filter((ch) => ch.status === "tight");
  const first = overs[0] ?? tights[0];
  verdict.message =
    checked === "over"
      ? `Over: ${lowerFirst(first!.message)}`
      : checked === "tight"
        ? `Tight: ${lowerFirst(first!.message)}` + (complete ? "" : ` ${lacking(incomplete.length)}.`)
        : complete
          ? `Within: every check passes with at least ${fP(c.tight)} to spare.`
          : `Not confirmed: the checks with data pass, but ${lacking(incomplete.length)}.`;
  return verdict;
}
