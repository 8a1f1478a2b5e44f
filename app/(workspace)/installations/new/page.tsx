import type { Metadata } from "next";
import Link from "next/link";
import { RecordForm } from "@/components/installations/record-form";
import { PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { recordFormOptions } from "@/lib/server/installation-pages";
import { entityId } from "@/lib/validation/checks";
import { saveInstallationAction } from "../actions";

export const metadata: Metadata = { title: "New installation" };

export default async function NewInstallationPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePage("installations.edit", "/installations/new");
  const options = await recordFormOptions(access);
  const asked = entityId.safeParse((await searchParams).vehicle);
  const vehicleProfileId = asked.success && options.vehicles.some((v) => v.id === asked.data) ? asked.data : undefined;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={
          <Link href="/installations" className="underline">
            Installations
          </Link>
        }
        title="New installation"
        description="The job, what was fitted, what was measured after fitting, and the checklist. Fitted records give the vehicle its measured figures."
      />
      <RecordForm
        units={access.organisation.units}
        {...options}
        defaults={{ vehicleProfileId, installerUserId: access.user.id, fittedOn: new Date().toISOString().slice(0, 10) }}
        action={saveInstallationAction}
      />
    </div>
  );
}
