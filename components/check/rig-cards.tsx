"use client";

/**
 * The three input cards of the workbench: the vehicle, the hitch, and what is hitched. Each field says where
 * its number is found and how to measure it; the uncommon ones sit under "More measurements".
 */
import { useId, type ReactNode } from "react";
import { useFormContext, useWatch } from "react-hook-form";
import { Field, Select, cn } from "@/components/ui";
import { formatQuantity } from "@/lib/format";
import { ACCESSORY_TYPES, BALL_SIZES, BRAKE_TYPES, RECEIVER_SIZES, TRAILER_TYPES, type AccessoryType, type HitchType, type TrailerType } from "@/lib/towing/choices";
import { TermHelp } from "@/components/glossary/term-help";
import { ChoiceField, FieldGrid, FieldGroup, MoreMeasurements, MoreSection, NumField, unitFor, useGlossary, useUnits, YesNoField } from "./field-parts";
import { HitchHardwareFields, TrailerPlateFields, VehicleTyreFields } from "./hardware-fields";
import type { GlossaryId } from "@/lib/towing/rules/types";
import type { HitchedKind, RigFormValues } from "./rig-form";

export const TRAILER_TYPE_LABELS: Record<TrailerType, string> = {
  utility: "Utility (open)",
  "enclosed-cargo": "Enclosed cargo",
  travel: "Travel camper",
  boat: "Boat",
  "car-hauler": "Car hauler",
  "horse-livestock": "Horse or livestock",
  other: "Other",
};

export const ACCESSORY_TYPE_LABELS: Record<AccessoryType, string> = {
  "platform-rack": "Platform bike rack",
  "hanging-rack": "Hanging bike rack",
  "cargo-carrier": "Cargo carrier",
  other: "Other",
};

/** How the trailer hitches; not given is a ball mount in the receiver. */
export const HITCH_TYPE_LABELS: Record<Exclude<HitchType, "receiver">, string> = {
  "fifth-wheel": "Fifth wheel in the bed (kingpin)",
  gooseneck: "Gooseneck in the bed (ball)",
};

/** True when the form's trailer rides on a fifth wheel or gooseneck in the bed. */
export function useBedHitch(): boolean {
  const { control } = useFormContext<RigFormValues>();
  const type = useWatch({ control, name: "trailer.hitchType" });
  return type === "fifth-wheel" || type === "gooseneck";
}

const BRAKE_LABELS: Record<(typeof BRAKE_TYPES)[number], string> = { none: "None", surge: "Surge", electric: "Electric", other: "Other" };

const inches = (size: string) => ({ value: size, label: `${size} in` });

// ---------------------------------------------------------------- summaries

function joinParts(parts: Array<string | false | undefined>): string {
  const given = parts.filter(Boolean) as string[];
  return given.length ? given.join(" · ") : "Nothing entered yet";
}

function useQuantities() {
  const units = useUnits();
  return {
    w: (v: number | undefined) => (typeof v === "number" && Number.isFinite(v) ? formatQuantity({ value: v, unit: unitFor("mass", units) }) : undefined),
    l: (v: number | undefined) => (typeof v === "number" && Number.isFinite(v) ? formatQuantity({ value: v, unit: unitFor("length", units) }) : undefined),
  };
}

export function VehicleSummary() {
  const { control } = useFormContext<RigFormValues>();
  const [vehicle, load] = useWatch({ control, name: ["vehicle", "load"] });
  const { w, l } = useQuantities();
  const tow = w(vehicle?.towRating);
  const tongue = w(vehicle?.tongueWeightLimit);
  const gvwr = w(vehicle?.gvwr);
  const wb = l(vehicle?.wheelbase);
  const aboard = [load?.occupants, load?.cargo].filter((n): n is number => typeof n === "number" && Number.isFinite(n));
  return (
    <>
      {joinParts([
        tow && `Tows ${tow}`,
        tongue && `tongue ${tongue}`,
        gvwr && `GVWR ${gvwr}`,
        wb && `wheelbase ${wb}`,
        aboard.length > 0 && `aboard ${w(aboard.reduce((a, b) => a + b, 0))}`,
      ])}
    </>
  );
}

