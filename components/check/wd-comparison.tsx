"use client";

/**
 * Side by side, the answer customers ask for with a trailer: the rig without weight distribution and with it,
 * each with its level and the limit that governs, and which of the two is the set-up entered. Computed from the
 * same checks by the core (compareWeightDistribution); it follows the verdict a moment later, never holding up
 * a keystroke.
 */
import { memo, useDeferredValue, useMemo } from "react";
import { VerdictBadge, cn, levelWords } from "@/components/ui";
import { formatQuantity } from "@/lib/format";
import { compareWeightDistribution, type RigInput, type WdSide } from "@/lib/towing";
import type { Place } from "@/lib/towing/rules/types";

function SideAnswer({ title, side }: { title: string; side: WdSide }) {
  return (
    <div
      data-testid={side.used ? "wd-with" : "wd-without"}
      data-level={side.level}
      className={cn("min-w-0 rounded-md border px-3 py-2.5", side.asEntered ? "border-accent/60 bg-accent-soft/40" : "border-rule bg-panel")}
    >
      <p className="text-[0.8125rem] font-semibold text-ink">{title}</p>
      <div className="mt-1.5">
        <VerdictBadge status={side.level} label={levelWords[side.level]} size="sm" />
      </div>
      <p className="num mt-1.5 text-[0.8125rem] leading-snug text-ink-soft">
        {side.governing ? (
          <>
            Governs: <span className="font-medium text-ink">{side.governing.label}</span>
            {side.governing.unit ? ` (${formatQuantity(side.governing)})` : ""}
          </>
        ) : side.incomplete.length ? (
          `${side.incomplete.length === 1 ? "One check lacks" : `${side.incomplete.length} checks lack`} figures.`
        ) : (
          "Nothing governs yet."
        )}
      </p>
      {side.asEntered ? <p className="mt-1 text-xs font-medium text-accent-strong">As entered</p> : null}
    </div>
  );
}

function WdComparisonImpl({ rig, tightMarginRatio, place }: { rig: RigInput; tightMarginRatio?: number; place?: Place }) {
  const deferred = useDeferredValue(rig);
  const comparison = useMemo(() => compareWeightDistribution(deferred, { tightMarginRatio, place }), [deferred, tightMarginRatio, place]);
  if (!comparison) return null;
  return (
    <section aria-labelledby="wd-compare-title" data-testid="wd-compare" className="space-y-2">
      <h3 id="wd-compare-title" className="text-sm font-semibold text-ink">
        Without and with weight distribution
      </h3>
      <div className="grid grid-cols-2 gap-2">
        <SideAnswer title="Without weight distribution" side={comparison.without} />
        <SideAnswer title="With weight distribution" side={comparison.with} />
      </div>
    </section>
  );
}

/** Re-renders only for a new rig. */
export const WdComparison = memo(WdComparisonImpl);
