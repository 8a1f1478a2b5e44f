import type { Metadata } from "next";
import Link from "next/link";
import { Card, CardBody, CardHeader, FormMessage, PageHeader, buttonClasses } from "@/components/ui";
import { ROLE_DESCRIPTIONS, ROLE_LABELS, can } from "@/lib/roles";
import { FleetAtAGlance, RecentChecks, TeamAndActivity, TrainingAtAGlance } from "@/components/overview/role-start";
import { requirePage } from "@/lib/server/access";
import { GENERAL_CAUTIONS } from "@/lib/towing";

export const metadata: Metadata = { title: "Overview" };


export default async function OverviewPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePage(undefined, "/overview");
  const params = await searchParams;
  const greeting = params.welcome !== undefined ? "Your organisation is ready." : params.joined !== undefined ? `You have joined ${access.organisation.name}.` : undefined;
  const { organisation, role } = access;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={organisation.kind === "shop" ? "Hitch shop" : "Fleet"}
        title={`Hello, ${access.user.name}`}
        description={`${ROLE_LABELS[role]} at ${organisation.name}. ${ROLE_DESCRIPTIONS[role]}`}
        actions={
          can(role, "checks.run") ? (
            <Link href="/check" className={buttonClasses({ variant: "primary" })}>
              Check a rig
            </Link>
          ) : null
        }
      />
      {greeting ? <FormMessage tone="success">{greeting}</FormMessage> : null}
      {/* Each role's start first: what this person opens the product for. */}
      <div className="grid gap-4 md:grid-cols-2" data-testid="role-start" data-role={role}>
        {role === "owner" ? <TeamAndActivity access={access} /> : null}
        {role === "owner" || role === "staff" ? <RecentChecks access={access} /> : null}
        {role === "fleet_manager" ? <FleetAtAGlance access={access} /> : null}
        {role === "trainer" ? <TrainingAtAGlance access={access} /> : null}
      </div>
      <div className="grid gap-4 md:grid-cols-2">
        <Card>
          <CardHeader title="How this organisation counts" description="Settings every check here uses." />
          <CardBody>
            <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-2 text-sm">
              <dt className="text-ink-soft">Units</dt>
              <dd className="font-medium text-ink">{organisation.units === "imperial" ? "Imperial (lb, in)" : "Metric (kg, mm)"}</dd>
              <dt className="text-ink-soft">Tight below</dt>
              <dd className="num font-medium text-ink">
                {Math.round(organisation.tightMarginRatio * 1000) / 10} <span className="font-normal text-ink-soft">% of a limit left</span>
              </dd>
            </dl>
            {can(role, "organisation.manage") ? (
              <p className="mt-4 text-sm">
                <Link href="/settings" className="text-accent underline">
                  Change the settings
                </Link>
              </p>
            ) : null}
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Before any verdict" description="Towmargin does the arithmetic; these stay true whatever it says." />
          <CardBody>
            <ul className="list-disc space-y-1.5 pl-5 text-sm leading-relaxed text-ink-soft">
              {GENERAL_CAUTIONS.map((caution) => (
                <li key={caution}>{caution}</li>
              ))}
            </ul>
          </CardBody>
        </Card>
      </div>
    </div>
  );
}
