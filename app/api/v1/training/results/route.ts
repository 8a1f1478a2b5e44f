import { authorize } from "@/lib/server/access";
import { badRequest, json, refusal } from "@/lib/server/http";
import { listResults } from "@/lib/server/training";
import { fieldErrorsFrom } from "@/lib/validation/form-state";
import { resultsQuerySchema } from "@/lib/validation/training";

export const dynamic = "force-dynamic";

/** Learners' practice per learner and example, for trainers and owners. */
export async function GET(request: Request) {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return refusal(allowed);
  const query = resultsQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return badRequest(fieldErrorsFrom(query.error.issues));
  return json({ rows: await listResults(allowed.access, query.data) });
}
