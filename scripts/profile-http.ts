/**
 * Where a route's server time goes: `npm run profile:http -- save` (or `evaluate`, `summary`, `health`).
 * Starts the production build (NEXT_DIST_DIR) with `node --cpu-prof` over a fresh seeded database, warms it
 * up, sends PROFILE_REQUESTS (default 3,000) requests at 10 connections, stops the server so that the
 * profile is written, then prints the self time by package or file of this tree, and the heaviest functions.
 * The .cpuprofile stays in the printed folder (open it in Chromium's DevTools, Performance tab).
 */
import autocannon from "autocannon";
import { existsSync, mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { SourceMap } from "node:module";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { buildIfNeeded, seededDatabase, sessionCookieFor, startApp } from "../tests/load/support/app-server";

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number; columnNumber: number };
  children?: number[];
}
interface Profile {
  nodes: ProfileNode[];
  startTime: number;
  samples: number[];
  timeDeltas: number[];
}

/** V8 stamps samples on the monotonic clock that process.hrtime reads, in microseconds. */
const nowUs = () => Number(process.hrtime.bigint() / 1000n);

const route = process.argv[2] ?? "save";
const requests = Number(process.env.PROFILE_REQUESTS ?? 3000);
const rig = readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8");

function packageOf(path: string): string | null {
  const modules = path.lastIndexOf("node_modules/");
  if (modules < 0) return null;
  const rest = path.slice(modules + "node_modules/".length).split("/");
  return rest[0]!.startsWith("@") ? `${rest[0]}/${rest[1]}` : rest[0]!;
}

/** The build's chunks carry source maps: a sample in a chunk is named by the file it was compiled from. */
const sourceMaps = new Map<string, SourceMap | null>();
function original(url: string, line: number, column: number): { source: string; line: number } | null {
  if (!url.includes("/server/chunks/")) return null;
  const path = url.startsWith("file://") ? new URL(url).pathname : url;
  let map = sourceMaps.get(path);
  if (map === undefined) {
    map = existsSync(`${path}.map`) ? new SourceMap(JSON.parse(readFileSync(`${path}.map`, "utf8"))) : null;
    sourceMaps.set(path, map);
  }
  const entry = map?.findEntry(line, column);
  if (!entry || !("originalSource" in entry) || !entry.originalSource) return null;
  return { source: entry.originalSource.replace(/^.*\[project\]\//, "").replace(/^(\.\.\/)+/, ""), line: entry.originalLine + 1 };
}

/** A package, a file of this tree, or a part of Node.js. */
function where(frame: ProfileNode["callFrame"]): { place: string; line: number } {
  const { url } = frame;
  if (!url) return { place: "(native, GC, idle)", line: 0 };
  const mapped = original(url, frame.lineNumber, frame.columnNumber);
  if (mapped) return { place: packageOf(mapped.source) ?? mapped.source, line: mapped.line };
  const name = packageOf(url);
  // Next's own server files: name the folder.
  if (name) return { place: name === "next" ? `next/${url.slice(url.lastIndexOf("node_modules/next/") + 18).split("/").slice(0, 3).join("/")}` : name, line: frame.lineNumber + 1 };
  if (url.startsWith("node:")) return { place: url, line: frame.lineNumber + 1 };
  const chunk = url.indexOf("/server/");
  return { place: chunk >= 0 ? `app build: ${url.slice(chunk + 1)}` : url, line: frame.lineNumber + 1 };
}

async function main() {
  buildIfNeeded();
  const database = seededDatabase("towmargin-profile-");
  const dir = mkdtempSync(join(tmpdir(), "towmargin-cpuprof-"));
  const server = await startApp(database.url, { EVALUATE_LIMIT_PER_MINUTE: "100000000" }, undefined, ["--cpu-prof", `--cpu-prof-dir=${dir}`]);
  const cookie = await sessionCookieFor(database.url, "counter@quillfield.example.com");
  const json = { "content-type": "application/json" };
  const options: Record<string, autocannon.Options> = {
    health: { url: `${server.baseURL}/api/v1/health` },
    evaluate: { url: `${server.baseURL}/api/v1/evaluate`, method: "POST", headers: json, body: rig },
    summary: { url: `${server.baseURL}/api/v1/evaluate`, method: "POST", headers: json, body: JSON.stringify({ rig: JSON.parse(rig), detail: "summary" }) },
    save: { url: `${server.baseURL}/api/v1/checks`, method: "POST", headers: { ...json, cookie }, body: JSON.stringify({ rig: JSON.parse(rig), customerName: "Profile Customer" }) },
  };
  const chosen = options[route];
  if (!chosen) throw new Error(`Choose one of: ${Object.keys(options).join(", ")}.`);
  const run = (amount: number) => new Promise((resolve, reject) => autocannon({ ...chosen, connections: 10, amount }, (error, result) => (error ? reject(error) : resolve(result))));
  await run(Math.min(1000, requests)); // warm-up: its samples (and the server's start) are left out below
  const from = nowUs();
  await run(requests);
  const to = nowUs();
  await server.stop();
  database.remove();

  const file = readdirSync(dir).find((name) => name.endsWith(".cpuprofile"));
  if (!file) throw new Error(`No profile was written in ${dir}.`);
  const profile = JSON.parse(readFileSync(join(dir, file), "utf8")) as Profile;
  const byId = new Map(profile.nodes.map((node) => [node.id, node]));
  // Only the samples taken while the measured requests ran: the start and the warm-up are not a request's cost.
  const self = new Map<number, number>();
  let at = profile.startTime;
  profile.samples.forEach((id, i) => {
    at += profile.timeDeltas[i] ?? 0;
    if (at >= from && at <= to) self.set(id, (self.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0));
  });
  const byPlace = new Map<string, number>();
  const byFunction = new Map<string, number>();
  let total = 0;
  for (const [id, us] of self) {
    const node = byId.get(id)!;
    if (node.callFrame.functionName === "(idle)") continue;
    total += us;
    const { place, line } = where(node.callFrame);
    byPlace.set(place, (byPlace.get(place) ?? 0) + us);
    const name = `${node.callFrame.functionName || "(anonymous)"} ${place}:${line}`;
    byFunction.set(name, (byFunction.get(name) ?? 0) + us);
  }
  const top = (map: Map<string, number>, n: number) =>
    [...map]
      .sort((a, b) => b[1] - a[1])
      .slice(0, n)
      .map(([name, us]) => `  ${((100 * us) / total).toFixed(1).padStart(5)} %  ${(us / requests).toFixed(1).padStart(6)} µs/request  ${name}`)
      .join("\n");
  console.log(
    `${route}: ${requests} requests after a warm-up; busy CPU ${(total / 1000).toFixed(0)} ms while they ran, ${(total / requests).toFixed(0)} µs a request (${join(dir, file)})`,
  );
  console.log(`Self time by place:\n${top(byPlace, 25)}`);
  console.log(`Heaviest functions:\n${top(byFunction, 30)}`);
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
