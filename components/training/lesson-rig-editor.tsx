"use client";
/**
 * The lesson's rig, edited with the check screen's own cards (vehicle, hitch, what is hitched) instead of
 * JSON. Every change writes the rig, as the evaluate format's JSON, into the lesson form's `rig` field, which
 * the server parses and checks again.
 */
import { useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import { FormProvider, useForm, useWatch, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button, Field, Textarea, cn } from "@/components/ui";
import { RigCard, UnitsProvider } from "@/components/check/field-parts";
import { AccessoryFields, HitchedChoice, HitchedSummary, HitchFields, HitchSummary, TrailerFields, VehicleFields, VehicleSummary, WdSummary, WeightDistributionFields } from "@/components/check/rig-cards";
import { convertFormValues, formValuesFromRig, toRigCandidate, type CardId, type HitchedKind, type RigFormValues } from "@/components/check/rig-form";
import { parseRig, type RigInput, type UnitSystem } from "@/lib/towing";
import { rigInputSchema } from "@/lib/validation/rig";

export interface LessonRigEditorProps {
  /** The rig as JSON text (the lesson's stored form). */
  initialJson: string;
  /** Called with the rig as JSON text after every change. */
  onChange: (json: string) => void;
}

function rigFromJson(text: string): RigInput | undefined {
  try {
    const parsed = parseRig(JSON.parse(text));
    return parsed.ok ? parsed.rig : undefined;
  } catch {
    return undefined;
  }
}

export function LessonRigEditor({ initialJson, onChange }: LessonRigEditorProps) {
  const initialRig = useMemo(() => rigFromJson(initialJson), [initialJson]);
  const [units, setUnits] = useState<UnitSystem>(initialRig?.units ?? "imperial");
  const [kind, setKind] = useState<HitchedKind>(initialRig?.accessory && !initialRig.trailer ? "accessory" : "trailer");
  const [collapsed, setCollapsed] = useState<Record<CardId, boolean>>({ vehicle: false, hitch: true, hitched: true, wd: true });
  const [pasted, setPasted] = useState("");
  const [pasteError, setPasteError] = useState<string>();
  const kindRef = useRef(kind);
  useLayoutEffect(() => {
    kindRef.current = kind;
  }, [kind]);

  // The same schema as the check screen, on the rig as it will be built (the chosen hitched item only).
  const resolver = useMemo<Resolver<RigFormValues, unknown, RigInput>>(() => {
    const zod = zodResolver(rigInputSchema) as unknown as Resolver<RigFormValues, unknown, RigInput>;
    return (values, context, options) => zod(toRigCandidate(values, kindRef.current) as RigFormValues, context, options);
  }, []);
  const form = useForm<RigFormValues, unknown, RigInput>({
    resolver,
    defaultValues: formValuesFromRig(initialRig, initialRig?.units ?? "imperial") as never,
    mode: "onChange",
  });
  const values = useWatch({ control: form.control }) as RigFormValues;
  const json = useMemo(() => JSON.stringify(toRigCandidate(values, kind)), [values, kind]);
  useEffect(() => onChange(json), [json, onChange]);

  const toggle = (card: CardId) => setCollapsed((c) => ({ ...c, [card]: !c[card] }));
  const switchUnits = (to: UnitSystem) => {
    if (to === units) return;
    form.reset(convertFormValues(form.getValues(), to) as never);
    setUnits(to);
  };
  const usePasted = () => {
    const rig = rigFromJson(pasted);
    if (!rig) {
      setPasteError("That is not a rig in the evaluate format (docs/evaluate.md): check the JSON and the figures.");
      return;
    }
    setPasteError(undefined);
    setUnits(rig.units);
    setKind(rig.accessory && !rig.trailer ? "accessory" : "trailer");
    form.reset(formValuesFromRig(rig, rig.units) as never);
    setPasted("");
  };

  return (
    <UnitsProvider value={units}>
      <FormProvider {...form}>
        <div role="group" aria-label="The lesson's rig" className="space-y-4">
          <fieldset className="flex flex-wrap items-center gap-3">
            <legend className="sr-only">Units of the rig</legend>
            {(["imperial", "metric"] as const).map((value) => (
              <label
                key={value}
                className={cn(
                  "num inline-flex min-h-10 cursor-pointer items-center rounded-md border px-3 text-sm font-medium has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-accent",
                  units === value ? "border-accent bg-accent-soft text-ink" : "border-rule text-ink-soft hover:text-ink",
                )}
              >
                <input type="radio" name="lesson-rig-units" value={value} checked={units === value} onChange={() => switchUnits(value)} className="sr-only" />
                {value === "imperial" ? "Imperial (lb, in)" : "Metric (kg, mm)"}
              </label>
            ))}
          </fieldset>
          <RigCard id="lesson-vehicle" title="Vehicle" summary={<VehicleSummary />} collapsed={collapsed.vehicle} onToggle={() => toggle("vehicle")}>
            <VehicleFields />
          </RigCard>
          <RigCard id="lesson-hitch" title="Hitch" summary={<HitchSummary />} collapsed={collapsed.hitch} onToggle={() => toggle("hitch")}>
            <HitchFields kind={kind} />
          </RigCard>
          <RigCard id="lesson-hitched" title="What is hitched" summary={<HitchedSummary kind={kind} />} collapsed={collapsed.hitched} onToggle={() => toggle("hitched")}>
            <HitchedChoice kind={kind} onChange={setKind} />
            {kind === "trailer" ? <TrailerFields /> : <AccessoryFields />}
          </RigCard>
          {kind === "trailer" ? (
            <RigCard id="lesson-wd" title="Weight distribution" summary={<WdSummary />} collapsed={collapsed.wd} onToggle={() => toggle("wd")}>
              <WeightDistributionFields />
            </RigCard>
          ) : null}
          <details className="rounded-md border border-dashed border-rule px-4 py-3 text-sm">
            <summary className="cursor-pointer font-medium text-accent-strong">The rig as JSON (to copy, or to paste one in)</summary>
            <pre className="mt-3 max-h-64 overflow-auto rounded bg-sunken p-3 font-mono text-[0.8125rem] whitespace-pre-wrap text-ink" data-testid="lesson-rig-json">
              {JSON.stringify(JSON.parse(json), null, 2)}
            </pre>
            <Field label="Paste a rig as JSON" help="In the evaluate format (docs/evaluate.md); it replaces the figures above." error={pasteError} className="mt-3">
              <Textarea rows={5} className="font-mono text-[0.8125rem]" spellCheck={false} value={pasted} onChange={(e) => setPasted(e.target.value)} />
            </Field>
            <Button variant="secondary" size="sm" className="mt-2" onClick={usePasted} disabled={!pasted.trim()}>
              Use the pasted rig
            </Button>
          </details>
        </div>
      </FormProvider>
    </UnitsProvider>
  );
}
