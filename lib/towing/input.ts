/**
 * The rig as typed by staff or sent to the API: zod schemas shared by forms, route handlers and the core.
 *
 * Every weight is in lb (imperial) or kg (metric) and every length in in or mm, as the rig's `units` says.
 * Ranges are written once in imperial and converted for metric through the units module, so one rig is
 * valid in both systems. Every field except `units`, the trailer's and the accessory's `type` is optional:
 * a check that needs a missing field reports "incomplete" and says what to measure.
 */
import { z } from "zod";
import { ACCESSORY_TYPES, BALL_SIZES, BRAKE_TYPES, HITCH_TYPES, LICENCE_CATEGORIES, PIN_SIZES, RECEIVER_SIZES, SHANK_SIZES, TRAILER_TYPES } from "./choices";
import { KG_PER_LB, MM_PER_IN, type UnitSystem } from "./units";

export {
  ACCESSORY_TYPES,
  BALL_SIZES,
  BRAKE_TYPES,
  HITCH_TYPES,
  LICENCE_CATEGORIES,
  PIN_SIZES,
  RECEIVER_SIZES,
  SHANK_SIZES,
  TRAILER_TYPES,
  type AccessoryType,
  type HitchType,
  type LicenceCategory,
  type PinSize,
  type ShankSize,
  type TrailerType,
} from "./choices";

/** "force" is a coupling's D value in kN, the same in both unit systems. */
type Kind = "mass" | "length" | "angle" | "percent" | "force";

interface Range {
  kind: Kind;
  /** Bounds in imperial (lb, in), degrees or percent. */
  min: number;
  max: number;
}

/** Valid range and unit of every numeric field, by dotted path. Used by the schema and the docs. */
export const FIELD_RANGES: Record<string, Range & { label: string }> = {};

function unitOf(kind: Kind, units: UnitSystem): string {
  if (kind === "mass") return units === "metric" ? "kg" : "lb";
  if (kind === "length") return units === "metric" ? "mm" : "in";
  if (kind === "force") return "kN";
  return kind === "angle" ? "°" : "%";
}

function scaleOf(kind: Kind, units: UnitSystem): number {
  if (units === "imperial") return 1;
  if (kind === "mass") return KG_PER_LB;
  if (kind === "length") return MM_PER_IN;
  return 1;
}

function show(n: number): string {
  const r = Math.round(n * 10) / 10;
  return String(r);
}

function field(units: UnitSystem, path: string, label: string, kind: Kind, min: number, max: number) {
  FIELD_RANGES[path] = { kind, min, max, label };
  const s = scaleOf(kind, units);
  const lo = min * s;
  const hi = max * s;
  const u = unitOf(kind, units);
  return z
    .number({ error: `${label}: enter a number in ${u}.` })
    .min(lo, { error: `${label} must be at least ${show(lo)} ${u}.` })
    .max(hi, { error: `${label} must be at most ${show(hi)} ${u}.` })
    .optional();
}

function req<T extends z.ZodType>(schema: z.ZodOptional<T>): T {
  return schema.unwrap();
}

