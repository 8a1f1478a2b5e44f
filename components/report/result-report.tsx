/**
 * The customer's read-only result report: phone first, one printed sheet, no JavaScript beyond the print
 * button. A Server Component. It imports only types from the calculation core, so the core (and mathjs)
 * never reach the page's bundle; every figure is rounded for display by lib/format.
 */
import { formatRatio } from "@/lib/format";
import type { RigInput } from "@/lib/towing/input";
import type { AnyCheckResult, CheckStatus, RigResult, VerdictResult } from "@/lib/towing/types";
import { buttonClasses } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import { VerdictBadge, levelWords } from "@/components/ui/verdict-badge";
import { CheckItem, printedLines } from "./check-item";
import { CHECK_WORDS, plainTitle, STATUS_MEANING, termsIn } from "@/lib/glossary";
import { GlossaryList } from "@/components/glossary/glossary-list";
import { carriedWords, verdictMeaningKey } from "./meaning";
import { stillToMeasure } from "@/lib/still-to-measure";
import { PrintButton } from "./print-button";
import { reportFigures } from "./report-charts";
import { describeRig, listWords } from "./rig-summary";
import { AppliedRules, localRulesOf } from "@/components/rules/applied-rules";
import "./result-report.css";

export interface ResultReportProps {
  shopName: string;
  /** When the check was saved. */
  createdAt: Date;
  customerName?: string | null;
  /** The inputs snapshot. */
  rig: RigInput;
  /** The results snapshot (coreVersion inside). */
  result: RigResult;
  /** QR code SVG markup of the page's own URL, for the printout. */
  qrSvg?: string;
  /** The page's URL, printed under the QR on paper. */
  linkUrl?: string;
  /** IANA time zone for the date (the shop's); the server's own zone when absent. */
  timeZone?: string;
  /** Today's version of the rule set the result was read with, to say when the rules have changed since. */
  currentRuleSetVersion?: string;
  /** The place's words for the report's own sentences (the result's texts already are); the page passes it. */
  words?: (text: string) => string;
}

/**
 * Said whenever a saved result carries no cautions of its own (a snapshot from a fast evaluation): the
 * customer's page never goes without them.
 */
const FALLBACK_CAUTIONS = [
  "Every rating here comes from the vehicle maker and the labels on the parts; the report is only as good as the figures entered.",
  "The lowest rating of any part is the limit for the whole rig.",
  "Weigh the loaded rig at a public scale before you rely on these figures.",
  "Fit every part as its maker instructs, to the maker's torque values.",
  "Towmargin does the arithmetic on the figures entered and does not decide what the law allows: local law and a qualified installer have the last word.",
];

const SEVERITY: Record<CheckStatus, number> = { over: 0, adjust: 1, tight: 2, incomplete: 3, within: 4 };

/** "1 Dec 2026". */
export function formatReportDate(date: Date, timeZone?: string): string {
  return new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone }).format(date);
}

