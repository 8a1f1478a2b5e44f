// @vitest-environment happy-dom
import { readFileSync } from "node:fs";
import { afterEach, describe, expect, it, vi } from "vitest";
import { act, cleanup, render, screen, within } from "@testing-library/react";
import { VerdictPanel } from "@/components/check/verdict-panel";
import { verdictWords } from "@/components/ui";
import { evaluateRig, GENERAL_CAUTIONS, parseRig, type RigInput } from "@/lib/towing";

vi.mock("next/dynamic", () => ({ default: () => () => <div data-testid="chart-stub" /> }));

afterEach(cleanup);

function rig(input: unknown): RigInput {
  const parsed = parseRig(input);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.fieldErrors));
  return parsed.rig;
}

/** Invented: a trailer 400 lb heavier than the hitch's 3,500 lb, everything else in order; no GCWR given. */
const overRig = rig({
  units: "imperial",
  vehicle: {
    towRating: 7000,
    tongueWeightLimit: 700,
    gvwr: 6500,
    curbWeight: 4600,
    gawrFront: 3400,
    gawrRear: 3600,
    axleWeights: { front: 2700, rear: 2300 },
    wheelbase: 130,
    rearAxleToHitch: 45,
  },
  hitch: { gtwRating: 3500, twRating: 600, receiverHeight: 20 },
  trailer: { type: "utility", grossTrailerWeight: 3900, tongueWeight: 450, couplerHeight: 17, ballRating: 6000, couplerRating: 6000, safetyChainRating: 6000 },
  ballMount: { drop: 3 },
  load: { occupants: 300, cargo: 100, hitchHardware: 30 },
});

