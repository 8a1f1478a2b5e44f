/**
 * Front-axle load loss: how much load the steering axle loses to the hitch load, as a share of its unhitched
 * load, against a limit the organisation sets (default 10 %).
 *
 * Physics: statics, moments about the rear axle. A load P hung OH behind the rear axle of a vehicle with
 * wheelbase WB lifts L = P · OH / WB off the front axle (`axleLoadChange`); weight distribution at restoration R
 * gives R · L back (`lossLeftWithWd`). With the axles weighed hitched (bars released), L = F_0 − F_h as weighed.
 * A hitch point over or ahead of the rear axle (a fifth wheel or gooseneck, OH ≤ 0) takes nothing off the front.
 *
 * The limit is common practice, with no published source: beyond it the check reads tight, never over, and
 * never adjust (a convention does not make a set-up change compulsory). A vehicle maker's own figure wins.
 */
import { fP, fW, govW, iN, iW, iL, marginW, NO_STEPS, NO_TEXT, qW, rN, rW, statusOf, withMissing, type Ctx } from "../context";
import { needHitchLever, tongueWeightNote, type Derived } from "../derive";
import { TAKE_WEIGHT_OUT, wdAdvice } from "../advice";
import { need } from "../missing";
import type { CheckStatus, FrontAxleLossResult, MissingField, Step } from "../types";
import { axleLoadChange, UNMEASURED_RESTORATION } from "./axle-loads";
import { lossLeftWithWd, wdState } from "./weight-distribution";

const FENDER_FIELDS = ["weightDistribution.fenderUnhitched", "weightDistribution.fenderHitched", "weightDistribution.fenderWithWd"] as const;

