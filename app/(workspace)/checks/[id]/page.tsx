import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { VerdictPanel } from "@/components/check/verdict-panel";
import { PrintButton } from "@/components/report/print-button";
import { ResultReport } from "@/components/report/result-report";
import { localise } from "@/lib/towing/rules/glossary";
import { Card, CardBody, CardHeader, PageHeader, buttonClasses } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { getCheck } from "@/lib/server/checks";
import { linkLifetimeDays } from "@/lib/server/organisation";
import { listShareLinks } from "@/lib/server/share-links";
import { entityId } from "@/lib/validation/checks";
import { SharePanel } from "./share-panel";
import { AppliedRules, localRulesOf } from "@/components/rules/applied-rules";
import { ruleSetStanding } from "@/lib/towing/rules/places";
import { savedCheckTitle } from "@/lib/format";

export const metadata: Metadata = { title: "Saved check" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" });

export default async function SavedCheckPage({ params }: { params: Promise<{ id: string }> }) {
  const access = await requirePage("checks.run");
  const id = entityId.safeParse((await params).id);
  const check = id.success ? await getCheck(access, id.data) : undefined;
  if (!check) notFound();
  const links = await listShareLinks(access, check.id);
  const localRules = localRulesOf(check.result);
  const standing = ruleSetStanding(check.result.rules);
  return (
    <>
    {/* On paper the check prints as the customer's one-sheet report. */}
    <div className="hidden print:block">
      <ResultReport shopName={access.organisation.name} createdAt={check.createdAt} customerName={check.customerName} rig={check.rig} result={check.result} words={(text) => localise(text, check.result.rules?.glossary ?? "us")} currentRuleSetVersion={standing.current} />
    </div>
    <div className="flex flex-col gap-6 print:hidden">
      <PageHeader
        eyebrow={
          <Link href="/checks" className="underline">
            Saved checks
          </Link>
        }
        title={savedCheckTitle(check)}
        description={`Saved ${when.format(check.createdAt)}${check.customerName ? ` for ${check.customerName}` : ""}. Computed by Towmargin core ${check.coreVersion}${check.result.rules ? `, read against the rules of ${check.result.rules.title} (rule set ${check.result.rules.ruleSetVersion})` : ""}; this snapshot never changes.`}
        actions={
          <>
            <Link href={`/check?from=${check.id}`} className={buttonClasses({ variant: "secondary" })}>
              Duplicate and change
            </Link>
            {can(access.role, "training.author") ? (
              <Link href={`/training/lessons/new?from=${check.id}`} className={buttonClasses({ variant: "secondary" })}>
                Use as a worked example
              </Link>
            ) : null}
            <PrintButton className={buttonClasses({ variant: "secondary", className: "[&_svg]:size-4" })} />
          </>
        }
      />
      {check.note ? (
        <Card>
          <CardBody>
            <p className="text-sm whitespace-pre-wrap text-ink">
              <span className="font-medium">Note: </span>
              {check.note}
            </p>
          </CardBody>
        </Card>
      ) : null}
      <Card className="no-print">
        <CardHeader title="Share with the customer" description="A read-only page of this check, for their phone, with no account. Withdraw it at any time." />
        <CardBody>
          <SharePanel
            checkId={check.id}
            canShare={can(access.role, "checks.save")}
            usualDays={await linkLifetimeDays(access)}
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
      <VerdictPanel result={check.result} rig={check.rig} />
      {localRules ? (
        <Card>
          <CardBody>
            <AppliedRules rules={localRules} currentVersion={standing.changed ? standing.current : undefined} />
          </CardBody>
        </Card>
      ) : null}
    </div>
    </>
  );
}
