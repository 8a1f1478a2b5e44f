"use client";

/**
 * Small pieces the workbench's cards are built from: a figure field, a choice field, a card that folds to
 * one line, and the "More measurements" folds, one per topic. Each field subscribes to its own error only, so
 * typing in one field re-renders that field and the verdict, not the whole form; a fold re-renders only when
 * its own counts change.
 */
import { createContext, useCallback, useContext, useId, useLayoutEffect, useState, useSyncExternalStore, type ReactNode } from "react";
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

// ---------------------------------------------------------------- the figures the verdict waits for

/**
 * The fields the verdict's still-to-measure list names (lib/still-to-measure.ts), published by the live verdict
 * and read by the folds, so a fold can say how many of its figures are awaited. A tiny store rather than React
 * state, so a new verdict re-renders only the folds whose count changes.
 */
export interface AwaitedFigures {
  get: () => ReadonlySet<string>;
  set: (fields: readonly string[]) => void;
  subscribe: (listener: () => void) => () => void;
}

const NONE: ReadonlySet<string> = new Set();

export function createAwaitedFigures(): AwaitedFigures {
  let current: ReadonlySet<string> = NONE;
  let key = "";
  const listeners = new Set<() => void>();
  return {
    get: () => current,
    set: (fields) => {
      const next = [...fields].sort().join("|");
      if (next === key) return;
      key = next;
      current = new Set(fields);
      for (const listener of listeners) listener();
    },
    subscribe: (listener) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}

const AwaitedContext = createContext<AwaitedFigures | null>(null);
export const AwaitedFiguresProvider = AwaitedContext.Provider;

export function useAwaitedStore(): AwaitedFigures | null {
  return useContext(AwaitedContext);
}

const noSubscribe = () => () => {};
const noFigures = () => NONE;

/** The fields the verdict is waiting for (none outside a workbench). */
export function useAwaitedFigures(): ReadonlySet<string> {
  const store = useContext(AwaitedContext);
  return useSyncExternalStore(store?.subscribe ?? noSubscribe, store?.get ?? noFigures, store?.get ?? noFigures);
}

// ---------------------------------------------------------------- folds know their fields

/** A fold collects the names of the fields drawn inside it, so whoever adds a field there adds it to the counts. */
const FoldContext = createContext<((name: string) => () => void) | null>(null);

function useInFold(name: string) {
  const add = useContext(FoldContext);
  useLayoutEffect(() => (add ? add(name) : undefined), [add, name]);
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
  useInFold(name);
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
  useInFold(name);
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
  useInFold(name);
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

/**
 * A grid of fields sized by the card it sits in (a container query on the card's body): one column on a phone,
 * two in a card of ordinary width, three in a wide desktop card.
 */
export function FieldGrid({ children, className }: { children: ReactNode; className?: string }) {
  return <div className={cn("grid grid-cols-1 gap-x-4 gap-y-4 @md:grid-cols-2 @[40rem]:grid-cols-3", className)}>{children}</div>;
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

/** Whether a held value counts as entered (a blank, an unreadable figure or "not given" does not). */
function isEntered(value: unknown): boolean {
  if (value === undefined || value === null || value === "") return false;
  if (typeof value === "number") return Number.isFinite(value);
  return typeof value !== "object";
}

function Pill({ tone, children }: { tone: "error" | "awaited" | "entered"; children: ReactNode }) {
  return (
    <span
      className={cn(
        "num inline-flex items-center rounded-full border px-2 py-0.5 text-xs font-medium whitespace-nowrap",
        tone === "error" && "border-over/50 bg-over-soft text-ink",
        tone === "awaited" && "border-unknown/50 bg-unknown-soft text-ink",
        tone === "entered" && "border-rule bg-sunken text-ink-soft",
      )}
    >
      {children}
    </span>
  );
}

/**
 * The less common fields of a card, under one "More measurements" heading; each topic is a MoreSection. A new
 * topic is one more MoreSection here.
 */
export function MoreMeasurements({ children }: { children: ReactNode }) {
  const id = useId();
  return (
    <div role="group" aria-labelledby={id} className="space-y-2 border-t border-rule pt-4 first:border-t-0 first:pt-0">
      <h3 id={id} className="text-xs font-semibold tracking-wide text-ink-soft uppercase">
        More measurements
      </h3>
      {children}
    </div>
  );
}

/**
 * One topic's fields, folded (a native disclosure named by what it holds). Its summary counts the figures
 * entered inside, the figures the verdict still waits for (its "Still to measure" list), and the errors; a
 * field with an error opens it.
 */
export function MoreSection({ title, note, children }: { title: string; note?: ReactNode; children: ReactNode }) {
  const { control, watch, getValues } = useFormContext<RigFormValues>();
  const [names, setNames] = useState<string[]>([]);
  const add = useCallback((name: string) => {
    setNames((known) => (known.includes(name) ? known : [...known, name]));
    return () => setNames((known) => known.filter((n) => n !== name));
  }, []);

  // Entered figures, counted on each change of the form's values; re-renders only when the count changes.
  const subscribe = useCallback(
    (changed: () => void) => {
      const subscription = watch(() => changed());
      return () => subscription.unsubscribe();
    },
    [watch],
  );
  const countEntered = () => names.filter((n) => isEntered(get(getValues(), n))).length;
  const entered = useSyncExternalStore(subscribe, countEntered, () => 0);

  const { errors } = useFormState({ control, name: names as RigPath[] });
  const errorCount = names.filter((n) => get(errors, n)).length;
  const awaitedFields = useAwaitedFigures();
  const awaited = names.filter((n) => awaitedFields.has(n) && !get(errors, n)).length;

  const [open, setOpen] = useState(false);
  // A field with an error opens its fold (once, when the error appears; it may be closed again).
  const hasError = errorCount > 0;
  const [hadError, setHadError] = useState(false);
  if (hasError !== hadError) {
    setHadError(hasError);
    if (hasError) setOpen(true);
  }

  const words = useWords();
  const total = names.length;
  return (
    <details
      open={open}
      onToggle={(e) => setOpen(e.currentTarget.open)}
      data-testid="more-section"
      data-title={title}
      className="group rounded-md border border-dashed border-rule bg-paper/60 [&[open]]:border-solid [&[open]]:bg-transparent"
    >
      <summary className="flex min-h-11 cursor-pointer list-none flex-wrap items-center gap-x-2 gap-y-1 px-3 py-1.5 text-sm select-none [&::-webkit-details-marker]:hidden">
        <ChevronRight aria-hidden="true" className="size-4 shrink-0 text-accent-strong transition-transform group-open:rotate-90 motion-reduce:transition-none" />
        <span className="mr-auto font-medium text-accent-strong">{words(title)}</span>
        {errorCount ? <Pill tone="error">{errorCount === 1 ? "1 to fix" : `${errorCount} to fix`}</Pill> : null}
        {awaited ? <Pill tone="awaited">{awaited === 1 ? "needs 1 figure" : `needs ${awaited} figures`}</Pill> : null}
        {total ? <Pill tone="entered">{entered ? `${entered} of ${total} entered` : `${total} ${total === 1 ? "figure" : "figures"}`}</Pill> : null}
      </summary>
      <FoldContext.Provider value={add}>
        <div className="space-y-4 px-3 pt-1 pb-4">
          {note ? <p className="text-[0.8125rem] leading-snug text-ink-soft">{note}</p> : null}
          {children}
        </div>
      </FoldContext.Provider>
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
    <Card as="section" aria-labelledby={titleId} id={id} className="scroll-mt-32 lg:scroll-mt-16">
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
      <div id={bodyId} hidden={collapsed} className="@container space-y-5 px-4 py-4 sm:px-5">
        {tools ? <div className="flex flex-wrap items-end gap-3">{tools}</div> : null}
        {children}
      </div>
    </Card>
  );
}
