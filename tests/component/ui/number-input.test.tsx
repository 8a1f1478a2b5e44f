// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { createRef } from "react";
import { Field } from "@/components/ui/field";
import { NumberInput } from "@/components/ui/number-input";

afterEach(cleanup);

describe("NumberInput", () => {
  it("is reachable by its label and shows its unit", () => {
    render(
      <Field label="Gross trailer weight">
        <NumberInput unit="lb" />
      </Field>,
    );
    const input = screen.getByLabelText("Gross trailer weight");
    expect(input.tagName).toBe("INPUT");
    expect(screen.getByText("lb")).toBeTruthy();
  });

  it("asks for a decimal keypad rather than a spinner field", () => {
    render(<NumberInput unit="mm" aria-label="Drop" />);
    const input = screen.getByRole("textbox", { name: "Drop" });
    expect(input.getAttribute("inputmode")).toBe("decimal");
    expect(input.getAttribute("type")).toBe("text");
  });

  it("announces the unit with the field, alongside Field's help", () => {
    render(
      <Field label="Receiver height" help="Ground to the top of the opening.">
        <NumberInput unit="mm" />
      </Field>,
    );
    expect(screen.getByRole("textbox", { name: "Receiver height", description: "Ground to the top of the opening. mm" })).toBeTruthy();
  });

  it("speaks a longer unit name when given one, while showing the short form", () => {
    render(<NumberInput unit="lb" unitLabel="pounds" aria-label="Payload" />);
    expect(screen.getByText("lb")).toBeTruthy();
    expect(screen.getByRole("textbox", { name: "Payload", description: "pounds" })).toBeTruthy();
  });

  it("forwards its ref to the input and keeps what is typed, separators included", async () => {
    const ref = createRef<HTMLInputElement>();
    render(<NumberInput ref={ref} unit="%" aria-label="Share on the tongue" />);
    await userEvent.type(screen.getByRole("textbox", { name: "Share on the tongue" }), "12.5");
    expect(ref.current?.value).toBe("12.5");
  });

  it("carries the invalid state from Field", () => {
    render(
      <Field label="Tongue weight" error="Enter a weight.">
        <NumberInput unit="lb" />
      </Field>,
    );
    expect(screen.getByLabelText("Tongue weight").getAttribute("aria-invalid")).toBe("true");
  });
});