function rigShape<U extends UnitSystem>(units: U) {
  const m = (path: string, label: string, min: number, max: number) => field(units, path, label, "mass", min, max);
  const l = (path: string, label: string, min: number, max: number) => field(units, path, label, "length", min, max);
  const axlePair = (path: string, label: string) =>
    z
      .object({
        front: req(m(`${path}.front`, `${label}, front axle`, 100, 30000)),
        rear: req(m(`${path}.rear`, `${label}, rear axle`, 100, 30000)),
      })
      .optional();

  return z.object({
    units: z.literal(units),
    /** Free text the shop gives the rig; not used in any check. */
    name: z.string().max(200).optional(),
    vehicle: z.object({
      towRating: m("vehicle.towRating", "Tow rating (weight-carrying)", 0, 40000),
      towRatingWd: m("vehicle.towRatingWd", "Tow rating with weight distribution", 0, 40000),
      tongueWeightLimit: m("vehicle.tongueWeightLimit", "Vehicle tongue-weight limit", 0, 6000),
      tongueWeightLimitWd: m("vehicle.tongueWeightLimitWd", "Vehicle tongue-weight limit with weight distribution", 0, 6000),
      gvwr: m("vehicle.gvwr", "GVWR", 1000, 40000),
      curbWeight: m("vehicle.curbWeight", "Curb weight", 500, 40000),
      payloadLabel: m("vehicle.payloadLabel", "Payload on the label", 0, 20000),
      gcwr: m("vehicle.gcwr", "GCWR", 1000, 80000),
      gawrFront: m("vehicle.gawrFront", "Front GAWR", 300, 30000),
      gawrRear: m("vehicle.gawrRear", "Rear GAWR", 300, 30000),
      axleWeights: axlePair("vehicle.axleWeights", "Weighed axle load, unhitched and loaded"),
      axleWeightsHitched: axlePair("vehicle.axleWeightsHitched", "Weighed axle load, hitched"),
      wheelbase: l("vehicle.wheelbase", "Wheelbase", 40, 300),
      rearAxleToPin: l("vehicle.rearAxleToPin", "Rear axle to receiver pin hole", 10, 200),
      /**
       * Older inputs: rear axle to the ball as measured (to the pin for an accessory). parseRig turns it into
       * rearAxleToPin where it can; a trailer rig whose ball mount length is unknown keeps it as the ball's figure.
       */
      rearAxleToHitch: l("vehicle.rearAxleToHitch", "Rear axle to ball (older inputs)", 10, 200),
      /**
       * Rear axle centre to the bed hitch's centre (the kingpin's or the gooseneck ball's), along the ground:
       * positive behind the axle, negative ahead of it, zero straight over it.
       */
      rearAxleToBedHitch: l("vehicle.rearAxleToBedHitch", "Rear axle to the bed hitch (negative: ahead of the axle)", -60, 60),
      /** The maker's tow rating for a fifth wheel or gooseneck, where it gives one apart from the conventional figure. */
      towRatingBed: m("vehicle.towRatingBed", "Tow rating for a fifth wheel or gooseneck", 0, 40000),
      /** The maker's tow rating for a trailer without brakes: a link whenever `trailer.brakes` is "none". */
      towRatingUnbraked: m("vehicle.towRatingUnbraked", "Tow rating for a trailer without brakes", 0, 40000),
      /** Each front tyre's maximum load (the figure on its sidewall); the front axle has two. */
      tyreLoadFront: m("vehicle.tyreLoadFront", "Front tyre load capacity (each tyre)", 200, 10000),
      /** Each rear tyre's maximum load; the rear axle has two, or four with `dualRearWheels`. */
      tyreLoadRear: m("vehicle.tyreLoadRear", "Rear tyre load capacity (each tyre)", 200, 10000),
      dualRearWheels: z.boolean({ error: "Dual rear wheels: yes or no." }).optional(),
      wdRequiredAbove: m("vehicle.wdRequiredAbove", "Weight distribution required above", 0, 40000),
      departureAngle: field(units, "vehicle.departureAngle", "Departure angle", "angle", 1, 60),
      tongueShareBand: z
        .object({
          min: req(field(units, "vehicle.tongueShareBand.min", "Lowest tongue-weight share", "percent", 1, 30)),
          max: req(field(units, "vehicle.tongueShareBand.max", "Highest tongue-weight share", "percent", 1, 40)),
        })
        .refine((b) => b.min < b.max, { error: "The lowest share must be below the highest.", path: ["max"] })
        .optional(),
    }),
    hitch: z
      .object({
        class: z
          .number({ error: "Hitch class: enter 1 to 5." })
          .int({ error: "Hitch class: enter a whole number from 1 to 5." })
          .min(1, { error: "Hitch class: enter 1 to 5." })
          .max(5, { error: "Hitch class: enter 1 to 5." })
          .optional(),
        receiverSize: z.enum(RECEIVER_SIZES, { error: "Receiver size: choose 1-1/4, 2, 2-1/2 or 3 in." }).optional(),
        pinDiameter: z.enum(PIN_SIZES, { error: "Hitch pin: choose 1/2 or 5/8 in." }).optional(),
        gtwRating: m("hitch.gtwRating", "Hitch gross trailer weight rating", 0, 40000),
        twRating: m("hitch.twRating", "Hitch tongue weight rating", 0, 6000),
        gtwRatingWd: m("hitch.gtwRatingWd", "Hitch gross trailer weight rating with weight distribution", 0, 40000),
        twRatingWd: m("hitch.twRatingWd", "Hitch tongue weight rating with weight distribution", 0, 6000),
        receiverHeight: l("hitch.receiverHeight", "Receiver height", 4, 40),
        pinToFascia: l("hitch.pinToFascia", "Pin hole to fascia", 0, 24),
        dValue: field(units, "hitch.dValue", "Tow bar D value", "force", 1, 200),
        sValue: m("hitch.sValue", "Tow ball S value (static vertical load)", 0, 6000),
        bedGtwRating: m("hitch.bedGtwRating", "Bed hitch gross trailer weight rating", 0, 40000),
        bedPinRating: m("hitch.bedPinRating", "Bed hitch pin weight rating", 0, 10000),
      })
      .optional(),
    trailer: z
      .object({
        type: z.enum(TRAILER_TYPES, { error: "Trailer type: choose one from the list." }),
        hitchType: z.enum(HITCH_TYPES, { error: "Hitched by: choose a receiver, a fifth wheel or a gooseneck." }).optional(),
        grossTrailerWeight: m("trailer.grossTrailerWeight", "Gross trailer weight", 50, 30000),
        tongueWeight: m("trailer.tongueWeight", "Tongue weight", 0, 10000),
        tongueWeightBasis: z.enum(["measured", "estimated"]).optional(),
        tongueMeasurement: z
          .object({
            scaleReading: req(m("trailer.tongueMeasurement.scaleReading", "Scale reading", 0, 6000)),
            blockToJack: l("trailer.tongueMeasurement.blockToJack", "Block to jack", 1, 120),
            jackToScale: l("trailer.tongueMeasurement.jackToScale", "Jack to scale", 0, 120),
          })
          .optional(),
        couplerHeight: l("trailer.couplerHeight", "Coupler height", 4, 40),
        couplerRating: m("trailer.couplerRating", "Coupler rating", 0, 40000),
        couplerBallSize: z.enum(BALL_SIZES, { error: "Coupler ball size: choose one from the list." }).optional(),
        ballSize: z.enum(BALL_SIZES, { error: "Ball size: choose one from the list." }).optional(),
        ballRating: m("trailer.ballRating", "Ball rating", 0, 40000),
        ballShankSize: z.enum(SHANK_SIZES, { error: "Ball shank: choose 3/4, 1 or 1-1/4 in." }).optional(),
        brakes: z.enum(BRAKE_TYPES, { error: "Brakes: choose one from the list." }).optional(),
        safetyChainRating: m("trailer.safetyChainRating", "Safety chain rating (each chain)", 0, 60000),
        mam: m("trailer.mam", "Trailer's plated maximum mass", 50, 30000),
        /** Each axle's own rating (GAWR), from the trailer's label. */
        axleRating: m("trailer.axleRating", "Trailer axle rating (each axle)", 100, 20000),
        axleCount: z
          .number({ error: "Trailer axles: enter 1 to 4." })
          .int({ error: "Trailer axles: enter a whole number from 1 to 4." })
          .min(1, { error: "Trailer axles: enter 1 to 4." })
          .max(4, { error: "Trailer axles: enter 1 to 4." })
          .optional(),
        /** Each trailer tyre's maximum load; two tyres per axle. */
        tyreLoad: m("trailer.tyreLoad", "Trailer tyre load capacity (each tyre)", 200, 10000),
        brakesAllWheels: z.boolean({ error: "Brakes on every wheel: yes or no." }).optional(),
        breakaway: z.boolean({ error: "Breakaway device: yes or no." }).optional(),
        couplingDValue: field(units, "trailer.couplingDValue", "Coupling head D value", "force", 1, 200),
      })
      .optional(),
    ballMount: z
      .object({
        gtwRating: m("ballMount.gtwRating", "Ball mount gross trailer weight rating", 0, 40000),
        twRating: m("ballMount.twRating", "Ball mount tongue weight rating", 0, 6000),
        drop: l("ballMount.drop", "Ball mount drop (negative for a rise)", -12, 16),
        length: l("ballMount.length", "Ball mount length, pin to ball", 0, 30),
        squatAllowance: l("ballMount.squatAllowance", "Expected rear squat when hitched", 0, 8),
        holeSize: z.enum(SHANK_SIZES, { error: "Ball mount hole: choose 3/4, 1 or 1-1/4 in." }).optional(),
      })
      .optional(),
    /** A receiver-size adapter (a reducer or an enlarger) between the receiver and the ball mount: a link with its own label. */
    receiverAdapter: z
      .object({
        gtwRating: m("receiverAdapter.gtwRating", "Receiver adapter gross trailer weight rating", 0, 40000),
        twRating: m("receiverAdapter.twRating", "Receiver adapter tongue weight rating", 0, 6000),
      })
      .optional(),
    /** A reducer sleeve (bushing) in the ball mount's hole, so a thinner ball shank fits: a link with its own label. */
    ballSleeve: z
      .object({
        gtwRating: m("ballSleeve.gtwRating", "Ball reducer sleeve gross trailer weight rating", 0, 40000),
        twRating: m("ballSleeve.twRating", "Ball reducer sleeve tongue weight rating", 0, 6000),
      })
      .optional(),
    extender: z
      .object({
        length: req(l("extender.length", "Extender length", 0, 24)),
        gtwRating: m("extender.gtwRating", "Extender gross trailer weight rating", 0, 40000),
        twRating: m("extender.twRating", "Extender tongue weight rating", 0, 6000),
      })
      .optional(),
    weightDistribution: z
      .object({
        used: z.boolean({ error: "Weight distribution used: yes or no." }),
        tongueRating: m("weightDistribution.tongueRating", "Weight distribution tongue rating", 0, 6000),
        fenderUnhitched: l("weightDistribution.fenderUnhitched", "Front fender height unhitched", 10, 80),
        fenderHitched: l("weightDistribution.fenderHitched", "Front fender height hitched, weight distribution off", 10, 80),
        fenderWithWd: l("weightDistribution.fenderWithWd", "Front fender height hitched with weight distribution", 10, 80),
        restorationTarget: field(units, "weightDistribution.restorationTarget", "Restoration target", "percent", 10, 100),
      })
      .optional(),
    load: z
      .object({
        occupants: m("load.occupants", "Occupants", 0, 5000),
        cargo: m("load.cargo", "Cargo in the vehicle", 0, 20000),
        hitchHardware: m("load.hitchHardware", "Hitch hardware", 0, 1000),
      })
      .optional(),
    driver: z
      .object({
        licence: z.enum(LICENCE_CATEGORIES, { error: "Driving licence: choose one from the list." }).optional(),
      })
      .optional(),
    accessory: z
      .object({
        type: z.enum(ACCESSORY_TYPES, { error: "Accessory type: choose one from the list." }),
        weight: m("accessory.weight", "Accessory weight", 0, 1000),
        loadWeight: m("accessory.loadWeight", "Load on the accessory", 0, 2000),
        loadCenterFromPin: l("accessory.loadCenterFromPin", "Pin hole to the load's centre", 0, 80),
        foldClearance: l("accessory.foldClearance", "Fold clearance needed", 0, 40),
        lowestPointBelowShankTop: l("accessory.lowestPointBelowShankTop", "Lowest point below the shank top", -20, 40),
        lowestPointBehindPin: l("accessory.lowestPointBehindPin", "Lowest point behind the pin", 0, 80),
        shankRise: l("accessory.shankRise", "Shank rise", -12, 16),
      })
      .optional(),
  });
}

