/** Builders for the local-rules tests. Invented rigs; every reference value sits beside its source in the tests. */
import { evaluateRig, type LocalRulesResult, type Place, type RigResult, type RuleFinding } from "@/lib/towing";
import { rig } from "../helpers";

/** Pounds in one kilogram's inverse: kg ÷ 0.45359237 = lb (the international pound, exact by definition). */
export const KG = 0.45359237;
export const lb = (kg: number) => kg / KG;

export function trailerRig(units: "metric" | "imperial", trailer: Record<string, unknown>, more: Record<string, unknown> = {}) {
  return rig({ units, vehicle: {}, trailer: { type: "utility", ...trailer }, ...more });
}

export function run(r: ReturnType<typeof rig>, place: Place): RigResult {
  return evaluateRig(r, { place });
}

export function local(result: RigResult): LocalRulesResult {
  const c = result.checks.find((x) => x.id === "local-rules");
  if (!c) throw new Error("no local-rules check");
  return c as LocalRulesResult;
}

export function finding(result: RigResult, ruleId: string): RuleFinding {
  const f = local(result).findings.find((x) => x.ruleId === ruleId);
  if (!f) throw new Error(`no finding ${ruleId}; have ${local(result).findings.map((x) => x.ruleId).join(", ")}`);
  return f;
}

export function hasFinding(result: RigResult, ruleId: string): boolean {
  return local(result).findings.some((x) => x.ruleId === ruleId);
}
