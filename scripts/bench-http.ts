/**
 * The HTTP bench: the production build on a free loopback port over a fresh seeded database, driven by
 * autocannon. (a) GET /api/v1/health, (b) POST /api/v1/evaluate with an example rig, (c) POST /api/v1/checks
 * signed in as counter staff. Prints req/s and p50/p99 for each, and last one JSON line:
 *   {"evaluateVsTrivial":…, "saveP99Ms":…, "errors":…, "lost":…}
 * Targets: evaluate ≥ 0.7 × trivial, save p99 < 50 ms at 10 connections, no errors, no lost saves.
 * BENCH_SECONDS (default 10) sets the length of the first two runs; the save run sends a fixed number of saves,
 * BENCH_SAVES (default 3000), so that every answer is counted before the stored rows are; BENCH_CONNECTIONS
 * (default 10) the connections.
 */
import autocannon, { type Result } from "autocannon";
import { readFileSync } from "node:fs";
import { buildIfNeeded, countRows, seededDatabase, sessionCookieFor, startApp } from "../tests/load/support/app-server";

const seconds = Number(process.env.BENCH_SECONDS ?? 10);
const connections = Number(process.env.BENCH_CONNECTIONS ?? 10);
const saves = Number(process.env.BENCH_SAVES ?? 3000);
const rig = readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8");

function run(options: autocannon.Options): Promise<Result> {
  return new Promise((resolve, reject) => {
    autocannon(options, (error, result) => (error ? reject(error) : resolve(result)));
  });
}

function line(name: string, result: Result) {
  const ok = result["2xx"];
  console.log(
    `${name.padEnd(28)} ${result.requests.average.toFixed(0).padStart(6)} req/s   p50 ${String(result.latency.p50).padStart(4)} ms   p99 ${String(result.latency.p99).padStart(4)} ms   ` +
      `2xx ${ok}   non-2xx ${result.non2xx}   errors ${result.errors}   timeouts ${result.timeouts}`,
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
    const targets: Array<{ name: string; options: autocannon.Options }> = [
      { name: "GET /api/v1/health", options: { url: `${server.baseURL}/api/v1/health`, duration: seconds } },
      { name: "POST /api/v1/evaluate", options: { url: `${server.baseURL}/api/v1/evaluate`, method: "POST", headers: json, body: rig, duration: seconds } },
      { name: "POST /api/v1/checks (save)", options: { url: `${server.baseURL}/api/v1/checks`, method: "POST", headers: { ...json, cookie }, body: save, amount: saves } },
    ];
    console.log(`Towmargin HTTP bench: ${connections} connections, ${seconds} s per read run, ${saves} saves, ${server.baseURL} (production build in ${process.env.NEXT_DIST_DIR || ".next"})`);
    const results: Result[] = [];
    let lost = 0;
    for (const target of targets) {
      // A short warm-up so the first compiled paths and the database file are not measured.
      const warmBefore = await countRows(database.url, "saved_checks");
      const warm = await run({ ...target.options, connections: 2, amount: 200 });
      const before = await countRows(database.url, "saved_checks");
      const result = await run({ ...target.options, connections });
      const after = await countRows(database.url, "saved_checks");
      line(target.name, result);
      results.push(result);
      if (target.name.includes("save")) {
        const acknowledgedNotStored = result["2xx"] - (after - before);
        const warmLost = warm["2xx"] - (before - warmBefore);
        console.log(`${"".padEnd(28)} acknowledged ${result["2xx"]}, stored ${after - before} (warm-up ${warm["2xx"]}/${before - warmBefore})`);
        lost += acknowledgedNotStored + warmLost;
      }
    }
    const [trivial, evaluate, saved] = results as [Result, Result, Result];
    const errors = results.reduce((sum, r) => sum + r.errors + r.timeouts + r.non2xx, 0);
    const summary = {
      evaluateVsTrivial: Number((evaluate.requests.average / trivial.requests.average).toFixed(2)),
      saveP99Ms: saved.latency.p99,
      errors,
      lost,
    };
    console.log(JSON.stringify(summary));
    const met = summary.evaluateVsTrivial >= 0.7 && summary.saveP99Ms < 50 && summary.errors === 0 && summary.lost === 0;
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
