import { authorize } from "@/lib/server/access";
import { listFleetProfiles } from "@/lib/server/fleet";
import { kindParam } from "@/lib/server/fleet-http";
import { badRequest, json, refusal } from "@/lib/server/http";
import { listProfilesQuerySchema } from "@/lib/validation/fleet";
import { fieldErrorsFrom } from "@/lib/validation/form-state";

export const dynamic = "force-dynamic";

/** The organisation's vehicles, trailers or accessories: ?archived=exclude|include|only */
export async function GET(request: Request, { params }: { params: Promise<{ kind: string }> }) {
  const allowed = await authorize("fleet.read");
  if (!allowed.ok) return refusal(allowed);
  const kind = await kindParam(params);
  if (kind instanceof Response) return kind;
  const query = listProfilesQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return badRequest(fieldErrorsFrom(query.error.issues));
  return json({ kind, units: allowed.access.organisation.units, profiles: await listFleetProfiles(allowed.access, kind, query.data.archived) });
}
