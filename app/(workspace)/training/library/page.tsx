import type { Metadata } from "next";
import Link from "next/link";
import { ActionForm } from "@/components/training/action-form";
import { Card, CardBody, PageHeader } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { familyLabel, LIBRARY } from "@/lib/training/library";
import { copyLibraryAction } from "../actions";

export const metadata: Metadata = { title: "Example library" };

export default async function LibraryPage() {
  const access = await requirePage("training.practise", "/training/library");
  const author = can(access.role, "training.author");
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={<Link href="/training" className="underline">Training</Link>}
        title="Example library"
        description="Built-in worked examples, one for each check, set in the invented town of Brackenfold. Every key figure is checked against a published source or the physics behind it."
      />
      <ul className="grid gap-4 md:grid-cols-2">
        {LIBRARY.map((example) => (
          <li key={example.slug}>
            <Card className="h-full">
              <CardBody className="flex h-full flex-col gap-2">
                <p className="text-xs font-semibold tracking-wide text-ink-faint uppercase">{familyLabel(example.checkId)}</p>
                <h2 className="text-base font-semibold text-ink">
                  <Link href={`/training/library/${example.slug}`} className="text-accent underline">
                    {example.title}
                  </Link>
                </h2>
                <p className="flex-1 text-sm leading-snug text-ink-soft">{example.question}</p>
                {author ? <ActionForm action={copyLibraryAction} hidden={{ slug: example.slug }} label="Copy into our lessons" goTo="/training/lessons/:id" ariaLabel={`Copy into our lessons: “${example.title}”`} /> : null}
              </CardBody>
            </Card>
          </li>
        ))}
      </ul>
    </div>
  );
}
