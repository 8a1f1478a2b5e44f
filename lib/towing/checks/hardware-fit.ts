/**
 * Hardware fit: do the ball, the ball mount, the hitch pin and the receiver go together, whatever their ratings.
 * - Ball size: the smallest ball diameter the trailer's class allows, the class read from its gross weight
 *   (Source: 15 CRR-NY 57.5 Table 1; the classes from 15 NYCRR 57.3(c)). A smaller ball is a part to change:
 *   adjust (the ball's stamped rating is a link in the weakest-link check, where exceeding it is over).
 * - Receiver opening against the hitch class: common practice, no published source, so a mismatch is a caution
 *   that makes the part tight (never over or adjust): it usually means the class or the size was misread.
 * - Ball shank against the ball mount's hole: a shank that does not fill the hole rocks in it (a reducer sleeve
 *   rated for the trailer fills it); a shank larger than the hole does not go in. Either is a part to change:
 *   adjust. Geometry.
 * - Hitch pin against the receiver: 1/2 in for a 1-1/4 in receiver, 5/8 in for 2 in and larger. Common practice,
 *   no published source: a mismatch is adjust (a pin that does not fit the hole), never over.
 * Receiver-size adapters and ball reducer sleeves are links of their own in the weakest-link check.
 * Not applied to a fifth wheel or gooseneck, nor to a rack or carrier (no ball, no ball mount).
 */
import { fW, iL, NO_STEPS, NO_TEXT, qL, rL, rankOf, worst, withMissing, type Ctx } from "../context";
import type { Derived } from "../derive";
import { need } from "../missing";
import { CLASS_MAX_GTW, MIN_BALL_BY_CLASS, PIN_FOR_RECEIVER, RECEIVERS_BY_CLASS, SIZE_IN } from "../reference";
import type { CheckStatus, HardwareFitResult, MissingField, Step } from "../types";

type Part = HardwareFitResult["parts"][number];

/** The trailer class (1–4) a gross trailer weight falls in, by the classes' maximum gross weights; undefined above class 4. */
export function trailerClassOf(gtwLb: number): number | undefined {
  for (const cls of [1, 2, 3, 4]) if (gtwLb <= CLASS_MAX_GTW[cls]! * (1 + 1e-9)) return cls;
  return undefined;
}

const CAUTIONS = [
  "The ball, the coupler, the ball mount's hole and the hitch pin are sized together: a part that only nearly fits can work loose on the road.",
  "Tighten the ball's nut to the torque its maker gives, and fit the pin's clip or lock every time.",
  "A receiver adapter or a reducer sleeve carries the whole trailer: use one whose label covers the trailer, and follow the vehicle's and the hitch maker's word on adapters.",
];

const inches = (name: string) => SIZE_IN[name] ?? 0;

