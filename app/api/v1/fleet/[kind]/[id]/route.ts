import { authorize } from "@/lib/server/access";
import { listVehicleDocuments } from "@/lib/server/documents";
import { getFleetProfile } from "@/lib/server/fleet";
import { kindParam, notFoundJson } from "@/lib/server/fleet-http";
import { json, refusal } from "@/lib/server/http";
import { profileIdSchema } from "@/lib/validation/fleet";

export const dynamic = "force-dynamic";

/** One profile of the organisation (a vehicle with its documents). */
export async function GET(_request: Request, { params }: { params: Promise<{ kind: string; id: string }> }) {
  const allowed = await authorize("fleet.read");
  if (!allowed.ok) return refusal(allowed);
  const kind = await kindParam(params);
  if (kind instanceof Response) return kind;
  const id = profileIdSchema.safeParse((await params).id);
  const profile = id.success ? await getFleetProfile(allowed.access, kind, id.data) : undefined;
  if (!profile) return notFoundJson("No such profile in this organisation.");
  const documents = kind === "vehicles" ? await listVehicleDocuments(allowed.access, profile.id) : undefined;
  return json({ kind, profile, documents });
}
