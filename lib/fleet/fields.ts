/**
 * The fields of each kind of fleet profile: where each sits in the core's rig input, its CSV column and its
 * label. One list drives the forms, the CSV template, the import mapping and the export, so they never drift.
 * Pure: no server code, no React.
 */
import { ACCESSORY_TYPES, BALL_SIZES, BRAKE_TYPES, FIELD_RANGES, HITCH_TYPES, PIN_SIZES, RECEIVER_SIZES, SHANK_SIZES, TRAILER_TYPES } from "../towing/input";

export const PROFILE_KINDS = ["vehicles", "trailers", "accessories"] as const;
export type ProfileKind = (typeof PROFILE_KINDS)[number];

export const KIND_WORDS: Record<ProfileKind, { one: string; many: string; title: string }> = {
  vehicles: { one: "vehicle", many: "vehicles", title: "Vehicles" },
  trailers: { one: "trailer", many: "trailers", title: "Trailers" },
  accessories: { one: "accessory", many: "accessories", title: "Accessories" },
};

export function isProfileKind(value: unknown): value is ProfileKind {
  return typeof value === "string" && (PROFILE_KINDS as readonly string[]).includes(value);
}

export type FieldType = "number" | "integer" | "choice" | "yes-no";

export interface ProfileField {
  /** Dotted path inside the rig input, e.g. "vehicle.gvwr". */
  path: string;
  /** The CSV column. */
  column: string;
  label: string;
  type: FieldType;
  /** "mass", "length", "angle", "percent" for numbers (their unit follows the file's or profile's units). */
  measure?: "mass" | "length" | "angle" | "percent" | "force";
  choices?: readonly string[];
  /** Where the figure is found or how it is measured (forms show it as help). */
  help?: string;
  /** A group shown together on the form. */
  group: string;
}

const num = (path: string, column: string, group: string, help?: string): ProfileField => {
  const range = FIELD_RANGES[path];
  if (!range) throw new Error(`No range for ${path}`);
  return { path, column, label: range.label, type: "number", measure: range.kind, group, help };
};

const choice = (path: string, column: string, label: string, choices: readonly string[], group: string): ProfileField => ({
  path,
  column,
  label,
  type: "choice",
  choices,
  group,
});

export const VEHICLE_FIELDS: ProfileField[] = [
  num("vehicle.gvwr", "gvwr", "Ratings", "On the door-jamb label."),
  num("vehicle.gawrFront", "gawr_front", "Ratings", "On the door-jamb label."),
  num("vehicle.gawrRear", "gawr_rear", "Ratings", "On the door-jamb label."),
  num("vehicle.gcwr", "gcwr", "Ratings", "In the owner's manual or the maker's towing table."),
  num("vehicle.towRating", "tow_max", "Ratings", "The maker's weight-carrying figure for this exact configuration; no part can raise it."),
  num("vehicle.towRatingWd", "tow_max_wd", "Ratings", "The maker's figure with weight distribution, if it gives one."),
  num("vehicle.tongueWeightLimit", "tongue_max", "Ratings", "Owner's manual, towing section."),
  num("vehicle.tongueWeightLimitWd", "tongue_max_wd", "Ratings"),
  num("vehicle.towRatingBed", "tow_max_bed_hitch", "Ratings", "The maker's figure for a fifth wheel or gooseneck, where it gives one apart from the conventional figure."),
  num("vehicle.towRatingUnbraked", "tow_max_unbraked", "Ratings", "The maker's figure for a trailer without brakes; a limit whenever the trailer has none."),
  num("vehicle.tyreLoadFront", "tyre_load_front", "Tyres", "Each front tyre's maximum load, moulded on its sidewall."),
  num("vehicle.tyreLoadRear", "tyre_load_rear", "Tyres", "Each rear tyre's maximum load, moulded on its sidewall."),
  { path: "vehicle.dualRearWheels", column: "dual_rear_wheels", label: "Dual rear wheels", type: "yes-no", group: "Tyres", help: "Four tyres on the rear axle." },
  num("vehicle.wdRequiredAbove", "wd_needed_above", "Ratings", "The trailer weight above which the maker requires weight distribution."),
  num("vehicle.curbWeight", "curb_weight", "Weights", "Weighed empty with a full tank, or the maker's figure."),
  num("vehicle.payloadLabel", "payload_on_label", "Weights", "The tire and loading label's \"combined weight of occupants and cargo\"."),
  num("vehicle.axleWeights.front", "weighed_front", "Weights", "Weighed unhitched, loaded as it travels."),
  num("vehicle.axleWeights.rear", "weighed_rear", "Weights", "Weighed unhitched, loaded as it travels."),
  num("vehicle.wheelbase", "wheelbase", "Measurements", "Centre of the front wheel to centre of the rear wheel."),
  num("vehicle.rearAxleToPin", "axle_to_pin", "Measurements", "Rear axle centre to the receiver pin hole, along the ground: the installer's figure after fitting. The ball mount's length and any extender are added to reach the ball."),
  num("vehicle.rearAxleToBedHitch", "axle_to_bed_hitch", "Measurements", "Fifth wheel or gooseneck only: rear axle centre to the kingpin's or ball's centre, along the ground; negative when it sits ahead of the axle."),
  num("vehicle.departureAngle", "departure_angle", "Measurements", "Owner's manual, dimensions page (the angle as 49 CFR 523.2 defines it)."),
  { path: "hitch.class", column: "hitch_class", label: "Hitch class", type: "integer", choices: ["1", "2", "3", "4", "5"], group: "Hitch", help: "On the hitch's label. The class sets a ceiling; the label's own rating governs (\"Class 5\" is trade usage)." },
  choice("hitch.receiverSize", "receiver_opening", "Receiver size (in)", RECEIVER_SIZES, "Hitch"),
  choice("hitch.pinDiameter", "hitch_pin", "Hitch pin (in)", PIN_SIZES, "Hitch"),
  num("hitch.gtwRating", "hitch_gtw", "Hitch", "On the hitch's own label."),
  num("hitch.twRating", "hitch_tw", "Hitch", "On the hitch's own label."),
  num("hitch.gtwRatingWd", "hitch_gtw_wd", "Hitch"),
  num("hitch.twRatingWd", "hitch_tw_wd", "Hitch"),
  num("hitch.bedGtwRating", "bed_hitch_gtw", "Hitch", "The fifth wheel's or gooseneck's own label."),
  num("hitch.bedPinRating", "bed_hitch_pin", "Hitch", "The fifth wheel's or gooseneck's own label: the vertical (pin) load."),
  num("hitch.receiverHeight", "receiver_height", "Hitch", "Measured after fitting: ground to the top inside of the opening, loaded."),
  num("hitch.pinToFascia", "pin_to_fascia", "Hitch", "Measured after fitting: pin hole to the outermost point of the bumper."),
  num("load.occupants", "usual_occupants", "Usual load"),
  num("load.cargo", "usual_cargo", "Usual load"),
  num("load.hitchHardware", "hitch_hardware", "Usual load", "Ball mount, bars and anything else fitted at the hitch."),
];

