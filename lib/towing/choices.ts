/**
 * The fixed choices of the rig's input (trailer and accessory types, nominal sizes, brakes, how the trailer
 * hitches, licence categories). Plain data with no schema library, so a form can list them without loading
 * the schema; input.ts builds its enums from these and re-exports them.
 */
export const TRAILER_TYPES = [
  "utility",
  "enclosed-cargo",
  "travel",
  "boat",
  "car-hauler",
  "horse-livestock",
  "other",
] as const;
export type TrailerType = (typeof TRAILER_TYPES)[number];

export const ACCESSORY_TYPES = ["platform-rack", "hanging-rack", "cargo-carrier", "other"] as const;
export type AccessoryType = (typeof ACCESSORY_TYPES)[number];

/** Nominal receiver openings, in inches as the trade names them in either unit system. */
export const RECEIVER_SIZES = ["1-1/4", "2", "2-1/2", "3"] as const;
/** Nominal hitch-ball diameters, in inches as stamped. */
export const BALL_SIZES = ["1-7/8", "2", "2-5/16", "3"] as const;
/** Nominal ball shank diameters (and the ball mount holes they go through), in inches as the trade names them. */
export const SHANK_SIZES = ["3/4", "1", "1-1/4"] as const;
export type ShankSize = (typeof SHANK_SIZES)[number];
/** Nominal hitch pin diameters, in inches as the trade names them. */
export const PIN_SIZES = ["1/2", "5/8"] as const;
export type PinSize = (typeof PIN_SIZES)[number];
export const BRAKE_TYPES = ["none", "surge", "electric", "other"] as const;
/**
 * How the trailer hitches: a ball coupler on a ball mount in the receiver behind the bumper, or a hitch in the
 * bed over or ahead of the rear axle (a fifth wheel takes a kingpin, a gooseneck a ball). Not given: receiver.
 */
export const HITCH_TYPES = ["receiver", "fifth-wheel", "gooseneck"] as const;
export type HitchType = (typeof HITCH_TYPES)[number];
/**
 * Driving-licence categories the local rules know (Great Britain and the EU): B (a car), B with code 96, BE.
 * "other" is any other licence: the rules say "check the licence" for it.
 */
export const LICENCE_CATEGORIES = ["B", "B96", "BE", "other"] as const;
export type LicenceCategory = (typeof LICENCE_CATEGORIES)[number];

