"use client";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, TextInput } from "@/components/ui";
import { acceptInvitationSchema } from "@/lib/validation/auth";
import { acceptAsNewMember } from "./actions";

export function NewMemberForm({ token, email }: { token: string; email: string }) {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(acceptInvitationSchema, acceptAsNewMember, {
    token,
    name: "",
    password: "",
  });
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage tone="error">{state.message}</FormMessage>
      <input type="hidden" {...form.register("token")} />
      <Field label="E-mail">
        <TextInput value={email} readOnly aria-readonly="true" />
      </Field>
      <Field label="Your name" error={errorOf("name")} required>
        <TextInput autoComplete="name" {...form.register("name")} />
      </Field>
      <Field label="Choose a password" help="At least 10 characters." error={errorOf("password")} required>
        <TextInput type="password" autoComplete="new-password" {...form.register("password")} />
      </Field>
      <Button type="submit" loading={pending} className="w-full">
        Join
      </Button>
    </form>
  );
}
