"use client";

/**
 * The check screen ("the workbench"): the units, place and example pickers on top, the rig's inputs on the left
 * in cards (rig-cards.tsx: the vehicle, the hitch, what is hitched, and weight distribution for a trailer on a
 * ball mount) under a small sticky list of links to them, the live verdict on the right (live-verdict.tsx), and
 * the save areas (save-check.tsx, save-vehicle-profile.tsx). Holds the form, the units, the place and what is
 * hitched. Each card leads with the figures that decide most rigs; the rest sit in folds named by topic.
 */
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import Link from "next/link";
import { FormProvider, useForm, type Resolver } from "react-hook-form";
import { Field, Select, cn } from "@/components/ui";
import type { RigInput, UnitSystem } from "@/lib/towing";
import { AwaitedFiguresProvider, createAwaitedFigures, RigCard, UnitsProvider, WordsProvider } from "./field-parts";
import { PlacePicker, type PlaceChoice } from "./place-picker";
import { glossaryFor } from "@/lib/towing/rules/place-list";
import type { Place } from "@/lib/towing/rules/types";
import {
  AccessoryFields,
  HitchedChoice,
  HitchedSummary,
  HitchFields,
  HitchSummary,
  ProfilePicker,
  TrailerFields,
  useBedHitch,
  VehicleFields,
  VehicleSummary,
  WdSummary,
  WeightDistributionFields,
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
import { LiveVerdict } from "./live-verdict-lazy";
import { loadedParser, loadParser } from "./parser-loader";
import { SaveCheck, type SaveCheckHandler, type SaveCheckInput } from "./save-check";
import { SaveVehicleProfile, type SaveVehicleProfileHandler } from "./save-vehicle-profile";

export interface CheckWorkbenchProps {
  /** Starting rig (already valid per rigInputSchema); default: an empty rig in `units` with a trailer of type "travel". */
  initialRig?: RigInput;
  /** The organisation's setting (or the visitor's choice when signed out). */
  units: "imperial" | "metric";
  /** Organisation's setting, default 0.1. */
  tightMarginRatio?: number;
  /** Organisation's front-axle loss limit, default 0.1 (common practice, no published source). */
  frontAxleLossLimit?: number;
  /** Saved profiles to pick from (may be empty/undefined when signed out). */
  profiles?: {
    vehicles: Array<{ id: string; name: string; rig: Pick<RigInput, "units" | "vehicle" | "hitch" | "load"> }>;
    trailers: Array<{ id: string; name: string; rig: Pick<RigInput, "units" | "trailer" | "ballMount" | "weightDistribution"> }>;
    accessories: Array<{ id: string; name: string; rig: Pick<RigInput, "units" | "accessory" | "extender"> }>;
  };
  /** When given, a "Save check" area appears (customer name optional, note optional). Called with the parsed rig. */
  onSave?: SaveCheckHandler;
  /** Where the organisation works: the check is read against its rules unless staff choose another place. */
  place?: Place;
  /** When given, a "Save vehicle as profile" button appears on the vehicle card (asks for a name in a Dialog). */
  onSaveVehicleProfile?: SaveVehicleProfileHandler;
  /** Shown when signed out: a line saying nothing is saved and a link to sign in. */
  signedOut?: boolean;
  /** The saved profiles `initialRig` was built from (a pairing opened from the fleet): their pickers name them. */
  initialProfileIds?: ProfileIds;
}

/** Which saved profile each picker last filled its card from. */
export interface ProfileIds {
  vehicle?: string;
  trailer?: string;
  accessory?: string;
}

/** The weight-distribution card: for a trailer on a ball mount only (a bed hitch has none). */
function WdCard({ collapsed, onToggle }: { collapsed: boolean; onToggle: () => void }) {
  const bed = useBedHitch();
  if (bed) return null;
  return (
    <RigCard id="workbench-wd" title="Weight distribution" summary={<WdSummary />} collapsed={collapsed} onToggle={onToggle}>
      <WeightDistributionFields />
    </RigCard>
  );
}

/**
 * A small list of links to the cards, sticky while the form scrolls: under the verdict bar on a phone, at the
 * top of the form's column on a desktop.
 */
function CardNav({ kind, save }: { kind: HitchedKind; save: boolean }) {
  const bed = useBedHitch() && kind === "trailer";
  const links: Array<[string, string]> = [
    ["workbench-vehicle", "Vehicle"],
    ["workbench-hitch", "Hitch"],
    ["workbench-hitched", kind === "trailer" ? "Trailer" : "Rack or carrier"],
  ];
  if (kind === "trailer" && !bed) links.push(["workbench-wd", "Weight distribution"]);
  if (save) links.push(["workbench-save", "Save"]);
  return (
    <nav aria-label="Parts of the rig" className="sticky top-[2.75rem] z-10 min-w-0 rounded-md border border-rule bg-panel/95 px-1 py-1 shadow-card backdrop-blur lg:top-2 lg:col-start-1">
      <ul className="flex gap-1 overflow-x-auto">
        {links.map(([id, label]) => (
          <li key={id} className="shrink-0">
            <a
              href={`#${id}`}
              onClick={(e) => {
                const target = document.getElementById(id);
                if (!target) return;
                e.preventDefault();
                target.scrollIntoView({ block: "start" });
                const heading = target.querySelector<HTMLElement>("h2");
                if (heading) {
                  heading.tabIndex = -1;
                  heading.focus({ preventScroll: true });
                }
              }}
              className="inline-flex min-h-9 items-center rounded px-2.5 text-sm font-medium whitespace-nowrap text-accent-strong hover:bg-accent-soft"
            >
              {label}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}

export function CheckWorkbench({ initialRig, units: startUnits, tightMarginRatio, frontAxleLossLimit, profiles, onSave, onSaveVehicleProfile, signedOut, place: home, initialProfileIds }: CheckWorkbenchProps) {
  const [units, setUnits] = useState<UnitSystem>(startUnits);
  const [place, setPlace] = useState<PlaceChoice>(home ?? null);
  const glossary = glossaryFor(place);
  const [kind, setKind] = useState<HitchedKind>(initialRig?.accessory && !initialRig.trailer ? "accessory" : "trailer");
  const [collapsed, setCollapsed] = useState<Record<CardId, boolean>>({ vehicle: false, hitch: false, hitched: false, wd: false });
  const awaited = useMemo(() => createAwaitedFigures(), []);
  const [filledFrom, setFilledFrom] = useState<string | null>(null);
  const [picked, setPicked] = useState<ProfileIds>(initialProfileIds ?? {});
  const kindRef = useRef(kind);
  useLayoutEffect(() => {
    kindRef.current = kind;
  }, [kind]);

  // The shared schema checks the values as the rig will be built from them (only the chosen hitched item,
  // blank groups left out), so a field's message matches what the verdict sees.
  // The schema arrives as its own chunk just after the page (parser-loader.ts): the first check waits for it.
  const resolver = useMemo<Resolver<RigFormValues, unknown, RigInput>>(
    () => async (values, context, options) => (await loadParser()).resolveCandidate(toRigCandidate(values, kindRef.current) as RigFormValues, context, options),
    [],
  );
  useEffect(() => {
    void loadParser();
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
    const parsed = loadedParser()?.parseCandidate(getValues(), kindRef.current);
    return parsed?.ok ? parsed.rig : null;
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
      setPicked({});
      return;
    }
    const sample = SAMPLE_RIGS.find((s) => s.id === id);
    if (!sample) return;
    setPicked({});
    setKind(sample.rig.accessory && !sample.rig.trailer ? "accessory" : "trailer");
    reset(formValuesFromRig(sample.rig, units) as never);
    setCollapsed({ vehicle: false, hitch: false, hitched: false, wd: false });
    setFilledFrom(`Example loaded: ${sample.label}. Invented figures, for practice only.`);
  };

  const fill = (part: Pick<RigInput, "units"> & Partial<RigInput>, groups: readonly string[], name: string) => {
    const converted = rigPartForForm(part, units);
    reset(replaceGroups(getValues(), converted, groups) as never);
    setFilledFrom(`Filled from the saved profile “${name}”${part.units !== units ? `, converted to ${units === "metric" ? "kg and mm" : "lb and in"}` : ""}.`);
  };

  const pickVehicle = (id: string) => {
    const p = profiles?.vehicles.find((v) => v.id === id);
    if (!p) return;
    fill(p.rig, ["vehicle", "hitch", "load"], p.name);
    setPicked((current) => ({ ...current, vehicle: id }));
  };
  const pickTrailer = (id: string) => {
    const p = profiles?.trailers.find((v) => v.id === id);
    if (!p) return;
    setKind("trailer");
    fill(p.rig, ["trailer", "ballMount", "weightDistribution"], p.name);
    setPicked((current) => ({ ...current, trailer: id }));
  };
  const pickAccessory = (id: string) => {
    const p = profiles?.accessories.find((v) => v.id === id);
    if (!p) return;
    setKind("accessory");
    fill(p.rig, ["accessory", "extender"], p.name);
    setPicked((current) => ({ ...current, accessory: id }));
  };

  const saveWithErrors = useCallback(
    async (input: SaveCheckInput) => {
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
      <AwaitedFiguresProvider value={awaited}>
      <FormProvider {...form}>
        {/* data-wide-page lets the page's frame widen on a large screen (components/shell/app-shell.tsx). */}
        <div className="space-y-4" data-wide-page>
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
            <CardNav kind={kind} save={!!onSave} />
            <div role="form" aria-label="Rig figures" className="min-w-0 space-y-4 lg:col-start-1">
              <RigCard id="workbench-vehicle" title="Vehicle" summary={<VehicleSummary />} collapsed={collapsed.vehicle} onToggle={() => toggle("vehicle")}>
                <VehicleFields
                  tools={
                    profiles?.vehicles.length || onSaveVehicleProfile ? (
                      <div className="flex flex-wrap items-end gap-3">
                        <ProfilePicker label="Saved vehicle" options={profiles?.vehicles ?? []} onPick={pickVehicle} selectedId={picked.vehicle} />
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
                  <TrailerFields tools={<ProfilePicker label="Saved trailer" options={profiles?.trailers ?? []} onPick={pickTrailer} selectedId={picked.trailer} />} />
                ) : (
                  <AccessoryFields tools={<ProfilePicker label="Saved rack or carrier" options={profiles?.accessories ?? []} onPick={pickAccessory} selectedId={picked.accessory} />} />
                )}
              </RigCard>
              {kind === "trailer" ? (
                <WdCard collapsed={collapsed.wd} onToggle={() => toggle("wd")} />
              ) : null}
            </div>

            <LiveVerdict control={control} kind={kind} tightMarginRatio={tightMarginRatio} frontAxleLossLimit={frontAxleLossLimit} place={place} onJump={jump} />

            {onSave ? <SaveCheck onSave={saveWithErrors} getRig={currentRig} /> : null}
          </div>
          <GlossaryDisclosure title="Words and symbols used here">
            <GlossaryList terms={TERMS} symbols={Object.keys(SYMBOLS)} />
          </GlossaryDisclosure>
        </div>
      </FormProvider>
      </AwaitedFiguresProvider>
      </WordsProvider>
    </UnitsProvider>
  );
}
