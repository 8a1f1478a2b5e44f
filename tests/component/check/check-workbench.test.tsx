// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from "vitest";
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { CheckWorkbench } from "@/components/check/check-workbench";
import type { RigInput } from "@/lib/towing";

// The screen loads its live verdict as a later chunk; here it renders at once.
vi.mock("@/components/check/live-verdict-lazy", async () => ({ LiveVerdict: (await import("@/components/check/live-verdict")).LiveVerdict }));

// The charts are loaded lazily (next/dynamic) in the browser; here each one stands in as a plain box.
vi.mock("next/dynamic", () => ({ default: () => () => <div data-testid="chart-stub" /> }));

afterEach(cleanup);

/** An invented pickup and travel trailer, every rating present; the hitch allows 4,500 lb, the lowest rating. */
const rig: RigInput = {
  units: "imperial",
  vehicle: {
    towRating: 8000,
    tongueWeightLimit: 800,
    gvwr: 7000,
    curbWeight: 5100,
    gcwr: 15000,
    gawrFront: 3700,
    gawrRear: 4000,
    axleWeights: { front: 3000, rear: 2500 },
    wheelbase: 145,
    rearAxleToHitch: 50,
  },
  hitch: { class: 4, receiverSize: "2", gtwRating: 4500, twRating: 600, receiverHeight: 21, pinToFascia: 5.5 },
  trailer: {
    type: "travel",
    grossTrailerWeight: 4000,
    tongueWeight: 500,
    tongueWeightBasis: "measured",
    couplerHeight: 18,
    couplerRating: 10000,
    couplerBallSize: "2",
    ballSize: "2",
    ballRating: 10000,
    safetyChainRating: 10000,
  },
  ballMount: { gtwRating: 10000, twRating: 1000, drop: 3, length: 9 },
  load: { occupants: 300, cargo: 100, hitchHardware: 40 },
};

function messagesOf(input: HTMLElement) {
  return (input.getAttribute("aria-describedby") ?? "")
    .split(" ")
    .map((id) => document.getElementById(id)?.textContent ?? "")
    .join(" ");
}

function level() {
  return screen.getByTestId("verdict-level");
}

