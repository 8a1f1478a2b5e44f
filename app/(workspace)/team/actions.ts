"use server";
import { revalidatePath } from "next/cache";
import { authorize } from "@/lib/server/access";
import { changeRole, inviteMember, removeMember, revokeInvitation, type TeamResult } from "@/lib/server/team";
import { changeRoleSchema, inviteSchema, removeMemberSchema, revokeInvitationSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";

function answer(result: TeamResult, success: string): FormState {
  if (result.ok) {
    revalidatePath("/team");
    return { ok: true, message: success };
  }
  return { ok: false, message: result.message, fieldErrors: result.field ? { [result.field]: [result.message] } : undefined };
}

export async function invite(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("team.manage");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = inviteSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  return answer(await inviteMember(allowed.access, parsed.data), `Invitation sent to ${parsed.data.email}.`);
}

export async function setRole(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("team.manage");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = changeRoleSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  return answer(await changeRole(allowed.access, parsed.data.membershipId, parsed.data.role), "Role changed.");
}

export async function remove(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("team.manage");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = removeMemberSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  return answer(await removeMember(allowed.access, parsed.data.membershipId), "Member removed.");
}

export async function revoke(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("team.manage");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = revokeInvitationSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  return answer(await revokeInvitation(allowed.access, parsed.data.invitationId), "Invitation withdrawn.");
}
