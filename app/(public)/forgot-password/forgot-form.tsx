"use client";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, TextInput } from "@/components/ui";
import { forgotPasswordSchema } from "@/lib/validation/auth";
import { askForReset } from "./actions";

export function ForgotPasswordForm() {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(forgotPasswordSchema, askForReset, { email: "" });
  if (state.ok) return <FormMessage tone="success">{state.message}</FormMessage>;
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage tone="error">{state.message}</FormMessage>
      <Field label="E-mail" error={errorOf("email")} required>
        <TextInput type="email" autoComplete="email" {...form.register("email")} />
      </Field>
      <Button type="submit" loading={pending} className="w-full">
        Send me a link
      </Button>
    </form>
  );
}
