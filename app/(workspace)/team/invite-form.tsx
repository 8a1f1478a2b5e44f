"use client";
import { useEffect } from "react";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, Select, TextInput, useToast } from "@/components/ui";
import { ROLE_LABELS, ROLES } from "@/lib/roles";
import { inviteSchema } from "@/lib/validation/auth";
import { invite } from "./actions";

export function InviteForm() {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(inviteSchema, invite, { email: "", role: "staff" });
  const { toast } = useToast();
  useEffect(() => {
    if (state.ok && state.message) {
      toast({ title: state.message, tone: "success" });
      form.reset({ email: "", role: form.getValues("role") });
    }
  }, [state, toast, form]);
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormMessage tone="error">{state.ok ? undefined : state.message}</FormMessage>
      <div className="grid gap-4 sm:grid-cols-[1fr_14rem_auto] sm:items-start">
        <Field label="E-mail" error={errorOf("email")} required>
          <TextInput type="email" autoComplete="off" {...form.register("email")} />
        </Field>
        <Field label="Role" error={errorOf("role")} required>
          <Select {...form.register("role")}>
            {ROLES.map((role) => (
              <option key={role} value={role}>
                {ROLE_LABELS[role]}
              </option>
            ))}
          </Select>
        </Field>
        <Button type="submit" loading={pending} className="sm:mt-[1.625rem]">
          Send invitation
        </Button>
      </div>
    </form>
  );
}
