"use server";
import { requestPasswordReset } from "@/lib/server/accounts";
import { limitAuthAttempt } from "@/lib/server/auth-limits";
import { forgotPasswordSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";

export async function askForReset(_previous: FormState, formData: FormData): Promise<FormState> {
  const parsed = forgotPasswordSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const refusal = await limitAuthAttempt("reset", parsed.data.email);
  if (refusal) return { ok: false, message: refusal };
  await requestPasswordReset(parsed.data.email);
  return { ok: true, message: "If an account uses that address, a link to choose a new password is on its way." };
}
