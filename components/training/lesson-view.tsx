/**
 * A worked example as a lesson: the story, the question, each step of the core's working, the rule it
 * illustrates, and the conclusion with its cautions. Renders on the server from a PreparedLesson.
 */
import type { ReactNode } from "react";
import { Card, CardBody } from "@/components/ui";
import { GlossaryList } from "@/components/glossary/glossary-list";
import { termsIn } from "@/lib/glossary";
import { familyLabel } from "@/lib/training/library";
import type { PreparedLesson } from "@/lib/training/prepare";
import { LessonConclusion } from "./lesson-conclusion";
import { StepDetail } from "./step-detail";

export function LessonStory({ lesson }: { lesson: Pick<PreparedLesson, "story" | "question" | "checkId" | "units"> }) {
  return (
    <div className="space-y-3">
      <p className="text-xs font-semibold tracking-wide text-ink-faint uppercase">
        {familyLabel(lesson.checkId)} · {lesson.units === "metric" ? "kg and mm" : "lb and in"}
      </p>
      <p className="text-[0.9375rem] leading-relaxed whitespace-pre-wrap text-ink">{lesson.story}</p>
      <p className="border-l-4 border-accent pl-3 text-[0.9375rem] font-medium text-ink">
        <span className="sr-only">Question: </span>
        {lesson.question}
      </p>
    </div>
  );
}

export function LessonRule({ rule }: { rule: string }) {
  return (
    <section aria-labelledby="lesson-rule" className="rounded-md border border-accent/40 bg-panel px-3 py-3">
      <h2 id="lesson-rule" className="text-sm font-semibold text-ink">
        The rule it shows
      </h2>
      <p className="mt-1 text-sm leading-relaxed text-ink">{rule}</p>
    </section>
  );
}

/** The glossary's definitions of the words and symbols this lesson uses, so a new hire can read it alone. */
export function LessonWords({ lesson }: { lesson: PreparedLesson }) {
  const texts = [lesson.story, lesson.question, lesson.rule, lesson.conclusion.message, ...lesson.conclusion.advice];
  for (const step of lesson.steps) texts.push(step.title, step.formulaWords, ...step.inputs.map((input) => input.label), step.note ?? "");
  const symbols = lesson.steps.flatMap((step) => [...step.inputs.map((input) => input.symbol), step.result.symbol]);
  return (
    <section aria-labelledby="lesson-words">
      <h2 id="lesson-words" className="mb-3 text-base font-semibold text-ink">
        Words and symbols in this lesson
      </h2>
      <GlossaryList terms={termsIn(texts)} symbols={symbols} />
    </section>
  );
}

export function LessonView({ lesson, aside }: { lesson: PreparedLesson; aside?: ReactNode }) {
  return (
    <article className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]" aria-labelledby="lesson-title">
      <div className="flex min-w-0 flex-col gap-6">
        <Card>
          <CardBody>
            <LessonStory lesson={lesson} />
          </CardBody>
        </Card>
        <Card as="section" aria-labelledby="lesson-steps">
          <CardBody>
            <h2 id="lesson-steps" className="mb-4 text-base font-semibold text-ink">
              The working, step by step
            </h2>
            <ol className="space-y-6">
              {lesson.steps.map((step, index) => (
                <li key={step.id} data-testid={`lesson-step-${step.id}`}>
                  <StepDetail step={step} index={index} />
                </li>
              ))}
            </ol>
          </CardBody>
        </Card>
        <Card>
          <CardBody>
            <LessonWords lesson={lesson} />
          </CardBody>
        </Card>
      </div>
      <div className="flex min-w-0 flex-col gap-4">
        {aside}
        <Card>
          <CardBody className="space-y-4">
            <LessonRule rule={lesson.rule} />
            <LessonConclusion lesson={lesson} />
          </CardBody>
        </Card>
      </div>
    </article>
  );
}
