/**
 * Reads a rig against a rule set and returns legal findings. Pure: it takes the core's derived figures
 * (canonical lb and in) and the rule rows, and returns one finding per row that applies.
 *
 * - law: within, tight (near a limit or a threshold), over, or incomplete when a figure is missing.
 * - guideline: within or tight (with `caution` past its ceiling); never over on its own.
 * - defer: always incomplete ("check local law"), never within.
 * A missing licence is "check the licence", never a pass.
 */
import { EPS, fP, fW, iN, lessOrEqual, lessThan, qW, statusOf, TINY, type Ctx } from "../context";
import type { Derived } from "../derive";
import { need } from "../missing";
import type { CheckStatus, MissingField, Step } from "../types";
import { KG_PER_LB } from "../units";
import { dValue } from "./d-value";
import type { LicenceAllowance, MassUnit, RuleFinding, RuleRow, RuleSet, Threshold } from "./types";

export interface RuleEvaluation {
  findings: RuleFinding[];
  notApplicable: string[];
  steps: Step[];
}

/** Canonical pounds in a rule's own unit. */
function inUnit(lb: number, unit: MassUnit): number {
  return unit === "kg" ? lb * KG_PER_LB : lb;
}
/** A rule's figure in canonical pounds. */
function toLb(value: number, unit: MassUnit): number {
  return unit === "kg" ? value / KG_PER_LB : value;
}
function show(value: number, unit: MassUnit): string {
  return `${Math.round(value).toLocaleString("en-US")} ${unit}`;
}

/** Does the threshold apply to this mass (canonical lb)? Compared in the rule's unit, with the core's tolerance. */
function over(lb: number, t: Threshold): boolean {
  const x = inUnit(lb, t.unit);
  return t.applies === "above" ? !lessOrEqual(x, t.value) : !lessThan(x, t.value);
}

interface MassFor {
  /** The mass the threshold is read on, canonical lb; undefined when it cannot be known. */
  value?: number;
  /** An upper bound when the value itself is unknown (GTM without the towball mass). */
  upper?: number;
  missing: MissingField[];
  label: string;
}

/** The trailer's mass a threshold is read on: laden weight, or GTM (ATM less the towball mass). */
function massFor(d: Derived, t: Threshold): MassFor {
  if (t.of === "laden") {
    return d.gtw === undefined
      ? { missing: [need("trailer.grossTrailerWeight")], label: "gross trailer weight" }
      : { value: d.gtw, missing: [], label: "gross trailer weight" };
  }
  // GTM: what the trailer's axles carry when hitched: its ATM (the plate, else the laden weight) less the towball mass.
  const atm = d.rig.trailer?.mam ?? d.gtw;
  if (atm === undefined) return { missing: [need("trailer.grossTrailerWeight")], label: "GTM" };
  if (d.tw === undefined) return { upper: atm, missing: [need("trailer.tongueWeight")], label: "GTM" };
  return { value: Math.max(0, atm - d.tw), missing: [], label: "GTM" };
}

function base(row: RuleRow, status: CheckStatus, message: string): RuleFinding {
  return { ruleId: row.id, kind: row.kind, topic: row.topic, title: row.title, requires: row.requires, source: row.source, status, message };
}

function cite(row: RuleRow): string {
  return row.source.ref ? `${row.source.title}, ${row.source.ref}` : row.source.title;
}

/** A guideline is never "over" on its own. */
function capGuideline(f: RuleFinding): RuleFinding {
  if (f.kind === "guideline" && f.status === "over") f.status = "tight";
  if (f.kind === "defer") f.status = "incomplete";
  return f;
}

type Has = (d: Derived) => boolean | undefined;

/** Rows that ask for a piece of equipment once the trailer is over a threshold. */
const EQUIPMENT: Record<string, { has: Has; field: string; what: string }> = {
  brakes: { has: (d) => (d.rig.trailer?.brakes === undefined ? undefined : d.rig.trailer.brakes !== "none"), field: "trailer.brakes", what: "brakes" },
  "brakes-all-wheels": {
    has: (d) => (d.rig.trailer?.brakes === "none" ? false : d.rig.trailer?.brakesAllWheels),
    field: "trailer.brakesAllWheels",
    what: "brakes on all wheels",
  },
  breakaway: { has: (d) => d.rig.trailer?.breakaway, field: "trailer.breakaway", what: "a breakaway device" },
  "no-surge": {
    has: (d) => (d.rig.trailer?.brakes === undefined ? undefined : d.rig.trailer.brakes !== "surge"),
    field: "trailer.brakes",
    what: "brakes worked from the driver's seat (not surge brakes)",
  },
};

