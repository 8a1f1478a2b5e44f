/**
 * Check 1, weakest link: the gross trailer weight and the tongue weight against every rating present.
 * The lowest rating of each kind governs (Source: Washington WAC 204-70-060; vehicle owner's manuals).
 */
import {
  fP,
  fW,
  govW,
  iW,
  lessThan,
  marginW,
  NO_STEPS,
  NO_TEXT,
  qW,
  rW,
  statusOf,
  withMissing,
  worst,
  type Ctx,
} from "../context";
import { needTongueWeight, tongueWeightNote, type Derived } from "../derive";
import { HITCHING_CAUTIONS, overLinkAdvice } from "../advice";
import { need } from "../missing";
import { CLASS_MAX_GTW } from "../reference";
import type { CheckStatus, Governing, Link, MissingField, Step, WeakestLinkResult } from "../types";

export interface RatingEntry {
  id: string;
  label: string;
  symbol: string;
  rating: number;
  note?: string;
}

export interface RatingSet {
  gtw: RatingEntry[];
  tw: RatingEntry[];
  missing: MissingField[];
  /** Optional links that could not be checked (no figure entered). */
  unchecked: string[];
}

/** Every rating that limits this rig's trailer, in canonical pounds, with what is missing (computed once per rig). */
export function ratingSet(d: Derived): RatingSet {
  return (d.cache.ratingSet ??= buildRatingSet(d)) as RatingSet;
}

/**
 * A fifth wheel or gooseneck in the bed: the vehicle's tow rating (its figure for a bed hitch when given), the
 * bed hitch's own ratings, and the gooseneck ball, coupler or kingpin and chains when entered. The receiver's
 * ratings, the vehicle's receiver tongue limit, a ball mount, an extender and weight distribution do not apply.
 */
function buildBedRatingSet(d: Derived): RatingSet {
  const { rig, hitchType } = d;
  const v = rig.vehicle;
  const h = rig.hitch;
  const t = rig.trailer!;
  const gtw: RatingEntry[] = [];
  const tw: RatingEntry[] = [];
  const missing: MissingField[] = [];
  const unchecked: string[] = [];
  if (v.towRatingBed !== undefined)
    gtw.push({ id: "vehicle.towRatingBed", label: "Vehicle tow rating for a fifth wheel or gooseneck", symbol: "R_veh", rating: v.towRatingBed });
  else if (v.towRating !== undefined)
    gtw.push({ id: "vehicle.towRating", label: "Vehicle tow rating", symbol: "R_veh", rating: v.towRating, note: "The vehicle's conventional tow rating is used: the owner's manual may give another figure for a fifth wheel or gooseneck; enter it." });
  else missing.push(need("vehicle.towRatingBed"));
  unbrakedLink(d, gtw, missing);
  if (h?.bedGtwRating !== undefined) gtw.push({ id: "hitch.bedGtwRating", label: "Bed hitch rating", symbol: "R_bed", rating: h.bedGtwRating });
  else missing.push(need("hitch.bedGtwRating"));
  if (h?.bedPinRating !== undefined) tw.push({ id: "hitch.bedPinRating", label: "Bed hitch pin weight rating", symbol: "T_bed", rating: h.bedPinRating });
  else missing.push(need("hitch.bedPinRating"));
  const gooseneck = hitchType === "gooseneck";
  if (gooseneck) {
    if (t.ballRating !== undefined) gtw.push({ id: "trailer.ballRating", label: "Gooseneck ball rating", symbol: "R_ball", rating: t.ballRating });
    else unchecked.push("gooseneck ball rating (stamped on the ball)");
  }
  if (t.couplerRating !== undefined)
    gtw.push({ id: "trailer.couplerRating", label: gooseneck ? "Coupler rating" : "Kingpin rating", symbol: "R_coupler", rating: t.couplerRating });
  else unchecked.push(gooseneck ? "coupler rating (stamped on the coupler)" : "kingpin or pin box rating (the trailer's label)");
  if (gooseneck) {
    if (t.safetyChainRating !== undefined)
      gtw.push({ id: "trailer.safetyChainRating", label: "Safety chain rating (each chain)", symbol: "R_chain", rating: t.safetyChainRating });
    else unchecked.push("safety chain rating (tag on each chain)");
  }
  return { gtw, tw, missing, unchecked };
}

