// @vitest-environment happy-dom
/** The rules applied, as the counter, the saved check and the customer's page show them. */
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { AppliedRules, localRulesOf } from "@/components/rules/applied-rules";
import { evaluateRig, parseRig } from "@/lib/towing";

afterEach(cleanup);

function gbResult() {
  const parsed = parseRig({ units: "metric", vehicle: { gvwr: 2000 }, trailer: { type: "utility", grossTrailerWeight: 800, brakes: "none" } });
  if (!parsed.ok) throw new Error("bad rig");
  return evaluateRig(parsed.rig, { place: { country: "GB", region: "ENG" } });
}

describe("AppliedRules", () => {
  it("names the rule set, its version, each rule's kind and its source", () => {
    const result = gbResult();
    render(<AppliedRules rules={localRulesOf(result)!} />);
    expect(screen.getByRole("heading", { name: /Rules applied: Great Britain/ })).toBeTruthy();
    expect(screen.getByText(/rule set/).textContent).toContain(result.rules!.ruleSetVersion);
    // Source: gov.uk "Towing with a car" (over 750 kg: brakes).
    const brakes = document.querySelector('[data-rule="gb.brakes.over-750"]')!;
    expect(brakes.textContent).toContain("Law");
    expect(brakes.textContent).toContain("Source: gov.uk, Towing with a car, Trailer brakes");
    expect(brakes.textContent).toContain("Over");
    const breakaway = document.querySelector('[data-rule="gb.breakaway"]')!;
    expect(breakaway.textContent).toContain("Check local law");
    const licence = document.querySelector('[data-rule="gb.licence.car"]')!;
    expect(licence.textContent).toContain("Check the licence");
  });
  it("on a saved check whose rule file has changed since, says so and keeps the version it was read with", () => {
    const result = gbResult();
    render(<AppliedRules rules={localRulesOf(result)!} currentVersion="2099.1.1" />);
    const line = screen.getByText(/the rules have changed since/);
    expect(line.textContent).toContain("now 2099.1.1");
    expect(screen.getByText(result.rules!.ruleSetVersion)).toBeTruthy();
  });
  it("the customer's wording", () => {
    render(<AppliedRules rules={localRulesOf(gbResult())!} variant="report" />);
    expect(screen.getByRole("heading", { name: /The rules where you drive/ })).toBeTruthy();
  });
});
