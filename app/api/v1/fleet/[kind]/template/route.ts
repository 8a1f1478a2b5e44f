import { templateCsv } from "@/lib/fleet/csv";
import { authorize } from "@/lib/server/access";
import { csvResponse, kindParam } from "@/lib/server/fleet-http";
import { refusal } from "@/lib/server/http";

export const dynamic = "force-dynamic";

/** An empty sheet with the columns and one invented example row. */
export async function GET(_request: Request, { params }: { params: Promise<{ kind: string }> }) {
  const allowed = await authorize("fleet.read");
  if (!allowed.ok) return refusal(allowed);
  const kind = await kindParam(params);
  if (kind instanceof Response) return kind;
  return csvResponse(templateCsv(kind), `towmargin-${kind}-template.csv`);
}
