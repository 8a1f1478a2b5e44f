/**
 * One check on the customer's page: plain title, status in words, what it looks at, the figures, and what
 * to do right under a problem. A Server Component; type-only imports from the core.
 */
import type { ReactNode } from "react";
import { formatMargin, formatQuantity } from "@/lib/format";
import type { AccessoryFitResult, AnyCheckResult, CheckId, Link, TongueShareResult, WeakestLinkResult } from "@/lib/towing/types";
import { VerdictBadge, verdictWords } from "@/components/ui/verdict-badge";
import { cn } from "@/components/ui/cn";
import { CHECK_WORDS } from "@/lib/glossary";
import { carriedWords, checkMeaning } from "./meaning";
import { checkFigureWords, partWords } from "./part-words";
import { ownAdvice } from "@/lib/still-to-measure";
import { bandEdge } from "./tongue-share-chart";

/** What the measured side of each check is, in words. */
const ACTUAL_LABEL: Partial<Record<CheckId, string>> = {
  payload: "Payload used",
  "combined-weight": "Vehicle and trailer",
  "axle-loads": "Axle with least room",
  "weight-distribution": "This rig",
  "ball-mount": "Off level by",
  "tongue-measure": "Tongue weight",
  envelope: "This trailer",
};

export const GOVERNING_WORDS = "lowest — this one decides";

function isWeakestLink(check: AnyCheckResult): check is WeakestLinkResult {
  return check.id === "weakest-link" && "links" in check;
}
function isTongueShare(check: AnyCheckResult): check is TongueShareResult {
  return check.id === "tongue-share" && "band" in check;
}
function isAccessoryFit(check: AnyCheckResult): check is AccessoryFitResult {
  return check.id === "accessory-fit" && "parts" in check;
}

function Figure({ term, children, strong }: { term: ReactNode; children: ReactNode; strong?: boolean }) {
  return (
    <div className="min-w-0 print:flex print:items-baseline print:gap-1">
      <dt className="text-xs text-ink-faint print:text-[7pt]">{term}</dt>
      <dd className={cn("num text-sm tabular-nums print:text-[8pt]", strong ? "font-semibold text-ink" : "text-ink")}>{children}</dd>
    </div>
  );
}

function Figures({ check }: { check: AnyCheckResult }) {
  if (isTongueShare(check)) {
    if (check.share === undefined) return null;
    return (
      <dl className="mt-2 flex flex-wrap gap-x-6 gap-y-1 print:mt-0 print:gap-x-2.5 print:gap-y-0">
        <Figure term="Share on the tongue" strong>
          {formatQuantity({ value: check.share * 100, unit: "%" })}
        </Figure>
        <Figure term={check.band.source === "vehicle" ? "The vehicle maker's band" : check.band.source === "hitch-type" ? "Usual pin-weight band" : "Usual band for this trailer"}>
          {bandEdge(check.band.min)} to {bandEdge(check.band.max)}
        </Figure>
      </dl>
    );
  }
  if (!check.actual && !check.limit) return null;
  const limitNote = check.governing && check.limit ? check.governing.label : undefined;
  const room = checkFigureWords(check);
  return (
    <dl className="mt-2 flex flex-wrap gap-x-6 gap-y-1 print:mt-0 print:gap-x-2.5 print:gap-y-0">
      {check.actual ? (
        <Figure term={room ? "Room it needs" : (ACTUAL_LABEL[check.id] ?? "This rig")} strong>
          {formatQuantity(check.actual)}
        </Figure>
      ) : null}
      {check.limit ? (
        <Figure
          term={
            <>
              {room ? "Room it has" : "Limit"}
              {limitNote ? <span className="print:hidden">: {limitNote}</span> : null}
            </>
          }
        >
          {formatQuantity(check.limit)}
        </Figure>
      ) : null}
      {check.margin ? (
        <Figure term="Room left" strong>
          {formatMargin(check.margin)}
        </Figure>
      ) : null}
    </dl>
  );
}

