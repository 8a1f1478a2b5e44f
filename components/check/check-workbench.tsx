"use client";

/**
 * The check screen ("the workbench"): the rig's inputs on the left in three cards, the verdict on the right,
 * recomputed in the browser on every keystroke that leaves the inputs valid. The core runs synchronously on
 * the parsed values; the last good verdict stays up, marked as waiting, while a field is invalid.
 */
import { useCallback, useDeferredValue, useMemo, useLayoutEffect, useRef, useState, type FormEvent } from "react";
import Link from "next/link";
import { FormProvider, useForm, useWatch, type Control, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { ChevronDown, CircleAlert, Save, UserRound } from "lucide-react";
import { Button, Card, CardBody, CardHeader, Dialog, Field, FormMessage, Select, TextInput, Textarea, VerdictBadge, cn, levelWords } from "@/components/ui";
import { evaluateRig, type RigInput, type RigResult, type UnitSystem, type AccessoryFitResult } from "@/lib/towing";
import { rigInputSchema } from "@/lib/validation/rig";
import { RigCard, UnitsProvider, WordsProvider } from "./field-parts";
import { PlacePicker, type PlaceChoice } from "./place-picker";
import { AppliedRules, localRulesOf } from "@/components/rules/applied-rules";
import { ruleSetFor } from "@/lib/towing/rules/places";
import type { Place } from "@/lib/towing/rules/types";
import {
  AccessoryFields,
  HitchedChoice,
  HitchedSummary,
  HitchFields,
  HitchSummary,
  ProfilePicker,
  TrailerFields,
  VehicleFields,
  VehicleSummary,
} from "./rig-cards";
import {
  cardOf,
  convertFormValues,
  emptyFormValues,
  formValuesFromRig,
  replaceGroups,
  rigPartForForm,
  toRigCandidate,
  type CardId,
  type HitchedKind,
  type RigFormValues,
} from "./rig-form";
import { GlossaryDisclosure } from "@/components/glossary/glossary-disclosure";
import { GlossaryList } from "@/components/glossary/glossary-list";
import { SYMBOLS, TERMS } from "@/lib/glossary";
import { SAMPLE_RIGS } from "./sample-rigs";
import { SideView } from "./side-view";
import { VerdictPanel } from "./verdict-panel";

type ActionResult = { ok: boolean; message?: string; fieldErrors?: Record<string, string[]> };

export interface CheckWorkbenchProps {
  /** Starting rig (already valid per rigInputSchema); default: an empty rig in `units` with a trailer of type "travel". */
  initialRig?: RigInput;
  /** The organisation's setting (or the visitor's choice when signed out). */
  units: "imperial" | "metric";
  /** Organisation's setting, default 0.1. */
  tightMarginRatio?: number;
  /** Saved profiles to pick from (may be empty/undefined when signed out). */
  profiles?: {
    vehicles: Array<{ id: string; name: string; rig: Pick<RigInput, "units" | "vehicle" | "hitch" | "load"> }>;
    trailers: Array<{ id: string; name: string; rig: Pick<RigInput, "units" | "trailer" | "ballMount" | "weightDistribution"> }>;
    accessories: Array<{ id: string; name: string; rig: Pick<RigInput, "units" | "accessory" | "extender"> }>;
  };
  /** When given, a "Save check" area appears (customer name optional, note optional). Called with the parsed rig. */
  onSave?: (input: { rig: RigInput; customerName?: string; note?: string; place?: Place | null }) => Promise<ActionResult & { checkId?: string }>;
  /** Where the organisation works: the check is read against its rules unless staff choose another place. */
  place?: Place;
  /** When given, a "Save vehicle as profile" button appears on the vehicle card (asks for a name in a Dialog). */
  onSaveVehicleProfile?: (input: { name: string; rig: Pick<RigInput, "units" | "vehicle" | "hitch" | "load"> }) => Promise<ActionResult>;
  /** Shown when signed out: a line saying nothing is saved and a link to sign in. */
  signedOut?: boolean;
}

type Parsed = { ok: true; rig: RigInput } | { ok: false; issues: Array<{ path: string; message: string }> };

function parseCandidate(values: RigFormValues, kind: HitchedKind): Parsed {
  const parsed = rigInputSchema.safeParse(toRigCandidate(values, kind));
  if (parsed.success) return { ok: true, rig: parsed.data };
  const seen = new Set<string>();
  const issues: Array<{ path: string; message: string }> = [];
  for (const issue of parsed.error.issues) {
    const path = issue.path.map(String).join(".");
    if (seen.has(path)) continue;
    seen.add(path);
    issues.push({ path, message: issue.message });
  }
  return { ok: false, issues };
}

// ---------------------------------------------------------------- the live verdict

interface LiveProps {
  control: Control<RigFormValues, unknown, RigInput>;
  kind: HitchedKind;
  tightMarginRatio?: number;
  place: PlaceChoice;
  onJump: (path: string) => void;
}

/**
 * Subscribes to every value, parses and evaluates; the only part of the screen that re-renders on each
 * keystroke besides the field itself. Renders straight into the page grid: the phone's bar, the verdict
 * column and the side view are siblings there.
 */
/** The verdict sentence without its leading level word ("Over: …"), where a badge beside it already says it. */
function withoutLevelWord(message: string): string {
  const cut = message.match(/^(?:Adjust the set-up before towing|[A-Z][a-z]+(?: [a-z]+)?): (.*)$/s);
  if (!cut) return message;
  const rest = cut[1]!;
  return rest.charAt(0).toUpperCase() + rest.slice(1);
}

function LiveVerdict({ control, kind, tightMarginRatio, place, onJump }: LiveProps) {
  const values = useWatch({ control }) as RigFormValues;
  const parsed = useMemo(() => parseCandidate(values, kind), [values, kind]);
  const evaluated = useMemo(
    () => (parsed.ok ? { rig: parsed.rig, result: evaluateRig(parsed.rig, { tightMarginRatio, place: place ?? undefined }) } : null),
    [parsed, tightMarginRatio, place],
  );
  // While a figure is half-typed, the last rig that parsed stays on screen (kept as state, set while rendering).
  const [lastGood, setLastGood] = useState<{ rig: RigInput; result: RigResult } | null>(null);
  if (evaluated && evaluated !== lastGood) setLastGood(evaluated);
  const shown = evaluated ?? lastGood;
  const [open, setOpen] = useState(false);
  // The drawing follows a moment after the verdict (a deferred render), so typing never waits for it.
  const deferredValues = useDeferredValue(values);
  const sideRig = useMemo(() => toRigCandidate(deferredValues, kind) as RigInput, [deferredValues, kind]);
  if (!shown) return null;
  const { result, rig } = shown;
  const level = result.verdict.level;
  const waiting = !parsed.ok ? parsed.issues : null;
  const accessoryAngle = (result.checks.find((c) => c.id === "accessory-fit") as AccessoryFitResult | undefined)?.accessoryAngle?.value;

  const waitingNote = waiting ? (
    <div role="alert" className="rounded-md border border-over/45 bg-over-soft px-3 py-2.5 text-sm text-ink">
      <p className="flex items-start gap-2 font-semibold">
        <CircleAlert aria-hidden="true" className="mt-px size-4 shrink-0 text-over" />
        Waiting for valid input: the verdict below is the last one that had valid figures.
      </p>
      <ul className="mt-1.5 space-y-1 pl-6">
        {waiting.map((issue) => (
          <li key={issue.path}>
            <button type="button" onClick={() => onJump(issue.path)} className="text-left text-accent-strong underline underline-offset-2 hover:text-ink">
              {issue.message}
            </button>
          </li>
        ))}
      </ul>
    </div>
  ) : null;

  return (
    <>
      {/* Phone: a compact bar on top that opens to the full list. */}
      <div className="sticky top-0 z-20 order-first rounded-card border border-rule bg-panel/95 px-3 py-2 shadow-card backdrop-blur lg:hidden">
        <button
          type="button"
          onClick={() => setOpen((o) => !o)}
          aria-expanded={open}
          aria-controls="workbench-verdict"
          className="flex w-full items-center gap-3 text-left"
        >
          <VerdictBadge status={level} label={waiting ? `${levelWords[level]} (waiting)` : levelWords[level]} />
          <span className="min-w-0 flex-1 truncate text-sm text-ink">{withoutLevelWord(result.verdict.message)}</span>
          <span className="inline-flex shrink-0 items-center gap-1 text-sm font-medium text-accent-strong">
            {open ? "Hide" : "Checks"}
            <ChevronDown aria-hidden="true" className={cn("size-4 transition-transform motion-reduce:transition-none", open && "rotate-180")} />
          </span>
        </button>
      </div>

      {/* Phone: the full list opens as a sheet under the bar, wherever the form is scrolled to. Desktop: the
          column stretches over every row so its panel stays in view (sticky) while the form scrolls. */}
      <aside
        id="workbench-verdict"
        aria-label="Verdict"
        className={cn(
          "order-first min-w-0 lg:static lg:order-none lg:col-start-2 lg:row-span-4 lg:row-start-1 lg:block lg:max-h-none lg:self-stretch lg:overflow-visible lg:p-0",
          open ? "fixed inset-x-2 top-16 bottom-2 z-30 block overflow-y-auto overscroll-contain rounded-card" : "hidden",
        )}
      >
        <div className="space-y-3 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)] lg:overflow-y-auto lg:pr-1">
          <Card className={cn("px-4 py-4 sm:px-5", waiting && "opacity-95")}>
            {waitingNote ? <div className="mb-4">{waitingNote}</div> : null}
            <div className={cn(waiting && "opacity-60 transition-opacity")}>
              <VerdictPanel result={result} rig={rig} />
            </div>
          </Card>
          {localRulesOf(result) ? (
            <Card className="px-4 py-4 sm:px-5">
              <AppliedRules rules={localRulesOf(result)!} />
            </Card>
          ) : null}
        </div>
      </aside>

      <Card as="section" aria-labelledby="workbench-side-title" className="min-w-0 lg:col-start-1">
        <CardHeader titleId="workbench-side-title" title="Side view" description="Heights and distances from the figures entered, to scale." />
        <CardBody>
          <SideView rig={sideRig} kind={kind} accessoryAngle={accessoryAngle} />
        </CardBody>
      </Card>
    </>
  );
}

// ---------------------------------------------------------------- save areas

function SaveCheck({ onSave, getRig }: { onSave: NonNullable<CheckWorkbenchProps["onSave"]>; getRig: () => RigInput | null; }) {
  const [customerName, setCustomerName] = useState("");
  const [note, setNote] = useState("");
  const [pending, setPending] = useState(false);
  const [state, setState] = useState<(ActionResult & { checkId?: string }) | null>(null);

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const rig = getRig();
    if (!rig) {
      setState({ ok: false, message: "Some figures are not valid yet: fix the fields marked in red, then save." });
      return;
    }
    setPending(true);
    try {
      const answer = await onSave({ rig, customerName: customerName.trim() || undefined, note: note.trim() || undefined });
      setState(answer);
    } catch {
      setState({ ok: false, message: "The check could not be saved. Try again in a moment." });
    } finally {
      setPending(false);
    }
  };
  const errorOf = (key: string) => state?.fieldErrors?.[key]?.[0];

  return (
    <Card as="section" aria-labelledby="workbench-save-title" className="min-w-0 lg:col-start-1">
      <CardHeader titleId="workbench-save-title" title="Save check" description="Keeps the figures and the verdict, for the customer's page and for later." />
      <CardBody>
        <form onSubmit={submit} noValidate className="space-y-4">
          <div className="grid gap-4 sm:grid-cols-2">
            <Field label="Customer name (optional)" error={errorOf("customerName")}>
              <TextInput value={customerName} onChange={(e) => setCustomerName(e.target.value)} autoComplete="off" maxLength={200} />
            </Field>
            <Field label="Note (optional)" error={errorOf("note")} className="sm:col-span-2">
              <Textarea value={note} onChange={(e) => setNote(e.target.value)} rows={2} maxLength={2000} />
            </Field>
          </div>
          <FormMessage tone={state?.ok ? "success" : "error"}>
            {state?.ok ? (
              <>
                Check saved.{" "}
                {state.checkId ? (
                  <Link href={`/checks/${state.checkId}`} className="font-semibold text-accent-strong underline">
                    Open the saved check
                  </Link>
                ) : null}
              </>
            ) : state?.message ? (
              state.message
            ) : state && state.fieldErrors ? (
              "Some figures need a look before this can be saved."
            ) : null}
          </FormMessage>
          <Button type="submit" loading={pending} icon={<Save />}>
            Save check
          </Button>
        </form>
      </CardBody>
    </Card>
  );
}

