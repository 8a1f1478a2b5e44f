/**
 * What this hitch allows: the figures a customer leaves the shop with once a receiver is fitted and measured.
 * Standalone, like the measuring helpers: every value is in the unit system given (lb & in, or kg & mm) and
 * comes back in the same system, with its steps. Never throws; a missing figure is listed, never guessed.
 *
 * - Lowest ratings: the gross trailer weight and the tongue weight the rig may carry are the lowest of the
 *   vehicle's ratings, the hitch label's and every fitted part's, weight-carrying and with weight distribution
 *   (Source: Washington WAC 204-70-060; vehicle owner's manuals). A WD figure left blank falls back to the
 *   weight-carrying one (the lower, so the safe side), and says so.
 * - Folding rack: a folded rack needs room between the receiver pin hole and the fascia, so the deepest it
 *   may be when folded is the measured pin hole to fascia.
 * - Carrier: a carrier reaching D behind the pin, its lowest point h_low below the shank top, sits
 *   h = H_r + r − h_low above the ground and x = X_pin + D behind the rear axle (the rear tyre's contact
 *   point, vehicle unloaded on level ground). Its angle from the tyre is atan(h / x); the rise that brings
 *   it to the vehicle's departure angle β is max(0, x · tan β − h). (Departure angle: 49 CFR 523.2; the
 *   angle is geometry.)
 * - Raised shank: advisable when the receiver sits low (LOW_RECEIVER_IN, common practice) or when a
 *   carrier of the depth asked about would not keep the departure angle.
 */
import { LOW_RECEIVER_IN } from "./checks/accessory-fit";
import { GENERAL_CAUTIONS } from "./checks/verdict";
import type { Quantity, Step } from "./types";
import { MM_PER_IN, type UnitString, type UnitSystem } from "./units";

export interface HitchAllowanceRatings {
  gtwRating?: number;
  twRating?: number;
  gtwRatingWd?: number;
  twRatingWd?: number;
}

export interface HitchAllowanceInput {
  units: UnitSystem;
  vehicle: {
    towRating?: number;
    towRatingWd?: number;
    tongueWeightLimit?: number;
    tongueWeightLimitWd?: number;
    departureAngle?: number;
  };
  hitch: HitchAllowanceRatings & {
    class?: number;
    receiverSize?: string;
    /** Ground to the top inside of the receiver opening, measured after fitting. */
    receiverHeight?: number;
    /** Receiver pin hole to the outermost point of the fascia, measured after fitting. */
    pinToFascia?: number;
  };
  /** Rear axle centre to the receiver pin hole, measured after fitting. */
  rearAxleToPin?: number;
  /** The other fitted parts (ball mount, pin and clip, wiring…), with their own ratings where they have them. */
  parts?: Array<HitchAllowanceRatings & { label: string }>;
  /** A carrier the customer asks about: how far it reaches behind the pin, and its lowest point below the shank top (0 when level with it). */
  carrier?: { depth: number; lowestPointBelowShankTop?: number; shankRise?: number };
}

export interface AllowanceRating {
  /** `vehicle.towRating`, `hitch.twRatingWd`, `part.2.gtwRating`… */
  id: string;
  label: string;
  value: number;
  unit: UnitString;
  /** Set when a weight-carrying figure stands in for a blank weight-distribution one. */
  note?: string;
}

export interface AllowanceLimit {
  /** The lowest rating, or undefined when no rating of this kind was entered. */
  value?: Quantity;
  governing?: AllowanceRating;
  /** Every rating of this kind that was entered, lowest first. */
  ratings: AllowanceRating[];
  /** The vehicle's or the hitch's own figure is missing: the lowest may be lower still. */
  missing: Array<{ id: string; label: string }>;
}

export interface HitchAllowance {
  units: UnitSystem;
  weightCarrying: { grossTrailerWeight: AllowanceLimit; tongueWeight: AllowanceLimit };
  withWd: { grossTrailerWeight: AllowanceLimit; tongueWeight: AllowanceLimit };
  /** The deepest a folding rack may be when folded: the room from the pin hole to the fascia. */
  foldedDepthMax?: Quantity;
  carrier?: {
    depth: Quantity;
    groundClearance: Quantity;
    /** Undefined without the rear axle to pin distance. */
    angle?: Quantity;
    departureAngle?: Quantity;
    /** Rise that brings the carrier's angle to the departure angle (0 when it already keeps it). */
    riseNeeded?: Quantity;
    keepsDepartureAngle?: boolean;
  };
  raisedShank: { advisable: boolean; reasons: string[]; statement: string };
  /** Plain sentences for the customer, in order (the raised shank has its own, in `raisedShank.statement`). */
  statements: string[];
  missing: Array<{ field: string; what: string }>;
  steps: Step[];
  cautions: string[];
  /** The last word belongs to the vehicle maker and local law. */
  deferral: string;
}

