import { authorize } from "@/lib/server/access";
import { badRequest, json, refusal } from "@/lib/server/http";
import { listInstallations } from "@/lib/server/installations";
import { fieldErrorsFrom } from "@/lib/validation/form-state";
import { listInstallationsQuerySchema } from "@/lib/validation/installations";

export const dynamic = "force-dynamic";

/** The organisation's installation records: ?state=&installer=&from=&to=&vehicle=&page=&pageSize= */
export async function GET(request: Request) {
  const allowed = await authorize("installations.read");
  if (!allowed.ok) return refusal(allowed);
  const query = listInstallationsQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return badRequest(fieldErrorsFrom(query.error.issues));
  return json(await listInstallations(allowed.access, query.data));
}
