"use server";
import { revalidatePath } from "next/cache";
import { KIND_WORDS } from "@/lib/fleet/fields";
import { authorize } from "@/lib/server/access";
import { deleteVehicleDocument } from "@/lib/server/documents";
import { saveFleetProfile, setProfileArchived } from "@/lib/server/fleet";
import { archiveProfileSchema, profileFormSchema, profileIdSchema, saveProfileSchema } from "@/lib/validation/fleet";
import { invalid, type FormState } from "@/lib/validation/form-state";

export type SaveProfileState = FormState & { id?: string };

/** Creates or edits a vehicle, trailer or accessory: { kind, id?, values } with the form's typed values. */
export async function saveProfileAction(input: unknown): Promise<SaveProfileState> {
  const allowed = await authorize("fleet.edit");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const envelope = saveProfileSchema.safeParse(input);
  if (!envelope.success) return invalid(envelope.error.issues);
  const { kind, id } = envelope.data;
  const parsed = profileFormSchema(kind).safeParse(envelope.data.values);
  if (!parsed.success) return invalid(parsed.error.issues);
  const result = await saveFleetProfile(allowed.access, kind, id, parsed.data);
  if (!result.ok) return { ok: false, message: result.message, fieldErrors: result.field ? { [result.field]: [result.message] } : undefined };
  revalidatePath("/fleet", "layout");
  return { ok: true, id: result.id, message: id ? `Saved the changes to “${parsed.data.name}”.` : `Added the ${KIND_WORDS[kind].one} “${parsed.data.name}”.` };
}

/** Archives or restores a profile: { kind, id, archived }. */
export async function archiveProfileAction(input: unknown): Promise<FormState> {
  const allowed = await authorize("fleet.edit");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = archiveProfileSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error.issues);
  const found = await setProfileArchived(allowed.access, parsed.data.kind, parsed.data.id, parsed.data.archived);
  if (!found) return { ok: false, message: `No such ${KIND_WORDS[parsed.data.kind].one} in this organisation.` };
  revalidatePath("/fleet", "layout");
  return { ok: true, message: parsed.data.archived ? "Archived: it leaves the pickers and the pairings." : "Restored." };
}

/** Removes a document from a vehicle: { id }. */
export async function deleteDocumentAction(input: unknown): Promise<FormState> {
  const allowed = await authorize("fleet.edit");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const id = profileIdSchema.safeParse((input as { id?: unknown } | null)?.id);
  if (!id.success) return invalid(id.error.issues.map((issue) => ({ ...issue, path: ["id"] })));
  const vehicleId = await deleteVehicleDocument(allowed.access, id.data);
  if (!vehicleId) return { ok: false, message: "No such document in this organisation." };
  revalidatePath(`/fleet/vehicles/${vehicleId}`);
  return { ok: true, message: "Document removed." };
}
