import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { RecordForm } from "@/components/installations/record-form";
import { PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { recordFormOptions } from "@/lib/server/installation-pages";
import { getInstallation } from "@/lib/server/installations";
import { entityId } from "@/lib/validation/checks";
import { saveInstallationAction } from "../../actions";

export const metadata: Metadata = { title: "Edit installation" };

export default async function EditInstallationPage({ params }: { params: Promise<{ id: string }> }) {
  const access = await requirePage("installations.edit");
  const id = entityId.safeParse((await params).id);
  const record = id.success ? await getInstallation(access, id.data) : undefined;
  if (!record) notFound();
  const options = await recordFormOptions(access);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={
          <Link href={`/installations/${record.id}`} className="underline">
            {record.vehicleLabel} · {record.fittedOn}
          </Link>
        }
        title="Edit installation"
      />
      <RecordForm units={access.organisation.units} {...options} record={record} defaults={{ installerUserId: access.user.id, fittedOn: record.fittedOn }} action={saveInstallationAction} />
    </div>
  );
}
