"use server";
import { redirect } from "next/navigation";
import { z } from "zod";
import { getCurrentSession, startSession } from "@/lib/server/session";
import { acceptInvitationAsUser, acceptInvitationWithNewAccount } from "@/lib/server/team";
import { acceptInvitationSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";
import { switchOrganisation } from "@/lib/server/access";
import { limitByAddress } from "@/lib/server/auth-limits";
import { commonPasswordErrors } from "@/lib/server/password-policy";

export async function acceptAsNewMember(_previous: FormState, formData: FormData): Promise<FormState> {
  const parsed = acceptInvitationSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const common = commonPasswordErrors(parsed.data.password);
  if (common) return { ok: false, message: "Some fields need attention.", fieldErrors: common };
  const refusal = await limitByAddress("new-password");
  if (refusal) return { ok: false, message: refusal };
  const result = await acceptInvitationWithNewAccount(parsed.data.token, parsed.data.name, parsed.data.password);
  if (!result.ok) return { ok: false, message: result.message };
  await startSession(result.userId, result.organisationId);
  redirect("/overview?joined=1");
}

const tokenSchema = z.object({ token: z.string().min(10).max(200) });

export async function acceptAsSignedIn(_previous: FormState, formData: FormData): Promise<FormState> {
  const parsed = tokenSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return { ok: false, message: "This link is not complete. Open it again from the mail." };
  const { user } = await getCurrentSession();
  if (!user) return { ok: false, message: "Please sign in again: your session has ended." };
  const result = await acceptInvitationAsUser(parsed.data.token, user);
  if (!result.ok) return { ok: false, message: result.message };
  await switchOrganisation(result.organisationId);
  redirect("/overview?joined=1");
}
