"use client";
import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import { Button, Card, EmptyRow, Field, TBody, TD, TH, THead, TR, Table, TextInput, VerdictBadge } from "@/components/ui";
import { fetchJson } from "@/lib/client/fetcher";
import { checksKey } from "@/lib/client/keys";
import type { CheckListPage } from "@/lib/server/checks";
import { VerdictFilter } from "@/components/verdict-filter";

type Sort = "createdAt" | "customerName" | "vehicleLabel" | "level";

const dateTime = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });

export function ChecksTable({ initial, initialKey }: { initial: CheckListPage; initialKey: string }) {
  const [filters, setFilters] = useState({ vehicle: "", customer: "", from: "", to: "", level: "" });
  const [sort, setSort] = useState<{ by: Sort; dir: "asc" | "desc" }>({ by: "createdAt", dir: "desc" });
  const [page, setPage] = useState(1);
  const key = checksKey({ ...filters, sort: sort.by, dir: sort.dir, page, pageSize: 20 });
  const { data, error, isLoading } = useSWR(key, fetchJson<CheckListPage>, {
    fallback: { [initialKey]: initial },
    keepPreviousData: true,
  });

  const sortBy = (by: Sort) => {
    setPage(1);
    setSort((current) => ({ by, dir: current.by === by && current.dir === "desc" ? "asc" : "desc" }));
  };
  const ariaSort = (by: Sort) => (sort.by === by ? (sort.dir === "asc" ? "ascending" : "descending") : "none");
  const setFilter = (name: keyof typeof filters, value: string) => {
    setPage(1);
    setFilters((current) => ({ ...current, [name]: value }));
  };

  return (
    <div className="flex flex-col gap-4">
      <Card>
        <form className="grid gap-4 p-4 sm:grid-cols-2 lg:grid-cols-5" onSubmit={(event) => event.preventDefault()} role="search" aria-label="Filter saved checks">
          <Field label="Vehicle">
            <TextInput value={filters.vehicle} onChange={(e) => setFilter("vehicle", e.target.value)} placeholder="Any" />
          </Field>
          <Field label="Customer">
            <TextInput value={filters.customer} onChange={(e) => setFilter("customer", e.target.value)} placeholder="Any" />
          </Field>
          <Field label="From">
            <TextInput type="date" value={filters.from} onChange={(e) => setFilter("from", e.target.value)} />
          </Field>
          <Field label="To">
            <TextInput type="date" value={filters.to} onChange={(e) => setFilter("to", e.target.value)} />
          </Field>
          <VerdictFilter value={filters.level} onChange={(value) => setFilter("level", value)} />
        </form>
      </Card>
      {error ? <p role="alert" className="text-sm text-over">{(error as Error).message}</p> : null}
      <Card>
        <Table caption="Saved checks" hideCaption aria-busy={isLoading}>
          <THead>
            <TR>
              <TH sort={ariaSort("createdAt")} onSort={() => sortBy("createdAt")}>Saved</TH>
              <TH sort={ariaSort("customerName")} onSort={() => sortBy("customerName")}>Customer</TH>
              <TH sort={ariaSort("vehicleLabel")} onSort={() => sortBy("vehicleLabel")}>Vehicle</TH>
              <TH>Hitched</TH>
              <TH sort={ariaSort("level")} onSort={() => sortBy("level")}>Verdict</TH>
              <TH>By</TH>
            </TR>
          </THead>
          <TBody>
            {data && data.rows.length === 0 ? <EmptyRow colSpan={6}>No saved checks match. Save one from the check screen.</EmptyRow> : null}
            {data?.rows.map((row) => (
              <TR key={row.id}>
                <TD className="whitespace-nowrap">
                  <Link href={`/checks/${row.id}`} className="text-accent underline">
                    {dateTime.format(new Date(row.createdAt))}
                  </Link>
                </TD>
                <TD>{row.customerName ?? <span className="text-ink-soft">—</span>}</TD>
                <TD>{row.vehicleLabel}</TD>
                <TD>{row.hitchedLabel}</TD>
                <TD>
                  <VerdictBadge status={row.level} size="sm" />
                  {row.complete ? null : <span className="ml-1.5 text-xs text-ink-soft">some data missing</span>}
                </TD>
                <TD className="text-ink-soft">{row.createdBy ?? "—"}</TD>
              </TR>
            ))}
          </TBody>
        </Table>
        <div className="flex flex-wrap items-center justify-between gap-3 border-t border-rule px-4 py-3 text-sm text-ink-soft">
          <span className="num">
            {data ? `${data.total} ${data.total === 1 ? "check" : "checks"} · page ${data.page} of ${data.pageCount}` : "Loading…"}
          </span>
          <div className="flex gap-2">
            <Button size="sm" variant="secondary" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
              Previous
            </Button>
            <Button size="sm" variant="secondary" disabled={!data || page >= data.pageCount} onClick={() => setPage((p) => p + 1)}>
              Next
            </Button>
          </div>
        </div>
      </Card>
    </div>
  );
}
