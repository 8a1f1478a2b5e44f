"use server";
import { redirect } from "next/navigation";
import { confirmSignup, requestSignup } from "@/lib/server/accounts";
import { limitAuthAttempt, limitByAddress } from "@/lib/server/auth-limits";
import { commonPasswordErrors } from "@/lib/server/password-policy";
import { startSession } from "@/lib/server/session";
import { confirmSignupSchema, signUpSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";

export async function signUp(_previous: FormState, formData: FormData): Promise<FormState> {
  const parsed = signUpSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);

  const refusal = await limitAuthAttempt("sign-up", parsed.data.email);
  if (refusal) return { ok: false, message: refusal };

  const sent = await requestSignup(parsed.data);
  if (!sent) return { ok: false, message: "We could not send mail just now. Try again in a moment." };
  // The same answer whether or not the address already has an account.
  return { ok: true, message: `Check your inbox at ${parsed.data.email}: we sent a link to finish signing up.` };
}

/** The confirmation page's form: the link's token and the password chosen there. */
export async function finishSignup(_previous: FormState, formData: FormData): Promise<FormState> {
  const parsed = confirmSignupSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const common = commonPasswordErrors(parsed.data.password);
  if (common) return { ok: false, message: "Some fields need attention.", fieldErrors: common };
  const refusal = await limitByAddress("new-password");
  if (refusal) return { ok: false, message: refusal };
  const created = await confirmSignup(parsed.data.token, parsed.data.password);
  if (!created) return { ok: false, message: "This link has been used or has expired. Sign in, or sign up again." };
  await startSession(created.userId, created.organisationId);
  redirect("/overview?welcome=1");
}
