import { env } from "@/lib/env";
import { evaluateRig, parseEvaluateRequest } from "@/lib/towing";
import { badRequest, json } from "@/lib/server/http";
import { consume } from "@/lib/server/rate-limit";
import { clientAddress } from "@/lib/server/request";

export const dynamic = "force-dynamic";

const MAX_BODY_BYTES = 64 * 1024;

/**
 * The calculation core over HTTP, no account needed: the same input and output as `npm run evaluate`
 * (docs/evaluate.md): a bare rig or `{ rig, options }`. Nothing is stored.
 */
export async function POST(request: Request) {
  const limit = consume(`evaluate:${await clientAddress()}`, env.EVALUATE_LIMIT_PER_MINUTE, 60_000);
  if (!limit.allowed) {
    return json({ error: "rate_limited", message: "Too many requests. Try again shortly." }, 429, { "retry-after": String(limit.retryAfterSeconds) });
  }
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > MAX_BODY_BYTES) return json({ error: "too_large", message: "The rig must be under 64 KiB of JSON." }, 413);
  const text = await request.text();
  if (text.length > MAX_BODY_BYTES) return json({ error: "too_large", message: "The rig must be under 64 KiB of JSON." }, 413);
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    return badRequest({ rig: ["The body is not valid JSON."] }, "The body is not valid JSON.");
  }
  const parsed = parseEvaluateRequest(body);
  if (!parsed.ok) return badRequest(parsed.fieldErrors);
  return json(evaluateRig(parsed.rig, parsed.options));
}
