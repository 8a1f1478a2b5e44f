import { env } from "@/lib/env";
import { evaluateRig, evaluateRigSummary, parseEvaluateRequest } from "@/lib/towing";
import { readJsonBody, refuseForeignOrigin } from "@/lib/server/body";
import { badRequest, json } from "@/lib/server/http";
import { consume } from "@/lib/server/rate-limit";
import { clientAddress } from "@/lib/server/request";

export const dynamic = "force-dynamic";

const LIMIT = { bytes: 64 * 1024, message: "The rig must be under 64 KiB of JSON.", field: "rig" };

/**
 * The calculation core over HTTP, no account needed: the same input and output as `npm run evaluate`
 * (docs/evaluate.md): a bare rig or `{ rig, options, detail }`. Nothing is stored.
 */
export async function POST(request: Request) {
  const foreign = refuseForeignOrigin(request);
  if (foreign) return foreign;
  const limit = await consume(`evaluate:${await clientAddress(request.headers)}`, env.EVALUATE_LIMIT_PER_MINUTE, 60_000);
  if (!limit.allowed) {
    return json({ error: "rate_limited", message: "Too many requests. Try again shortly." }, 429, { "retry-after": String(limit.retryAfterSeconds) });
  }
  const body = await readJsonBody(request, LIMIT);
  if (!body.ok) return body.response;
  const parsed = parseEvaluateRequest(body.value);
  if (!parsed.ok) return badRequest(parsed.fieldErrors);
  return json(parsed.detail === "summary" ? evaluateRigSummary(parsed.rig, parsed.options) : evaluateRig(parsed.rig, parsed.options));
}