export function checkHardwareFit(d: Derived, c: Ctx): HardwareFitResult | null {
  if (!d.hasTrailer || d.bedHitch) return null;
  const { rig } = d;
  const t = rig.trailer!;
  const h = rig.hitch;
  const bm = rig.ballMount;
  const sleeve = rig.ballSleeve;
  const missing: MissingField[] = [];
  const steps: Step[] = [];
  const parts: Part[] = [];
  const advice: string[] = [];
  const cautions = CAUTIONS.slice();
  const detail = c.detail;

  // ---- ball size against the trailer's class ----
  const ballPart: Part = { id: "ball-size", label: "Ball size for the trailer's class", status: "incomplete" };
  if (t.ballSize === undefined) {
    missing.push(need("trailer.ballSize"));
    ballPart.waitingFor = "The ball's diameter, stamped on its top";
  }
  if (d.gtw === undefined) {
    missing.push(need("trailer.grossTrailerWeight"));
    ballPart.waitingFor ??= "The loaded trailer's weight, to know its class";
  }
  if (t.ballSize !== undefined && d.gtw !== undefined) {
    const cls = trailerClassOf(d.gtw);
    const tableMin = cls !== undefined ? MIN_BALL_BY_CLASS[cls] : undefined;
    // Above class 3 the table sets no diameter (the ball's rating, a weakest-link, and the coupler decide), and a
    // heavier trailer never takes a smaller ball than a lighter one: class 3's diameter stays the floor.
    const min = tableMin ?? MIN_BALL_BY_CLASS[3]!;
    const ball = inches(t.ballSize);
    const least = inches(min);
    ballPart.actual = qL(c, ball);
    ballPart.limit = qL(c, least);
    ballPart.status = ball + 1e-9 >= least ? "within" : "adjust";
    if (detail) {
      if (tableMin === undefined)
        cautions.push(
          cls === 4
            ? "Over 5,000 lb (class 4) the table sets no ball diameter: the ball and its bolt must be as strong as the coupler needs (15 CRR-NY 57.5 Table 1); the ball's stamped rating is checked with the other links."
            : "Over 10,000 lb the trailer is outside the hitch classes: the ball's stamped rating and the coupler's decide, and are checked with the other links.",
        );
      steps.push({
        id: "ball-size-room",
        title: "Ball diameter over the class's smallest",
        formulaWords: "The ball's diameter minus the smallest the trailer's class allows (negative: too small)",
        formula: "D_ball - D_min",
        inputs: [
          iL(c, "D_ball", `Ball diameter (${t.ballSize} in)`, ball),
          iL(c, "D_min", tableMin ? `Smallest ball for class ${cls} (${min} in)` : `Smallest ball for class 3, the floor above it (${min} in)`, least),
        ],
        result: rL(c, "M_ball", ball - least),
        note: tableMin
          ? `15 CRR-NY 57.5 Table 1: a class ${cls} trailer (up to ${fW(c, CLASS_MAX_GTW[cls!]!)} gross) needs a ball of at least ${min} in.`
          : `15 CRR-NY 57.5 Table 1 sets no diameter above class 3 (up to ${fW(c, CLASS_MAX_GTW[3]!)} gross); a heavier trailer takes no smaller ball than class 3's ${min} in.`,
      });
      if (ballPart.status === "adjust")
        advice.push(
          tableMin
            ? `Fit a ball of at least ${min} in, with a coupler to match: a ${t.ballSize} in ball is too small for a class ${cls} trailer.`
            : `Fit a ball of at least ${min} in, with a coupler to match: a ${t.ballSize} in ball is smaller than even a class 3 trailer (up to ${fW(c, CLASS_MAX_GTW[3]!)}) needs.`,
        );
    }
  }
  parts.push(ballPart);

  // ---- receiver opening against the hitch class (common practice) ----
  const recv = h?.receiverSize;
  if (recv === undefined) missing.push(need("hitch.receiverSize"));
  const cls = h?.class;
  if (cls !== undefined && recv !== undefined) {
    const usual = RECEIVERS_BY_CLASS[cls] ?? [];
    const receiverPart: Part = { id: "receiver-class", label: "Receiver opening for the hitch class", status: usual.includes(recv) ? "within" : "tight" };
    receiverPart.actual = qL(c, inches(recv));
    parts.push(receiverPart);
    if (detail && receiverPart.status === "tight")
      cautions.push(
        `A class ${cls} hitch usually has a ${usual.join(" or ")} in receiver, and this one is entered as ${recv} in: check the class and the opening on the hitch's label (common practice, no published source).`,
      );
  } else if (detail && cls === undefined && recv !== undefined) cautions.push("The hitch class was not entered, so the receiver opening was not compared with it.");

  // ---- ball shank against the ball mount's hole ----
  const shank = t.ballShankSize;
  const hole = bm?.holeSize;
  const shankPart: Part = { id: "shank-hole", label: "Ball shank in the ball mount's hole", status: "incomplete" };
  if (shank === undefined) missing.push(need("trailer.ballShankSize"));
  if (hole === undefined) missing.push(need("ballMount.holeSize"));
  if (shank !== undefined && hole !== undefined) {
    const gap = inches(hole) - inches(shank);
    shankPart.actual = qL(c, inches(shank));
    shankPart.limit = qL(c, inches(hole));
    if (gap < -1e-9) {
      shankPart.status = "adjust";
      if (detail) advice.push(`The ${shank} in shank does not go through the ${hole} in hole: use a ball with a ${hole} in shank, or a ball mount made for a ${shank} in shank. Never drill the hole out.`);
    } else if (gap > 1e-9 && !sleeve) {
      shankPart.status = "adjust";
      if (detail)
        advice.push(`The ${shank} in shank is thinner than the ${hole} in hole and will rock in it: fit a reducer sleeve from ${hole} to ${shank} in rated for the trailer (then enter its ratings), or a ball with a ${hole} in shank.`);
    } else {
      shankPart.status = "within";
      if (detail && gap > 1e-9) cautions.push(`A reducer sleeve fills the ${hole} in hole round the ${shank} in shank: its own ratings are links of the rig, and the ball's nut must be torqued onto it as its maker says.`);
      if (detail && gap <= 1e-9 && sleeve) cautions.push("A reducer sleeve is entered, but the shank already fills the hole: no sleeve fits in it. Check which ball and ball mount are fitted.");
    }
    if (detail)
      steps.push({
        id: "shank-gap",
        title: "Room round the shank in the hole",
        formulaWords: "The ball mount's hole minus the ball's shank (negative: the shank does not go in)",
        formula: "D_hole - D_shank",
        inputs: [iL(c, "D_hole", `Ball mount hole (${hole} in)`, inches(hole)), iL(c, "D_shank", `Ball shank (${shank} in)`, inches(shank))],
        result: rL(c, "G_shank", gap),
        note: sleeve && gap > 1e-9 ? "A reducer sleeve fills this room." : undefined,
      });
  } else shankPart.waitingFor = "The ball's shank diameter and the ball mount's hole";
  parts.push(shankPart);

  // ---- hitch pin against the receiver (common practice) ----
  const pin = h?.pinDiameter;
  const pinPart: Part = { id: "pin", label: "Hitch pin for the receiver", status: "incomplete" };
  if (pin === undefined) missing.push(need("hitch.pinDiameter"));
  if (pin !== undefined && recv !== undefined) {
    const wanted = PIN_FOR_RECEIVER[recv]!;
    const gap = inches(wanted) - inches(pin);
    pinPart.actual = qL(c, inches(pin));
    pinPart.limit = qL(c, inches(wanted));
    // A convention: a pin that does not suit the receiver is a part to change, never a rating exceeded.
    pinPart.status = Math.abs(gap) <= 1e-9 ? "within" : "adjust";
    if (detail) {
      steps.push({
        id: "pin-gap",
        title: "Pin against the receiver's usual pin",
        formulaWords: "The pin the receiver usually takes minus the pin entered (not zero: it does not suit)",
        formula: "D_pinhole - D_pin",
        inputs: [iL(c, "D_pinhole", `Pin a ${recv} in receiver takes (${wanted} in)`, inches(wanted)), iL(c, "D_pin", `Hitch pin (${pin} in)`, inches(pin))],
        result: rL(c, "G_pin", gap),
        note: "Common practice, no published source: 1/2 in pins for 1-1/4 in receivers, 5/8 in for 2 in and larger.",
      });
      if (pinPart.status === "adjust")
        advice.push(
          gap > 0
            ? `A ${pin} in pin is loose in a ${recv} in receiver: use a ${wanted} in hitch pin with its clip or lock.`
            : `A ${pin} in pin does not go through a ${recv} in receiver's hole: use a ${wanted} in hitch pin with its clip or lock.`,
        );
    }
  } else pinPart.waitingFor = "The hitch pin's diameter and the receiver's opening";
  parts.push(pinPart);

  const withData: CheckStatus[] = parts.map((p) => p.status).filter((s) => s !== "incomplete");
  const status = withMissing(worst(withData), missing);
  // The part shown is the most severe one with figures.
  let shown: Part | undefined;
  for (const p of parts) if (p.status !== "incomplete" && p.actual && (!shown || rankOf(p.status) > rankOf(shown.status))) shown = p;
  const result: HardwareFitResult = {
    id: "hardware-fit",
    title: "Hardware fit",
    status,
    parts,
    message: "",
    advice: NO_TEXT,
    cautions: NO_TEXT,
    missing: missing.length ? missing : undefined,
    steps: NO_STEPS,
  };
  if (shown?.actual) result.actual = shown.actual;
  if (shown?.limit) result.limit = shown.limit;
  if (!detail) return result;
  result.steps = steps;
  if (rig.receiverAdapter) cautions.push("A receiver adapter sits between the receiver and the ball mount: it moves the ball further back, and its own pin must suit its opening.");
  for (const m of missing) advice.push(`${m.what}: ${m.where}.`);
  result.advice = advice;
  result.cautions = cautions;
  const adjusting = parts.filter((p) => p.status === "adjust").map((p) => p.label.toLowerCase());
  result.message =
    adjusting.length
      ? `A part does not fit as it should: ${adjusting.join("; ")}. Change it before towing.`
      : status === "incomplete"
        ? "Enter the ball's size and shank, the ball mount's hole and the hitch pin to check that the parts go together."
        : status === "tight"
          ? "The parts fit, but the receiver opening is not the usual one for the hitch class: check the label."
          : `The ball${t.ballSize ? ` (${t.ballSize} in)` : ""}, its shank, the ball mount's hole and the hitch pin go together${recv ? ` in the ${recv} in receiver` : ""}.`;
  return result;
}
