"use client";

/**
 * Small pieces the workbench's cards are built from: a figure field, a choice field, a card that folds to
 * one line, and the "More measurements" disclosure. Each field subscribes to its own error only, so typing in
 * one field re-renders that field and the verdict, not the whole form.
 */
import { createContext, useContext, useId, type ReactNode } from "react";
import { get, useFormContext, useFormState, type Path } from "react-hook-form";
import { ChevronDown, ChevronRight, Pencil } from "lucide-react";
import { Card, Field, NumberInput, Select, cn } from "@/components/ui";
import type { UnitString, UnitSystem } from "@/lib/towing";
import { localise } from "@/lib/towing/rules/glossary";
import type { GlossaryId } from "@/lib/towing/rules/types";
import { optionalChoice, parseTyped, type RigFormValues } from "./rig-form";

export type RigPath = Path<RigFormValues>;

export type QuantityKind = "mass" | "length" | "angle" | "percent" | "force";

const UnitsContext = createContext<UnitSystem>("imperial");
export const UnitsProvider = UnitsContext.Provider;

/** The place's glossary: labels and help read in its words (lib/towing/rules/glossary.ts). */
const WordsContext = createContext<GlossaryId>("us");
export const WordsProvider = WordsContext.Provider;

/** A label or help text in the place's words. */
export function useGlossary(): GlossaryId {
  return useContext(WordsContext);
}

export function useWords(): (text: string) => string {
  const glossary = useContext(WordsContext);
  return (text: string) => localise(text, glossary);
}

export function useUnits(): UnitSystem {
  return useContext(UnitsContext);
}

const spoken: Record<string, string> = { lb: "pounds", kg: "kilograms", in: "inches", mm: "millimetres", "°": "degrees", "%": "percent", kN: "kilonewtons" };

export function unitFor(kind: QuantityKind, units: UnitSystem): UnitString {
  if (kind === "mass") return units === "metric" ? "kg" : "lb";
  if (kind === "length") return units === "metric" ? "mm" : "in";
  if (kind === "force") return "kN";
  return kind === "angle" ? "°" : "%";
}

function useFieldError(name: RigPath): string | undefined {
  const { control } = useFormContext<RigFormValues>();
  const { errors } = useFormState({ control, name });
  const error = get(errors, name) as { message?: unknown } | undefined;
  return typeof error?.message === "string" ? error.message : undefined;
}

export interface NumFieldProps {
  name: RigPath;
  label: string;
  kind: QuantityKind;
  help?: ReactNode;
  className?: string;
  placeholder?: string;
}

/** A figure with its unit; "" means not given. */
export function NumField({ name, label, kind, help, className, placeholder }: NumFieldProps) {
  const { register } = useFormContext<RigFormValues>();
  const units = useUnits();
  const error = useFieldError(name);
  const unit = unitFor(kind, units);
  const words = useWords();
  return (
    <Field label={words(label)} help={typeof help === "string" ? words(help) : help} error={error} className={className}>
      <NumberInput unit={unit} unitLabel={spoken[unit]} placeholder={placeholder} {...register(name, { setValueAs: parseTyped })} />
    </Field>
  );
}

export interface ChoiceFieldProps {
  name: RigPath;
  label: string;
  help?: ReactNode;
  options: ReadonlyArray<{ value: string; label: string }>;
  /** Label of the empty choice; leave out when a value is required. */
  emptyLabel?: string;
  /** Store numbers (hitch class) rather than strings. */
  numeric?: boolean;
  className?: string;
}

export function ChoiceField({ name, label, help, options, emptyLabel, numeric, className }: ChoiceFieldProps) {
  const { register } = useFormContext<RigFormValues>();
  const error = useFieldError(name);
  const words = useWords();
  return (
    <Field label={words(label)} help={typeof help === "string" ? words(help) : help} error={error} className={className}>
      <Select {...register(name, { setValueAs: numeric ? (v: unknown) => parseTyped(v) : optionalChoice })}>
        {emptyLabel !== undefined ? <option value="">{emptyLabel}</option> : null}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {words(o.label)}
          </option>
        ))}
      </Select>
    </Field>
  );
}

