/**
 * Check 9, accessory fit: a hitch-mounted rack or cargo carrier.
 * - Load: the accessory and its load against the tongue capacity, weighted by its moment about the pin.
 *   Physics: moment about the receiver pin, M = W · (d + e). The rating is taken to apply at a reference arm
 *   d_ref behind the pin, so the equivalent load is W · max(1, (d + e) / d_ref). The reference arm is common
 *   practice, no published source (default 10 in, an option).
 * - Fold: the clearance it needs when folded against pin-to-fascia (plus any extender).
 * - Ground: height and angle of its lowest point; the angle against the vehicle's departure angle
 *   (Source: 49 CFR 523.2 for the definition; the angle is geometry: atan(h / d)).
 */
import { EPS, fA, fL, fW, iL, iN, iW, lessThan, rankOf, marginL, marginW, NO_STEPS, NO_TEXT, qL, qW, ratioOf, rL, rN, rW, statusOf, worst, type Ctx } from "../context";
import type { Derived } from "../derive";
import { RISE_CAUTION } from "../advice";
import { need } from "../missing";
import { EXTENDER_CAUTIONS } from "./weakest-link";
import type { AccessoryFitResult, CheckStatus, Margin, MissingField, Quantity, Step } from "../types";

/** A receiver whose top is about 12 in from the ground calls for a raised shank. Common practice, no published source. */
export const LOW_RECEIVER_IN = 12;

const RAD = 180 / Math.PI;

const CAUTIONS = [
  "Check the accessory's own rating as well as the hitch's: the lowest one is the limit.",
  "The further the load sits from the receiver, the harder it levers on the hitch; an extender makes this worse, and extender makers often cut the rating, often by half. Use the extender's own label.",
  "Use an anti-rattle device or a locking pin, and check the bolts and pin before each trip and again after the first few miles.",
  "Lights and the number plate must stay visible in many places: check local law.",
];

type Part = AccessoryFitResult["parts"][number];

