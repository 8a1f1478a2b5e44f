// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from "vitest";
import { cleanup, render, screen } from "@testing-library/react";
import { VerdictBadge, verdictWords, type VerdictStatus } from "@/components/ui/verdict-badge";

afterEach(cleanup);

const expected: [VerdictStatus, string][] = [
  ["within", "Within"],
  ["tight", "Tight"],
  ["over", "Over"],
  ["incomplete", "Not enough data"],
];

describe("VerdictBadge", () => {
  it.each(expected)("says %s in words", (status, word) => {
    render(<VerdictBadge status={status} />);
    const badge = screen.getByText(word);
    expect(badge.closest("[data-status]")?.getAttribute("data-status")).toBe(status);
  });

  it("pairs every word with an icon, and no two statuses share an icon", () => {
    const { container } = render(
      <>
        {expected.map(([status]) => (
          <VerdictBadge key={status} status={status} />
        ))}
      </>,
    );
    const shapes = expected.map(([status]) => {
      const badge = container.querySelector(`[data-status="${status}"]`);
      const svg = badge?.querySelector("svg");
      expect(svg, `${status} has an icon`).toBeTruthy();
      expect(svg?.getAttribute("aria-hidden")).toBe("true");
      return svg?.innerHTML ?? "";
    });
    expect(new Set(shapes).size).toBe(expected.length);
  });

  it("takes a label in place of the standard word", () => {
    render(<VerdictBadge status="over" label="Over by 300 lb" />);
    expect(screen.getByText("Over by 300 lb")).toBeTruthy();
    expect(screen.queryByText("Over")).toBeNull();
  });

  it("keeps the standard words in one place for other screens", () => {
    expect(verdictWords).toEqual({ within: "Within", tight: "Tight", adjust: "Adjust the set-up", over: "Over", incomplete: "Not enough data" });
  });
});
