import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DocumentsPanel } from "@/components/fleet/documents-panel";
import { Card, CardBody, CardHeader, PageHeader, VerdictBadge, buttonClasses } from "@/components/ui";
import { FIELDS_BY_KIND, KIND_WORDS, getPath, isProfileKind, unitFor } from "@/lib/fleet/fields";
import { formatNumber } from "@/lib/format";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { listVehicleDocuments } from "@/lib/server/documents";
import { getFleetProfile, savedChecksOfVehicle } from "@/lib/server/fleet";
import { figureSourcesOf, installationsOfVehicle, type FigureSources } from "@/lib/server/installations";
import { StateBadge } from "@/components/installations/state-badge";
import { profileIdSchema } from "@/lib/validation/fleet";
import { deleteDocumentAction } from "../../actions";

export const metadata: Metadata = { title: "Fleet profile" };

const when = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

export default async function ProfilePage({ params }: { params: Promise<{ kind: string; id: string }> }) {
  const { kind, id } = await params;
  const access = await requirePage("fleet.read", `/fleet/${encodeURIComponent(kind)}/${encodeURIComponent(id)}`);
  if (!isProfileKind(kind) || !profileIdSchema.safeParse(id).success) notFound();
  const profile = await getFleetProfile(access, kind, id);
  if (!profile) notFound();
  const canEdit = can(access.role, "fleet.edit");
  const fields = FIELDS_BY_KIND[kind];
  const groups = [...new Set(fields.map((field) => field.group))];
  const [documents, checks] =
    kind === "vehicles" ? await Promise.all([listVehicleDocuments(access, profile.id), savedChecksOfVehicle(access, profile)]) : [[], []];
  const [sources, installations]: [FigureSources, Awaited<ReturnType<typeof installationsOfVehicle>>] =
    kind === "vehicles" ? await Promise.all([figureSourcesOf(access, profile.id), can(access.role, "installations.read") ? installationsOfVehicle(access, profile.id) : []]) : [{}, []];
  const matrixFilter = kind === "vehicles" ? `vehicle=${encodeURIComponent(profile.name)}` : `hitched=${encodeURIComponent(profile.name)}`;

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={<Link href={`/fleet/${kind}`} className="underline">{KIND_WORDS[kind].title}</Link>}
        title={profile.name}
        description={`${profile.archivedAt ? "Archived. " : ""}Figures in ${profile.units === "metric" ? "kg and mm" : "lb and in"}; last changed ${when.format(profile.updatedAt)}.`}
        actions={
          <>
            <Link href={`/fleet/matrix?${matrixFilter}`} className={buttonClasses({ variant: "secondary" })}>
              Its pairings
            </Link>
            {canEdit ? (
              <Link href={`/fleet/${kind}/${profile.id}/edit`} className={buttonClasses({ variant: "primary" })}>
                Edit
              </Link>
            ) : null}
          </>
        }
      />
      <div className="grid gap-4 lg:grid-cols-2">
        {groups.map((group) => (
          <Card key={group} as="section" aria-label={group}>
            <CardHeader title={group} />
            <CardBody>
              <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-2 text-sm">
                {fields
                  .filter((field) => field.group === group)
                  .map((field) => {
                    const value = getPath(profile.data, field.path);
                    const unit = unitFor(field, profile.units);
                    return (
                      <div key={field.path} className="contents">
                        <dt className="text-ink-soft">
                          {field.label}
                          {sources[field.path] ? (
                            <Link href={`/installations/${sources[field.path]!.recordId}`} className="block text-xs text-accent-strong underline" data-testid={`source-${field.path}`}>
                              {sources[field.path]!.kind === "measured" ? "Measured" : "From the hitch label"} {sources[field.path]!.fittedOn}, installation record
                            </Link>
                          ) : null}
                        </dt>
                        <dd className="num text-right">
                          {value === undefined || value === null ? (
                            <span className="text-ink-faint">not known</span>
                          ) : typeof value === "number" && field.type === "number" ? (
                            <>
                              {formatNumber(value, unit)} <span className="text-ink-faint">{unit}</span>
                            </>
                          ) : typeof value === "boolean" ? (
                            value ? "yes" : "no"
                          ) : (
                            String(value)
                          )}
                        </dd>
                      </div>
                    );
                  })}
              </dl>
            </CardBody>
          </Card>
        ))}
      </div>
      {kind === "vehicles" ? (
        <>
          <Card as="section" aria-labelledby="vehicle-installations">
            <CardHeader
              titleId="vehicle-installations"
              title="Installation records"
              description="Hitches fitted to this vehicle. A fitted record gives the profile its hitch and measured figures, marked above with the record they came from."
              actions={
                can(access.role, "installations.edit") ? (
                  <Link href={`/installations/new?vehicle=${profile.id}`} className={buttonClasses({ variant: "secondary", size: "sm" })}>
                    Record an installation
                  </Link>
                ) : undefined
              }
            />
            <CardBody>
              {installations.length === 0 ? (
                <p className="text-sm text-ink-soft">No installation records yet.</p>
              ) : (
                <ul className="divide-y divide-rule">
                  {installations.map((row) => (
                    <li key={row.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
                      <Link href={`/installations/${row.id}`} className="text-accent-strong underline">
                        {row.fittedOn} · {row.customerName}
                        {row.installerName ? ` · ${row.installerName}` : ""}
                      </Link>
                      <StateBadge state={row.state} />
                    </li>
                  ))}
                </ul>
              )}
            </CardBody>
          </Card>
          <DocumentsPanel vehicleId={profile.id} documents={documents} canEdit={canEdit} deleteAction={deleteDocumentAction} />
          <Card as="section" aria-labelledby="vehicle-checks">
            <CardHeader titleId="vehicle-checks" title="Saved checks with this vehicle" description="Checks saved under this vehicle's name or with exactly its figures." />
            <CardBody>
              {checks.length === 0 ? (
                <p className="text-sm text-ink-soft">No saved checks yet. Open a pairing and save it from the check screen.</p>
              ) : (
                <ul className="divide-y divide-rule">
                  {checks.map((check) => (
                    <li key={check.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
                      <Link href={`/checks/${check.id}`} className="text-accent-strong underline">
                        {when.format(check.createdAt)} · {check.hitchedLabel ?? "nothing hitched"}
                        {check.customerName ? ` · ${check.customerName}` : ""}
                      </Link>
                      <VerdictBadge status={check.level} size="sm" />
                    </li>
                  ))}
                </ul>
              )}
            </CardBody>
          </Card>
        </>
      ) : null}
    </div>
  );
}
