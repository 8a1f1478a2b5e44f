/**
 * Definitions from lib/glossary as a list: each term and each symbol with its own anchor (`term-<id>`,
 * `sym-<symbol>`), so labels and worked steps can link to them. No hooks: the customer's page, the lessons
 * and the check screen draw it alike.
 */
import { SYMBOLS, TERM_BY_ID, symbolAnchor, termAnchor, type GlossaryTerm, type TermId } from "@/lib/glossary";
import type { ReactNode } from "react";
import { cn } from "@/components/ui/cn";

export interface GlossaryListProps {
  terms: readonly GlossaryTerm[];
  /** Step symbols to define as well, in the order given. */
  symbols?: readonly string[];
  className?: string;
}

function termName(id: TermId | undefined): string | undefined {
  return id ? TERM_BY_ID[id]?.term : undefined;
}

export function GlossaryList({ terms, symbols = [], className }: GlossaryListProps) {
  // A numbered family (T_1, T_2) is defined once, under its stem (T_n).
  const keys = symbols.map((s) => (SYMBOLS[s] ? s : s.replace(/_\d+$/, "_n")));
  const known = keys.filter((k, i) => keys.indexOf(k) === i && SYMBOLS[k]);
  return (
    <div className={cn("space-y-4", className)}>
      {terms.length ? (
        <dl className="grid gap-x-6 gap-y-2.5 sm:grid-cols-2">
          {terms.map((t) => (
            <div key={t.id} id={termAnchor(t.id)} className="min-w-0 scroll-mt-24 target:rounded target:bg-accent-soft target:px-1">
              <dt className="text-sm font-semibold text-ink">{t.term}</dt>
              <dd className="text-[0.8125rem] leading-snug text-ink-soft">{t.definition}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      {known.length ? (
        <div>
          <h3 className="text-xs font-semibold tracking-wide text-ink-soft uppercase">Symbols in the worked steps</h3>
          <dl className="mt-1.5 grid gap-x-6 gap-y-1.5 sm:grid-cols-2">
            {known.map((symbol) => {
              const entry = SYMBOLS[symbol]!;
              const name = termName(entry.term);
              return (
                <div key={symbol} id={symbolAnchor(symbol)} className="flex min-w-0 scroll-mt-24 gap-2 target:rounded target:bg-accent-soft target:px-1">
                  <dt className="shrink-0 font-mono text-[0.8125rem] text-ink">{symbol}</dt>
                  <dd className="min-w-0 text-[0.8125rem] leading-snug text-ink-soft">
                    {entry.meaning}
                    {name && entry.term ? (
                      <>
                        {" "}
                        (see{" "}
                        <a href={`#${termAnchor(entry.term)}`} className="text-accent-strong underline underline-offset-2">
                          {name}
                        </a>
                        )
                      </>
                    ) : null}
                  </dd>
                </div>
              );
            })}
          </dl>
        </div>
      ) : null}
    </div>
  );
}

/** A step symbol as a link to its definition (plain text when the glossary has none). */
export function SymbolLink({ symbol, children }: { symbol: string; children: ReactNode }) {
  const defined = SYMBOLS[symbol] ?? SYMBOLS[symbol.replace(/_\d+$/, "_n")];
  if (!defined) return <>{children}</>;
  return (
    <a href={`#${symbolAnchor(symbol)}`} title={defined.meaning} className="text-ink underline decoration-dotted underline-offset-2 hover:text-accent-strong">
      {children}
    </a>
  );
}
