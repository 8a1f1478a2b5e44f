"use server";
import { redirect } from "next/navigation";
import { verifyCredentials } from "@/lib/server/accounts";
import { limitAuthAttempt } from "@/lib/server/auth-limits";
import { startSession } from "@/lib/server/session";
import { safeReturnPath, signInSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";

export async function signIn(_previous: FormState, formData: FormData): Promise<FormState> {
  const parsed = signInSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const { email, password, next } = parsed.data;

  const refusal = await limitAuthAttempt("sign-in", email);
  if (refusal) return { ok: false, message: refusal };

  const user = await verifyCredentials(email, password);
  // One message for an unknown address and a wrong password: it must not tell which.
  if (!user) return { ok: false, message: "That e-mail and password do not match an account." };

  await startSession(user.id, null);
  redirect(safeReturnPath(next));
}
