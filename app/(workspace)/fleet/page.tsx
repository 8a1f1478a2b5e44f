import type { Metadata } from "next";
import Link from "next/link";
import { Card, CardBody, PageHeader, buttonClasses } from "@/components/ui";
import { KIND_WORDS, PROFILE_KINDS } from "@/lib/fleet/fields";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { listFleetProfiles } from "@/lib/server/fleet";

export const metadata: Metadata = { title: "Fleet" };

export default async function FleetOverviewPage() {
  const access = await requirePage("fleet.read", "/fleet");
  const lists = await Promise.all(PROFILE_KINDS.map((kind) => listFleetProfiles(access, kind)));
  const canEdit = can(access.role, "fleet.edit");
  const pairs = lists[0]!.length * (lists[1]!.length + lists[2]!.length);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={`${access.organisation.name}: fleet`}
        description="The vehicles, trailers and accessories in service, and which of them may go together before a driver hooks up."
        actions={
          <>
            <Link href="/fleet/matrix" className={buttonClasses({ variant: "primary" })}>
              See the pairings
            </Link>
            {canEdit ? (
              <Link href="/fleet/import" className={buttonClasses({ variant: "secondary" })}>
                Import a spreadsheet
              </Link>
            ) : null}
          </>
        }
      />
      <div className="grid gap-4 sm:grid-cols-3">
        {PROFILE_KINDS.map((kind, i) => (
          <Card key={kind}>
            <CardBody className="flex flex-col gap-2">
              <p className="text-sm font-medium text-ink-soft">{KIND_WORDS[kind].title}</p>
              <p className="num text-3xl font-semibold">{lists[i]!.length}</p>
              <Link href={`/fleet/${kind}`} className="text-sm text-accent-strong underline">
                Open the list
              </Link>
            </CardBody>
          </Card>
        ))}
      </div>
      <p className="text-sm text-ink-soft">
        <span className="num">{pairs.toLocaleString("en-US")}</span> pairings to check: each vehicle with each trailer and accessory in service.
      </p>
    </div>
  );
}
