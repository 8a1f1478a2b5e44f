import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { HandOverPanel } from "@/components/installations/hand-over-panel";
import { HandOverSheet } from "@/components/installations/hand-over-sheet";
import { PhotosPanel } from "@/components/installations/photos-panel";
import { StateBadge } from "@/components/installations/state-badge";
import { Card, CardBody, CardHeader, PageHeader, buttonClasses } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { allowanceOf, getInstallation, listInstallationLinks, listInstallationPhotos, measuredByOf } from "@/lib/server/installations";
import { entityId } from "@/lib/validation/checks";

export const metadata: Metadata = { title: "Installation" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" });

export default async function InstallationPage({ params }: { params: Promise<{ id: string }> }) {
  const access = await requirePage("installations.read");
  const id = entityId.safeParse((await params).id);
  const record = id.success ? await getInstallation(access, id.data) : undefined;
  if (!record) notFound();
  const [allowance, measuredBy, links, photos] = await Promise.all([
    allowanceOf(access.organisation.id, record),
    measuredByOf(access, record),
    listInstallationLinks(access, record.id),
    listInstallationPhotos(access, record.id),
  ]);
  const canEdit = can(access.role, "installations.edit");
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        className="no-print"
        eyebrow={
          <Link href="/installations" className="underline">
            Installations
          </Link>
        }
        title={`${record.vehicleLabel} · ${record.fittedOn}`}
        description={`For ${record.customerName}${record.installerName ? `, fitted by ${record.installerName}` : ""}.`}
        actions={
          <>
            <StateBadge state={record.state} />
            {canEdit ? (
              <Link href={`/installations/${record.id}/edit`} className={buttonClasses({ variant: "secondary" })}>
                Edit the record
              </Link>
            ) : null}
          </>
        }
      />
      <div className="no-print flex flex-col gap-2 text-sm">
        {record.vehicleProfileId ? (
          <p data-testid="profile-note">
            {record.appliedToProfileAt ? (
              <>
                The fitted hitch and the measured figures went into the vehicle&rsquo;s profile on {when.format(new Date(record.appliedToProfileAt))}:{" "}
              </>
            ) : (
              <>Planned: the vehicle&rsquo;s profile takes the figures once the record is fitted. </>
            )}
            <Link href={`/fleet/vehicles/${record.vehicleProfileId}`} className="text-accent-strong underline">
              open the vehicle
            </Link>
            .
          </p>
        ) : (
          <p className="text-ink-soft">A customer&rsquo;s vehicle, kept on this record only.</p>
        )}
        <p data-testid="customer-confirmation" className={record.customerConfirmedAt ? "text-within" : "text-ink-soft"}>
          {record.customerConfirmedAt
            ? `The customer confirmed on their page that they have read the limits: ${when.format(new Date(record.customerConfirmedAt))}.`
            : record.state === "handed-over"
              ? "The customer has not confirmed on their page yet."
              : "Not handed over yet."}
        </p>
      </div>
      <Card className="print:border-0 print:shadow-none">
        <HandOverSheet shopName={access.organisation.name} record={record} allowance={allowance} measuredBy={measuredBy} />
      </Card>
      <Card as="section" aria-labelledby="handover-panel" className="no-print">
        <CardHeader titleId="handover-panel" title="Hand over to the customer" description="A read-only page for their phone with the record and what the hitch allows; they can confirm there that they have read the limits. Withdraw it at any time." />
        <CardBody>
          <HandOverPanel
            recordId={record.id}
            canEdit={canEdit}
            planned={record.state === "planned"}
            defaultEmail={record.customerEmail ?? undefined}
            links={links.map((link) => ({
              id: link.id,
              tokenHint: link.tokenHint,
              createdAt: link.createdAt.toISOString(),
              expiresAt: link.expiresAt?.toISOString() ?? null,
              revokedAt: link.revokedAt?.toISOString() ?? null,
              lastOpenedAt: link.lastOpenedAt?.toISOString() ?? null,
            }))}
          />
        </CardBody>
      </Card>
      <PhotosPanel recordId={record.id} photos={photos} canEdit={canEdit} />
      {record.note ? (
        <Card className="no-print">
          <CardBody>
            <p className="text-sm whitespace-pre-wrap">
              <span className="font-medium">Note: </span>
              {record.note}
            </p>
          </CardBody>
        </Card>
      ) : null}
    </div>
  );
}