export function HitchSummary() {
  const { control } = useFormContext<RigFormValues>();
  const [hitch, mount, extender] = useWatch({ control, name: ["hitch", "ballMount", "extender"] });
  const { w, l } = useQuantities();
  return (
    <>
      {joinParts([
        hitch?.class !== undefined && Number.isFinite(hitch.class) && `Class ${hitch.class}`,
        hitch?.receiverSize && `${hitch.receiverSize} in receiver`,
        w(hitch?.gtwRating) && `rated ${w(hitch?.gtwRating)} / ${w(hitch?.twRating) ?? "—"}`,
        l(hitch?.receiverHeight) && `${l(hitch?.receiverHeight)} high`,
        mount?.drop !== undefined && Number.isFinite(mount.drop) && `${mount.drop >= 0 ? "drop" : "rise"} ${l(Math.abs(mount.drop))}`,
        l(extender?.length) && `extender ${l(extender?.length)}`,
      ])}
    </>
  );
}

export function HitchedSummary({ kind }: { kind: HitchedKind }) {
  const { control } = useFormContext<RigFormValues>();
  const [trailer, accessory, wd] = useWatch({ control, name: ["trailer", "accessory", "weightDistribution"] });
  const { w } = useQuantities();
  if (kind === "accessory")
    return (
      <>
        {joinParts([
          ACCESSORY_TYPE_LABELS[(accessory?.type ?? "platform-rack") as AccessoryType],
          w(accessory?.weight),
          w(accessory?.loadWeight) && `load ${w(accessory?.loadWeight)}`,
        ])}
      </>
    );
  return (
    <>
      {joinParts([
        `${TRAILER_TYPE_LABELS[(trailer?.type ?? "travel") as TrailerType]} trailer`,
        w(trailer?.grossTrailerWeight),
        w(trailer?.tongueWeight) && `tongue ${w(trailer?.tongueWeight)}${trailer?.tongueWeightBasis ? ` (${trailer.tongueWeightBasis})` : ""}`,
        wd?.used && "weight distribution on",
      ])}
    </>
  );
}

export function WdSummary() {
  const { control } = useFormContext<RigFormValues>();
  const [wd, vehicle, hitch] = useWatch({ control, name: ["weightDistribution", "vehicle", "hitch"] });
  const { w } = useQuantities();
  return (
    <>
      {joinParts([
        wd?.used ? "Used" : "Not used",
        w(vehicle?.towRatingWd) && `tows ${w(vehicle?.towRatingWd)} with it`,
        w(hitch?.gtwRatingWd) && `hitch ${w(hitch?.gtwRatingWd)} / ${w(hitch?.twRatingWd) ?? "—"}`,
        w(wd?.tongueRating) && `bars ${w(wd?.tongueRating)}`,
      ])}
    </>
  );
}

// ---------------------------------------------------------------- diagrams

/** Where the hitch's two measurements are taken; a sketch, not to scale. */
function HitchDiagram() {
  return (
    <figure className="rounded-md border border-rule bg-paper/70 p-2 sm:max-w-xs">
      <svg viewBox="0 0 240 120" className="block w-full" role="img" aria-label="Receiver height runs from the ground to the top inside edge of the receiver opening. Pin to fascia runs from the centre of the pin hole forward to the outermost point of the bumper.">
        <defs>
          <marker id="hitch-diagram-arrow" viewBox="0 0 10 10" refX="5" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
            <path d="M 0 1 L 9 5 L 0 9 z" fill="var(--color-ink)" />
          </marker>
        </defs>
        <line x1="0" y1="108" x2="240" y2="108" stroke="var(--color-ink-soft)" strokeWidth="1.5" />
        <path d="M 8 30 L 92 30 Q 104 30 104 44 L 104 62 L 60 62" fill="none" stroke="var(--color-ink-soft)" strokeWidth="1.5" />
        <rect x="60" y="62" width="110" height="16" fill="var(--color-panel)" stroke="var(--color-ink)" strokeWidth="1.5" />
        <circle cx="150" cy="70" r="3.5" fill="var(--color-ink)" />
        <line x1="150" y1="44" x2="150" y2="60" stroke="var(--color-ink-faint)" strokeDasharray="2 2" />
        <line x1="104" y1="50" x2="150" y2="50" stroke="var(--color-ink)" markerStart="url(#hitch-diagram-arrow)" markerEnd="url(#hitch-diagram-arrow)" />
        <text x="127" y="44" textAnchor="middle" fontSize="10" fill="var(--color-ink)">pin to fascia</text>
        <line x1="188" y1="108" x2="188" y2="62" stroke="var(--color-ink)" markerStart="url(#hitch-diagram-arrow)" markerEnd="url(#hitch-diagram-arrow)" />
        <line x1="170" y1="62" x2="196" y2="62" stroke="var(--color-ink-faint)" strokeDasharray="2 2" />
        <text x="194" y="90" fontSize="10" fill="var(--color-ink)">receiver</text>
        <text x="194" y="102" fontSize="10" fill="var(--color-ink)">height</text>
      </svg>
      <figcaption className="mt-1 text-xs leading-snug text-ink-soft">
        Measure with the vehicle loaded as it will travel, on level ground. Not to scale.
      </figcaption>
    </figure>
  );
}

