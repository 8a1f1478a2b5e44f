import { revalidatePath } from "next/cache";
import { authorize } from "@/lib/server/access";
import { uploadVehicleDocument } from "@/lib/server/documents";
import { env } from "@/lib/env";
import { readMultipartBody, refuseForeignOrigin } from "@/lib/server/body";
import { badRequest, json, refusal } from "@/lib/server/http";
import { documentUploadSchema, profileIdSchema } from "@/lib/validation/fleet";
import { fieldErrorsFrom } from "@/lib/validation/form-state";

export const dynamic = "force-dynamic";

/** Uploads a label photo or PDF to a vehicle (multipart: vehicleId, kind, file). */
export async function POST(request: Request) {
  const foreign = refuseForeignOrigin(request);
  if (foreign) return foreign;
  const allowed = await authorize("fleet.edit");
  if (!allowed.ok) return refusal(allowed);
  const body = await readMultipartBody(request, {
    bytes: env.UPLOAD_MAX_BYTES + 64 * 1024,
    message: "The file is too large.",
    field: "file",
    fieldMessage: `Upload at most ${Math.round(env.UPLOAD_MAX_BYTES / 1024 / 1024)} MB.`,
  });
  if (!body.ok) return body.response;
  const data = body.value;
  const vehicleId = profileIdSchema.safeParse(data.get("vehicleId"));
  const kind = documentUploadSchema.safeParse({ kind: data.get("kind") });
  const fieldErrors: Record<string, string[]> = {};
  if (!vehicleId.success) fieldErrors.vehicleId = ["Not a valid vehicle."];
  if (!kind.success) Object.assign(fieldErrors, fieldErrorsFrom(kind.error.issues));
  const file = data.get("file");
  if (!(file instanceof File) || file.size === 0) fieldErrors.file = ["Choose a photo or a PDF."];
  if (!vehicleId.success || !kind.success || !(file instanceof File) || Object.keys(fieldErrors).length) return badRequest(fieldErrors);
  if (file.size > env.UPLOAD_MAX_BYTES) {
    return json({ ok: false, error: "too_large", message: "The file is too large.", fieldErrors: { file: [`Upload at most ${Math.round(env.UPLOAD_MAX_BYTES / 1024 / 1024)} MB.`] } }, 413);
  }
  const result = await uploadVehicleDocument(allowed.access, vehicleId.data, kind.data.kind, { name: file.name, bytes: new Uint8Array(await file.arrayBuffer()) });
  if (!result.ok) return json({ ok: false, error: result.status === 404 ? "not_found" : "invalid_input", message: result.message, fieldErrors: { [result.field]: [result.message] } }, result.status);
  revalidatePath(`/fleet/vehicles/${vehicleId.data}`);
  return json({ ok: true, document: result.document }, 201);
}
