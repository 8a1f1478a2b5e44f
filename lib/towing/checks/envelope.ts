/**
 * Check 11, envelope: the largest gross trailer weight (G) and tongue weight (T) this rig allows as loaded,
 * with every constraint at once:
 *   G ≤ each GTW rating;  G ≤ GCWR − loaded vehicle;
 *   T ≤ each TW rating;   T ≤ payload left;  T ≤ (rear GAWR − rear axle load) · WB / (WB + OH);
 *   s_min · G ≤ T ≤ s_max · G (the tongue-weight band).
 * Physics: the region is the intersection of half-planes; its corners are found in closed form.
 */
import { EPS, fP, fW, iN, iW, lessThan, marginW, NO_STEPS, NO_TEXT, qW, rankOf, ratioOf, rW, statusOf, withMissing, worst, type Ctx } from "../context";
import { needTongueWeight, tongueWeightNote, type Derived } from "../derive";
import { need } from "../missing";
import type { CheckStatus, EnvelopeLine, EnvelopeResult, MissingField, Step } from "../types";
import { ratingSet } from "./weakest-link";
import { rearGainPerTongue, UNMEASURED_RESTORATION } from "./axle-loads";
import { wdState } from "./weight-distribution";

interface Bound {
  id: string;
  label: string;
  on: "G" | "T";
  value: number;
}

