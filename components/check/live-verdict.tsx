"use client";

/**
 * The check screen's live verdict: the phone's compact bar, the verdict column (with the local rules when a
 * place applies) and the side view. Recomputed in the browser on every keystroke that leaves the inputs valid;
 * the last good verdict stays up, marked as waiting, while a field is invalid.
 */
import { useDeferredValue, useEffect, useMemo, useRef, useState } from "react";
import { useWatch, type Control } from "react-hook-form";
import { ChevronDown, CircleAlert } from "lucide-react";
import { Card, CardBody, CardHeader, VerdictBadge, cn, levelWords } from "@/components/ui";
import { evaluateRig, type RigInput, type RigResult, type AccessoryFitResult } from "@/lib/towing";
import { AppliedRules, localRulesOf } from "@/components/rules/applied-rules";
import { stillToMeasure } from "@/lib/still-to-measure";
import { useAwaitedStore } from "./field-parts";
import { parseCandidate } from "./parse-candidate";
import type { PlaceChoice } from "./place-picker";
import { toRigCandidate, type HitchedKind, type RigFormValues } from "./rig-form";
import { SideView } from "./side-view";
import { VerdictPanel } from "./verdict-panel";
import { WdComparison } from "./wd-comparison";

export interface LiveVerdictProps {
  control: Control<RigFormValues, unknown, RigInput>;
  kind: HitchedKind;
  tightMarginRatio?: number;
  /** The organisation's front-axle loss limit (common practice, no published source). */
  frontAxleLossLimit?: number;
  place: PlaceChoice;
  onJump: (path: string) => void;
}

/** The verdict sentence without its leading level word ("Over: …"), where a badge beside it already says it. */
function withoutLevelWord(message: string): string {
  const cut = message.match(/^(?:Adjust the set-up before towing|[A-Z][a-z]+(?: [a-z]+)?): (.*)$/s);
  if (!cut) return message;
  const rest = cut[1]!;
  return rest.charAt(0).toUpperCase() + rest.slice(1);
}

/**
 * Subscribes to every value, parses and evaluates; the only part of the screen that re-renders on each
 * keystroke besides the field itself. Renders straight into the page grid: the phone's bar, the verdict
 * column and the side view are siblings there.
 */
