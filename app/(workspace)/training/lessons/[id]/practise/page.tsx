import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Practice } from "@/components/training/practice";
import { LessonConclusion } from "@/components/training/lesson-conclusion";
import { LessonStory, LessonWords } from "@/components/training/lesson-view";
import { Card, CardBody, PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { getPreparedLesson } from "@/lib/server/training";
import { entityId } from "@/lib/validation/checks";
import { submitAttemptAction } from "../../../actions";

export const metadata: Metadata = { title: "Practise" };

export default async function PractisePage({ params }: { params: Promise<{ id: string }> }) {
  const access = await requirePage("training.practise");
  const id = entityId.safeParse((await params).id);
  const found = id.success ? await getPreparedLesson(access, id.data) : undefined;
  if (!found?.prepared) notFound();
  const { lesson, prepared } = found;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={<Link href={`/training/lessons/${lesson.id}`} className="underline">{lesson.title}</Link>}
        title={`Practise: ${lesson.title}`}
        description="Work out each step from the figures given, then check your answer. Give it in the step's unit or another one of the same kind; the step is shown once you have answered. Then say which limit governs and what comes next."
      />
      <Card>
        <CardBody>
          <LessonStory lesson={prepared} />
        </CardBody>
      </Card>
      <Card>
        <CardBody>
          <Practice lessonId={lesson.id} steps={prepared.steps} questions={prepared.questions} submit={submitAttemptAction} conclusion={<LessonConclusion lesson={prepared} />} />
        </CardBody>
      </Card>
      <Card>
        <CardBody>
          <LessonWords lesson={prepared} />
        </CardBody>
      </Card>
    </div>
  );
}
