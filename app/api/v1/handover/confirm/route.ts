import { readLimitedBytes, refuseForeignOrigin } from "@/lib/server/body";
import { badRequest, json } from "@/lib/server/http";
import { confirmLimitsByToken } from "@/lib/server/installations";
import { consume } from "@/lib/server/rate-limit";
import { clientAddress } from "@/lib/server/request";
import { fieldErrorsFrom } from "@/lib/validation/form-state";
import { confirmLimitsSchema } from "@/lib/validation/installations";

export const dynamic = "force-dynamic";

/** A confirmation is a token and a ticked box: a few hundred bytes; 16 KiB leaves room and no more. */
const MAX_BODY_BYTES = 16 * 1024;
/** Per client address per minute; a customer confirms once. */
const LIMIT_PER_MINUTE = 20;

/**
 * The customer confirms, on their hand-over page, that they have read the limits. No account: the link's
 * token is the permission, so the route checks the Origin, limits the body and the rate per address, and
 * answers a withdrawn or unknown link exactly as a wrong one. A form post (the page works without
 * JavaScript) is sent back to the page; a JSON post gets JSON.
 */
export async function POST(request: Request) {
  const foreign = refuseForeignOrigin(request);
  if (foreign) return foreign;
  const limit = await consume(`handover-confirm:${await clientAddress()}`, LIMIT_PER_MINUTE, 60_000);
  if (!limit.allowed) return json({ error: "rate_limited", message: "Too many tries: wait a minute and try again." }, 429, { "retry-after": String(limit.retryAfterSeconds) });
  const read = await readLimitedBytes(request, { bytes: MAX_BODY_BYTES, message: "The confirmation is too large.", field: "form" });
  if (!read.ok) return read.response;
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(read.value);
  } catch {
    return badRequest({ form: ["Send the confirmation as JSON or as a form."] });
  }
  const isJson = (request.headers.get("content-type") ?? "").includes("application/json");
  let body: unknown;
  if (isJson) {
    try {
      body = JSON.parse(text);
    } catch {
      return badRequest({ form: ["Send the confirmation as JSON or as a form."] });
    }
  } else body = Object.fromEntries(new URLSearchParams(text));
  if (typeof body !== "object" || body === null || Array.isArray(body)) return badRequest({ form: ["Send the confirmation as JSON or as a form."] });
  const parsed = confirmLimitsSchema.safeParse(body);
  if (!parsed.success) return badRequest(fieldErrorsFrom(parsed.error.issues));
  const confirmed = await confirmLimitsByToken(parsed.data.token);
  if (!confirmed.ok) return json({ ok: false, error: "not_found", message: "This link is not open any more.", fieldErrors: { token: ["This link is not open any more."] } }, 404);
  if (isJson) return json({ ok: true, confirmedAt: confirmed.confirmedAt.toISOString() });
  return new Response(null, { status: 303, headers: { location: `/r/${parsed.data.token}?confirmed=1`, "cache-control": "no-store" } });
}
