import { revalidatePath } from "next/cache";
import { env } from "@/lib/env";
import { authorize } from "@/lib/server/access";
import { readMultipartBody, refuseForeignOrigin } from "@/lib/server/body";
import { badRequest, json, refusal } from "@/lib/server/http";
import { uploadInstallationPhoto } from "@/lib/server/installations";
import { fieldErrorsFrom } from "@/lib/validation/form-state";
import { photoUploadSchema } from "@/lib/validation/installations";

export const dynamic = "force-dynamic";

const tooLarge = () =>
  json({ ok: false, error: "too_large", message: "The file is too large.", fieldErrors: { file: [`Upload at most ${Math.round(env.UPLOAD_MAX_BYTES / 1024 / 1024)} MB.`] } }, 413);

/** A photo of the hitch label or the fitted hitch for a record (multipart: recordId, kind, file). */
export async function POST(request: Request) {
  const foreign = refuseForeignOrigin(request);
  if (foreign) return foreign;
  const allowed = await authorize("installations.edit");
  if (!allowed.ok) return refusal(allowed);
  const body = await readMultipartBody(request, {
    bytes: env.UPLOAD_MAX_BYTES + 64 * 1024,
    message: "The file is too large.",
    field: "file",
    fieldMessage: `Upload at most ${Math.round(env.UPLOAD_MAX_BYTES / 1024 / 1024)} MB.`,
  });
  if (!body.ok) return body.response;
  const data = body.value;
  const fields = photoUploadSchema.safeParse({ recordId: data.get("recordId") ?? undefined, kind: data.get("kind") ?? undefined });
  const fieldErrors: Record<string, string[]> = fields.success ? {} : fieldErrorsFrom(fields.error.issues);
  const file = data.get("file");
  if (!(file instanceof File) || file.size === 0) fieldErrors.file = ["Choose a photo or a PDF."];
  if (!fields.success || !(file instanceof File) || Object.keys(fieldErrors).length) return badRequest(fieldErrors);
  if (file.size > env.UPLOAD_MAX_BYTES) return tooLarge();
  const result = await uploadInstallationPhoto(allowed.access, fields.data.recordId, fields.data.kind, { name: file.name, bytes: new Uint8Array(await file.arrayBuffer()) });
  if (!result.ok) return json({ ok: false, error: result.status === 404 ? "not_found" : "invalid_input", message: result.message, fieldErrors: { [result.field]: [result.message] } }, result.status);
  revalidatePath(`/installations/${fields.data.recordId}`);
  return json({ ok: true, photo: result.photo }, 201);
}
