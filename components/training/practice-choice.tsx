"use client";
/**
 * One choice question of the practice: a radio group with its legend (arrow keys move between the choices, as
 * in any radio group), marked at once on "Check", then shown with the right answer and why.
 */
import { useId, useState, type FormEvent } from "react";
import { CircleCheck, CircleX } from "lucide-react";
import { Button } from "@/components/ui";
import { markChoice, type ChoiceMark, type ChoiceQuestion } from "@/lib/training/choice-answers";

export type MarkedChoice = Extract<ChoiceMark, { status: "right" | "wrong" }>;

export function PracticeChoice({ question, index, mark, onMarked }: { question: ChoiceQuestion; index: number; mark?: MarkedChoice; onMarked: (mark: MarkedChoice) => void }) {
  const [chosen, setChosen] = useState<string>();
  const [error, setError] = useState<string>();
  const legendId = useId();
  const errorId = useId();
  const check = (event: FormEvent) => {
    event.preventDefault();
    const result = markChoice(question, chosen);
    if (result.status === "invalid") return setError(result.error);
    setError(undefined);
    onMarked(result);
  };
  const answer = question.choices.find((choice) => choice.id === question.answerId);
  return (
    <section aria-labelledby={legendId} className="space-y-3" data-testid={`practice-question-${question.id}`}>
      <form onSubmit={check} className="space-y-3" noValidate>
        <fieldset className="space-y-2" aria-describedby={error ? errorId : undefined} aria-invalid={error ? true : undefined} disabled={!!mark}>
          <legend id={legendId} className="text-sm font-semibold text-ink">
            <span className="num mr-1.5 text-ink-faint">{index + 1}.</span>
            {question.title}
          </legend>
          <p className="text-[0.8125rem] leading-snug text-ink-soft">{question.prompt}</p>
          <div className="flex flex-col gap-1.5">
            {question.choices.map((choice) => {
              const picked = (mark ? mark.choiceId : chosen) === choice.id;
              const isAnswer = !!mark && choice.id === question.answerId;
              return (
                <label
                  key={choice.id}
                  className={[
                    "flex min-h-11 cursor-pointer items-start gap-2.5 rounded-md border px-3 py-2 text-sm text-ink has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent",
                    isAnswer ? "border-within bg-within-soft" : picked && mark ? "border-over bg-over-soft" : picked ? "border-accent" : "border-rule",
                    mark ? "cursor-default" : "",
                  ].join(" ")}
                >
                  <input
                    type="radio"
                    name={`choices.${question.id}`}
                    value={choice.id}
                    checked={picked}
                    disabled={!!mark}
                    onChange={() => {
                      setChosen(choice.id);
                      setError(undefined);
                    }}
                    className="mt-0.5 size-4 shrink-0 accent-accent"
                  />
                  <span className="min-w-0 flex-1">
                    {choice.label}
                    {choice.detail ? <span className="num ml-1.5 text-ink-faint">{choice.detail}</span> : null}
                  </span>
                  {isAnswer ? <span className="shrink-0 text-xs font-semibold text-within">The answer</span> : picked && mark ? <span className="shrink-0 text-xs font-semibold text-over">Your choice</span> : null}
                </label>
              );
            })}
          </div>
        </fieldset>
        {error ? (
          <p id={errorId} role="alert" className="text-[0.8125rem] font-medium text-over">
            {error}
          </p>
        ) : null}
        {mark ? null : (
          <Button type="submit" variant="primary">
            Check
          </Button>
        )}
      </form>
      {mark ? (
        <div className="space-y-1.5" data-testid="practice-mark" data-mark={mark.status} aria-live="polite">
          <p className={mark.status === "right" ? "flex items-center gap-1.5 text-sm font-medium text-within" : "flex items-center gap-1.5 text-sm font-medium text-over"}>
            {mark.status === "right" ? <CircleCheck aria-hidden="true" className="size-4 shrink-0" /> : <CircleX aria-hidden="true" className="size-4 shrink-0" />}
            {mark.status === "right" ? `Right: ${answer?.label}.` : `Not quite: the answer is “${answer?.label}”.`}
          </p>
          <p className="text-[0.8125rem] leading-snug text-ink-soft" data-testid="practice-why">
            {question.why}
          </p>
        </div>
      ) : null}
    </section>
  );
}
