// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useForm } from "react-hook-form";
import { Field, TextInput, Textarea } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { NumberInput } from "@/components/ui/number-input";

afterEach(cleanup);

/** The text of every element an element's aria-describedby points at, in order. */
function descriptionOf(element: HTMLElement): string {
  const ids = (element.getAttribute("aria-describedby") ?? "").split(/\s+/).filter(Boolean);
  return ids
    .map((id) => {
      const target = document.getElementById(id);
      expect(target, `aria-describedby points at a missing id "${id}"`).not.toBeNull();
      return target?.textContent ?? "";
    })
    .join(" ");
}

describe("Field", () => {
  it("labels its input so it can be found by label", () => {
    render(
      <Field label="Reference name">
        <TextInput />
      </Field>,
    );
    const input = screen.getByLabelText("Reference name");
    expect(input.tagName).toBe("INPUT");
    expect(input.id).not.toBe("");
  });

  it("describes the input with its help text and leaves it valid without an error", () => {
    render(
      <Field label="Receiver height" help="Measure from level ground to the top inside edge of the receiver opening.">
        <TextInput />
      </Field>,
    );
    const input = screen.getByRole("textbox", {
      name: "Receiver height",
      description: "Measure from level ground to the top inside edge of the receiver opening.",
    });
    expect(input.hasAttribute("aria-invalid")).toBe(false);
  });

  it("marks the input invalid and puts the error into its description, before the help", () => {
    render(
      <Field label="Tongue weight" help="Weigh the coupler end on a tongue scale." error="Enter a weight above zero.">
        <TextInput />
      </Field>,
    );
    const input = screen.getByLabelText("Tongue weight");
    expect(input.getAttribute("aria-invalid")).toBe("true");
    expect(descriptionOf(input)).toBe("Enter a weight above zero. Weigh the coupler end on a tongue scale.");
  });

  it("drops aria-describedby entirely when there is neither help nor error", () => {
    render(
      <Field label="Notes">
        <Textarea />
      </Field>,
    );
    expect(screen.getByRole("textbox", { name: "Notes" }).hasAttribute("aria-describedby")).toBe(false);
  });

  it("keeps the child's own description alongside its help", () => {
    render(
      <>
        <p id="shared-note">Figures from the door sticker.</p>
        <Field label="Axle rating" help="Printed on the axle tag.">
          <TextInput aria-describedby="shared-note" />
        </Field>
      </>,
    );
    expect(descriptionOf(screen.getByLabelText("Axle rating"))).toBe("Printed on the axle tag. Figures from the door sticker.");
  });

  it("marks a required field for assistive technology without polluting its name", () => {
    render(
      <Field label="Gross trailer weight" required>
        <TextInput />
      </Field>,
    );
    const input = screen.getByRole("textbox", { name: "Gross trailer weight" });
    expect(input.getAttribute("aria-required")).toBe("true");
  });

  it("hands the wiring to a render prop", () => {
    render(
      <Field label="Ball size" help="Stamped on top of the ball." error="Pick a size.">
        {(control) => (
          <select {...control}>
            <option value="">Choose</option>
          </select>
        )}
      </Field>,
    );
    const select = screen.getByRole("combobox", { name: "Ball size" });
    expect(select.getAttribute("aria-invalid")).toBe("true");
    expect(descriptionOf(select)).toBe("Pick a size. Stamped on top of the ball.");
  });

  it("wires a styled Select the same way", () => {
    render(
      <Field label="Hitch class" error="Choose the class on the receiver label.">
        <Select defaultValue="">
          <option value="">Choose</option>
          <option value="3">Class 3</option>
        </Select>
      </Field>,
    );
    const select = screen.getByLabelText("Hitch class");
    expect(select.tagName).toBe("SELECT");
    expect(select.getAttribute("aria-invalid")).toBe("true");
  });

  it("gives two fields on one page different ids", () => {
    render(
      <>
        <Field label="First rating" help="One">
          <TextInput />
        </Field>
        <Field label="Second rating" help="Two">
          <TextInput />
        </Field>
      </>,
    );
    const first = screen.getByLabelText("First rating");
    const second = screen.getByLabelText("Second rating");
    expect(first.id).not.toBe(second.id);
    expect(descriptionOf(first)).toBe("One");
    expect(descriptionOf(second)).toBe("Two");
  });
});

describe("TextInput and NumberInput with react-hook-form", () => {
  function RigForm({ onValues }: { onValues: (values: { label: string; towRating: string }) => void }) {
    const { register, handleSubmit } = useForm<{ label: string; towRating: string }>();
    return (
      <form onSubmit={handleSubmit(onValues)}>
        <Field label="Label">
          <TextInput {...register("label")} />
        </Field>
        <Field label="Tow rating">
          <NumberInput unit="lb" {...register("towRating")} />
        </Field>
        <button type="submit">Save</button>
      </form>
    );
  }

  it("registers through the forwarded refs and submits what was typed", async () => {
    const submitted: { label: string; towRating: string }[] = [];
    render(<RigForm onValues={(values) => submitted.push(values)} />);
    await userEvent.type(screen.getByLabelText("Label"), "Yard truck");
    await userEvent.type(screen.getByLabelText("Tow rating"), "7500");
    await userEvent.click(screen.getByRole("button", { name: "Save" }));
    expect(submitted).toEqual([{ label: "Yard truck", towRating: "7500" }]);
  });
});
