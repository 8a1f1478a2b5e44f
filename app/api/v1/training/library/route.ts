import { authorize } from "@/lib/server/access";
import { json, refusal } from "@/lib/server/http";
import { LIBRARY } from "@/lib/training/library";

export const dynamic = "force-dynamic";

/** The built-in worked examples, the same for every organisation. */
export async function GET() {
  const allowed = await authorize("training.practise");
  if (!allowed.ok) return refusal(allowed);
  return json({ examples: LIBRARY });
}
