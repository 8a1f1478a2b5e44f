import { authorize } from "@/lib/server/access";
import { listChecks } from "@/lib/server/checks";
import { badRequest, json, refusal } from "@/lib/server/http";
import { fieldErrorsFrom } from "@/lib/validation/form-state";
import { listChecksQuerySchema } from "@/lib/validation/checks";

export const dynamic = "force-dynamic";

/** The organisation's saved checks: ?vehicle=&customer=&from=&to=&level=&sort=&dir=&page=&pageSize= */
export async function GET(request: Request) {
  const allowed = await authorize("checks.run");
  if (!allowed.ok) return refusal(allowed);
  const query = listChecksQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return badRequest(fieldErrorsFrom(query.error.issues));
  return json(await listChecks(allowed.access, query.data));
}