/** Where the three fender heights are read. */
function FenderDiagram() {
  return (
    <figure className="rounded-md border border-rule bg-paper/70 p-2 sm:max-w-xs">
      <svg viewBox="0 0 240 92" className="block w-full" role="img" aria-label="Front fender height runs from the ground straight up to the lip of the front wheel opening, directly above the wheel centre.">
        <defs>
          <marker id="fender-diagram-arrow" viewBox="0 0 10 10" refX="5" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
            <path d="M 0 1 L 9 5 L 0 9 z" fill="var(--color-ink)" />
          </marker>
        </defs>
        <line x1="0" y1="84" x2="240" y2="84" stroke="var(--color-ink-soft)" strokeWidth="1.5" />
        <path d="M 10 40 L 62 40 A 34 34 0 0 1 130 40 L 230 40" fill="none" stroke="var(--color-ink-soft)" strokeWidth="1.5" />
        <circle cx="96" cy="60" r="24" fill="var(--color-sunken)" stroke="var(--color-ink-soft)" strokeWidth="1.5" />
        <line x1="96" y1="84" x2="96" y2="7" stroke="var(--color-ink)" markerStart="url(#fender-diagram-arrow)" markerEnd="url(#fender-diagram-arrow)" />
        <text x="140" y="22" fontSize="10" fill="var(--color-ink)">ground to wheel-opening lip,</text>
        <text x="140" y="34" fontSize="10" fill="var(--color-ink)">straight above the wheel centre</text>
      </svg>
    </figure>
  );
}

// ---------------------------------------------------------------- cards' bodies

