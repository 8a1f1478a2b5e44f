// @vitest-environment happy-dom
/**
 * The check screen with a fifth wheel or gooseneck: the bed hitch's fields appear, the ball mount's and weight
 * distribution's go, and what was typed for them stays in the form but not in the rig.
 */
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CheckWorkbench } from "@/components/check/check-workbench";
import { emptyFormValues, toRigCandidate, type RigFormValues } from "@/components/check/rig-form";

// The screen loads its live verdict as a later chunk; here it renders at once.
vi.mock("@/components/check/live-verdict-lazy", async () => ({ LiveVerdict: (await import("@/components/check/live-verdict")).LiveVerdict }));

// The charts are loaded lazily (next/dynamic) in the browser; here each one stands in as a plain box.
vi.mock("next/dynamic", () => ({ default: () => () => <div data-testid="chart-stub" /> }));

afterEach(cleanup);

describe("a bed hitch on the check screen", () => {
  it("leaves the ball mount, extender and weight distribution out of a fifth-wheel rig", () => {
    const values: RigFormValues = {
      ...emptyFormValues("imperial"),
      vehicle: { rearAxleToBedHitch: -4, wheelbase: 160 },
      trailer: { type: "travel", hitchType: "fifth-wheel", tongueWeight: 2000 },
      ballMount: { drop: 4, length: 10 },
      extender: { length: 6 },
      weightDistribution: { used: true, fenderUnhitched: 36 },
    };
    const rig = toRigCandidate(values, "trailer") as Record<string, unknown>;
    expect(rig.ballMount).toBeUndefined();
    expect(rig.extender).toBeUndefined();
    expect(rig.weightDistribution).toBeUndefined();
    expect(rig.trailer).toMatchObject({ hitchType: "fifth-wheel", tongueWeight: 2000 });
    expect(rig.vehicle).toMatchObject({ rearAxleToBedHitch: -4 });
    // Back to a receiver: the ball mount typed before goes into the rig again.
    const back = toRigCandidate({ ...values, trailer: { type: "travel", tongueWeight: 500 } }, "trailer") as Record<string, unknown>;
    expect(back.ballMount).toEqual({ drop: 4, length: 10 });
  });

  it("shows the bed hitch's ratings and hides the ball mount once a fifth wheel is chosen", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench units="imperial" />);
    expect(screen.getByLabelText("Ball mount length")).toBeTruthy();
    expect(screen.queryByLabelText("Bed hitch pin weight rating")).toBeNull();
    await user.selectOptions(screen.getByLabelText("Hitched by"), "fifth-wheel");
    await waitFor(() => expect(screen.getByLabelText("Bed hitch pin weight rating")).toBeTruthy());
    expect(screen.getByLabelText("Bed hitch GTW rating")).toBeTruthy();
    expect(screen.queryByLabelText("Ball mount length")).toBeNull();
    expect(screen.queryByLabelText("Fender height, unhitched")).toBeNull();
    expect(screen.getByLabelText("Pin weight")).toBeTruthy();
    expect(screen.getByLabelText("Rear axle to bed hitch")).toBeTruthy();
  });
});
