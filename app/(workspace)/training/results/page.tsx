import type { Metadata } from "next";
import Link from "next/link";
import { ResultsTable } from "@/components/training/results-table";
import { PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { listLessons, listResults } from "@/lib/server/training";

export const metadata: Metadata = { title: "Learners' results" };

export default async function ResultsPage() {
  const access = await requirePage("training.author", "/training/results");
  const [rows, lessons] = await Promise.all([listResults(access), listLessons(access)]);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader eyebrow={<Link href="/training" className="underline">Training</Link>} title="Learners' results" description="Each learner's practice per example: attempts, best and latest score out of the example's steps." />
      <ResultsTable initial={rows} lessons={lessons.map((lesson) => ({ id: lesson.id, title: lesson.title }))} />
    </div>
  );
}