const imperialRigSchema = rigShape("imperial");
const metricRigSchema = rigShape("metric");

/** The rig schema: one shape per unit system, chosen by `units`. */
export const rigInputSchema = z
  .discriminatedUnion("units", [imperialRigSchema, metricRigSchema], {
    error: "Units: choose imperial (lb, in) or metric (kg, mm).",
  })
  .superRefine((rig, ctx) => {
    if (rig.trailer && rig.accessory) {
      ctx.addIssue({
        code: "custom",
        path: ["accessory"],
        message: "A rig carries a trailer or a hitch-mounted accessory, not both at once.",
      });
    }
    // Geometry: a hitch point at or past the front axle cannot be a bed hitch; the likely slip is the sign.
    const bed = rig.vehicle.rearAxleToBedHitch;
    const wb = rig.vehicle.wheelbase;
    if (bed !== undefined && wb !== undefined && -bed >= wb)
      ctx.addIssue({ code: "custom", path: ["vehicle", "rearAxleToBedHitch"], message: "Rear axle to the bed hitch reaches the front axle: check the figure and its sign (negative is ahead of the rear axle)." });
    // The tongue carries part of the trailer, never more than all of it: a larger figure is a misreading.
    const t = rig.trailer;
    const gtw = t?.grossTrailerWeight;
    if (t && gtw !== undefined) {
      if (t.tongueWeight !== undefined && t.tongueWeight > gtw)
        ctx.addIssue({ code: "custom", path: ["trailer", "tongueWeight"], message: "Tongue weight cannot be more than the gross trailer weight: check both figures." });
      const m = t.tongueMeasurement;
      if (m) {
        const measured = m.blockToJack !== undefined && m.jackToScale !== undefined ? (m.scaleReading * (m.blockToJack + m.jackToScale)) / m.blockToJack : m.scaleReading;
        if (measured > gtw * (1 + 1e-9))
          ctx.addIssue({ code: "custom", path: ["trailer", "tongueMeasurement", "scaleReading"], message: "The measured tongue weight comes out more than the gross trailer weight: check the reading and the distances." });
      }
    }
  });

