"use client";
/** Learners' practice results, per learner and per example, refreshed through SWR. */
import useSWR from "swr";
import { Card, EmptyRow, Field, Select, TBody, TD, TH, THead, TR, Table } from "@/components/ui";
import { fetchJson } from "@/lib/client/fetcher";
import { formatRatio } from "@/lib/format";
import type { ResultRow } from "@/lib/server/training";
import { useState } from "react";

export const trainingResultsKey = (lessonId = "") => `/api/v1/training/results${lessonId ? `?lessonId=${encodeURIComponent(lessonId)}` : ""}`;

const date = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });

export function ResultsTable({ initial, lessons }: { initial: ResultRow[]; lessons: Array<{ id: string; title: string }> }) {
  const [lessonId, setLessonId] = useState("");
  const { data, error } = useSWR(trainingResultsKey(lessonId), fetchJson<{ rows: ResultRow[] }>, {
    fallback: { [trainingResultsKey()]: { rows: initial } },
    keepPreviousData: true,
  });
  const rows = data?.rows ?? [];
  return (
    <div className="flex flex-col gap-4">
      <Card>
        <form className="p-4" role="search" aria-label="Filter results" onSubmit={(e) => e.preventDefault()}>
          <Field label="Example" className="max-w-sm">
            <Select value={lessonId} onChange={(e) => setLessonId(e.target.value)}>
              <option value="">All examples</option>
              {lessons.map((lesson) => (
                <option key={lesson.id} value={lesson.id}>
                  {lesson.title}
                </option>
              ))}
            </Select>
          </Field>
        </form>
      </Card>
      {error ? <p role="alert" className="text-sm text-over">{(error as Error).message}</p> : null}
      <Card>
        <Table caption="Practice results per learner and example" hideCaption>
          <THead>
            <TR>
              <TH>Learner</TH>
              <TH>Example</TH>
              <TH numeric>Attempts</TH>
              <TH numeric>Best</TH>
              <TH numeric>Latest</TH>
              <TH>Last practised</TH>
            </TR>
          </THead>
          <TBody>
            {rows.length === 0 ? <EmptyRow colSpan={6}>No practice yet. Publish an example to your organisation and learners can start.</EmptyRow> : null}
            {rows.map((row) => (
              <TR key={`${row.userId}-${row.lessonId}`} data-testid="result-row">
                <TD>{row.learner}</TD>
                <TD>{row.lesson}</TD>
                <TD numeric>{row.attempts}</TD>
                <TD numeric>
                  {row.bestCorrect} / {row.total} <span className="text-ink-soft">({formatRatio(row.total ? row.bestCorrect / row.total : 0, 0)})</span>
                </TD>
                <TD numeric>
                  {row.latestCorrect} / {row.total}
                </TD>
                <TD className="whitespace-nowrap">{date.format(new Date(row.lastAt))}</TD>
              </TR>
            ))}
          </TBody>
        </Table>
      </Card>
    </div>
  );
}