describe("CheckWorkbench", () => {
  it("turns over and names the hitch's rating when the trailer is heavier than the hitch allows", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench initialRig={rig} units="imperial" />);
    expect(level().getAttribute("data-level")).not.toBe("over");

    const gtw = screen.getByLabelText("Gross trailer weight");
    await user.clear(gtw);
    await user.type(gtw, "4800");

    await waitFor(() => expect(level().getAttribute("data-level")).toBe("over"));
    expect(level().textContent).toContain("Over");
    const panel = screen.getByTestId("verdict-panel");
    expect(within(panel).getByText(/Governing:/).textContent).toContain("Hitch rating — 4,500 lb");
    expect(panel.textContent).toContain("4,800 lb on it");
    expect(screen.getByTestId("check-weakest-link").getAttribute("data-status")).toBe("over");
  });

  it("reports missing data when a needed field is cleared", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench initialRig={rig} units="imperial" />);
    const row = () => screen.getByTestId("check-weakest-link");
    expect(row().getAttribute("data-status")).not.toBe("incomplete");

    await user.clear(screen.getByLabelText("Hitch TW rating"));

    await waitFor(() => expect(row().getAttribute("data-status")).toBe("incomplete"));
    expect(within(row()).getByTestId("waits-for")).toBeTruthy();
    const asked = screen.getAllByTestId("still-to-measure")[0]!.querySelector('[data-field="hitch.twRating"]')!;
    expect(asked.textContent).toMatch(/tongue weight rating/i);
    expect(asked.textContent).toMatch(/Hitch label or stamp/);
  });

  it("shows a field-level message beside an invalid field and keeps the last verdict", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench initialRig={rig} units="imperial" />);
    const before = level().getAttribute("data-level");
    const beforeMessage = level().parentElement?.querySelector("p")?.textContent;

    const tw = screen.getByLabelText("Tongue weight") as HTMLInputElement;
    // Replace "500" in one keystroke, so no valid figure comes in between.
    await user.type(tw, "x", { initialSelectionStart: 0, initialSelectionEnd: tw.value.length });

    await waitFor(() => expect(tw.getAttribute("aria-invalid")).toBe("true"));
    // The message is announced with the field (aria-describedby) and sits in the field's own group.
    const describedBy = tw.getAttribute("aria-describedby") ?? "";
    const messages = describedBy
      .split(" ")
      .map((id) => document.getElementById(id)?.textContent ?? "")
      .join(" ");
    expect(messages).toMatch(/Tongue weight: enter a number in lb/);
    // The verdict stays what it was, marked as waiting.
    expect(level().getAttribute("data-level")).toBe(before);
    expect(level().parentElement?.querySelector("p")?.textContent).toBe(beforeMessage);
    expect(screen.getByRole("alert").textContent).toMatch(/Waiting for valid input/);
    expect(screen.getByRole("button", { name: /Tongue weight: enter a number/ })).toBeTruthy();
    // The panel was not redrawn with other figures: the weakest link still reads the old tongue weight.
    expect(screen.getByTestId("check-weakest-link").textContent).toContain("500 lb");

    // Out of range is refused the same way, with the range in the message (10,000 lb covers a gooseneck's pin weight).
    await user.type(tw, "12000", { initialSelectionStart: 0, initialSelectionEnd: tw.value.length });
    await waitFor(() => expect(messagesOf(tw)).toMatch(/Tongue weight must be at most 10000 lb/));
  });

  it("converts the entered figures when the units change", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench units="imperial" />);
    const gtw = screen.getByLabelText("Gross trailer weight") as HTMLInputElement;
    await user.type(gtw, "5000");
    const receiver = screen.getByLabelText("Receiver height") as HTMLInputElement;
    await user.type(receiver, "21");

    await user.click(screen.getByRole("radio", { name: /Metric/ }));

    await waitFor(() => expect((screen.getByLabelText("Gross trailer weight") as HTMLInputElement).value).toBe("2268"));
    expect((screen.getByLabelText("Receiver height") as HTMLInputElement).value).toBe("533");
    expect(screen.getAllByText("kg").length).toBeGreaterThan(0);

    await user.click(screen.getByRole("radio", { name: /Imperial/ }));
    await waitFor(() => expect((screen.getByLabelText("Gross trailer weight") as HTMLInputElement).value).toBe("5000"));
  });

  it("treats an empty field as not given, not as zero", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench units="imperial" />);
    await user.type(screen.getByLabelText("Gross trailer weight"), "3000");
    const row = screen.getByTestId("check-weakest-link");
    await waitFor(() => expect(row.getAttribute("data-status")).toBe("incomplete"));
    const list = screen.getAllByTestId("still-to-measure")[0]!;
    expect(list.querySelector('[data-field="vehicle.towRating"]')?.textContent).toMatch(/tow rating/i);
  });

  it("fills the vehicle from a saved profile, converting its units", async () => {
    const user = userEvent.setup();
    render(
      <CheckWorkbench
        units="metric"
        profiles={{
          vehicles: [{ id: "v1", name: "Blue pickup", rig: { units: "imperial", vehicle: { towRating: 5000 }, hitch: { gtwRating: 6000 } } }],
          trailers: [],
          accessories: [],
        }}
      />,
    );
    await user.selectOptions(screen.getByLabelText("Saved vehicle"), "v1");
    await waitFor(() => expect((screen.getByLabelText("Tow rating") as HTMLInputElement).value).toBe("2268"));
    expect((screen.getByLabelText("Hitch GTW rating") as HTMLInputElement).value).toBe("2722");
  });

  it("saves the parsed rig and links to the saved check", async () => {
    const user = userEvent.setup();
    const onSave = vi.fn(async () => ({ ok: true, checkId: "chk_1" }));
    render(<CheckWorkbench initialRig={rig} units="imperial" onSave={onSave} />);
    await user.type(screen.getByLabelText("Customer name (optional)"), "A. Customer");
    await user.click(screen.getByRole("button", { name: "Save check" }));
    await waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    const arg = (onSave.mock.calls[0] as unknown as [{ rig: RigInput; customerName?: string }])[0];
    expect(arg.customerName).toBe("A. Customer");
    expect(arg.rig.trailer?.grossTrailerWeight).toBe(4000);
    expect(arg.rig.accessory).toBeUndefined();
    const link = await screen.findByRole("link", { name: /Open the saved check/ });
    expect(link.getAttribute("href")).toBe("/checks/chk_1");
  });

  it("says nothing is saved when signed out", () => {
    render(<CheckWorkbench units="imperial" signedOut />);
    expect(screen.getByText(/Nothing is saved while you are signed out/)).toBeTruthy();
    expect(screen.getByRole("link", { name: "Sign in" }).getAttribute("href")).toBe("/sign-in");
  });
});
