import { authorize } from "@/lib/server/access";
import { getCheck } from "@/lib/server/checks";
import { json, refusal } from "@/lib/server/http";
import { listShareLinks } from "@/lib/server/share-links";
import { entityId } from "@/lib/validation/checks";

export const dynamic = "force-dynamic";

/** One saved check (inputs, results, core version) and its customer links. */
export async function GET(_request: Request, { params }: { params: Promise<{ id: string }> }) {
  const allowed = await authorize("checks.run");
  if (!allowed.ok) return refusal(allowed);
  const id = entityId.safeParse((await params).id);
  const check = id.success ? await getCheck(allowed.access, id.data) : undefined;
  if (!check) return json({ error: "not_found", message: "No such check in this organisation." }, 404);
  return json({ check, links: await listShareLinks(allowed.access, check.id) });
}