export function VehicleFields({ tools }: { tools?: ReactNode }) {
  return (
    <>
      {tools}
      <FieldGroup title="Ratings" note="From the owner's manual (towing section) and the door-jamb label.">
        <FieldGrid>
          <NumField name="vehicle.towRating" label="Tow rating" kind="mass" help={<TermHelp term="weight-carrying">Owner&rsquo;s manual, towing section: the weight-carrying figure, without weight distribution.</TermHelp>} />
          <NumField name="vehicle.tongueWeightLimit" label="Tongue-weight limit" kind="mass" help={<TermHelp term="tongue-weight">Owner&rsquo;s manual, towing section.</TermHelp>} />
          <NumField name="vehicle.gvwr" label="GVWR" kind="mass" help={<TermHelp term="gvwr">Door-jamb label, driver&rsquo;s side.</TermHelp>} />
          <NumField name="vehicle.curbWeight" label="Curb weight" kind="mass" help={<TermHelp term="curb-weight">Weigh it empty with a full tank, or take the maker&rsquo;s figure. It is not on the tyre and loading label, which gives occupants plus cargo.</TermHelp>} />
          <NumField name="vehicle.payloadLabel" label="Payload on the label" kind="mass" help={<TermHelp term="payload">Tyre and loading label on the door jamb: the combined weight of occupants and cargo.</TermHelp>} />
          <NumField name="vehicle.gcwr" label="GCWR" kind="mass" help={<TermHelp term="gcwr">Owner&rsquo;s manual, towing section.</TermHelp>} />
        </FieldGrid>
      </FieldGroup>
      <MoreMeasurements>
        <MoreSection title="Load in the vehicle" note="What rides along when it tows. Ask, or weigh.">
          <FieldGrid>
            <NumField name="load.occupants" label="Occupants" kind="mass" help="Everyone who rides, together." />
            <NumField name="load.cargo" label="Cargo" kind="mass" help="Luggage and gear in the vehicle." />
            <NumField name="load.hitchHardware" label="Hitch hardware" kind="mass" help={<TermHelp term="hitch-hardware">Ball mount, or weight-distribution head and bars: the maker&rsquo;s sheet or a bathroom scale.</TermHelp>} />
          </FieldGrid>
        </MoreSection>
        <MoreSection title="Axle ratings, weights and wheelbase" note="Axle ratings from the door-jamb label; lengths with a tape measure along the ground, or the owner's manual's dimensions page.">
          <FieldGrid>
            <NumField name="vehicle.gawrFront" label="Front GAWR" kind="mass" help={<TermHelp term="gawr">Door-jamb label.</TermHelp>} />
            <NumField name="vehicle.gawrRear" label="Rear GAWR" kind="mass" help={<TermHelp term="gawr">Door-jamb label.</TermHelp>} />
            <NumField name="vehicle.wheelbase" label="Wheelbase" kind="length" help="Front wheel centre to rear wheel centre." />
            <NumField name="vehicle.rearAxleToPin" label="Rear axle to pin hole" kind="length" help={<TermHelp term="overhang">Along the ground from the rear axle centre to the receiver pin hole: the installer&rsquo;s figure after fitting. The ball mount&rsquo;s length and any extender are added to reach the ball.</TermHelp>} />
          </FieldGrid>
          <FieldGroup title="Weighed axle loads, unhitched" note="A public axle scale, vehicle loaded as it will travel.">
            <FieldGrid>
              <NumField name="vehicle.axleWeights.front" label="Front axle, unhitched" kind="mass" />
              <NumField name="vehicle.axleWeights.rear" label="Rear axle, unhitched" kind="mass" />
            </FieldGrid>
          </FieldGroup>
          <FieldGroup title="Weighed axle loads, hitched" note="The same scale with the trailer on, weight distribution released.">
            <FieldGrid>
              <NumField name="vehicle.axleWeightsHitched.front" label="Front axle, hitched" kind="mass" />
              <NumField name="vehicle.axleWeightsHitched.rear" label="Rear axle, hitched" kind="mass" />
            </FieldGrid>
          </FieldGroup>
        </MoreSection>
        <MoreSection title="Fifth wheel or gooseneck" note="Only for a trailer hitched in the bed.">
          <FieldGrid>
            <NumField name="vehicle.towRatingBed" label="Tow rating for a fifth wheel or gooseneck" kind="mass" help={<TermHelp term="bed-hitch">Owner&rsquo;s manual, towing section, where the maker gives its own figure for a bed hitch.</TermHelp>} />
            <NumField name="vehicle.rearAxleToBedHitch" label="Rear axle to bed hitch" kind="length" help={<TermHelp term="bed-hitch">Fifth wheel or gooseneck only: along the ground from the rear axle centre to the kingpin&rsquo;s or ball&rsquo;s centre. Negative when it sits ahead of the axle, 0 straight over it.</TermHelp>} />
          </FieldGrid>
        </MoreSection>
        <MoreSection title="Departure angle and tongue-weight band" note="The owner's manual: its dimensions page, and its own share of the trailer for the tongue where it states one.">
          <FieldGrid>
            <NumField name="vehicle.departureAngle" label="Departure angle" kind="angle" help={<TermHelp term="departure-angle">Owner&rsquo;s manual, dimensions page.</TermHelp>} />
            <NumField name="vehicle.tongueShareBand.min" label="Lowest tongue share" kind="percent" />
            <NumField name="vehicle.tongueShareBand.max" label="Highest tongue share" kind="percent" />
          </FieldGrid>
        </MoreSection>
        <VehicleTyreFields />
      </MoreMeasurements>
    </>
  );
}

