/**
 * Benchmark of the calculation core: `npm run bench`.
 * 1. One full evaluation with steps (median of batches, microseconds per evaluation).
 * 2. A 500-vehicle × 200-trailer matrix as the server works it out (lib/fleet/matrix.ts: the profiles' parts
 *    composed per pair, the core's evaluateRigFast, the governing margin picked), milliseconds for all 100,000 pairs.
 * 3. matrixPerPairVsEvaluate: the matrix's time per pair over one fast evaluation of the same rigs, already
 *    composed, measured in turn in the same run (target ≤ 1.2: the matrix adds no more than a fifth).
 * The last line printed is JSON: {"evaluateMedianUs": …, "matrix500x200Ms": …, "matrixPerPairVsEvaluate": …}.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { evaluatePair, profilePart } from "../lib/fleet/matrix";
import { evaluateRig, evaluateRigFast, parseRig, TRAILER_TYPES, type RigInput } from "../lib/towing/index";

function load(name: string): RigInput {
  const path = fileURLToPath(new URL(`../tests/fixtures/rigs/${name}`, import.meta.url));
  const parsed = parseRig(JSON.parse(readFileSync(path, "utf8")));
  if (!parsed.ok) throw new Error(`${name}: ${JSON.stringify(parsed.fieldErrors)}`);
  return parsed.rig;
}

/** Small deterministic generator, so every run measures the same fleet. */
function prng(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

// ---- 1. full evaluation ----
const camper = load("camper-on-pickup.json");
const boat = load("boat-on-suv.json");
for (let i = 0; i < 3000; i++) evaluateRig(i % 2 ? camper : boat); // warm up
const BATCH = 200;
const perCall: number[] = [];
let sink = 0;
for (let b = 0; b < 100; b++) {
  const t0 = process.hrtime.bigint();
  for (let i = 0; i < BATCH; i++) sink += evaluateRig(camper).checks.length;
  perCall.push(Number(process.hrtime.bigint() - t0) / 1000 / BATCH);
}
const evaluateMedianUs = median(perCall);
const metricPerCall: number[] = [];
for (let b = 0; b < 50; b++) {
  const t0 = process.hrtime.bigint();
  for (let i = 0; i < BATCH; i++) sink += evaluateRig(boat).checks.length;
  metricPerCall.push(Number(process.hrtime.bigint() - t0) / 1000 / BATCH);
}

// ---- 2. fleet matrix ----
const rnd = prng(20261201);
const pick = <T>(xs: readonly T[]) => xs[Math.floor(rnd() * xs.length)]!;
const between = (lo: number, hi: number) => Math.round(lo + rnd() * (hi - lo));
type Side = Pick<RigInput, "vehicle" | "hitch" | "load">;
type Hitched = Pick<RigInput, "trailer" | "ballMount" | "weightDistribution">;
/** An invented receiver sized to the vehicle, as a shop would fit it. */
function hitchFor(tow: number) {
  const cls = tow <= 3500 ? 2 : tow <= 6000 ? 3 : 4;
  const gtw = cls === 2 ? 3500 : cls === 3 ? 6000 : 10000;
  return { class: cls, gtwRating: gtw, twRating: gtw / 10, gtwRatingWd: gtw * 1.2, twRatingWd: gtw * 0.12, receiverHeight: between(14, 28), pinToFascia: 5.5 };
}
const vehicles: Side[] = [];
for (let i = 0; i < 500; i++) {
  const gvwr = between(4500, 11000);
  const curb = Math.round(gvwr * (0.65 + rnd() * 0.15));
  const tow = between(3500, 14000);
  const r = parseRig({
    units: "imperial",
    vehicle: {
      towRating: tow,
      towRatingWd: Math.round(tow * 1.2),
      tongueWeightLimit: Math.round(tow * 0.1),
      tongueWeightLimitWd: Math.round(tow * 0.12),
      gvwr,
      curbWeight: curb,
      gcwr: gvwr + tow + between(0, 2000),
      gawrFront: Math.round(gvwr * 0.55),
      gawrRear: Math.round(gvwr * 0.6),
      axleWeights: { front: Math.round(curb * 0.56), rear: Math.round(curb * 0.44) + 300 },
      wheelbase: between(100, 170),
      rearAxleToPin: between(27, 52),
      departureAngle: between(15, 30),
    },
    hitch: hitchFor(tow),
    load: { occupants: between(150, 600), cargo: between(0, 500), hitchHardware: between(10, 90) },
  });
  if (!r.ok) throw new Error("bench vehicle: " + JSON.stringify(r.fieldErrors));
  vehicles.push({ vehicle: r.rig.vehicle, hitch: r.rig.hitch, load: r.rig.load });
}
const trailers: Hitched[] = [];
for (let i = 0; i < 200; i++) {
  const gtw = between(1000, 9000);
  const r = parseRig({
    units: "imperial",
    vehicle: {},
    trailer: {
      type: pick(TRAILER_TYPES),
      grossTrailerWeight: gtw,
      tongueWeight: Math.round(gtw * (0.09 + rnd() * 0.07)),
      tongueWeightBasis: "measured",
      couplerHeight: between(14, 24),
      couplerRating: Math.max(gtw, pick([3500, 6000, 10000])),
      ballSize: "2",
      couplerBallSize: "2",
      ballRating: gtw <= 3500 ? pick([3500, 6000]) : gtw <= 6000 ? 6000 : 10000,
      brakes: gtw > 3000 ? "electric" : "none",
      safetyChainRating: Math.max(gtw, 5000),
    },
    ballMount: { gtwRating: 10000, twRating: 1000, drop: between(0, 6), length: 9 },
    weightDistribution: gtw > 5000 ? { used: true, fenderUnhitched: 38, fenderHitched: 39.2, fenderWithWd: 38.6 } : undefined,
  });
  if (!r.ok) throw new Error("bench trailer: " + JSON.stringify(r.fieldErrors));
  trailers.push({ trailer: r.rig.trailer, ballMount: r.rig.ballMount, weightDistribution: r.rig.weightDistribution });
}
// As the server holds them: each profile's stored parts, converted once to the organisation's units.
const vehicleParts = vehicles.map((v) => profilePart({ units: "imperial", data: { ...v } }, "imperial"));
const trailerParts = trailers.map((t) => profilePart({ units: "imperial", data: { ...t } }, "imperial"));
const TIGHT = 0.1;
const counts: Record<string, number> = { within: 0, tight: 0, adjust: 0, over: 0, incomplete: 0 };
// The baseline: the same 100,000 rigs, composed beforehand, one fast evaluation each.
const width = trailerParts.length;
const composed: RigInput[] = [];
for (const v of vehicleParts) for (const t of trailerParts) composed.push({ units: "imperial", ...v, ...t } as RigInput);
const matrixRow = (r: number) => {
  const v = vehicleParts[r]!;
  for (let c = 0; c < width; c++) {
    const cell = evaluatePair("imperial", v, trailerParts[c]!, TIGHT);
    counts[cell.level] = (counts[cell.level] ?? 0) + 1;
  }
};
const evaluationRow = (r: number) => {
  for (let c = 0; c < width; c++) sink += evaluateRigFast(composed[r * width + c]!, { tightMarginRatio: TIGHT }).checks.length;
};
/**
 * One pass over every pair both ways, row by row in turn (alternating which goes first), so that the
 * machine's drift within a run falls on both alike. Returns the total milliseconds of each.
 */
const runBoth = () => {
  let matrix = 0;
  let evaluations = 0;
  for (let r = 0; r < vehicleParts.length; r++) {
    const first = r % 2 ? matrixRow : evaluationRow;
    const second = r % 2 ? evaluationRow : matrixRow;
    const t0 = performance.now();
    first(r);
    const t1 = performance.now();
    second(r);
    const t2 = performance.now();
    if (r % 2) {
      matrix += t1 - t0;
      evaluations += t2 - t1;
    } else {
      evaluations += t1 - t0;
      matrix += t2 - t1;
    }
  }
  return { matrix, evaluations };
};
runBoth(); // warm up
for (const key of Object.keys(counts)) counts[key] = 0;
const matrixRuns: number[] = [];
const evaluationRuns: number[] = [];
const perPairRatios: number[] = [];
for (let i = 0; i < 3; i++) {
  const { matrix, evaluations } = runBoth();
  matrixRuns.push(matrix);
  evaluationRuns.push(evaluations);
  perPairRatios.push(matrix / evaluations);
}
const matrix500x200Ms = median(matrixRuns);
const matrixPerPairVsEvaluate = median(perPairRatios);

console.log(`full evaluation with steps (imperial camper): median ${evaluateMedianUs.toFixed(2)} µs`);
console.log(`full evaluation with steps (metric boat): median ${median(metricPerCall).toFixed(2)} µs`);
console.log(
  `500 × 200 matrix: ${matrixRuns.map((m) => m.toFixed(0)).join(" / ")} ms (median ${matrix500x200Ms.toFixed(0)} ms); levels per run: ` +
    Object.entries(counts).map(([level, n]) => `${level} ${n / 3}`).join(", "),
);
console.log(
  `the same 100,000 rigs composed beforehand, one fast evaluation each: ${evaluationRuns.map((m) => m.toFixed(0)).join(" / ")} ms; ` +
    `matrix per pair ÷ evaluation by run: ${perPairRatios.map((r) => r.toFixed(2)).join(", ")} (target ≤ 1.2)`,
);
if (sink < 0) console.log(sink);
console.log(
  JSON.stringify({
    evaluateMedianUs: Math.round(evaluateMedianUs * 100) / 100,
    matrix500x200Ms: Math.round(matrix500x200Ms),
    matrixPerPairVsEvaluate: Math.round(matrixPerPairVsEvaluate * 100) / 100,
  }),
);
if (!(matrixPerPairVsEvaluate <= 1.2)) process.exitCode = 1;
