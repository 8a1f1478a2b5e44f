import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { LessonView } from "@/components/training/lesson-view";
import { resolveLessonToken } from "@/lib/server/training";
import { prepareLesson } from "@/lib/training/prepare";

export const metadata: Metadata = {
  title: "Worked example",
  robots: { index: false, follow: false, nocache: true },
  referrer: "no-referrer",
};
export const dynamic = "force-dynamic";

/**
 * A worked example published by link: read-only, no account. It shows the lesson itself and nothing else of the
 * organisation that wrote it. An unknown or withdrawn link renders the not-found page.
 */
export default async function PublicLessonPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const lesson = await resolveLessonToken(token);
  const prepared = lesson ? prepareLesson(lesson, lesson.rig) : null;
  if (!prepared) notFound();
  return (
    <div className="mx-auto w-full max-w-6xl px-4 py-6 sm:px-6 sm:py-10">
      <p className="text-xs font-semibold tracking-wide text-ink-faint uppercase">Towmargin worked example</p>
      <h1 id="lesson-title" className="mt-1 mb-6 text-2xl leading-tight font-semibold tracking-tight text-ink">
        {prepared.title}
      </h1>
      <LessonView lesson={prepared} />
    </div>
  );
}