function buildRatingSet(d: Derived): RatingSet {
  if (d.bedHitch) return buildBedRatingSet(d);
  const { rig, wdUsed } = d;
  const v = rig.vehicle;
  const h = rig.hitch;
  const t = rig.trailer;
  const gtw: RatingEntry[] = [];
  const tw: RatingEntry[] = [];
  const missing: MissingField[] = [];
  const unchecked: string[] = [];
  const fallback = "Weight-carrying figure used: no figure with weight distribution was entered, and it is the lower one.";

  // Vehicle
  if (wdUsed && v.towRatingWd !== undefined)
    gtw.push({ id: "vehicle.towRatingWd", label: "Vehicle tow rating with weight distribution", symbol: "R_veh", rating: v.towRatingWd });
  else if (v.towRating !== undefined)
    gtw.push({ id: "vehicle.towRating", label: "Vehicle tow rating", symbol: "R_veh", rating: v.towRating, note: wdUsed ? fallback : undefined });
  else missing.push(need(wdUsed ? "vehicle.towRatingWd" : "vehicle.towRating"));
  unbrakedLink(d, gtw, missing);
  if (wdUsed && v.tongueWeightLimitWd !== undefined)
    tw.push({ id: "vehicle.tongueWeightLimitWd", label: "Vehicle tongue-weight limit with weight distribution", symbol: "T_veh", rating: v.tongueWeightLimitWd });
  else if (v.tongueWeightLimit !== undefined)
    tw.push({ id: "vehicle.tongueWeightLimit", label: "Vehicle tongue-weight limit", symbol: "T_veh", rating: v.tongueWeightLimit, note: wdUsed ? fallback : undefined });
  else missing.push(need(wdUsed ? "vehicle.tongueWeightLimitWd" : "vehicle.tongueWeightLimit"));

  // Hitch (receiver). A hitch label with only weight-carrying figures may mean the hitch is not made for weight
  // distribution: with weight distribution used, its figure is still a limit, but the check waits for the label's
  // figure with weight distribution.
  const wcOnly = "Only a weight-carrying figure was entered: a hitch rated for weight-carrying only must not be used with weight distribution.";
  if (wdUsed && h?.gtwRatingWd !== undefined)
    gtw.push({ id: "hitch.gtwRatingWd", label: "Hitch rating with weight distribution", symbol: "R_hitch", rating: h.gtwRatingWd });
  else if (h?.gtwRating !== undefined) {
    gtw.push({ id: "hitch.gtwRating", label: "Hitch rating", symbol: "R_hitch", rating: h.gtwRating, note: wdUsed ? wcOnly : undefined });
    if (wdUsed) missing.push(need("hitch.gtwRatingWd"));
  } else missing.push(need(wdUsed ? "hitch.gtwRatingWd" : "hitch.gtwRating"));
  if (wdUsed && h?.twRatingWd !== undefined)
    tw.push({ id: "hitch.twRatingWd", label: "Hitch tongue rating with weight distribution", symbol: "T_hitch", rating: h.twRatingWd });
  else if (h?.twRating !== undefined) {
    tw.push({ id: "hitch.twRating", label: "Hitch tongue rating", symbol: "T_hitch", rating: h.twRating, note: wdUsed ? wcOnly : undefined });
    if (wdUsed) missing.push(need("hitch.twRatingWd"));
  } else missing.push(need(wdUsed ? "hitch.twRatingWd" : "hitch.twRating"));

  // Ball: every ball is stamped, so it is required.
  if (t?.ballRating !== undefined) gtw.push({ id: "trailer.ballRating", label: "Ball rating", symbol: "R_ball", rating: t.ballRating });
  else if (t) missing.push(need("trailer.ballRating"));

  // Optional links: checked when entered.
  const bm = rig.ballMount;
  if (bm?.gtwRating !== undefined) gtw.push({ id: "ballMount.gtwRating", label: "Ball mount rating", symbol: "R_mount", rating: bm.gtwRating });
  else if (t && !wdUsed) unchecked.push("ball mount rating (stamped on the ball mount)");
  if (bm?.twRating !== undefined) tw.push({ id: "ballMount.twRating", label: "Ball mount tongue rating", symbol: "T_mount", rating: bm.twRating });
  if (t?.couplerRating !== undefined) gtw.push({ id: "trailer.couplerRating", label: "Coupler rating", symbol: "R_coupler", rating: t.couplerRating });
  else if (t) unchecked.push("coupler rating (stamped on the coupler)");
  // Source: Washington WAC 204-70-070; New Hampshire RSA 266:63 (each chain at least the gross trailer weight)
  if (t?.safetyChainRating !== undefined)
    gtw.push({ id: "trailer.safetyChainRating", label: "Safety chain rating (each chain)", symbol: "R_chain", rating: t.safetyChainRating });
  else if (t) unchecked.push("safety chain rating (tag on each chain)");
  if (wdUsed) {
    const wdr = rig.weightDistribution?.tongueRating;
    if (wdr !== undefined) tw.push({ id: "weightDistribution.tongueRating", label: "Weight distribution rating", symbol: "T_wd", rating: wdr });
    else unchecked.push("weight distribution rating (label on the spring bars)");
  }
  // An extender is a link like any other: its label's ratings apply as stamped (never derated again here).
  const ex = rig.extender;
  if (ex) {
    if (ex.twRating !== undefined) tw.push({ id: "extender.twRating", label: "Extender tongue rating", symbol: "T_ext", rating: ex.twRating });
    else missing.push(need("extender.twRating"));
    if (ex.gtwRating !== undefined) gtw.push({ id: "extender.gtwRating", label: "Extender rating", symbol: "R_ext", rating: ex.gtwRating });
    else if (t) unchecked.push("extender gross trailer weight rating (label on the extender)");
  }
  // A receiver adapter and a ball reducer sleeve carry the whole trailer: a present one's label is required.
  const ra = rig.receiverAdapter;
  if (ra) {
    if (ra.gtwRating !== undefined) gtw.push({ id: "receiverAdapter.gtwRating", label: "Receiver adapter rating", symbol: "R_adapt", rating: ra.gtwRating });
    else if (t) missing.push(need("receiverAdapter.gtwRating"));
    if (ra.twRating !== undefined) tw.push({ id: "receiverAdapter.twRating", label: "Receiver adapter tongue rating", symbol: "T_adapt", rating: ra.twRating });
    else missing.push(need("receiverAdapter.twRating"));
  }
  const sl = t ? rig.ballSleeve : undefined;
  if (sl) {
    if (sl.gtwRating !== undefined) gtw.push({ id: "ballSleeve.gtwRating", label: "Ball reducer sleeve rating", symbol: "R_sleeve", rating: sl.gtwRating });
    else missing.push(need("ballSleeve.gtwRating"));
    if (sl.twRating !== undefined) tw.push({ id: "ballSleeve.twRating", label: "Ball reducer sleeve tongue rating", symbol: "T_sleeve", rating: sl.twRating });
    else missing.push(need("ballSleeve.twRating"));
  }

  return { gtw, tw, missing, unchecked };
}

