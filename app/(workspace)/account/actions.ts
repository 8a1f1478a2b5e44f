"use server";
import { getAccess } from "@/lib/server/access";
import { changePassword } from "@/lib/server/accounts";
import { limitAuthAttempt } from "@/lib/server/auth-limits";
import { commonPasswordErrors } from "@/lib/server/password-policy";
import { changePasswordSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";

/** Anyone signed in: a new password, given the current one. Other devices are signed out. */
export async function changePasswordAction(_previous: FormState, formData: FormData): Promise<FormState> {
  const access = await getAccess();
  if (!access) return { ok: false, message: "Please sign in again: your session has ended." };
  const parsed = changePasswordSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const common = commonPasswordErrors(parsed.data.password);
  if (common) return { ok: false, message: "Some fields need attention.", fieldErrors: common };
  // Checking the current password costs a hash: limited like a sign-in, per account and per address.
  const refusal = await limitAuthAttempt("change-password", access.user.id);
  if (refusal) return { ok: false, message: refusal };
  if (!(await changePassword(access, parsed.data.currentPassword, parsed.data.password))) {
    const message = "That is not your current password.";
    return { ok: false, message: "Some fields need attention.", fieldErrors: { currentPassword: [message] } };
  }
  return { ok: true, message: "Your new password is set. Other devices are signed out; this one stays signed in." };
}