export function checkEnvelope(d: Derived, c: Ctx): EnvelopeResult | null {
  if (d.hasAccessory) return null;
  const { rig, band } = d;
  const v = rig.vehicle;
  const set = ratingSet(d);
  const missing: MissingField[] = set.missing.slice();
  const bounds: Bound[] = [];
  for (const e of set.gtw) bounds.push({ id: e.id, label: e.label, on: "G", value: e.rating });
  for (const e of set.tw) bounds.push({ id: e.id, label: e.label, on: "T", value: e.rating });
  const steps: Step[] = [];

  // GCWR
  if (v.gcwr === undefined) missing.push(need("vehicle.gcwr"));
  else if (d.loadedVehicle === undefined) missing.push(need(d.curb === undefined ? "vehicle.curbWeight" : "load.cargo"));
  else {
    bounds.push({ id: "vehicle.gcwr", label: "GCWR less the loaded vehicle", on: "G", value: v.gcwr - d.loadedVehicle });
    if (c.detail)
      steps.push({ id: "gcwr-room", title: "Trailer weight the GCWR leaves", formulaWords: "GCWR minus the loaded vehicle", formula: "GCWR - W_veh", inputs: [iW(c, "GCWR", "GCWR", v.gcwr), iW(c, "W_veh", "Loaded vehicle", d.loadedVehicle)], result: rW(c, "G_gcwr", v.gcwr - d.loadedVehicle) });
  }
  // Payload left for the tongue
  let payloadRoom: number | undefined;
  let payloadBase = 0;
  if (d.weighedTotal !== undefined && v.gvwr !== undefined) {
    payloadBase = v.gvwr;
    payloadRoom = v.gvwr - d.weighedTotal;
  } else if (d.payloadCapacity !== undefined && rig.load?.occupants !== undefined && rig.load?.cargo !== undefined) {
    payloadBase = d.payloadCapacity;
    payloadRoom = d.payloadCapacity - rig.load.occupants - rig.load.cargo - d.hardware;
  }
  if (payloadRoom === undefined) missing.push(need(d.payloadCapacity === undefined ? "vehicle.gvwr" : "load.cargo"));
  else {
    bounds.push({ id: "payload", label: "Payload left", on: "T", value: payloadRoom });
    if (c.detail)
      steps.push({ id: "payload-room", title: "Payload left for the tongue", formulaWords: "Payload capacity minus occupants, cargo and hitch hardware", formula: "P_cap - W_load", inputs: [iW(c, "P_cap", "Payload capacity (or GVWR)", payloadBase), iW(c, "W_load", "Already aboard", payloadBase - payloadRoom)], result: rW(c, "T_payload", payloadRoom) });
  }
  // Axles, in the same state as the axle-loads check: weight distribution at its measured restoration, else the
  // rear axle between the bars released (the bound used here, the safe side) and all the lost load given back.
  const aw = v.axleWeights;
  const s = d.wdUsed ? wdState(d) : undefined;
  const rMeasured = s?.restoration;
  let rearLightestBound: number | undefined;
  if (v.gawrRear === undefined) missing.push(need("vehicle.gawrRear"));
  else if (!aw) missing.push(need("vehicle.axleWeights"));
  else {
    const rHeavy = d.wdUsed ? (rMeasured ?? UNMEASURED_RESTORATION.heaviest) : undefined;
    const k = rearGainPerTongue(d, rHeavy);
    if (k === undefined || !(k > 0)) {
      if (v.wheelbase === undefined) missing.push(need("vehicle.wheelbase"));
      for (const f of d.overhangNeed) missing.push(need(f));
    } else {
      const t = (v.gawrRear - aw.rear) / k;
      bounds.push({ id: "vehicle.gawrRear", label: "Rear GAWR", on: "T", value: t });
      if (d.wdUsed && rMeasured === undefined) {
        const kLight = rearGainPerTongue(d, UNMEASURED_RESTORATION.lightest);
        if (kLight !== undefined && kLight > 0) rearLightestBound = (v.gawrRear - aw.rear) / kLight;
      }
      if (c.detail)
        steps.push({
          id: "rear-axle-room",
          title: "Tongue weight the rear GAWR allows",
          formulaWords: "Room on the rear axle divided by the rear axle's gain per unit of tongue weight",
          formula: "(GAWR_R - R_0) / k_R",
          inputs: [iW(c, "GAWR_R", "Rear GAWR", v.gawrRear), iW(c, "R_0", "Rear axle unhitched", aw.rear), iN("k_R", "Rear axle gain per unit of tongue weight", k, "")],
          result: rW(c, "T_axle", t),
          note: d.wdUsed
            ? rMeasured !== undefined
              ? "With weight distribution at its measured restoration, as the axle-loads check: k_R = 1 + (1 − R) · OH / WB."
              : "Weight distribution not measured yet: the bars taken released (the safe side), as the axle-loads check: k_R = (WB + OH) / WB."
            : v.axleWeightsHitched && d.tw
              ? "From the hitched weighing, as the axle-loads check: k_R = (R_hitched − R_0) / TW."
              : "Statics, as the axle-loads check: k_R = (WB + OH) / WB.",
        });
    }
  }
  // The front axle: over already unhitched leaves no trailer; with more than all of the lost load given back,
  // the front gains (R − 1) · OH / WB per unit of tongue weight.
  if (aw && v.gawrFront !== undefined) {
    if (aw.front > v.gawrFront * (1 + 1e-9)) bounds.push({ id: "vehicle.gawrFront", label: "Front GAWR (over before hitching)", on: "T", value: 0 });
    else if (rMeasured !== undefined && rMeasured > 1 && v.wheelbase !== undefined && d.overhang !== undefined)
      bounds.push({ id: "vehicle.gawrFront", label: "Front GAWR", on: "T", value: (v.gawrFront - aw.front) / (((rMeasured - 1) * d.overhang) / v.wheelbase) });
  }

  let gMax = Infinity;
  let tMax = Infinity;
  let gBound: Bound | undefined;
  let tBound: Bound | undefined;
  for (const b of bounds) {
    if (b.on === "G" && lessThan(b.value, gMax)) {
      gMax = b.value;
      gBound = b;
    }
    if (b.on === "T" && lessThan(b.value, tMax)) {
      tMax = b.value;
      tBound = b;
    }
  }
  const lo = band.min;
  const hi = band.max;
  const result: EnvelopeResult = {
    id: "envelope",
    title: "Trailer envelope",
    status: "incomplete",
    lines: [],
    region: [],
    regionUnit: c.u.weight,
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    steps: NO_STEPS,
  };
  const wf = c.u.weightFactor;
  if (c.detail) {
    // Chart data: only on the full path.
    const lines: EnvelopeLine[] = [];
    for (const b of bounds) lines.push({ id: b.id, label: b.label, kind: b.on === "G" ? "gtw-max" : "tw-max", value: b.value * wf });
    lines.push({ id: "band.min", label: "Lowest tongue-weight share", kind: "share-min", slope: lo });
    lines.push({ id: "band.max", label: "Highest tongue-weight share", kind: "share-max", slope: hi });
    result.lines = lines;
  }

  const statuses: CheckStatus[] = [];
  let exceeded: Array<[Bound, number]> = [];
  // The largest trailer at the trailer's own share (or the middle of the band), for the sentences: at the lowest
  // share the tongue limit allows the most, but that is the edge where sway starts.
  let atShare: { share: number; g: number; own: boolean } | undefined;
  if (gBound && tBound) {
    // Largest G: the GTW limit, or where the lowest share meets the TW limit.
    const gx = Math.max(0, Math.min(gMax, tMax / lo));
    const tx = Math.max(0, Math.min(tMax, hi * gx));
    const byBand = lessThan(tMax / lo, gMax);
    result.maxGrossTrailerWeight = qW(c, gx);
    result.maxTongueWeight = qW(c, tx);
    // Binding first along the trailer's own share (or the middle of the band).
    const share = d.gtw !== undefined && d.tw !== undefined && d.gtw > 0 && d.tw > 0 ? d.tw / d.gtw : (lo + hi) / 2;
    let bind: Bound | undefined;
    let gAt = Infinity;
    for (const b of bounds) {
      const g = b.on === "G" ? b.value : b.value / share;
      if (lessThan(g, gAt)) {
        gAt = g;
        bind = b;
      }
    }
    if (bind) result.binding = { id: bind.id, label: bind.label, value: bind.value * wf, unit: c.u.weight };
    if (Number.isFinite(gAt)) atShare = { share, g: Math.max(0, gAt), own: d.gtw !== undefined && d.tw !== undefined && d.gtw > 0 && d.tw > 0 };
    if (c.detail && gx > EPS) {
      const g1 = Math.min(tMax / hi, gx);
      const pts: Array<[number, number]> = [[0, 0], [g1, hi * g1], [gx, Math.min(hi * gx, tMax)], [gx, lo * gx]];
      const region: EnvelopeResult["region"] = [];
      for (const [g, t] of pts) {
        const last = region[region.length - 1];
        if (!last || Math.abs(last.grossTrailerWeight - g * wf) > 1e-9 || Math.abs(last.tongueWeight - t * wf) > 1e-9)
          region.push({ grossTrailerWeight: g * wf, tongueWeight: t * wf });
      }
      result.region = region;
    }
    if (c.detail) {
      steps.push({
        id: "max-gtw",
        title: "Largest gross trailer weight",
        formulaWords: "The lowest GTW limit, or the TW limit divided by the lowest share, whichever is smaller",
        formula: "min(G_lim, T_lim / s_min)",
        inputs: [iW(c, "G_lim", gBound.label, gMax), iW(c, "T_lim", tBound.label, tMax), iN("s_min", "Lowest share", lo, "")],
        result: rW(c, "G_max", gx),
        note: byBand ? "The tongue limit binds: a heavier trailer would need more tongue weight than allowed." : undefined,
      });
      steps.push({
        id: "max-tw",
        title: "Largest tongue weight",
        formulaWords: "The lowest TW limit, or the highest share of the largest trailer, whichever is smaller",
        formula: "min(T_lim, s_max * G_max)",
        inputs: [iW(c, "T_lim", tBound.label, tMax), iN("s_max", "Highest share", hi, ""), iW(c, "G_max", "Largest gross trailer weight", gx)],
        result: rW(c, "T_max", tx),
      });
    }
    // The trailer against the largest gross weight and the largest tongue weight: the badge and the figures
    // shown come from the same comparison, the one with the least room.
    const parts: Array<{ on: "G" | "T"; actual: number; limit: number; status: CheckStatus }> = [];
    if (d.gtw !== undefined) parts.push({ on: "G", actual: d.gtw, limit: gx, status: statusOf(d.gtw, gx, c.tight) });
    if (d.tw !== undefined) {
      let st = statusOf(d.tw, tx, c.tight);
      // Over the rear-axle bound with the bars released, but not with all the load given back: measure first.
      if (st === "over" && rearLightestBound !== undefined && tBound?.id === "vehicle.gawrRear" && d.tw <= Math.min(rearLightestBound, hi * gx) * (1 + 1e-9)) {
        const otherT = bounds.filter((b) => b.on === "T" && b.id !== "vehicle.gawrRear").reduce((m, b) => Math.min(m, b.value), Infinity);
        if (d.tw <= otherT * (1 + 1e-9)) {
          st = "incomplete";
          missing.push(need("weightDistribution.fenderWithWd"));
        }
      }
      parts.push({ on: "T", actual: d.tw, limit: tx, status: st });
    }
    let shown: (typeof parts)[number] | undefined;
    for (const p of parts) {
      statuses.push(p.status);
      const r = ratioOf(p.actual, p.limit);
      if (!shown || rankOf(p.status) > rankOf(shown.status) || (rankOf(p.status) === rankOf(shown.status) && lessThan(r, ratioOf(shown.actual, shown.limit)))) shown = p;
    }
    if (shown) {
      result.actual = qW(c, shown.actual);
      result.limit = qW(c, shown.limit);
      result.margin = marginW(c, shown.actual, shown.limit);
      const b = shown.on === "G" ? (byBand ? tBound : gBound) : tBound;
      const bv = shown.on === "G" ? (byBand ? tMax : gMax) : tMax;
      result.governing = { id: b.id, label: b.label, value: bv * wf, unit: c.u.weight };
      exceeded = [];
      if (d.gtw !== undefined) for (const bd of bounds) if (bd.on === "G" && d.gtw > bd.value * (1 + 1e-9)) exceeded.push([bd, d.gtw]);
      if (d.tw !== undefined) for (const bd of bounds) if (bd.on === "T" && d.tw > bd.value * (1 + 1e-9)) exceeded.push([bd, d.tw]);
      if (d.gtw !== undefined && byBand && d.gtw > gx * (1 + 1e-9) && !exceeded.length) exceeded.push([{ id: "band.min", label: `Tongue limit at the lowest share (${tBound.label.toLowerCase()})`, on: "G", value: gx }, d.gtw]);
    }
    // With nothing hitched, or a trailer not yet weighed, the envelope is an answer but not a check.
    if (d.gtw === undefined) missing.push(need("trailer.grossTrailerWeight"));
    if (d.hasTrailer && d.tw === undefined) missing.push(...needTongueWeight(d));
    // Room left in the vehicle with this trailer on.
    const roomParts: number[] = [];
    if (payloadRoom !== undefined) roomParts.push(payloadRoom - (d.tw ?? 0));
    if (v.gcwr !== undefined && d.loadedVehicle !== undefined) roomParts.push(v.gcwr - d.loadedVehicle - (d.gtw ?? 0));
    if (roomParts.length) result.vehicleLoadRoom = qW(c, Math.min(...roomParts));
  } else {
    if (!gBound) missing.push(need("vehicle.towRating"));
    if (!tBound) missing.push(need("vehicle.tongueWeightLimit"));
  }
  result.status = withMissing(worst(statuses), missing);
  if (missing.length) result.missing = dedupe(missing);
  if (!c.detail) return result;
  result.steps = steps;
  result.cautions = [
    "The envelope holds for the vehicle loaded as entered: more people or cargo shrink it.",
    "A trailer inside the envelope still needs its tongue weight inside the band and its own ratings respected.",
    "The largest trailer is stated at the tongue share named: loaded lighter on the tongue the limits allow more, but that is where sway starts.",
  ];
  const note = tongueWeightNote(d, c);
  if (note) result.cautions.push(note);
  if (d.wdUsed && rMeasured === undefined) result.cautions.push("The restoration is not measured yet: the rear axle is taken with the bars released, so the envelope may be larger once the fender heights are measured.");
  const advice: string[] = [];
  if (result.status === "over" && atShare)
    advice.push(
      `Choose a trailer no heavier than ${fW(c, atShare.g)} loaded at a ${fP(atShare.share)} tongue share (${fW(c, atShare.g * atShare.share)} on the tongue), or take weight out, keeping the tongue share inside its band.`,
    );
  for (const m of result.missing ?? []) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  const over = exceeded.length
    ? exceeded
        .map(([b, actual]) =>
          b.id === "band.min"
            ? `at ${fW(c, actual)} the trailer would need more tongue weight than the ${tBound!.label.toLowerCase()} allows (largest trailer ${fW(c, b.value)}, ${fW(c, actual - b.value)} over)`
            : `${b.label.toLowerCase()} allows ${fW(c, Math.max(0, b.value))} ${b.on === "G" ? "of trailer" : "on the tongue"}, the trailer puts ${fW(c, actual)} (${fW(c, actual - Math.max(0, b.value))} over)`,
        )
        .join("; ")
    : "";
  result.message =
    result.status === "over" && over
      ? `This trailer is more than the rig allows: ${over}.`
      : result.maxGrossTrailerWeight && result.maxTongueWeight && atShare
      ? `As loaded, at ${atShare.own ? "this trailer's" : "a mid-band"} ${fP(atShare.share)} tongue share, this rig allows a trailer up to ${fW(c, atShare.g)} with ${fW(c, atShare.g * atShare.share)} on the tongue` +
        (result.binding ? `; first to bind: ${result.binding.label.toLowerCase()}.` : ".") +
        (result.status === "incomplete" ? " Some limits are not known yet, so it may be less." : "")
      : "Enter the vehicle's and the hitch's ratings to see how heavy a trailer this rig can take.";
  return result;
}

function dedupe(list: MissingField[]): MissingField[] {
  const seen = new Set<string>();
  return list.filter((m) => (seen.has(m.field) ? false : (seen.add(m.field), true)));
}
