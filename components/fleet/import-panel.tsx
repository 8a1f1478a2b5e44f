"use client";
import { Download, FileUp } from "lucide-react";
import Link from "next/link";
import { useRef, useState } from "react";
import { useSWRConfig } from "swr";
import { Button, Card, CardBody, CardHeader, Field, FormMessage, Select, TBody, TD, TH, THead, TR, Table, VerdictBadge, buttonClasses } from "@/components/ui";
import { checkCsvBytes, CSV_MAX_BYTES, csvColumns } from "@/lib/fleet/csv";
import { KIND_WORDS, PROFILE_KINDS, type ProfileKind } from "@/lib/fleet/fields";
import type { ImportOutcome } from "@/lib/server/fleet";

type Mode = "preview" | "valid-rows" | "all-or-nothing";
type Answer = ImportOutcome & { ok: boolean; elapsedMs: number; message?: string; fieldErrors?: Record<string, string[]> };

const PREVIEW_PAGE = 50;

/** Sends the file with upload progress; resolves with the server's JSON and status. */
function send(body: FormData, onProgress: (share: number) => void): Promise<{ status: number; answer: Partial<Answer> }> {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open("POST", "/api/v1/fleet/import");
    request.responseType = "json";
    request.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    request.onload = () => resolve({ status: request.status, answer: (request.response ?? {}) as Partial<Answer> });
    request.onerror = () => reject(new Error("The file did not reach the server. Check the connection and try again."));
    request.send(body);
  });
}

