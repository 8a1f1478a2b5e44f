/**
 * The workbench's form model: what react-hook-form holds, how typed text becomes a number, and how the held
 * values become a rig the schema can parse. Pure functions, no React, so the tests and the form share them.
 */
import type { RigInput } from "@/lib/towing";
import { convertRig } from "@/lib/towing/convert-rig";
import { FIELD_KINDS } from "@/lib/towing/field-kinds";
import { KG_PER_LB, MM_PER_IN, type UnitSystem } from "@/lib/towing/units";
import { formatNumber } from "@/lib/format";

type DeepPartial<T> = { [K in keyof T]?: NonNullable<T[K]> extends object ? DeepPartial<NonNullable<T[K]>> : T[K] };

/** What the hitched card carries. */
export type HitchedKind = "trailer" | "accessory";

/**
 * The form holds a trailer and an accessory side by side, so switching the segmented choice back and forth
 * keeps what was typed; only the chosen one goes into the rig.
 */
export type RigFormValues = Omit<DeepPartial<RigInput>, "units"> & { units: UnitSystem };

const MINUS = "\u2212";

/**
 * Typed text → a number, "" → undefined (not given), anything unreadable → NaN (the schema then names the
 * field). Accepts thousands separators ("5,000"), a true minus sign and a decimal comma ("3,5").
 */
export function parseTyped(value: unknown): number | undefined {
  if (typeof value === "number") return value;
  if (value === undefined || value === null) return undefined;
  let text = String(value).trim().replace(/[\s\u00a0\u202f]/g, "").replace(MINUS, "-");
  if (text === "") return undefined;
  if (/^-?\d{1,3}(,\d{3})+(\.\d+)?$/.test(text)) text = text.replace(/,/g, "");
  else if (/^-?\d*,\d+$/.test(text)) text = text.replace(",", ".");
  if (!/^-?(\d+\.?\d*|\.\d+)$/.test(text)) return Number.NaN;
  return Number(text);
}

/** "" → undefined for selects; other values pass. */
export function optionalChoice(value: unknown): string | undefined {
  return value === "" || value === undefined || value === null ? undefined : String(value);
}

type Plain = Record<string, unknown>;

function isPlain(value: unknown): value is Plain {
  return value !== null && typeof value === "object" && !Array.isArray(value);
}

/** Drop undefined keys and empty optional groups, so a group the staff left blank reads "not given". */
function prune(node: Plain): Plain | undefined {
  const out: Plain = {};
  let any = false;
  for (const [key, value] of Object.entries(node)) {
    if (value === undefined || value === null || value === "") continue;
    if (isPlain(value)) {
      const inner = prune(value);
      if (inner) {
        out[key] = inner;
        any = true;
      }
      continue;
    }
    out[key] = value;
    any = true;
  }
  return any ? out : undefined;
}

/**
 * The values as the schema should see them: only the chosen hitched item, empty groups removed, a weight
 * distribution group kept only when it says something.
 */
export function toRigCandidate(values: RigFormValues, kind: HitchedKind): unknown {
  const v = values as unknown as Plain;
  const out: Plain = { units: values.units };
  if (typeof v.name === "string" && v.name.trim() !== "") out.name = v.name;
  out.vehicle = (isPlain(v.vehicle) && prune(v.vehicle)) || {};
  for (const key of ["hitch", "load", "extender", "driver"] as const) {
    const group = isPlain(v[key]) ? prune(v[key] as Plain) : undefined;
    if (group) out[key] = group;
  }
  // A receiver adapter or a reducer sleeve is in the rig when its box is ticked or a rating is typed.
  const fitted = (key: "receiverAdapter" | "ballSleeve") => {
    const group = isPlain(v[key]) ? prune(v[key] as Plain) : undefined;
    if (!group) return;
    const { fitted: ticked, ...ratings } = group;
    if (ticked === true || Object.keys(ratings).length) out[key] = ratings;
  };
  if (kind === "trailer") {
    const trailer = isPlain(v.trailer) ? prune(v.trailer) : undefined;
    out.trailer = { type: "travel", ...trailer };
    // A fifth wheel or gooseneck has no ball mount, extender or weight distribution: what was typed for a
    // receiver stays in the form (switching back keeps it) but does not go into the rig.
    const bed = trailer?.hitchType === "fifth-wheel" || trailer?.hitchType === "gooseneck";
    if (bed) delete out.extender;
    else {
      fitted("receiverAdapter");
      fitted("ballSleeve");
    }
    const mount = !bed && isPlain(v.ballMount) ? prune(v.ballMount) : undefined;
    if (mount) out.ballMount = mount;
    const wd = !bed && isPlain(v.weightDistribution) ? prune(v.weightDistribution) : undefined;
    // An unticked box alone says nothing; with figures beside it, it says "measured, not used".
    if (wd && !(Object.keys(wd).length === 1 && wd.used === false)) out.weightDistribution = { used: false, ...wd };
  } else {
    const accessory = isPlain(v.accessory) ? prune(v.accessory) : undefined;
    out.accessory = { type: "platform-rack", ...accessory };
    fitted("receiverAdapter");
  }
  return out;
}

/** Round a converted figure to what the screen shows for its unit, through the one formatting module. */
function roundForEntry(value: number, unit: string): number {
  const parsed = parseTyped(formatNumber(value, unit));
  return parsed === undefined || Number.isNaN(parsed) ? value : parsed;
}

