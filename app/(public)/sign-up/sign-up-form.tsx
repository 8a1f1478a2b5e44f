"use client";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, Select, TextInput } from "@/components/ui";
import { signUpSchema } from "@/lib/validation/auth";
import { signUp } from "./actions";

export function SignUpForm() {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(signUpSchema, signUp, {
    name: "",
    email: "",
    organisationName: "",
    organisationKind: "shop",
  });
  if (state.ok) {
    return <FormMessage tone="success">{state.message}</FormMessage>;
  }
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage tone="error">{state.message}</FormMessage>
      <Field label="Your name" error={errorOf("name")} required>
        <TextInput autoComplete="name" {...form.register("name")} />
      </Field>
      <Field label="E-mail" help="We send a link here to confirm it is yours. You choose your password on the page it opens." error={errorOf("email")} required>
        <TextInput type="email" autoComplete="email" {...form.register("email")} />
      </Field>
      <Field label="Shop or fleet name" error={errorOf("organisationName")} required>
        <TextInput autoComplete="organization" {...form.register("organisationName")} />
      </Field>
      <Field label="What kind of organisation?" error={errorOf("organisationKind")} required>
        <Select {...form.register("organisationKind")}>
          <option value="shop">A hitch shop: we fit hitches and check rigs for customers</option>
          <option value="fleet">A fleet: we run our own vehicles and trailers</option>
        </Select>
      </Field>
      <Button type="submit" loading={pending} className="w-full">
        Create my organisation
      </Button>
    </form>
  );
}