/** A validated rig (the schema's output). */
export type RigInput = z.output<typeof rigInputSchema>;
export type VehicleInput = RigInput["vehicle"];
export type TrailerInput = NonNullable<RigInput["trailer"]>;
export type AccessoryInput = NonNullable<RigInput["accessory"]>;

export type ParseRigResult =
  | { ok: true; rig: RigInput }
  | { ok: false; fieldErrors: Record<string, string[]> };

/** What a section of the rig holds, in the words a person reads in an error. */
const SECTION_WORDS: Record<string, string> = {
  vehicle: "The vehicle section",
  hitch: "The hitch section",
  trailer: "The trailer section",
  ballMount: "The ball mount section",
  receiverAdapter: "The receiver adapter section",
  ballSleeve: "The ball reducer sleeve section",
  extender: "The extender section",
  weightDistribution: "The weight-distribution section",
  load: "The load section",
  accessory: "The accessory section",
  driver: "The driver section",
};

/** zod's own default messages ("Invalid input: expected object, received undefined") are never shown. */
const VALIDATOR_DEFAULT = /^(Invalid|Unrecognized|Too (small|big)|Expected)\b/;

function ownWords(path: PropertyKey[], message: string, code: string): string {
  if (!VALIDATOR_DEFAULT.test(message)) return message;
  const key = path.map(String).join(".");
  const section = SECTION_WORDS[key] ?? (path.length ? `“${key}”` : "The rig");
  if (!path.length) return "The rig must be a JSON object with units and a vehicle section.";
  // zod reports a missing section as an invalid type whose input was undefined.
  if (code === "invalid_type" && /received undefined/.test(message)) return `${section} is required: send it with the figures you know, or as {} when none are known yet.`;
  if (code === "invalid_type") return `${section} must be an object of figures.`;
  return `${section} is not valid here.`;
}