function equipment(row: RuleRow & { threshold: Threshold }, d: Derived, c: Ctx): RuleFinding {
  const spec = EQUIPMENT[row.test]!;
  const m = massFor(d, row.threshold);
  const limitLb = toLb(row.threshold.value, row.threshold.unit);
  const fitted = spec.has(d);
  const limitText = show(row.threshold.value, row.threshold.unit);
  const f = base(row, "incomplete", "");
  f.limit = qW(c, limitLb);
  if (m.value === undefined) {
    // Only an upper bound: under the threshold it cannot apply; otherwise the figure is needed.
    if (m.upper !== undefined && !over(m.upper, row.threshold)) {
      f.status = "within";
      f.actual = qW(c, m.upper);
      f.message = `The ${m.label} is at most ${fW(c, m.upper)}, not over ${limitText}: ${spec.what} not required by this rule.`;
      return f;
    }
    f.missing = m.missing;
    f.message = `Needs the ${m.label} to tell whether ${spec.what} are required from ${limitText}.`;
    return f;
  }
  f.actual = qW(c, m.value);
  const applies = over(m.value, row.threshold);
  if (applies) {
    if (fitted === true) {
      f.status = "within";
      f.message = `At ${fW(c, m.value)} the trailer needs ${spec.what}, and has them.`;
    } else if (fitted === false) {
      f.status = "over";
      f.message = `At ${fW(c, m.value)} the trailer needs ${spec.what} (${cite(row)}), and this one does not have them.`;
    } else {
      f.missing = [need(spec.field)];
      f.message = `At ${fW(c, m.value)} the trailer needs ${spec.what}: say whether it has them.`;
    }
    return f;
  }
  // Under the threshold: met. Tight when close to it and the equipment is not (known to be) fitted.
  const near = limitLb > TINY && (limitLb - m.value) / limitLb < c.tight - EPS;
  f.status = near && fitted !== true ? "tight" : "within";
  f.message =
    f.status === "tight"
      ? `At ${fW(c, m.value)} the trailer is close to ${limitText}, from where it needs ${spec.what}: weigh it loaded.`
      : `At ${fW(c, m.value)} the trailer is under ${limitText}: ${spec.what} not required by this rule.`;
  return f;
}

function licence(row: RuleRow & { test: "licence" }, d: Derived, c: Ctx, steps: Step[]): RuleFinding {
  const f = base(row, "incomplete", "");
  const category = d.rig.driver?.licence;
  if (category === undefined) {
    f.missing = [need("driver.licence")];
    f.message = "Check the licence: the driver's licence was not given, so this combination is not confirmed.";
    return f;
  }
  const allow: LicenceAllowance | undefined = category === "other" ? undefined : row.categories[category];
  if (!allow) {
    f.message = `Check the licence: the product holds no limits for this licence here.`;
    return f;
  }
  const vehicle = d.rig.vehicle.gvwr;
  const plate = d.rig.trailer?.mam;
  const missing: MissingField[] = [];
  if (vehicle === undefined) missing.push(need("vehicle.gvwr"));
  if (plate === undefined) missing.push(need("trailer.mam"));
  // Without the trailer's plate, its laden weight is a lower bound of its MAM: enough to show a known "over".
  const trailer = plate ?? d.gtw;
  const limits: Array<{ actual: number; limit: number; text: string }> = [];
  const v = vehicle === undefined ? undefined : inUnit(vehicle, allow.unit);
  const t = trailer === undefined ? undefined : inUnit(trailer, allow.unit);
  if (v !== undefined) limits.push({ actual: v, limit: allow.vehicleMax, text: `a vehicle up to ${show(allow.vehicleMax, allow.unit)} GVWR` });
  if (t !== undefined && allow.trailerMax !== undefined)
    limits.push({ actual: t, limit: allow.trailerMax, text: `a trailer up to ${show(allow.trailerMax, allow.unit)} MAM` });
  if (t !== undefined && v !== undefined && allow.combinationMax !== undefined && allow.trailerFreeUpTo !== undefined && !lessOrEqual(t, allow.trailerFreeUpTo))
    limits.push({ actual: v + t, limit: allow.combinationMax, text: `a combination up to ${show(allow.combinationMax, allow.unit)} MAM with a trailer over ${show(allow.trailerFreeUpTo, allow.unit)}` });
  let worstRatio = Infinity;
  let binding: (typeof limits)[number] | undefined;
  let isOver = false;
  for (const l of limits) {
    const s = statusOf(l.actual, l.limit, c.tight);
    const ratio = (l.limit - l.actual) / l.limit;
    if (s === "over") isOver = true;
    if (ratio < worstRatio) {
      worstRatio = ratio;
      binding = l;
    }
  }
  if (binding) {
    const unitLb = (x: number) => toLb(x, allow.unit);
    f.actual = qW(c, unitLb(binding.actual));
    f.limit = qW(c, unitLb(binding.limit));
  }
  if (isOver) {
    f.status = "over";
    f.message = `This licence allows ${binding!.text}; this combination is ${show(binding!.actual, allow.unit)} (${cite(row)}).`;
  } else if (missing.length) {
    f.missing = missing;
    f.message = "Check the licence: the GVWR and the trailer's plated maximum mass are both needed.";
  } else {
    f.status = binding ? statusOf(binding.actual, binding.limit, c.tight) : "within";
    f.message = `This licence allows ${binding?.text ?? "this combination"}; this combination is ${show(binding?.actual ?? 0, allow.unit)}.`;
    if (c.detail && v !== undefined && t !== undefined)
      steps.push({
        id: `licence-${row.id}`,
        title: "Combination's maximum authorised mass",
        formulaWords: "The vehicle's GVWR plus the trailer's plated maximum mass",
        formula: "MAM_v + MAM_t",
        inputs: [iN("MAM_v", "Vehicle GVWR", v, allow.unit), iN("MAM_t", "Trailer's plated maximum mass", t, allow.unit)],
        result: { symbol: "MAM_c", value: v + t, unit: allow.unit },
      });
  }
  return f;
}

