import { authorize } from "@/lib/server/access";
import { listChecks, saveCheck } from "@/lib/server/checks";
import { badRequest, json, refusal } from "@/lib/server/http";
import { fieldErrorsFrom } from "@/lib/validation/form-state";
import { listChecksQuerySchema, saveCheckSchema } from "@/lib/validation/checks";

export const dynamic = "force-dynamic";

const MAX_BODY_BYTES = 64 * 1024;

/** The organisation's saved checks: ?vehicle=&customer=&from=&to=&level=&sort=&dir=&page=&pageSize= */
export async function GET(request: Request) {
  const allowed = await authorize("checks.run");
  if (!allowed.ok) return refusal(allowed);
  const query = listChecksQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return badRequest(fieldErrorsFrom(query.error.issues));
  return json(await listChecks(allowed.access, query.data));
}

/**
 * Saves a check: `{ rig, customerName?, note? }`, the same shape and the same data layer as the check
 * screen's action. The server evaluates the rig itself; 201 with the new id once it is stored.
 */
export async function POST(request: Request) {
  const allowed = await authorize("checks.save");
  if (!allowed.ok) return refusal(allowed);
  const tooLarge = () => json({ ok: false, error: "too_large", message: "The check must be under 64 KiB of JSON." }, 413);
  if (Number(request.headers.get("content-length") ?? 0) > MAX_BODY_BYTES) return tooLarge();
  const text = await request.text();
  if (text.length > MAX_BODY_BYTES) return tooLarge();
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    return badRequest({ form: ["The body is not valid JSON."] }, "The body is not valid JSON.");
  }
  const parsed = saveCheckSchema.safeParse(body);
  if (!parsed.success) return badRequest(fieldErrorsFrom(parsed.error.issues));
  const { id, result } = await saveCheck(allowed.access, parsed.data);
  // No revalidatePath here: every page is rendered per request (nothing of /checks is cached on the server),
  // and a program calling this route has no router cache to refresh.
  return json({ ok: true, id, level: result.verdict.level, complete: result.verdict.complete }, 201, { location: `/api/v1/checks/${id}` });
}
