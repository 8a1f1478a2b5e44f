/**
 * The HTTP bench: the production build on a free loopback port over a fresh seeded database, driven by
 * autocannon. (a) GET /api/v1/health (the trivial route), (b) POST /api/v1/evaluate with an example rig,
 * (c) the same with `"detail": "summary"`, (d) POST /api/v1/checks signed in as counter staff. Prints req/s,
 * p50/p99 and the server's CPU time per request for each, and last one JSON line:
 *   {"evaluateCpuVsTrivial":…, "summaryCpuVsTrivial":…, "saveCpuVsTrivial":…, "errors":…, "lost":…}
 * Each ratio is the route's server CPU per request over the trivial route's in the same round (the median
 * over rounds). Targets: evaluate ≤ 1.5, summary ≤ 1.15, save ≤ 2.5, no errors, no lost saves. Ratios taken
 * side by side hold on a loaded machine where absolute times do not.
 *
 * How it measures, and why:
 * - Warm-up first, at full concurrency (BENCH_WARM_SECONDS, default 3 s per route, and 1,000 saves): a
 *   fresh server runs unoptimised code for its first few thousand requests, and a server in use is warm.
 * - Then BENCH_ROUNDS rounds (default 3), each running (a) to (d) back to back, and the figures are the
 *   median over rounds. The machine's speed drifts by a quarter within a minute, so each route is compared
 *   with (a) within its round, never across the run, and one slow round cannot decide alone.
 * - CPU, not req/s: the server's own user + system time (its process group, from /proc) per request does not
 *   count what the load tool and the neighbours take.
 * BENCH_SECONDS (default 5) sets the length of each read run; each save run sends BENCH_SAVES (default 2,000)
 * so that every answer is counted before the stored rows are; BENCH_CONNECTIONS (default 10).
 */
import autocannon, { type Result } from "autocannon";
import { readFileSync } from "node:fs";
import { buildIfNeeded, countRows, cpuTimeMs, seededDatabase, sessionCookieFor, startApp } from "../tests/load/support/app-server";

const seconds = Number(process.env.BENCH_SECONDS ?? 5);
const warmSeconds = Number(process.env.BENCH_WARM_SECONDS ?? 3);
const rounds = Number(process.env.BENCH_ROUNDS ?? 3);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 10);
const saves = Number(process.env.BENCH_SAVES ?? 2000);
const rig = readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8");

function run(options: autocannon.Options): Promise<Result> {
  return new Promise((resolve, reject) => {
    autocannon(options, (error, result) => (error ? reject(error) : resolve(result)));
  });
}

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
};

interface Measured {
  result: Result;
  cpuUsPerRequest: number;
}

function line(name: string, { result, cpuUsPerRequest }: Measured) {
  console.log(
    `  ${name.padEnd(28)} ${result.requests.average.toFixed(0).padStart(6)} req/s   p50 ${String(result.latency.p50).padStart(4)} ms   p99 ${String(result.latency.p99).padStart(4)} ms   ` +
      `server CPU ${(cpuUsPerRequest / 1000).toFixed(2)} ms/request   2xx ${result["2xx"]}   non-2xx ${result.non2xx}   errors ${result.errors}   timeouts ${result.timeouts}`,
  );
}

