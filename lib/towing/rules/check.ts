/**
 * The "local-rules" check: the findings of the place's rule set as one check of the rig, so the verdict,
 * the counter screen and the customer's page read them like any other check. A known legal "over" makes
 * the rig over; a deferred or unconfirmed rule reads "incomplete", so the rig reads "not confirmed", never
 * "within"; a guideline reads at most "tight". The check's status is the worst of its findings in the core's
 * order (over > incomplete > adjust > tight > within).
 */
import { NO_STEPS, NO_TEXT, worst, type Ctx } from "../context";
import type { Derived } from "../derive";
import type { MissingField } from "../types";
import { evaluateRules } from "./evaluate-rules";
import { placeLabel } from "./places";
import type { LocalRulesResult, Place, RuleSet } from "./types";

export interface RulesContext {
  set: RuleSet;
  place: Place;
}

const CAUTIONS = [
  "These are the rules the product knows for this place, each with its source; local law and the authorities have the last word.",
  "Guidelines are advice, not law: they may read tight or carry a caution, never over on their own.",
];

export function checkLocalRules(d: Derived, c: Ctx, rules: RulesContext): LocalRulesResult {
  const { set, place } = rules;
  const ev = evaluateRules(d, set, c);
  const status = worst(ev.findings.map((f) => f.status));
  const result: LocalRulesResult = {
    id: "local-rules",
    title: `Rules where it is driven: ${set.title}`,
    status,
    rules: {
      place,
      placeLabel: placeLabel(place),
      ruleSetId: set.id,
      ruleSetVersion: set.version,
      title: set.title,
      glossary: set.glossary,
    },
    findings: ev.findings,
    notApplicable: ev.notApplicable,
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    steps: NO_STEPS,
  };
  const missing: MissingField[] = [];
  const seen = new Set<string>();
  for (const f of ev.findings)
    for (const m of f.missing ?? [])
      if (!seen.has(m.field)) {
        seen.add(m.field);
        missing.push(m);
      }
  if (missing.length) result.missing = missing;
  if (!c.detail) return result;
  result.steps = ev.steps;
  const first =
    ev.findings.find((f) => f.status === "over") ??
    ev.findings.find((f) => f.status === "incomplete") ??
    ev.findings.find((f) => f.status === "adjust") ??
    ev.findings.find((f) => f.status === "tight");
  result.message = first
    ? first.message
    : ev.findings.length
      ? `Every rule of ${set.title} that applies is met.`
      : `None of the rules of ${set.title} apply to this rig.`;
  const advice: string[] = [];
  for (const f of ev.findings) {
    if (f.status === "over") advice.push(`${f.title}: ${f.requires}`);
    else if (f.deferred) advice.push(`${f.title}: check local law (${f.source.title}).`);
    else if (f.topic === "licence" && f.status === "incomplete") advice.push("Check the licence: enter the driver's licence category, the GVWR and the trailer's plated maximum mass.");
    else if (f.caution) advice.push(`${f.title}: ${f.requires}`);
  }
  result.advice = advice;
  result.cautions = [set.scope, ...CAUTIONS];
  return result;
}
