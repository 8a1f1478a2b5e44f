// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { act, cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { ToastProvider, useToast, type ToastOptions } from "@/components/ui/toast";

afterEach(cleanup);

function Trigger(props: ToastOptions) {
  const { toast } = useToast();
  return (
    <button type="button" onClick={() => toast(props)}>
      Notify
    </button>
  );
}

function liveRegion(): HTMLElement {
  const region = screen.getByRole("region", { name: "Notifications" });
  expect(region.getAttribute("aria-live")).toBe("polite");
  return region;
}

describe("toast", () => {
  it("keeps an empty polite live region in place before any message", () => {
    render(
      <ToastProvider>
        <p>Page</p>
      </ToastProvider>,
    );
    expect(liveRegion().textContent).toBe("");
  });

  it("shows the message inside the live region and dismisses it on request", async () => {
    render(
      <ToastProvider>
        <Trigger title="Check saved" description="It is in the history list." tone="success" />
      </ToastProvider>,
    );
    await userEvent.click(screen.getByRole("button", { name: "Notify" }));
    const region = liveRegion();
    expect(within(region).getByText("Check saved")).toBeTruthy();
    expect(within(region).getByText("It is in the history list.")).toBeTruthy();

    await userEvent.click(within(region).getByRole("button", { name: "Dismiss: Check saved" }));
    expect(within(region).queryByText("Check saved")).toBeNull();
  });

  describe("timing", () => {
    beforeEach(() => {
      vi.useFakeTimers({ shouldAdvanceTime: true });
    });
    afterEach(() => {
      vi.useRealTimers();
    });

    it("dismisses itself after about five seconds", async () => {
      const user = userEvent.setup({ advanceTimers: vi.advanceTimersByTime });
      render(
        <ToastProvider>
          <Trigger title="Mail could not be sent" tone="error" />
        </ToastProvider>,
      );
      await user.click(screen.getByRole("button", { name: "Notify" }));
      expect(within(liveRegion()).getByText("Mail could not be sent")).toBeTruthy();

      act(() => {
        vi.advanceTimersByTime(4000);
      });
      expect(within(liveRegion()).queryByText("Mail could not be sent")).not.toBeNull();

      act(() => {
        vi.advanceTimersByTime(1500);
      });
      expect(within(liveRegion()).queryByText("Mail could not be sent")).toBeNull();
    });
  });

  it("refuses to work outside a provider, with a message that says why", () => {
    const quiet = vi.spyOn(console, "error").mockImplementation(() => {});
    expect(() => render(<Trigger title="Orphan" />)).toThrow(/ToastProvider/);
    quiet.mockRestore();
  });
});
