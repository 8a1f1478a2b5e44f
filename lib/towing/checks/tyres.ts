/**
 * Tyres: each axle's load against the load its tyres are made to carry.
 * - The vehicle: the front and rear axle loads the axle-loads check compares with the GAWRs (`drivenAxles`),
 *   against the tyres' maximum load, entered per tyre (the figure moulded on the sidewall) and taken two per axle,
 *   four on a rear axle with dual wheels (`vehicle.dualRearWheels`).
 * - The trailer: the load on its axles (statics: GTW − TW) against its tyres' maximum load, two tyres per axle.
 * Physics: statics; the axle's load is taken as shared equally by its tyres (a caution says a side-to-side
 * imbalance loads one tyre more). A tyre's maximum load is a rating: exceeded is over. Without the tyres'
 * figures the check says what to enter and is never within.
 */
import { fW, iN, iW, NO_STEPS, NO_TEXT, qW, rW, statusOf, withMissing, worst, type Ctx, keepTightestWeight } from "../context";
import { needHitchLever, needTongueWeight, type Derived } from "../derive";
import { need } from "../missing";
import type { CheckStatus, MissingField, Step, TyresResult } from "../types";
import { drivenAxles } from "./axle-loads";
import { lighterNote } from "./trailer-labels";

const FENDER_FIELDS = ["weightDistribution.fenderUnhitched", "weightDistribution.fenderHitched", "weightDistribution.fenderWithWd"] as const;

const CAUTIONS = [
  "A tyre carries its maximum load only at the pressure its maker gives for it: inflate to the vehicle's placard (and the trailer's label) with the tyres cold.",
  "The load is taken as shared equally by an axle's tyres; a load heavier on one side loads that tyre more.",
  "Trailer tyres (often marked ST) are rated for trailer use: fit the size and load range the trailer's label gives.",
];

