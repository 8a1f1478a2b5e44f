/**
 * Check 6, axle loads. Physics: statics, moments about the rear axle. A load P hung OH behind the rear axle of
 * a vehicle with wheelbase WB lifts P·OH/WB off the front axle and puts P·(WB + OH)/WB on the rear axle.
 * Each axle is compared with its GAWR; the front axle with the larger of its unhitched and hitched loads.
 */
import { fL, fP, fW, iL, iW, NO_STEPS, NO_TEXT, qW, rW, statusOf, withMissing, worst, type Ctx, keepTightestWeight } from "../context";
import { needHitchLever, tongueWeightNote, type Derived, type DrivenAxles } from "../derive";
import { TAKE_WEIGHT_OUT, wdRatingsState } from "../advice";
import { need } from "../missing";
import type { AxleLoadsResult, CheckStatus, MissingField, Step } from "../types";
import { axlesWithWd, wdState } from "./weight-distribution";

/** Change of each axle's load for a load `p` at `overhang` behind the rear axle. Physics: statics. */
export function axleLoadChange(p: number, wheelbase: number, overhang: number) {
  return { front: (-p * overhang) / wheelbase, rear: (p * (wheelbase + overhang)) / wheelbase };
}

/**
 * Rear axle load gained per unit of tongue weight, in the one state the axle check and the envelope both use:
 * with weight distribution at restoration `r` (Statics: 1 + (1 − r) · OH / WB); without it, from the hitched
 * weighing when there is one ((R_h − R_0) / TW), else statics ((WB + OH) / WB). Undefined when it cannot be known.
 */
export function rearGainPerTongue(d: Derived, r: number | undefined): number | undefined {
  const v = d.rig.vehicle;
  const aw = v.axleWeights;
  if (d.wdUsed) {
    if (v.wheelbase === undefined || d.overhang === undefined || r === undefined) return undefined;
    return 1 + ((1 - r) * d.overhang) / v.wheelbase;
  }
  const awh = d.hasTrailer ? v.axleWeightsHitched : undefined;
  if (aw && awh && d.tw !== undefined && d.tw >= MIN_SCALED_TONGUE_LB && awh.rear - aw.rear > 0) return (awh.rear - aw.rear) / d.tw;
  if (v.wheelbase === undefined || d.overhang === undefined) return undefined;
  return (v.wheelbase + d.overhang) / v.wheelbase;
}

/** Below this tongue weight (lb) a hitched weighing's gain is not scaled per unit of tongue weight: statics instead. */
const MIN_SCALED_TONGUE_LB = 1;

/** With weight distribution and no measured restoration, the rear axle lies between these two restorations. */
export const UNMEASURED_RESTORATION = { heaviest: 0, lightest: 1 } as const;

const CAUTIONS = [
  "Weight on the hitch lightens the front axle: the front tyres steer and brake with less grip.",
  "Cargo placed behind the rear axle adds to the rear axle even more than its own weight.",
];

/** The axle loads the axle-loads check compares (computed once per evaluation; null when they cannot be known). */
export function drivenAxles(d: Derived, c: Ctx): DrivenAxles | null {
  if (d.cache.axles === undefined) {
    d.cache.axles = null;
    checkAxleLoads(d, { ...c, detail: false });
  }
  return d.cache.axles ?? null;
}

