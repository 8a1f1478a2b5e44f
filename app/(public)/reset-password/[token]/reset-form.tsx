"use client";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, TextInput } from "@/components/ui";
import { resetPasswordSchema } from "@/lib/validation/auth";
import { chooseNewPassword } from "./actions";

export function ResetPasswordForm({ token }: { token: string }) {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(resetPasswordSchema, chooseNewPassword, {
    token,
    password: "",
    confirmPassword: "",
  });
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage tone="error">{state.message}</FormMessage>
      <input type="hidden" {...form.register("token")} />
      <Field label="New password" help="At least 10 characters." error={errorOf("password")} required>
        <TextInput type="password" autoComplete="new-password" {...form.register("password")} />
      </Field>
      <Field label="The same again" error={errorOf("confirmPassword")} required>
        <TextInput type="password" autoComplete="new-password" {...form.register("confirmPassword")} />
      </Field>
      <Button type="submit" loading={pending} className="w-full">
        Set the new password
      </Button>
    </form>
  );
}