function SaveVehicleProfile({ onSave, getPart }: { onSave: NonNullable<CheckWorkbenchProps["onSaveVehicleProfile"]>; getPart: () => Pick<RigInput, "units" | "vehicle" | "hitch" | "load"> | null; }) {
  const [open, setOpen] = useState(false);
  const [name, setName] = useState("");
  const [pending, setPending] = useState(false);
  const [state, setState] = useState<ActionResult | null>(null);
  const [saved, setSaved] = useState<string | null>(null);

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!name.trim()) {
      setState({ ok: false, fieldErrors: { name: ["Give the profile a name."] } });
      return;
    }
    const part = getPart();
    if (!part) {
      setState({ ok: false, message: "Some vehicle or hitch figures are not valid yet." });
      return;
    }
    setPending(true);
    try {
      const answer = await onSave({ name: name.trim(), rig: part });
      setState(answer);
      if (answer.ok) {
        setSaved(name.trim());
        setOpen(false);
        setName("");
      }
    } catch {
      setState({ ok: false, message: "The profile could not be saved. Try again in a moment." });
    } finally {
      setPending(false);
    }
  };

  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button variant="secondary" size="sm" icon={<UserRound />} onClick={() => { setState(null); setOpen(true); }}>
        Save vehicle as profile
      </Button>
      {saved ? <p role="status" className="text-sm text-within">Saved as “{saved}”.</p> : null}
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title="Save vehicle as profile"
        description="The vehicle's ratings, lengths and load, with the hitch, to pick again next time."
        closeOnBackdrop={false}
      >
        <form onSubmit={submit} noValidate className="space-y-4">
          <Field label="Profile name" error={state?.fieldErrors?.name?.[0]} required>
            <TextInput value={name} onChange={(e) => setName(e.target.value)} autoFocus maxLength={120} />
          </Field>
          <FormMessage>{state && !state.ok ? state.message : null}</FormMessage>
          <div className="flex flex-wrap justify-end gap-2">
            <Button variant="secondary" onClick={() => setOpen(false)}>
              Cancel
            </Button>
            <Button type="submit" loading={pending}>
              Save profile
            </Button>
          </div>
        </form>
      </Dialog>
    </div>
  );
}

