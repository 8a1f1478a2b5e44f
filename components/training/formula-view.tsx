/**
 * Draws a formula's readable pieces (lib/training/formula.ts): symbols in italic with their subscripts, figures
 * upright with their unit in a lighter tone, operators spaced. No hooks: a Server Component and the practice
 * screen draw it alike, and neither ships mathjs.
 */
import { cn } from "@/components/ui";
import type { FormulaPart } from "@/lib/training/formula";

export function FormulaPiece({ part }: { part: FormulaPart }) {
  switch (part.kind) {
    case "symbol":
      return (
        <span className="italic">
          {part.base}
          {part.sub ? <sub className="text-[0.75em] not-italic">{part.sub}</sub> : null}
        </span>
      );
    case "number":
      return (
        <span className="num not-italic">
          {part.text}
          {part.unit ? <span className="text-ink-soft">{`\u00a0${part.unit}`}</span> : null}
        </span>
      );
    case "operator":
      return <span className="mx-1">{part.text}</span>;
    case "function":
      return <span className="not-italic">{part.text}</span>;
    default:
      return <span>{part.text}</span>;
  }
}

export function FormulaView({ parts, result, className }: { parts: FormulaPart[]; result?: FormulaPart; className?: string }) {
  return (
    <span className={cn("font-mono text-[0.875rem] leading-relaxed text-ink", className)}>
      {result ? (
        <>
          <FormulaPiece part={result} />
          <span className="mx-1">=</span>
        </>
      ) : null}
      {parts.map((part, index) => (
        <FormulaPiece key={index} part={part} />
      ))}
    </span>
  );
}
