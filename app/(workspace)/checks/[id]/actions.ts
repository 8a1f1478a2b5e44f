"use server";
import { revalidatePath } from "next/cache";
import QRCode from "qrcode";
import { authorize } from "@/lib/server/access";
import { createShareLink, emailShareLink, revokeShareLink } from "@/lib/server/share-links";
import { createLinkSchema, emailLinkSchema, revokeLinkSchema } from "@/lib/validation/checks";
import { invalid, type FormState } from "@/lib/validation/form-state";

export type CreateLinkState = FormState & { url?: string; token?: string; qrSvg?: string; expiresAt?: string | null };

export async function createLinkAction(_previous: CreateLinkState, formData: FormData): Promise<CreateLinkState> {
  const allowed = await authorize("checks.save");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = createLinkSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const link = await createShareLink(allowed.access, parsed.data.checkId, parsed.data.expiresInDays);
  if (!link) return { ok: false, message: "That check is not in this organisation." };
  const qrSvg = await QRCode.toString(link.url, { type: "svg", margin: 1, errorCorrectionLevel: "M" });
  revalidatePath(`/checks/${parsed.data.checkId}`);
  return { ok: true, message: "Link ready.", url: link.url, token: link.token, qrSvg, expiresAt: link.expiresAt?.toISOString() ?? null };
}

export async function revokeLinkAction(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("checks.save");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = revokeLinkSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const revoked = await revokeShareLink(allowed.access, parsed.data.linkId);
  if (!revoked) return { ok: false, message: "That link is already withdrawn." };
  revalidatePath("/checks");
  return { ok: true, message: "Link withdrawn: it opens nothing now." };
}

export async function emailLinkAction(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("checks.save");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = emailLinkSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const sent = await emailShareLink(allowed.access, parsed.data.checkId, parsed.data.token, parsed.data.email);
  if (!sent.ok) return { ok: false, message: sent.message };
  return { ok: true, message: `Sent to ${parsed.data.email}.` };
}
