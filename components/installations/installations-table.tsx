"use client";
import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import { Button, Card, EmptyRow, Field, Select, TBody, TD, TH, THead, TR, Table, TextInput } from "@/components/ui";
import { fetchJson } from "@/lib/client/fetcher";
import { installationsKey } from "@/lib/client/keys";
import type { InstallationListPage } from "@/lib/server/installations";
import { INSTALLATION_STATES, STATE_WORDS } from "@/lib/installations/words";
import { StateBadge } from "./state-badge";

export interface InstallationsTableProps {
  initial: InstallationListPage;
  initialKey: string;
  installers: Array<{ id: string; name: string }>;
}

/** Installation records with filters by state, installer and fitting date; SWR keeps the list fresh. */
export function InstallationsTable({ initial, initialKey, installers }: InstallationsTableProps) {
  const [filters, setFilters] = useState({ state: "", installer: "", from: "", to: "" });
  const [page, setPage] = useState(1);
  const key = installationsKey({ ...filters, page, pageSize: 25 });
  const { data, error, isLoading } = useSWR(key, fetchJson<InstallationListPage>, { fallback: { [initialKey]: initial }, keepPreviousData: true });
  const setFilter = (name: keyof typeof filters, value: string) => {
    setPage(1);
    setFilters((current) => ({ ...current, [name]: value }));
  };
  return (
    <div className="flex flex-col gap-4">
      <Card>
        <form className="grid gap-4 p-4 sm:grid-cols-2 lg:grid-cols-4" onSubmit={(event) => event.preventDefault()} role="search" aria-label="Filter installation records">
          <Field label="State">
            <Select value={filters.state} onChange={(e) => setFilter("state", e.target.value)}>
              <option value="">Any</option>
              {INSTALLATION_STATES.map((state) => (
                <option key={state} value={state}>
                  {STATE_WORDS[state]}
                </option>
              ))}
            </Select>
          </Field>
          <Field label="Installer">
            <Select value={filters.installer} onChange={(e) => setFilter("installer", e.target.value)}>
              <option value="">Anyone</option>
              {installers.map((person) => (
                <option key={person.id} value={person.id}>
                  {person.name}
                </option>
              ))}
            </Select>
          </Field>
          <Field label="Fitted from">
            <TextInput type="date" value={filters.from} onChange={(e) => setFilter("from", e.target.value)} />
          </Field>
          <Field label="Fitted to">
            <TextInput type="date" value={filters.to} onChange={(e) => setFilter("to", e.target.value)} />
          </Field>
        </form>
      </Card>
      {error ? (
        <p role="alert" className="text-sm text-over">
          {(error as Error).message}
        </p>
      ) : null}
      <Card>
        <Table caption="Installation records" hideCaption aria-busy={isLoading}>
          <THead>
            <TR>
              <TH>Fitted</TH>
              <TH>Vehicle</TH>
              <TH>Customer</TH>
              <TH>Installer</TH>
              <TH>State</TH>
            </TR>
          </THead>
          <TBody>
            {data && data.rows.length === 0 ? <EmptyRow colSpan={5}>No installation records match.</EmptyRow> : null}
            {data?.rows.map((row) => (
              <TR key={row.id}>
                <TD className="whitespace-nowrap">
                  <Link href={`/installations/${row.id}`} className="text-accent underline">
                    {row.fittedOn}
                  </Link>
                </TD>
                <TD>{row.vehicleLabel}</TD>
                <TD>{row.customerName}</TD>
                <TD className="text-ink-soft">{row.installerName ?? "—"}</TD>
                <TD>
                  <StateBadge state={row.state} />
                  {row.customerConfirmedAt ? <span className="ml-1.5 text-xs text-ink-soft">read by the customer</span> : null}
                </TD>
              </TR>
            ))}
          </TBody>
        </Table>
        <div className="flex flex-wrap items-center justify-between gap-3 border-t border-rule px-4 py-3 text-sm text-ink-soft">
          <span className="num">{data ? `${data.total} ${data.total === 1 ? "record" : "records"} · page ${data.page} of ${data.pageCount}` : "Loading…"}</span>
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