export function LiveVerdict({ control, kind, tightMarginRatio, frontAxleLossLimit, place, onJump }: LiveVerdictProps) {
  const values = useWatch({ control }) as RigFormValues;
  const parsed = useMemo(() => parseCandidate(values, kind), [values, kind]);
  const evaluated = useMemo(
    () => (parsed.ok ? { rig: parsed.rig, result: evaluateRig(parsed.rig, { tightMarginRatio, frontAxleLossLimit, place: place ?? undefined }) } : null),
    [parsed, tightMarginRatio, frontAxleLossLimit, place],
  );
  // While a figure is half-typed, the last rig that parsed stays on screen (kept as state, set while rendering).
  const [lastGood, setLastGood] = useState<{ rig: RigInput; result: RigResult } | null>(null);
  if (evaluated && evaluated !== lastGood) setLastGood(evaluated);
  const shown = evaluated ?? lastGood;
  const [open, setOpen] = useState(false);
  const asideRef = useRef<HTMLElement>(null);
  const barButtonRef = useRef<HTMLButtonElement>(null);
  // The cards' folds say how many of their figures the verdict still waits for.
  const awaitedStore = useAwaitedStore();
  const shownResult = shown?.result;
  useEffect(() => {
    if (awaitedStore && shownResult) awaitedStore.set(stillToMeasure(shownResult.checks).map((m) => m.field));
  }, [awaitedStore, shownResult]);
  // The phone's "Checks" brings the whole panel into view and moves the focus to it.
  useEffect(() => {
    if (!open) return;
    const panel = asideRef.current;
    if (!panel) return;
    panel.scrollTop = 0;
    panel.scrollIntoView({ block: "start" });
    panel.focus({ preventScroll: true });
  }, [open]);
  // Desktop: when the panel's headline is out of view (the panel pushed up at the foot of the form, or scrolled
  // inside), a compact line of the verdict stays at the top of the column instead.
  const [headlineOut, setHeadlineOut] = useState(false);
  const shownLevel = shown?.result.verdict.level;
  useEffect(() => {
    const headline = asideRef.current?.querySelector('[data-testid="verdict-level"]');
    if (!headline || typeof IntersectionObserver === "undefined") return;
    const observer = new IntersectionObserver(([entry]) => setHeadlineOut(!entry!.isIntersecting));
    observer.observe(headline);
    return () => observer.disconnect();
  }, [shownLevel]);
  // The drawing follows a moment after the verdict (a deferred render), so typing never waits for it.
  const deferredValues = useDeferredValue(values);
  const sideRig = useMemo(() => toRigCandidate(deferredValues, kind) as RigInput, [deferredValues, kind]);
  if (!shown) return null;
  const { result, rig } = shown;
  const level = result.verdict.level;
  const waiting = !parsed.ok ? parsed.issues : null;
  const accessoryAngle = (result.checks.find((c) => c.id === "accessory-fit") as AccessoryFitResult | undefined)?.accessoryAngle?.value;

  const waitingNote = waiting ? (
    <div role="alert" className="rounded-md border border-over/45 bg-over-soft px-3 py-2.5 text-sm text-ink">
      <p className="flex items-start gap-2 font-semibold">
        <CircleAlert aria-hidden="true" className="mt-px size-4 shrink-0 text-over" />
        Waiting for valid input: the verdict below is the last one that had valid figures.
      </p>
      <ul className="mt-1.5 space-y-1 pl-6">
        {waiting.map((issue) => (
          <li key={issue.path}>
            <button type="button" onClick={() => onJump(issue.path)} className="text-left text-accent-strong underline underline-offset-2 hover:text-ink">
              {issue.message}
            </button>
          </li>
        ))}
      </ul>
    </div>
  ) : null;

  return (
    <>
      {/* Phone: a compact bar on top that opens to the full list. */}
      <div className="sticky top-0 z-20 order-first rounded-card border border-rule bg-panel/95 px-3 py-2 shadow-card backdrop-blur lg:hidden">
        <button
          ref={barButtonRef}
          type="button"
          onClick={() => setOpen((o) => !o)}
          aria-expanded={open}
          aria-controls="workbench-verdict"
          className="flex w-full items-center gap-3 text-left"
        >
          <VerdictBadge status={level} label={waiting ? `${levelWords[level]} (waiting)` : levelWords[level]} />
          <span className="min-w-0 flex-1 truncate text-sm text-ink">{withoutLevelWord(result.verdict.message)}</span>
          <span className="inline-flex shrink-0 items-center gap-1 text-sm font-medium text-accent-strong">
            {open ? "Hide" : "Checks"}
            <ChevronDown aria-hidden="true" className={cn("size-4 transition-transform motion-reduce:transition-none", open && "rotate-180")} />
          </span>
        </button>
      </div>

      {/* Phone: the full list opens as a sheet under the bar, wherever the form is scrolled to. Desktop: the
          column stretches over every row so its panel stays in view (sticky) while the form scrolls. */}
      <aside
        ref={asideRef}
        id="workbench-verdict"
        aria-label="Verdict"
        tabIndex={-1}
        onKeyDown={(e) => {
          if (e.key === "Escape" && open) {
            setOpen(false);
            barButtonRef.current?.focus();
          }
        }}
        className={cn(
          "order-first min-w-0 outline-none lg:static lg:order-none lg:col-start-2 lg:row-span-4 lg:row-start-1 lg:block lg:max-h-none lg:self-stretch lg:overflow-visible lg:p-0",
          open ? "fixed inset-x-2 top-16 bottom-2 z-30 block overflow-y-auto overscroll-contain rounded-card" : "hidden",
        )}
      >
        {/* Takes no room: shown over the panel only while the panel's own headline is out of view. */}
        <div className="sticky top-0 z-10 hidden h-0 lg:block">
          <div
            data-testid="verdict-compact"
            data-shown={headlineOut || undefined}
            aria-hidden={!headlineOut}
            className={cn("absolute inset-x-0 top-0 bg-paper pt-4 transition-opacity duration-150 motion-reduce:transition-none", headlineOut ? "opacity-100" : "pointer-events-none invisible opacity-0")}
          >
            <div className="flex items-center gap-3 rounded-card border border-rule bg-panel px-3 py-2 shadow-card">
              <VerdictBadge status={level} label={waiting ? `${levelWords[level]} (waiting)` : levelWords[level]} />
              <span className="min-w-0 flex-1 truncate text-sm text-ink">{withoutLevelWord(result.verdict.message)}</span>
            </div>
          </div>
        </div>
        <div className="space-y-3 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)] lg:overflow-y-auto lg:pr-1">
          <Card className={cn("px-4 py-4 sm:px-5", waiting && "opacity-95")}>
            {waitingNote ? <div className="mb-4">{waitingNote}</div> : null}
            <div className={cn(waiting && "opacity-60 transition-opacity")}>
              <VerdictPanel result={result} rig={rig} underHeadline={rig.trailer ? <WdComparison rig={rig} tightMarginRatio={tightMarginRatio} place={place ?? undefined} /> : null} />
            </div>
          </Card>
          {localRulesOf(result) ? (
            <Card className="px-4 py-4 sm:px-5">
              <AppliedRules rules={localRulesOf(result)!} />
            </Card>
          ) : null}
        </div>
      </aside>

      <Card as="section" aria-labelledby="workbench-side-title" className="min-w-0 lg:col-start-1">
        <CardHeader titleId="workbench-side-title" title="Side view" description="Heights and distances from the figures entered, to scale." />
        <CardBody>
          <SideView rig={sideRig} kind={kind} accessoryAngle={accessoryAngle} />
        </CardBody>
      </Card>
    </>
  );
}
