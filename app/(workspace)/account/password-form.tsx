"use client";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, TextInput } from "@/components/ui";
import { changePasswordSchema } from "@/lib/validation/auth";
import { changePasswordAction } from "./actions";

export function ChangePasswordForm() {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(changePasswordSchema, changePasswordAction, {
    currentPassword: "",
    password: "",
    confirmPassword: "",
  });
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex max-w-md flex-col gap-4">
      <FormMessage tone={state.ok ? "success" : "error"}>{state.message}</FormMessage>
      <Field label="Current password" error={errorOf("currentPassword")} required>
        <TextInput type="password" autoComplete="current-password" {...form.register("currentPassword")} />
      </Field>
      <Field label="New password" help="At least 10 characters, and not one of the common ones." error={errorOf("password")} required>
        <TextInput type="password" autoComplete="new-password" {...form.register("password")} />
      </Field>
      <Field label="The new one again" error={errorOf("confirmPassword")} required>
        <TextInput type="password" autoComplete="new-password" {...form.register("confirmPassword")} />
      </Field>
      <div>
        <Button type="submit" loading={pending}>
          Change the password
        </Button>
      </div>
    </form>
  );
}