/**
 * The vehicle's own tow rating for a trailer without brakes: a link whenever the trailer has none (the maker's
 * figure, often far below the braked one). Not entered for an unbraked trailer: missing, never a pass. Whether the
 * law wants brakes at this weight is the local rules' business, not this link's.
 */
function unbrakedLink(d: Derived, gtw: RatingEntry[], missing: MissingField[]): void {
  if (d.rig.trailer?.brakes !== "none") return;
  const r = d.rig.vehicle.towRatingUnbraked;
  if (r !== undefined) gtw.push({ id: "vehicle.towRatingUnbraked", label: "Vehicle tow rating without trailer brakes", symbol: "R_unbr", rating: r });
  else missing.push(need("vehicle.towRatingUnbraked"));
}

function lowest(entries: RatingEntry[]): RatingEntry | undefined {
  let low: RatingEntry | undefined;
  for (const e of entries) if (!low || lessThan(e.rating, low.rating)) low = e;
  return low;
}

interface LinkAcc {
  links: Link[];
  statuses: CheckStatus[];
  bestRatio: number;
  governing: Governing | undefined;
  govActual: number;
  govLimit: number;
}

function addLinks(acc: LinkAcc, c: Ctx, entries: RatingEntry[], actual: number | undefined, kind: Link["limits"]): void {
  for (const e of entries) {
    const link: Link = { id: e.id, label: e.label, limits: kind, rating: qW(c, e.rating), status: "incomplete" };
    if (actual !== undefined) {
      link.actual = qW(c, actual);
      link.margin = marginW(c, actual, e.rating);
      link.status = statusOf(actual, e.rating, c.tight);
      acc.statuses.push(link.status);
      if (lessThan(link.margin.ratio, acc.bestRatio)) {
        acc.bestRatio = link.margin.ratio;
        acc.governing = govW(c, e.id, e.label, e.rating);
        acc.govActual = actual;
        acc.govLimit = e.rating;
      }
    }
    acc.links.push(link);
  }
}

