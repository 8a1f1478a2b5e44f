"use client";
import Link from "next/link";
import { useEffect, useState } from "react";
import useSWR from "swr";
import { Button, Card, CardBody, Field, Select, TextInput, VerdictBadge, cn, levelWords } from "@/components/ui";
import { fetchJson } from "@/lib/client/fetcher";
import { MATRIX_COL_PAGE_SIZE as COL_PAGE_SIZE, MATRIX_PAGE_SIZE as PAGE_SIZE, fleetMatrixKey } from "@/lib/fleet/keys";
import { formatNumber } from "@/lib/format";
import type { MatrixCell, MatrixColumn, MatrixPage, MatrixRow } from "@/lib/server/fleet";
import type { MatrixHitchedSort, MatrixVehicleSort } from "@/lib/validation/fleet";
import { VerdictFilter } from "@/components/verdict-filter";

export interface PairingMatrixFilters {
  vehicle: string;
  hitched: string;
  level: string;
  vehicleSort: string;
  hitchedSort: string;
}

export interface PairingMatrixProps {
  initial: MatrixPage;
  initialKey: string;
  initialFilters: PairingMatrixFilters;
  cautions: readonly string[];
}

const VEHICLE_ORDERS: Array<[MatrixVehicleSort, string]> = [
  ["name", "Name, A to Z"],
  ["capacity-desc", "Most it may pull, largest first"],
  ["capacity-asc", "Most it may pull, smallest first"],
];
const HITCHED_ORDERS: Array<[MatrixHitchedSort, string]> = [
  ["name", "Name, trailers then accessories"],
  ["weight-desc", "Weight, heaviest first"],
  ["weight-asc", "Weight, lightest first"],
];

/** A count of pairs with its thousands marked (100,000 pairs is an ordinary fleet's grid). */
const count = (n: number | undefined) => (n ?? 0).toLocaleString("en-US");

/** The header's aria-sort for an order: by name reads A to Z, so ascending. */
function ariaSort(sort: string, byName: boolean): "ascending" | "descending" | "none" {
  if (sort === "name") return byName ? "ascending" : "none";
  return sort.endsWith("-desc") ? "descending" : "ascending";
}

/** The page's own address with the filters and the order, so a reload or a shared link shows the same grid. */
function addressOf(filters: PairingMatrixFilters): string {
  const search = new URLSearchParams();
  for (const [name, value] of Object.entries(filters)) if (value && !(name.endsWith("Sort") && value === "name")) search.set(name, value);
  const query = search.toString();
  return `${window.location.pathname}${query ? `?${query}` : ""}`;
}

/** The set-up each check asks to adjust, in a few words for a cell. */
/** The vehicles' column: held at the left edge, narrow on a phone, with a rule on its right edge (a shadow: a collapsed border would scroll away). */
const STICKY = "sticky left-0 w-32 min-w-32 max-w-32 shadow-[inset_-1px_0_0_var(--color-rule)] sm:w-48 sm:min-w-48 sm:max-w-48";

const SETUP_WORDS: Partial<Record<string, string>> = {
  "ball-mount": "ball mount drop",
  "weight-distribution": "weight distribution",
  "accessory-fit": "accessory fit",
  "tongue-share": "trailer loading",
  "weakest-link": "ball size",
  "hardware-fit": "hitch parts",
};

function cellHref(vehicleId: string, column: MatrixColumn): string {
  return `/check?vehicle=${encodeURIComponent(vehicleId)}&${column.kind === "trailers" ? "trailer" : "accessory"}=${encodeURIComponent(column.id)}`;
}

