"use client";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import { Archive, ArchiveRestore, Download, Pencil } from "lucide-react";
import Link from "next/link";
import { useMemo, useState } from "react";
import useSWR from "swr";
import { Button, Card, EmptyRow, Field, Select, TBody, TD, TH, THead, TR, Table, TextInput, buttonClasses, useToast } from "@/components/ui";
import { fetchJson } from "@/lib/client/fetcher";
import { KIND_WORDS, type ProfileKind } from "@/lib/fleet/fields";
import { fleetListKey } from "@/lib/fleet/keys";
import { SUMMARY_COLUMNS, measureUnit, summaryValue } from "@/lib/fleet/summary";
import { formatNumber } from "@/lib/format";
import type { FleetProfile } from "@/lib/server/fleet";
import type { FormState } from "@/lib/validation/form-state";

type ListResponse = { kind: ProfileKind; units: string; profiles: FleetProfile[] };
type Archived = "exclude" | "include" | "only";

export interface ProfilesTableProps {
  kind: ProfileKind;
  initial: ListResponse;
  canEdit: boolean;
  archiveAction: (input: unknown) => Promise<FormState>;
}

const helper = createColumnHelper<FleetProfile>();

export function ProfilesTable({ kind, initial, canEdit, archiveAction }: ProfilesTableProps) {
  const [archived, setArchived] = useState<Archived>("exclude");
  const key = fleetListKey(kind, archived);
  const { data, error, mutate, isLoading } = useSWR(key, fetchJson<ListResponse>, {
    fallback: { [fleetListKey(kind, "exclude")]: initial },
    keepPreviousData: true,
  });
  const { toast } = useToast();
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const [filter, setFilter] = useState("");
  const words = KIND_WORDS[kind];

  const archive = async (profile: FleetProfile, toArchived: boolean) => {
    const current = data;
    // The row leaves (or changes) at once; the server's answer confirms it or puts it back.
    const optimistic = current && {
      ...current,
      profiles:
        archived === "include"
          ? current.profiles.map((p) => (p.id === profile.id ? { ...p, archivedAt: toArchived ? Date.now() : null } : p))
          : current.profiles.filter((p) => p.id !== profile.id),
    };
    try {
      await mutate(
        async () => {
          const result = await archiveAction({ kind, id: profile.id, archived: toArchived });
          if (!result.ok) throw new Error(result.message ?? "Not saved.");
          toast({ title: toArchived ? `Archived “${profile.name}”.` : `Restored “${profile.name}”.`, tone: "success" });
          return undefined;
        },
        { optimisticData: optimistic, rollbackOnError: true, populateCache: false, revalidate: true },
      );
    } catch (problem) {
      toast({ title: (problem as Error).message, tone: "error" });
    }
  };

  const columns = useMemo(() => {
    const units = (p: FleetProfile) => p.units;
    return [
      helper.accessor("name", {
        header: "Name",
        cell: (info) => (
          <Link href={`/fleet/${kind}/${info.row.original.id}`} className="font-medium text-accent-strong underline">
            {info.getValue()}
          </Link>
        ),
      }),
      ...SUMMARY_COLUMNS[kind].map((column) =>
        helper.accessor((row) => summaryValue(column, row.data) ?? null, {
          id: column.id,
          header: column.header,
          sortUndefined: "last",
          meta: { numeric: Boolean(column.measure) },
          cell: (info) => {
            const value = info.getValue();
            if (value === null || value === undefined) return <span className="text-ink-faint">—</span>;
            if (typeof value === "number" && column.measure) {
              const unit = measureUnit(column.measure, units(info.row.original));
              return (
                <>
                  {formatNumber(value, unit)} <span className="text-ink-faint">{unit}</span>
                </>
              );
            }
            return String(value);
          },
        }),
      ),
      helper.display({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        cell: (info) => {
          const profile = info.row.original;
          if (!canEdit) return null;
          return (
            <div className="flex justify-end gap-1">
              <Link href={`/fleet/${kind}/${profile.id}/edit`} className={buttonClasses({ variant: "quiet", size: "sm" })} aria-label={`Edit ${profile.name}`}>
                <Pencil aria-hidden="true" />
                <span className="hidden lg:inline">Edit</span>
              </Link>
              <Button
                size="sm"
                variant="quiet"
                icon={profile.archivedAt ? <ArchiveRestore /> : <Archive />}
                aria-label={`${profile.archivedAt ? "Restore" : "Archive"} ${profile.name}`}
                onClick={() => void archive(profile, !profile.archivedAt)}
              >
                <span className="hidden lg:inline">{profile.archivedAt ? "Restore" : "Archive"}</span>
              </Button>
            </div>
          );
        },
      }),
    ];
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [kind, canEdit, data, archived]);

  // eslint-disable-next-line react-hooks/incompatible-library -- the table's API is read fresh on each render here
  const table = useReactTable({
    data: data?.profiles ?? [],
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    globalFilterFn: (row, _column, value: string) => row.original.name.toLowerCase().includes(value.toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize: 20 } },
    autoResetPageIndex: true,
  });

  const shown = table.getFilteredRowModel().rows.length;
  const { pageIndex } = table.getState().pagination;

  return (
    <div className="flex flex-col gap-4">
      <Card>
        <form className="grid gap-4 p-4 sm:grid-cols-[1fr_14rem_auto] sm:items-end" role="search" aria-label={`Filter ${words.many}`} onSubmit={(e) => e.preventDefault()}>
          <Field label="Name contains">
            <TextInput value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Any" />
          </Field>
          <Field label="Show">
            <Select value={archived} onChange={(e) => setArchived(e.target.value as Archived)}>
              <option value="exclude">In service</option>
              <option value="only">Archived</option>
              <option value="include">All</option>
            </Select>
          </Field>
          <a href={`/api/v1/fleet/${kind}/export?archived=${archived}`} className={buttonClasses({ variant: "secondary" })} download>
            <Download aria-hidden="true" />
            Export CSV
          </a>
        </form>
      </Card>
      {error ? <p role="alert" className="text-sm text-over">{(error as Error).message}</p> : null}
      <Card>
        <Table caption={words.title} hideCaption aria-busy={isLoading}>
          <THead>
            {table.getHeaderGroups().map((group) => (
              <TR key={group.id}>
                {group.headers.map((header) => {
                  const sortable = header.column.getCanSort() && header.column.id !== "actions";
                  const direction = header.column.getIsSorted();
                  const numeric = (header.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                  return (
                    <TH
                      key={header.id}
                      numeric={numeric}
                      // A visually hidden heading is positioned absolutely: anchored here, it stays inside the scroll box.
                      className="relative"
                      sort={sortable ? (direction === "asc" ? "ascending" : direction === "desc" ? "descending" : "none") : undefined}
                      onSort={sortable ? () => header.column.toggleSorting(direction === "asc") : undefined}
                    >
                      {flexRender(header.column.columnDef.header, header.getContext())}
                    </TH>
                  );
                })}
              </TR>
            ))}
          </THead>
          <TBody>
            {data && table.getRowModel().rows.length === 0 ? (
              <EmptyRow colSpan={columns.length}>
                {filter ? `No ${words.many} match “${filter}”.` : archived === "only" ? `No archived ${words.many}.` : `No ${words.many} yet. Add one, or import a spreadsheet.`}
              </EmptyRow>
            ) : null}
            {table.getRowModel().rows.map((row) => (
              <TR key={row.id} className={row.original.archivedAt ? "text-ink-soft" : undefined} data-testid="profile-row">
                {row.getVisibleCells().map((cell) => {
                  const numeric = (cell.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                  return (
                    <TD key={cell.id} numeric={numeric} className={cell.column.id === "name" ? "relative min-w-44" : "relative"}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      {cell.column.id === "name" && row.original.archivedAt ? <span className="ml-2 text-xs text-ink-soft">archived</span> : null}
                    </TD>
                  );
                })}
              </TR>
            ))}
          </TBody>
        </Table>
        <div className="flex flex-wrap items-center justify-between gap-3 border-t border-rule px-4 py-3 text-sm text-ink-soft">
          <span className="num">
            {shown} {shown === 1 ? words.one : words.many} · page {pageIndex + 1} of {Math.max(1, table.getPageCount())}
          </span>
          <div className="flex gap-2">
            <Button size="sm" variant="secondary" disabled={!table.getCanPreviousPage()} onClick={() => table.previousPage()}>
              Previous
            </Button>
            <Button size="sm" variant="secondary" disabled={!table.getCanNextPage()} onClick={() => table.nextPage()}>
              Next
            </Button>
          </div>
        </div>
      </Card>
    </div>
  );
}
