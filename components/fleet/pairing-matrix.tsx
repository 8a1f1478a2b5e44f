"use client";
import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import { Button, Card, CardBody, Field, TextInput, VerdictBadge, cn, levelWords } from "@/components/ui";
import { fetchJson } from "@/lib/client/fetcher";
import { fleetMatrixKey } from "@/lib/fleet/keys";
import { formatNumber } from "@/lib/format";
import type { MatrixCell, MatrixColumn, MatrixPage } from "@/lib/server/fleet";
import { VerdictFilter } from "@/components/verdict-filter";

export interface PairingMatrixProps {
  initial: MatrixPage;
  initialKey: string;
  initialFilters: { vehicle: string; hitched: string; level: string };
  cautions: readonly string[];
}

const PAGE_SIZE = 25;
const COL_PAGE_SIZE = 8;

/** The set-up each check asks to adjust, in a few words for a cell. */
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

/**
 * Every vehicle against every trailer and accessory. Pages over both axes so 500 × 200 stays a screenful;
 * the grid scrolls inside its own box on a phone.
 */
export function PairingMatrix({ initial, initialKey, initialFilters, cautions }: PairingMatrixProps) {
  const [filters, setFilters] = useState(initialFilters);
  const [page, setPage] = useState(1);
  const [colPage, setColPage] = useState(1);
  const key = fleetMatrixKey({ ...filters, page, pageSize: PAGE_SIZE, colPage, colPageSize: COL_PAGE_SIZE });
  const { data, error, isLoading } = useSWR(key, fetchJson<MatrixPage>, { fallback: { [initialKey]: initial }, keepPreviousData: true });

  const setFilter = (name: keyof typeof filters, value: string) => {
    setPage(1);
    setColPage(1);
    setFilters((current) => ({ ...current, [name]: value }));
  };

  return (
    <div className="flex flex-col gap-4">
      <Card>
        <form className="grid gap-4 p-4 sm:grid-cols-3" role="search" aria-label="Filter pairings" onSubmit={(e) => e.preventDefault()}>
          <Field label="Vehicle">
            <TextInput value={filters.vehicle} onChange={(e) => setFilter("vehicle", e.target.value)} placeholder="Any" />
          </Field>
          <Field label="Trailer or accessory">
            <TextInput value={filters.hitched} onChange={(e) => setFilter("hitched", e.target.value)} placeholder="Any" />
          </Field>
          <VerdictFilter value={filters.level} onChange={(value) => setFilter("level", value)} />
        </form>
      </Card>
      {error ? <p role="alert" className="text-sm text-over">{(error as Error).message}</p> : null}
      {data?.counts ? (
        <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft" aria-live="polite">
          <VerdictBadge status="within" size="sm" label={`${data.counts.within} within`} />
          <VerdictBadge status="tight" size="sm" label={`${data.counts.tight} tight`} />
          <VerdictBadge status="adjust" size="sm" label={`${data.counts.adjust ?? 0} to adjust`} />
          <VerdictBadge status="over" size="sm" label={`${data.counts.over} over`} />
          <VerdictBadge status="incomplete" size="sm" label={`${data.counts.incomplete ?? 0} not confirmed`} />
        </p>
      ) : null}
      <Card>
        <div className="w-full overflow-x-auto rounded-md" role="region" aria-label="Pairings" tabIndex={0} aria-busy={isLoading}>
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">Vehicles down the side, trailers and accessories across the top</caption>
            <thead className="border-b border-rule bg-sunken">
              <tr>
                <th scope="col" className="sticky left-0 z-10 bg-sunken px-3 py-2.5 text-xs font-semibold tracking-wide text-ink-soft uppercase">
                  Vehicle
                </th>
                {data?.columns.map((column) => (
                  <th key={column.id} scope="col" className="min-w-40 px-2 py-2.5 align-bottom text-xs font-semibold text-ink">
                    <Link href={`/fleet/${column.kind}/${column.id}`} className="underline decoration-rule">
                      {column.name}
                    </Link>
                    <span className="block font-normal text-ink-soft">{column.kind === "trailers" ? "trailer" : "accessory"}</span>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="divide-y divide-rule">
              {data && data.rows.length === 0 ? (
                <tr>
                  <td colSpan={1 + data.columns.length} className="px-3 py-8 text-center text-ink-soft">
                    No pairings match. Clear a filter, or add vehicles and trailers.
                  </td>
                </tr>
              ) : null}
              {data?.rows.map((row) => (
                <tr key={row.id} className="align-top" data-testid="pairing-row">
                  <th scope="row" className="sticky left-0 z-10 max-w-44 bg-panel px-3 py-2 text-sm font-medium">
                    <Link href={`/fleet/vehicles/${row.id}`} className="underline decoration-rule">
                      {row.name}
                    </Link>
                    {row.measuredOn ? <span className="block text-xs font-normal text-ink-soft">hitch measured {row.measuredOn}</span> : null}
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
