/** What the example shows, with the check's status, what to do, and the cautions every verdict carries. */
import { VerdictBadge } from "@/components/ui";
import type { PreparedLesson } from "@/lib/training/prepare";

export function LessonConclusion({ lesson }: { lesson: PreparedLesson }) {
  const { conclusion } = lesson;
  return (
    <section aria-labelledby="lesson-conclusion" className="space-y-3">
      <h2 id="lesson-conclusion" className="text-base font-semibold text-ink">
        What it comes to
      </h2>
      <div className="flex flex-wrap items-center gap-2">
        <VerdictBadge status={conclusion.status} data-testid="lesson-status" data-status={conclusion.status} />
        <span className="text-sm font-medium text-ink">{conclusion.title}</span>
      </div>
      <p className="text-sm leading-relaxed text-ink">{conclusion.message}</p>
      {conclusion.advice.length ? (
        <ul className="list-disc space-y-1 pl-5 text-sm text-ink">
          {conclusion.advice.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      ) : null}
      <div className="rounded-md border border-rule bg-sunken px-3 py-3">
        <h3 className="text-sm font-semibold text-ink">Cautions</h3>
        <ul className="mt-1.5 list-disc space-y-1 pl-5 text-[0.8125rem] leading-snug text-ink-soft" data-testid="lesson-cautions">
          {[...conclusion.cautions, ...conclusion.generalCautions].map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      </div>
    </section>
  );
}