type Plain = Record<string, unknown>;
const isPlain = (v: unknown): v is Plain => typeof v === "object" && v !== null && !Array.isArray(v);

/**
 * Older inputs gave `vehicle.rearAxleToHitch`: the rear axle to the ball for a trailer, to the pin for an
 * accessory. The one figure measured now is the rear axle to the receiver pin hole (`rearAxleToPin`); the ball
 * is reached by adding the extender and the ball mount's length. Turn the old figure into the new one where the
 * geometry allows (Geometry: pin = ball − ball mount length − extender length); a trailer rig whose ball mount
 * length is unknown keeps the old figure, read as the ball's position as measured.
 */
export function migrateRigInput(value: unknown): unknown {
  if (!isPlain(value) || !isPlain(value.vehicle)) return value;
  const v = value.vehicle;
  if (typeof v.rearAxleToHitch !== "number" || v.rearAxleToPin !== undefined) return value;
  const old = v.rearAxleToHitch;
  const { rearAxleToHitch: _old, ...vehicle } = v;
  void _old;
  if (!isPlain(value.trailer)) return { ...value, vehicle: { ...vehicle, rearAxleToPin: old } };
  const len = isPlain(value.ballMount) ? value.ballMount.length : undefined;
  const ext = isPlain(value.extender) && typeof value.extender.length === "number" ? value.extender.length : 0;
  if (typeof len !== "number") return value;
  const pin = old - len - ext;
  const range = FIELD_RANGES["vehicle.rearAxleToPin"]!;
  const s = value.units === "metric" ? MM_PER_IN : 1;
  if (!(pin >= range.min * s && pin <= range.max * s)) return value;
  return { ...value, vehicle: { ...vehicle, rearAxleToPin: pin } };
}

/** Validate unknown input (a form, a request body, a file). Never throws; error keys are dotted paths. */
export function parseRig(value: unknown): ParseRigResult {
  const parsed = rigInputSchema.safeParse(migrateRigInput(value));
  if (parsed.success) return { ok: true, rig: parsed.data };
  const fieldErrors: Record<string, string[]> = {};
  for (const issue of parsed.error.issues) {
    const key = issue.path.length ? issue.path.map(String).join(".") : "rig";
    (fieldErrors[key] ??= []).push(ownWords(issue.path, issue.message, issue.code));
  }
  return { ok: false, fieldErrors };
}
