"use client";
import Link from "next/link";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, TextInput } from "@/components/ui";
import { signInSchema } from "@/lib/validation/auth";
import { signIn } from "./actions";

export function SignInForm({ next, notice }: { next?: string; notice?: string }) {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(signInSchema, signIn, { email: "", password: "", next });
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage tone={state.message ? "error" : "success"}>{state.message ?? notice}</FormMessage>
      {next ? <input type="hidden" {...form.register("next")} /> : null}
      <Field label="E-mail" error={errorOf("email")} required>
        <TextInput type="email" autoComplete="email" {...form.register("email")} />
      </Field>
      <Field label="Password" error={errorOf("password")} required>
        <TextInput type="password" autoComplete="current-password" {...form.register("password")} />
      </Field>
      <Button type="submit" loading={pending} className="w-full">
        Sign in
      </Button>
      <p className="text-sm">
        <Link href="/forgot-password" className="text-accent underline">
          Forgot your password?
        </Link>
      </p>
    </form>
  );
}