function CellLink({ vehicle, column, cell }: { vehicle: { id: string; name: string }; column: MatrixColumn; cell: MatrixCell }) {
  const governing = cell.governing;
  return (
    <Link
      href={cellHref(vehicle.id, column)}
      data-testid="pairing-cell"
      data-level={cell.level}
      className="flex min-w-36 flex-col gap-1 rounded-md p-1.5 hover:bg-sunken focus-visible:outline-2 focus-visible:outline-accent"
    >
      <VerdictBadge status={cell.level} size="sm" label={levelWords[cell.level]} />
      {cell.adjust?.length && cell.level !== "adjust" ? (
        <span className="text-xs font-medium text-adjust">Set-up to adjust too</span>
      ) : null}
      {cell.adjust?.length ? (
        <span className="text-xs leading-snug text-ink-soft">Adjust: {cell.adjust.map((id) => SETUP_WORDS[id] ?? id).join(", ")}</span>
      ) : null}
      {/* Read after the visible words, so the link's name holds what is on it (label in name). */}
      <span className="sr-only">
        {vehicle.name} with {column.name}. Open the check.
      </span>
      {governing ? (
        <span className="text-xs leading-snug text-ink-soft">
          {governing.label}{" "}
          <span className="num whitespace-nowrap">
            {formatNumber(governing.value, governing.unit)} {governing.unit}
          </span>
          {cell.margin ? (
            <span className="num block whitespace-nowrap">
              {cell.margin.value >= 0 ? "room " : "over by "}
              {formatNumber(Math.abs(cell.margin.value), cell.margin.unit)} {cell.margin.unit}
            </span>
          ) : null}
        </span>
      ) : null}
    </Link>
  );
}

/** The vehicle's name, then the most it may pull and the rating that sets it (the core's figure, from the server). */
function VehicleHeader({ row }: { row: MatrixRow }) {
  const capacity = row.capacity;
  return (
    <>
      <Link href={`/fleet/vehicles/${row.id}`} className="underline decoration-rule">
        {row.name}
      </Link>
      {capacity ? (
        <span className="mt-0.5 block text-xs font-normal text-ink-soft" data-testid="vehicle-capacity">
          pulls up to{" "}
          <span className="num font-semibold whitespace-nowrap text-ink">
            {formatNumber(capacity.value, capacity.unit)} {capacity.unit}
          </span>
          <span className="block">by the {capacity.setBy.toLowerCase()}</span>
          {capacity.missing.length ? <span className="block">{capacity.missing.map((m) => m.toLowerCase()).join(" and ")} not on record: may be lower</span> : null}
        </span>
      ) : (
        <span className="mt-0.5 block text-xs font-normal text-ink-soft">no tow rating on record</span>
      )}
      {row.measuredOn ? <span className="block text-xs font-normal text-ink-soft">hitch measured {row.measuredOn}</span> : null}
    </>
  );
}

/** A trailer's gross weight or an accessory's loaded weight, as its profile records it. */
function WeightHeader({ column }: { column: MatrixColumn }) {
  const weight = column.weight;
  if (!weight) return <span className="font-normal text-ink-soft">weight not on record</span>;
  return (
    <>
      <span className="num whitespace-nowrap">
        {formatNumber(weight.value, weight.unit)} {weight.unit}
      </span>{" "}
      <span className="font-normal text-ink-soft">{weight.basis === "gross" ? "gross" : "loaded"}</span>
    </>
  );
}

/**
 * Every vehicle against every trailer and accessory. Pages over both axes so 500 × 200 stays a screenful;
 * the server sorts before it pages, so an order holds across pages. The grid scrolls sideways inside its own
 * box with the vehicles' column held in place.
 */