export function checkFrontAxleLoss(d: Derived, c: Ctx): FrontAxleLossResult | null {
  if (!d.hasTrailer && !d.hasAccessory) return null;
  const { rig } = d;
  const v = rig.vehicle;
  const aw = v.axleWeights;
  // The hitched weighing is taken with the bars released (the check screen asks for it so).
  const awh = d.hasTrailer ? v.axleWeightsHitched : undefined;
  const p = d.hitchLoad;
  const missing: MissingField[] = [];
  const steps: Step[] = [];
  const result: FrontAxleLossResult = {
    id: "front-axle-loss",
    title: "Front-axle load loss",
    status: "incomplete",
    limitShare: c.frontLossLimit,
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    estimated: d.twEstimated || undefined,
    steps: NO_STEPS,
  };
  const sym = d.hasAccessory ? "W_acc" : "TW";
  const loadLabel = d.hasAccessory ? "Accessory and its load" : d.bedHitch ? "Pin weight" : "Tongue weight";

  // The load lost with nothing given back (bars released).
  let lost: number | undefined;
  if (aw && awh) {
    lost = aw.front - awh.front;
    result.basis = "weighed";
    if (c.detail)
      steps.push({
        id: "front-loss",
        title: "Load the front axle loses, as weighed",
        formulaWords: "Front axle unhitched minus front axle hitched (bars released), both weighed",
        formula: "F_0 - F_h",
        inputs: [iW(c, "F_0", "Front axle unhitched", aw.front), iW(c, "F_h", "Front axle hitched", awh.front)],
        result: rW(c, "L_F", lost),
      });
  } else {
    missing.push(...needHitchLever(d));
    if (p !== undefined && v.wheelbase !== undefined && d.overhang !== undefined) {
      lost = -axleLoadChange(p, v.wheelbase, d.overhang).front;
      result.basis = "statics";
      if (c.detail)
        steps.push({
          id: "front-loss",
          title: "Load the front axle loses",
          formulaWords: "Hitch load times overhang divided by wheelbase (negative: the front gains)",
          formula: `${sym} * OH / WB`,
          inputs: [iW(c, sym, loadLabel, p), iL(c, "OH", d.bedHitch ? "Rear axle to the bed hitch (negative: ahead)" : d.hasAccessory ? "Rear axle to the load's centre" : "Rear axle to ball", d.overhang), iL(c, "WB", "Wheelbase", v.wheelbase)],
          result: rW(c, "L_F", lost),
        });
    }
  }

  // As driven: weight distribution gives back its restoration's share; unmeasured, judge on the most it can be.
  let driven = lost;
  let lightest: number | undefined;
  const s = d.wdUsed ? wdState(d) : undefined;
  if (lost !== undefined && s) {
    if (s.restoration !== undefined) {
      driven = lossLeftWithWd(lost, s.restoration);
      if (c.detail)
        steps.push({
          id: "front-loss-wd",
          title: "Load still lost with weight distribution",
          formulaWords: "The lost load times one minus the measured restoration",
          formula: "(1 - R) * L_F",
          inputs: [iN("R", "Restoration, measured", s.restoration, ""), iW(c, "L_F", "Load lost, bars released", lost)],
          result: rW(c, "L_wd", driven),
        });
    } else {
      result.estimated = true;
      lightest = lossLeftWithWd(lost, UNMEASURED_RESTORATION.lightest);
    }
  }
  if (driven !== undefined) result.loss = qW(c, driven);

  const statuses: CheckStatus[] = [];
  const front0 = aw?.front;
  if (driven !== undefined && driven <= 0) {
    // Nothing lost (a bed hitch over or ahead of the rear axle): no share of the front axle is needed to say so.
    statuses.push("within");
    result.actual = qW(c, driven);
    if (front0 !== undefined && front0 > 0) result.share = driven / front0;
  } else if (front0 === undefined) {
    missing.push(need("vehicle.axleWeights"));
  } else if (driven !== undefined) {
    const limit = c.frontLossLimit * front0;
    const share = front0 > 0 ? driven / front0 : 1;
    result.share = share;
    result.actual = qW(c, driven);
    result.limit = qW(c, limit);
    result.governing = govW(c, "organisation.frontAxleLossLimit", `Front-axle loss limit (${fP(c.frontLossLimit)} of the unhitched front axle)`, limit);
    // A convention: beyond it the check reads tight, never over.
    let st = statusOf(driven, limit, c.tight, "tight");
    const beyond = driven > limit;
    if (st !== "within" && lightest !== undefined) {
      // The restoration is not measured: with the bars set it may be far less. Measure before calling it.
      st = "incomplete";
      for (const f of FENDER_FIELDS) if (rig.weightDistribution?.[f.split(".")[1] as "fenderUnhitched"] === undefined) missing.push(need(f));
      if (!missing.some((m) => m.field.startsWith("weightDistribution."))) missing.push(need("weightDistribution.fenderWithWd"));
    }
    statuses.push(st);
    // The room is shown while the loss is inside the limit; beyond it a negative margin would read as a rating exceeded.
    if (!beyond) result.margin = marginW(c, driven, limit);
    if (c.detail)
      steps.push(
        {
          id: "front-loss-limit",
          title: "Most the front axle may lose",
          formulaWords: "The organisation's limit, as a share, times the front axle's unhitched load",
          formula: "k_F / 100 * F_0",
          inputs: [iN("k_F", "Front-axle loss limit", c.frontLossLimit * 100, "%"), iW(c, "F_0", "Front axle unhitched", front0)],
          result: rW(c, "L_max", limit),
          note: "Common practice, no published source: the organisation sets this limit.",
        },
        {
          id: "front-loss-share",
          title: "Share of the front axle lost",
          formulaWords: "The load lost as driven divided by the front axle's unhitched load, as a percentage",
          formula: "L / F_0 * 100",
          inputs: [iW(c, "L", s?.restoration !== undefined ? "Load lost with weight distribution" : "Load lost", driven), iW(c, "F_0", "Front axle unhitched", front0)],
          result: rN("s_F", share * 100, "%"),
          note: lightest !== undefined ? "The restoration is not measured yet: this is the loss with the bars released, the most it can be." : undefined,
        },
      );
  }
  result.status = statuses.length ? withMissing(statuses[0]!, missing) : "incomplete";
  if (missing.length) result.missing = missing;

  // Weight distribution not fitted on a receiver trailer: what it would leave at the target, for the advice.
  let atTarget: number | undefined;
  const wdPossible = d.hasTrailer && !d.bedHitch && !d.wdUsed;
  if (wdPossible && lost !== undefined && lost > 0) {
    const target = wdState(d).target;
    atTarget = lossLeftWithWd(lost, target);
    result.lossAtWdTarget = qW(c, atTarget);
    if (c.detail && result.status !== "within")
      steps.push({
        id: "front-loss-at-target",
        title: "Load still lost with weight distribution at the target",
        formulaWords: "The lost load times one minus the restoration target",
        formula: "(1 - t) * L_F",
        inputs: [iN("t", "Restoration target", target, ""), iW(c, "L_F", "Load lost, no weight distribution", lost)],
        result: rW(c, "L_t", atTarget),
        note: "What weight distribution set to the target would leave: advice, not a finding.",
      });
  }
  if (!c.detail) return result;
  result.steps = steps;

  const cautions = [
    `The limit of ${fP(c.frontLossLimit)} of the front axle's unhitched load is common practice, with no published source: the organisation sets it in its settings. Where the vehicle's maker gives a figure, it wins.`,
    "A lighter front axle steers and brakes with less grip, most of all on wet roads, on bends and in crosswinds.",
  ];
  if (result.basis === "statics") cautions.push("Worked out by statics from the wheelbase and the overhang; weighing each axle hitched and unhitched at a public scale gives the real figure.");
  if (lightest !== undefined) cautions.push("The restoration is not measured yet: the loss is taken with the bars released. Measure the front fender height unhitched, hitched, and hitched with weight distribution.");
  const note = tongueWeightNote(d, c);
  if (note) cautions.push(note);
  result.cautions = cautions;

  const advice: string[] = [];
  if (result.status === "tight") {
    if (wdPossible && atTarget !== undefined && lost !== undefined) {
      const target = wdState(d).target;
      advice.push(
        `Weight distribution set to give back ${fP(target)} would leave about ${fW(c, atTarget)} lost${front0 ? ` (${fP(atTarget / front0)} of the front axle)` : ""}.`,
        ...wdAdvice(d, "This trailer"),
      );
    } else if (d.wdUsed && s?.restoration !== undefined && s.restoration < s.target)
      advice.push("Set the spring bars to give back more, as the weight-distribution maker's instructions say (see the weight-distribution check).");
    if (d.hasAccessory) advice.push("Bring the load closer to the vehicle, or carry less on the rack or carrier.");
    else if (!d.bedHitch) advice.push(`Keep the ball close to the vehicle (a shorter ball mount, no extender), or ${TAKE_WEIGHT_OUT}.`);
  }
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;

  if (driven === undefined) result.message = "Enter the hitch load, the wheelbase and the overhang (or weigh the axles hitched and unhitched) to work out the load the front axle loses.";
  else if (driven <= 0)
    result.message = driven < 0 ? `The front axle gains ${fW(c, -driven)}: the hitch point sits ahead of the rear axle.` : "The front axle loses nothing: the hitch point sits over the rear axle.";
  else if (front0 === undefined) result.message = `The front axle loses ${fW(c, driven)}; weigh the axles unhitched to compare it with the limit.`;
  else {
    const limit = c.frontLossLimit * front0;
    result.message =
      driven > limit
        ? `The front axle loses ${fW(c, driven)} (${fP(driven / front0)} of its load), more than the ${fP(c.frontLossLimit)} the organisation allows (${fW(c, limit)}): steering and braking grip suffer.`
        : `The front axle loses ${fW(c, driven)} (${fP(driven / front0)} of its load), inside the ${fP(c.frontLossLimit)} limit (${fW(c, limit)}).` +
          (result.status === "incomplete" ? " Some figures are missing." : "");
  }
  return result;
}
