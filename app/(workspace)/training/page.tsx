import type { Metadata } from "next";
import Link from "next/link";
import { ActionForm } from "@/components/training/action-form";
import { Card, CardBody, CardHeader, EmptyRow, Field, PageHeader, TBody, TD, TH, THead, TR, Table, TextInput, buttonClasses } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { listCourses, listLessons, listMyResults } from "@/lib/server/training";
import { familyLabel, VISIBILITY_WORDS } from "@/lib/training/library";
import { createCourseAction } from "./actions";

export const metadata: Metadata = { title: "Training" };

export default async function TrainingPage() {
  const access = await requirePage("training.practise", "/training");
  const author = can(access.role, "training.author");
  const [lessons, courses, mine] = await Promise.all([listLessons(access), listCourses(access), listMyResults(access)]);
  const myBest = new Map(mine.map((row) => [row.lessonId, row]));
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Training"
        description={author ? "Worked examples that show the math behind a verdict, step by step, for your staff to practise." : "Worked examples from your trainers: read the working, then practise each step yourself."}
        actions={
          <>
            <Link href="/training/library" className={buttonClasses({ variant: "secondary" })}>
              Example library
            </Link>
            {author ? (
              <>
                <Link href="/training/results" className={buttonClasses({ variant: "secondary" })}>
                  Learners&apos; results
                </Link>
                <Link href="/training/lessons/new" className={buttonClasses({ variant: "primary" })}>
                  New worked example
                </Link>
              </>
            ) : null}
          </>
        }
      />
      <Card as="section" aria-labelledby="courses-heading">
        <CardHeader title="Courses" titleId="courses-heading" description="Examples in the order they are taught." />
        <CardBody className="space-y-4">
          {courses.length === 0 ? <p className="text-sm text-ink-soft">No courses yet.</p> : null}
          <ul className="grid gap-3 sm:grid-cols-2">
            {courses.map((course) => (
              <li key={course.id} className="rounded-md border border-rule px-3 py-2.5">
                <Link href={`/training/courses/${course.id}`} className="font-medium text-accent underline">
                  {course.title}
                </Link>
                <p className="text-[0.8125rem] text-ink-soft">
                  {course.lessonCount === 1 ? "1 example" : `${course.lessonCount} examples`}
                  {course.description ? ` · ${course.description}` : ""}
                </p>
              </li>
            ))}
          </ul>
          {author ? (
            <ActionForm action={createCourseAction} hidden={{}} label="Make course" goTo="/training/courses/:id" ariaLabel="Make course">
              <Field label="New course title" className="w-full max-w-sm">
                <TextInput name="title" required maxLength={120} />
              </Field>
            </ActionForm>
          ) : null}
        </CardBody>
      </Card>
      <Card as="section" aria-labelledby="lessons-heading">
        <CardHeader title={author ? "Our worked examples" : "Examples to practise"} titleId="lessons-heading" description={author ? "Drafts are seen by trainers and owners only until you publish them." : undefined} />
        <Table caption="Worked examples" hideCaption>
          <THead>
            <TR>
              <TH>Example</TH>
              <TH>Check</TH>
              {author ? <TH>Who sees it</TH> : null}
              <TH>Your best</TH>
              <TH>
                <span className="sr-only">Practise</span>
              </TH>
            </TR>
          </THead>
          <TBody>
            {lessons.length === 0 ? (
              <EmptyRow colSpan={author ? 5 : 4}>{author ? "No examples yet: copy one from the library or write your own." : "Nothing published yet."}</EmptyRow>
            ) : null}
            {lessons.map((lesson) => {
              const best = myBest.get(lesson.id);
              return (
                <TR key={lesson.id}>
                  <TD>
                    <Link href={`/training/lessons/${lesson.id}`} className="text-accent underline">
                      {lesson.title}
                    </Link>
                  </TD>
                  <TD>{familyLabel(lesson.checkId)}</TD>
                  {author ? <TD>{VISIBILITY_WORDS[lesson.visibility]}</TD> : null}
                  <TD className="num">{best ? `${best.bestCorrect} / ${best.total}` : "—"}</TD>
                  <TD>
                    <Link href={`/training/lessons/${lesson.id}/practise`} className="text-accent underline">
                      Practise
                    </Link>
                  </TD>
                </TR>
              );
            })}
          </TBody>
        </Table>
      </Card>
    </div>
  );
}
