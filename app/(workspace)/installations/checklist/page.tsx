import type { Metadata } from "next";
import Link from "next/link";
import { ChecklistEditor } from "@/components/installations/checklist-editor";
import { Card, CardBody, CardHeader, PageHeader } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { listChecklistItems } from "@/lib/server/installations";

export const metadata: Metadata = { title: "Fitting checklist" };

export default async function ChecklistPage() {
  const access = await requirePage("installations.read", "/installations/checklist");
  const items = await listChecklistItems(access);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={
          <Link href="/installations" className="underline">
            Installations
          </Link>
        }
        title="Fitting checklist"
        description="The shop's own checks after every fitting, ticked on each record. Towmargin holds no maker's torque values or instructions: where an item asks for a value, the installer types it from the maker's instruction sheet."
      />
      <Card>
        <CardHeader title="Items" description={can(access.role, "installations.checklist") ? "Defined once here; every new record lists them in this order." : "The owner defines the checklist."} />
        <CardBody>
          <ChecklistEditor items={items.map(({ id, label, valueLabel }) => ({ id, label, valueLabel }))} canEdit={can(access.role, "installations.checklist")} />
        </CardBody>
      </Card>
    </div>
  );
}
