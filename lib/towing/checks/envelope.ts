/**
 * Check 11, envelope: the largest gross trailer weight (G) and tongue weight (T) this rig allows as loaded,
 * with every constraint at once:
 *   G ≤ each GTW rating;  G ≤ GCWR − loaded vehicle;
 *   T ≤ each TW rating;   T ≤ payload left;  T ≤ (rear GAWR − rear axle load) · WB / (WB + OH);
 *   s_min · G ≤ T ≤ s_max · G (the tongue-weight band).
 * Physics: the region is the intersection of half-planes; its corners are found in closed form.
 */
import { EPS, fW, iL, iN, iW, lessThan, marginW, NO_STEPS, NO_TEXT, qW, rW, statusOf, withMissing, worst, type Ctx } from "../context";
import type { Derived } from "../derive";
import { need } from "../missing";
import type { CheckStatus, EnvelopeLine, EnvelopeResult, MissingField, Step } from "../types";
import { ratingSet } from "./weakest-link";

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
  // Rear GAWR
  const aw = v.axleWeights;
  if (v.gawrRear === undefined) missing.push(need("vehicle.gawrRear"));
  else if (!aw) missing.push(need("vehicle.axleWeights"));
  else if (v.wheelbase === undefined) missing.push(need("vehicle.wheelbase"));
  else if (d.overhang === undefined) missing.push(need("vehicle.rearAxleToHitch"));
  else {
    const t = ((v.gawrRear - aw.rear) * v.wheelbase) / (v.wheelbase + d.overhang);
    bounds.push({ id: "vehicle.gawrRear", label: "Rear GAWR", on: "T", value: t });
    if (c.detail)
      steps.push({ id: "rear-axle-room", title: "Tongue weight the rear GAWR allows", formulaWords: "Room on the rear axle times wheelbase over (wheelbase plus overhang)", formula: "(GAWR_R - R_0) * WB / (WB + OH)", inputs: [iW(c, "GAWR_R", "Rear GAWR", v.gawrRear), iW(c, "R_0", "Rear axle unhitched", aw.rear), iL(c, "WB", "Wheelbase", v.wheelbase), iL(c, "OH", "Rear axle to ball", d.overhang)], result: rW(c, "T_axle", t), note: "Weight distribution released: the safe side." });
  }

  let gMax = Infinity;
  let tMax = Infinity;
  let gBound: Bound | undefined;
  let tBound: Bound | undefined;
  for (const b of bounds) {
    if (b.on === "G" && lessThan(b.value, gMax)) (gMax = b.value), (gBound = b);
    if (b.on === "T" && lessThan(b.value, tMax)) (tMax = b.value), (tBound = b);
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
      if (lessThan(g, gAt)) (gAt = g), (bind = b);
    }
    if (bind) result.binding = { id: bind.id, label: bind.label, value: bind.value * wf, unit: c.u.weight };
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
    if (d.gtw !== undefined) {
      statuses.push(statusOf(d.gtw, gx, c.tight));
      result.actual = qW(c, d.gtw);
      result.limit = qW(c, gx);
      result.margin = marginW(c, d.gtw, gx);
      result.governing = { id: (byBand ? tBound : gBound).id, label: (byBand ? tBound : gBound).label, value: (byBand ? tMax : gMax) * wf, unit: c.u.weight };
    }
    if (d.tw !== undefined) statuses.push(statusOf(d.tw, tx, c.tight));
    if (d.hasTrailer && (d.gtw === undefined || d.tw === undefined)) missing.push(need(d.gtw === undefined ? "trailer.grossTrailerWeight" : "trailer.tongueWeight"));
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
  ];
  const advice: string[] = [];
  if (result.status === "over") advice.push(`Choose a trailer no heavier than ${fW(c, result.maxGrossTrailerWeight?.value !== undefined ? result.maxGrossTrailerWeight.value / wf : 0)} loaded, with a tongue weight no more than ${fW(c, (result.maxTongueWeight?.value ?? 0) / wf)}.`);
  for (const m of result.missing ?? []) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  result.message =
    result.maxGrossTrailerWeight && result.maxTongueWeight
      ? `As loaded, this rig allows a trailer up to ${fW(c, result.maxGrossTrailerWeight.value / wf)} with up to ${fW(c, result.maxTongueWeight.value / wf)} on the tongue` +
        (result.binding ? `; first to bind: ${result.binding.label.toLowerCase()}.` : ".") +
        (result.status === "incomplete" ? " Some limits are not known yet, so it may be less." : "")
      : "Enter the vehicle's and the hitch's ratings to see how heavy a trailer this rig can take.";
  return result;
}

function dedupe(list: MissingField[]): MissingField[] {
  const seen = new Set<string>();
  return list.filter((m) => (seen.has(m.field) ? false : (seen.add(m.field), true)));
}
