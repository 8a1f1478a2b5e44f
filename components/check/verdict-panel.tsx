"use client";

/**
 * The verdict of one rig: the overall level and the sentence that matters, the governing item, each check as
 * a row (figures, margin bar, what to do, worked steps), the cautions, then the charts. Takes a result only
 * (and, optionally, the rig for the axle ratings), so any screen can show it.
 */
import { memo, useDeferredValue, useLayoutEffect, useRef, useState, type ReactNode } from "react";
import dynamic from "next/dynamic";
import { ChevronRight } from "lucide-react";
import { VerdictBadge, cn, levelMeaning, levelWords } from "@/components/ui";
import { formatMargin, formatQuantity, formatRatio } from "@/lib/format";
import { checkFigureWords, partWords } from "@/components/report/part-words";
import { stillToMeasure } from "@/lib/still-to-measure";
import type {
  AccessoryFitResult,
  AnyCheckResult,
  AxleLoadsResult,
  EnvelopeResult,
  RigInput,
  RigResult,
  TongueShareResult,
  WeakestLinkResult,
} from "@/lib/towing";
import { MarginBar } from "./margin-bar";
import { WorkedSteps } from "./worked-steps";

function ChartSlot({ height }: { height: number }) {
  return <div aria-hidden="true" style={{ height }} className="w-full animate-pulse rounded-md bg-sunken motion-reduce:animate-none" />;
}

const RatingsChart = dynamic(() => import("./charts").then((m) => m.RatingsChart), { ssr: false, loading: () => <ChartSlot height={180} /> });
const TongueShareChart = dynamic(() => import("./charts").then((m) => m.TongueShareChart), { ssr: false, loading: () => <ChartSlot height={96} /> });
const AxleChart = dynamic(() => import("./charts").then((m) => m.AxleChart), { ssr: false, loading: () => <ChartSlot height={130} /> });
const EnvelopeChart = dynamic(() => import("./charts").then((m) => m.EnvelopeChart), { ssr: false, loading: () => <ChartSlot height={230} /> });

export interface VerdictPanelProps {
  result: RigResult;
  /** The rig the result is for: lets the axle chart draw both GAWRs. */
  rig?: RigInput;
  /** Draw the charts (default true). */
  charts?: boolean;
  className?: string;
  /** Heading level of the panel's title. */
  headingLevel?: "h2" | "h3";
  /** Shown right under the headline, before the figures still to measure and the checks (the check screen's comparison). */
  underHeadline?: ReactNode;
}

function isWeakestLink(c: AnyCheckResult): c is WeakestLinkResult {
  return c.id === "weakest-link";
}
function isAccessory(c: AnyCheckResult): c is AccessoryFitResult {
  return c.id === "accessory-fit";
}

function ActualVsLimit({ check }: { check: AnyCheckResult }) {
  if (!check.actual || !check.limit) return null;
  const isShare = check.id === "tongue-share";
  const isAngle = check.id === "accessory-fit" && check.actual.unit === "°";
  const room = checkFigureWords(check);
  return (
    <p className="num text-sm text-ink">
      {isShare ? "Share " : isAngle ? "Departure angle " : room ? `${room.actual} ` : "On it "}
      <strong className="font-semibold">{formatQuantity(check.actual)}</strong>
      <span className="text-ink-soft">
        {isShare ? " · nearest edge " : isAngle ? " · accessory angle " : room ? ` · ${room.limit} ` : " · allowed "}
        {formatQuantity(check.limit)}
      </span>
    </p>
  );
}

/**
 * Every link with its rating, room and status. Where the panel is narrow (a phone's sheet) the rating and the room
 * go under the link's name, so the status column keeps its place without a sideways scroll; a wider panel gives
 * each its own column. Sized by the panel (a container query), not the screen: the desktop column is narrow too.
 */
