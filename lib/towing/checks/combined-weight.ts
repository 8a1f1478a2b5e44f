/**
 * Check 5, combined weight: the loaded vehicle plus the whole trailer against GCWR. The tongue weight is part
 * of the trailer's weight, so it is not added again. Physics: the rig's total mass.
 */
import { fP, fW, govW, iW, marginW, NO_STEPS, NO_TEXT, qW, rW, statusOf, withMissing, type Ctx } from "../context";
import type { Derived } from "../derive";
import { brakeCautions } from "../advice";
import { need } from "../missing";
import type { CheckResult, MissingField, Step } from "../types";

const CAUTIONS = [
  "The tongue weight is already part of the trailer's weight: it is not counted twice.",
  "The GCWR caps the whole rig: the vehicle with everyone and everything in it, plus the loaded trailer. A rig near it climbs, stops and cools poorly.",
];

export function checkCombinedWeight(d: Derived, c: Ctx): CheckResult | null {
  if (!d.hasTrailer) return null;
  const { rig } = d;
  const v = rig.vehicle;
  const missing: MissingField[] = [];
  if (d.gtw === undefined) missing.push(need("trailer.grossTrailerWeight"));
  if (v.gcwr === undefined) missing.push(need("vehicle.gcwr"));
  if (d.loadedVehicle === undefined) {
    if (d.curb === undefined) missing.push(need("vehicle.curbWeight"));
    if (rig.load?.occupants === undefined) missing.push(need("load.occupants"));
    if (rig.load?.cargo === undefined) missing.push(need("load.cargo"));
  }
  const result: CheckResult = {
    id: "combined-weight",
    title: "Combined weight",
    status: "incomplete",
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    steps: NO_STEPS,
  };
  const steps: Step[] = [];
  // With the vehicle figure missing, its known parts still give a lower bound that can prove "over".
  const vehicle = d.loadedVehicle ?? (d.curb ?? 0) + (rig.load?.occupants ?? 0) + (rig.load?.cargo ?? 0) + d.hardware;
  const gtw = d.gtw ?? 0;
  const total = vehicle + gtw;
  if (c.detail) {
    if (d.loadedVehicle !== undefined && d.weighedTotal === undefined)
      steps.push({
        id: "loaded-vehicle",
        title: "Loaded vehicle weight",
        formulaWords: "Curb weight plus occupants plus cargo plus hitch hardware",
        formula: "W_curb + W_occ + W_cargo + W_hw",
        inputs: [
          iW(c, "W_curb", "Curb weight", d.curb!),
          iW(c, "W_occ", "Occupants", rig.load?.occupants ?? 0),
          iW(c, "W_cargo", "Cargo", rig.load?.cargo ?? 0),
          iW(c, "W_hw", "Hitch hardware", d.hardware),
        ],
        result: rW(c, "W_veh", vehicle),
        note: v.curbWeight === undefined ? "Curb weight taken as GVWR minus the label's payload." : undefined,
      });
    else if (d.weighedTotal !== undefined)
      steps.push({
        id: "loaded-vehicle",
        title: "Loaded vehicle weight",
        formulaWords: "Front axle plus rear axle, as weighed unhitched",
        formula: "F_w + R_w",
        inputs: [iW(c, "F_w", "Front axle as weighed", v.axleWeights!.front), iW(c, "R_w", "Rear axle as weighed", v.axleWeights!.rear)],
        result: rW(c, "W_veh", vehicle),
      });
    steps.push({
      id: "combined",
      title: "Combined weight",
      formulaWords: "Loaded vehicle plus gross trailer weight (the tongue weight is inside the trailer's weight)",
      formula: "W_veh + GTW",
      inputs: [iW(c, "W_veh", "Loaded vehicle", vehicle), iW(c, "GTW", "Gross trailer weight", gtw)],
      result: rW(c, "GCW", total),
    });
  }
  if (v.gcwr !== undefined) {
    result.actual = qW(c, total);
    result.limit = qW(c, v.gcwr);
    result.margin = marginW(c, total, v.gcwr);
    result.governing = govW(c, "vehicle.gcwr", "GCWR", v.gcwr);
    result.status = withMissing(statusOf(total, v.gcwr, c.tight), missing);
    if (c.detail)
      steps.push({
        id: "combined-margin",
        title: "Room left under GCWR",
        formulaWords: "GCWR minus the combined weight",
        formula: "GCWR - GCW",
        inputs: [iW(c, "GCWR", "GCWR", v.gcwr), iW(c, "GCW", "Combined weight", total)],
        result: rW(c, "M_GCW", v.gcwr - total),
      });
  }
  if (missing.length) result.missing = missing;
  if (!c.detail) return result;
  result.steps = steps;
  const cautions = CAUTIONS.slice();
  cautions.push(...brakeCautions(d));
  result.cautions = cautions;
  const advice: string[] = [];
  if (result.status === "over") advice.push(`Take ${fW(c, total - v.gcwr!)} off the rig: lighten the trailer or the vehicle, or use a vehicle with a higher GCWR. Weight distribution does not raise it.`);
  if (result.status === "tight") advice.push("The rig is close to its GCWR: weigh it whole at a public scale before a long or hilly trip.");
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  result.message =
    v.gcwr === undefined
      ? "Enter the GCWR from the owner's manual to check the whole rig's weight."
      : result.status === "over"
        ? `The whole rig weighs ${fW(c, total)}, over the GCWR of ${fW(c, v.gcwr)}.`
        : `The whole rig weighs ${fW(c, total)} of the ${fW(c, v.gcwr)} GCWR, leaving ${fW(c, v.gcwr - total)} (${fP((v.gcwr - total) / v.gcwr)}).` +
          (result.status === "incomplete" ? " Some figures are missing." : "");
  return result;
}