async function main() {
  buildIfNeeded();
  const database = seededDatabase("towmargin-bench-");
  const server = await startApp(database.url, {
    // The per-address limits would refuse a load tool on one address within a second.
    EVALUATE_LIMIT_PER_MINUTE: "100000000",
    AUTH_LIMIT_PER_ACCOUNT: "100000000",
    AUTH_LIMIT_PER_ADDRESS: "100000000",
  });
  try {
    const cookie = await sessionCookieFor(database.url, "counter@quillfield.example.com");
    const json = { "content-type": "application/json" };
    const save = JSON.stringify({ rig: JSON.parse(rig), customerName: "Bench Customer", note: "Load run." });
    const trivial: autocannon.Options = { url: `${server.baseURL}/api/v1/health`, connections };
    const evaluate: autocannon.Options = { url: `${server.baseURL}/api/v1/evaluate`, method: "POST", headers: json, body: rig, connections };
    const summaryBody = JSON.stringify({ rig: JSON.parse(rig), detail: "summary" });
    const summary: autocannon.Options = { url: `${server.baseURL}/api/v1/evaluate`, method: "POST", headers: json, body: summaryBody, connections };
    const saving: autocannon.Options = { url: `${server.baseURL}/api/v1/checks`, method: "POST", headers: { ...json, cookie }, body: save, connections };
    console.log(
      `Towmargin HTTP bench: ${connections} connections; warm-up ${warmSeconds} s per route; ${rounds} rounds of ${seconds} s per read run and ${saves} saves; ` +
        `${server.baseURL} (production build in ${process.env.NEXT_DIST_DIR || ".next"})`,
    );

    const measure = async (options: autocannon.Options): Promise<Measured> => {
      const before = cpuTimeMs(server);
      const result = await run(options);
      const cpu = cpuTimeMs(server) - before;
      return { result, cpuUsPerRequest: result.requests.total ? (cpu * 1000) / result.requests.total : 0 };
    };
    /** Saves, and how many of those answered 2xx are not in the table afterwards. */
    const measureSaves = async (amount: number): Promise<Measured & { lost: number }> => {
      const before = await countRows(database.url, "saved_checks");
      const measured = await measure({ ...saving, amount });
      const stored = (await countRows(database.url, "saved_checks")) - before;
      return { ...measured, lost: measured.result["2xx"] - stored };
    };

    let errors = 0;
    let lost = 0;
    const tally = (measured: Measured) => {
      errors += measured.result.errors + measured.result.timeouts + measured.result.non2xx;
    };
    for (const options of [trivial, evaluate, summary]) tally(await measure({ ...options, duration: warmSeconds }));
    const warmSaves = await measureSaves(1000);
    tally(warmSaves);
    lost += warmSaves.lost;

    const ratios = { evaluate: [] as number[], summary: [] as number[], save: [] as number[] };
    const cpuRatio = (measured: Measured, baseline: Measured) => (baseline.cpuUsPerRequest ? measured.cpuUsPerRequest / baseline.cpuUsPerRequest : Infinity);
    for (let round = 1; round <= rounds; round++) {
      console.log(`Round ${round}`);
      const a = await measure({ ...trivial, duration: seconds });
      line("GET /api/v1/health", a);
      const b = await measure({ ...evaluate, duration: seconds });
      line("POST /api/v1/evaluate", b);
      const s = await measure({ ...summary, duration: seconds });
      line("POST /api/v1/evaluate summary", s);
      const c = await measureSaves(saves);
      line("POST /api/v1/checks (save)", c);
      console.log(`  ${"".padEnd(28)} acknowledged ${c.result["2xx"]}, stored ${c.result["2xx"] - c.lost}`);
      for (const measured of [a, b, s, c]) tally(measured);
      lost += c.lost;
      ratios.evaluate.push(cpuRatio(b, a));
      ratios.summary.push(cpuRatio(s, a));
      ratios.save.push(cpuRatio(c, a));
      console.log(`  server CPU per request against the trivial route: evaluate ${cpuRatio(b, a).toFixed(2)}, summary ${cpuRatio(s, a).toFixed(2)}, save ${cpuRatio(c, a).toFixed(2)}`);
    }
    const byRound = (values: number[]) => values.map((r) => r.toFixed(2)).join(", ");
    console.log(`CPU ÷ trivial by round: evaluate ${byRound(ratios.evaluate)}; summary ${byRound(ratios.summary)}; save ${byRound(ratios.save)} (the summary takes the medians)`);
    const result = {
      evaluateCpuVsTrivial: Number(median(ratios.evaluate).toFixed(2)),
      summaryCpuVsTrivial: Number(median(ratios.summary).toFixed(2)),
      saveCpuVsTrivial: Number(median(ratios.save).toFixed(2)),
      errors,
      lost,
    };
    const targets = { evaluateCpuVsTrivial: 1.5, summaryCpuVsTrivial: 1.15, saveCpuVsTrivial: 2.5 } as const;
    const missed = (Object.keys(targets) as Array<keyof typeof targets>).filter((key) => !(result[key] <= targets[key]));
    console.log(`targets: evaluate ≤ ${targets.evaluateCpuVsTrivial}, summary ≤ ${targets.summaryCpuVsTrivial}, save ≤ ${targets.saveCpuVsTrivial}, no errors, no lost saves${missed.length ? `; missed: ${missed.join(", ")}` : "; all met"}`);
    console.log(JSON.stringify(result));
    const met = missed.length === 0 && result.errors === 0 && result.lost === 0;
    if (!met) process.exitCode = 1;
  } finally {
    await server.stop();
    database.remove();
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
