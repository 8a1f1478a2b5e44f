/**
 * Where a route's server time goes: `npm run profile:http -- save` (or `evaluate`, `summary`, `health`).
 * Starts the production build (NEXT_DIST_DIR) with `node --cpu-prof` over a fresh seeded database, warms it
 * up, sends PROFILE_REQUESTS (default 3,000) requests at 10 connections, stops the server so that the
 * profile is written, then prints the self time by package or file of this tree, and the heaviest functions.
 * The .cpuprofile stays in the printed folder (open it in Chromium's DevTools, Performance tab).
 */
import autocannon from "autocannon";
import { mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { buildIfNeeded, seededDatabase, sessionCookieFor, startApp } from "../tests/load/support/app-server";

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}
interface Profile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
}

const route = process.argv[2] ?? "save";
const requests = Number(process.env.PROFILE_REQUESTS ?? 3000);
const rig = readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8");

function where(url: string): string {
  if (!url) return "(native, GC, idle)";
  const modules = url.lastIndexOf("node_modules/");
  if (modules >= 0) {
    const rest = url.slice(modules + "node_modules/".length).split("/");
    const name = rest[0]!.startsWith("@") ? `${rest[0]}/${rest[1]}` : rest[0]!;
    // Next's server bundles hold React and the app's own code compiled in: name the chunk.
    return name === "next" ? `next/${rest.slice(1, 4).join("/")}` : name;
  }
  if (url.startsWith("node:")) return url;
  const chunk = url.indexOf("/server/");
  return chunk >= 0 ? `app build: ${url.slice(chunk + 1)}` : url;
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
  await run(Math.min(1000, requests)); // warm-up, in the profile too; small against the measured run
  await run(requests);
  await server.stop();
  database.remove();

  const file = readdirSync(dir).find((name) => name.endsWith(".cpuprofile"));
  if (!file) throw new Error(`No profile was written in ${dir}.`);
  const profile = JSON.parse(readFileSync(join(dir, file), "utf8")) as Profile;
  const byId = new Map(profile.nodes.map((node) => [node.id, node]));
  const self = new Map<number, number>();
  profile.samples.forEach((id, i) => self.set(id, (self.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0)));
  const byPlace = new Map<string, number>();
  const byFunction = new Map<string, number>();
  let total = 0;
  for (const [id, us] of self) {
    const node = byId.get(id)!;
    if (node.callFrame.functionName === "(idle)") continue;
    total += us;
    const place = where(node.callFrame.url);
    byPlace.set(place, (byPlace.get(place) ?? 0) + us);
    const name = `${node.callFrame.functionName || "(anonymous)"} ${place}:${node.callFrame.lineNumber + 1}`;
    byFunction.set(name, (byFunction.get(name) ?? 0) + us);
  }
  const top = (map: Map<string, number>, n: number) =>
    [...map].sort((a, b) => b[1] - a[1]).slice(0, n).map(([name, us]) => `  ${((100 * us) / total).toFixed(1).padStart(5)} %  ${name}`).join("\n");
  console.log(`${route}: ${requests} requests after a warm-up; busy CPU ${(total / 1000).toFixed(0)} ms in the profile (${join(dir, file)})`);
  console.log(`Self time by place:\n${top(byPlace, 25)}`);
  console.log(`Heaviest functions:\n${top(byFunction, 30)}`);
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
