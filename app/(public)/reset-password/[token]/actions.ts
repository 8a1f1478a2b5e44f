"use server";
import { redirect } from "next/navigation";
import { resetPassword } from "@/lib/server/accounts";
import { resetPasswordSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";

export async function chooseNewPassword(_previous: FormState, formData: FormData): Promise<FormState> {
  const parsed = resetPasswordSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const userId = await resetPassword(parsed.data.token, parsed.data.password);
  if (!userId) return { ok: false, message: "This link has been used or has expired. Ask for a new one." };
  redirect("/sign-in?reset=1");
}