export function HitchFields({ kind }: { kind: HitchedKind }) {
  const bed = useBedHitch() && kind === "trailer";
  const mount = kind === "trailer" && !bed;
  return (
    <>
      {bed ? (
        <FieldGroup title="Bed hitch" note="The fifth wheel's or gooseneck's own label. The receiver, a ball mount, an extender and weight distribution do not apply to it.">
          <FieldGrid>
            <NumField name="hitch.bedGtwRating" label="Bed hitch GTW rating" kind="mass" help={<TermHelp term="bed-hitch">Label on the fifth wheel or gooseneck hitch: gross trailer weight.</TermHelp>} />
            <NumField name="hitch.bedPinRating" label="Bed hitch pin weight rating" kind="mass" help={<TermHelp term="pin-weight">Label on the fifth wheel or gooseneck hitch: the vertical (pin) load.</TermHelp>} />
          </FieldGrid>
        </FieldGroup>
      ) : null}
      <FieldGroup title="Receiver" note="Ratings from the hitch's own label or stamp.">
        <FieldGrid>
          <ChoiceField name="hitch.class" label="Hitch class" numeric emptyLabel="Not given" options={[1, 2, 3, 4, 5].map((n) => ({ value: String(n), label: `Class ${n}` }))} help={<TermHelp term="hitch-class">On the hitch&rsquo;s label. The class is a ceiling; the label&rsquo;s own rating governs.</TermHelp>} />
          <ChoiceField name="hitch.receiverSize" label="Receiver size" emptyLabel="Not given" options={RECEIVER_SIZES.map(inches)} help="Inside width of the opening." />
          <NumField name="hitch.gtwRating" label="Hitch GTW rating" kind="mass" help={<TermHelp term="gross-trailer-weight">Hitch label: gross trailer weight, weight-carrying line.</TermHelp>} />
          <NumField name="hitch.twRating" label="Hitch TW rating" kind="mass" help={<TermHelp term="tongue-weight">Hitch label: tongue weight, weight-carrying line.</TermHelp>} />
        </FieldGrid>
      </FieldGroup>
      <MoreMeasurements>
        <MoreSection
          title={mount ? "Ball mount and heights" : "Receiver height and bumper"}
          note={mount ? "Heights and distances with a tape measure; the ball mount's ratings are stamped on it." : "Heights and distances with a tape measure."}
        >
          <FieldGrid>
            <NumField name="hitch.receiverHeight" label="Receiver height" kind="length" help={<TermHelp term="receiver">Ground to the top inside edge of the receiver opening, vehicle loaded, unhitched.</TermHelp>} />
            <NumField name="hitch.pinToFascia" label="Pin to fascia" kind="length" help={<TermHelp term="fascia" question="What is the fascia?">Centre of the pin hole forward to the outermost point of the bumper.</TermHelp>} />
            {mount ? (
              <>
                <NumField name="ballMount.drop" label="Drop (negative for a rise)" kind="length" help={<TermHelp term="ball-platform">Top of the shank down to the top of the ball platform. A rise is a negative figure.</TermHelp>} />
                <NumField name="ballMount.length" label="Ball mount length" kind="length" help="Pin hole to the ball's centre." />
                <NumField name="ballMount.gtwRating" label="Ball mount GTW rating" kind="mass" help="Stamp on the ball mount." />
                <NumField name="ballMount.twRating" label="Ball mount TW rating" kind="mass" help="Stamp on the ball mount." />
                <NumField name="ballMount.squatAllowance" label="Expected rear squat" kind="length" help={<TermHelp term="squat">How far the receiver comes down once hitched: receiver height unhitched minus receiver height hitched, or an estimate.</TermHelp>} />
              </>
            ) : null}
          </FieldGrid>
          <HitchDiagram />
        </MoreSection>
        {bed ? null : (
          <MoreSection title="Extender" note="Only if one is fitted: its own label gives its rating, often lower than the hitch's.">
            <FieldGrid>
              <NumField name="extender.length" label="Extender length" kind="length" help={<TermHelp term="extender">How far it moves the pin hole back.</TermHelp>} />
              <NumField name="extender.twRating" label="Extender TW rating" kind="mass" help="The extender's label." />
              <NumField name="extender.gtwRating" label="Extender GTW rating" kind="mass" help="The extender's label, if it gives one." />
            </FieldGrid>
          </MoreSection>
        )}
        <MoreSection title="Marked D and S values" note="Where the tow bar is built to UN Regulation No. 55: its plate and the ball's stamp.">
          <FieldGrid>
            <NumField name="hitch.dValue" label="Hitch D value (marked)" kind="force" help="On the plate of a tow bar built to UN Regulation No. 55, in kN." />
            <NumField name="hitch.sValue" label="Hitch ball S value (marked)" kind="mass" help="The static vertical load stamped on the ball or the tow bar's plate." />
          </FieldGrid>
        </MoreSection>
        <HitchHardwareFields kind={kind} />
      </MoreMeasurements>
    </>
  );
}

/**
 * Everything weight distribution asks for, in one place: whether it is used, the vehicle's and the hitch's
 * ratings with it, the head's or bars' own rating, and the fender readings. Shown for a trailer on a ball
 * mount only (a bed hitch has none).
 */