/** Cautions for any rig with an extender. Common practice, no published source: makers' own rules vary. */
export function EXTENDER_CAUTIONS(wdUsed: boolean): string[] {
  const list = [
    "Many hitch and vehicle makers derate their ratings with an extender, or do not allow one: follow their instructions as well as the extender's own label.",
    "An extender moves the load further behind the rear axle: more load on the rear axle and less on the front.",
  ];
  if (wdUsed) list.push("Most makers forbid weight distribution through an extender: check both makers' instructions before fitting the spring bars.");
  return list;
}

const CAUTIONS = [
  "Every part between the vehicle and the trailer has its own rating; the lowest one is the limit for the whole rig.",
  "Read the figures from the labels and stamps on the parts themselves; a catalogue figure may differ.",
  "Use two safety chains crossed under the tongue, hooked to the hitch, never to the ball or a removable ball mount.",
  ...HITCHING_CAUTIONS,
];

/** Hands-on cautions for a fifth wheel (common practice, no published source). */
const FIFTH_WHEEL_CAUTIONS = [
  "Every part between the vehicle and the trailer has its own rating; the lowest one is the limit for the whole rig.",
  "Read the figures from the labels and stamps on the parts themselves; a catalogue figure may differ.",
  "Check that the jaws have closed round the kingpin and the lock is set: look, then pull gently forward against the trailer's brakes.",
  "Keep the pin box clear of the cab and the bed's sides in tight turns (a short bed may need a sliding hitch).",
  HITCHING_CAUTIONS[1]!,
  HITCHING_CAUTIONS[2]!,
  HITCHING_CAUTIONS[3]!,
];

/** Said when a bed rig also carries receiver parts' figures: they are not used. */
export const BED_HITCH_IGNORES =
  "A fifth wheel or gooseneck rides in the bed: the receiver's ratings, a ball mount, an extender and weight distribution do not apply to it, and their figures are not used.";

