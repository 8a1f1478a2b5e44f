"use server";
import { redirect } from "next/navigation";
import { resetPassword } from "@/lib/server/accounts";
import { limitByAddress } from "@/lib/server/auth-limits";
import { commonPasswordErrors } from "@/lib/server/password-policy";
import { resetPasswordSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";

export async function chooseNewPassword(_previous: FormState, formData: FormData): Promise<FormState> {
  const parsed = resetPasswordSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const common = commonPasswordErrors(parsed.data.password);
  if (common) return { ok: false, message: "Some fields need attention.", fieldErrors: common };
  // A token names no account: the client's address is what is counted.
  const refusal = await limitByAddress("new-password");
  if (refusal) return { ok: false, message: refusal };
  const userId = await resetPassword(parsed.data.token, parsed.data.password);
  if (!userId) return { ok: false, message: "This link has been used or has expired. Ask for a new one." };
  redirect("/sign-in?reset=1");
}
