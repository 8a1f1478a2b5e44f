/**
 * One list of the figures still to find, gathered from every check: each figure once, in the order a person
 * gathers them (MEASURE_ORDER), with the checks that wait for it. The screens show this list once, above the
 * checks, and each check's card keeps to its own result. Pure and light, with type-only imports from the core:
 * the customer's page imports it.
 */
import type { CheckId, MissingField } from "@/lib/towing/types";

/**
 * The order a person gathers figures in: the vehicle's papers and labels, the hitch and what is fitted to it,
 * the trailer or rack, then the set-up and the load. Within one part, the order the checks ask for them.
 */
const PART_ORDER = ["vehicle", "hitch", "ballMount", "extender", "trailer", "accessory", "weightDistribution", "load", "driver"];

export interface StillToMeasure extends MissingField {
  /** The checks that wait for this figure, in the result's order. */
  checks: CheckId[];
}

interface HasMissing {
  id: CheckId;
  missing?: MissingField[];
}

export function stillToMeasure(checks: readonly HasMissing[]): StillToMeasure[] {
  const byField = new Map<string, StillToMeasure>();
  for (const check of checks) {
    for (const item of check.missing ?? []) {
      const known = byField.get(item.field);
      if (known) {
        if (!known.checks.includes(check.id)) known.checks.push(check.id);
      } else {
        byField.set(item.field, { ...item, checks: [check.id] });
      }
    }
  }
  const rank = (field: string) => {
    const at = PART_ORDER.indexOf(field.split(".")[0] ?? "");
    return at === -1 ? PART_ORDER.length : at;
  };
  const asked = [...byField.values()];
  // A stable sort: within one part, the figures keep the order the checks asked for them.
  return asked.sort((a, b) => rank(a.field) - rank(b.field));
}

/** A check's advice without the lines that only restate its missing figures (those are in the one list). */
export function ownAdvice(check: { advice: readonly string[]; missing?: MissingField[] }): string[] {
  const restated = new Set((check.missing ?? []).map((m) => `${m.what}: ${m.where}.`));
  return check.advice.filter((line) => !restated.has(line));
}
