import type { Metadata } from "next";
import Link from "next/link";
import { LessonForm } from "@/components/training/lesson-form";
import { Card, CardBody, PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { getCheck } from "@/lib/server/checks";
import { LESSON_FAMILY_IDS, LIBRARY, type LessonFamily } from "@/lib/training/library";
import { entityId } from "@/lib/validation/checks";
import { createLessonAction } from "../../actions";
import { savedCheckTitle } from "@/lib/format";

export const metadata: Metadata = { title: "New worked example" };

/** A new example from scratch (starting from a library rig of the chosen family) or from a saved check (?from=). */
export default async function NewLessonPage({ searchParams }: { searchParams: Promise<{ from?: string; family?: string }> }) {
  const access = await requirePage("training.author", "/training/lessons/new");
  const query = await searchParams;
  const from = entityId.safeParse(query.from);
  const check = from.success ? await getCheck(access, from.data) : undefined;
  const family: LessonFamily = (LESSON_FAMILY_IDS as string[]).includes(query.family ?? "") ? (query.family as LessonFamily) : "weakest-link";
  const start = LIBRARY.find((example) => example.checkId === family) ?? LIBRARY[0]!;
  // From a saved check: the rig and its verdict's tightest check, but not the customer's name.
  const checkFamily = check?.result.verdict.governing?.checkId;
  const defaults = check
    ? {
        title: savedCheckTitle({ vehicleLabel: check.vehicleLabel, hitchedLabel: check.hitchedLabel }),
        story: "A customer asked at the counter whether this rig fits its ratings. Tell the learner who they are and what they want to tow or carry.",
        question: "Is this rig within its ratings, and which limit is closest?",
        rule: "The lowest rating of any part is the limit for the whole rig.",
        checkId: checkFamily && (LESSON_FAMILY_IDS as string[]).includes(checkFamily) ? checkFamily : "weakest-link",
        rig: JSON.stringify({ ...check.rig, name: undefined }, null, 2),
        sourceCheckId: check.id,
      }
    : { title: "", story: "", question: start.question, rule: start.rule, checkId: start.checkId, rig: JSON.stringify(start.rig, null, 2) };
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={<Link href="/training" className="underline">Training</Link>}
        title="New worked example"
        description={check ? "Starting from a saved check. The rig is copied; the customer's name is not." : "Start from a rig of the library and make it yours."}
      />
      <Card>
        <CardBody>
          <LessonForm action={createLessonAction} defaults={defaults} submitLabel="Save as draft" />
        </CardBody>
      </Card>
    </div>
  );
}
