import { revalidatePath } from "next/cache";
import { checkCsvBytes, CSV_MAX_BYTES, decodeCsv } from "@/lib/fleet/csv";
import { authorize } from "@/lib/server/access";
import { importFleetProfiles } from "@/lib/server/fleet";
import { readMultipartBody, refuseForeignOrigin } from "@/lib/server/body";
import { badRequest, json, refusal } from "@/lib/server/http";
import { importOptionsSchema } from "@/lib/validation/fleet";
import { fieldErrorsFrom } from "@/lib/validation/form-state";

export const dynamic = "force-dynamic";

/**
 * A fleet CSV (multipart: file, kind, units, mode). mode=preview reads it and answers each row's errors;
 * valid-rows or all-or-nothing also write, in one transaction. Previewing needs fleet.read, writing fleet.edit.
 */
export async function POST(request: Request) {
  const foreign = refuseForeignOrigin(request);
  if (foreign) return foreign;
  const reader = await authorize("fleet.read");
  if (!reader.ok) return refusal(reader);
  // The file plus room for the form's other fields and boundaries.
  const body = await readMultipartBody(request, {
    bytes: CSV_MAX_BYTES + 64 * 1024,
    message: `A fleet file may be at most ${CSV_MAX_BYTES / 1024 / 1024} MB.`,
    field: "file",
    fieldMessage: "The file is too large.",
  });
  if (!body.ok) return body.response;
  const data = body.value;
  const options = importOptionsSchema.safeParse({ kind: data.get("kind"), units: data.get("units"), mode: data.get("mode") });
  if (!options.success) return badRequest(fieldErrorsFrom(options.error.issues));
  if (options.data.mode !== "preview") {
    const editor = await authorize("fleet.edit");
    if (!editor.ok) return refusal(editor);
  }
  const file = data.get("file");
  if (!(file instanceof File)) return badRequest({ file: ["Choose a CSV file."] });
  if (file.size > CSV_MAX_BYTES) {
    return json({ ok: false, error: "too_large", message: checkCsvBytes(new Uint8Array(file.size)) ?? "Too large.", fieldErrors: { file: ["The file is too large."] } }, 413);
  }
  const bytes = new Uint8Array(await file.arrayBuffer());
  const problem = checkCsvBytes(bytes);
  if (problem) return badRequest({ file: [problem] }, problem);
  const started = performance.now();
  const outcome = await importFleetProfiles(reader.access, decodeCsv(bytes), options.data);
  if (outcome.imported > 0) {
    revalidatePath("/fleet", "layout");
  }
  return json({ ok: outcome.outcome !== "refused", ...outcome, elapsedMs: Math.round(performance.now() - started) });
}