/** The verdict's sentence without a leading "Tight: " (or the like) when the badge beside it already says so. */
function verdictSentence(verdict: VerdictResult): string {
  const text = verdict.message.replace(/^(Over|Tight|Within|Not confirmed|Adjust the set-up before towing): /, "");
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** One plain line on what the level means, in the customer's words for each status (one source: lib/glossary). */
function levelMeaning(verdict: VerdictResult): string {
  const key = verdictMeaningKey(verdict);
  const share = formatRatio(verdict.tightMarginRatio, 0);
  if (key === "tight") return `Tight: it fits, with less than ${share} left on at least one rating; weigh the loaded rig before you rely on it.`;
  if (key === "within") return `Within: every rating checked has room to spare, at least ${share} on each.`;
  return `${STATUS_MEANING[key].word}. ${STATUS_MEANING[key].verdict}`;
}

const TONE_PANEL: Record<VerdictResult["level"], string> = {
  within: "border-within/35 bg-within-soft/60",
  tight: "border-tight/40 bg-tight-soft/60",
  adjust: "border-adjust/45 bg-adjust-soft/60",
  over: "border-over/50 bg-over-soft/60",
  incomplete: "border-dashed border-unknown/50 bg-unknown-soft/60",
};

/** Index of the first check of the second printed column: the split that evens the two columns out. */
function columnSplit(checks: AnyCheckResult[]): number {
  const heights = checks.map(printedLines);
  const total = heights.reduce((sum, h) => sum + h, 0);
  let best = checks.length;
  let bestTaller = Infinity;
  let first = 0;
  for (let i = 0; i < checks.length; i++) {
    const taller = Math.max(first, total - first);
    if (taller < bestTaller) {
      bestTaller = taller;
      best = i;
    }
    first += heights[i] ?? 0;
  }
  return best;
}

function sortChecks(checks: AnyCheckResult[]): AnyCheckResult[] {
  return checks
    .map((check, index) => ({ check, index }))
    .sort((a, b) => SEVERITY[a.check.status] - SEVERITY[b.check.status] || a.index - b.index)
    .map(({ check }) => check);
}

/** Every sentence and label the page shows, to find the terms it should define. */
function reportTexts(rig: RigInput, result: RigResult): string[] {
  const texts = [describeRig(rig), result.verdict.message];
  for (const check of result.checks) {
    const words = CHECK_WORDS[check.id];
    texts.push(check.message, ...check.advice, ...check.cautions, check.governing?.label ?? "");
    if (words) texts.push(words.title, words.line);
    if ("links" in check) for (const link of check.links) texts.push(link.label);
    if ("parts" in check) for (const part of check.parts) texts.push(part.label);
  }
  return texts;
}

const H2 = "text-sm font-semibold tracking-wide text-ink-soft uppercase print:text-[8pt]";

export function ResultReport({ shopName, createdAt, customerName, rig, result, qrSvg, linkUrl, timeZone, currentRuleSetVersion, words = (text) => text }: ResultReportProps) {
  const localRules = localRulesOf(result);
  const { verdict } = result;
  const date = formatReportDate(createdAt, timeZone);
  const cautions = verdict.cautions.length ? verdict.cautions : FALLBACK_CAUTIONS;
  const checks = sortChecks(result.checks);
  const split = columnSplit(checks);
  const figures = reportFigures(result, rig);
  const missingTitles = verdict.incomplete.map(plainTitle);
  const toMeasure = stillToMeasure(result.checks);
  // A rack or carrier is carried, not towed: the page's own words say so.
  const carried = Boolean(rig.accessory && !rig.trailer);
  const say = (text: string) => (carried ? carriedWords(words(text)) : words(text));
  // Results saved before the set-up status carry no `adjust` list.
  const adjustTitles = (verdict.adjust ?? []).map(plainTitle);

  return (
    <article
      aria-labelledby="report-title"
      className={cn(
        "mx-auto w-full max-w-3xl px-4 pt-5 pb-10 text-ink sm:px-6 sm:pt-8",
        "print:max-w-none print:p-0 print:text-[8pt] print:leading-snug",
      )}
    >
      {/* One sheet: narrow margins come from result-report.css; the rest of the print rules ride on print: variants. */}
      <header className="flex items-start justify-between gap-4 border-b border-rule pb-4 print:pb-1">
        <div className="min-w-0 print:flex print:flex-1 print:items-end print:justify-between print:gap-6">
          <div className="min-w-0">
            <p className="text-xs font-medium tracking-wide text-ink-faint uppercase print:hidden">{say("Towing check")}</p>
            <h1 id="report-title" className="mt-0.5 text-xl leading-tight font-semibold break-words sm:text-2xl print:text-[13pt]">
              {shopName}
            </h1>
          </div>
          <div className="mt-1 text-sm text-ink-soft print:mt-0 print:text-right print:text-[8pt]">
            <p>
              <span className="hidden print:inline">{say("Towing check")} · </span>
              Checked on <time dateTime={createdAt.toISOString()}>{date}</time>
            </p>
            {customerName ? <p>Prepared for {customerName}</p> : null}
          </div>
        </div>
        <PrintButton className={buttonClasses({ variant: "secondary", size: "sm" })} />
      </header>

      <section
        aria-labelledby="report-verdict"
        className={cn("mt-5 rounded-card border p-4 sm:p-5 print:mt-1.5 print:border-2 print:bg-transparent print:p-2", TONE_PANEL[verdict.level])}
      >
        <h2 id="report-verdict" className="sr-only">
          Verdict
        </h2>
        <div className="flex flex-col items-start gap-3 print:flex-row print:items-center print:gap-3">
          <VerdictBadge status={verdict.level} label={levelWords[verdict.level]} size="lg" className="print:h-7 print:text-[9pt]" />
          <p className="text-xl leading-snug font-semibold text-balance sm:text-2xl print:text-[11pt]">{verdictSentence(verdict)}</p>
        </div>
        <p className="mt-2 text-[0.9375rem] text-ink-soft print:mt-0.5 print:text-[8.5pt]">{say(levelMeaning(verdict))}</p>
        {adjustTitles.length && verdict.level !== "adjust" ? (
          <p className="mt-2 text-[0.9375rem] print:mt-0.5 print:text-[8.5pt]">
            {say("The set-up also needs adjusting before you tow")}: {listWords(adjustTitles.map((title) => title.toLowerCase()))}.
          </p>
        ) : null}
        {!verdict.complete && missingTitles.length ? (
          <p className="mt-2 text-[0.9375rem] print:mt-0.5 print:text-[8.5pt]">
            {missingTitles.length === 1 ? "One check could not be done" : `${missingTitles.length} checks could not be done`} because
            figures are missing: {listWords(missingTitles.map((title) => title.toLowerCase()))}. The shop can add them and send a new
            link.
          </p>
        ) : null}
      </section>

      {toMeasure.length ? (
        <section aria-labelledby="report-to-measure" className="mt-6 print:mt-1.5">
          <h2 id="report-to-measure" className={H2}>
            Still to measure
          </h2>
          <p className="mt-1 text-sm text-ink-soft print:hidden">Each figure once, in the order you would gather them; the checks that wait for it in brackets.</p>
          <ol className="mt-2 list-decimal space-y-1 pl-5 text-[0.9375rem] print:mt-0.5 print:space-y-0 print:columns-2 print:text-[7.5pt]">
            {toMeasure.map((item) => (
              <li key={item.field} data-field={item.field}>
                {item.what}. <span className="text-ink-soft">{item.where}.</span>{" "}
                <span className="text-ink-faint">({listWords(item.checks.map((id) => plainTitle(id).toLowerCase()))})</span>
              </li>
            ))}
          </ol>
        </section>
      ) : null}

      <section aria-labelledby="report-rig" className="mt-6 print:mt-1.5">
        <h2 id="report-rig" className={H2}>
          The rig
        </h2>
        <p className="mt-1.5 max-w-prose leading-relaxed print:mt-0.5 print:max-w-none print:text-[8pt] print:leading-snug">{words(describeRig(rig))}</p>
      </section>

      <section aria-labelledby="report-checks" className="mt-6 print:mt-1.5">
        <h2 id="report-checks" className={H2}>
          Each check
        </h2>
        <ul className="mt-2 grid gap-3 print:mt-0.5 print:block print:columns-2 print:gap-x-5">
          {checks.map((check, index) => (
            <CheckItem key={check.id} check={check} carried={carried} columnBreak={index === split && index > 0} />
          ))}
        </ul>
      </section>

      {localRules ? (
        <section aria-label="The rules where you drive" className="mt-6 print:mt-1.5">
          <AppliedRules rules={localRules} variant="report" currentVersion={currentRuleSetVersion} />
        </section>
      ) : null}

      {/* On paper the charts and the cautions share one band across the sheet. */}
      <div className={cn("print:mt-1.5 print:grid print:gap-4 print:break-inside-avoid", figures.length ? "print:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]" : "")}>
        {figures.length ? (
          <section aria-labelledby="report-charts" className="mt-6 print:mt-0 print:min-w-0">
            <h2 id="report-charts" className={H2}>
              At a glance
            </h2>
            <div className={cn("mt-2 grid gap-4 sm:grid-cols-2 print:mt-1 print:gap-3", figures.length > 1 ? "print:grid-cols-2 print:grid-rows-[auto_1fr]" : "print:grid-cols-1")}>
              {figures.map((figure) => (
                <figure
                  key={figure.id}
                  className={cn(
                    "min-w-0 break-inside-avoid rounded-card border border-rule bg-panel p-4 print:border-0 print:bg-transparent print:p-0",
                    figure.id === "ratings" && figures.length > 2 && "sm:row-span-2",
                  )}
                >
                  {figure.chart}
                  <figcaption className="mt-2 text-sm leading-snug text-ink-soft print:mt-0.5 print:text-[7pt]">{figure.caption}</figcaption>
                </figure>
              ))}
            </div>
          </section>
        ) : null}

        <section aria-labelledby="report-cautions" className="mt-6 print:mt-0 print:min-w-0">
          <h2 id="report-cautions" className={H2}>
            {say("Before you tow")}
          </h2>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-[0.9375rem] print:mt-0.5 print:space-y-0.5 print:pl-4 print:text-[7.5pt]">
            {cautions.map((caution) => (
              <li key={caution}>{caution}</li>
            ))}
          </ul>
          {qrSvg || linkUrl ? (
            <div className="mt-2 hidden items-end gap-2 print:flex">
              {qrSvg ? (
                <div aria-hidden="true" className="size-16 shrink-0 [&_svg]:block [&_svg]:size-full" dangerouslySetInnerHTML={{ __html: qrSvg }} />
              ) : null}
              {linkUrl ? (
                <p className="min-w-0 text-[6.5pt] break-all text-ink-soft">
                  This report online:
                  <span className="block">{linkUrl}</span>
                </p>
              ) : null}
            </div>
          ) : null}
        </section>
      </div>

      <section aria-labelledby="report-words" className="mt-6 print:hidden">
        <h2 id="report-words" className={H2}>
          Words on this page
        </h2>
        <GlossaryList className="mt-2" terms={termsIn(reportTexts(rig, result))} />
      </section>

      <footer className="mt-8 border-t border-rule pt-3 text-xs text-ink-faint print:mt-1.5 print:pt-0.5 print:text-[7pt]">
        <p>
          Computed by Towmargin core {result.coreVersion}, from the figures {shopName} entered on {date}.
          {result.rules ? ` Rules read: ${result.rules.title}, rule set ${result.rules.ruleSetVersion}.` : ""}
        </p>
      </footer>
    </article>
  );
}
