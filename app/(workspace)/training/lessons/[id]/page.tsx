import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ActionForm } from "@/components/training/action-form";
import { LessonView } from "@/components/training/lesson-view";
import { Card, CardBody, CardHeader, Field, PageHeader, Select, buttonClasses } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { getPreparedLesson } from "@/lib/server/training";
import { VISIBILITY_WORDS } from "@/lib/training/library";
import { entityId } from "@/lib/validation/checks";
import { deleteLessonAction, setVisibilityAction } from "../../actions";

export const metadata: Metadata = { title: "Worked example" };

export default async function LessonPage({ params }: { params: Promise<{ id: string }> }) {
  const access = await requirePage("training.practise");
  const id = entityId.safeParse((await params).id);
  const found = id.success ? await getPreparedLesson(access, id.data) : undefined;
  if (!found) notFound();
  const { lesson, prepared } = found;
  const author = can(access.role, "training.author");
  const publish = author ? (
    <Card as="section" aria-labelledby="publish-heading">
      <CardHeader title="Who sees it" titleId="publish-heading" description={`Now: ${VISIBILITY_WORDS[lesson.visibility]}${lesson.hasPublicLink ? " (a public link is open)" : ""}.`} />
      <CardBody className="space-y-4">
        <ActionForm action={setVisibilityAction} hidden={{ lessonId: lesson.id }} label="Apply" variant="primary" showUrl ariaLabel="Set who sees it">
          <Field label="Visibility" className="w-full">
            <Select key={lesson.visibility} name="visibility" defaultValue={lesson.visibility}>
              <option value="draft">Draft: trainers and owners only</option>
              <option value="organisation">Everyone in the organisation</option>
              <option value="public">Everyone in the organisation, and anyone with a link (new link)</option>
            </Select>
          </Field>
        </ActionForm>
        <ActionForm action={deleteLessonAction} hidden={{ lessonId: lesson.id }} label="Delete example" variant="danger" goTo="/training" ariaLabel="Delete example" />
      </CardBody>
    </Card>
  ) : null;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={<Link href="/training" className="underline">Training</Link>}
        title={<span id="lesson-title">{lesson.title}</span>}
        actions={
          <>
            {author ? (
              <Link href={`/training/lessons/${lesson.id}/edit`} className={buttonClasses({ variant: "secondary" })}>
                Edit text
              </Link>
            ) : null}
            {prepared ? (
              <Link href={`/training/lessons/${lesson.id}/practise`} className={buttonClasses({ variant: "primary" })}>
                Practise
              </Link>
            ) : null}
          </>
        }
      />
      {prepared ? (
        <LessonView lesson={prepared} aside={publish} />
      ) : (
        <>
          {publish}
          <p className="text-sm text-ink">This rig gives no steps for its check any more. Edit the example and fill in the figures the check needs.</p>
        </>
      )}
    </div>
  );
}
