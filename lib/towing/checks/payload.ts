/**
 * Check 4, payload: what the vehicle carries (people, cargo, the tongue weight or the accessory, the hitch
 * hardware) against its payload capacity (GVWR − curb weight, or the label's figure, the lower of the two).
 * Source: 49 CFR 567.4(g)(3); GM (Cadillac) owner's manuals (tongue weight counts against payload).
 */
import { fP, fW, govW, iW, marginW, NO_STEPS, NO_TEXT, qW, rW, statusOf, withMissing, type Ctx } from "../context";
import { needTongueWeight, tongueWeightNote, type Derived } from "../derive";
import { TAKE_WEIGHT_OUT } from "../advice";
import { need } from "../missing";
import type { CheckResult, MissingField, Step } from "../types";

const CAUTIONS = [
  "The label's payload is for the vehicle as built: every person, every bag, the tongue weight and the hitch parts come out of it.",
  "Options and accessories fitted after the factory (a bed cover, a toolbox, a bull bar) also use payload.",
];

export function checkPayload(d: Derived, c: Ctx): CheckResult {
  const { rig } = d;
  const v = rig.vehicle;
  const missing: MissingField[] = [];
  const hitched = d.hasTrailer || d.hasAccessory;
  const hitchLoad = d.hitchLoad ?? 0;
  if (hitched && d.hitchLoad === undefined) {
    if (d.hasTrailer) missing.push(...needTongueWeight(d));
    else {
      if (rig.accessory!.weight === undefined) missing.push(need("accessory.weight"));
      if (rig.accessory!.loadWeight === undefined) missing.push(need("accessory.loadWeight"));
    }
  }
  const hitchLabel = d.hasAccessory ? "Accessory and its load" : d.bedHitch ? "Pin weight" : "Tongue weight";
  const hitchSym = d.hasAccessory ? "W_acc" : "TW";
  const result: CheckResult = {
    id: "payload",
    title: "Payload",
    status: "incomplete",
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    estimated: d.twEstimated || undefined,
    steps: NO_STEPS,
  };
  const steps: Step[] = [];
  let actual: number | undefined;
  let limit: number | undefined;
  let partial = 0;

  if (d.weighedTotal !== undefined && v.gvwr !== undefined) {
    // Weighed: the scale already includes people, cargo and hardware.
    partial = d.weighedTotal + hitchLoad;
    limit = v.gvwr;
    actual = partial;
    result.governing = govW(c, "vehicle.gvwr", "GVWR", v.gvwr);
    // With a known payload capacity, the same room (GVWR − weighed GVW) is measured against the payload,
    // so a weighed and an unweighed rig are called tight by the same share of the same limit.
    const empty = d.payloadCapacity !== undefined ? v.gvwr - d.payloadCapacity : undefined;
    if (c.detail)
      steps.push({
        id: "gross-vehicle-weight",
        title: "Loaded vehicle with the hitch load",
        formulaWords: `Weighed axle loads plus the ${hitchLabel.toLowerCase()}`,
        formula: `F_w + R_w + ${hitchSym}`,
        inputs: [
          iW(c, "F_w", "Front axle as weighed", rig.vehicle.axleWeights!.front),
          iW(c, "R_w", "Rear axle as weighed", rig.vehicle.axleWeights!.rear),
          iW(c, hitchSym, hitchLabel, hitchLoad),
        ],
        result: rW(c, "GVW", partial),
        note: "Compared with the GVWR: the room left is the payload still free.",
      });
    if (empty !== undefined && d.payloadCapacity !== undefined) {
      limit = d.payloadCapacity;
      actual = partial - empty;
      result.governing =
        d.payloadSource === "label"
          ? govW(c, "vehicle.payloadLabel", "Payload on the label", limit)
          : govW(c, "vehicle.gvwr", "GVWR less curb weight", limit);
      if (c.detail)
        steps.push({
          id: "payload-used",
          title: "Payload used, as weighed",
          formulaWords: "Weighed vehicle with the hitch load, less the empty vehicle (GVWR minus payload capacity)",
          formula: "GVW - (GVWR - P_cap)",
          inputs: [iW(c, "GVW", "Weighed with the hitch load", partial), iW(c, "GVWR", "GVWR", v.gvwr), iW(c, "P_cap", "Payload capacity", limit)],
          result: rW(c, "P_used", actual),
        });
    }
  } else {
    const occ = rig.load?.occupants;
    const cargo = rig.load?.cargo;
    if (d.payloadCapacity === undefined) {
      if (v.gvwr === undefined) missing.push(need("vehicle.gvwr"));
      missing.push(need("vehicle.curbWeight"));
    }
    if (occ === undefined) missing.push(need("load.occupants"));
    if (cargo === undefined) missing.push(need("load.cargo"));
    partial = (occ ?? 0) + (cargo ?? 0) + hitchLoad + d.hardware;
    if (d.payloadCapacity !== undefined) {
      limit = d.payloadCapacity;
      actual = partial;
      result.governing =
        d.payloadSource === "label"
          ? govW(c, "vehicle.payloadLabel", "Payload on the label", limit)
          : govW(c, "vehicle.gvwr", "GVWR less curb weight", limit);
    }
    if (c.detail) {
      if (d.payloadSource === "gvwr-curb")
        steps.push({
          id: "payload-capacity",
          title: "Payload capacity",
          formulaWords: "GVWR minus curb weight",
          formula: "GVWR - W_curb",
          inputs: [iW(c, "GVWR", "GVWR", v.gvwr!), iW(c, "W_curb", "Curb weight", v.curbWeight!)],
          result: rW(c, "P_cap", d.payloadCapacity!),
          note: v.payloadLabel !== undefined ? "Lower than the label's payload, so it governs." : undefined,
        });
      else if (d.payloadSource === "label")
        steps.push({
          id: "payload-capacity",
          title: "Payload capacity",
          formulaWords: "The payload printed on the vehicle's label",
          formula: "P_label",
          inputs: [iW(c, "P_label", "Payload on the label", v.payloadLabel!)],
          result: rW(c, "P_cap", v.payloadLabel!),
          note: v.curbWeight !== undefined && v.gvwr !== undefined ? "Lower than GVWR minus curb weight, so it governs." : undefined,
        });
      steps.push({
        id: "payload-used",
        title: "Payload used",
        formulaWords: `Occupants plus cargo plus ${hitchLabel.toLowerCase()} plus hitch hardware`,
        formula: `W_occ + W_cargo + ${hitchSym} + W_hw`,
        inputs: [
          iW(c, "W_occ", "Occupants", occ ?? 0),
          iW(c, "W_cargo", "Cargo", cargo ?? 0),
          iW(c, hitchSym, hitchLabel, hitchLoad),
          iW(c, "W_hw", "Hitch hardware", d.hardware),
        ],
        result: rW(c, "P_used", partial),
        note: missing.length ? "Missing figures counted as zero here; the check stays open until they are entered." : undefined,
      });
    }
  }

  if (actual !== undefined && limit !== undefined) {
    result.actual = qW(c, actual);
    result.limit = qW(c, limit);
    result.margin = marginW(c, actual, limit);
    result.status = withMissing(statusOf(actual, limit, c.tight), missing);
    if (c.detail)
      steps.push({
        id: "payload-margin",
        title: "Payload left",
        formulaWords: "Limit minus what is carried",
        formula: "P_cap - P_used",
        inputs: [iW(c, "P_cap", "Limit", limit), iW(c, "P_used", "Carried", actual)],
        result: rW(c, "M_P", limit - actual),
      });
  }
  if (missing.length) result.missing = missing;
  if (!c.detail) return result;
  result.steps = steps;
  const cautions = CAUTIONS.slice();
  // The pin weight is counted once, as the hitch load: cargo entered for the bed leaves it out.
  if (d.bedHitch)
    cautions.push("The pin weight rides in the bed and comes out of the payload once, as counted here: the cargo entered is what else rides in the vehicle, without the pin weight. The bed hitch itself belongs in the hitch hardware.");
  if (!d.hardwareKnown && d.weighedTotal === undefined && hitched)
    cautions.push("The hitch hardware's weight was not entered and is counted as zero; a ball mount or weight-distribution head can weigh a good deal.");
  result.cautions = cautions;
  const advice: string[] = [];
  if (result.status === "over")
    advice.push(
      `Take ${fW(c, actual! - limit!)} or more out of the vehicle, or ${d.hasAccessory ? "carry less on the rack or carrier" : `${TAKE_WEIGHT_OUT}; weight distribution adds no payload`}.`,
    );
  if (result.status === "tight") advice.push("Little payload is left: weigh the loaded vehicle at a public scale before the trip.");
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  result.message =
    actual === undefined || limit === undefined
      ? "Enter the payload figures to check what the vehicle carries."
      : result.status === "over"
        ? `The vehicle carries ${fW(c, actual)} against a payload of ${fW(c, limit)}: ${fW(c, actual - limit)} too much.`
        : `The vehicle carries ${fW(c, actual)} of its ${fW(c, limit)} payload, leaving ${fW(c, limit - actual)} (${fP((limit - actual) / (limit || 1))}).` +
          (result.status === "incomplete" ? " Some figures are missing." : "");
  if (d.weighedTotal !== undefined && v.gvwr !== undefined && actual !== undefined) {
    // `partial` is the weighed vehicle with its hitch load; `actual` may be the payload used (against the payload).
    const weighs = partial;
    result.message =
      result.status === "over"
        ? `Loaded and hitched, the vehicle weighs ${fW(c, weighs)}, ${fW(c, weighs - v.gvwr)} over its GVWR of ${fW(c, v.gvwr)}.`
        : `Loaded and hitched, the vehicle weighs ${fW(c, weighs)} of its ${fW(c, v.gvwr)} GVWR, leaving ${fW(c, v.gvwr - weighs)}.` +
          (result.status === "incomplete" ? " Some figures are missing." : "");
  }
  const note = tongueWeightNote(d, c);
  if (note) result.cautions = [...result.cautions, note];
  return result;
}