// ---------------------------------------------------------------- the workbench

export function CheckWorkbench({ initialRig, units: startUnits, tightMarginRatio, profiles, onSave, onSaveVehicleProfile, signedOut, place: home }: CheckWorkbenchProps) {
  const [units, setUnits] = useState<UnitSystem>(startUnits);
  const [place, setPlace] = useState<PlaceChoice>(home ?? null);
  const glossary = (place && ruleSetFor(place)?.glossary) || "us";
  const [kind, setKind] = useState<HitchedKind>(initialRig?.accessory && !initialRig.trailer ? "accessory" : "trailer");
  const [collapsed, setCollapsed] = useState<Record<CardId, boolean>>({ vehicle: false, hitch: false, hitched: false });
  const [filledFrom, setFilledFrom] = useState<string | null>(null);
  const kindRef = useRef(kind);
  useLayoutEffect(() => {
    kindRef.current = kind;
  }, [kind]);

  // The shared schema checks the values as the rig will be built from them (only the chosen hitched item,
  // blank groups left out), so a field's message matches what the verdict sees.
  const resolver = useMemo<Resolver<RigFormValues, unknown, RigInput>>(() => {
    const zod = zodResolver(rigInputSchema) as unknown as Resolver<RigFormValues, unknown, RigInput>;
    return (values, context, options) => zod(toRigCandidate(values, kindRef.current) as RigFormValues, context, options);
  }, []);

  const defaultValues = useMemo(() => formValuesFromRig(initialRig, startUnits), [initialRig, startUnits]);
  const form = useForm<RigFormValues, unknown, RigInput>({
    resolver,
    defaultValues: defaultValues as never,
    mode: "onChange",
    reValidateMode: "onChange",
  });
  const { control, getValues, reset, setError, setFocus } = form;

  const currentRig = useCallback((): RigInput | null => {
    const parsed = parseCandidate(getValues(), kindRef.current);
    return parsed.ok ? parsed.rig : null;
  }, [getValues]);

  const toggle = (card: CardId) => setCollapsed((c) => ({ ...c, [card]: !c[card] }));

  const jump = useCallback(
    (path: string) => {
      setCollapsed((c) => ({ ...c, [cardOf(path)]: false }));
      requestAnimationFrame(() => {
        const el = document.querySelector<HTMLElement>(`[name="${CSS.escape(path)}"]`);
        const details = el?.closest("details");
        if (details && !details.open) details.open = true;
        try {
          setFocus(path as never);
        } catch {
          el?.focus();
        }
        el?.scrollIntoView({ block: "center" });
      });
    },
    [setFocus],
  );

  const switchUnits = (to: UnitSystem) => {
    if (to === units) return;
    reset(convertFormValues(getValues(), to) as never);
    setUnits(to);
  };

  const loadExample = (id: string) => {
    if (id === "empty") {
      reset(emptyFormValues(units) as never);
      setKind("trailer");
      setFilledFrom(null);
      return;
    }
    const sample = SAMPLE_RIGS.find((s) => s.id === id);
    if (!sample) return;
    setKind(sample.rig.accessory && !sample.rig.trailer ? "accessory" : "trailer");
    reset(formValuesFromRig(sample.rig, units) as never);
    setCollapsed({ vehicle: false, hitch: false, hitched: false });
    setFilledFrom(`Example loaded: ${sample.label}. Invented figures, for practice only.`);
  };

  const fill = (part: Pick<RigInput, "units"> & Partial<RigInput>, groups: readonly string[], name: string) => {
    const converted = rigPartForForm(part, units);
    reset(replaceGroups(getValues(), converted, groups) as never);
    setFilledFrom(`Filled from the saved profile “${name}”${part.units !== units ? `, converted to ${units === "metric" ? "kg and mm" : "lb and in"}` : ""}.`);
  };

  const pickVehicle = (id: string) => {
    const p = profiles?.vehicles.find((v) => v.id === id);
    if (p) fill(p.rig, ["vehicle", "hitch", "load"], p.name);
  };
  const pickTrailer = (id: string) => {
    const p = profiles?.trailers.find((v) => v.id === id);
    if (!p) return;
    setKind("trailer");
    fill(p.rig, ["trailer", "ballMount", "weightDistribution"], p.name);
  };
  const pickAccessory = (id: string) => {
    const p = profiles?.accessories.find((v) => v.id === id);
    if (!p) return;
    setKind("accessory");
    fill(p.rig, ["accessory", "extender"], p.name);
  };

  const saveWithErrors = useCallback(
    async (input: Parameters<NonNullable<CheckWorkbenchProps["onSave"]>>[0]) => {
      const answer = await onSave!({ ...input, place });
      for (const [path, messages] of Object.entries(answer.fieldErrors ?? {})) {
        if (messages[0] && path !== "customerName" && path !== "note") setError(path as never, { type: "server", message: messages[0] });
      }
      return answer;
    },
    [onSave, setError, place],
  );

  const vehiclePart = useCallback(() => {
    const rig = currentRig();
    return rig ? { units: rig.units, vehicle: rig.vehicle, hitch: rig.hitch, load: rig.load } : null;
  }, [currentRig]);

  const unitOptions: Array<[UnitSystem, string]> = [
    ["imperial", "lb · in"],
    ["metric", "kg · mm"],
  ];

  return (
    <UnitsProvider value={units}>
      <WordsProvider value={glossary}>
      <FormProvider {...form}>
        <div className="space-y-4">
          {/* Tools: units, examples, and the signed-out notice. */}
          <div className="flex flex-wrap items-end gap-x-5 gap-y-3">
            <fieldset className="min-w-0">
              <legend className="mb-1.5 text-sm font-medium text-ink">Units</legend>
              <div className="inline-grid grid-cols-2 rounded-md border border-rule bg-sunken p-1">
                {unitOptions.map(([value, label]) => (
                  <label
                    key={value}
                    className={cn(
                      "num flex min-h-10 cursor-pointer items-center justify-center rounded px-3 text-sm font-medium has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-accent",
                      units === value ? "bg-panel text-ink shadow-card" : "text-ink-soft hover:text-ink",
                    )}
                  >
                    <input type="radio" name="workbench-units" value={value} checked={units === value} onChange={() => switchUnits(value)} className="sr-only" />
                    <span className="sr-only">{value === "imperial" ? "Imperial, " : "Metric, "}</span>
                    {label}
                  </label>
                ))}
              </div>
            </fieldset>
            <PlacePicker value={place} home={home} onChange={setPlace} />
            <Field label="Try an example" className="w-full sm:w-80">
              <Select
                value=""
                onChange={(e) => {
                  if (e.target.value) loadExample(e.target.value);
                }}
              >
                <option value="">Choose an example rig…</option>
                {SAMPLE_RIGS.map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.label}
                  </option>
                ))}
                <option value="empty">Clear every field</option>
              </Select>
            </Field>
          </div>
          {signedOut ? (
            <p className="text-sm text-ink-soft">
              Nothing is saved while you are signed out: the check runs in this browser only.{" "}
              <Link href="/sign-in" className="font-medium text-accent-strong underline">
                Sign in
              </Link>{" "}
              to keep checks and profiles.
            </p>
          ) : null}
          {filledFrom ? (
            <p role="status" className="text-sm text-ink-soft">
              {filledFrom}
            </p>
          ) : null}

          <div className="grid grid-cols-1 items-start gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,26rem)] lg:gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,30rem)]">
            {/* A group, not a <form>: the figures are never submitted (the verdict follows each keystroke), and
                the "save vehicle as profile" dialog inside holds a form of its own, which may not nest in a form. */}
            <div role="form" aria-label="Rig figures" className="min-w-0 space-y-4 lg:col-start-1">
              <RigCard id="workbench-vehicle" title="Vehicle" summary={<VehicleSummary />} collapsed={collapsed.vehicle} onToggle={() => toggle("vehicle")}>
                <VehicleFields
                  tools={
                    profiles?.vehicles.length || onSaveVehicleProfile ? (
                      <div className="flex flex-wrap items-end gap-3">
                        <ProfilePicker label="Saved vehicle" options={profiles?.vehicles ?? []} onPick={pickVehicle} />
                        {onSaveVehicleProfile ? <SaveVehicleProfile onSave={onSaveVehicleProfile} getPart={vehiclePart} /> : null}
                      </div>
                    ) : null
                  }
                />
              </RigCard>
              <RigCard id="workbench-hitch" title="Hitch" summary={<HitchSummary />} collapsed={collapsed.hitch} onToggle={() => toggle("hitch")}>
                <HitchFields kind={kind} />
              </RigCard>
              <RigCard id="workbench-hitched" title="What is hitched" summary={<HitchedSummary kind={kind} />} collapsed={collapsed.hitched} onToggle={() => toggle("hitched")}>
                <HitchedChoice kind={kind} onChange={setKind} />
                {kind === "trailer" ? (
                  <TrailerFields tools={<ProfilePicker label="Saved trailer" options={profiles?.trailers ?? []} onPick={pickTrailer} />} />
                ) : (
                  <AccessoryFields tools={<ProfilePicker label="Saved rack or carrier" options={profiles?.accessories ?? []} onPick={pickAccessory} />} />
                )}
              </RigCard>
            </div>

            <LiveVerdict control={control} kind={kind} tightMarginRatio={tightMarginRatio} place={place} onJump={jump} />

            {onSave ? <SaveCheck onSave={saveWithErrors} getRig={currentRig} /> : null}
          </div>
          <GlossaryDisclosure title="Words and symbols used here">
            <GlossaryList terms={TERMS} symbols={Object.keys(SYMBOLS)} />
          </GlossaryDisclosure>
        </div>
      </FormProvider>
      </WordsProvider>
    </UnitsProvider>
  );
}
