import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ActionForm } from "@/components/training/action-form";
import { LessonView } from "@/components/training/lesson-view";
import { PageHeader } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { libraryExample } from "@/lib/training/library";
import { prepareLesson } from "@/lib/training/prepare";
import { copyLibraryAction } from "../../actions";

export const metadata: Metadata = { title: "Library example" };

export default async function LibraryExamplePage({ params }: { params: Promise<{ slug: string }> }) {
  const access = await requirePage("training.practise");
  const example = libraryExample((await params).slug);
  if (!example) notFound();
  const lesson = prepareLesson(example, example.rig, access.organisation.tightMarginRatio);
  if (!lesson) notFound();
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={<Link href="/training/library" className="underline">Example library</Link>}
        title={<span id="lesson-title">{example.title}</span>}
        actions={can(access.role, "training.author") ? <ActionForm action={copyLibraryAction} hidden={{ slug: example.slug }} label="Copy into our lessons" variant="primary" goTo="/training/lessons/:id" /> : null}
      />
      <LessonView lesson={lesson} />
    </div>
  );
}
