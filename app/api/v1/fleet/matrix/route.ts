import { authorize } from "@/lib/server/access";
import { fleetMatrix } from "@/lib/server/fleet";
import { badRequest, json, refusal } from "@/lib/server/http";
import { matrixQuerySchema } from "@/lib/validation/fleet";
import { fieldErrorsFrom } from "@/lib/validation/form-state";

export const dynamic = "force-dynamic";

/**
 * Which vehicle may pull which trailer: ?vehicle=&hitched=&level=&page=&pageSize=&colPage=&colPageSize=
 * &vehicleSort=name|capacity-desc|capacity-asc&hitchedSort=name|weight-desc|weight-asc (left out: by name).
 * An unknown value is a 400 naming the field.
 */
export async function GET(request: Request) {
  const allowed = await authorize("fleet.read");
  if (!allowed.ok) return refusal(allowed);
  const query = matrixQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return badRequest(fieldErrorsFrom(query.error.issues));
  return json(await fleetMatrix(allowed.access, query.data));
}