export function checkAccessoryFit(d: Derived, c: Ctx): AccessoryFitResult | null {
  if (!d.hasAccessory) return null;
  const { rig } = d;
  const a = rig.accessory!;
  const v = rig.vehicle;
  const h = rig.hitch;
  const ext = rig.extender?.length ?? 0;
  const missing: MissingField[] = [];
  const steps: Step[] = [];
  const parts: Part[] = [];
  const detail = c.detail;

  // ---- load on the receiver ----
  const limits: Array<[string, string, number]> = [];
  if (v.tongueWeightLimit !== undefined) limits.push(["vehicle.tongueWeightLimit", "Vehicle tongue-weight limit", v.tongueWeightLimit]);
  else missing.push(need("vehicle.tongueWeightLimit"));
  if (h?.twRating !== undefined) limits.push(["hitch.twRating", "Hitch tongue rating", h.twRating]);
  else missing.push(need("hitch.twRating"));
  // The extender's label already allows for its own length: it is compared with the plain load, never derated again.
  if (rig.extender?.twRating !== undefined) limits.push(["extender.twRating", "Extender tongue rating", rig.extender.twRating]);
  else if (rig.extender) missing.push(need("extender.twRating"));
  // A receiver adapter carries the rack as well: its own label is a link, required when one is fitted.
  if (rig.receiverAdapter?.twRating !== undefined) limits.push(["receiverAdapter.twRating", "Receiver adapter tongue rating", rig.receiverAdapter.twRating]);
  else if (rig.receiverAdapter) missing.push(need("receiverAdapter.twRating"));
  let lowVh: [string, string, number] | undefined;
  for (const l of limits) if (l[0] !== "extender.twRating" && l[0] !== "receiverAdapter.twRating" && (!lowVh || lessThan(l[2], lowVh[2]))) lowVh = l;
  if (a.weight === undefined) missing.push(need("accessory.weight"));
  if (a.loadWeight === undefined) missing.push(need("accessory.loadWeight"));
  if (a.loadCenterFromPin === undefined) missing.push(need("accessory.loadCenterFromPin"));
  let low: [string, string, number] | undefined;
  for (const l of limits) if (!low || lessThan(l[2], low[2])) low = l;
  const loadPart: Part = { id: "load", label: "Load on the receiver", status: "incomplete" };
  let leverBeyond = false;
  // The load is checked against the ratings as soon as it and one rating are known; the lever effect (a
  // convention) waits for the load's distance, and while it waits the part can still read over, never within
  // on its own: the distance stays on the missing list, so the check stays unconfirmed.
  if (d.hitchLoad !== undefined) {
    const w = d.hitchLoad;
    const arm = a.loadCenterFromPin !== undefined ? a.loadCenterFromPin + ext : undefined;
    const factor = arm !== undefined ? Math.max(1, arm / c.referenceArm) : undefined;
    const eq = factor !== undefined ? w * factor : undefined;
    loadPart.actual = qW(c, w);
    if (eq === undefined) loadPart.waitingFor = "The distance from the pin hole to the load's centre, to weigh how hard the load levers on the hitch";
    if (low) {
      // The ratings decide "over" on the load itself. The lever effect is a convention (the reference arm has no
      // published source): beyond the vehicle's or hitch's rating it makes the part tight, never over.
      loadPart.limit = qW(c, low[2]);
      loadPart.margin = marginW(c, w, low[2]);
      const byRating = statusOf(w, low[2], c.tight);
      const byLever = lowVh && eq !== undefined ? statusOf(eq, lowVh[2], c.tight, "tight") : "within";
      loadPart.status = eq === undefined ? worst([byRating, "incomplete"]) : worst([byRating, byLever]);
      leverBeyond = byRating !== "over" && !!lowVh && eq !== undefined && eq > lowVh[2] * (1 + 1e-9);
    }
    if (detail)
      steps.push({ id: "accessory-weight", title: "Weight on the receiver", formulaWords: "Accessory weight plus the load it carries", formula: "W_rack + W_load", inputs: [iW(c, "W_rack", "Accessory", a.weight!), iW(c, "W_load", "Its load", a.loadWeight!)], result: rW(c, "W", w) });
    if (detail && factor !== undefined && eq !== undefined)
      steps.push(
        {
          id: "accessory-lever",
          title: "Lever effect of the load's distance",
          formulaWords: "Distance from the pin to the load's centre, plus the extender, over the reference arm (never less than 1)",
          formula: "max(1, (d + e) / d_ref)",
          inputs: [iL(c, "d", "Pin to the load's centre", a.loadCenterFromPin!), iL(c, "e", "Extender", ext), iL(c, "d_ref", "Reference arm for the rating", c.referenceArm)],
          result: rN("k", factor, ""),
          note: "The reference arm is common practice, not a published figure; the moment about the pin is physics.",
        },
        { id: "accessory-equivalent", title: "Equivalent tongue load", formulaWords: "Weight times the lever effect", formula: "W * k", inputs: [iW(c, "W", "Weight on the receiver", w), iN("k", "Lever effect", factor, "")], result: rW(c, "W_eq", eq) },
      );
    if (detail && low)
      steps.push({
        id: "accessory-capacity",
        title: "Room left on the tongue capacity",
        formulaWords: "Lowest tongue rating minus the weight on the receiver",
        formula: limits.length > 1 ? `min(${limits.map((_, i) => `T_${i + 1}`).join(", ")}) - W` : "T_1 - W",
        inputs: [...limits.map((l, i) => iW(c, `T_${i + 1}`, l[1], l[2])), iW(c, "W", "Weight on the receiver", w)],
        result: rW(c, "M_T", low[2] - w),
      });
    if (detail && lowVh && eq !== undefined)
      steps.push({
        id: "accessory-lever-allowance",
        title: "Room left for the lever effect",
        formulaWords: "The vehicle's or hitch's lowest tongue rating minus the equivalent load (a caution at most)",
        formula: "T_vh - W_eq",
        inputs: [iW(c, "T_vh", lowVh[1], lowVh[2]), iW(c, "W_eq", "Equivalent load", eq)],
        result: rW(c, "M_lever", lowVh[2] - eq),
        note: "Common practice, no published source: beyond it the check reads tight, never over.",
      });
  }
  parts.push(loadPart);

  // ---- fold clearance ----
  const folds = a.type === "platform-rack" || a.type === "hanging-rack" || a.foldClearance !== undefined;
  if (folds) {
    const foldPart: Part = { id: "fold", label: "Room to fold up", status: "incomplete" };
    if (a.foldClearance === undefined) missing.push(need("accessory.foldClearance"));
    if (h?.pinToFascia === undefined) missing.push(need("hitch.pinToFascia"));
    if (a.foldClearance !== undefined && h?.pinToFascia !== undefined) {
      const room = h.pinToFascia + ext;
      foldPart.actual = qL(c, a.foldClearance);
      foldPart.limit = qL(c, room);
      foldPart.margin = marginL(c, a.foldClearance, room);
      // Not folding clear of the bumper is a fit to change (another accessory or a short extender), not a rating.
      foldPart.status = statusOf(a.foldClearance, room, c.tight, "adjust");
      if (detail)
        steps.push({
          id: "fold-room",
          title: "Room to fold against the bumper",
          formulaWords: "Pin hole to fascia, plus the extender, minus the clearance the folded accessory needs",
          formula: "P_f + e - C_fold",
          inputs: [iL(c, "P_f", "Pin hole to fascia", h.pinToFascia), iL(c, "e", "Extender", ext), iL(c, "C_fold", "Clearance needed folded", a.foldClearance)],
          result: rL(c, "M_fold", room - a.foldClearance),
        });
    }
    parts.push(foldPart);
  }

  // ---- ground clearance and departure angle ----
  const recv = h?.receiverHeight;
  const rise = a.shankRise ?? 0;
  let angle: number | undefined;
  let ground: number | undefined;
  let riseNeeded: number | undefined;
  if (recv === undefined) missing.push(need("hitch.receiverHeight"));
  if (a.lowestPointBelowShankTop === undefined) missing.push(need("accessory.lowestPointBelowShankTop"));
  const groundPart: Part = { id: "ground", label: "Ground clearance and departure angle", status: "incomplete" };
  if (recv !== undefined && a.lowestPointBelowShankTop !== undefined) {
    ground = recv + rise - a.lowestPointBelowShankTop;
    if (detail)
      steps.push({
        id: "ground-clearance",
        title: "Ground clearance of the lowest point",
        formulaWords: "Receiver height plus shank rise minus the drop of the lowest point below the shank top",
        formula: "H_r + r - h_low",
        inputs: [iL(c, "H_r", "Receiver height", recv), iL(c, "r", "Shank rise", rise), iL(c, "h_low", "Lowest point below the shank top", a.lowestPointBelowShankTop)],
        result: rL(c, "h", ground),
      });
    if (ground <= EPS) {
      // A raised shank is needed: a set-up to adjust.
      groundPart.status = "adjust";
      groundPart.actual = qL(c, ground);
      groundPart.limit = qL(c, 0);
    } else {
      if (d.pin === undefined) missing.push(need("vehicle.rearAxleToPin"));
      if (a.lowestPointBehindPin === undefined) missing.push(need("accessory.lowestPointBehindPin"));
      if (v.departureAngle === undefined) missing.push(need("vehicle.departureAngle"));
      if (d.pin !== undefined && a.lowestPointBehindPin !== undefined) {
        const dist = d.pin + ext + a.lowestPointBehindPin;
        angle = Math.atan2(ground, dist) * RAD;
        if (detail)
          steps.push({
            id: "accessory-angle",
            title: "Angle to the accessory's lowest point",
            formulaWords: "Arc tangent of its height over its distance behind the rear tyre's contact point",
            formula: "atan(h / x) * 180 / pi",
            inputs: [iL(c, "h", "Height of the lowest point", ground), iL(c, "x", "Rear axle to the lowest point", dist)],
            result: rN("alpha", angle, "°"),
          });
        const target = v.departureAngle;
        if (target !== undefined) {
          groundPart.actual = { value: target, unit: "°" };
          groundPart.limit = { value: angle, unit: "°" };
          groundPart.margin = { value: angle - target, unit: "°", ratio: ratioOf(target, angle) };
          // Below the vehicle's own departure angle: a raised shank or another accessory, a set-up to adjust.
          groundPart.status = statusOf(target, angle, c.tight, "adjust");
          const needH = dist * Math.tan(target / RAD);
          riseNeeded = Math.max(0, needH - ground);
          if (detail)
            steps.push({
              id: "shank-rise-needed",
              title: "Extra shank rise to keep the departure angle",
              formulaWords: "Height the lowest point needs for the vehicle's departure angle, minus its height now (zero if none)",
              formula: "max(0, x * tan(beta * pi / 180) - h)",
              inputs: [iL(c, "x", "Rear axle to the lowest point", dist), iN("beta", "Vehicle departure angle", target, "°"), iL(c, "h", "Height of the lowest point", ground)],
              result: rL(c, "r_add", riseNeeded),
            });
        }
      }
    }
  }
  parts.push(groundPart);

  const statuses: CheckStatus[] = parts.map((p) => p.status).filter((s) => s !== "incomplete");
  let status = worst(statuses);
  if (status !== "over" && missing.length) status = "incomplete";
  let gov: Part | undefined;
  let best = Infinity;
  // The part shown is the most severe, then the one with the least room, so the badge and the figures agree.
  let govRank = -1;
  for (const p of parts) {
    if (!p.margin) continue;
    const r = rankOf(p.status);
    if (r > govRank || (r === govRank && lessThan(p.margin.ratio, best))) {
      govRank = r;
      best = p.margin.ratio;
      gov = p;
    }
  }
  const result: AccessoryFitResult = {
    id: "accessory-fit",
    title: "Accessory fit",
    status,
    parts,
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    missing: missing.length ? missing : undefined,
    steps: NO_STEPS,
  };
  if (angle !== undefined) result.accessoryAngle = { value: angle, unit: "°" };
  if (ground !== undefined) result.groundClearance = qL(c, ground);
  if (riseNeeded !== undefined) result.shankRiseNeeded = qL(c, riseNeeded);
  if (gov) {
    result.actual = gov.actual as Quantity;
    result.limit = gov.limit as Quantity;
    result.margin = gov.margin as Margin;
    result.governing =
      gov.id === "load" && low
        ? { id: low[0], label: low[1], value: qW(c, low[2]).value, unit: c.u.weight }
        : gov.id === "fold"
          ? { id: "hitch.pinToFascia", label: "Room to fold (pin hole to fascia)", value: gov.limit!.value, unit: gov.limit!.unit }
          : { id: "accessory.angle", label: "Accessory's angle from the rear tyre", value: gov.limit!.value, unit: "°" };
  }
  if (!detail) return result;
  result.steps = steps;
  const cautions = CAUTIONS.slice();
  if (rig.extender) cautions.push(...EXTENDER_CAUTIONS(false));
  const advice: string[] = [];
  if (leverBeyond)
    cautions.push(
      `Its moment about the pin is more than the ${fL(c, c.referenceArm)} reference arm allows for: the load counts as about ${fW(c, (d.hitchLoad ?? 0) * Math.max(1, ((a.loadCenterFromPin ?? 0) + ext) / c.referenceArm))} against the ratings. The reference arm is common practice, no published source: the accessory's and the hitch's own instructions decide.`,
    );
  if (recv !== undefined && recv <= LOW_RECEIVER_IN + EPS)
    advice.push(`The receiver sits low (${fL(c, recv)} from the ground): more shank rise keeps the accessory clear of driveways and ramps.`);
  if (loadPart.status === "over" || leverBeyond)
    advice.push(
      ext > 0
        ? "Carry less on the accessory, bring the load closer to the vehicle, or do without the extender."
        : "Carry less on the accessory, or bring the load closer to the vehicle.",
    );
  const foldPart = parts.find((p) => p.id === "fold");
  if (foldPart?.status === "adjust") advice.push("The accessory will hit the bumper when folded: choose one that folds in the room available, or fit a short extender if its rating allows.");
  if (groundPart.status === "adjust" && ground !== undefined && ground <= EPS) advice.push("The accessory's lowest point would touch the ground: fit a shank with more shank rise.");
  else if (riseNeeded !== undefined && riseNeeded > EPS)
    advice.push(`Add about ${fL(c, riseNeeded)} of shank rise to keep the vehicle's ${fA(v.departureAngle!)} departure angle.`);
  if (advice.some((a) => /shank rise/.test(a))) advice.push(RISE_CAUTION);
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  result.cautions = cautions;
  result.message =
    status === "over"
      ? `A rating is exceeded: ${fW(c, d.hitchLoad ?? 0)} on the receiver, more than the ${low ? low[1].toLowerCase() : "rating"} of ${low ? fW(c, low[2]) : "?"}.`
      : status === "adjust"
        ? [
            groundPart.status === "adjust" && ground !== undefined && ground <= EPS
              ? "The accessory's lowest point would touch the ground: a raised shank is needed"
              : groundPart.status === "adjust" && angle !== undefined && v.departureAngle !== undefined
                ? `The accessory sits at ${fA(angle)} from the rear tyre, below the vehicle's ${fA(v.departureAngle)} departure angle: about ${fL(c, riseNeeded ?? 0)} more shank rise is needed`
                : "",
            parts.find((p) => p.id === "fold")?.status === "adjust" ? "It does not fold clear of the bumper" : "",
          ]
            .filter(Boolean)
            .join("; ") + "."
      : status === "incomplete"
        ? "Some measurements are missing to check the accessory's fit."
        : status === "tight"
          ? `The accessory fits, with little room on the ${gov?.label.toLowerCase() ?? "closest item"}.`
          : `The accessory fits: load, folding and ground clearance are within limits${d.hitchLoad !== undefined ? ` (${fW(c, d.hitchLoad)} on the receiver)` : ""}.`;
  return result;
}
