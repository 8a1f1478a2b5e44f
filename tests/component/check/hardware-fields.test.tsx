// @vitest-environment happy-dom
/**
 * The check screen's fields for the hardware fit, the trailer's own ratings and the tyres: they are on the cards,
 * a receiver adapter or reducer sleeve goes into the rig when it is ticked or rated, and a fifth wheel hides the
 * pin, hole and adapters.
 */
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { CheckWorkbench } from "@/components/check/check-workbench";
import { cardOf, emptyFormValues, formValuesFromRig, toRigCandidate, type RigFormValues } from "@/components/check/rig-form";
import { parseRig } from "@/lib/towing";

vi.mock("next/dynamic", () => ({ default: () => () => <div data-testid="chart-stub" /> }));

afterEach(cleanup);

describe("hardware, plate and tyre fields", () => {
  it("puts a ticked adapter in the rig with no ratings, and leaves an unticked, blank one out", () => {
    const base = emptyFormValues("imperial");
    const blank = toRigCandidate(base, "trailer") as Record<string, unknown>;
    expect(blank.receiverAdapter).toBeUndefined();
    expect(blank.ballSleeve).toBeUndefined();
    const values = { ...base, receiverAdapter: { fitted: true }, ballSleeve: { twRating: 500 } } as unknown as RigFormValues;
    const rig = toRigCandidate(values, "trailer") as Record<string, unknown>;
    expect(rig.receiverAdapter).toEqual({});
    expect(rig.ballSleeve).toEqual({ twRating: 500 });
    expect(parseRig(rig).ok).toBe(true);
    // A rack rig keeps the adapter (it carries the rack), never a reducer sleeve (a rack has no ball).
    const rack = toRigCandidate(values, "accessory") as Record<string, unknown>;
    expect(rack.receiverAdapter).toEqual({});
    expect(rack.ballSleeve).toBeUndefined();
    // A saved rig with an adapter shows it ticked.
    const saved = parseRig({ units: "imperial", vehicle: {}, receiverAdapter: {} });
    if (!saved.ok) throw new Error("invalid rig");
    const back = formValuesFromRig(saved.rig, "imperial") as unknown as Record<string, Record<string, unknown>>;
    expect(back.receiverAdapter!.fitted).toBe(true);
    expect(cardOf("receiverAdapter.twRating")).toBe("hitch");
    expect(cardOf("ballSleeve.gtwRating")).toBe("hitch");
  });

  it("shows the new fields on the cards and takes what is typed", async () => {
    const user = userEvent.setup();
    render(<CheckWorkbench units="imperial" />);
    expect(screen.getByLabelText("Front tyre load capacity (each tyre)")).toBeTruthy();
    expect(screen.getByLabelText("Tow rating for a trailer without brakes")).toBeTruthy();
    expect(screen.getByLabelText("Trailer axle rating (each axle)")).toBeTruthy();
    expect(screen.getByLabelText("Trailer tyre load capacity (each tyre)")).toBeTruthy();
    await user.selectOptions(screen.getByLabelText("Hitch pin"), "5/8");
    await user.selectOptions(screen.getByLabelText("Ball shank"), "1");
    await user.selectOptions(screen.getByLabelText("Trailer axles"), "2");
    expect((screen.getByLabelText("Hitch pin") as HTMLSelectElement).value).toBe("5/8");
    await user.selectOptions(screen.getByLabelText("Hitched by"), "fifth-wheel");
    await waitFor(() => expect(screen.queryByLabelText("Hitch pin")).toBeNull());
    expect(screen.queryByLabelText("Ball shank")).toBeNull();
    expect(screen.queryByLabelText("A receiver adapter is fitted")).toBeNull();
  });
});
