import { authorize } from "@/lib/server/access";
import { exportFleet } from "@/lib/server/fleet";
import { csvResponse, kindParam } from "@/lib/server/fleet-http";
import { badRequest, refusal } from "@/lib/server/http";
import { listProfilesQuerySchema } from "@/lib/validation/fleet";
import { fieldErrorsFrom } from "@/lib/validation/form-state";

export const dynamic = "force-dynamic";

/** The list as CSV in the import's own columns, so an exported file can be edited and imported again. */
export async function GET(request: Request, { params }: { params: Promise<{ kind: string }> }) {
  const allowed = await authorize("fleet.read");
  if (!allowed.ok) return refusal(allowed);
  const kind = await kindParam(params);
  if (kind instanceof Response) return kind;
  const query = listProfilesQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return badRequest(fieldErrorsFrom(query.error.issues));
  const date = new Date().toISOString().slice(0, 10);
  return csvResponse(await exportFleet(allowed.access, kind, query.data.archived), `towmargin-${kind}-${date}.csv`);
}
