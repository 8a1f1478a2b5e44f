/**
 * One pair of the pairing matrix, pure: a vehicle's parts and a trailer's or accessory's parts composed
 * into one rig and run through the core's `evaluateRigFast`. The data layer (lib/server/fleet.ts) and `npm run bench`
 * share it, so the bench measures what the server does per pair.
 */
import { convertRig, evaluateRigFast, hitchAllowance } from "../towing/index";
import type { RigInput } from "../towing/input";
import type { CheckId, Governing, Margin, VerdictLevel } from "../towing/types";
import type { UnitString, UnitSystem } from "../towing/units";

export interface MatrixCell {
  level: VerdictLevel;
  complete: boolean;
  /** The checks whose set-up needs adjusting (a ball mount, spring bars, a raised shank), whatever the level. */
  adjust: CheckId[];
  governing?: Pick<Governing, "label" | "value" | "unit"> & { checkId: string };
  margin?: Margin;
}

/** A stored profile's own sections in the wanted units (a trailer's part carries no vehicle section to overwrite the truck's). */
export function profilePart(profile: { units: UnitSystem; data: Record<string, unknown> }, units: UnitSystem): Partial<RigInput> {
  const rig = { units: profile.units, vehicle: {}, ...profile.data } as RigInput;
  const converted = profile.units === units ? rig : convertRig(rig, units);
  const { units: _u, vehicle, ...rest } = converted as RigInput;
  return "vehicle" in profile.data ? { vehicle, ...rest } : rest;
}

/**
 * The verdict of one vehicle with one trailer or accessory, with its governing item and that item's margin, at
 * the organisation's tight threshold and front-axle loss limit.
 */
export function evaluatePair(units: UnitSystem, vehicle: Partial<RigInput>, hitched: Partial<RigInput>, tightMarginRatio: number, frontAxleLossLimit?: number): MatrixCell {
  const result = evaluateRigFast({ units, ...vehicle, ...hitched } as RigInput, { tightMarginRatio, frontAxleLossLimit });
  const governing = result.governing;
  const margin = governing ? result.checks.find((check) => check.id === governing.checkId)?.margin : undefined;
  return {
    level: result.level,
    complete: result.complete,
    adjust: result.adjust,
    governing: governing ? { label: governing.label, value: governing.value, unit: governing.unit, checkId: governing.checkId } : undefined,
    margin,
  };
}

/**
 * The most a vehicle may pull as its profile stands: the core's lowest gross trailer weight rating of the
 * vehicle and its hitch, weight-carrying (`hitchAllowance`), with the rating that sets it and the ones not on
 * record. A trailer's ball, coupler, chains, ball mount or weight distribution may lower it for a given pair;
 * the pair's own verdict says so. Undefined when neither the vehicle's nor the hitch's figure is on record.
 */
export interface VehicleCapacity {
  value: number;
  unit: UnitString;
  /** The core's words for the governing rating ("Vehicle tow rating", "Hitch label"). */
  setBy: string;
  /** The core's words for the vehicle's or hitch's rating that is not on record, so the figure may be lower. */
  missing: string[];
}

export function vehicleCapacity(units: UnitSystem, part: Partial<RigInput>): VehicleCapacity | undefined {
  const allowance = hitchAllowance({ units, vehicle: { ...part.vehicle }, hitch: { ...part.hitch } });
  const limit = allowance.weightCarrying.grossTrailerWeight;
  if (!limit.governing) return undefined;
  return { value: limit.governing.value, unit: limit.governing.unit, setBy: limit.governing.label, missing: limit.missing.map((m) => m.label) };
}

/**
 * What a trailer or accessory puts behind the vehicle, as its profile records it: a trailer's gross trailer
 * weight, an accessory's own weight with its load (the weight the core puts on the receiver). Undefined when
 * the profile lacks the figure (an accessory needs both).
 */
export interface HitchedWeight {
  value: number;
  unit: UnitString;
  basis: "gross" | "loaded";
}

export function hitchedWeight(units: UnitSystem, part: Partial<RigInput>): HitchedWeight | undefined {
  const unit: UnitString = units === "metric" ? "kg" : "lb";
  if (part.trailer) return part.trailer.grossTrailerWeight === undefined ? undefined : { value: part.trailer.grossTrailerWeight, unit, basis: "gross" };
  const a = part.accessory;
  if (!a || a.weight === undefined || a.loadWeight === undefined) return undefined;
  return { value: a.weight + a.loadWeight, unit, basis: "loaded" };
}
