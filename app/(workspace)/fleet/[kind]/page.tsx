import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ProfilesTable } from "@/components/fleet/profiles-table";
import { PageHeader, buttonClasses } from "@/components/ui";
import { KIND_WORDS, isProfileKind } from "@/lib/fleet/fields";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { listFleetProfiles } from "@/lib/server/fleet";
import { archiveProfileAction } from "../actions";

export async function generateMetadata({ params }: { params: Promise<{ kind: string }> }): Promise<Metadata> {
  const { kind } = await params;
  return { title: isProfileKind(kind) ? `Fleet ${KIND_WORDS[kind].many}` : "Fleet" };
}

export default async function FleetListPage({ params }: { params: Promise<{ kind: string }> }) {
  const { kind } = await params;
  const access = await requirePage("fleet.read", `/fleet/${encodeURIComponent(kind)}`);
  if (!isProfileKind(kind)) notFound();
  const profiles = await listFleetProfiles(access, kind);
  const canEdit = can(access.role, "fleet.edit");
  const words = KIND_WORDS[kind];
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={words.title}
        description={
          kind === "vehicles"
            ? "Each vehicle with its hitch as fitted: ratings from the labels, and the receiver height and pin-to-fascia measured after fitting."
            : kind === "trailers"
              ? "Each trailer with the ball mount it is towed on."
              : "Racks and carriers that go into a receiver."
        }
        actions={
          canEdit ? (
            <Link href={`/fleet/${kind}/new`} className={buttonClasses({ variant: "primary" })}>
              Add a {words.one}
            </Link>
          ) : undefined
        }
      />
      <ProfilesTable kind={kind} initial={{ kind, units: access.organisation.units, profiles }} canEdit={canEdit} archiveAction={archiveProfileAction} />
    </div>
  );
}
