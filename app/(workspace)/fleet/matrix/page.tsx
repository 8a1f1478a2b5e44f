import type { Metadata } from "next";
import { PairingMatrix } from "@/components/fleet/pairing-matrix";
import { PageHeader } from "@/components/ui";
import { fleetMatrixKey } from "@/lib/fleet/keys";
import { requirePage } from "@/lib/server/access";
import { fleetMatrix } from "@/lib/server/fleet";
import { GENERAL_CAUTIONS, VERDICT_LEVELS } from "@/lib/towing";
import { matrixQuerySchema } from "@/lib/validation/fleet";

export const metadata: Metadata = { title: "Fleet pairings" };

export default async function MatrixPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePage("fleet.read", "/fleet/matrix");
  const params = await searchParams;
  const text = (value: unknown) => (typeof value === "string" ? value.slice(0, 120) : "");
  const level = (VERDICT_LEVELS as readonly string[]).includes(text(params.level)) ? text(params.level) : "";
  const filters = { vehicle: text(params.vehicle), hitched: text(params.hitched), level };
  const query = matrixQuerySchema.parse({ ...filters, page: 1, pageSize: 25, colPage: 1, colPageSize: 8 });
  const initial = await fleetMatrix(access, query);
  const initialKey = fleetMatrixKey({ ...filters, page: 1, pageSize: 25, colPage: 1, colPageSize: 8 });
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Pairings"
        description="Each vehicle with each trailer and accessory, as the profiles stand: the verdict and the limit that governs. Open a pairing for the full check with its worked steps."
      />
      <PairingMatrix initial={initial} initialKey={initialKey} initialFilters={filters} cautions={GENERAL_CAUTIONS} />
    </div>
  );
}
