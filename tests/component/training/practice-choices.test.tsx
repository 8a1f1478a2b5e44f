// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { Practice } from "@/components/training/practice";
import { libraryExample } from "@/lib/training/library";
import { prepareLesson } from "@/lib/training/prepare";

afterEach(cleanup);

// The ball-mount lesson: receiver 26 in, coupler 20 in, so 26 − 20 = 6 in of drop is needed (geometry); the 4 in
// mount leaves the trailer 2 in off level, beyond the 1 in allowance: the allowance governs, more drop is next.
const example = libraryExample("riding-level")!;
const lesson = prepareLesson(example, example.rig)!;

function answerSteps() {
  const answers: Record<string, string> = { "drop-needed": "6", "level-error": "2" };
  for (const step of lesson.steps) {
    const section = screen.getByTestId(`practice-step-${step.id}`);
    fireEvent.change(within(section).getByLabelText(/Your answer for/), { target: { value: answers[step.id] } });
    fireEvent.click(within(section).getByRole("button", { name: "Check" }));
  }
}

describe("practice: the choice questions", () => {
  it("asks them only once the steps are answered, as radio groups named by their legend", () => {
    render(<Practice lessonId="l1" steps={lesson.steps} questions={lesson.questions} submit={vi.fn()} />);
    expect(screen.queryByRole("group", { name: /Which limit governs/ })).toBeNull();
    answerSteps();
    const governs = screen.getByRole("group", { name: /Which limit governs/ });
    expect(within(governs).getAllByRole("radio").length).toBeGreaterThanOrEqual(3);
    // One question at a time: the next action waits for the first.
    expect(screen.queryByRole("group", { name: /What is the next action/ })).toBeNull();
  });

  it("asks for a choice, marks it at once and shows the right answer and why", () => {
    render(<Practice lessonId="l1" steps={lesson.steps} questions={lesson.questions} submit={vi.fn()} />);
    answerSteps();
    const governs = screen.getByTestId("practice-question-governs");
    fireEvent.click(within(governs).getByRole("button", { name: "Check" }));
    expect(within(governs).getByRole("alert").textContent).toBe("Choose one of the answers.");
    expect(within(governs).getByRole("group").getAttribute("aria-invalid")).toBe("true");
    fireEvent.click(within(governs).getByRole("radio", { name: /Vehicle tow rating/ }));
    fireEvent.click(within(governs).getByRole("button", { name: "Check" }));
    expect(within(governs).getByTestId("practice-mark").getAttribute("data-mark")).toBe("wrong");
    expect(within(governs).getByText(/the answer is “Off-level allowance at the coupler”/)).toBeTruthy();
    expect(within(governs).getByTestId("practice-why").textContent).toContain("a 6 in drop is needed");
    // Marked: the choices are fixed now.
    for (const radio of within(governs).getAllByRole("radio")) expect((radio as HTMLInputElement).disabled).toBe(true);
  });

  it("sends the chosen ids with the typed answers, and counts them in the score", async () => {
    const submit = vi.fn(async () => ({ ok: true, message: "Recorded: 3 of 4 answers right." }));
    render(<Practice lessonId="l1" steps={lesson.steps} questions={lesson.questions} submit={submit} />);
    answerSteps();
    const governs = screen.getByTestId("practice-question-governs");
    fireEvent.click(within(governs).getByRole("radio", { name: /Off-level allowance at the coupler/ }));
    fireEvent.click(within(governs).getByRole("button", { name: "Check" }));
    expect(within(governs).getByTestId("practice-mark").getAttribute("data-mark")).toBe("right");
    const next = screen.getByTestId("practice-question-next-action");
    fireEvent.click(within(next).getByRole("radio", { name: "Choose a ball mount with less drop (or a rise)" }));
    fireEvent.click(within(next).getByRole("button", { name: "Check" }));
    expect(within(next).getByTestId("practice-mark").getAttribute("data-mark")).toBe("wrong");
    expect(within(next).getByText(/the answer is “Choose a ball mount with more drop”/)).toBeTruthy();
    expect(screen.getByTestId("practice-score").textContent).toBe("3 of 4 answers right.");
    fireEvent.click(screen.getByRole("button", { name: "Record my result" }));
    expect(await screen.findByText("Recorded: 3 of 4 answers right.")).toBeTruthy();
    expect(submit).toHaveBeenCalledWith({ lessonId: "l1", answers: { "drop-needed": "6", "level-error": "2" }, choices: { governs: "level.tolerance", "next-action": "less-drop" } });
  });
});