const LINK_GROUPS: Array<{ limits: Link["limits"]; title: string }> = [
  { limits: "gross-trailer-weight", title: "Ratings for the trailer's weight" },
  { limits: "tongue-weight", title: "Ratings for the weight on the tongue" },
];

function LinkList({ check }: { check: WeakestLinkResult }) {
  const governingIds: Record<Link["limits"], string | undefined> = {
    "gross-trailer-weight": check.governingGrossTrailerWeight?.id,
    "tongue-weight": check.governingTongueWeight?.id,
  };
  return (
    <div className="mt-3 grid gap-3 sm:grid-cols-2 print:hidden">
      {LINK_GROUPS.map(({ limits, title }) => {
        const links = check.links.filter((link) => link.limits === limits);
        if (!links.length) return null;
        const governingId = governingIds[limits];
        const lowest = links.find((link) => link.id === governingId);
        return (
          <div key={limits} className="min-w-0">
            <h4 className="text-xs font-semibold text-ink-soft print:text-[7.5pt]">{title}</h4>
            <ul className="mt-1 divide-y divide-rule/70 text-sm print:text-[8pt]">
              {links.map((link) => {
                const decides = link.id === governingId;
                const equal = !decides && lowest !== undefined && link.rating.value === lowest.rating.value;
                return (
                  <li key={link.id} className="grid grid-cols-[minmax(0,1fr)_auto] items-baseline gap-x-3 py-1 print:py-0">
                    <span className={cn("min-w-0", decides && "font-semibold")}>
                      {link.label}
                      {decides ? <span className="ml-1 font-semibold text-ink">({GOVERNING_WORDS})</span> : null}
                      {equal ? <span className="ml-1 text-ink-soft">(as low as the deciding one)</span> : null}
                    </span>
                    <span className="num text-right tabular-nums">
                      {formatQuantity(link.rating)}
                      {link.status !== "within" ? (
                        <span className="ml-1 text-xs font-semibold">· {verdictWords[link.status]}</span>
                      ) : null}
                    </span>
                  </li>
                );
              })}
            </ul>
          </div>
        );
      })}
    </div>
  );
}

function PartList({ check }: { check: AccessoryFitResult }) {
  if (!check.parts.length) return null;
  return (
    <ul className="mt-3 divide-y divide-rule/70 text-sm print:mt-1 print:text-[8pt]">
      {check.parts.map((part) => (
        <li key={part.id} className="grid grid-cols-[minmax(0,1fr)_auto] items-center gap-x-3 py-1.5 print:py-0">
          <span className="min-w-0">
            {part.label}
            {part.actual && part.limit ? (
              <span className="num block text-xs text-ink-soft tabular-nums print:inline print:pl-1">
                {partWords(part.id).actual.toLowerCase()} {formatQuantity(part.actual)}, {partWords(part.id).limit} {formatQuantity(part.limit)}
                {part.margin ? ` · room left ${formatMargin(part.margin)}` : ""}
              </span>
            ) : null}
            {part.waitingFor ? <span className="block text-xs text-ink-soft">Still needs: {part.waitingFor.charAt(0).toLowerCase() + part.waitingFor.slice(1)}.</span> : null}
          </span>
          <VerdictBadge status={part.status} size="sm" />
        </li>
      ))}
    </ul>
  );
}

/**
 * Rough printed height of a check, in lines of a half-sheet column, so the paper layout can split the
 * list into two even columns (browsers balance columns of unbreakable items poorly).
 */
export function printedLines(check: AnyCheckResult): number {
  const lines = (text: string, perLine = 62) => Math.max(1, Math.ceil(text.length / perLine));
  // Title row with its badge, the padding and the rule between checks.
  let total = 2.2 + lines(check.message);
  if (check.id === "tongue-share") total += 1;
  else if (check.actual || check.limit) {
    const figures = [
      check.actual ? `${ACTUAL_LABEL[check.id] ?? "This rig"} ${formatQuantity(check.actual)}` : "",
      check.limit ? `Limit ${formatQuantity(check.limit)}` : "",
      check.margin ? `Room left ${formatMargin(check.margin)}` : "",
    ].join("   ");
    total += lines(figures, 64);
  }
  for (const advice of ownAdvice(check)) total += lines(advice, 56);
  if (check.missing?.length) total += 1;
  if (check.estimated) total += 1;
  return total;
}

