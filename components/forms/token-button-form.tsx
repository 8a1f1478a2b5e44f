"use client";
import { useActionState } from "react";
import { Button, FormMessage } from "@/components/ui";
import { initialFormState, type FormState } from "@/lib/validation/form-state";

/** A one-button form that spends a link's token (finish sign-up, accept an invitation) and shows the refusal. */
export function TokenButtonForm({ token, label, action }: { token: string; label: string; action: (state: FormState, data: FormData) => Promise<FormState> }) {
  const [state, formAction, pending] = useActionState(action, initialFormState);
  return (
    <form action={formAction} className="flex flex-col gap-4">
      <FormMessage tone="error">{state.message}</FormMessage>
      <input type="hidden" name="token" value={token} />
      <Button type="submit" loading={pending} className="w-full">
        {label}
      </Button>
    </form>
  );
}