export function checkAxleLoads(d: Derived, c: Ctx): AxleLoadsResult | null {
  if (!d.hasTrailer && !d.hasAccessory) return null;
  const { rig } = d;
  const v = rig.vehicle;
  const missing: MissingField[] = needHitchLever(d);
  const p = d.hitchLoad;
  if (!v.axleWeights) missing.push(need("vehicle.axleWeights"));
  if (v.gawrFront === undefined) missing.push(need("vehicle.gawrFront"));
  if (v.gawrRear === undefined) missing.push(need("vehicle.gawrRear"));
  const result: AxleLoadsResult = {
    id: "axle-loads",
    title: "Axle loads",
    status: "incomplete",
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    estimated: d.twEstimated || undefined,
    steps: NO_STEPS,
  };
  const steps: Step[] = [];
  const sym = d.hasAccessory ? "W_acc" : "TW";
  const label = d.hasAccessory ? "Accessory and its load" : "Tongue weight";
  let change: { front: number; rear: number } | undefined;
  if (p !== undefined && v.wheelbase !== undefined && d.overhang !== undefined) {
    change = axleLoadChange(p, v.wheelbase, d.overhang);
    result.frontChange = qW(c, change.front);
    result.rearChange = qW(c, change.rear);
    if (c.detail) {
      const ohLabel = d.hasAccessory ? "Rear axle to the load's centre" : d.bedHitch ? "Rear axle to the bed hitch (negative: ahead)" : "Rear axle to ball";
      // Geometry: the ball sits the extender's and the ball mount's length behind the pin hole.
      const ohNote =
        !d.hasAccessory && d.overhangFrom === "pin"
          ? `Rear axle to ball: ${fL(c, d.pin!)} to the pin hole + ${fL(c, rig.extender?.length ?? 0)} extender + ${fL(c, rig.ballMount!.length!)} ball mount = ${fL(c, d.overhang)}.`
          : d.overhangFrom === "ball-as-measured"
            ? "Rear axle to ball as measured on the rig (an older figure)."
            : d.overhangFrom === "bed-hitch" && d.overhang <= 0
              ? "The bed hitch sits over or ahead of the rear axle: the front axle loses nothing (ahead of the axle it gains), and the rear axle takes less than the pin weight."
              : undefined;
      steps.push(
        {
          id: "front-change",
          title: "Load taken off the front axle",
          formulaWords: "Hitch load times overhang divided by wheelbase, taken off the front",
          formula: `-${sym} * OH / WB`,
          inputs: [iW(c, sym, label, p), iL(c, "OH", ohLabel, d.overhang), iL(c, "WB", "Wheelbase", v.wheelbase)],
          result: rW(c, "dF", change.front),
          note: ohNote,
        },
        {
          id: "rear-change",
          title: "Load added to the rear axle",
          formulaWords: "Hitch load times (wheelbase plus overhang) divided by wheelbase",
          formula: `${sym} * (WB + OH) / WB`,
          inputs: [iW(c, sym, label, p), iL(c, "OH", ohLabel, d.overhang), iL(c, "WB", "Wheelbase", v.wheelbase)],
          result: rW(c, "dR", change.rear),
        },
      );
    }
  }
  const aw = v.axleWeights;
  const awh = d.hasTrailer ? v.axleWeightsHitched : undefined;
  const statuses: CheckStatus[] = [];
  if (aw) {
    result.unhitched = { front: qW(c, aw.front), rear: qW(c, aw.rear) };
    let front: number | undefined;
    let rear: number | undefined;
    if (awh) {
      front = awh.front;
      rear = awh.rear;
    } else if (change) {
      front = aw.front + change.front;
      rear = aw.rear + change.rear;
    }
    if (front !== undefined && rear !== undefined) {
      result.hitched = { front: qW(c, front), rear: qW(c, rear) };
      if (c.detail && !awh && change)
        steps.push(
          { id: "front-hitched", title: "Front axle, hitched", formulaWords: "Unhitched front load plus its change", formula: "F_0 + dF", inputs: [iW(c, "F_0", "Front axle unhitched", aw.front), iW(c, "dF", "Change on the front", change.front)], result: rW(c, "F_h", front) },
          { id: "rear-hitched", title: "Rear axle, hitched", formulaWords: "Unhitched rear load plus its change", formula: "R_0 + dR", inputs: [iW(c, "R_0", "Rear axle unhitched", aw.rear), iW(c, "dR", "Change on the rear", change.rear)], result: rW(c, "R_h", rear) },
        );
      let frontDriven = front;
      let rearDriven = rear;
      // With weight distribution and no fender heights, the restoration is not known: the rear axle lies between
      // its load with the bars released (the heaviest) and with all the lost load given back (the lightest).
      let rearLightest: number | undefined;
      if (d.wdUsed && p !== undefined && v.wheelbase !== undefined && d.overhang !== undefined) {
        const s = wdState(d);
        const shown = axlesWithWd(aw.front, aw.rear, p, v.wheelbase, d.overhang, s.restorationUsed ?? s.target);
        result.withWd = { front: qW(c, shown.front), rear: qW(c, shown.rear) };
        if (s.restoration !== undefined) {
          frontDriven = shown.front;
          rearDriven = shown.rear;
        } else {
          result.estimated = true;
          const heavy = axlesWithWd(aw.front, aw.rear, p, v.wheelbase, d.overhang, UNMEASURED_RESTORATION.heaviest);
          const light = axlesWithWd(aw.front, aw.rear, p, v.wheelbase, d.overhang, UNMEASURED_RESTORATION.lightest);
          frontDriven = Math.max(heavy.front, light.front);
          rearDriven = heavy.rear;
          rearLightest = light.rear;
          if (c.detail)
            steps.push({
              id: "rear-unmeasured-wd",
              title: "Rear axle until the fender heights are measured",
              formulaWords: "Rear axle with the weight distribution released, the heaviest it can be",
              formula: "R_0 + TW * (WB + OH) / WB",
              inputs: [iW(c, "R_0", "Rear axle unhitched", aw.rear), iW(c, "TW", "Tongue weight", p), iL(c, "OH", "Rear axle to ball", d.overhang), iL(c, "WB", "Wheelbase", v.wheelbase)],
              result: rW(c, "R_max", heavy.rear),
              note: `The load with weight distribution is an estimate at the ${Math.round(s.target * 100)} % target until the front fender heights are measured.`,
            });
        }
      }
      // The vehicle also drives unhitched, so the front axle answers for the larger of the two.
      const frontWorst = Math.max(aw.front, front, frontDriven);
      d.cache.axles = { front: frontWorst, rear: rearDriven, rearLightest, estimated: !!result.estimated, basis: awh ? "weighed" : "statics" };
      const keepTightest = keepTightestWeight(c, result);
      const axles: Array<[string, string, number, number | undefined]> = [
        ["vehicle.gawrRear", "Rear GAWR", rearDriven, v.gawrRear],
        ["vehicle.gawrFront", "Front GAWR", frontWorst, v.gawrFront],
      ];
      for (const [id, lab, actual, limit] of axles) {
        if (limit === undefined) continue;
        let st = statusOf(actual, limit, c.tight);
        // Over only if it is over even at the lightest the restoration could make it; otherwise measure.
        if (st === "over" && id === "vehicle.gawrRear" && rearLightest !== undefined && statusOf(rearLightest, limit, c.tight) !== "over") {
          st = "incomplete";
          for (const f of ["weightDistribution.fenderUnhitched", "weightDistribution.fenderHitched", "weightDistribution.fenderWithWd"] as const)
            if (d.rig.weightDistribution?.[f.split(".")[1] as "fenderUnhitched"] === undefined) missing.push(need(f));
          if (!missing.some((m) => m.field.startsWith("weightDistribution."))) missing.push(need("weightDistribution.fenderWithWd"));
        }
        statuses.push(st);
        keepTightest(id, lab, actual, limit);
      }
    }
  }
  result.status = withMissing(worst(statuses), missing);
  if (missing.length) result.missing = missing;
  if (!c.detail) return result;
  result.steps = steps;
  const cautions = CAUTIONS.slice();
  if (change && aw && aw.front > 0 && change.front < 0)
    cautions.push(`Hitched, the front axle carries ${fW(c, -change.front)} (${fP(-change.front / aw.front)}) less than unhitched.`);
  else if (change && aw && aw.front > 0 && change.front > 0)
    cautions.push(`Hitched, the front axle carries ${fW(c, change.front)} (${fP(change.front / aw.front)}) more than unhitched: the bed hitch sits ahead of the rear axle.`);
  if (d.wdUsed)
    cautions.push(
      wdState(d).restoration !== undefined
        ? "The axle loads compared with the GAWRs are those with weight distribution engaged, as driven."
        : "The restoration is not measured yet: the rear axle is compared with the bars released (the heaviest it can be), and the loads with weight distribution are estimates. Measure the front fender height unhitched, hitched, and hitched with weight distribution.",
    );
  const note = tongueWeightNote(d, c);
  if (note) cautions.push(note);
  if (d.overhangFrom === "ball-as-measured") cautions.push("Rear axle to ball taken from the figure as measured on the rig; record the rear axle to the receiver pin hole and the ball mount's length instead.");
  result.cautions = cautions;
  const advice: string[] = [];
  if (result.status === "over" && result.governing?.id === "vehicle.gawrRear")
    advice.push(
      `Move cargo forward in the vehicle, or ${TAKE_WEIGHT_OUT}.` +
        (d.hasTrailer && !d.bedHitch && !d.wdUsed && wdRatingsState(d) !== "exceeded"
          ? " Weight distribution moves part of the load off the rear axle, if its ratings cover this trailer; it raises no GAWR."
          : ""),
    );
  if (result.status === "over" && result.governing?.id === "vehicle.gawrFront") advice.push("Move cargo off the front of the vehicle or back towards the rear axle.");
  if (result.status === "tight") advice.push("An axle is close to its rating: weigh each axle at a public scale, hitched.");
  if (result.estimated && d.wdUsed) advice.push("Measure the front fender height unhitched, hitched with the bars released, and hitched with the bars on: the loads with weight distribution are estimates until then.");
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  const g = result.governing;
  result.message =
    g && result.actual && result.limit
      ? result.status === "over"
        ? `${g.label === "Rear GAWR" ? "The rear axle" : "The front axle"} carries ${fW(c, result.actual.value / c.u.weightFactor)}, over its ${g.label} of ${fW(c, g.value / c.u.weightFactor)}.`
        : `${g.label === "Rear GAWR" ? "The rear axle" : "The front axle"} has the least room: ${fW(c, result.actual.value / c.u.weightFactor)} of its ${fW(c, g.value / c.u.weightFactor)} ${g.label === "Rear GAWR" ? "rear" : "front"} GAWR.` +
          (result.status === "incomplete" ? " Some figures are missing." : "")
      : change
        ? change.front > 0
          ? `The hitch load adds ${fW(c, change.rear)} to the rear axle and ${fW(c, change.front)} to the front; weigh the axles to compare with the GAWRs.`
          : `The hitch load adds ${fW(c, change.rear)} to the rear axle and lifts ${fW(c, -change.front)} off the front; weigh the axles to compare with the GAWRs.`
        : "Enter the wheelbase, the overhang and the hitch load to work out the axle loads.";
  return result;
}
