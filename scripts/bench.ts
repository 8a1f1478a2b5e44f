/**
 * Benchmark of the calculation core: `npm run bench`.
 * 1. One full evaluation with steps (median of batches, microseconds per evaluation).
 * 2. A 500-vehicle × 200-trailer matrix as the server works it out (lib/fleet/matrix.ts: the profiles' parts
 *    composed per pair, the core's evaluateRigFast, the governing margin picked), milliseconds for all 100,000 pairs.
 * 3. matrixPerPairVsEvaluate: the matrix's time per pair over one fast evaluation of the same rigs, already
 *    composed, measured in turn in the same run (target ≤ 1.2: the matrix adds no more than a fifth).
 * 4. filteredPageVsFirstPage: the pairings route over the same fleet stored as profiles, a page filtered by a
 *    verdict over all 100,000 pairs against the unfiltered first page, in the same run (target ≤ 3).
 * The last line printed is JSON:
 *   {"evaluateMedianUs": …, "matrix500x200Ms": …, "matrixPerPairVsEvaluate": …, "filteredPageVsFirstPage": …}.
 */
import { createClient } from "@libsql/client";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { evaluatePair, profilePart } from "../lib/fleet/matrix";
import { evaluateRig, evaluateRigFast, parseRig, TRAILER_TYPES, type RigInput } from "../lib/towing/index";
import { buildIfNeeded, seededDatabase, sessionCookieFor, startApp } from "../tests/load/support/app-server";

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

// ---- 4. the fleet filter over every pair, from stored verdicts ----
/**
 * The same 500 vehicles and 200 trailers as profiles of the demo's fleet organisation, served by the
 * production build (built first if need be) over a fresh seeded database. Once the stored pair verdicts are
 * ready, it asks in turn for the unfiltered first page and for a page filtered by each verdict over all
 * 100,000 pairs, PAIRS_ROUNDS times (default 30), and compares the medians, each filter against the first
 * page of the same run. filteredPageVsFirstPage is the slowest filter's ratio (target ≤ 3).
 */
async function pairingsBench(): Promise<{ ratio: number; lines: string[] }> {
  buildIfNeeded();
  const database = seededDatabase("towmargin-bench-pairs-");
  const client = createClient({ url: database.url });
  const organisationId = "org-fernhollow";
  try {
    const now = Date.now();
    const insert = (table: string, prefix: string, i: number, data: object) => ({
      sql: `INSERT INTO ${table} (id, organisation_id, name, units, data, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?)`,
      args: [`bench-${prefix}-${i}`, organisationId, `Bench ${prefix} ${String(i).padStart(3, "0")}`, "imperial", JSON.stringify({ units: "imperial", ...data }), now, now],
    });
    const statements = [...vehicles.map((v, i) => insert("vehicle_profiles", "truck", i, v)), ...trailers.map((t, i) => insert("trailer_profiles", "trailer", i, t))];
    await client.batch(statements, "write");
  } finally {
    client.close();
  }
  const server = await startApp(database.url);
  try {
    const cookie = await sessionCookieFor(database.url, "fleet@fernhollow.example.com");
    const ask = async (query: string) => {
      const started = performance.now();
      const response = await fetch(`${server.baseURL}/api/v1/fleet/matrix?${query}`, { headers: { cookie } });
      const body = (await response.json()) as { rechecking: boolean; totalRows: number; counts: Record<string, number> | null };
      if (!response.ok) throw new Error(`matrix answered ${response.status}`);
      return { ms: performance.now() - started, body };
    };
    const first = "pageSize=25&colPageSize=10";
    const waitStarted = performance.now();
    while ((await ask(first)).body.rechecking) {
      if (performance.now() - waitStarted > 300_000) throw new Error("the stored pair verdicts were not ready within five minutes");
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    const readyAfter = performance.now() - waitStarted;
    const levels = ["within", "tight", "adjust", "over", "incomplete"] as const;
    const queries = { first, ...Object.fromEntries(levels.map((level) => [level, `level=${level}&${first}`])) } as Record<string, string>;
    for (let i = 0; i < 5; i++) for (const query of Object.values(queries)) await ask(query); // warm up
    const rounds = Number(process.env.PAIRS_ROUNDS ?? 30);
    const times: Record<string, number[]> = Object.fromEntries(Object.keys(queries).map((key) => [key, []]));
    for (let r = 0; r < rounds; r++) for (const [key, query] of Object.entries(queries)) times[key]!.push((await ask(query)).ms);
    const firstMs = median(times.first!);
    const ratios = levels.map((level) => [level, median(times[level]!) / firstMs] as const);
    const worst = Math.max(...ratios.map(([, ratio]) => ratio));
    return {
      ratio: worst,
      lines: [
        `stored pair verdicts for 500 × 200 ready ${(readyAfter / 1000).toFixed(1)} s after the first look; over ${rounds} rounds, unfiltered first page median ${firstMs.toFixed(1)} ms`,
        `filtered page over all 100,000 pairs ÷ first page: ${ratios.map(([level, ratio]) => `${level} ${ratio.toFixed(2)}`).join(", ")} (target ≤ 3)`,
      ],
    };
  } finally {
    await server.stop();
    database.remove();
  }
}

pairingsBench()
  .then(({ ratio, lines }) => {
    for (const line of lines) console.log(line);
    console.log(
      JSON.stringify({
        evaluateMedianUs: Math.round(evaluateMedianUs * 100) / 100,
        matrix500x200Ms: Math.round(matrix500x200Ms),
        matrixPerPairVsEvaluate: Math.round(matrixPerPairVsEvaluate * 100) / 100,
        filteredPageVsFirstPage: Math.round(ratio * 100) / 100,
      }),
    );
    if (!(matrixPerPairVsEvaluate <= 1.2) || !(ratio <= 3)) process.exitCode = 1;
  })
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
