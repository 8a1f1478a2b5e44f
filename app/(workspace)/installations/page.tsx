import type { Metadata } from "next";
import Link from "next/link";
import { InstallationsTable } from "@/components/installations/installations-table";
import { PageHeader, buttonClasses } from "@/components/ui";
import { installationsKey } from "@/lib/client/keys";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { listInstallations, listInstallers } from "@/lib/server/installations";
import { listInstallationsQuerySchema } from "@/lib/validation/installations";

export const metadata: Metadata = { title: "Installations" };

export default async function InstallationsPage() {
  const access = await requirePage("installations.read", "/installations");
  const initial = await listInstallations(access, listInstallationsQuerySchema.parse({}));
  const installers = (await listInstallers(access)).map(({ id, name }) => ({ id, name }));
  const initialKey = installationsKey({ state: "", installer: "", from: "", to: "", page: 1, pageSize: 25 });
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Installations"
        description={
          access.role === "fleet_manager"
            ? "Hitches fitted to the fleet's vehicles: what was fitted, what was measured, and what each hitch allows."
            : "Every hitch fitted here: what was fitted and measured, the checklist, and the customer's hand-over."
        }
        actions={
          <>
            <Link href="/installations/checklist" className={buttonClasses({ variant: "secondary" })}>
              Fitting checklist
            </Link>
            {can(access.role, "installations.edit") ? (
              <Link href="/installations/new" className={buttonClasses({ variant: "primary" })}>
                New installation
              </Link>
            ) : null}
          </>
        }
      />
      <InstallationsTable initial={initial} initialKey={initialKey} installers={installers} />
    </div>
  );
}
