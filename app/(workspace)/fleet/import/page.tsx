import type { Metadata } from "next";
import { ImportPanel } from "@/components/fleet/import-panel";
import { PageHeader } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";

export const metadata: Metadata = { title: "Import the fleet" };

export default async function ImportPage() {
  const access = await requirePage("fleet.read", "/fleet/import");
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Import from a spreadsheet"
        description="Check a CSV file first: each row's problems are listed by column. Then import the valid rows, or nothing unless every row is valid."
      />
      <ImportPanel canEdit={can(access.role, "fleet.edit")} />
    </div>
  );
}
