"use client";
/**
 * Practice: the learner sees each step's figures, works the result out and types it; the step is marked at once
 * (within the step's tolerance, any unit of the right kind) and then shown in full. Then the choice questions (which
 * limit governs, what to do next), marked the same way. At the end the answers and the choices go to the server,
 * which marks them again against the core before keeping the attempt.
 */
import { useId, useState, useTransition, type FormEvent, type ReactNode } from "react";
import { CircleCheck, CircleX } from "lucide-react";
import { formatStepValue } from "@/components/check/worked-steps";
import { Button, Field, FormMessage, TextInput } from "@/components/ui";
import { markAnswer, type AnswerMark } from "@/lib/training/answers";
import type { ChoiceQuestion } from "@/lib/training/choice-answers";
import type { PreparedStep } from "@/lib/training/prepare";
import type { FormState } from "@/lib/validation/form-state";
import { FormulaView } from "./formula-view";
import { PracticeChoice, type MarkedChoice } from "./practice-choice";
import { StepFormula, StepInputs } from "./step-detail";

export type AttemptState = FormState & { correct?: number; total?: number };
export type SubmitAttempt = (input: { lessonId: string; answers: Record<string, string>; choices: Record<string, string> }) => Promise<AttemptState>;

type Marked = Extract<AnswerMark, { status: "right" | "wrong" }>;

function PracticeStep({ step, index, mark, onMarked }: { step: PreparedStep; index: number; mark?: Marked; onMarked: (answer: string, mark: Marked) => void }) {
  const [answer, setAnswer] = useState("");
  const [error, setError] = useState<string>();
  const headingId = useId();
  const check = (event: FormEvent) => {
    event.preventDefault();
    const result = markAnswer(answer, step.result.value, step.result.unit);
    if (result.status === "invalid") return setError(result.error);
    setError(undefined);
    onMarked(answer, result);
  };
  const unit = step.result.unit;
  return (
    <section aria-labelledby={headingId} className="space-y-3" data-testid={`practice-step-${step.id}`}>
      <h3 id={headingId} className="text-sm font-semibold text-ink">
        <span className="num mr-1.5 text-ink-faint">{index + 1}.</span>
        {step.title}
      </h3>
      <p className="text-[0.8125rem] leading-snug text-ink-soft">{step.formulaWords}</p>
      <StepInputs step={step} />
      {mark ? null : (
        <form onSubmit={check} className="flex flex-wrap items-end gap-3" noValidate>
          <Field
            label={<>Your answer for <FormulaView parts={[step.resultPart]} /></>}
            help={unit ? `In ${unit}, or give another unit (kg, lb, mm, in…).` : "A plain number."}
            error={error}
            className="w-full max-w-xs"
          >
            <TextInput name={`answers.${step.id}`} value={answer} onChange={(e) => setAnswer(e.target.value)} inputMode="decimal" autoComplete="off" />
          </Field>
          <Button type="submit" variant="primary">
            Check
          </Button>
        </form>
      )}
      {mark ? (
        <div className="space-y-2" data-testid="practice-mark" data-mark={mark.status}>
          <p className={mark.status === "right" ? "flex items-center gap-1.5 text-sm font-medium text-within" : "flex items-center gap-1.5 text-sm font-medium text-over"}>
            {mark.status === "right" ? <CircleCheck aria-hidden="true" className="size-4" /> : <CircleX aria-hidden="true" className="size-4" />}
            {mark.status === "right"
              ? `Right: ${formatStepValue(mark.value, unit)}${mark.typedUnit && mark.typedUnit !== unit ? ` (from your ${mark.typedUnit})` : ""}.`
              : `Not quite: you gave ${formatStepValue(mark.value, unit)}; the step gives ${formatStepValue(step.result.value, unit)}.`}
          </p>
          <StepFormula step={step} />
          {step.note ? <p className="text-[0.8125rem] leading-snug text-ink-soft">{step.note}</p> : null}
        </div>
      ) : null}
    </section>
  );
}

export function Practice({
  lessonId,
  steps,
  questions = [],
  submit,
  conclusion,
}: {
  lessonId: string;
  steps: PreparedStep[];
  questions?: ChoiceQuestion[];
  submit: SubmitAttempt;
  conclusion?: ReactNode;
}) {
  const [marks, setMarks] = useState<Record<string, Marked>>({});
  const [answers, setAnswers] = useState<Record<string, string>>({});
  const [choiceMarks, setChoiceMarks] = useState<Record<string, MarkedChoice>>({});
  const [state, setState] = useState<AttemptState>();
  const [pending, startTransition] = useTransition();
  const shown = steps.findIndex((step) => !marks[step.id]);
  const visible = shown === -1 ? steps : steps.slice(0, shown + 1);
  const stepsDone = shown === -1;
  const asked = questions.findIndex((question) => !choiceMarks[question.id]);
  const visibleQuestions = !stepsDone ? [] : asked === -1 ? questions : questions.slice(0, asked + 1);
  const done = stepsDone && asked === -1;
  const right = Object.values(marks).filter((m) => m.status === "right").length + Object.values(choiceMarks).filter((m) => m.status === "right").length;
  const total = steps.length + questions.length;

  const record = () =>
    startTransition(async () => {
      try {
        const choices = Object.fromEntries(Object.entries(choiceMarks).map(([id, mark]) => [id, mark.choiceId]));
        setState(await submit({ lessonId, answers, choices }));
      } catch {
        setState({ ok: false, message: "The result could not be saved just now. Try again in a moment." });
      }
    });

  return (
    <div className="space-y-6">
      <ol className="space-y-6">
        {visible.map((step, index) => (
          <li key={step.id} className="border-b border-rule pb-6 last:border-b-0">
            <PracticeStep
              step={step}
              index={index}
              mark={marks[step.id]}
              onMarked={(answer, mark) => {
                setAnswers((current) => ({ ...current, [step.id]: answer }));
                setMarks((current) => ({ ...current, [step.id]: mark }));
              }}
            />
          </li>
        ))}
      </ol>
      {visibleQuestions.length ? (
        <section aria-labelledby="practice-choices" className="space-y-4 border-t border-rule pt-6">
          <h3 id="practice-choices" className="text-sm font-semibold text-ink">
            What the figures mean
          </h3>
          <ol className="space-y-6">
            {visibleQuestions.map((question, index) => (
              <li key={question.id} className="border-b border-rule pb-6 last:border-b-0">
                <PracticeChoice
                  question={question}
                  index={steps.length + index}
                  mark={choiceMarks[question.id]}
                  onMarked={(mark) => setChoiceMarks((current) => ({ ...current, [question.id]: mark }))}
                />
              </li>
            ))}
          </ol>
        </section>
      ) : null}
      {done ? (
        <div className="space-y-3 rounded-md border border-rule bg-sunken px-4 py-3">
          <p className="text-sm font-semibold text-ink" data-testid="practice-score">
            {right} of {total} {questions.length ? "answers" : "steps"} right.
          </p>
          {state?.ok ? null : (
            <Button variant="primary" onClick={record} loading={pending}>
              Record my result
            </Button>
          )}
          <FormMessage tone={state?.ok ? "success" : "error"}>{state?.message}</FormMessage>
        </div>
      ) : null}
      {done ? conclusion : null}
    </div>
  );
}
