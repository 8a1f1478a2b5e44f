/**
 * One worked step as a lesson shows it: the method in words, the formula, the figures that go in, the formula
 * with the numbers put in, and the result. Figures format through lib/format (via formatStepValue).
 */
import { StepFiguresTable, formatStepValue } from "@/components/check/worked-steps";
import type { PreparedStep } from "@/lib/training/prepare";
import { SymbolLink } from "@/components/glossary/glossary-list";
import { FormulaView } from "./formula-view";

export function StepInputs({ step }: { step: PreparedStep }) {
  if (!step.inputs.length) return null;
  return (
    <StepFiguresTable
      inputs={step.inputs}
      caption={`Figures for ${step.title.toLowerCase()}`}
      renderSymbol={(symbol) => (
        <SymbolLink symbol={symbol}>
          <FormulaView parts={[{ kind: "symbol", ...splitSymbol(step, symbol) }]} />
        </SymbolLink>
      )}
    />
  );
}

/** The symbol's readable form, taken from the formula's own pieces so both read the same. */
function splitSymbol(step: PreparedStep, symbol: string): { base: string; sub?: string } {
  const at = symbol.indexOf("_");
  const found = step.formulaParts.find((part) => part.kind === "symbol" && (part.sub ? `${part.base}_${part.sub}` === symbol : part.base === symbol));
  if (found && found.kind === "symbol") return { base: found.base, sub: found.sub };
  return at > 0 ? { base: symbol.slice(0, at), sub: symbol.slice(at + 1) } : { base: symbol.replace(/^d([A-Z])$/, "Δ$1") };
}

export function StepFormula({ step }: { step: PreparedStep }) {
  return (
    <div className="space-y-1 rounded-md bg-sunken px-3 py-2">
      <p className="overflow-x-auto">
        <span className="sr-only">Formula: </span>
        <FormulaView parts={step.formulaParts} result={step.resultPart} />
      </p>
      <p className="overflow-x-auto" data-testid="step-substituted">
        <span className="sr-only">With the numbers: </span>
        <FormulaView parts={step.substitutedParts} result={step.resultPart} />
      </p>
    </div>
  );
}

export function StepResult({ step }: { step: PreparedStep }) {
  return (
    <p className="text-sm text-ink">
      Result:{" "}
      <SymbolLink symbol={step.result.symbol}>
        <FormulaView parts={[step.resultPart]} />
      </SymbolLink>{" "}
      ={" "}
      <strong className="num font-semibold" data-testid="step-result">
        {formatStepValue(step.result.value, step.result.unit)}
      </strong>
    </p>
  );
}

export function StepDetail({ step, index }: { step: PreparedStep; index: number }) {
  return (
    <div className="space-y-2">
      <h3 className="text-sm font-semibold text-ink">
        <span className="num mr-1.5 text-ink-faint">{index + 1}.</span>
        {step.title}
      </h3>
      <p className="text-[0.8125rem] leading-snug text-ink-soft">{step.formulaWords}</p>
      <StepFormula step={step} />
      <StepInputs step={step} />
      <StepResult step={step} />
      {step.note ? <p className="text-[0.8125rem] leading-snug text-ink-soft">{step.note}</p> : null}
    </div>
  );
}