export const TRAILER_FIELDS: ProfileField[] = [
  choice("trailer.type", "trailer_kind", "Trailer type", TRAILER_TYPES, "Trailer"),
  { ...choice("trailer.hitchType", "hitched_by", "Hitched by", HITCH_TYPES, "Trailer"), help: "receiver (a ball mount in the receiver, when not given), fifth-wheel or gooseneck." },
  num("trailer.grossTrailerWeight", "gross_weight", "Trailer", "Weighed loaded, or the trailer's own GVWR when unknown."),
  num("trailer.tongueWeight", "tongue_weight", "Trailer", "Weighed at the coupler, loaded."),
  choice("trailer.tongueWeightBasis", "tongue_weight_basis", "Tongue weight basis", ["measured", "estimated"], "Trailer"),
  num("trailer.couplerHeight", "coupler_height", "Coupler", "Ground to the bottom of the coupler, trailer level."),
  num("trailer.couplerRating", "coupler_rating", "Coupler"),
  choice("trailer.couplerBallSize", "coupler_ball", "Coupler ball size (in)", BALL_SIZES, "Coupler"),
  choice("trailer.ballSize", "ball_size", "Ball size (in)", BALL_SIZES, "Coupler"),
  num("trailer.ballRating", "ball_rating", "Coupler"),
  choice("trailer.ballShankSize", "ball_shank", "Ball shank (in)", SHANK_SIZES, "Coupler"),
  choice("trailer.brakes", "brakes", "Brakes", BRAKE_TYPES, "Trailer"),
  num("trailer.safetyChainRating", "chain_rating", "Coupler"),
  num("trailer.mam", "trailer_gvwr", "Trailer's plate", "The trailer's GVWR (plated maximum mass)."),
  num("trailer.axleRating", "axle_rating", "Trailer's plate", "Each axle's rating (GAWR), from the trailer's plate."),
  { path: "trailer.axleCount", column: "axles", label: "Trailer axles", type: "integer", choices: ["1", "2", "3", "4"], group: "Trailer's plate" },
  num("trailer.tyreLoad", "tyre_load", "Trailer's plate", "Each trailer tyre's maximum load, moulded on its sidewall."),
  num("ballMount.gtwRating", "mount_gtw", "Ball mount"),
  num("ballMount.twRating", "mount_tw", "Ball mount"),
  num("ballMount.drop", "mount_drop", "Ball mount", "Top of the shank down to the top of the ball platform; negative for a rise."),
  num("ballMount.length", "mount_length", "Ball mount"),
  choice("ballMount.holeSize", "mount_hole", "Ball mount hole (in)", SHANK_SIZES, "Ball mount"),
  { path: "weightDistribution.used", column: "wd_fitted", label: "Weight distribution used", type: "yes-no", group: "Weight distribution" },
  num("weightDistribution.tongueRating", "wd_tongue_rating", "Weight distribution", "Label on the spring bars or head."),
];