export function WeightDistributionFields() {
  return (
    <>
      <div className="space-y-1">
        <WdUsed />
        <p className="text-[0.8125rem] leading-snug text-ink-soft">
          The verdict shows the rig both ways; the figures below give the side with weight distribution its limits.
        </p>
      </div>
      <FieldGroup title="Ratings with weight distribution" note="The owner's manual (towing section), the hitch's label (its weight-distributing line) and the label on the spring bars or head.">
        <FieldGrid>
          <NumField name="vehicle.towRatingWd" label="Tow rating with weight distribution" kind="mass" help="Owner's manual, towing section." />
          <NumField name="vehicle.tongueWeightLimitWd" label="Tongue-weight limit with weight distribution" kind="mass" help="Owner's manual, towing section." />
          <NumField name="hitch.gtwRatingWd" label="Hitch GTW rating with WD" kind="mass" help={<TermHelp term="weight-distribution">Hitch label, weight-distributing line.</TermHelp>} />
          <NumField name="hitch.twRatingWd" label="Hitch TW rating with WD" kind="mass" help="Hitch label, weight-distributing line." />
          <NumField name="weightDistribution.tongueRating" label="WD tongue rating" kind="mass" help={<TermHelp term="weight-distribution">Label on the spring bars or head.</TermHelp>} />
          <NumField name="vehicle.wdRequiredAbove" label="Weight distribution required above" kind="mass" help={<TermHelp term="weight-distribution">Owner&rsquo;s manual: the trailer weight above which the maker requires it.</TermHelp>} />
        </FieldGrid>
      </FieldGroup>
      <MoreMeasurements>
        <MoreSection
          title="Fender readings and front restoration"
          note="Front fender height: ground to the lip of the front wheel opening, straight above the wheel centre, on level ground. Unhitched, hitched with the spring bars released, then hitched with the bars set. Chock the trailer first."
        >
          <FieldGrid>
            <NumField name="weightDistribution.fenderUnhitched" label="Fender height, unhitched" kind="length" help="Tape measure, before hitching." />
            <NumField name="weightDistribution.fenderHitched" label="Fender height, hitched" kind="length" help="Trailer on the ball and chocked, spring bars released." />
            <NumField name="weightDistribution.fenderWithWd" label="Fender height, hitched with WD" kind="length" help={<TermHelp term="spring-bars" question="Why keep clear?">Spring bars set as they will travel, with the maker&rsquo;s handle; keep hands and feet clear of a bar under tension.</TermHelp>} />
            <NumField name="weightDistribution.restorationTarget" label="Front restoration target" kind="percent" help={<TermHelp term="restoration">Share of the lost front-axle load to give back; the owner&rsquo;s manual may set it (often 50 %).</TermHelp>} />
          </FieldGrid>
          <FenderDiagram />
        </MoreSection>
      </MoreMeasurements>
    </>
  );
}

export interface HitchedChoiceProps {
  kind: HitchedKind;
  onChange: (kind: HitchedKind) => void;
}

