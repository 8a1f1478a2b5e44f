import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ProfileForm } from "@/components/fleet/profile-form";
import { PageHeader } from "@/components/ui";
import { KIND_WORDS, isProfileKind } from "@/lib/fleet/fields";
import { requirePage } from "@/lib/server/access";
import { saveProfileAction } from "../../actions";

export const metadata: Metadata = { title: "Add to the fleet" };

export default async function NewProfilePage({ params }: { params: Promise<{ kind: string }> }) {
  const { kind } = await params;
  const access = await requirePage("fleet.edit", `/fleet/${encodeURIComponent(kind)}/new`);
  if (!isProfileKind(kind)) notFound();
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={<Link href={`/fleet/${kind}`} className="underline">{KIND_WORDS[kind].title}</Link>}
        title={`Add a ${KIND_WORDS[kind].one}`}
        description="Take each rating from the maker's labels; leave a field empty when it is not known: the checks then say what to measure."
      />
      <ProfileForm kind={kind} units={access.organisation.units} action={saveProfileAction} />
    </div>
  );
}
