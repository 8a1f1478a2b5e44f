/**
 * The rig in words, built only from what staff entered. Every figure goes through lib/format so the
 * paragraph reads the same as the rest of the page. Type-only imports from the core.
 */
import { formatQuantity } from "@/lib/format";
import type { RigInput } from "@/lib/towing/input";
import type { Quantity } from "@/lib/towing/types";

type TrailerType = NonNullable<RigInput["trailer"]>["type"];
type AccessoryType = NonNullable<RigInput["accessory"]>["type"];

const TRAILER_WORDS: Record<TrailerType, string> = {
  utility: "a utility trailer",
  "enclosed-cargo": "an enclosed cargo trailer",
  travel: "a travel trailer",
  boat: "a boat trailer",
  "car-hauler": "a car-hauler trailer",
  "horse-livestock": "a horse or livestock trailer",
  other: "a trailer",
};

const ACCESSORY_WORDS: Record<AccessoryType, string> = {
  "platform-rack": "a platform rack",
  "hanging-rack": "a hanging rack",
  "cargo-carrier": "a cargo carrier",
  other: "a hitch-mounted accessory",
};

const BRAKE_WORDS: Record<NonNullable<NonNullable<RigInput["trailer"]>["brakes"]>, string> = {
  none: "The trailer has no brakes of its own.",
  surge: "The trailer has surge brakes.",
  electric: "The trailer has electric brakes.",
  other: "The trailer has its own brakes.",
};

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** "a, b and c". */
export function listWords(items: string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}

/** A short paragraph describing the rig; mentions only what was given. */
export function describeRig(rig: RigInput): string {
  const weightUnit: Quantity["unit"] = rig.units === "metric" ? "kg" : "lb";
  const lengthUnit: Quantity["unit"] = rig.units === "metric" ? "mm" : "in";
  const w = (value: number) => formatQuantity({ value, unit: weightUnit });
  const l = (value: number) => formatQuantity({ value, unit: lengthUnit });
  const { vehicle, hitch, trailer, accessory, ballMount, extender, weightDistribution, load } = rig;

  const sentences: string[] = [];
  const opening: string[] = [];

  if (trailer) {
    let subject = TRAILER_WORDS[trailer.type];
    if (trailer.grossTrailerWeight !== undefined) subject += ` of ${w(trailer.grossTrailerWeight)} gross`;
    opening.push(subject);
    if (trailer.tongueWeight !== undefined) {
      const basis =
        trailer.tongueWeightBasis === "measured" ? " (weighed)" : trailer.tongueWeightBasis === "estimated" ? " (estimated)" : "";
      opening.push(`${w(trailer.tongueWeight)} on the tongue${basis}`);
    }
  } else if (accessory) {
    let subject = ACCESSORY_WORDS[accessory.type];
    if (accessory.weight !== undefined) subject += ` weighing ${w(accessory.weight)}`;
    opening.push(subject);
    if (accessory.loadWeight !== undefined) {
      const centre =
        accessory.loadCenterFromPin !== undefined ? ` centred ${l(accessory.loadCenterFromPin)} behind the hitch pin` : "";
      opening.push(`carrying ${w(accessory.loadWeight)} of load${centre}`);
    }
  } else {
    opening.push("a vehicle and hitch, with nothing hitched yet");
  }

  if (vehicle.towRating !== undefined || vehicle.towRatingWd !== undefined) {
    const ratings: string[] = [];
    if (vehicle.towRating !== undefined) ratings.push(w(vehicle.towRating));
    if (vehicle.towRatingWd !== undefined) ratings.push(`${w(vehicle.towRatingWd)} with weight distribution`);
    opening.push(`on a vehicle rated to tow ${ratings.join(", or ")}`);
  }

  if (hitch && (hitch.class !== undefined || hitch.receiverSize !== undefined)) {
    const parts: string[] = [];
    if (hitch.class !== undefined) parts.push(`a class ${hitch.class} hitch`);
    if (hitch.receiverSize !== undefined) parts.push(`${parts.length ? "with " : ""}a ${hitch.receiverSize} in receiver`);
    opening.push(`through ${parts.join(" ")}`);
  }
  sentences.push(`${capitalise(opening.join(", "))}.`);

  const vehicleLimits: string[] = [];
  if (vehicle.gvwr !== undefined) vehicleLimits.push(`may weigh up to ${w(vehicle.gvwr)} loaded (its GVWR)`);
  if (vehicle.gcwr !== undefined) vehicleLimits.push(`up to ${w(vehicle.gcwr)} together with what it tows (its GCWR)`);
  if (vehicle.tongueWeightLimit !== undefined) vehicleLimits.push(`takes up to ${w(vehicle.tongueWeightLimit)} on the hitch`);
  if (vehicleLimits.length) sentences.push(`The vehicle ${listWords(vehicleLimits)}.`);

  if (hitch && (hitch.gtwRating !== undefined || hitch.twRating !== undefined)) {
    const parts: string[] = [];
    if (hitch.gtwRating !== undefined) parts.push(`${w(hitch.gtwRating)} of trailer`);
    if (hitch.twRating !== undefined) parts.push(`${w(hitch.twRating)} on the tongue`);
    sentences.push(`The hitch is rated for ${listWords(parts)}.`);
  }

  if (ballMount?.drop !== undefined) {
    const shape =
      ballMount.drop < 0 ? `a ${l(-ballMount.drop)} rise` : ballMount.drop === 0 ? "no rise or drop" : `a ${l(ballMount.drop)} drop`;
    const ball = trailer?.ballSize ? ` and a ${trailer.ballSize} in ball` : "";
    sentences.push(`The ball mount has ${shape}${ball}.`);
  } else if (trailer?.ballSize) {
    sentences.push(`The hitch ball is ${trailer.ballSize} in.`);
  }

  if (extender) sentences.push(`A ${l(extender.length)} receiver extender is fitted.`);
  if (accessory?.shankRise !== undefined && accessory.shankRise !== 0) {
    sentences.push(
      accessory.shankRise > 0 ? `The shank rises ${l(accessory.shankRise)}.` : `The shank drops ${l(-accessory.shankRise)}.`,
    );
  }

  if (weightDistribution) {
    sentences.push(weightDistribution.used ? "A weight-distribution hitch is used." : "No weight-distribution hitch is used.");
  }
  if (trailer?.brakes) sentences.push(BRAKE_WORDS[trailer.brakes]);

  if (load) {
    const carried: string[] = [];
    if (load.occupants !== undefined && load.occupants > 0) carried.push(`${w(load.occupants)} of people`);
    if (load.cargo !== undefined && load.cargo > 0) carried.push(`${w(load.cargo)} of luggage`);
    if (load.hitchHardware !== undefined && load.hitchHardware > 0) carried.push(`${w(load.hitchHardware)} of hitch parts`);
    if (carried.length) sentences.push(`In the vehicle: ${listWords(carried)}.`);
  }

  return sentences.join(" ");
}
