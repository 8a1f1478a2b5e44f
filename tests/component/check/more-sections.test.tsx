// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from "vitest";
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { CheckWorkbench } from "@/components/check/check-workbench";
import type { RigInput } from "@/lib/towing";

// The screen loads its live verdict as a later chunk; here it renders at once.
vi.mock("@/components/check/live-verdict-lazy", async () => ({ LiveVerdict: (await import("@/components/check/live-verdict")).LiveVerdict }));
vi.mock("next/dynamic", () => ({ default: () => () => <div data-testid="chart-stub" /> }));

afterEach(cleanup);

/** An invented crossover and utility trailer: the deciding figures, two axle figures, no load aboard. */
const rig: RigInput = {
  units: "imperial",
  vehicle: { towRating: 3500, tongueWeightLimit: 350, gvwr: 4800, curbWeight: 3600, gcwr: 8000, gawrFront: 2500, wheelbase: 108 },
  hitch: { class: 3, receiverSize: "2", gtwRating: 5000, twRating: 500 },
  trailer: { type: "utility", grossTrailerWeight: 2000, tongueWeight: 220, tongueWeightBasis: "measured" },
};

function fold(title: string): HTMLDetailsElement {
  const found = screen.getAllByTestId("more-section").find((el) => el.getAttribute("data-title") === title);
  if (!found) throw new Error(`No fold named ${title}`);
  return found as HTMLDetailsElement;
}

const summaryOf = (el: HTMLElement) => el.querySelector(":scope > summary")!.textContent ?? "";

describe("the check form's folds", () => {
  it("count the figures entered inside them and follow typing", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench initialRig={rig} units="imperial" />);
    const axles = fold("Axle ratings, weights and wheelbase");
    // Front GAWR and wheelbase of the fold's eight figures.
    await waitFor(() => expect(summaryOf(axles)).toContain("2 of 8 entered"));
    expect(axles.open).toBe(false);
    await user.type(within(axles).getByLabelText("Rear GAWR"), "2600");
    await waitFor(() => expect(summaryOf(axles)).toContain("3 of 8 entered"));
  });

  it("say how many of their figures the verdict still waits for", async () => {
    render(<CheckWorkbench initialRig={rig} units="imperial" />);
    // The payload check waits for the occupants and the cargo: both sit in "Load in the vehicle".
    const load = fold("Load in the vehicle");
    await waitFor(() => expect(summaryOf(load)).toContain("needs 2 figures"));
    expect(load.open).toBe(false);
    const list = screen.getByTestId("still-to-measure");
    expect(list.querySelector('[data-field="load.occupants"]')).not.toBeNull();
  });

  it("open by themselves when a field inside has an error", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench initialRig={rig} units="imperial" />);
    const axles = fold("Axle ratings, weights and wheelbase");
    expect(axles.open).toBe(false);
    const wheelbase = within(axles).getByLabelText("Wheelbase");
    await user.clear(wheelbase);
    await user.type(wheelbase, "lots");
    await waitFor(() => expect(axles.open).toBe(true));
    expect(summaryOf(axles)).toContain("1 to fix");
  });

  it("keep the weight-distribution figures together in one card", () => {
    render(<CheckWorkbench initialRig={rig} units="imperial" />);
    const card = document.getElementById("workbench-wd")!;
    for (const label of ["Weight distribution is used", "Tow rating with weight distribution", "Hitch TW rating with WD", "WD tongue rating", "Fender height, hitched with WD"]) {
      expect(within(card).getByLabelText(label)).toBeTruthy();
    }
    expect(within(document.getElementById("workbench-vehicle")!).queryByLabelText("Tow rating with weight distribution")).toBeNull();
    expect(within(document.getElementById("workbench-hitch")!).queryByLabelText("Hitch GTW rating with WD")).toBeNull();
  });
});