/** "Not given", "Yes" or "No": a true/false figure that may be unknown (a breakaway device fitted?). */
export function YesNoField({ name, label, help, className }: { name: RigPath; label: string; help?: string; className?: string }) {
  const { register } = useFormContext<RigFormValues>();
  const error = useFieldError(name);
  const words = useWords();
  return (
    <Field label={words(label)} help={help ? words(help) : undefined} error={error} className={className}>
      <Select {...register(name, { setValueAs: (v: unknown) => (v === "yes" || v === true ? true : v === "no" || v === false ? false : undefined) })}>
        <option value="">Not given</option>
        <option value="yes">Yes</option>
        <option value="no">No</option>
      </Select>
    </Field>
  );
}

/** A row of fields that wraps to one column on a phone. */
export function FieldGrid({ children, className }: { children: ReactNode; className?: string }) {
  return <div className={cn("grid grid-cols-1 gap-x-4 gap-y-4 sm:grid-cols-2", className)}>{children}</div>;
}

/** A titled group inside a card. */
export function FieldGroup({ title, children, note }: { title: string; children: ReactNode; note?: ReactNode }) {
  const id = useId();
  return (
    <fieldset aria-labelledby={id} className="min-w-0 border-t border-rule pt-4 first:border-t-0 first:pt-0">
      <legend className="sr-only">{title}</legend>
      <h3 id={id} aria-hidden="true" className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">
        {title}
      </h3>
      {note ? <p className="mb-3 text-[0.8125rem] leading-snug text-ink-soft">{note}</p> : <div className="mb-3" />}
      {children}
    </fieldset>
  );
}

/** The less common fields, folded away so the common case stays short. */
export function MoreMeasurements({ children, label = "More measurements" }: { children: ReactNode; label?: string }) {
  return (
    <details className="group rounded-md border border-dashed border-rule bg-paper/60 [&[open]]:bg-transparent">
      <summary className="flex min-h-11 cursor-pointer list-none items-center gap-2 px-3 text-sm font-medium text-accent-strong select-none [&::-webkit-details-marker]:hidden">
        <ChevronRight aria-hidden="true" className="size-4 transition-transform group-open:rotate-90 motion-reduce:transition-none" />
        {label}
      </summary>
      <div className="space-y-4 px-3 pt-1 pb-4">{children}</div>
    </details>
  );
}

export interface RigCardProps {
  id: string;
  title: string;
  /** What the card says in one line when folded (rendered only then). */
  summary: ReactNode;
  collapsed: boolean;
  onToggle: () => void;
  /** Controls drawn beside the title (a profile picker, a save button). */
  tools?: ReactNode;
  children: ReactNode;
}

/** One input card; folds to its summary line once filled, and opens again with one press. */
export function RigCard({ id, title, summary, collapsed, onToggle, tools, children }: RigCardProps) {
  const titleId = `${id}-title`;
  const bodyId = `${id}-body`;
  return (
    <Card as="section" aria-labelledby={titleId} id={id} className="scroll-mt-24">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-2 border-b border-rule px-4 py-3 sm:px-5">
        <h2 id={titleId} className="min-w-0 flex-1 text-base leading-6 font-semibold text-ink">
          {title}
        </h2>
        <button
          type="button"
          onClick={onToggle}
          aria-expanded={!collapsed}
          aria-controls={bodyId}
          className="inline-flex min-h-10 items-center gap-1.5 rounded-md px-2 text-sm font-medium text-accent-strong hover:bg-accent-soft"
        >
          {collapsed ? <Pencil aria-hidden="true" className="size-4" /> : <ChevronDown aria-hidden="true" className="size-4 rotate-180" />}
          {collapsed ? "Edit" : "Fold"}
          <span className="sr-only"> {title.toLowerCase()}</span>
        </button>
      </div>
      {collapsed ? (
        <button
          type="button"
          onClick={onToggle}
          className="num block w-full px-4 py-3 text-left text-sm leading-snug text-ink-soft hover:bg-sunken sm:px-5"
        >
          {summary}
          <span className="sr-only"> (edit {title.toLowerCase()})</span>
        </button>
      ) : null}
      <div id={bodyId} hidden={collapsed} className="space-y-5 px-4 py-4 sm:px-5">
        {tools ? <div className="flex flex-wrap items-end gap-3">{tools}</div> : null}
        {children}
      </div>
    </Card>
  );
}
