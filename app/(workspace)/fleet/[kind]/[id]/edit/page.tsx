import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ProfileForm } from "@/components/fleet/profile-form";
import { PageHeader } from "@/components/ui";
import { KIND_WORDS, isProfileKind } from "@/lib/fleet/fields";
import { requirePage } from "@/lib/server/access";
import { getFleetProfile } from "@/lib/server/fleet";
import { profileIdSchema } from "@/lib/validation/fleet";
import { saveProfileAction } from "../../../actions";

export const metadata: Metadata = { title: "Edit a profile" };

export default async function EditProfilePage({ params }: { params: Promise<{ kind: string; id: string }> }) {
  const { kind, id } = await params;
  const access = await requirePage("fleet.edit", `/fleet/${encodeURIComponent(kind)}/${encodeURIComponent(id)}/edit`);
  if (!isProfileKind(kind) || !profileIdSchema.safeParse(id).success) notFound();
  const profile = await getFleetProfile(access, kind, id);
  if (!profile) notFound();
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={<Link href={`/fleet/${kind}/${profile.id}`} className="underline">{profile.name}</Link>}
        title={`Edit ${KIND_WORDS[kind].one}`}
        description="Saved checks keep the figures they were made with; the pairings follow the new figures at once."
      />
      <ProfileForm kind={kind} units={profile.units} profile={profile} action={saveProfileAction} />
    </div>
  );
}
