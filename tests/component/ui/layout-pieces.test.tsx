// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { FormMessage } from "@/components/ui/form-message";
import { PageHeader } from "@/components/ui/page-header";
import * as ui from "@/components/ui";

afterEach(cleanup);

describe("FormMessage", () => {
  it("announces the form's outcome through a status region", () => {
    render(<FormMessage tone="error">Two figures need a look before the check can run.</FormMessage>);
    const status = screen.getByRole("status");
    expect(status.getAttribute("aria-live")).toBe("polite");
    expect(status.textContent).toBe("Two figures need a look before the check can run.");
  });

  it("keeps the empty region in place so the next message is announced", () => {
    const { rerender } = render(<FormMessage tone="success" />);
    expect(screen.getByRole("status").textContent).toBe("");
    rerender(<FormMessage tone="success">Saved.</FormMessage>);
    expect(screen.getByRole("status").textContent).toBe("Saved.");
  });
});

describe("Card", () => {
  it("titles a section with a heading, its description and actions", () => {
    render(
      <Card as="section" aria-labelledby="vehicle-card">
        <CardHeader
          titleId="vehicle-card"
          title="Vehicle"
          description="Ratings from the door sticker."
          actions={<button type="button">Edit</button>}
        />
        <CardBody>Body</CardBody>
      </Card>,
    );
    expect(screen.getByRole("region", { name: "Vehicle" })).toBeTruthy();
    expect(screen.getByRole("heading", { level: 2, name: "Vehicle" })).toBeTruthy();
    expect(screen.getByText("Ratings from the door sticker.")).toBeTruthy();
    expect(screen.getByRole("button", { name: "Edit" })).toBeTruthy();
  });
});

describe("PageHeader", () => {
  it("gives the page its one top-level heading", () => {
    render(<PageHeader title="Saved checks" description="Every check the shop has run." actions={<a href="/check">New check</a>} />);
    expect(screen.getByRole("heading", { level: 1, name: "Saved checks" })).toBeTruthy();
    expect(screen.getByRole("link", { name: "New check" })).toBeTruthy();
  });
});

describe("index", () => {
  it("re-exports every building block", () => {
    const names = [
      "Button", "buttonClasses", "Field", "TextInput", "Textarea", "Select", "NumberInput", "Card", "CardHeader",
      "CardBody", "Table", "THead", "TBody", "TR", "TH", "TD", "EmptyRow", "Dialog", "ToastProvider", "useToast",
      "VerdictBadge", "FormMessage", "PageHeader",
    ];
    for (const name of names) expect(ui, name).toHaveProperty(name);
  });
});