export const ACCESSORY_FIELDS: ProfileField[] = [
  choice("accessory.type", "accessory_kind", "Accessory type", ACCESSORY_TYPES, "Accessory"),
  num("accessory.weight", "own_weight", "Accessory"),
  num("accessory.loadWeight", "load_weight", "Accessory"),
  num("accessory.loadCenterFromPin", "load_centre_from_pin", "Accessory"),
  num("accessory.foldClearance", "fold_clearance", "Fit"),
  num("accessory.lowestPointBelowShankTop", "lowest_below_shank", "Fit"),
  num("accessory.lowestPointBehindPin", "lowest_behind_pin", "Fit"),
  num("accessory.shankRise", "shank_rise", "Fit", "Negative for a drop. More shank rise often lowers the rack maker's rating and can hide the lights or the number plate."),
  num("extender.length", "extender_length", "Extender"),
  num("extender.twRating", "extender_tw", "Extender", "The extender's own label; often far below the hitch's."),
];

export const FIELDS_BY_KIND: Record<ProfileKind, ProfileField[]> = {
  vehicles: VEHICLE_FIELDS,
  trailers: TRAILER_FIELDS,
  accessories: ACCESSORY_FIELDS,
};

/** The sections of the rig input each kind of profile holds. */
export const SECTIONS_BY_KIND: Record<ProfileKind, readonly string[]> = {
  vehicles: ["vehicle", "hitch", "load"],
  trailers: ["trailer", "ballMount", "weightDistribution"],
  accessories: ["accessory", "extender"],
};

export function unitFor(field: ProfileField, units: "imperial" | "metric"): string {
  if (field.measure === "mass") return units === "metric" ? "kg" : "lb";
  if (field.measure === "length") return units === "metric" ? "mm" : "in";
  if (field.measure === "angle") return "°";
  if (field.measure === "percent") return "%";
  return "";
}

function setPath(target: Record<string, unknown>, path: string, value: unknown) {
  const keys = path.split(".");
  let node = target;
  for (const key of keys.slice(0, -1)) {
    if (typeof node[key] !== "object" || node[key] === null) node[key] = {};
    node = node[key] as Record<string, unknown>;
  }
  node[keys[keys.length - 1]!] = value;
}

export function getPath(source: unknown, path: string): unknown {
  let node = source;
  for (const key of path.split(".")) {
    if (typeof node !== "object" || node === null) return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  return node;
}

/**
 * Typed text to a field's value: numbers as numbers (a comma as thousands separator is allowed), "" as
 * absent, yes/no as a boolean. What does not read is passed on as text so the schema names the field.
 */
export function readValue(field: ProfileField, raw: unknown): unknown {
  if (raw === undefined || raw === null) return undefined;
  if (typeof raw !== "string") return raw;
  const text = raw.trim();
  if (text === "") return undefined;
  if (field.type === "number" || field.type === "integer") {
    const cleaned = text.replace(/(\d),(?=\d{3}\b)/g, "$1");
    const value = Number(cleaned);
    return Number.isFinite(value) && /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(cleaned) ? value : text;
  }
  if (field.type === "yes-no") {
    const lower = text.toLowerCase();
    if (["yes", "y", "true", "1", "on"].includes(lower)) return true;
    if (["no", "n", "false", "0", "off"].includes(lower)) return false;
    return text;
  }
  return text;
}

/**
 * A profile's parts from a flat or nested set of typed values (a form's or a CSV row's): every known field
 * read with `readValue`, empty sections left out. The result still goes through the shared zod schema.
 */
export function buildProfileData(kind: ProfileKind, values: (path: string) => unknown): Record<string, unknown> {
  const data: Record<string, unknown> = {};
  for (const field of FIELDS_BY_KIND[kind]) {
    const value = readValue(field, values(field.path));
    if (value !== undefined) setPath(data, field.path, value);
  }
  // A weight-distribution section needs its "used" answer; a rating alone means it is fitted.
  const wd = data.weightDistribution as Record<string, unknown> | undefined;
  if (wd && wd.used === undefined) wd.used = true;
  // A vehicle with no figures yet is still a vehicle: the checks will list what to measure.
  if (kind === "vehicles") data.vehicle ??= {};
  return data;
}

/** A profile's stored parts back to text for a form or a CSV cell. */
export function profileValueText(field: ProfileField, data: unknown): string {
  const value = getPath(data, field.path);
  if (value === undefined || value === null) return "";
  if (typeof value === "boolean") return value ? "yes" : "no";
  return String(value);
}
