// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { createRef } from "react";
import { Button, buttonClasses } from "@/components/ui/button";

afterEach(cleanup);

describe("Button", () => {
  it("is a plain button by default so it never submits a form by accident", async () => {
    const onSubmit = vi.fn((event: Event) => event.preventDefault());
    render(
      <form onSubmit={(event) => onSubmit(event.nativeEvent)}>
        <Button>Recalculate</Button>
      </form>,
    );
    const button = screen.getByRole("button", { name: "Recalculate" });
    expect(button.getAttribute("type")).toBe("button");
    await userEvent.click(button);
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it("submits when asked to", async () => {
    const onSubmit = vi.fn((event: Event) => event.preventDefault());
    render(
      <form onSubmit={(event) => onSubmit(event.nativeEvent)}>
        <Button type="submit">Save check</Button>
      </form>,
    );
    await userEvent.click(screen.getByRole("button", { name: "Save check" }));
    expect(onSubmit).toHaveBeenCalledTimes(1);
  });

  it("is busy and disabled while loading and ignores presses", async () => {
    const onClick = vi.fn();
    render(
      <Button loading onClick={onClick}>
        Send result
      </Button>,
    );
    const button = screen.getByRole("button", { name: "Send result" });
    expect(button.getAttribute("aria-busy")).toBe("true");
    expect((button as HTMLButtonElement).disabled).toBe(true);
    await userEvent.click(button);
    expect(onClick).not.toHaveBeenCalled();
  });

  it("is neither busy nor disabled when idle, and reacts to presses", async () => {
    const onClick = vi.fn();
    render(<Button onClick={onClick}>Send result</Button>);
    const button = screen.getByRole("button", { name: "Send result" });
    expect(button.hasAttribute("aria-busy")).toBe(false);
    expect((button as HTMLButtonElement).disabled).toBe(false);
    await userEvent.click(button);
    expect(onClick).toHaveBeenCalledTimes(1);
  });

  it("forwards its ref and other button props", () => {
    const ref = createRef<HTMLButtonElement>();
    render(
      <Button ref={ref} variant="danger" size="sm" aria-describedby="why" name="intent" value="delete">
        Delete hitch
      </Button>,
    );
    expect(ref.current).toBe(screen.getByRole("button", { name: "Delete hitch" }));
    expect(ref.current?.getAttribute("aria-describedby")).toBe("why");
    expect(ref.current?.name).toBe("intent");
  });

  it("styles a link as a button with the same classes as the button itself", () => {
    render(
      <>
        <a href="/check" className={buttonClasses({ variant: "secondary", size: "sm" })}>
          New check
        </a>
        <Button variant="secondary" size="sm">
          Same look
        </Button>
      </>,
    );
    const link = screen.getByRole("link", { name: "New check" });
    const button = screen.getByRole("button", { name: "Same look" });
    expect(link.className).toBe(button.className);
    expect(buttonClasses({ variant: "primary" })).not.toBe(buttonClasses({ variant: "danger" }));
  });
});