function couplingD(row: RuleRow & { test: "coupling-d" }, d: Derived, c: Ctx, steps: Step[]): RuleFinding {
  const f = base(row, "incomplete", "");
  const r = d.rig;
  const marks = [r.hitch?.dValue, r.trailer?.couplingDValue].filter((x): x is number => x !== undefined);
  const missing: MissingField[] = [];
  if (r.vehicle.gvwr === undefined) missing.push(need("vehicle.gvwr"));
  if (r.trailer?.mam === undefined) missing.push(need("trailer.mam"));
  if (!marks.length) missing.push(need("hitch.dValue"));
  const T = r.vehicle.gvwr === undefined ? undefined : (r.vehicle.gvwr * KG_PER_LB) / 1000;
  // D grows with R: the laden weight stands in as a lower bound of the plate, enough to show a known "over".
  const rMass = r.trailer?.mam ?? d.gtw;
  const R = rMass === undefined ? undefined : (rMass * KG_PER_LB) / 1000;
  const marked = marks.length ? Math.min(...marks) : undefined;
  if (T === undefined || R === undefined) {
    f.missing = missing;
    f.message = "Needs the vehicle's and the trailer's maximum masses to work out the D value.";
    return f;
  }
  const D = dValue(T, R, row.g);
  f.actual = { value: D, unit: "kN" };
  if (c.detail)
    steps.push({
      id: `d-value-${row.id}`,
      title: "Coupling D value",
      formulaWords: "g times T times R, divided by T plus R (T and R the maximum masses in tonnes)",
      formula: "g * T * R / (T + R)",
      inputs: [iN("g", "Gravity, m/s²", row.g, ""), iN("T", "Towing vehicle's maximum mass, t", T, ""), iN("R", "Trailer's maximum mass, t", R, "")],
      result: { symbol: "D", value: D, unit: "kN" },
      note: r.trailer?.mam === undefined ? "The trailer's laden weight stands in for its plated maximum: the D value can only be higher." : undefined,
    });
  if (marked === undefined) {
    f.missing = missing;
    f.message = `The coupling needs a D value of at least ${D.toFixed(2)} kN: enter the value marked on the tow bar.`;
    return f;
  }
  f.limit = { value: marked, unit: "kN" };
  const s = statusOf(D, marked, c.tight);
  if (s === "over") {
    f.status = "over";
    f.message = `The coupling is marked D ${marked} kN; this combination needs ${D.toFixed(2)} kN (${cite(row)}).`;
  } else if (missing.length) {
    f.missing = missing;
    f.message = `The coupling is marked D ${marked} kN and needs at least ${D.toFixed(2)} kN with the laden weight: the trailer's plated maximum decides.`;
  } else {
    f.status = s;
    f.message = `The coupling is marked D ${marked} kN; this combination needs ${D.toFixed(2)} kN.`;
  }
  return f;
}

