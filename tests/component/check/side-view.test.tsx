// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { SideView } from "@/components/check/side-view";
import type { RigInput } from "@/lib/towing";

afterEach(cleanup);

type SideRig = Partial<RigInput> & { units: RigInput["units"] };

/** A dimension's label, whether it reads on one line or as its name over its value. */
const dim = (text: string) => (_: string, el: Element | null) => el?.tagName.toLowerCase() === "text" && el.textContent === text;

/** Invented: a utility trailer on a 4 in drop; the figures are demo numbers, not from any vehicle. */
const trailerRig: SideRig = {
  units: "imperial",
  vehicle: { rearAxleToPin: 40, departureAngle: 22 },
  hitch: { receiverHeight: 20, pinToFascia: 5, receiverSize: "2" },
  ballMount: { length: 8, drop: 4 },
  trailer: { type: "utility", grossTrailerWeight: 2000, tongueWeight: 250, couplerHeight: 16.5 },
};

/** Invented: a platform rack on a 150 mm extender, metric. */
const rackRig: SideRig = {
  units: "metric",
  vehicle: { rearAxleToPin: 1000 },
  hitch: { receiverHeight: 480, pinToFascia: 100 },
  extender: { length: 150 },
  accessory: { type: "platform-rack", weight: 20, foldClearance: 300, lowestPointBelowShankTop: 250, lowestPointBehindPin: 500, shankRise: 50 },
};

describe("SideView", () => {
  it("labels a trailer rig's distances with their values and units, and says what it draws", () => {
    render(<SideView rig={trailerRig} kind="trailer" />);
    screen.getByRole("img", {
      name: /hitch and trailer coupler, to scale/,
      description: /Receiver 20\.0 in above the ground, pin hole 5\.0 in behind the fascia, rear axle to pin hole 40\.0 in, ball mount 8\.0 in long, drop 4\.0 in, coupler 16\.5 in high/,
    });
    for (const label of ["receiver height 20.0 in", "pin hole to fascia 5.0 in", "rear axle to pin hole 40.0 in", "ball mount 8.0 in", "drop 4.0 in", "coupler 16.5 in"])
      expect(screen.getByText(dim(label))).toBeTruthy();
    expect(screen.queryByText(/Assumed, drawn dashed/, { selector: "figcaption" })).toBeNull();
  });

  it("labels a rack rig's distances, folded and unfolded, with fold clearance over the room in the over tone", () => {
    render(<SideView rig={rackRig} kind="accessory" accessoryAngle={12.3} />);
    // Statics: ground clearance = 480 + 50 − 250 = 280 mm; room to fold = 100 + 150 = 250 mm.
    screen.getByRole("img", { name: /accessory, folded and unfolded, to scale/, description: /ground clearance 280 mm.*folded it needs 300 mm ahead of the pin of 250 mm room/ });
    for (const label of ["receiver height 480 mm", "pin hole to fascia 100 mm", "rear axle to pin hole 1,000 mm", "lowest point 500 mm behind pin", "fold clearance 300 mm", "ground clearance 280 mm"])
      expect(screen.getByText(dim(label))).toBeTruthy();
    expect(screen.getByText(dim("fold clearance 300 mm")).getAttribute("fill")).toBe("var(--color-over)");
    expect(screen.getByText("folded")).toBeTruthy();
  });

  it("draws an empty rig dashed and names every assumed part", () => {
    render(<SideView rig={{ units: "imperial" }} kind="trailer" />);
    const assumed = /Assumed, drawn dashed: receiver height, rear axle to pin hole, pin hole to fascia, ball mount length, ball mount rise or drop, coupler height\./;
    expect(screen.getByText(assumed, { selector: "figcaption" })).toBeTruthy();
    screen.getByRole("img", { description: /Receiver height not given/ });
    screen.getByRole("img", { description: assumed });
  });
});
