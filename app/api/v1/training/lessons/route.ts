import { authorize } from "@/lib/server/access";
import { json, refusal } from "@/lib/server/http";
import { listCourses, listLessons } from "@/lib/server/training";

export const dynamic = "force-dynamic";

/** The organisation's worked examples this person may see (drafts for authors only) and its courses. */
export async function GET() {
  const allowed = await authorize("training.practise");
  if (!allowed.ok) return refusal(allowed);
  const [lessons, courses] = await Promise.all([listLessons(allowed.access), listCourses(allowed.access)]);
  return json({ lessons, courses });
}
