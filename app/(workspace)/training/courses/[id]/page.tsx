import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ActionForm } from "@/components/training/action-form";
import { Card, CardBody, CardHeader, Field, PageHeader, Select, TextInput, Textarea } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { getCourse, listLessons } from "@/lib/server/training";
import { familyLabel, VISIBILITY_WORDS } from "@/lib/training/library";
import { entityId } from "@/lib/validation/checks";
import { addCourseLessonAction, deleteCourseAction, moveCourseLessonAction, removeCourseLessonAction, updateCourseAction } from "../../actions";

export const metadata: Metadata = { title: "Course" };

export default async function CoursePage({ params }: { params: Promise<{ id: string }> }) {
  const access = await requirePage("training.practise");
  const id = entityId.safeParse((await params).id);
  const course = id.success ? await getCourse(access, id.data) : undefined;
  if (!course) notFound();
  const author = can(access.role, "training.author");
  const inCourse = new Set(course.lessons.map((lesson) => lesson.id));
  const addable = author ? (await listLessons(access)).filter((lesson) => !inCourse.has(lesson.id)) : [];
  return (
    <div className="flex flex-col gap-6">
      <PageHeader eyebrow={<Link href="/training" className="underline">Training</Link>} title={course.title} description={course.description || undefined} />
      <Card as="section" aria-labelledby="course-lessons">
        <CardHeader title="Examples, in order" titleId="course-lessons" />
        <CardBody>
          {course.lessons.length === 0 ? <p className="text-sm text-ink-soft">{author ? "No examples yet: add one below." : "Nothing published in this course yet."}</p> : null}
          <ol className="divide-y divide-rule" data-testid="course-order">
            {course.lessons.map((lesson, index) => (
              <li key={lesson.id} className="flex flex-wrap items-center justify-between gap-3 py-3">
                <div className="min-w-0">
                  <span className="num mr-2 text-ink-faint">{index + 1}.</span>
                  <Link href={`/training/lessons/${lesson.id}`} className="font-medium text-accent underline">
                    {lesson.title}
                  </Link>
                  <span className="ml-2 text-[0.8125rem] text-ink-soft">
                    {familyLabel(lesson.checkId)}
                    {author ? ` · ${VISIBILITY_WORDS[lesson.visibility]}` : ""}
                  </span>
                </div>
                {author ? (
                  <div className="flex flex-wrap gap-2">
                    {index > 0 ? <ActionForm action={moveCourseLessonAction} hidden={{ courseId: course.id, lessonId: lesson.id, direction: "up" }} label="Up" ariaLabel={`Up: move “${lesson.title}” up`} /> : null}
                    {index < course.lessons.length - 1 ? <ActionForm action={moveCourseLessonAction} hidden={{ courseId: course.id, lessonId: lesson.id, direction: "down" }} label="Down" ariaLabel={`Down: move “${lesson.title}” down`} /> : null}
                    <ActionForm action={removeCourseLessonAction} hidden={{ courseId: course.id, lessonId: lesson.id }} label="Remove" variant="quiet" ariaLabel={`Remove “${lesson.title}” from the course`} />
                  </div>
                ) : (
                  <Link href={`/training/lessons/${lesson.id}/practise`} className="text-sm text-accent underline">
                    Practise
                  </Link>
                )}
              </li>
            ))}
          </ol>
        </CardBody>
      </Card>
      {author ? (
        <div className="grid gap-6 md:grid-cols-2">
          <Card as="section" aria-labelledby="course-add">
            <CardHeader title="Add an example" titleId="course-add" description="Drafts can sit in a course; learners see them once published." />
            <CardBody>
              {addable.length ? (
                <ActionForm action={addCourseLessonAction} hidden={{ courseId: course.id }} label="Add" variant="primary" ariaLabel="Add to the course">
                  <Field label="Example" className="w-full max-w-sm">
                    <Select name="lessonId">
                      {addable.map((lesson) => (
                        <option key={lesson.id} value={lesson.id}>
                          {lesson.title}
                        </option>
                      ))}
                    </Select>
                  </Field>
                </ActionForm>
              ) : (
                <p className="text-sm text-ink-soft">Every example is in this course already.</p>
              )}
            </CardBody>
          </Card>
          <Card as="section" aria-labelledby="course-edit">
            <CardHeader title="Course details" titleId="course-edit" />
            <CardBody className="space-y-4">
              <ActionForm action={updateCourseAction} hidden={{ courseId: course.id }} label="Save" ariaLabel="Save course details">
                <div className="flex w-full flex-col gap-3">
                  <Field label="Title">
                    <TextInput name="title" defaultValue={course.title} required maxLength={120} />
                  </Field>
                  <Field label="Description">
                    <Textarea name="description" defaultValue={course.description} rows={2} maxLength={1000} />
                  </Field>
                </div>
              </ActionForm>
              <ActionForm action={deleteCourseAction} hidden={{ courseId: course.id }} label="Delete course" variant="danger" goTo="/training" ariaLabel="Delete course" />
            </CardBody>
          </Card>
        </div>
      ) : null}
    </div>
  );
}