export function checkTyres(d: Derived, c: Ctx): TyresResult | null {
  if (!d.hasTrailer) return null;
  const { rig } = d;
  const v = rig.vehicle;
  const t = rig.trailer!;
  const missing: MissingField[] = [];
  const steps: Step[] = [];
  const statuses: CheckStatus[] = [];
  const result: TyresResult = {
    id: "tyres",
    title: "Tyres",
    status: "incomplete",
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    estimated: d.twEstimated || undefined,
    steps: NO_STEPS,
  };
  const over: string[] = [];
  const keepTightest = keepTightestWeight(c, result);
  const compare = (id: string, label: string, actual: number, limit: number, st = statusOf(actual, limit, c.tight)) => {
    statuses.push(st);
    if (st === "over") over.push(label);
    keepTightest(id, label, actual, limit);
  };

  // ---- the vehicle's tyres ----
  const axles = drivenAxles(d, c);
  if (v.tyreLoadFront === undefined) missing.push(need("vehicle.tyreLoadFront"));
  if (v.tyreLoadRear === undefined) missing.push(need("vehicle.tyreLoadRear"));
  if (!axles) {
    for (const m of needHitchLever(d)) if (!missing.some((x) => x.field === m.field)) missing.push(m);
    if (!v.axleWeights) missing.push(need("vehicle.axleWeights"));
  }
  const rearTyres = v.dualRearWheels ? 4 : 2;
  if (axles) {
    result.vehicleAxles = { front: qW(c, axles.front), rear: qW(c, axles.rear) };
    if (axles.estimated) result.estimated = true;
  }
  if (v.tyreLoadFront !== undefined) {
    const cap = 2 * v.tyreLoadFront;
    if (c.detail)
      steps.push({
        id: "front-tyre-capacity",
        title: "What the front tyres carry",
        formulaWords: "Each front tyre's maximum load times two",
        formula: "2 * L_tf",
        inputs: [iW(c, "L_tf", "Front tyre load capacity (each tyre)", v.tyreLoadFront)],
        result: rW(c, "C_tf", cap),
      });
    if (axles) {
      compare("vehicle.tyreLoadFront", "Front tyres", axles.front, cap);
      if (c.detail)
        steps.push({
          id: "front-tyre-room",
          title: "Room left on the front tyres",
          formulaWords: "The front tyres' capacity minus the front axle's load (the larger of unhitched and hitched)",
          formula: "C_tf - F_ax",
          inputs: [iW(c, "C_tf", "Front tyres together", cap), iW(c, "F_ax", "Front axle load", axles.front)],
          result: rW(c, "M_tf", cap - axles.front),
          note: axles.basis === "weighed" ? "The front axle as weighed hitched (or unhitched, the larger)." : "The front axle from the axle-loads check's statics (or unhitched, the larger).",
        });
    }
  }
  if (v.tyreLoadRear !== undefined) {
    const cap = rearTyres * v.tyreLoadRear;
    if (c.detail)
      steps.push({
        id: "rear-tyre-capacity",
        title: "What the rear tyres carry",
        formulaWords: v.dualRearWheels ? "Each rear tyre's maximum load times four (dual wheels)" : "Each rear tyre's maximum load times two",
        formula: "n_tr * L_tr",
        inputs: [iN("n_tr", "Rear tyres", rearTyres, ""), iW(c, "L_tr", "Rear tyre load capacity (each tyre)", v.tyreLoadRear)],
        result: rW(c, "C_tr", cap),
      });
    if (axles) {
      let st = statusOf(axles.rear, cap, c.tight);
      // With weight distribution unmeasured the rear is taken at its heaviest: over only if over at its lightest too.
      if (st === "over" && axles.rearLightest !== undefined && statusOf(axles.rearLightest, cap, c.tight) !== "over") {
        st = "incomplete";
        for (const f of FENDER_FIELDS)
          if (rig.weightDistribution?.[f.split(".")[1] as "fenderUnhitched"] === undefined && !missing.some((m) => m.field === f)) missing.push(need(f));
        if (!missing.some((m) => m.field.startsWith("weightDistribution."))) missing.push(need("weightDistribution.fenderWithWd"));
      }
      compare("vehicle.tyreLoadRear", "Rear tyres", axles.rear, cap, st);
      if (c.detail)
        steps.push({
          id: "rear-tyre-room",
          title: "Room left on the rear tyres",
          formulaWords: "The rear tyres' capacity minus the rear axle's load as driven",
          formula: "C_tr - R_ax",
          inputs: [iW(c, "C_tr", "Rear tyres together", cap), iW(c, "R_ax", "Rear axle load", axles.rear)],
          result: rW(c, "M_tr", cap - axles.rear),
          note: axles.rearLightest !== undefined ? "The rear axle with the bars released, the heaviest it can be, until the fender heights are measured." : undefined,
        });
    }
  }

  // ---- the trailer's tyres ----
  if (t.tyreLoad === undefined) missing.push(need("trailer.tyreLoad"));
  if (t.axleCount === undefined) missing.push(need("trailer.axleCount"));
  if (d.gtw === undefined) missing.push(need("trailer.grossTrailerWeight"));
  if (d.tw === undefined) for (const m of needTongueWeight(d)) if (!missing.some((x) => x.field === m.field)) missing.push(m);
  if (t.tyreLoad !== undefined && t.axleCount !== undefined) {
    const n = 2 * t.axleCount;
    const cap = n * t.tyreLoad;
    if (c.detail)
      steps.push({
        id: "trailer-tyre-capacity",
        title: "What the trailer's tyres carry",
        formulaWords: "Each trailer tyre's maximum load times the tyres (two per axle)",
        formula: "n_tt * L_tt",
        inputs: [iN("n_tt", "Trailer tyres", n, ""), iW(c, "L_tt", "Trailer tyre load capacity (each tyre)", t.tyreLoad)],
        result: rW(c, "C_tt", cap),
      });
    const tw = d.twLow;
    if (d.gtw !== undefined && tw !== undefined) {
      const load = d.gtw - tw;
      compare("trailer.tyreLoad", "Trailer tyres", load, cap);
      if (c.detail)
        steps.push({
          id: "trailer-tyre-room",
          title: "Room left on the trailer's tyres",
          formulaWords: `The trailer tyres' capacity minus the load on the trailer's axles (gross trailer weight less the ${d.bedHitch ? "pin" : "tongue"} weight)`,
          formula: "C_tt - (GTW - TW)",
          inputs: [iW(c, "C_tt", "Trailer tyres together", cap), iW(c, "GTW", "Gross trailer weight", d.gtw), iW(c, "TW", d.bedHitch ? "Pin weight" : "Tongue weight", tw)],
          result: rW(c, "M_tt", cap - load),
          note: lighterNote(d, c),
        });
    }
  }

  result.status = withMissing(statuses.length ? worst(statuses) : "incomplete", missing);
  if (missing.length) result.missing = missing;
  if (!c.detail) return result;
  result.steps = steps;
  const cautions = CAUTIONS.slice();
  if (d.wdUsed) cautions.push("Weight distribution hands part of the hitch load to the front and the trailer's axles: weigh the axles hitched, bars set, to know each tyre's share.");
  result.cautions = cautions;
  const advice: string[] = [];
  if (over.length) advice.push(`${over.join(" and ")} carry more than their maximum load: lighten the load on that axle, or fit tyres with the load rating the vehicle's or trailer's label gives (never above what the wheels are rated for).`);
  if (result.status === "tight") advice.push("Little room is left on a tyre's load: check the pressures cold and weigh the loaded rig.");
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  const g = result.governing;
  result.message =
    !g || !result.actual
      ? "Enter each tyre's maximum load (moulded on its sidewall) to compare the axle loads with the tyres."
      : result.status === "over"
        ? `${g.label} carry ${fW(c, result.actual.value / c.u.weightFactor)}, over their ${fW(c, g.value / c.u.weightFactor)} together.`
        : `The ${g.label.toLowerCase()} have the least room: ${fW(c, result.actual.value / c.u.weightFactor)} of ${fW(c, g.value / c.u.weightFactor)}.` +
          (result.status === "incomplete" ? " Some figures are missing." : "");
  return result;
}
