"use client";

/**
 * The figures the hardware fit, the trailer's own ratings and the tyre checks read, one small group per card:
 * the vehicle's tyres and unbraked tow rating, the hitch pin, the ball mount's hole, a receiver adapter or a
 * reducer sleeve, and the trailer's plate, ball shank and tyres. Each says where its figure is found.
 */
import { useFormContext, useWatch } from "react-hook-form";
import { PIN_SIZES, SHANK_SIZES } from "@/lib/towing/choices";
import { TermHelp } from "@/components/glossary/term-help";
import { ChoiceField, FieldGrid, MoreSection, NumField, YesNoField } from "./field-parts";
import type { HitchedKind, RigFormValues } from "./rig-form";

const inches = (size: string) => ({ value: size, label: `${size} in` });

/** The vehicle card: each tyre's maximum load and the tow rating for a trailer without brakes. */
export function VehicleTyreFields() {
  return (
    <MoreSection title="Tyres and unbraked towing" note="Each tyre's maximum load is moulded on its sidewall; the unbraked figure is in the owner's manual, towing section.">
      <FieldGrid>
        <NumField name="vehicle.tyreLoadFront" label="Front tyre load capacity (each tyre)" kind="mass" help={<TermHelp term="tyre-load">The &ldquo;max load&rdquo; on one front tyre&rsquo;s sidewall; the front axle has two.</TermHelp>} />
        <NumField name="vehicle.tyreLoadRear" label="Rear tyre load capacity (each tyre)" kind="mass" help={<TermHelp term="tyre-load">The &ldquo;max load&rdquo; on one rear tyre&rsquo;s sidewall; two on the axle, four with dual wheels.</TermHelp>} />
        <YesNoField name="vehicle.dualRearWheels" label="Dual rear wheels" help="Two tyres on each side of the rear axle." />
        <NumField name="vehicle.towRatingUnbraked" label="Tow rating for a trailer without brakes" kind="mass" help={<TermHelp term="tow-rating">Owner&rsquo;s manual, towing section: a limit whenever the trailer has no brakes.</TermHelp>} />
      </FieldGrid>
    </MoreSection>
  );
}

/** A tick box that says a part is fitted even before its label's figures are typed. */
function FittedBox({ name, label }: { name: "receiverAdapter.fitted" | "ballSleeve.fitted"; label: string }) {
  const { register } = useFormContext<RigFormValues>();
  return (
    <label className="inline-flex min-h-10 items-center gap-2 text-sm font-medium text-ink">
      <input type="checkbox" {...register(name as never)} className="size-4 accent-(--color-accent)" />
      {label}
    </label>
  );
}

/** The hitch card: the hitch pin, the ball mount's hole, and a receiver adapter or reducer sleeve if one is fitted. */
export function HitchHardwareFields({ kind }: { kind: HitchedKind }) {
  const { control } = useFormContext<RigFormValues>();
  const hitchType = useWatch({ control, name: "trailer.hitchType" });
  if (kind === "trailer" && (hitchType === "fifth-wheel" || hitchType === "gooseneck")) return null;
  const trailer = kind === "trailer";
  return (
    <MoreSection title="Pin, hole and adapters" note="Sizes as the trade names them, stamped on the part or measured across it. An adapter or a sleeve carries the whole load: its own label gives its ratings.">
      <div className="space-y-4">
        {trailer ? (
          <FieldGrid>
            <ChoiceField name="hitch.pinDiameter" label="Hitch pin" emptyLabel="Not given" options={PIN_SIZES.map(inches)} help={<TermHelp term="pin-hole">Measured across the pin: usually 1/2 in for a 1-1/4 in receiver, 5/8 in for 2 in and larger.</TermHelp>} />
            <ChoiceField name="ballMount.holeSize" label="Ball mount hole" emptyLabel="Not given" options={SHANK_SIZES.map(inches)} help={<TermHelp term="ball-shank">The hole the ball&rsquo;s shank goes through, in the ball mount or the weight-distribution head.</TermHelp>} />
          </FieldGrid>
        ) : null}
        <FittedBox name="receiverAdapter.fitted" label="A receiver adapter is fitted" />
        <FieldGrid>
          <NumField name="receiverAdapter.gtwRating" label="Receiver adapter GTW rating" kind="mass" help={<TermHelp term="receiver-adapter">The adapter&rsquo;s own stamp or label.</TermHelp>} />
          <NumField name="receiverAdapter.twRating" label="Receiver adapter TW rating" kind="mass" help="The adapter's own stamp or label." />
        </FieldGrid>
        {trailer ? (
          <>
            <FittedBox name="ballSleeve.fitted" label="A ball reducer sleeve is fitted" />
            <FieldGrid>
              <NumField name="ballSleeve.gtwRating" label="Reducer sleeve GTW rating" kind="mass" help={<TermHelp term="reducer-sleeve">Stamped on the sleeve, or on its packaging.</TermHelp>} />
              <NumField name="ballSleeve.twRating" label="Reducer sleeve TW rating" kind="mass" help="Stamped on the sleeve, or on its packaging." />
            </FieldGrid>
          </>
        ) : null}
      </div>
    </MoreSection>
  );
}

/** The trailer card: the ball's shank, and the trailer's own plate and tyres. */
export function TrailerPlateFields() {
  const { control } = useFormContext<RigFormValues>();
  const hitchType = useWatch({ control, name: "trailer.hitchType" });
  const bed = hitchType === "fifth-wheel" || hitchType === "gooseneck";
  return (
    <MoreSection title="The trailer's plate and tyres" note="From the trailer's own plate or label, and each tyre's sidewall.">
      <FieldGrid>
        <NumField name="trailer.axleRating" label="Trailer axle rating (each axle)" kind="mass" help={<TermHelp term="trailer-gvwr">The trailer&rsquo;s plate, or the tag on the axle itself.</TermHelp>} />
        <ChoiceField name="trailer.axleCount" label="Trailer axles" numeric emptyLabel="Not given" options={[1, 2, 3, 4].map((n) => ({ value: String(n), label: n === 1 ? "1 axle" : `${n} axles` }))} help="Count them." />
        <NumField name="trailer.tyreLoad" label="Trailer tyre load capacity (each tyre)" kind="mass" help={<TermHelp term="tyre-load">The &ldquo;max load&rdquo; on one trailer tyre&rsquo;s sidewall; two tyres per axle.</TermHelp>} />
        {bed ? null : (
          <ChoiceField name="trailer.ballShankSize" label="Ball shank" emptyLabel="Not given" options={SHANK_SIZES.map(inches)} help={<TermHelp term="ball-shank">The threaded stem under the ball: stamped on it, or measured across the threads.</TermHelp>} />
        )}
      </FieldGrid>
    </MoreSection>
  );
}
