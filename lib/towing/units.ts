/**
 * The one conversion module of the core. The two factors are exact by definition and written here as
 * literals, so the core ships no unit library to the browser (a unit test holds them equal to mathjs's units).
 *
 * Canonical system inside the core: imperial (lb, in). Input is converted to it at the boundary and every
 * displayed value is converted back to the rig's own system here.
 */
/** Kilograms in one pound. Exact by definition (the international yard and pound agreement of 1959). */
export const KG_PER_LB = 0.45359237;
/** Millimetres in one inch. Exact by definition (the same agreement). */
export const MM_PER_IN = 25.4;

export type UnitSystem = "imperial" | "metric";
export type Dimension = "mass" | "length";
export type WeightUnit = "lb" | "kg";
export type LengthUnit = "in" | "mm";
/** Unit strings that appear in results. */
export type UnitString = WeightUnit | LengthUnit | "%" | "°" | "kN" | "";

export interface UnitSet {
  system: UnitSystem;
  weight: WeightUnit;
  length: LengthUnit;
  /** Multiply a canonical pound value by this to get the system's weight unit. */
  weightFactor: number;
  /** Multiply a canonical inch value by this to get the system's length unit. */
  lengthFactor: number;
}

export const IMPERIAL: UnitSet = { system: "imperial", weight: "lb", length: "in", weightFactor: 1, lengthFactor: 1 };
export const METRIC: UnitSet = {
  system: "metric",
  weight: "kg",
  length: "mm",
  weightFactor: KG_PER_LB,
  lengthFactor: MM_PER_IN,
};

export function unitSet(system: UnitSystem): UnitSet {
  return system === "metric" ? METRIC : IMPERIAL;
}

/** Factor that turns a value of `dimension` in system `from` into system `to`. */
export function factor(dimension: Dimension, from: UnitSystem, to: UnitSystem): number {
  if (from === to) return 1;
  const f = dimension === "mass" ? KG_PER_LB : MM_PER_IN;
  return from === "imperial" ? f : 1 / f;
}

/** Canonical pounds → the system's weight unit. */
export function weightOut(lb: number, set: UnitSet): number {
  return lb * set.weightFactor;
}
/** Canonical inches → the system's length unit. */
export function lengthOut(inches: number, set: UnitSet): number {
  return inches * set.lengthFactor;
}
/** A weight in the system's unit → canonical pounds. */
export function weightIn(value: number, set: UnitSet): number {
  return set.weightFactor === 1 ? value : value / set.weightFactor;
}
/** A length in the system's unit → canonical inches. */
export function lengthIn(value: number, set: UnitSet): number {
  return set.lengthFactor === 1 ? value : value / set.lengthFactor;
}