export function checkWeakestLink(d: Derived, c: Ctx): WeakestLinkResult | null {
  if (!d.hasTrailer) return null;
  const t = d.rig.trailer!;
  const set = ratingSet(d);
  const missing = set.missing.slice();
  if (d.gtw === undefined) missing.unshift(need("trailer.grossTrailerWeight"));
  if (d.tw === undefined) missing.unshift(...needTongueWeight(d));

  const acc: LinkAcc = { links: [], statuses: [], bestRatio: Infinity, governing: undefined, govActual: 0, govLimit: 0 };
  addLinks(acc, c, set.gtw, d.gtw, "gross-trailer-weight");
  addLinks(acc, c, set.tw, d.tw, "tongue-weight");
  const { links, statuses, governing, govActual, govLimit } = acc;

  // Ball and coupler must be the same size: a mismatch can let the trailer come off.
  const sizeMismatch = d.hitchType !== "fifth-wheel" && t.ballSize !== undefined && t.couplerBallSize !== undefined && t.ballSize !== t.couplerBallSize;
  // A set-up to change (fit the matching ball), not a rating exceeded.
  if (sizeMismatch) statuses.push("adjust");

  const lowG = lowest(set.gtw);
  const lowT = lowest(set.tw);
  const status = withMissing(worst(statuses), missing);
  const result: WeakestLinkResult = {
    id: "weakest-link",
    title: "Weakest link",
    status,
    links,
    governing,
    governingGrossTrailerWeight: lowG ? govW(c, lowG.id, lowG.label, lowG.rating) : undefined,
    governingTongueWeight: lowT ? govW(c, lowT.id, lowT.label, lowT.rating) : undefined,
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    missing: missing.length ? missing : undefined,
    estimated: d.twEstimated || undefined,
    steps: NO_STEPS,
  };
  if (governing) {
    result.actual = qW(c, govActual);
    result.limit = qW(c, govLimit);
    result.margin = marginW(c, govActual, govLimit);
  }
  if (!c.detail) return result;

  const steps: Step[] = [];
  const kinds: Array<[RatingEntry[], number | undefined, string, string, string]> = [
    [set.gtw, d.gtw, "gtw", "gross trailer weight", "GTW"],
    [set.tw, d.tw, "tw", "tongue weight", "TW"],
  ];
  for (const [entries, actual, key, words, sym] of kinds) {
    const low = lowest(entries);
    if (!low) continue;
    steps.push({
      id: `lowest-${key}-rating`,
      title: `Lowest ${words} rating`,
      formulaWords: `The smallest of the ${words} ratings present`,
      formula: entries.length > 1 ? `min(${entries.map((e) => e.symbol).join(", ")})` : entries[0]!.symbol,
      inputs: entries.map((e) => iW(c, e.symbol, e.label, e.rating)),
      result: rW(c, `${sym}_max`, low.rating),
      note: [...new Set(entries.filter((e) => e.note).map((e) => e.note!))].join(" ") || undefined,
    });
    if (actual !== undefined)
      steps.push({
        id: `${key}-margin`,
        title: `Room left on the ${words}`,
        formulaWords: `Lowest rating minus the trailer's ${words}`,
        formula: `${sym}_max - ${sym}`,
        inputs: [iW(c, `${sym}_max`, `Lowest ${words} rating`, low.rating), iW(c, sym, words[0]!.toUpperCase() + words.slice(1), actual)],
        result: rW(c, `M_${sym}`, low.rating - actual),
        note: sym === "TW" ? tongueWeightNote(d, c) : undefined,
      });
  }
  result.steps = steps;

  const advice: string[] = [];
  const cautions = (d.hitchType === "fifth-wheel" ? FIFTH_WHEEL_CAUTIONS : CAUTIONS).slice();
  if (d.bedHitch && (d.rig.ballMount || d.rig.extender || d.rig.weightDistribution?.used || d.rig.hitch?.gtwRating !== undefined || d.rig.hitch?.twRating !== undefined))
    cautions.push(BED_HITCH_IGNORES);
  if (sizeMismatch) {
    advice.push(`Fit a ${t.couplerBallSize} in ball to match the coupler; the ${t.ballSize} in ball does not fit it safely.`);
  }
  for (const l of links) {
    if (l.status === "over") advice.push(overLinkAdvice(c, l.id, l.label, l.limits, (l.limits === "tongue-weight" ? d.tw : d.gtw) ?? 0));
  }
  if (status === "tight") advice.push("Little room is left: weigh the loaded trailer before each trip and load no more.");
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  if (set.unchecked.length) cautions.push(`Not checked because no figure was entered: ${set.unchecked.join("; ")}.`);
  const twNote = tongueWeightNote(d, c);
  if (twNote) cautions.push(twNote);
  if (d.rig.extender && !d.bedHitch) cautions.push(...EXTENDER_CAUTIONS(d.wdUsed));
  const cls = d.rig.hitch?.class;
  const classMax = cls !== undefined ? CLASS_MAX_GTW[cls] : undefined;
  if (!d.bedHitch && classMax !== undefined && d.gtw !== undefined && d.gtw > classMax)
    cautions.push(`The class only sets a ceiling: class ${cls} goes up to ${fW(c, classMax)} (SAE J684), and this trailer is heavier. The hitch's own label gives its rating.`);
  result.advice = advice;
  result.cautions = cautions;

  if (sizeMismatch && status !== "over") result.message = `The ball (${t.ballSize} in) and the coupler (${t.couplerBallSize} in) are different sizes: fit the matching ball before towing.`;
  else if (!governing) result.message = "Enter the trailer's weights and the ratings to find the weakest link.";
  else {
    const g = governing as Governing;
    const isTw = set.tw.some((e) => e.id === g.id);
    const actual = isTw ? d.tw! : d.gtw!;
    const m = govLimit - actual;
    result.message =
      status === "over"
        ? `${g.label} is the weakest link: ${fW(c, govLimit)} allowed, ${fW(c, actual)} on it.`
        : `${g.label} is the weakest link, with ${fW(c, m)} (${fP(m / (govLimit || 1))}) to spare.` +
          (status === "incomplete" ? " Some ratings are still missing." : "");
  }
  return result;
}
