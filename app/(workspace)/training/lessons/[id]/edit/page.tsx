import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LessonForm } from "@/components/training/lesson-form";
import { Card, CardBody, PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { getLesson } from "@/lib/server/training";
import { entityId } from "@/lib/validation/checks";
import { updateLessonAction } from "../../../actions";

export const metadata: Metadata = { title: "Edit worked example" };

export default async function EditLessonPage({ params }: { params: Promise<{ id: string }> }) {
  const access = await requirePage("training.author");
  const id = entityId.safeParse((await params).id);
  const lesson = id.success ? await getLesson(access, id.data) : undefined;
  if (!lesson) notFound();
  return (
    <div className="flex flex-col gap-6">
      <PageHeader eyebrow={<Link href={`/training/lessons/${lesson.id}`} className="underline">{lesson.title}</Link>} title="Edit worked example" />
      <Card>
        <CardBody>
          <LessonForm
            action={updateLessonAction}
            submitLabel="Save changes"
            defaults={{ lessonId: lesson.id, title: lesson.title, story: lesson.story, question: lesson.question, rule: lesson.rule, checkId: lesson.checkId, rig: JSON.stringify(lesson.rig, null, 2) }}
          />
        </CardBody>
      </Card>
    </div>
  );
}
