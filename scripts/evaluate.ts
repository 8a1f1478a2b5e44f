/**
 * Evaluate one rig from standard input: `npm run --silent evaluate < rig.json`.
 * Prints the full result as JSON (the compact one for `{ rig, detail: "summary" }`); on bad input prints `{ "ok": false, "fieldErrors": … }` and exits 1.
 * `--place=GB-ENG` (or US-TX, AU-QLD, EU …) reads the rig against that place's rules as well; a place in the
 * body's options wins over none, the flag wins over the body. Shapes: docs/evaluate.md.
 */
import { evaluateRig, evaluateRigSummary, parseEvaluateRequest, parsePlace } from "../lib/towing/index";

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString("utf8");
}

function fail(fieldErrors: Record<string, string[]>, code = 1): never {
  process.stdout.write(JSON.stringify({ ok: false, fieldErrors }, null, 2) + "\n");
  process.exit(code);
}

const text = await readStdin();
let body: unknown;
try {
  body = JSON.parse(text);
} catch {
  fail({ rig: ["The input is not valid JSON."] });
}
const request = parseEvaluateRequest(body);
if (!request.ok) fail(request.fieldErrors);
const flag = process.argv.slice(2).find((a) => a.startsWith("--place"));
if (flag) {
  const value = flag.includes("=") ? flag.slice(flag.indexOf("=") + 1) : process.argv[process.argv.indexOf(flag) + 1];
  const place = parsePlace(value ?? "");
  if (!place.ok) fail(place.fieldErrors);
  request.options.place = place.place;
}
const result = request.detail === "summary" ? evaluateRigSummary(request.rig, request.options) : evaluateRig(request.rig, request.options);
process.stdout.write(JSON.stringify(result, null, 2) + "\n");