/**
 * One typed figure in the other unit system, rounded as entered figures are (the fleet profile form's unit
 * switch). Angles and shares pass unchanged; text that is not a number stays as typed for its field error.
 */
export function convertTypedFigure(text: string, measure: string, to: UnitSystem): string {
  if (measure !== "mass" && measure !== "length") return text;
  const value = parseTyped(text);
  if (value === undefined || Number.isNaN(value)) return text;
  const factor = measure === "mass" ? KG_PER_LB : MM_PER_IN;
  const converted = to === "metric" ? value * factor : value / factor;
  const unit = measure === "mass" ? (to === "metric" ? "kg" : "lb") : to === "metric" ? "mm" : "in";
  return String(roundForEntry(converted, unit));
}

function roundTree(node: Plain, prefix: string, units: UnitSystem): Plain {
  const out: Plain = {};
  for (const [key, value] of Object.entries(node)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof value === "number" && Number.isFinite(value)) {
      const kind = FIELD_KINDS[path];
      const unit = kind === "mass" ? (units === "metric" ? "kg" : "lb") : kind === "length" ? (units === "metric" ? "mm" : "in") : "%";
      out[key] = kind ? roundForEntry(value, unit) : value;
    } else if (typeof value === "number") {
      // Unreadable text cannot be converted; the field starts empty again.
      out[key] = undefined;
    } else if (isPlain(value)) out[key] = roundTree(value, path, units);
    else out[key] = value;
  }
  return out;
}

/**
 * The whole form (trailer and accessory both) in another unit system, rounded as entered figures are: whole
 * pounds, kilograms and millimetres, tenths of an inch.
 */
export function convertFormValues(values: RigFormValues, to: UnitSystem): RigFormValues {
  if (values.units === to) return values;
  const converted = convertRig(values as unknown as RigInput, to) as unknown as Plain;
  return roundTree(converted, "", to) as unknown as RigFormValues;
}

/** A rig (or part of one, from a profile) in the form's units and shape, rounded for entry. */
export function rigPartForForm<T extends Partial<RigInput> & { units: UnitSystem }>(part: T, to: UnitSystem): Plain {
  const base = { vehicle: {}, ...part } as unknown as RigInput;
  const converted = convertRig(base, to) as unknown as Plain;
  return part.units === to ? (converted as Plain) : roundTree(converted, "", to);
}

/** Every group present, so each registered input has a place to live. */
export function emptyFormValues(units: UnitSystem): RigFormValues {
  return {
    units,
    vehicle: {},
    hitch: {},
    load: {},
    trailer: { type: "travel" },
    ballMount: {},
    extender: {},
    receiverAdapter: {},
    ballSleeve: {},
    weightDistribution: { used: false },
    accessory: { type: "platform-rack" },
    driver: {},
  };
}

/** A rig as the form's starting values, in `units`. */
export function formValuesFromRig(rig: RigInput | undefined, units: UnitSystem): RigFormValues {
  const empty = emptyFormValues(units);
  if (!rig) return empty;
  const converted = rigPartForForm(rig, units) as Plain;
  // A part the rig carries shows as fitted, its ratings typed or not.
  for (const key of ["receiverAdapter", "ballSleeve"]) if (isPlain(converted[key])) converted[key] = { ...(converted[key] as Plain), fitted: true };
  return mergeForm(empty, converted);
}

/** Overlay `part` on `values` group by group (a profile fills its groups and leaves the rest). */
export function mergeForm(values: RigFormValues, part: Plain): RigFormValues {
  const out: Plain = { ...(values as unknown as Plain) };
  for (const [key, value] of Object.entries(part)) {
    if (key === "units") continue;
    out[key] = isPlain(value) ? { ...(isPlain(out[key]) ? (out[key] as Plain) : {}), ...value } : value;
  }
  return out as unknown as RigFormValues;
}

/** Replace whole groups (a profile's vehicle replaces the vehicle, blanks included). */
export function replaceGroups(values: RigFormValues, part: Plain, groups: readonly string[]): RigFormValues {
  const out: Plain = { ...(values as unknown as Plain) };
  for (const g of groups) {
    const value = part[g];
    const base = (emptyFormValues(values.units) as unknown as Plain)[g];
    out[g] = { ...(isPlain(base) ? base : {}), ...(isPlain(value) ? value : {}) };
  }
  return out as unknown as RigFormValues;
}

/** Which card holds a field, for jumping to it from the verdict's list of invalid fields. */
export type CardId = "vehicle" | "hitch" | "hitched" | "wd";

/** The vehicle's and the hitch's figures that sit in the weight-distribution card, with its own. */
const WD_CARD_FIELDS = new Set(["vehicle.towRatingWd", "vehicle.tongueWeightLimitWd", "vehicle.wdRequiredAbove", "hitch.gtwRatingWd", "hitch.twRatingWd"]);

export function cardOf(path: string): CardId {
  const head = path.split(".")[0];
  if (head === "weightDistribution" || WD_CARD_FIELDS.has(path)) return "wd";
  if (head === "vehicle" || head === "load") return "vehicle";
  if (head === "hitch" || head === "ballMount" || head === "extender" || head === "receiverAdapter" || head === "ballSleeve") return "hitch";
  return "hitched";
}
