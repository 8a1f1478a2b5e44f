/**
 * A field's help: where the figure is found, then the term's definition from lib/glossary behind a short
 * "What is …?" that opens in place (native disclosure, no script).
 */
import type { ReactNode } from "react";
import { TERM_BY_ID, type TermId } from "@/lib/glossary";

/** "What is GVWR?", "What is weight-carrying?": the term without its expansion, a word lower-cased. */
function defaultQuestion(term: string): string {
  const name = term.replace(/ \(.*\)$/, "");
  return `What is ${/^[A-Z]{2,}/.test(name) ? name : name.charAt(0).toLowerCase() + name.slice(1)}?`;
}

export function TermHelp({ term, question, children }: { term: TermId; question?: string; children?: ReactNode }) {
  const entry = TERM_BY_ID[term];
  return (
    <>
      {children ? <span>{children} </span> : null}
      <details className="group inline">
        <summary className="inline cursor-pointer text-accent-strong underline decoration-dotted underline-offset-2 select-none">
          {question ?? defaultQuestion(entry.term)}
        </summary>
        <span className="mt-0.5 block text-ink-soft">{entry.definition}</span>
      </details>
    </>
  );
}