describe("VerdictPanel", () => {
  const result = evaluateRig(overRig);

  it("leads with the level and the sentence that matters", () => {
    render(<VerdictPanel result={result} />);
    const level = screen.getByTestId("verdict-level");
    expect(level.getAttribute("data-level")).toBe("over");
    expect(level.textContent).toBe("Over: do not tow");
    expect(screen.getByText(result.verdict.message)).toBeTruthy();
    expect(result.verdict.message).toMatch(/^Over: a rating is exceeded, do not tow like this: hitch rating/i);
    expect(screen.getByTestId("verdict-meaning").textContent).toMatch(/^A rating is exceeded: do not tow like this\./);
    expect(screen.getByText(/Governing:/).textContent).toContain("Hitch rating — 3,500 lb");
  });

  it("draws each check as a row with its status in words", () => {
    render(<VerdictPanel result={result} />);
    for (const check of result.checks) {
      const row = screen.getByTestId(`check-${check.id}`);
      expect(row.getAttribute("data-status")).toBe(check.status);
      expect(within(row).getByRole("heading", { name: check.title })).toBeTruthy();
      expect(within(row).getAllByText(verdictWords[check.status]).length).toBeGreaterThan(0);
    }
    const weakest = screen.getByTestId("check-weakest-link");
    expect(weakest.textContent).toContain("3,900 lb");
    expect(weakest.textContent).toContain("−400 lb (−11.4 %)");
    // Every link is listed, the governing one said in words.
    const table = within(weakest).getByRole("table", { name: "Every link between the vehicle and the trailer" });
    const governingRow = within(table).getByText("· governs").closest("tr")!;
    expect(governingRow.textContent).toContain("Hitch rating");
    const links = (result.checks.find((c) => c.id === "weakest-link") as { links: unknown[] }).links;
    expect(within(table).getAllByRole("row").length).toBe(1 + links.length);
  });

  it("puts what to do right under a problem", () => {
    render(<VerdictPanel result={result} />);
    const weakest = screen.getByTestId("check-weakest-link");
    const heading = within(weakest).getByText("What to do");
    const list = heading.parentElement!.querySelector("ul")!;
    expect(list.textContent).toMatch(/Hitch rating is exceeded: fit a part rated for at least 3,900 lb, provided the vehicle.s own ratings allow it, or lighten the trailer/);
    // A check within its limits shows no advice box.
    const within_ = result.checks.find((c) => c.status === "within")!;
    expect(within(screen.getByTestId(`check-${within_.id}`)).queryByText("What to do")).toBeNull();
  });

  it("keeps the worked steps inside a disclosure", () => {
    const { container } = render(<VerdictPanel result={result} />);
    const weakest = screen.getByTestId("check-weakest-link");
    const details = weakest.querySelector("details")!;
    expect(details.open).toBe(false);
    expect(within(details).getByText(/How it is worked out \(\d+ steps\)/)).toBeTruthy();
    // Built when opened, not before.
    expect(within(details).queryByRole("heading", { name: /Lowest gross trailer weight rating/ })).toBeNull();
    act(() => {
      details.open = true;
      details.dispatchEvent(new Event("toggle"));
    });
    const step = within(details).getByRole("heading", { name: /Lowest gross trailer weight rating/ });
    expect(step.closest("details")).toBe(details);
    expect(within(details).getAllByText(/GTW_max = min\(/).length).toBe(1);
    // The formula is set in the mono face; its inputs are a table of symbol, figure and value.
    expect(container.querySelector("details code")?.closest(".font-mono")).not.toBeNull();
    const inputs = within(details).getAllByRole("table")[0]!;
    expect(within(inputs).getByRole("columnheader", { name: "Symbol" })).toBeTruthy();
    expect(inputs.textContent).toContain("3,500 lb");
  });

  it("lists what to measure for a check that lacks data", () => {
    render(<VerdictPanel result={result} />);
    // No GCWR was entered: the combined-weight check cannot run and says what to look up, and where.
    const row = screen.getByTestId("check-combined-weight");
    expect(row.getAttribute("data-status")).toBe("incomplete");
    expect(within(row).getByText("Not enough data")).toBeTruthy();
    // The row points to the one list above the checks, which names the figure and where to find it, once.
    expect(within(row).getByTestId("waits-for").textContent).toMatch(/Waits for one figure/);
    const list = screen.getByTestId("still-to-measure");
    const item = list.querySelector('[data-field="vehicle.gcwr"]')!;
    expect(item.textContent).toContain("The gross combined weight rating (GCWR)");
    expect(item.textContent).toContain("Owner's manual, towing section");
    expect(list.querySelectorAll('[data-field="vehicle.gcwr"]')).toHaveLength(1);
  });

  it("shows the cautions", () => {
    render(<VerdictPanel result={result} />);
    for (const caution of GENERAL_CAUTIONS) expect(screen.getByText(caution)).toBeTruthy();
    expect(result.verdict.cautions.length).toBeGreaterThan(0);
  });

  it("announces the level only, and stamps when it was drawn", () => {
    const { rerender } = render(<VerdictPanel result={result} />);
    const live = document.querySelector("[aria-live=polite]")!;
    expect(live.textContent).toBe("Verdict: Over: do not tow");
    const panel = screen.getByTestId("verdict-panel");
    const first = Number(panel.getAttribute("data-evaluated-at"));
    expect(first).toBeGreaterThan(0);
    const lighter = evaluateRig({ ...overRig, trailer: { ...overRig.trailer!, grossTrailerWeight: 3000, tongueWeight: 360 } });
    rerender(<VerdictPanel result={lighter} />);
    expect(Number(panel.getAttribute("data-evaluated-at"))).toBeGreaterThanOrEqual(first);
    expect(screen.getByTestId("verdict-level").getAttribute("data-level")).not.toBe("over");
    expect(live.textContent).not.toContain("3,000");
  });
});

describe("VerdictPanel with a set-up to adjust", () => {
  it("says adjust the set-up, not over, for a ball mount that leaves the trailer off level", () => {
    // Source: boating publication how-to: receiver 21 in − coupler 18 in = 3 in drop needed; an 8 in mount leaves
    // it 5 in off level (the 1 in allowance is common practice, no published source): a set-up to adjust
    const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8")) as { ballMount: object };
    const adjustRig = rig({ ...camper, ballMount: { ...camper.ballMount, drop: 8 } });
    const res = evaluateRig(adjustRig);
    render(<VerdictPanel result={res} />);
    const level = screen.getByTestId("verdict-level");
    expect(level.getAttribute("data-level")).toBe("adjust");
    expect(level.textContent).toBe("Adjust the set-up");
    expect(screen.getByTestId("verdict-meaning").textContent).toBe("No rating is exceeded, but the set-up needs adjusting before you tow. See what to do under each check.");
    const row = screen.getByTestId("check-ball-mount");
    expect(row.getAttribute("data-status")).toBe("adjust");
    expect(within(row).getByText("Adjust before you tow")).toBeTruthy();
  });
});
