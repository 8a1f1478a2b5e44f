"use server";
import { revalidatePath } from "next/cache";
import QRCode from "qrcode";
import { authorize } from "@/lib/server/access";
import { addChecklistItem, handOverInstallation, removeChecklistItem, saveInstallation } from "@/lib/server/installations";
import { revokeInstallationLink } from "@/lib/server/share-links";
import { invalid, type FormState } from "@/lib/validation/form-state";
import { checklistItemIdSchema, checklistItemSchema, handOverSchema, installationRecordSchema, revokeInstallationLinkSchema } from "@/lib/validation/installations";

export type SaveInstallationState = FormState & { id?: string; appliedToProfile?: boolean };

/** Creates or edits an installation record: the form's values as one object (figures as typed). */
export async function saveInstallationAction(input: unknown): Promise<SaveInstallationState> {
  const allowed = await authorize("installations.edit");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = installationRecordSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error.issues);
  const result = await saveInstallation(allowed.access, parsed.data);
  if (!result.ok) return { ok: false, message: result.message, fieldErrors: result.field ? { [result.field]: [result.message] } : undefined };
  revalidatePath("/installations", "layout");
  if (result.appliedToProfile) revalidatePath("/fleet", "layout");
  return {
    ok: true,
    id: result.id,
    appliedToProfile: result.appliedToProfile,
    message: result.appliedToProfile ? "Saved. The vehicle's profile now carries the fitted hitch and the measured figures." : "Saved.",
  };
}

export type HandOverState = FormState & { url?: string; qrSvg?: string; expiresAt?: string | null };

/** Hands the record over: a customer link (shown once) and, with an address, the mail. */
export async function handOverAction(_previous: HandOverState, formData: FormData): Promise<HandOverState> {
  const allowed = await authorize("installations.edit");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = handOverSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const result = await handOverInstallation(allowed.access, parsed.data.recordId, { email: parsed.data.email, expiresInDays: parsed.data.expiresInDays });
  if (!result.ok) return { ok: false, message: result.message };
  const qrSvg = await QRCode.toString(result.url, { type: "svg", margin: 1, errorCorrectionLevel: "M" });
  revalidatePath(`/installations/${parsed.data.recordId}`);
  const mailed = result.mailed === null ? "" : result.mailed ? ` Mailed to ${parsed.data.email}.` : " The mail could not be sent just now: copy the link instead.";
  return { ok: true, message: `Handed over: the customer's link is ready.${mailed}`, url: result.url, qrSvg, expiresAt: result.expiresAt?.toISOString() ?? null };
}

export async function revokeInstallationLinkAction(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("installations.edit");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = revokeInstallationLinkSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const recordId = await revokeInstallationLink(allowed.access, parsed.data.linkId);
  if (!recordId) return { ok: false, message: "That link is already withdrawn." };
  revalidatePath(`/installations/${recordId}`);
  return { ok: true, message: "Link withdrawn: it opens nothing now." };
}

export async function addChecklistItemAction(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("installations.checklist");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = checklistItemSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  await addChecklistItem(allowed.access, parsed.data);
  revalidatePath("/installations", "layout");
  return { ok: true, message: `Added “${parsed.data.label}” to the checklist.` };
}

export async function removeChecklistItemAction(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("installations.checklist");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = checklistItemIdSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const removed = await removeChecklistItem(allowed.access, parsed.data.itemId);
  if (!removed) return { ok: false, message: "That item is not on the checklist." };
  revalidatePath("/installations", "layout");
  return { ok: true, message: "Removed from the checklist; records already ticked keep it." };
}