export function CheckItem({ check, columnBreak = false, carried = false }: { check: AnyCheckResult; columnBreak?: boolean; carried?: boolean }) {
  const words = CHECK_WORDS[check.id] ?? { title: check.title, line: "" };
  const advice = ownAdvice(check);
  const say = carried ? carriedWords : (text: string) => text;
  const headingId = `report-check-${check.id}`;
  const problem = check.status === "over" || check.status === "adjust" || check.status === "tight";
  return (
    <li
      aria-labelledby={headingId}
      data-status={check.status}
      className={cn(
        "min-w-0 break-inside-avoid rounded-card border bg-panel px-4 py-3.5",
        "print:rounded-none print:border-0 print:border-t print:bg-transparent print:px-0 print:py-1",
        check.status === "over" ? "border-over/50" : check.status === "adjust" ? "border-adjust/45" : check.status === "tight" ? "border-tight/45" : "border-rule",
        "print:border-rule",
        columnBreak && "print:break-before-column",
      )}
    >
      <div className="flex flex-wrap items-start justify-between gap-x-3 gap-y-1">
        <h3 id={headingId} className="min-w-0 text-base leading-6 font-semibold print:text-[9pt] print:leading-tight">
          {words.title}
        </h3>
        <VerdictBadge status={check.status} size="sm" className="print:h-5 print:text-[7.5pt]" />
      </div>
      {words.line ? <p className="mt-0.5 text-sm leading-snug text-ink-soft print:hidden">{words.line}</p> : null}
      <p className="mt-2 text-[0.9375rem] leading-snug print:mt-0 print:text-[8pt] print:leading-[1.3]">{check.message}</p>
      {problem ? (
        <p data-testid="finding-meaning" className="mt-1 text-sm leading-snug font-medium print:mt-0 print:text-[7.5pt]">
          {say(checkMeaning(check))}
        </p>
      ) : null}
      <Figures check={check} />
      {isWeakestLink(check) ? <LinkList check={check} /> : null}
      {isAccessoryFit(check) ? <PartList check={check} /> : null}
      {check.estimated ? (
        <p className="mt-2 text-xs text-ink-soft print:text-[7.5pt]">One figure here is an estimate, not a weighed or measured value.</p>
      ) : null}
      {check.missing?.length ? (
        <p data-testid="waits-for" className="mt-2 text-sm text-ink-soft print:mt-0.5 print:text-[7.5pt]">
          {check.status === "incomplete" ? "Waits for" : "Would be firmer with"} {check.missing.length === 1 ? "one figure" : `${check.missing.length} figures`} from
          the list under “Still to measure”.
        </p>
      ) : null}
      {advice.length ? (
        <div
          className={cn(
            "mt-3 rounded-md border-l-4 bg-sunken px-3 py-2 print:mt-0.5 print:rounded-none print:border-l-2 print:bg-transparent print:px-2 print:py-0",
            check.status === "over" ? "border-over" : check.status === "adjust" ? "border-adjust" : check.status === "tight" ? "border-tight" : "border-rule",
          )}
        >
          <h4 className="text-sm font-semibold print:float-left print:mr-1 print:text-[7.5pt] print:leading-[1.3]">
            {check.status === "adjust" ? say("Adjust before you tow") : problem ? "What to do" : "Next step"}
            <span className="hidden print:inline">:</span>
          </h4>
          <ul className="mt-0.5 space-y-0.5 text-sm print:mt-0 print:space-y-0 print:text-[7.5pt] print:leading-[1.3]">
            {advice.map((line) => (
              <li key={line}>{say(line)}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {check.cautions.length ? (
        <details className="group mt-2 text-sm print:hidden">
          <summary className="cursor-pointer text-accent-strong underline-offset-2 hover:underline">Good to know</summary>
          <ul className="mt-1 list-disc space-y-0.5 pl-5 text-ink-soft">
            {check.cautions.map((caution) => (
              <li key={caution}>{caution}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </li>
  );
}
