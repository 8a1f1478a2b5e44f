import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, buttonClasses } from "@/components/ui";
import { checksKey } from "@/lib/client/keys";
import { requirePage } from "@/lib/server/access";
import { listChecks } from "@/lib/server/checks";
import { listChecksQuerySchema } from "@/lib/validation/checks";
import { ChecksTable } from "./checks-table";

export const metadata: Metadata = { title: "Saved checks" };

export default async function ChecksPage() {
  const access = await requirePage("checks.run", "/checks");
  const query = listChecksQuerySchema.parse({ pageSize: 20 });
  const initial = await listChecks(access, query);
  const initialKey = checksKey({ vehicle: "", customer: "", from: "", to: "", level: "", sort: "createdAt", dir: "desc", page: 1, pageSize: 20 });
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Saved checks" description={`Every check saved at ${access.organisation.name}, newest first. A saved check never changes; duplicate it to try a change.`}
        actions={
          <Link href="/check" className={buttonClasses({ variant: "primary" })}>
            Check a new rig
          </Link>
        }
      />
      <ChecksTable initial={initial} initialKey={initialKey} />
    </div>
  );
}
