"use client";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, TextInput } from "@/components/ui";
import { confirmSignupSchema } from "@/lib/validation/auth";
import { finishSignup } from "../../actions";

/** The last step of signing up: the password is chosen here, by whoever opened the link in the mail. */
export function ConfirmSignupForm({ token }: { token: string }) {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(confirmSignupSchema, finishSignup, {
    token,
    password: "",
    confirmPassword: "",
  });
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage tone="error">{state.message}</FormMessage>
      <input type="hidden" {...form.register("token")} />
      <Field label="Choose a password" help="At least 10 characters, and not one of the common ones." error={errorOf("password")} required>
        <TextInput type="password" autoComplete="new-password" {...form.register("password")} />
      </Field>
      <Field label="The same again" error={errorOf("confirmPassword")} required>
        <TextInput type="password" autoComplete="new-password" {...form.register("confirmPassword")} />
      </Field>
      <Button type="submit" loading={pending} className="w-full">
        Finish signing up
      </Button>
    </form>
  );
}