/** The segmented choice: a trailer, or a rack or carrier in the receiver. */
export function HitchedChoice({ kind, onChange }: HitchedChoiceProps) {
  const name = useId();
  const options: Array<[HitchedKind, string]> = [
    ["trailer", "A trailer"],
    ["accessory", "A rack or carrier"],
  ];
  return (
    <fieldset className="min-w-0">
      <legend className="mb-1.5 text-sm font-medium text-ink">What is hitched</legend>
      <div className="inline-grid w-full grid-cols-2 rounded-md border border-rule bg-sunken p-1 sm:w-auto">
        {options.map(([value, label]) => (
          <label
            key={value}
            className={cn(
              "flex min-h-10 cursor-pointer items-center justify-center rounded px-4 text-sm font-medium has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-accent",
              kind === value ? "bg-panel text-ink shadow-card" : "text-ink-soft hover:text-ink",
            )}
          >
            <input type="radio" name={name} value={value} checked={kind === value} onChange={() => onChange(value)} className="sr-only" />
            {label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

function TongueBasis() {
  const { register, control } = useFormContext<RigFormValues>();
  const name = "trailer.tongueWeightBasis" as const;
  const [basis, tongue] = useWatch({ control, name: [name, "trailer.tongueWeight"] });
  const noteId = useId();
  const unmarked = basis !== "measured" && basis !== "estimated" && typeof tongue === "number" && Number.isFinite(tongue);
  return (
    <fieldset className="min-w-0" aria-describedby={unmarked ? noteId : undefined}>
      <legend className="text-sm font-medium text-ink">The tongue weight is</legend>
      <div className="mt-1.5 flex flex-wrap gap-x-5 gap-y-2">
        {(["measured", "estimated"] as const).map((value) => (
          <label key={value} className="inline-flex min-h-10 items-center gap-2 text-sm text-ink">
            <input type="radio" value={value} {...register(name)} className="size-4 accent-(--color-accent)" />
            {value === "measured" ? "Weighed" : "An estimate"}
          </label>
        ))}
      </div>
      {unmarked ? (
        <p id={noteId} className="mt-1 text-[0.8125rem] leading-snug text-ink-soft">
          Neither chosen: the checks take it as an estimate until it is marked as weighed.
        </p>
      ) : null}
    </fieldset>
  );
}

function WdUsed() {
  const { register } = useFormContext<RigFormValues>();
  return (
    <label className="inline-flex min-h-10 items-center gap-2 text-sm font-medium text-ink">
      <input type="checkbox" {...register("weightDistribution.used")} className="size-4 accent-(--color-accent)" />
      Weight distribution is used
    </label>
  );
}

/** The trailer's plated maximum, in the place's own name for it. */
const PLATE_LABEL: Record<GlossaryId, string> = {
  us: "Trailer GVWR (plate)",
  ca: "Trailer GVWR (plate)",
  gb: "Trailer MAM (plate)",
  eu: "Trailer maximum mass (plate)",
  au: "ATM on the plate",
};

const LICENCE_OPTIONS = [
  { value: "B", label: "Category B (car)" },
  { value: "B96", label: "Category B with code 96" },
  { value: "BE", label: "Category BE" },
  { value: "other", label: "Another licence" },
];

export function TrailerFields({ tools }: { tools?: ReactNode }) {
  const glossary = useGlossary();
  const bed = useBedHitch();
  return (
    <>
      {tools}
      <FieldGroup title="Trailer">
        <FieldGrid>
          <ChoiceField name="trailer.type" label="Trailer type" options={TRAILER_TYPES.map((t) => ({ value: t, label: TRAILER_TYPE_LABELS[t] }))} help="Sets the usual tongue-weight band." />
          <ChoiceField name="trailer.hitchType" label="Hitched by" emptyLabel="Receiver ball mount" options={(Object.keys(HITCH_TYPE_LABELS) as Array<keyof typeof HITCH_TYPE_LABELS>).map((t) => ({ value: t, label: HITCH_TYPE_LABELS[t] }))} help={<TermHelp term="bed-hitch">A fifth wheel or gooseneck sits in the bed over or ahead of the rear axle; its pin weight is usually 15 to 25 % of the trailer.</TermHelp>} />
          <NumField name="trailer.grossTrailerWeight" label="Gross trailer weight" kind="mass" help={<TermHelp term="gross-trailer-weight">Loaded as it will travel: a public scale, or the trailer&rsquo;s own GVWR as the upper bound.</TermHelp>} />
          <NumField name="trailer.tongueWeight" label={bed ? "Pin weight" : "Tongue weight"} kind="mass" help={<TermHelp term="tongue-weight">A tongue scale, a bathroom scale and beam, or the difference at a public scale; spring bars released.</TermHelp>} />
          <TongueBasis />
        </FieldGrid>
      </FieldGroup>
      <MoreMeasurements>
        <MoreSection title="Plate, brakes and licence" note="The trailer's plate or papers, and what the rules where it is driven ask for: brakes, a breakaway device and the driver's licence.">
          <FieldGrid>
            <NumField name="trailer.mam" label={PLATE_LABEL[glossary]} kind="mass" help="The most the trailer may weigh loaded, from its plate or papers: licences and the coupling's D value read it." />
            <ChoiceField name="trailer.brakes" label="Trailer brakes" emptyLabel="Not given" options={BRAKE_TYPES.map((b) => ({ value: b, label: BRAKE_LABELS[b] }))} help={<TermHelp term="surge-brakes" question="What are surge brakes?">Electric brakes need a brake controller in the vehicle; surge brakes work from the trailer pushing on the ball.</TermHelp>} />
            <YesNoField name="trailer.brakesAllWheels" label="Brakes on every wheel" help="Look behind each wheel, or the trailer's papers." />
            <YesNoField name="trailer.breakaway" label="Breakaway device" help="Applies the trailer's brakes if it comes off the hitch ball." />
            <ChoiceField name="driver.licence" label="Driver's licence" emptyLabel="Not given" options={LICENCE_OPTIONS} help="Read by the licence rules where a place has them; not given means check the licence." />
          </FieldGrid>
        </MoreSection>
        <MoreSection title="Coupler, ball and chains" note="Each is stamped or tagged on the part itself.">
          <FieldGrid>
            <NumField name="trailer.couplerHeight" label="Coupler height" kind="length" help="Ground to the bottom of the coupler, with the trailer level." />
            <NumField name="trailer.couplerRating" label="Coupler rating" kind="mass" help="Stamp on the coupler." />
            <ChoiceField name="trailer.couplerBallSize" label="Coupler ball size" emptyLabel="Not given" options={BALL_SIZES.map(inches)} help="Stamped on the coupler." />
            <ChoiceField name="trailer.ballSize" label="Ball size" emptyLabel="Not given" options={BALL_SIZES.map(inches)} help="Stamped on top of the ball." />
            <NumField name="trailer.ballRating" label="Ball rating" kind="mass" help="Stamped on top of the ball." />
            <NumField name="trailer.safetyChainRating" label="Safety chain rating (each)" kind="mass" help={<TermHelp term="safety-chains" question="What are safety chains?">Tag or stamp on each chain.</TermHelp>} />
            <NumField name="trailer.couplingDValue" label="Coupler D value (marked)" kind="force" help="On the coupler's plate, in kN, where it is built to UN Regulation No. 55." />
          </FieldGrid>
        </MoreSection>
        <MoreSection title="Tongue weighed with a scale" note="A scale straight under the jack, or a bathroom scale under a beam resting on a block. Chock the trailer's wheels before lifting the tongue off the ball.">
          <FieldGrid>
            <NumField name="trailer.tongueMeasurement.scaleReading" label="Scale reading" kind="mass" />
            <NumField name="trailer.tongueMeasurement.blockToJack" label="Block to jack" kind="length" help="Beam method only: the block's centre to the jack." />
            <NumField name="trailer.tongueMeasurement.jackToScale" label="Jack to scale" kind="length" help="Beam method only: the jack to the scale's pipe." />
          </FieldGrid>
        </MoreSection>
        <TrailerPlateFields />
      </MoreMeasurements>
    </>
  );
}

export function AccessoryFields({ tools }: { tools?: ReactNode }) {
  return (
    <>
      {tools}
      <FieldGroup title="Rack or carrier" note="Weights from the maker's sheet or a bathroom scale. The hitch's TW rating and the vehicle's tongue-weight limit are what it is rated against.">
        <FieldGrid>
          <ChoiceField name="accessory.type" label="Accessory type" options={ACCESSORY_TYPES.map((t) => ({ value: t, label: ACCESSORY_TYPE_LABELS[t] }))} />
          <NumField name="accessory.weight" label="Accessory weight" kind="mass" help="Its own weight, empty." />
          <NumField name="accessory.loadWeight" label="Load on it" kind="mass" help="Bikes, boxes: weigh them." />
        </FieldGrid>
      </FieldGroup>
      <MoreMeasurements>
        <MoreSection title="Distances from the pin" note="With a tape measure from the pin hole.">
          <FieldGrid>
            <NumField name="accessory.loadCenterFromPin" label="Pin to the load's centre" kind="length" help="Pin hole back to the middle of the load." />
            <NumField name="accessory.foldClearance" label="Fold clearance needed" kind="length" help={<TermHelp term="fascia" question="What is the fascia?">Maker&rsquo;s sheet: room it needs between the pin hole and the bumper fascia when folded up.</TermHelp>} />
          </FieldGrid>
        </MoreSection>
        <MoreSection title="Lowest point and shank rise" note="With the accessory fitted and loaded: find the part nearest the ground.">
          <FieldGrid>
            <NumField name="accessory.lowestPointBelowShankTop" label="Lowest point below the shank top" kind="length" help="Top of the shank down to the lowest point (negative if above)." />
            <NumField name="accessory.lowestPointBehindPin" label="Lowest point behind the pin" kind="length" help="Pin hole back to the lowest point, along the ground." />
            <NumField name="accessory.shankRise" label="Shank rise" kind="length" help={<TermHelp term="shank-rise">How far the shank lifts the accessory; negative for a drop. More shank rise often lowers the rack maker&rsquo;s rating and can hide the lights or the number plate.</TermHelp>} />
          </FieldGrid>
        </MoreSection>
      </MoreMeasurements>
    </>
  );
}

export interface ProfilePickerProps {
  label: string;
  options: Array<{ id: string; name: string }>;
  onPick: (id: string) => void;
  /** The saved profile the card was last filled from, named in the picker; "Choose…" when none. */
  selectedId?: string;
}

/** A saved profile to fill the card from; names the one the card was filled from, if any (choose another to change it). */
export function ProfilePicker({ label, options, onPick, selectedId }: ProfilePickerProps) {
  if (!options.length) return null;
  return (
    <Field label={label} className="w-full sm:w-72">
      <Select
        value={selectedId && options.some((o) => o.id === selectedId) ? selectedId : ""}
        onChange={(e) => {
          if (e.target.value) onPick(e.target.value);
        }}
      >
        <option value="">Choose a saved profile…</option>
        {options.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name}
          </option>
        ))}
      </Select>
    </Field>
  );
}