export function ImportPanel({ canEdit }: { canEdit: boolean }) {
  const fileRef = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<ProfileKind>("vehicles");
  const [units, setUnits] = useState<"imperial" | "metric" | "column">("column");
  const [fileName, setFileName] = useState<string>();
  const [fileError, setFileError] = useState<string>();
  const [busy, setBusy] = useState<{ label: string; share: number } | null>(null);
  const [preview, setPreview] = useState<Answer | null>(null);
  const [result, setResult] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [onlyErrors, setOnlyErrors] = useState(false);
  const [page, setPage] = useState(0);
  const { mutate } = useSWRConfig();

  const run = async (mode: Mode) => {
    setResult(null);
    setFileError(undefined);
    const file = fileRef.current?.files?.[0];
    if (!file) return setFileError("Choose a CSV file.");
    if (file.size > CSV_MAX_BYTES) return setFileError(checkCsvBytes(new Uint8Array(file.size)) ?? "The file is too large.");
    const problem = checkCsvBytes(new Uint8Array(await file.slice(0, 8192).arrayBuffer()));
    if (problem) return setFileError(problem);
    const body = new FormData();
    body.set("kind", kind);
    body.set("units", units);
    body.set("mode", mode);
    body.set("file", file);
    const label = mode === "preview" ? "Reading the file" : "Importing";
    setBusy({ label: `${label}: sending`, share: 0 });
    try {
      const { status, answer } = await send(body, (share) => setBusy({ label: `${label}: sending`, share: share * 0.5 }));
      setBusy({ label: mode === "preview" ? "Checking each row" : "Checking and writing the rows", share: 0.75 });
      if (status >= 400 && !answer.rows) {
        setPreview(null);
        setFileError(answer.fieldErrors?.file?.[0] ?? answer.message ?? `The server answered ${status}.`);
        return;
      }
      const full = answer as Answer;
      setPreview(full);
      setPage(0);
      if (mode !== "preview") {
        if (full.outcome === "imported") {
          setResult({ tone: "success", text: `Imported ${full.imported} ${full.imported === 1 ? KIND_WORDS[kind].one : KIND_WORDS[kind].many} in ${(full.elapsedMs / 1000).toFixed(1)} s.${full.errorCount ? ` ${full.errorCount} rows with errors were left out.` : ""}` });
          void mutate((key) => typeof key === "string" && key.startsWith("/api/v1/fleet/"));
        } else if (full.outcome === "refused") {
          setResult({ tone: "error", text: `Nothing was imported: ${full.errorCount} ${full.errorCount === 1 ? "row has" : "rows have"} errors${full.fileErrors.length ? " and the file has problems" : ""}.` });
        } else {
          setResult({ tone: "error", text: "Nothing was imported: no row is valid." });
        }
      }
    } catch (problem) {
      setFileError((problem as Error).message);
    } finally {
      setBusy(null);
    }
  };

  const rows = (preview?.rows ?? []).filter((row) => !onlyErrors || row.errors.length > 0);
  const pageRows = rows.slice(page * PREVIEW_PAGE, (page + 1) * PREVIEW_PAGE);
  const pageCount = Math.max(1, Math.ceil(rows.length / PREVIEW_PAGE));

  return (
    <div className="flex flex-col gap-5">
      <Card>
        <CardHeader title="1. Choose the file" description={`One sheet per kind, saved as CSV (UTF-8). Up to ${CSV_MAX_BYTES / 1024 / 1024} MB and 5,000 rows.`} />
        <CardBody className="flex flex-col gap-4">
          <div className="grid gap-4 sm:grid-cols-3">
            <Field label="What the file lists">
              <Select value={kind} onChange={(e) => { setKind(e.target.value as ProfileKind); setPreview(null); }}>
                {PROFILE_KINDS.map((value) => (
                  <option key={value} value={value}>
                    {KIND_WORDS[value].title}
                  </option>
                ))}
              </Select>
            </Field>
            <Field label="Units" help="Imperial is lb and in; metric is kg and mm.">
              <Select value={units} onChange={(e) => { setUnits(e.target.value as typeof units); setPreview(null); }}>
                <option value="column">From the file&apos;s units column</option>
                <option value="imperial">The whole file is imperial</option>
                <option value="metric">The whole file is metric</option>
              </Select>
            </Field>
            <Field label="CSV file" error={fileError}>
              <input
                ref={fileRef}
                type="file"
                accept=".csv,text/csv"
                onChange={(e) => { setFileName(e.target.files?.[0]?.name); setPreview(null); setResult(null); setFileError(undefined); }}
                className="text-sm file:mr-3 file:rounded-md file:border file:border-rule file:bg-panel file:px-3 file:py-2"
              />
            </Field>
          </div>
          <div className="flex flex-wrap gap-2">
            <Button icon={<FileUp />} onClick={() => void run("preview")} loading={busy !== null} disabled={!fileName}>
              Check the file
            </Button>
            <a href={`/api/v1/fleet/${kind}/template`} className={buttonClasses({ variant: "secondary" })} download>
              <Download aria-hidden="true" />
              Template for {KIND_WORDS[kind].many}
            </a>
          </div>
          <details className="text-sm text-ink-soft">
            <summary className="cursor-pointer">The columns for {KIND_WORDS[kind].many}</summary>
            <p className="num mt-2 break-words">{csvColumns(kind).join(", ")}</p>
          </details>
          {busy ? (
            <div role="status" aria-live="polite" className="flex flex-col gap-1">
              <span className="text-sm">{busy.label}…</span>
              <progress className="h-2 w-full accent-[var(--color-accent)]" value={busy.share} max={1} aria-label={busy.label} />
            </div>
          ) : null}
        </CardBody>
      </Card>

      {result ? <FormMessage tone={result.tone}>{result.text}{result.tone === "success" ? <> <Link href="/fleet/matrix" className="underline">See the pairings</Link>.</> : null}</FormMessage> : null}

      {preview ? (
        <Card as="section" aria-labelledby="import-preview">
          <CardHeader
            titleId="import-preview"
            title="2. What the file holds"
            description={preview.fileErrors.length ? "The file cannot be read as it is:" : `${preview.validCount} valid, ${preview.errorCount} with errors, of ${preview.rows.length} rows (read in ${preview.elapsedMs} ms).`}
          />
          <CardBody className="flex flex-col gap-4">
            {preview.fileErrors.length ? (
              <ul className="list-disc space-y-1 pl-5 text-sm text-over" data-testid="file-errors">
                {preview.fileErrors.map((error) => (
                  <li key={error}>{error}</li>
                ))}
              </ul>
            ) : (
              <>
                {canEdit ? (
                  <div className="flex flex-wrap gap-2">
                    <Button onClick={() => void run("valid-rows")} loading={busy !== null} disabled={preview.validCount === 0}>
                      Import the {preview.validCount} valid rows
                    </Button>
                    <Button variant="secondary" onClick={() => void run("all-or-nothing")} loading={busy !== null}>
                      Import only if every row is valid
                    </Button>
                  </div>
                ) : (
                  <p className="text-sm text-ink-soft">Your role can check a file but not import it.</p>
                )}
                <label className="inline-flex items-center gap-2 text-sm">
                  <input type="checkbox" checked={onlyErrors} onChange={(e) => { setOnlyErrors(e.target.checked); setPage(0); }} />
                  Only rows with errors
                </label>
                <Table caption="Rows of the file" hideCaption>
                  <THead>
                    <TR>
                      <TH numeric>Line</TH>
                      <TH>Name</TH>
                      <TH>Units</TH>
                      <TH>Status</TH>
                      <TH>Errors</TH>
                    </TR>
                  </THead>
                  <TBody>
                    {pageRows.map((row) => (
                      <TR key={row.line} data-testid="import-row" data-ok={row.errors.length === 0}>
                        <TD numeric>{row.line}</TD>
                        <TD className="min-w-40">{row.name || <span className="text-ink-faint">no name</span>}</TD>
                        <TD>{row.units ?? "—"}</TD>
                        <TD>{row.errors.length === 0 ? <VerdictBadge status="within" size="sm" label="Ready" /> : <VerdictBadge status="over" size="sm" label={`${row.errors.length} to fix`} />}</TD>
                        <TD className="min-w-64">
                          {row.errors.length ? (
                            <ul className="space-y-0.5">
                              {row.errors.map((error, i) => (
                                <li key={i}>
                                  <span className="num font-medium">{error.column}</span>: {error.message}
                                </li>
                              ))}
                            </ul>
                          ) : null}
                        </TD>
                      </TR>
                    ))}
                  </TBody>
                </Table>
                <div className="flex flex-wrap items-center justify-between gap-3 text-sm text-ink-soft">
                  <span className="num">
                    Page {page + 1} of {pageCount}
                  </span>
                  <div className="flex gap-2">
                    <Button size="sm" variant="secondary" disabled={page === 0} onClick={() => setPage((p) => p - 1)}>
                      Previous
                    </Button>
                    <Button size="sm" variant="secondary" disabled={page + 1 >= pageCount} onClick={() => setPage((p) => p + 1)}>
                      Next
                    </Button>
                  </div>
                </div>
              </>
            )}
          </CardBody>
        </Card>
      ) : null}
    </div>
  );
}