function ballS(row: RuleRow, d: Derived, c: Ctx): RuleFinding {
  const f = base(row, "incomplete", "");
  const S = d.rig.hitch?.sValue;
  const load = d.hitchLoad;
  const missing: MissingField[] = [];
  if (S === undefined) missing.push(need("hitch.sValue"));
  if (load === undefined) missing.push(need(d.hasTrailer ? "trailer.tongueWeight" : "accessory.weight"));
  if (S === undefined || load === undefined) {
    f.missing = missing;
    f.message = "Needs the tow ball's S value and the tongue weight.";
    return f;
  }
  f.actual = qW(c, load);
  f.limit = qW(c, S);
  f.status = statusOf(load, S, c.tight);
  f.message =
    f.status === "over"
      ? `The tongue weight of ${fW(c, load)} is over the ball's S value of ${fW(c, S)}.`
      : `The tongue weight of ${fW(c, load)} is within the ball's S value of ${fW(c, S)}.`;
  return f;
}

function caravanMatch(row: RuleRow & { test: "caravan-match" }, d: Derived, c: Ctx, steps: Step[]): RuleFinding {
  const f = base(row, "incomplete", "");
  const missing: MissingField[] = [];
  if (d.gtw === undefined) missing.push(need("trailer.grossTrailerWeight"));
  if (d.curb === undefined) missing.push(need("vehicle.curbWeight"));
  if (d.gtw === undefined || d.curb === undefined || d.curb <= TINY) {
    f.missing = missing;
    f.message = "Needs the travel trailer's laden weight and the vehicle's curb weight.";
    return f;
  }
  const ratio = d.gtw / d.curb;
  f.actual = { value: ratio * 100, unit: "%" };
  f.limit = { value: row.advised * 100, unit: "%" };
  if (c.detail)
    steps.push({
      id: `match-${row.id}`,
      title: "Travel trailer to vehicle match",
      formulaWords: "The travel trailer's laden weight divided by the vehicle's curb weight, as a percentage",
      formula: "GTW / W_curb * 100",
      inputs: [
        { symbol: "GTW", label: "Gross trailer weight", value: qW(c, d.gtw).value, unit: c.u.weight },
        { symbol: "W_curb", label: "Curb weight", value: qW(c, d.curb).value, unit: c.u.weight },
      ],
      result: { symbol: "m", value: ratio * 100, unit: "%" },
    });
  if (lessOrEqual(ratio, row.advised)) {
    f.status = "within";
    f.message = `The travel trailer weighs ${fP(ratio)} of the vehicle's curb weight, within the ${fP(row.advised)} guideline.`;
  } else if (lessOrEqual(ratio, row.ceiling)) {
    f.status = "tight";
    f.message = `The travel trailer weighs ${fP(ratio)} of the vehicle's curb weight, over the ${fP(row.advised)} guideline: for experienced drivers only.`;
  } else {
    f.status = "tight";
    f.caution = true;
    f.message = `Caution: the travel trailer weighs ${fP(ratio)} of the vehicle's curb weight, heavier than the vehicle itself; the guideline says never over ${fP(row.ceiling)}.`;
  }
  return f;
}

function noseweightBand(row: RuleRow & { test: "noseweight-band" }, d: Derived): RuleFinding {
  const f = base(row, "incomplete", "");
  const { min, max } = row.band;
  if (d.gtw === undefined || d.tw === undefined || d.gtw <= TINY) {
    f.missing = [need(d.gtw === undefined ? "trailer.grossTrailerWeight" : "trailer.tongueWeight")];
    f.message = `Needs the tongue weight: ${fP(min)} to ${fP(max)} of the travel trailer's laden weight is the guideline.`;
    return f;
  }
  const share = d.tw / d.gtw;
  f.actual = { value: share * 100, unit: "%" };
  f.limit = { value: (share < min ? min : max) * 100, unit: "%" };
  const inside = !lessThan(share, min) && lessOrEqual(share, max);
  f.status = inside ? "within" : "tight";
  f.message = inside
    ? `The tongue weight is ${fP(share)} of the travel trailer, inside the ${fP(min)} to ${fP(max)} guideline.`
    : `The tongue weight is ${fP(share)} of the travel trailer, outside the ${fP(min)} to ${fP(max)} guideline: load it again and weigh the tongue.`;
  return f;
}