function LinksTable({ check }: { check: WeakestLinkResult }) {
  if (!check.links.length) return null;
  const governing = new Set([check.governing?.id, check.governingGrossTrailerWeight?.id, check.governingTongueWeight?.id]);
  const wide = "hidden @md:table-cell";
  return (
    <div className="@container rounded-md border border-rule" data-testid="links-table">
      <table className="w-full border-collapse text-left text-[0.8125rem]">
        <caption className="sr-only">Every link between the vehicle and the trailer</caption>
        <thead className="bg-sunken text-ink-soft">
          <tr>
            <th scope="col" className="px-2 py-1.5 font-semibold">
              Link<span className="font-normal @md:hidden">, rating, room</span>
            </th>
            <th scope="col" className={cn(wide, "px-2 py-1.5 text-right font-semibold")}>Rating</th>
            <th scope="col" className={cn(wide, "px-2 py-1.5 text-right font-semibold")}>Room</th>
            <th scope="col" className="w-px px-2 py-1.5 font-semibold whitespace-nowrap">
              <span className="sr-only">Status</span>
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {check.links.map((link) => {
            const governs = link.id === check.governing?.id;
            return (
              <tr key={link.id} className={cn("align-top", governs && "bg-accent-soft/60")} data-governs={governs || undefined}>
                <td className="px-2 py-1.5 [overflow-wrap:anywhere]">
                  <span className={cn(governs && "font-semibold")}>{link.label}</span>
                  {governs ? <span className="ml-1 text-xs font-semibold text-accent-strong">· governs</span> : null}
                  {!governs && governing.has(link.id) ? <span className="ml-1 text-xs text-ink-soft">· lowest of its kind</span> : null}
                  <span className="num mt-0.5 flex flex-wrap gap-x-2 text-ink-soft @md:hidden">
                    <span className="whitespace-nowrap text-ink">{formatQuantity(link.rating)}</span>
                    <span className="whitespace-nowrap">{link.margin ? `${formatMargin(link.margin)} room` : "room —"}</span>
                  </span>
                </td>
                <td className={cn(wide, "num px-2 py-1.5 text-right whitespace-nowrap")}>{formatQuantity(link.rating)}</td>
                <td className={cn(wide, "num px-2 py-1.5 text-right whitespace-nowrap")}>{formatMargin(link.margin)}</td>
                <td className="w-px px-2 py-1.5 whitespace-nowrap">
                  <VerdictBadge status={link.status} size="sm" />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

function PartsTable({ check }: { check: AccessoryFitResult }) {
  return (
    <ul className="space-y-1.5">
      {check.parts.map((part) => (
        <li key={part.id} className="flex flex-wrap items-center gap-x-2 gap-y-1 text-[0.8125rem]">
          <VerdictBadge status={part.status} size="sm" />
          <span className="font-medium text-ink">{part.label}</span>
          {part.actual && part.limit ? (
            <span className="num text-ink-soft">
              {partWords(part.id).actual.toLowerCase()} {formatQuantity(part.actual)} · {partWords(part.id).limit} {formatQuantity(part.limit)} · {formatMargin(part.margin)} room
            </span>
          ) : null}
          {part.waitingFor ? <span className="basis-full pl-1 text-ink-soft">Still needs: {part.waitingFor.charAt(0).toLowerCase() + part.waitingFor.slice(1)}.</span> : null}
        </li>
      ))}
    </ul>
  );
}

/**
 * A disclosure whose content is built only once it is opened: the worked steps of ten checks are most of the
 * panel's markup, and rebuilding them on every keystroke while closed would cost more than the evaluation.
 */
function LazyDetails({ summary, children, className }: { summary: ReactNode; children: () => ReactNode; className?: string }) {
  const [open, setOpen] = useState(false);
  return (
    <details className={cn("group", className)} onToggle={(e) => setOpen(e.currentTarget.open)}>
      {summary}
      {open ? children() : null}
    </details>
  );
}

function CheckRow({ check }: { check: AnyCheckResult }) {
  const missingLines = new Set((check.missing ?? []).map((m) => `${m.what}: ${m.where}.`));
  const advice = check.advice.filter((a) => !missingLines.has(a));
  const showAdvice = check.status !== "within" && advice.length > 0;
  const band = check.id === "tongue-share" ? (check as TongueShareResult).band : undefined;
  return (
    <li data-testid={`check-${check.id}`} data-status={check.status} className="min-w-0 space-y-2 py-3.5">
      <div className="flex flex-wrap items-start justify-between gap-x-3 gap-y-1.5">
        <h3 className="min-w-0 text-[0.9375rem] leading-6 font-semibold text-ink">{check.title}</h3>
        <VerdictBadge status={check.status} size="sm" />
      </div>
      <p className="text-sm leading-snug text-ink-soft">{check.message}</p>
      <ActualVsLimit check={check} />
      <MarginBar actual={check.actual} limit={check.limit} status={check.status} band={band ? { min: band.min * 100, max: band.max * 100 } : undefined} />
      {check.margin ? (
        <p className="num text-[0.8125rem] text-ink-soft">
          {check.id === "tongue-share" ? "Room to the band's edge" : "Room left"}: <span className="font-semibold text-ink">{formatMargin(check.margin)}</span>
          {check.estimated ? <span> · uses an estimate</span> : null}
        </p>
      ) : null}
      {isWeakestLink(check) ? <LinksTable check={check} /> : null}
      {isAccessory(check) ? <PartsTable check={check} /> : null}
      {showAdvice ? (
        <div
          className={cn(
            "rounded-md border-l-4 px-3 py-2",
            check.status === "over" ? "border-over bg-over-soft" : check.status === "adjust" ? "border-adjust bg-adjust-soft" : "border-tight bg-tight-soft",
          )}
        >
          <p className="text-[0.8125rem] font-semibold text-ink">{check.status === "adjust" ? "Adjust before you tow" : "What to do"}</p>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm leading-snug text-ink">
            {advice.map((a) => (
              <li key={a}>{a}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {check.missing?.length ? (
        <p data-testid="waits-for" className="text-[0.8125rem] text-ink-soft">
          {check.status === "incomplete" ? "Waits for" : "Would be firmer with"} {check.missing.length === 1 ? "one figure" : `${check.missing.length} figures`} from{" "}
          <a href="#verdict-to-measure" className="text-accent-strong underline underline-offset-2">
            Still to measure
          </a>
          .
        </p>
      ) : null}
      <LazyDetails
        summary={
          <summary className="inline-flex min-h-9 cursor-pointer list-none items-center gap-1.5 rounded text-[0.8125rem] font-medium text-accent-strong select-none [&::-webkit-details-marker]:hidden">
            <ChevronRight aria-hidden="true" className="size-4 transition-transform group-open:rotate-90 motion-reduce:transition-none" />
            How it is worked out{check.steps.length ? ` (${check.steps.length} step${check.steps.length > 1 ? "s" : ""})` : ""}
          </summary>
        }
      >
        {() => (
        <div className="mt-2 space-y-3 border-l-2 border-rule pl-3">
          <WorkedSteps steps={check.steps} />
          {check.cautions.length ? (
            <ul className="list-disc space-y-1 pl-5 text-[0.8125rem] leading-snug text-ink-soft">
              {check.cautions.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </ul>
          ) : null}
        </div>
        )}
      </LazyDetails>
    </li>
  );
}

/** The charts follow the verdict a moment later (a deferred render), so a keystroke never waits for them. */
function Charts(props: { result: RigResult; rig?: RigInput }) {
  const result = useDeferredValue(props.result);
  const rig = useDeferredValue(props.rig);
  const weakest = result.checks.find(isWeakestLink);
  const share = result.checks.find((c): c is TongueShareResult => c.id === "tongue-share");
  const axles = result.checks.find((c): c is AxleLoadsResult => c.id === "axle-loads");
  const envelope = result.checks.find((c): c is EnvelopeResult => c.id === "envelope");
  const gtw = envelope?.actual?.value;
  const tw = weakest?.links.find((l) => l.limits === "tongue-weight" && l.actual)?.actual?.value ?? rig?.trailer?.tongueWeight;
  const point = gtw !== undefined && tw !== undefined ? { grossTrailerWeight: gtw, tongueWeight: tw } : undefined;
  const showAxles = !!axles && (axles.unhitched || axles.hitched);
  const showWeakest = !!weakest && weakest.links.length > 0;
  const showShare = share?.share !== undefined;
  const showEnvelope = !!envelope && envelope.region.length >= 3;
  if (!showAxles && !showWeakest && !showShare && !showEnvelope) return null;
  return (
    <section aria-labelledby="verdict-charts" className="space-y-4 border-t border-rule pt-4">
      <h3 id="verdict-charts" className="text-sm font-semibold tracking-wide text-ink-soft uppercase">
        Charts
      </h3>
      {showWeakest ? <RatingsChart check={weakest!} /> : null}
      {showShare ? <TongueShareChart check={share!} /> : null}
      {showAxles ? <AxleChart check={axles!} gawrFront={rig?.vehicle.gawrFront} gawrRear={rig?.vehicle.gawrRear} /> : null}
      {showEnvelope ? <EnvelopeChart check={envelope!} point={point} /> : null}
    </section>
  );
}

function VerdictPanelImpl({ result, rig, charts = true, className, headingLevel = "h2", underHeadline }: VerdictPanelProps) {
  const rootRef = useRef<HTMLElement>(null);
  const { verdict } = result;
  const Heading = headingLevel;
  const governingCheck = verdict.governing ? result.checks.find((c) => c.id === verdict.governing!.checkId) : undefined;
  const incompleteTitles = verdict.incomplete.map((id) => result.checks.find((c) => c.id === id)?.title ?? id);
  const toMeasure = stillToMeasure(result.checks);
  const titleOf = (id: string) => result.checks.find((c) => c.id === id)?.title ?? id;

  // Stamped on every new result, straight onto the element, so a browser test can read input → verdict time.
  useLayoutEffect(() => {
    rootRef.current?.setAttribute("data-evaluated-at", String(performance.now()));
  }, [result]);

  return (
    <section ref={rootRef} aria-labelledby="verdict-title" data-testid="verdict-panel" className={cn("min-w-0 space-y-4", className)}>
      {/* Only the level is announced: the numbers change on every keystroke and would drown the reader. */}
      <p aria-live="polite" aria-atomic="true" className="sr-only">
        Verdict: {levelWords[verdict.level]}
      </p>
      <header className="space-y-2.5">
        <Heading id="verdict-title" className="sr-only">
          Verdict
        </Heading>
        <div
          data-testid="verdict-level"
          data-level={verdict.level}
          className="inline-flex transition-[opacity,translate] duration-200 starting:translate-y-1 starting:opacity-0 motion-reduce:transition-none"
          key={verdict.level}
        >
          <VerdictBadge status={verdict.level} label={levelWords[verdict.level]} size="lg" />
        </div>
        <p className="text-lg leading-snug font-semibold text-balance text-ink">{verdict.message}</p>
        <p data-testid="verdict-meaning" className="text-sm text-ink-soft">
          {levelMeaning[verdict.level]}
          {verdict.level === "over" && verdict.adjust?.length ? " The set-up also needs adjusting." : ""}
        </p>
        {verdict.governing ? (
          <p className="num text-sm text-ink-soft">
            Governing: <span className="font-semibold text-ink">{verdict.governing.label}</span>
            {verdict.governing.unit ? ` — ${formatQuantity(verdict.governing)}` : ""}
            {governingCheck ? ` (${governingCheck.title.toLowerCase()})` : ""}
          </p>
        ) : null}
        {!verdict.complete ? (
          <p className="text-sm text-ink-soft">
            Still lacking figures: {incompleteTitles.join(", ")}. The rig cannot be confirmed until they are in.
          </p>
        ) : null}
        <p className="text-xs text-ink-faint">Tight means less than {formatRatio(verdict.tightMarginRatio, 0)} of a limit left.</p>
      </header>

      {underHeadline}

      {toMeasure.length ? (
        <section aria-labelledby="verdict-to-measure-title" id="verdict-to-measure" data-testid="still-to-measure" className="scroll-mt-24 rounded-md border border-dashed border-unknown/50 bg-unknown-soft px-3 py-2.5">
          <h3 id="verdict-to-measure-title" className="text-sm font-semibold text-ink">
            Still to measure ({toMeasure.length})
          </h3>
          <p className="text-xs text-ink-soft">Each figure once, in the order you would gather them.</p>
          <ol className="mt-1.5 list-decimal space-y-1 pl-5 text-sm leading-snug">
            {toMeasure.map((m) => (
              <li key={m.field} data-field={m.field}>
                <span className="text-ink">{m.what}</span>
                <span className="text-ink-soft"> — {m.where}</span>
                <span className="block text-xs text-ink-faint">For: {m.checks.map(titleOf).join(" · ")}</span>
              </li>
            ))}
          </ol>
        </section>
      ) : null}

      <ol aria-label="Checks" className="divide-y divide-rule border-y border-rule">
        {result.checks.map((check) => (
          <CheckRow key={check.id} check={check} />
        ))}
      </ol>

      <section aria-labelledby="verdict-cautions" className="rounded-md border border-rule bg-sunken px-3 py-3">
        <h3 id="verdict-cautions" className="text-sm font-semibold text-ink">
          Before anyone drives off
        </h3>
        <ul className="mt-1.5 list-disc space-y-1 pl-5 text-[0.8125rem] leading-snug text-ink-soft">
          {verdict.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>

      {charts ? <Charts result={result} rig={rig} /> : null}
    </section>
  );
}

/** Re-renders only for a new result, so a keystroke that leaves the result alone costs nothing here. */
export const VerdictPanel = memo(VerdictPanelImpl);
