import { authorize } from "@/lib/server/access";
import { json, refusal } from "@/lib/server/http";
import { getPreparedLesson } from "@/lib/server/training";
import { entityId } from "@/lib/validation/checks";

export const dynamic = "force-dynamic";

/** One worked example with its steps as the lesson shows them. Another organisation's reads as not found. */
export async function GET(_request: Request, { params }: { params: Promise<{ id: string }> }) {
  const allowed = await authorize("training.practise");
  if (!allowed.ok) return refusal(allowed);
  const id = entityId.safeParse((await params).id);
  const found = id.success ? await getPreparedLesson(allowed.access, id.data) : undefined;
  if (!found) return json({ error: "not_found", message: "No such worked example in this organisation." }, 404);
  const { sourceCheckId: _source, authorUserId: _author, ...lesson } = found.lesson;
  return json({ lesson, steps: found.prepared?.steps ?? [], conclusion: found.prepared?.conclusion ?? null });
}
