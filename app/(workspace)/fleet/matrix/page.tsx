import type { Metadata } from "next";
import { PairingMatrix } from "@/components/fleet/pairing-matrix";
import { PageHeader } from "@/components/ui";
import { MATRIX_COL_PAGE_SIZE, MATRIX_PAGE_SIZE, fleetMatrixKey } from "@/lib/fleet/keys";
import { requirePage } from "@/lib/server/access";
import { fleetMatrix } from "@/lib/server/fleet";
import { GENERAL_CAUTIONS, VERDICT_LEVELS } from "@/lib/towing";
import { MATRIX_HITCHED_SORTS, MATRIX_VEHICLE_SORTS, matrixQuerySchema } from "@/lib/validation/fleet";

export const metadata: Metadata = { title: "Fleet pairings" };

export default async function MatrixPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePage("fleet.read", "/fleet/matrix");
  const params = await searchParams;
  const text = (value: unknown) => (typeof value === "string" ? value.slice(0, 120) : "");
  const level = (VERDICT_LEVELS as readonly string[]).includes(text(params.level)) ? text(params.level) : "";
  // An order the page does not know (a hand-edited address) falls back to by name; the JSON route names the field instead.
  const vehicleSort = (MATRIX_VEHICLE_SORTS as readonly string[]).includes(text(params.vehicleSort)) ? text(params.vehicleSort) : "name";
  const hitchedSort = (MATRIX_HITCHED_SORTS as readonly string[]).includes(text(params.hitchedSort)) ? text(params.hitchedSort) : "name";
  const filters = { vehicle: text(params.vehicle), hitched: text(params.hitched), level, vehicleSort, hitchedSort };
  const paging = { page: 1, pageSize: MATRIX_PAGE_SIZE, colPage: 1, colPageSize: MATRIX_COL_PAGE_SIZE };
  const query = matrixQuerySchema.parse({ ...filters, ...paging });
  const initial = await fleetMatrix(access, query);
  const initialKey = fleetMatrixKey({ ...filters, ...paging });
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
