/**
 * The hand-over: what was fitted and measured, and what this hitch allows, in plain words. Phone first on
 * screen, one sheet on paper (Letter or A4). A Server Component that imports only types from the core: the
 * figures arrive worked out, and lib/format rounds them.
 */
import type { ReactNode } from "react";
import { formatNumber, formatQuantity } from "@/lib/format";
import type { AllowanceLimit, HitchAllowance } from "@/lib/towing/hitch-allowance";
import type { InstallationRecord } from "@/lib/server/installations";
import { MEASUREMENT_KEYS, MEASUREMENT_WORDS } from "@/lib/installations/words";
import { buttonClasses } from "@/components/ui/button";
import { PrintButton } from "@/components/report/print-button";
import "@/components/report/result-report.css";

export interface HandOverSheetProps {
  shopName: string;
  record: InstallationRecord;
  allowance: HitchAllowance;
  /** Member names by user id, for "measured by". */
  measuredBy: Record<string, string>;
  /** The customer's confirmation form (their page), or nothing (the shop's print). */
  confirmation?: ReactNode;
  qrSvg?: string;
  linkUrl?: string;
}

const H2 = "text-sm font-semibold tracking-wide text-ink-soft uppercase print:text-[8pt]";

function day(date: string | number): string {
  const d = typeof date === "string" ? new Date(`${date}T12:00:00Z`) : new Date(date);
  return new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: typeof date === "string" ? "UTC" : undefined }).format(d);
}

function LimitCell({ limit }: { limit: AllowanceLimit }) {
  if (!limit.value || !limit.governing) return <span className="text-ink-soft">Not known yet: a rating is missing</span>;
  return (
    <span className="flex flex-col">
      <span className="num text-lg font-semibold text-ink print:text-[10pt]">{formatQuantity(limit.value)}</span>
      <span className="text-xs text-ink-soft print:text-[7pt]">
        set by the {limit.governing.id.startsWith("parts.") ? limit.governing.label : limit.governing.label.replace(/ with WD$/, "").toLowerCase()}
        {limit.missing.length ? "; a figure is missing, it may be lower" : ""}
      </span>
    </span>
  );
}