export function PairingMatrix({ initial, initialKey, initialFilters, cautions }: PairingMatrixProps) {
  const [filters, setFilters] = useState(initialFilters);
  const [page, setPage] = useState(1);
  const [colPage, setColPage] = useState(1);
  const key = fleetMatrixKey({ ...filters, page, pageSize: PAGE_SIZE, colPage, colPageSize: COL_PAGE_SIZE });
  // While a large fleet's stored verdicts are being rechecked, the page asks again every two seconds.
  const { data, error, isLoading } = useSWR(key, fetchJson<MatrixPage>, {
    fallback: { [initialKey]: initial },
    keepPreviousData: true,
    refreshInterval: (latest) => (latest?.rechecking ? 2000 : 0),
  });

  const setFilter = (name: keyof typeof filters, value: string) => setFilterSet({ [name]: value });
  const setFilterSet = (values: Partial<PairingMatrixFilters>) => {
    setPage(1);
    setColPage(1);
    setFilters((current) => ({ ...current, ...values }));
  };
  // The address follows the filters and the order, as the page reads them on a reload.
  useEffect(() => {
    const address = addressOf(filters);
    if (address !== `${window.location.pathname}${window.location.search}`) window.history.replaceState(window.history.state, "", address);
  }, [filters]);
  const vehicleAria = ariaSort(filters.vehicleSort, true);
  const weightAria = ariaSort(filters.hitchedSort, false);
  const strongestFirst = filters.vehicleSort === "capacity-desc" && filters.hitchedSort === "weight-desc";

  return (
    <div className="flex flex-col gap-4">
      <Card>
        <form className="grid gap-4 p-4 sm:grid-cols-2 lg:grid-cols-6" role="search" aria-label="Filter and sort pairings" onSubmit={(e) => e.preventDefault()}>
          <Field label="Vehicle" className="lg:col-span-2">
            <TextInput value={filters.vehicle} onChange={(e) => setFilter("vehicle", e.target.value)} placeholder="Any" />
          </Field>
          <Field label="Trailer or accessory" className="lg:col-span-2">
            <TextInput value={filters.hitched} onChange={(e) => setFilter("hitched", e.target.value)} placeholder="Any" />
          </Field>
          <div className="lg:col-span-2">
            <VerdictFilter value={filters.level} onChange={(value) => setFilter("level", value)} />
          </div>
          <Field label="Sort vehicles" className="lg:col-span-2">
            <Select value={filters.vehicleSort} onChange={(e) => setFilter("vehicleSort", e.target.value)}>
              {VEHICLE_ORDERS.map(([value, words]) => (
                <option key={value} value={value}>
                  {words}
                </option>
              ))}
            </Select>
          </Field>
          <Field label="Sort trailers and accessories" className="lg:col-span-2">
            <Select value={filters.hitchedSort} onChange={(e) => setFilter("hitchedSort", e.target.value)}>
              {HITCHED_ORDERS.map(([value, words]) => (
                <option key={value} value={value}>
                  {words}
                </option>
              ))}
            </Select>
          </Field>
          <div className="flex items-end lg:col-span-2">
            <Button
              type="button"
              variant="secondary"
              className="w-full aria-pressed:border-accent aria-pressed:bg-accent/10 aria-pressed:text-accent-strong"
              aria-pressed={strongestFirst}
              onClick={() => setFilterSet({ vehicleSort: "capacity-desc", hitchedSort: "weight-desc" })}
            >
              Heaviest load, strongest vehicle first
            </Button>
          </div>
        </form>
      </Card>
      {error ? <p role="alert" className="text-sm text-over">{(error as Error).message}</p> : null}
      {data?.rechecking ? (
        <p role="status" className="rounded-md border border-rule bg-sunken px-3 py-2 text-sm text-ink-soft" data-testid="pairings-rechecking">
          Being rechecked after a change to a profile or the thresholds. Every verdict shown is worked out for the
          profiles as they stand now; the counts and the verdict filter follow in a moment.
        </p>
      ) : null}
      {data?.counts ? (
        <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft" aria-live="polite">
          <VerdictBadge status="within" size="sm" label={`${count(data.counts.within)} within`} />
          <VerdictBadge status="tight" size="sm" label={`${count(data.counts.tight)} tight`} />
          <VerdictBadge status="adjust" size="sm" label={`${count(data.counts.adjust)} to adjust`} />
          <VerdictBadge status="over" size="sm" label={`${count(data.counts.over)} over`} />
          <VerdictBadge status="incomplete" size="sm" label={`${count(data.counts.incomplete)} not confirmed`} />
        </p>
      ) : null}
      <Card>
        {/* The box scrolls sideways, never the page: every column of the page is reachable at any width. */}
        <div className="w-full max-w-full overflow-x-auto overscroll-x-contain rounded-md" role="region" aria-label="Pairings" tabIndex={0} aria-busy={isLoading} data-testid="pairings-scroller">
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">
              Vehicles down the side ({VEHICLE_ORDERS.find(([value]) => value === filters.vehicleSort)?.[1].toLowerCase()}), trailers and accessories across the top (
              {HITCHED_ORDERS.find(([value]) => value === filters.hitchedSort)?.[1].toLowerCase()})
            </caption>
            <thead className="border-b border-rule bg-sunken">
              <tr>
                {/* Held in place while the grid scrolls sideways; a solid background and an edge so cells do not show through. */}
                <th scope="col" aria-sort={vehicleAria} className={cn(STICKY, "z-20 bg-sunken px-3 pt-2.5 pb-1 align-bottom text-xs font-semibold tracking-wide text-ink-soft uppercase")}>
                  Vehicle
                  <span className="block font-normal tracking-normal normal-case">most it may pull</span>
                </th>
                {data?.columns.map((column) => (
                  <th key={column.id} scope="col" className="min-w-40 px-2 pt-2.5 pb-1 align-bottom text-xs font-semibold text-ink" data-testid="pairing-column">
                    <Link href={`/fleet/${column.kind}/${column.id}`} className="underline decoration-rule">
                      {column.name}
                    </Link>
                    <span className="block font-normal text-ink-soft">{column.kind === "trailers" ? "trailer" : "accessory"}</span>
                  </th>
                ))}
              </tr>
              {/* The columns are ordered by this row when sorted by weight: its header carries the order. */}
              <tr>
                <th scope="row" aria-sort={weightAria} className={cn(STICKY, "z-20 bg-sunken px-3 pt-1 pb-2.5 text-xs font-semibold text-ink-soft")}>
                  Weight
                </th>
                {data?.columns.map((column) => (
                  <th key={column.id} scope="col" className="px-2 pt-1 pb-2.5 text-xs font-semibold text-ink" data-testid="pairing-weight">
                    <WeightHeader column={column} />
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="divide-y divide-rule">
              {data && data.rows.length === 0 ? (
                <tr>
                  <td colSpan={1 + data.columns.length} className="px-3 py-8 text-left text-ink-soft sm:text-center">
                    {data.rechecking && filters.level ? "The verdict filter is waiting for the recheck to finish." : "No pairings match. Clear a filter, or add vehicles and trailers."}
                  </td>
                </tr>
              ) : null}
              {data?.rows.map((row) => (
                <tr key={row.id} className="align-top" data-testid="pairing-row">
                  <th scope="row" className={cn(STICKY, "z-10 bg-panel px-3 py-2 text-sm font-medium")}>
                    <VehicleHeader row={row} />
                  </th>
                  {row.cells.map((cell, i) => (
                    <td key={data.columns[i]!.id} className={cn("relative px-1 py-1", !cell && "bg-sunken/40")}>
                      {cell ? <CellLink vehicle={row} column={data.columns[i]!} cell={cell} /> : <span className="sr-only">not shown by the filter</span>}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <div className="flex flex-wrap items-center justify-between gap-3 border-t border-rule px-4 py-3 text-sm text-ink-soft">
          <span className="num">
            {data ? `Vehicles ${data.totalRows ? (data.page - 1) * PAGE_SIZE + 1 : 0}–${Math.min(data.page * PAGE_SIZE, data.totalRows)} of ${data.totalRows}` : "Loading…"}
          </span>
          <div className="flex gap-2">
            <Button size="sm" variant="secondary" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
              Previous vehicles
            </Button>
            <Button size="sm" variant="secondary" disabled={!data || page >= data.pageCount} onClick={() => setPage((p) => p + 1)}>
              Next vehicles
            </Button>
          </div>
        </div>
        <div className="flex flex-wrap items-center justify-between gap-3 border-t border-rule px-4 py-3 text-sm text-ink-soft">
          <span className="num">
            {data ? `Trailers and accessories ${data.totalColumns ? (data.colPage - 1) * COL_PAGE_SIZE + 1 : 0}–${Math.min(data.colPage * COL_PAGE_SIZE, data.totalColumns)} of ${data.totalColumns}` : ""}
          </span>
          <div className="flex gap-2">
            <Button size="sm" variant="secondary" disabled={colPage <= 1} onClick={() => setColPage((p) => p - 1)}>
              Previous columns
            </Button>
            <Button size="sm" variant="secondary" disabled={!data || colPage >= data.colPageCount} onClick={() => setColPage((p) => p + 1)}>
              Next columns
            </Button>
          </div>
        </div>
      </Card>
      <Card as="section" aria-labelledby="pairing-cautions">
        <CardBody>
          <h2 id="pairing-cautions" className="mb-2 text-sm font-semibold">
            Before anyone hooks up
          </h2>
          <ul className="list-disc space-y-1 pl-5 text-sm text-ink-soft">
            {cautions.map((caution) => (
              <li key={caution}>{caution}</li>
            ))}
          </ul>
        </CardBody>
      </Card>
    </div>
  );
}
