/**
 * A step's formula as readable pieces: the core writes formulas in symbols mathjs parses ("TW * (WB + OH) / WB");
 * a lesson shows them as a trainer writes them on a board (TW × (WB + OH) ÷ WB, with subscripts and true minus
 * signs), and once more with the numbers put in. The pieces are plain data, so a Server Component can build them
 * and the page ships no mathjs; components/training/formula-view.tsx draws them.
 */
import { create, parseDependencies, type MathNode } from "mathjs";
import { formatNumber } from "@/lib/format";
import type { Step, StepInput } from "@/lib/towing/types";

// Only the parser: the lesson never evaluates through mathjs, the core has already done the arithmetic.
const math = create({ parseDependencies } as NonNullable<Parameters<typeof create>[0]>);

export type FormulaPart =
  | { kind: "symbol"; base: string; sub?: string }
  | { kind: "number"; text: string; unit?: string }
  | { kind: "operator"; text: string }
  | { kind: "function"; text: string }
  | { kind: "punct"; text: string };

const MINUS = "\u2212";
const OPERATORS: Record<string, string> = { add: "+", subtract: MINUS, multiply: "×", divide: "÷", pow: "^" };
const GREEK: Record<string, string> = { alpha: "α", beta: "β", theta: "θ", pi: "π" };
const FUNCTION_WORDS: Record<string, string> = { min: "min", max: "max", atan: "arctan", tan: "tan", sqrt: "√" };

/** "W_curb" → W with "curb" below; "dF" → ΔF (a change); "alpha" → α. */
export function symbolPart(name: string): FormulaPart {
  if (GREEK[name]) return { kind: "symbol", base: GREEK[name] };
  const change = /^d([A-Z])$/.exec(name);
  if (change) return { kind: "symbol", base: `Δ${change[1]}` };
  const at = name.indexOf("_");
  if (at > 0) {
    const base = name.slice(0, at);
    return { kind: "symbol", base: GREEK[base] ?? base, sub: name.slice(at + 1).replace(/_/g, " ") };
  }
  return { kind: "symbol", base: name };
}

type Values = Map<string, StepInput>;

function walk(node: MathNode, parts: FormulaPart[], values?: Values): void {
  switch (node.type) {
    case "ParenthesisNode":
      parts.push({ kind: "punct", text: "(" });
      walk((node as unknown as { content: MathNode }).content, parts, values);
      parts.push({ kind: "punct", text: ")" });
      return;
    case "SymbolNode": {
      const name = (node as unknown as { name: string }).name;
      const input = values?.get(name);
      if (input) {
        const text = formatNumber(input.value, input.unit, input.unit ? undefined : 3);
        const negative = input.value < 0 && text.startsWith(MINUS);
        if (negative) parts.push({ kind: "punct", text: "(" });
        parts.push({ kind: "number", text, unit: input.unit || undefined });
        if (negative) parts.push({ kind: "punct", text: ")" });
      } else parts.push(symbolPart(name));
      return;
    }
    case "ConstantNode":
      parts.push({ kind: "number", text: formatNumber(Number((node as unknown as { value: unknown }).value), "", 6).replace(/\.?0+$/, "") });
      return;
    case "OperatorNode": {
      const op = node as unknown as { fn: string; args: MathNode[] };
      if (op.fn === "unaryMinus") {
        parts.push({ kind: "operator", text: MINUS });
        walk(op.args[0]!, parts, values);
        return;
      }
      if (op.fn === "unaryPlus") return walk(op.args[0]!, parts, values);
      op.args.forEach((arg, index) => {
        if (index > 0) parts.push({ kind: "operator", text: OPERATORS[op.fn] ?? op.fn });
        walk(arg, parts, values);
      });
      return;
    }
    case "FunctionNode": {
      const fn = node as unknown as { fn: { name: string }; args: MathNode[] };
      if (fn.fn.name === "abs") {
        parts.push({ kind: "punct", text: "|" });
        walk(fn.args[0]!, parts, values);
        parts.push({ kind: "punct", text: "|" });
        return;
      }
      parts.push({ kind: "function", text: FUNCTION_WORDS[fn.fn.name] ?? fn.fn.name });
      parts.push({ kind: "punct", text: "(" });
      fn.args.forEach((arg, index) => {
        if (index > 0) parts.push({ kind: "punct", text: ", " });
        walk(arg, parts, values);
      });
      parts.push({ kind: "punct", text: ")" });
      return;
    }
    default:
      parts.push({ kind: "punct", text: node.toString() });
  }
}

/** The formula in readable pieces; a formula mathjs cannot parse is shown as written. */
export function formulaParts(formula: string): FormulaPart[] {
  try {
    const parts: FormulaPart[] = [];
    walk(math.parse(formula), parts);
    return parts;
  } catch {
    return [{ kind: "punct", text: formula }];
  }
}

/** The same formula with each symbol replaced by the step's figure for it (units kept, negatives bracketed). */
export function substitutedParts(step: Pick<Step, "formula" | "inputs">): FormulaPart[] {
  const values: Values = new Map(step.inputs.map((input) => [input.symbol, input]));
  try {
    const parts: FormulaPart[] = [];
    walk(math.parse(step.formula), parts, values);
    return parts;
  } catch {
    return [{ kind: "punct", text: step.formula }];
  }
}

/** Plain text of the pieces, for screen readers' summaries, tests and mail. */
export function partsText(parts: FormulaPart[]): string {
  return parts
    .map((part) => {
      if (part.kind === "symbol") return part.sub ? `${part.base}_${part.sub}` : part.base;
      if (part.kind === "number") return part.unit ? `${part.text} ${part.unit}` : part.text;
      if (part.kind === "operator") return ` ${part.text} `;
      return part.text;
    })
    .join("")
    .replace(/\( /g, "(")
    .replace(/ \)/g, ")");
}
