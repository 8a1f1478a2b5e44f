/**
 * The worked steps of a check, as a trainer would write them on a board: what is computed, in words and as a
 * formula, from which figures, with what result. Numbers are formatted through lib/format only.
 */
import type { ReactNode } from "react";
import { TBody, TD, TH, THead, TR } from "@/components/ui";
import { formatNumber, formatQuantity } from "@/lib/format";
import type { Step, StepInput, UnitString } from "@/lib/towing";
import { SymbolLink } from "@/components/glossary/glossary-list";

/** A step figure: with its unit when it has one; a bare factor or share keeps three decimals. */
export function formatStepValue(value: number, unit: UnitString): string {
  return unit ? formatQuantity({ value, unit }) : formatNumber(value, "", 3);
}

export function WorkedSteps({ steps }: { steps: Step[] }) {
  if (steps.length === 0) return <p className="text-sm text-ink-soft">No steps yet: the figures this check needs are not all in.</p>;
  return (
    <ol className="space-y-4">
      {steps.map((step, index) => (
        <li key={step.id} className="min-w-0">
          <h4 className="text-sm font-semibold text-ink">
            <span className="num mr-1.5 text-ink-faint">{index + 1}.</span>
            {step.title}
          </h4>
          <p className="mt-0.5 text-[0.8125rem] leading-snug text-ink-soft">{step.formulaWords}</p>
          <p className="mt-1.5 overflow-x-auto rounded bg-sunken px-2 py-1.5 font-mono text-[0.8125rem] text-ink">
            <code>
              {step.result.symbol} = {step.formula}
            </code>
          </p>
          {step.inputs.length ? (
            <div className="mt-2">
              <StepFiguresTable
                inputs={step.inputs}
                renderSymbol={(symbol) => (
                  <SymbolLink symbol={symbol}>
                    <span className="font-mono">{symbol}</span>
                  </SymbolLink>
                )}
              />
            </div>
          ) : null}
          <p className="mt-1.5 text-sm text-ink">
            Result:{" "}
            <SymbolLink symbol={step.result.symbol}>
              <span className="font-mono">{step.result.symbol}</span>
            </SymbolLink>{" "}
            ={" "}
            <strong className="num font-semibold">{formatStepValue(step.result.value, step.result.unit)}</strong>
          </p>
          {step.note ? <p className="mt-1 text-[0.8125rem] leading-snug text-ink-soft">{step.note}</p> : null}
        </li>
      ))}
    </ol>
  );
}

/** The figures that go into a step: symbol, what it is, and its value with the unit. Shared with lessons. */
export function StepFiguresTable({ inputs, renderSymbol, caption }: { inputs: StepInput[]; renderSymbol: (symbol: string) => ReactNode; caption?: string }) {
  return (
    <div className="overflow-x-auto rounded-md border border-rule">
      <table className="w-full border-collapse text-left text-[0.8125rem]">
        {caption ? <caption className="sr-only">{caption}</caption> : null}
        <THead>
          <TR>
            <TH className="px-2 py-1.5">Symbol</TH>
            <TH className="px-2 py-1.5">Figure</TH>
            <TH numeric className="px-2 py-1.5">
              Value
            </TH>
          </TR>
        </THead>
        <TBody>
          {inputs.map((input) => (
            <TR key={input.symbol + input.label}>
              <TD className="px-2 py-1.5">{renderSymbol(input.symbol)}</TD>
              <TD className="px-2 py-1.5 text-ink-soft">{input.label}</TD>
              <TD numeric className="px-2 py-1.5">
                {formatStepValue(input.value, input.unit)}
              </TD>
            </TR>
          ))}
        </TBody>
      </table>
    </div>
  );
}