const okNum = (n: unknown): n is number => typeof n === "number" && Number.isFinite(n);
const RAD = 180 / Math.PI;

function groupDigits(n: number): string {
  return new Intl.NumberFormat("en-US", { maximumFractionDigits: 0 }).format(n);
}

/** "3,500 lb", "5.5 in", "140 mm": rounded for the sentences only; the figures stay unrounded. */
function show(value: number, unit: UnitString): string {
  if (unit === "in") return `${Math.round(value * 10) / 10} in`;
  if (unit === "°") return `${Math.round(value * 10) / 10}°`;
  return `${groupDigits(Math.round(value))} ${unit}`;
}

type Kind = "gtw" | "tw";

const WD_FALLBACK = "No figure with weight distribution on record: the weight-carrying figure is used, the lower one.";

function limitOf(input: HitchAllowanceInput, kind: Kind, wd: boolean, wu: UnitString): AllowanceLimit {
  const ratings: AllowanceRating[] = [];
  const missing: AllowanceLimit["missing"] = [];
  const pick = (id: string, label: string, plain: number | undefined, withWd: number | undefined, required: boolean) => {
    if (wd && okNum(withWd)) ratings.push({ id, label: `${label} with WD`, value: withWd, unit: wu });
    else if (okNum(plain)) ratings.push({ id, label, value: plain, unit: wu, note: wd ? WD_FALLBACK : undefined });
    else if (required) missing.push({ id, label });
  };
  const v = input.vehicle;
  const h = input.hitch;
  if (kind === "gtw") {
    pick(wd && okNum(v.towRatingWd) ? "vehicle.towRatingWd" : "vehicle.towRating", "Vehicle tow rating", v.towRating, v.towRatingWd, true);
    pick(wd && okNum(h.gtwRatingWd) ? "hitch.gtwRatingWd" : "hitch.gtwRating", "Hitch label", h.gtwRating, h.gtwRatingWd, true);
  } else {
    pick(wd && okNum(v.tongueWeightLimitWd) ? "vehicle.tongueWeightLimitWd" : "vehicle.tongueWeightLimit", "Vehicle tongue-weight limit", v.tongueWeightLimit, v.tongueWeightLimitWd, true);
    pick(wd && okNum(h.twRatingWd) ? "hitch.twRatingWd" : "hitch.twRating", "Hitch label", h.twRating, h.twRatingWd, true);
  }
  (input.parts ?? []).forEach((part, i) => {
    const field = kind === "gtw" ? "gtwRating" : "twRating";
    const plain = part[field];
    const withWd = kind === "gtw" ? part.gtwRatingWd : part.twRatingWd;
    pick(`parts.${i}.${wd && okNum(withWd) ? `${field}Wd` : field}`, part.label, plain, withWd, false);
  });
  // Stable: the first of equal ratings (the vehicle's, then the hitch's) is named as governing.
  ratings.sort((a, b) => a.value - b.value);
  const governing = ratings[0];
  return { value: governing ? { value: governing.value, unit: wu } : undefined, governing, ratings, missing };
}

function lowestStep(id: string, title: string, limit: AllowanceLimit, symbol: string): Step | undefined {
  if (!limit.governing) return undefined;
  const inputs = limit.ratings.map((r, i) => ({ symbol: `${symbol}_${i + 1}`, label: r.label, value: r.value, unit: r.unit }));
  return {
    id,
    title,
    formulaWords: "The lowest of every rating entered",
    formula: inputs.length > 1 ? `min(${inputs.map((x) => x.symbol).join(", ")})` : inputs[0]!.symbol,
    inputs,
    result: { symbol, value: limit.governing.value, unit: limit.governing.unit },
  };
}

