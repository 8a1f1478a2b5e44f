/**
 * One pair of the pairing matrix, pure: a vehicle's parts and a trailer's or accessory's parts composed
 * into one rig and run through the core's `evaluateRigFast`. The data layer (lib/server/fleet.ts) and `npm run bench`
 * share it, so the bench measures what the server does per pair.
 */
import { convertRig, evaluateRigFast } from "../towing/index";
import type { RigInput } from "../towing/input";
import type { CheckId, Governing, Margin, VerdictLevel } from "../towing/types";
import type { UnitSystem } from "../towing/units";

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
