/** Shared builders for the core's tests. Invented rigs; reference values live in the tests beside their sources. */
import { convertRig, evaluateRig, parseRig, type AnyCheckResult, type CheckId, type RigInput, type RigResult } from "@/lib/towing";

type DeepPartial<T> = { [K in keyof T]?: T[K] extends object ? DeepPartial<T[K]> : T[K] };

/** A parsed rig; throws in the test if the literal is invalid (a broken fixture must fail loudly). */
export function rig(input: unknown): RigInput {
  const r = parseRig(input);
  if (!r.ok) throw new Error("invalid test rig: " + JSON.stringify(r.fieldErrors));
  return r.rig;
}

/** An invented pickup with a class 3 receiver and a travel trailer, every figure present, imperial. */
export function pickupRig(over: Record<string, unknown> = {}): RigInput {
  const base: Record<string, Record<string, unknown> | string> = {
    units: "imperial",
    vehicle: {
      towRating: 7000,
      tongueWeightLimit: 700,
      gvwr: 7000,
      curbWeight: 5100,
      gcwr: 14000,
      gawrFront: 3700,
      gawrRear: 4000,
      axleWeights: { front: 3000, rear: 2500 },
      wheelbase: 145,
      // Geometry: 41 in to the pin hole + 9 in ball mount = 50 in to the ball
      rearAxleToPin: 41,
      // Each tyre's maximum load, two per axle (invented)
      tyreLoadFront: 2400,
      tyreLoadRear: 2400,
    },
    hitch: { class: 3, receiverSize: "2", pinDiameter: "5/8", gtwRating: 4500, twRating: 675, gtwRatingWd: 5000, twRatingWd: 675, receiverHeight: 26, pinToFascia: 5.5 },
    trailer: {
      type: "travel",
      grossTrailerWeight: 4000,
      tongueWeight: 500,
      tongueWeightBasis: "measured",
      couplerHeight: 20,
      couplerRating: 6000,
      ballSize: "2",
      couplerBallSize: "2",
      ballRating: 6000,
      ballShankSize: "1",
      brakes: "electric",
      safetyChainRating: 6000,
      // The trailer's own plate (invented): GVWR, two axles of 3,500 lb, tyres of 2,200 lb each
      mam: 5200,
      axleRating: 3500,
      axleCount: 2,
      tyreLoad: 2200,
    },
    ballMount: { gtwRating: 6000, twRating: 800, drop: 6, length: 9, holeSize: "1" },
    load: { occupants: 300, cargo: 100, hitchHardware: 30 },
  };
  for (const [k, v] of Object.entries(over)) {
    if (v === undefined) delete base[k];
    else if (typeof v === "object" && v !== null && typeof base[k] === "object") base[k] = { ...(base[k] as object), ...(v as object) };
    else base[k] = v as never;
  }
  return rig(base);
}

export function check<T extends AnyCheckResult = AnyCheckResult>(result: RigResult, id: CheckId): T {
  const c = result.checks.find((x) => x.id === id);
  if (!c) throw new Error(`check ${id} not in result`);
  return c as T;
}

export function evalBoth(r: RigInput) {
  return { imperial: evaluateRig(convertRig(r, "imperial")), metric: evaluateRig(convertRig(r, "metric")) };
}

export type { DeepPartial };
