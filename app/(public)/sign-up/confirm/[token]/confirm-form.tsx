"use client";
import { useActionState } from "react";
import { Button, FormMessage } from "@/components/ui";
import { initialFormState } from "@/lib/validation/form-state";
import { finishSignup } from "../../actions";

export function ConfirmSignupForm({ token }: { token: string }) {
  const [state, formAction, pending] = useActionState(finishSignup, initialFormState);
  return (
    <form action={formAction} className="flex flex-col gap-4">
      <FormMessage tone="error">{state.message}</FormMessage>
      <input type="hidden" name="token" value={token} />
      <Button type="submit" loading={pending} className="w-full">
        Finish signing up
      </Button>
    </form>
  );
}
