import { authorize } from "@/lib/server/access";
import { listChecks, saveCheck } from "@/lib/server/checks";
import { readJsonBody, refuseForeignOrigin } from "@/lib/server/body";
import { badRequest, json, refusal } from "@/lib/server/http";
import { fieldErrorsFrom } from "@/lib/validation/form-state";
import { listChecksQuerySchema, saveCheckSchema } from "@/lib/validation/checks";

export const dynamic = "force-dynamic";

const LIMIT = { bytes: 64 * 1024, message: "The check must be under 64 KiB of JSON.", field: "form" };

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
  const foreign = refuseForeignOrigin(request);
  if (foreign) return foreign;
  const allowed = await authorize("checks.save");
  if (!allowed.ok) return refusal(allowed);
  const body = await readJsonBody(request, LIMIT);
  if (!body.ok) return body.response;
  const parsed = saveCheckSchema.safeParse(body.value);
  if (!parsed.success) return badRequest(fieldErrorsFrom(parsed.error.issues));
  const { id, result } = await saveCheck(allowed.access, parsed.data);
  // No revalidatePath here: every page is rendered per request (nothing of /checks is cached on the server),
  // and a program calling this route has no router cache to refresh.
  return json({ ok: true, id, level: result.verdict.level, complete: result.verdict.complete }, 201, { location: `/api/v1/checks/${id}` });
}
