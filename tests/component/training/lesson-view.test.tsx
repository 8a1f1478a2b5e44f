// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { LessonView } from "@/components/training/lesson-view";
import { Practice } from "@/components/training/practice";
import { GENERAL_CAUTIONS } from "@/lib/towing";
import { libraryExample } from "@/lib/training/library";
import { prepareLesson } from "@/lib/training/prepare";

vi.mock("next/navigation", () => ({ useRouter: () => ({ push: () => undefined }) }));

afterEach(cleanup);

const example = libraryExample("tongue-load-on-the-axles")!;
const lesson = prepareLesson(example, example.rig)!;

describe("the lesson view", () => {
  it("tells the story, asks the question and shows every step with its formula, figures and result", () => {
    render(<LessonView lesson={lesson} />);
    expect(screen.getByText(example.story)).toBeTruthy();
    expect(screen.getByText(example.question)).toBeTruthy();
    const steps = screen.getByRole("heading", { name: "The working, step by step" }).parentElement!;
    expect(within(steps).getAllByRole("listitem")).toHaveLength(4);
    const rear = screen.getByTestId("lesson-step-rear-change");
    expect(within(rear).getByRole("heading", { name: /rear/i })).toBeTruthy();
    // Physics: statics, 800 × (145 + 50) ÷ 145 = 1,075.86 lb, shown rounded to the pound
    expect(within(rear).getByTestId("step-result").textContent).toBe("1,076 lb");
    expect(within(rear).getByTestId("step-substituted").textContent?.replace(/\u00a0/g, " ")).toContain("ΔR=800 lb×(145.0 in+50.0 in)÷145.0 in");
    expect(within(rear).getByRole("table", { name: /figures for/i })).toBeTruthy();
  });

  it("ends with the rule, the check's status in words and the usual cautions", () => {
    render(<LessonView lesson={lesson} />);
    expect(screen.getByRole("heading", { name: "The rule it shows" })).toBeTruthy();
    expect(screen.getByText(example.rule)).toBeTruthy();
    expect(screen.getByTestId("lesson-status").getAttribute("data-status")).toBe("tight");
    const cautions = screen.getByTestId("lesson-cautions").textContent ?? "";
    for (const caution of GENERAL_CAUTIONS) expect(cautions).toContain(caution);
  });
});

describe("practice", () => {
  it("hides each result until it is answered, marks it, then shows the working and the next step", () => {
    const submit = vi.fn(async () => ({ ok: true, message: "Recorded: 3 of 4 steps right." }));
    render(<Practice lessonId="l1" steps={lesson.steps} submit={submit} />);
    expect(screen.queryByTestId("step-result")).toBeNull();
    expect(screen.queryByTestId("practice-step-rear-change")).toBeNull();
    const first = screen.getByTestId("practice-step-front-change");
    const field = within(first).getByLabelText(/Your answer for/);
    fireEvent.click(within(first).getByRole("button", { name: "Check" }));
    expect(within(first).getByText("Enter your answer as a number.")).toBeTruthy();
    expect(field.getAttribute("aria-invalid")).toBe("true");
    fireEvent.change(field, { target: { value: "\u2212125 kg" } });
    fireEvent.click(within(first).getByRole("button", { name: "Check" }));
    // Physics: −275.86 lb × 0.45359237 = −125.1 kg, within the tolerance
    expect(within(first).getByTestId("practice-mark").getAttribute("data-mark")).toBe("right");
    expect(within(first).getByTestId("step-substituted")).toBeTruthy();
    const second = screen.getByTestId("practice-step-rear-change");
    fireEvent.change(within(second).getByLabelText(/Your answer for/), { target: { value: "800" } });
    fireEvent.click(within(second).getByRole("button", { name: "Check" }));
    expect(within(second).getByTestId("practice-mark").getAttribute("data-mark")).toBe("wrong");
    expect(within(second).getByText(/the step gives 1,076 lb/)).toBeTruthy();
  });

  it("offers to record the result once every step is answered", async () => {
    const submit = vi.fn(async () => ({ ok: true, message: "Recorded: 4 of 4 steps right." }));
    render(<Practice lessonId="l1" steps={lesson.steps} submit={submit} conclusion={<p>Conclusion here</p>} />);
    const answers = ["-276", "1076", "2824", "3676"];
    lesson.steps.forEach((step, index) => {
      const section = screen.getByTestId(`practice-step-${step.id}`);
      fireEvent.change(within(section).getByLabelText(/Your answer for/), { target: { value: answers[index] } });
      fireEvent.click(within(section).getByRole("button", { name: "Check" }));
    });
    expect(screen.getByTestId("practice-score").textContent).toBe("4 of 4 steps right.");
    expect(screen.getByText("Conclusion here")).toBeTruthy();
    fireEvent.click(screen.getByRole("button", { name: "Record my result" }));
    expect(await screen.findByText("Recorded: 4 of 4 steps right.")).toBeTruthy();
    expect(submit).toHaveBeenCalledWith({ lessonId: "l1", answers: { "front-change": "-276", "rear-change": "1076", "front-hitched": "2824", "rear-hitched": "3676" }, choices: {} });
  });
});
