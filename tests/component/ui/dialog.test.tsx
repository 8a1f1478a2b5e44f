// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { Dialog } from "@/components/ui/dialog";

afterEach(cleanup);

function DeleteFlow({ onClose }: { onClose?: () => void }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <button type="button" onClick={() => setOpen(true)}>
        Remove hitch
      </button>
      <Dialog
        open={open}
        onClose={() => {
          onClose?.();
          setOpen(false);
        }}
        title="Remove this hitch?"
        description="Saved checks keep their own copy of its ratings."
        footer={<button type="button">Keep it</button>}
      >
        <p>The hitch leaves the list for everyone in the shop.</p>
      </Dialog>
    </>
  );
}

function dialogElement(): HTMLDialogElement {
  const element = document.querySelector("dialog");
  if (!element) throw new Error("no dialog element rendered");
  return element;
}

describe("Dialog", () => {
  it("stays shut until opened, then shows as a modal named by its title", async () => {
    render(<DeleteFlow />);
    expect(screen.queryByRole("dialog")).toBeNull();
    expect(dialogElement().open).toBe(false);

    await userEvent.click(screen.getByRole("button", { name: "Remove hitch" }));
    const dialog = screen.getByRole("dialog", { name: "Remove this hitch?" });
    expect(dialogElement().open).toBe(true);
    expect(dialog.getAttribute("aria-describedby")).toBeTruthy();
    expect(document.getElementById(dialog.getAttribute("aria-describedby") ?? "")?.textContent).toBe(
      "Saved checks keep their own copy of its ratings.",
    );
  });

  it("asks to close on Escape, closes, and hands focus back to the opener", async () => {
    const onClose = vi.fn();
    render(<DeleteFlow onClose={onClose} />);
    const opener = screen.getByRole("button", { name: "Remove hitch" });
    await userEvent.click(opener);
    expect(dialogElement().open).toBe(true);

    await userEvent.keyboard("{Escape}");
    expect(onClose).toHaveBeenCalledTimes(1);
    expect(dialogElement().open).toBe(false);
    expect(document.activeElement).toBe(opener);
  });

  it("asks to close from its close button", async () => {
    const onClose = vi.fn();
    render(<DeleteFlow onClose={onClose} />);
    await userEvent.click(screen.getByRole("button", { name: "Remove hitch" }));
    await userEvent.click(screen.getByRole("button", { name: "Close" }));
    expect(onClose).toHaveBeenCalledTimes(1);
    expect(dialogElement().open).toBe(false);
  });

  it("stays open when the parent declines to close it", async () => {
    const onClose = vi.fn();
    render(
      <Dialog open onClose={onClose} title="Unsaved figures">
        <p>Keep typing.</p>
      </Dialog>,
    );
    await userEvent.keyboard("{Escape}");
    expect(onClose).toHaveBeenCalledTimes(1);
    expect(dialogElement().open).toBe(true);
  });

  it("does not treat a press inside the panel as a press on the backdrop", async () => {
    const onClose = vi.fn();
    render(
      <Dialog open onClose={onClose} title="Edit rating">
        <p>Inside the panel</p>
      </Dialog>,
    );
    await userEvent.click(screen.getByText("Inside the panel"));
    expect(onClose).not.toHaveBeenCalled();
    await userEvent.click(dialogElement());
    expect(onClose).toHaveBeenCalledTimes(1);
  });

  it("closes when the parent sets open to false", () => {
    const { rerender } = render(<Dialog open onClose={() => {}} title="Import finished" />);
    expect(dialogElement().open).toBe(true);
    rerender(<Dialog open={false} onClose={() => {}} title="Import finished" />);
    expect(dialogElement().open).toBe(false);
  });
});
