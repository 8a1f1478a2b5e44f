import type { Metadata } from "next";
import { Card, CardBody, PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { linkLifetimeDays } from "@/lib/server/organisation";
import { SettingsForm } from "./settings-form";

export const metadata: Metadata = { title: "Organisation" };

export default async function SettingsPage() {
  const access = await requirePage("organisation.manage", "/settings");
  const { organisation } = access;
  const lifetime = await linkLifetimeDays(access);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Organisation" description="How checks are counted and shown for everyone here." />
      <Card>
        <CardBody className="p-5 sm:p-6">
          <SettingsForm
            defaults={{
              name: organisation.name,
              units: organisation.units,
              tightMarginPercent: Math.round(organisation.tightMarginRatio * 1000) / 10,
              frontAxleLossPercent: Math.round(organisation.frontAxleLossRatio * 1000) / 10,
              linkLifetimeDays: lifetime,
              country: organisation.country ?? "",
              region: organisation.region ?? "",
            }}
          />
        </CardBody>
      </Card>
    </div>
  );
}
