import { authorize } from "@/lib/server/access";
import { json, refusal } from "@/lib/server/http";
import { listTeam } from "@/lib/server/team";

export const dynamic = "force-dynamic";

/** The current organisation's members and open invitations (owners only). */
export async function GET() {
  const allowed = await authorize("team.manage");
  if (!allowed.ok) return refusal(allowed);
  return json(await listTeam(allowed.access));
}
