/**
 * Convert a whole rig between unit systems, field by field, using the fields' kinds (field-kinds.ts, held
 * equal to the schema's) and the factors of the units module. Formatting-free: values stay unrounded.
 */
import { FIELD_KINDS } from "./field-kinds";
import type { RigInput } from "./input";
import { factor, type UnitSystem } from "./units";

type Plain = Record<string, unknown>;
/** For each key: "mass", "length", or a nested spec for a nested object. Built once from FIELD_KINDS. */
interface Spec {
  [key: string]: "mass" | "length" | Spec;
}

const SPEC: Spec = {};
for (const [path, kind] of Object.entries(FIELD_KINDS)) {
  const keys = path.split(".");
  let node = SPEC;
  for (let i = 0; i < keys.length - 1; i++) {
    const k = keys[i]!;
    const next = node[k];
    if (typeof next === "object") node = next;
    else node = node[k] = {};
  }
  node[keys[keys.length - 1]!] = kind;
}

function convertNode(node: Plain, spec: Spec, mass: number, length: number): Plain {
  const out: Plain = {};
  for (const key in node) {
    const value = node[key];
    const kind = spec[key];
    if (typeof value === "number") out[key] = kind === "mass" ? value * mass : kind === "length" ? value * length : value;
    else if (value !== null && typeof value === "object" && !Array.isArray(value))
      out[key] = convertNode(value as Plain, typeof kind === "object" ? kind : {}, mass, length);
    else out[key] = value;
  }
  return out;
}

/** The same rig expressed in `toUnits` (lb & in, or kg & mm). Returns the rig itself when already there. */
export function convertRig(rig: RigInput, toUnits: UnitSystem): RigInput {
  if (rig.units === toUnits) return rig;
  const converted = convertNode(rig as unknown as Plain, SPEC, factor("mass", rig.units, toUnits), factor("length", rig.units, toUnits));
  converted.units = toUnits;
  return converted as unknown as RigInput;
}

/** The rig in the core's canonical system (imperial: lb, in). */
export function toCanonical(rig: RigInput): RigInput {
  return convertRig(rig, "imperial");
}