export function HandOverSheet({ shopName, record, allowance, measuredBy, confirmation, qrSvg, linkUrl }: HandOverSheetProps) {
  const a = allowance;
  const lu = record.units === "metric" ? "mm" : "in";
  const wu = record.units === "metric" ? "kg" : "lb";
  const hitch = record.hitch;
  const hitchWords = [
    hitch.class ? `Class ${hitch.class}` : null,
    hitch.receiverSize ? `${hitch.receiverSize} in receiver` : null,
  ].filter(Boolean).join(", ");
  const rating = (value: number | undefined) => (value === undefined ? "—" : `${formatNumber(value, wu)} ${wu}`);
  return (
    <article aria-labelledby="handover-title" className="mx-auto w-full max-w-3xl px-1 pt-5 pb-10 text-ink sm:px-6 sm:pt-8 print:max-w-none print:p-0 print:text-[8pt] print:leading-snug">
      <header className="flex items-start justify-between gap-4 border-b border-rule pb-4 print:pb-1">
        <div className="min-w-0">
          <p className="text-xs font-medium tracking-wide text-ink-faint uppercase">Hitch hand-over</p>
          <h1 id="handover-title" className="mt-0.5 text-xl leading-tight font-semibold break-words sm:text-2xl print:text-[13pt]">
            {shopName}
          </h1>
          <p className="mt-1 text-sm text-ink-soft print:mt-0 print:text-[8pt]">
            Fitted on <time dateTime={record.fittedOn}>{day(record.fittedOn)}</time> to {record.vehicleLabel}, for {record.customerName}
            {record.installerName ? `, by ${record.installerName}` : ""}.
          </p>
        </div>
        <PrintButton className={buttonClasses({ variant: "secondary", size: "sm" })} />
      </header>

      <section aria-labelledby="allows-title" className="mt-5 print:mt-2">
        <h2 id="allows-title" className={H2}>
          What this hitch allows
        </h2>
        <div className="mt-2 overflow-x-auto">
          <table className="w-full border-collapse text-sm print:text-[8pt]">
            <caption className="sr-only">The heaviest trailer and tongue weight, with and without weight distribution</caption>
            <thead>
              <tr className="border-b border-rule text-left text-xs text-ink-soft">
                <th scope="col" className="py-1.5 pr-3 font-medium" />
                <th scope="col" className="py-1.5 pr-3 font-medium">Without weight distribution</th>
                <th scope="col" className="py-1.5 font-medium">With weight distribution</th>
              </tr>
            </thead>
            <tbody>
              <tr className="border-b border-rule align-top">
                <th scope="row" className="py-2 pr-2 text-left font-medium sm:pr-3">Trailer, loaded <span className="font-normal text-ink-soft">(gross trailer weight)</span></th>
                <td className="py-2 pr-3"><LimitCell limit={a.weightCarrying.grossTrailerWeight} /></td>
                <td className="py-2"><LimitCell limit={a.withWd.grossTrailerWeight} /></td>
              </tr>
              <tr className="align-top">
                <th scope="row" className="py-2 pr-2 text-left font-medium sm:pr-3">Weight on the ball <span className="font-normal text-ink-soft">(tongue weight)</span></th>
                <td className="py-2 pr-3"><LimitCell limit={a.weightCarrying.tongueWeight} /></td>
                <td className="py-2"><LimitCell limit={a.withWd.tongueWeight} /></td>
              </tr>
            </tbody>
          </table>
        </div>
        <ul className="mt-3 flex list-disc flex-col gap-1 pl-5 text-sm print:mt-1 print:gap-0 print:text-[8pt]" data-testid="allowance-statements">
          {a.statements.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
        <p className={`mt-3 rounded-md border px-3 py-2 text-sm print:mt-1 print:px-2 print:py-1 print:text-[8pt] ${a.raisedShank.advisable ? "border-tight/40 bg-tight-soft/60" : "border-rule"}`}>
          <span className="font-medium">Raised shank: </span>
          {a.raisedShank.advisable ? a.raisedShank.reasons.join(" ") : "not needed for the figures measured."}
        </p>
      </section>

      <div className="mt-5 grid gap-5 sm:grid-cols-2 print:mt-2 print:grid-cols-2 print:gap-3">
        <section aria-labelledby="fitted-title">
          <h2 id="fitted-title" className={H2}>
            What was fitted
          </h2>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm print:mt-1 print:text-[8pt]">
            <dt className="text-ink-soft">Hitch</dt>
            <dd>{hitchWords || "—"}</dd>
            <dt className="text-ink-soft">Label, weight-carrying</dt>
            <dd className="num">
              {rating(hitch.gtwRating)} trailer · {rating(hitch.twRating)} tongue
            </dd>
            <dt className="text-ink-soft">Label, with WD</dt>
            <dd className="num">
              {hitch.gtwRatingWd === undefined && hitch.twRatingWd === undefined ? "Not rated for weight distribution on the label" : `${rating(hitch.gtwRatingWd)} trailer · ${rating(hitch.twRatingWd)} tongue`}
            </dd>
            {record.parts.map((part, i) => (
              <PartRow key={`${part.label}-${i}`} label={part.label} text={part.gtwRating === undefined && part.twRating === undefined ? "no rating of its own" : `${rating(part.gtwRating)} trailer · ${rating(part.twRating)} tongue`} />
            ))}
          </dl>
        </section>
        <section aria-labelledby="measured-title">
          <h2 id="measured-title" className={H2}>
            Measured after fitting
          </h2>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm print:mt-1 print:text-[8pt]">
            {MEASUREMENT_KEYS.map((key) => {
              const m = record.measurements[key];
              return (
                <PartRow
                  key={key}
                  label={MEASUREMENT_WORDS[key].label}
                  text={
                    m ? (
                      <>
                        <span className="num font-medium">{formatQuantity({ value: m.value, unit: lu })}</span>
                        {m.measuredByUserId && measuredBy[m.measuredByUserId] ? <span className="text-ink-soft">, by {measuredBy[m.measuredByUserId]}</span> : null}
                      </>
                    ) : (
                      <span className="text-ink-soft">not measured</span>
                    )
                  }
                />
              );
            })}
          </dl>
          {methodNote(record) ? <p className="mt-1 text-xs text-ink-soft print:text-[7pt]">{methodNote(record)}</p> : null}
        </section>
      </div>

      {record.checklist.length ? (
        <section aria-labelledby="checklist-title" className="mt-5 print:mt-2">
          <h2 id="checklist-title" className={H2}>
            Fitting checklist
          </h2>
          <ul className="mt-2 grid gap-1 text-sm sm:grid-cols-2 print:mt-1 print:grid-cols-2 print:gap-0 print:text-[8pt]">
            {record.checklist.map((entry) => (
              <li key={entry.itemId} className="flex gap-2">
                <span aria-hidden="true" className={entry.done ? "text-within" : "text-ink-faint"}>
                  {entry.done ? "✓" : "○"}
                </span>
                <span>
                  <span className="sr-only">{entry.done ? "Done: " : "Not done: "}</span>
                  {entry.label}
                  {entry.value ? <span className="text-ink-soft"> · {entry.valueLabel ?? "value"}: {entry.value}</span> : null}
                </span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <section aria-labelledby="cautions-title" className="mt-5 rounded-md border border-rule bg-paper/60 px-4 py-3 print:mt-2 print:px-2 print:py-1">
        <h2 id="cautions-title" className={H2}>
          Before you tow or carry
        </h2>
        <ul className="mt-2 flex list-disc flex-col gap-1 pl-5 text-sm print:mt-1 print:gap-0 print:text-[7.5pt]">
          {a.cautions.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
        <p className="mt-2 text-sm font-medium print:mt-1 print:text-[8pt]">{a.deferral}</p>
      </section>

      {confirmation ? <div className="mt-5 print:mt-2">{confirmation}</div> : null}

      {qrSvg && linkUrl ? (
        <footer className="mt-4 hidden items-center gap-3 print:flex">
          <div className="size-16 [&_svg]:h-full [&_svg]:w-full" aria-hidden="true" dangerouslySetInnerHTML={{ __html: qrSvg }} />
          <p className="text-[7pt] break-all text-ink-soft">This page: {linkUrl}</p>
        </footer>
      ) : null}
    </article>
  );
}

function PartRow({ label, text }: { label: string; text: ReactNode }) {
  return (
    <>
      <dt className="text-ink-soft">{label}</dt>
      <dd>{text}</dd>
    </>
  );
}

/** How the figures were measured, said once when they share a method, else per figure. */
function methodNote(record: InstallationRecord): string | undefined {
  const methods = MEASUREMENT_KEYS.map((key) => record.measurements[key]?.method).filter((m): m is string => Boolean(m));
  if (!methods.length) return undefined;
  if (methods.every((m) => m === methods[0])) return `Measured: ${methods[0]}.`;
  return MEASUREMENT_KEYS.filter((key) => record.measurements[key]?.method).map((key) => `${MEASUREMENT_WORDS[key].label}: ${record.measurements[key]!.method}`).join("; ") + ".";
}
