/**
 * Evaluate one rig from standard input: `npm run --silent evaluate < rig.json`.
 * Prints the full result as JSON; on bad input prints `{ "ok": false, "fieldErrors": … }` and exits 1.
 * Shapes: docs/evaluate.md.
 */
import { evaluateRig, parseRig, type EvaluateOptions } from "../lib/towing/index";

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
// Accept either a bare rig or { rig, options }.
const wrapped = body !== null && typeof body === "object" && "rig" in (body as object);
const rawRig = wrapped ? (body as { rig: unknown }).rig : body;
const rawOptions = wrapped ? (body as { options?: unknown }).options : undefined;
const options: EvaluateOptions = {};
if (rawOptions !== undefined) {
  if (rawOptions === null || typeof rawOptions !== "object") fail({ options: ["Options must be an object."] });
  const o = rawOptions as Record<string, unknown>;
  const t = o.tightMarginRatio;
  if (t !== undefined) {
    if (typeof t !== "number" || !Number.isFinite(t) || t < 0 || t > 0.5) fail({ "options.tightMarginRatio": ["Enter a number from 0 to 0.5."] });
    options.tightMarginRatio = t;
  }
  const a = o.accessoryReferenceArm;
  if (a !== undefined) {
    if (typeof a !== "number" || !Number.isFinite(a) || a <= 0) fail({ "options.accessoryReferenceArm": ["Enter a length above zero."] });
    options.accessoryReferenceArm = a;
  }
}
const parsed = parseRig(rawRig);
if (!parsed.ok) fail(parsed.fieldErrors);
process.stdout.write(JSON.stringify(evaluateRig(parsed.rig, options), null, 2) + "\n");
