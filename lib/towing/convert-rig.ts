/**
 * Convert a whole rig between unit systems, field by field, using the kinds declared in the schema
 * (FIELD_RANGES) and the factors of the units module. Formatting-free: values stay unrounded.
 */
import { FIELD_RANGES, type RigInput } from "./input";
import { factor, type UnitSystem } from "./units";

type Plain = Record<string, unknown>;

function convertNode(node: Plain, prefix: string, mass: number, length: number): Plain {
  const out: Plain = {};
  for (const key of Object.keys(node)) {
    const value = node[key];
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof value === "number") {
      const range = FIELD_RANGES[path];
      out[key] = range?.kind === "mass" ? value * mass : range?.kind === "length" ? value * length : value;
    } else if (value !== null && typeof value === "object" && !Array.isArray(value)) {
      out[key] = convertNode(value as Plain, path, mass, length);
    } else {
      out[key] = value;
    }
  }
  return out;
}

/** The same rig expressed in `toUnits` (lb & in, or kg & mm). Returns the rig itself when already there. */
export function convertRig(rig: RigInput, toUnits: UnitSystem): RigInput {
  if (rig.units === toUnits) return rig;
  const converted = convertNode(
    rig as unknown as Plain,
    "",
    factor("mass", rig.units, toUnits),
    factor("length", rig.units, toUnits),
  );
  converted.units = toUnits;
  return converted as unknown as RigInput;
}

/** The rig in the core's canonical system (imperial: lb, in). */
export function toCanonical(rig: RigInput): RigInput {
  return convertRig(rig, "imperial");
}