/** What this hitch allows, from the record's vehicle ratings, the hitch label, the fitted parts and the measurements. */
export function hitchAllowance(input: HitchAllowanceInput): HitchAllowance {
  const units = input.units;
  const wu: UnitString = units === "metric" ? "kg" : "lb";
  const lu: UnitString = units === "metric" ? "mm" : "in";
  const h = input.hitch;
  const v = input.vehicle;
  const steps: Step[] = [];
  const statements: string[] = [];
  const missing: HitchAllowance["missing"] = [];

  const weightCarrying = { grossTrailerWeight: limitOf(input, "gtw", false, wu), tongueWeight: limitOf(input, "tw", false, wu) };
  const withWd = { grossTrailerWeight: limitOf(input, "gtw", true, wu), tongueWeight: limitOf(input, "tw", true, wu) };
  for (const [id, title, limit, symbol] of [
    ["lowest-gtw", "Gross trailer weight allowed, weight-carrying", weightCarrying.grossTrailerWeight, "GTW_max"],
    ["lowest-tw", "Tongue weight allowed, weight-carrying", weightCarrying.tongueWeight, "TW_max"],
    ["lowest-gtw-wd", "Gross trailer weight allowed, with weight distribution", withWd.grossTrailerWeight, "GTW_max_wd"],
    ["lowest-tw-wd", "Tongue weight allowed, with weight distribution", withWd.tongueWeight, "TW_max_wd"],
  ] as const) {
    const step = lowestStep(id, title, limit, symbol);
    if (step) steps.push(step);
  }
  for (const limit of [weightCarrying.grossTrailerWeight, weightCarrying.tongueWeight, withWd.grossTrailerWeight, withWd.tongueWeight])
    for (const m of limit.missing) if (!missing.some((x) => x.field === m.id)) missing.push({ field: m.id, what: m.label });

  const sayLimit = (limit: AllowanceLimit, what: "gross trailer weight" | "tongue weight", how: string) => {
    if (!limit.governing) return `No ${what} ${how} can be given yet: neither the vehicle's nor the hitch's figure is on record.`;
    const rest = limit.missing.length ? ` (${limit.missing.map((m) => m.label.toLowerCase()).join(" and ")} not on record, so it may be lower)` : "";
    const lead = how[0]!.toUpperCase() + how.slice(1);
    const claim = what === "tongue weight" ? `the trailer's tongue may press at most ${show(limit.governing.value, wu)} on the ball` : `the trailer may weigh at most ${show(limit.governing.value, wu)} loaded`;
    const by = limit.governing.id.startsWith("parts.") ? limit.governing.label : limit.governing.label.replace(/ with WD$/, "").toLowerCase();
    return `${lead}, ${claim}; the ${by} sets this${rest}.`;
  };
  statements.push(
    sayLimit(weightCarrying.grossTrailerWeight, "gross trailer weight", "without weight distribution"),
    sayLimit(weightCarrying.tongueWeight, "tongue weight", "without weight distribution"),
    sayLimit(withWd.grossTrailerWeight, "gross trailer weight", "with weight distribution"),
    sayLimit(withWd.tongueWeight, "tongue weight", "with weight distribution"),
  );

  // ---- folding rack ----
  let foldedDepthMax: Quantity | undefined;
  if (okNum(h.pinToFascia)) {
    foldedDepthMax = { value: h.pinToFascia, unit: lu };
    statements.push(`A folding rack fits folded if it needs no more than ${show(h.pinToFascia, lu)} between the pin hole and the bumper (the measured pin hole to fascia).`);
  } else missing.push({ field: "hitch.pinToFascia", what: "Pin hole to fascia" });

  // ---- carrier geometry ----
  const lowReceiverLimit = units === "metric" ? LOW_RECEIVER_IN * MM_PER_IN : LOW_RECEIVER_IN;
  const reasons: string[] = [];
  if (okNum(h.receiverHeight) && h.receiverHeight <= lowReceiverLimit * (1 + 1e-9))
    reasons.push(`The receiver sits low, ${show(h.receiverHeight, lu)} from the ground: a raised shank keeps a rack or carrier clear of driveways and ramps.`);
  if (!okNum(h.receiverHeight)) missing.push({ field: "hitch.receiverHeight", what: "Receiver height" });
  if (!okNum(input.rearAxleToPin)) missing.push({ field: "rearAxleToPin", what: "Rear axle centre to pin hole" });

  let carrier: HitchAllowance["carrier"];
  const cr = input.carrier;
  if (cr && okNum(cr.depth) && okNum(h.receiverHeight)) {
    const below = okNum(cr.lowestPointBelowShankTop) ? cr.lowestPointBelowShankTop : 0;
    const rise = okNum(cr.shankRise) ? cr.shankRise : 0;
    const ground = h.receiverHeight + rise - below;
    steps.push({
      id: "carrier-ground",
      title: "Ground clearance of the carrier's lowest point",
      formulaWords: "Receiver height plus shank rise minus the drop of the lowest point below the shank top",
      formula: "H_r + r - h_low",
      inputs: [
        { symbol: "H_r", label: "Receiver height", value: h.receiverHeight, unit: lu },
        { symbol: "r", label: "Shank rise", value: rise, unit: lu },
        { symbol: "h_low", label: "Lowest point below the shank top", value: below, unit: lu },
      ],
      result: { symbol: "h", value: ground, unit: lu },
    });
    carrier = { depth: { value: cr.depth, unit: lu }, groundClearance: { value: ground, unit: lu } };
    if (okNum(input.rearAxleToPin)) {
      const x = input.rearAxleToPin + cr.depth;
      const angle = ground > 0 ? Math.atan2(ground, x) * RAD : 0;
      carrier.angle = { value: angle, unit: "°" };
      steps.push({
        id: "carrier-angle",
        title: "The carrier's angle from the rear tyre",
        formulaWords: "Arc tangent of its height over its distance behind the rear axle (pin distance plus the carrier's depth)",
        formula: "atan(h / (X_pin + D)) * 180 / pi",
        inputs: [
          { symbol: "h", label: "Height of the lowest point", value: ground, unit: lu },
          { symbol: "X_pin", label: "Rear axle centre to pin hole", value: input.rearAxleToPin, unit: lu },
          { symbol: "D", label: "Carrier depth behind the pin", value: cr.depth, unit: lu },
        ],
        result: { symbol: "alpha", value: angle, unit: "°" },
      });
      if (okNum(v.departureAngle)) {
        const needed = Math.max(0, x * Math.tan(v.departureAngle / RAD) - ground);
        carrier.departureAngle = { value: v.departureAngle, unit: "°" };
        carrier.riseNeeded = { value: needed, unit: lu };
        carrier.keepsDepartureAngle = needed <= 1e-9 * Math.max(1, x);
        steps.push({
          id: "carrier-rise",
          title: "Rise that brings the carrier to the departure angle",
          formulaWords: "Height needed for the vehicle's departure angle at that distance, minus the height it has (zero if none)",
          formula: "max(0, (X_pin + D) * tan(beta * pi / 180) - h)",
          inputs: [
            { symbol: "X_pin", label: "Rear axle centre to pin hole", value: input.rearAxleToPin, unit: lu },
            { symbol: "D", label: "Carrier depth behind the pin", value: cr.depth, unit: lu },
            { symbol: "beta", label: "Vehicle departure angle", value: v.departureAngle, unit: "°" },
            { symbol: "h", label: "Height of the lowest point", value: ground, unit: lu },
          ],
          result: { symbol: "r_add", value: needed, unit: lu },
        });
        if (!carrier.keepsDepartureAngle)
          reasons.push(`A carrier reaching ${show(cr.depth, lu)} behind the pin would sit at ${show(angle, "°")}, below the vehicle's ${show(v.departureAngle, "°")} departure angle: about ${show(needed, lu)} more rise brings it level with it.`);
        statements.push(
          carrier.keepsDepartureAngle
            ? `A carrier reaching ${show(cr.depth, lu)} behind the pin would clear the ground by ${show(ground, lu)} at ${show(angle, "°")}, within the vehicle's ${show(v.departureAngle, "°")} departure angle.`
            : `A carrier reaching ${show(cr.depth, lu)} behind the pin would clear the ground by ${show(ground, lu)} at ${show(angle, "°")}; it would scrape before the vehicle does unless raised about ${show(needed, lu)}.`,
        );
      } else {
        missing.push({ field: "vehicle.departureAngle", what: "Departure angle" });
        statements.push(`A carrier reaching ${show(cr.depth, lu)} behind the pin would clear the ground by ${show(ground, lu)} at ${show(angle, "°")}.`);
      }
    } else statements.push(`A carrier reaching ${show(cr.depth, lu)} behind the pin would clear the ground by ${show(ground, lu)}.`);
  }

  const advisable = reasons.length > 0;
  const shankStatement = advisable ? `A raised shank is advisable for racks and carriers. ${reasons.join(" ")}` : "No raised shank is needed for the figures on record.";

  const cautions = [
    ...GENERAL_CAUTIONS,
    "These figures are for the hitch as fitted and measured on the date of the record; a different ball mount, extender or load changes them.",
    "Tongue weight is measured, and a ball's rating applies, with weight distribution released.",
  ];
  return {
    units,
    weightCarrying,
    withWd,
    foldedDepthMax,
    carrier,
    raisedShank: { advisable, reasons, statement: shankStatement },
    statements,
    missing,
    steps,
    cautions,
    deferral: "The vehicle maker's figures in the owner's manual and on the labels, and local law, come before anything here.",
  };
}