function upperLimit(row: RuleRow, c: Ctx, actual: number | undefined, limit: number | undefined, missing: MissingField[], what: string, limitName: string): RuleFinding {
  const f = base(row, "incomplete", "");
  if (actual === undefined || limit === undefined) {
    f.missing = missing;
    f.message = `Needs the ${what} and the ${limitName}.`;
    return f;
  }
  f.actual = qW(c, actual);
  f.limit = qW(c, limit);
  f.status = statusOf(actual, limit, c.tight);
  f.message =
    f.status === "over"
      ? `The ${what} of ${fW(c, actual)} is over the ${limitName} of ${fW(c, limit)} (${cite(row)}).`
      : `The ${what} of ${fW(c, actual)} is within the ${limitName} of ${fW(c, limit)}.`;
  return f;
}

function defer(row: RuleRow & { test: "defer" }, d: Derived): RuleFinding | null {
  if (row.threshold) {
    const m = massFor(d, row.threshold);
    const known = m.value ?? m.upper;
    if (known !== undefined && m.value === undefined && !over(known, row.threshold)) return null;
    if (m.value !== undefined) {
      if (!over(m.value, row.threshold)) return null;
      if (row.below !== undefined && !lessThan(inUnit(m.value, row.threshold.unit), row.below)) return null;
    }
  }
  const f = base(row, "incomplete", `Check local law: ${row.requires[0]!.toLowerCase()}${row.requires.slice(1)}`);
  f.deferred = true;
  return f;
}

/** Does the row concern this rig at all? */
function concerns(row: RuleRow, d: Derived): boolean {
  if (row.test === "ball-s") return d.hasTrailer || d.hasAccessory;
  if (!d.hasTrailer) return false;
  if (row.trailerTypes && !row.trailerTypes.includes(d.rig.trailer!.type)) return false;
  return true;
}

/**
 * Every row of `set` against the rig. `d` is the core's derived figures (canonical lb); values in findings are
 * in the rig's own units.
 */
export function evaluateRules(d: Derived, set: RuleSet, c: Ctx): RuleEvaluation {
  const findings: RuleFinding[] = [];
  const notApplicable: string[] = [];
  const steps: Step[] = [];
  const r = d.rig;
  for (const row of set.rules) {
    if (!concerns(row, d)) {
      notApplicable.push(row.id);
      continue;
    }
    let f: RuleFinding | null;
    switch (row.test) {
      case "brakes":
      case "brakes-all-wheels":
      case "breakaway":
      case "no-surge":
        f = equipment(row, d, c);
        break;
      case "licence":
        f = licence(row, d, c, steps);
        break;
      case "coupling-d":
        f = couplingD(row, d, c, steps);
        break;
      case "ball-s":
        f = ballS(row, d, c);
        break;
      case "caravan-match":
        f = caravanMatch(row, d, c, steps);
        break;
      case "noseweight-band":
        f = noseweightBand(row, d);
        break;
      case "towball-limit":
        f = upperLimit(row, c, d.tw, r.vehicle.tongueWeightLimit, [need("trailer.tongueWeight"), need("vehicle.tongueWeightLimit")].filter((m) => (m.field === "trailer.tongueWeight" ? d.tw === undefined : r.vehicle.tongueWeightLimit === undefined)), "tongue weight", "vehicle maker's tongue-weight limit");
        break;
      case "train-weight": {
        const total = d.loadedVehicle !== undefined && d.gtw !== undefined ? d.loadedVehicle + d.gtw : undefined;
        const miss: MissingField[] = [];
        if (d.loadedVehicle === undefined) miss.push(need("vehicle.curbWeight"));
        if (d.gtw === undefined) miss.push(need("trailer.grossTrailerWeight"));
        if (r.vehicle.gcwr === undefined) miss.push(need("vehicle.gcwr"));
        f = upperLimit(row, c, total, r.vehicle.gcwr, miss, "loaded vehicle and trailer together", "GCWR");
        break;
      }
      case "trailer-plate": {
        const miss: MissingField[] = [];
        if (d.gtw === undefined) miss.push(need("trailer.grossTrailerWeight"));
        if (r.trailer?.mam === undefined) miss.push(need("trailer.mam"));
        f = upperLimit(row, c, d.gtw, r.trailer?.mam, miss, "loaded trailer's weight", "trailer's plated maximum mass");
        break;
      }
      case "defer":
        f = defer(row, d);
        break;
    }
    if (f) findings.push(capGuideline(f));
    else notApplicable.push(row.id);
  }
  return { findings, notApplicable, steps };
}
