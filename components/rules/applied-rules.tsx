/**
 * Which rules were applied, each with its kind and its source: shown beside the counter's verdict, on a saved
 * check and on the customer's page. Type-only imports from the core, no hooks: it renders on the server too.
 */
import type { LocalRulesResult, RuleFinding, RuleKind, RuleSource } from "@/lib/towing/rules/types";
import type { RigResult } from "@/lib/towing/types";
import { VerdictBadge } from "@/components/ui/verdict-badge";
import { cn } from "@/components/ui/cn";

const KIND_WORDS: Record<RuleKind, string> = {
  law: "Law",
  guideline: "Guideline",
  defer: "Check local law",
};

/** The local-rules check of a result, if the result was read against a place. */
export function localRulesOf(result: RigResult): LocalRulesResult | undefined {
  return result.checks.find((c) => c.id === "local-rules") as LocalRulesResult | undefined;
}

export function sourceText(source: RuleSource): string {
  return source.ref ? `${source.title}, ${source.ref}` : source.title;
}

function statusLabel(f: RuleFinding): string | undefined {
  if (f.deferred) return "Check local law";
  if (f.topic === "licence" && f.status === "incomplete") return "Check the licence";
  if (f.caution) return "Caution";
  return undefined;
}

export interface AppliedRulesProps {
  rules: LocalRulesResult;
  /** "counter": compact, beside the verdict; "report": the customer's wording. */
  variant?: "counter" | "report";
  /** The version of the same rule set today, when it differs from the one the result was read with. */
  currentVersion?: string;
  className?: string;
}

export function AppliedRules({ rules, variant = "counter", currentVersion, className }: AppliedRulesProps) {
  const applied = rules.rules;
  const headingId = `applied-rules-${variant}`;
  return (
    <section aria-labelledby={headingId} className={cn("min-w-0", className)} data-testid="applied-rules">
      <h3 id={headingId} className="text-sm font-semibold text-ink">
        {variant === "report" ? "The rules where you drive" : "Rules applied"}: {applied.title}
      </h3>
      <p className="mt-0.5 text-[0.8125rem] text-ink-soft">
        {applied.placeLabel} · rule set <span className="num">{applied.ruleSetVersion}</span>
        {currentVersion && currentVersion !== applied.ruleSetVersion ? (
          <>
            {" "}
            · <span className="font-medium text-ink">the rules have changed since (now {currentVersion}); this check stays as it was read</span>
          </>
        ) : null}
      </p>
      {rules.findings.length ? (
        <ul className="mt-2 space-y-2">
          {rules.findings.map((f) => (
            <li key={f.ruleId} className="rounded-md border border-rule bg-paper/60 px-3 py-2 break-inside-avoid" data-rule={f.ruleId}>
              <div className="flex flex-wrap items-center gap-2">
                <VerdictBadge status={f.status} size="sm" label={statusLabel(f)} />
                <span className="text-sm font-medium text-ink">{f.title}</span>
                <span className="text-xs tracking-wide text-ink-soft uppercase">{KIND_WORDS[f.kind]}</span>
              </div>
              <p className="mt-1 text-[0.8125rem] leading-snug text-ink">{f.message}</p>
              <p className="mt-0.5 text-xs leading-snug text-ink-soft">
                {f.requires} <span className="italic">Source: {sourceText(f.source)}</span>
                {f.source.note ? ` (${f.source.note})` : ""}
              </p>
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-2 text-[0.8125rem] text-ink-soft">None of this place&apos;s rules apply to this rig.</p>
      )}
    </section>
  );
}
