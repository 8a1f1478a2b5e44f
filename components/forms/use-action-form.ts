"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { startTransition, useActionState, useEffect, type FormEvent } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path } from "react-hook-form";
import type { z } from "zod";
import { initialFormState, type FormState } from "@/lib/validation/form-state";

type ServerAction = (state: FormState, formData: FormData) => Promise<FormState>;

/**
 * One form, two checks: the shared zod schema runs in the browser (instant field messages) and again in the
 * server action (the one that counts). The form still posts natively when JavaScript is off.
 */
export function useActionForm<TSchema extends z.ZodType<FieldValues, FieldValues>>(
  schema: TSchema,
  action: ServerAction,
  defaultValues?: DefaultValues<z.input<TSchema>>,
) {
  const [state, formAction, pending] = useActionState(action, initialFormState);
  const form = useForm<z.input<TSchema>, unknown, z.output<TSchema>>({
    resolver: zodResolver(schema as never) as never,
    defaultValues,
    // Messages appear on the first submit, then follow each keystroke. Validating on blur would insert a
    // message under the field just left and move the button out from under a pointer mid-click.
    mode: "onSubmit",
    reValidateMode: "onChange",
  });

  // The server's field messages land beside the same fields as the browser's.
  useEffect(() => {
    for (const [name, messages] of Object.entries(state.fieldErrors ?? {})) {
      if (messages[0]) form.setError(name as Path<z.input<TSchema>>, { type: "server", message: messages[0] });
    }
  }, [state, form]);

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    const element = event.currentTarget;
    void form.handleSubmit(() => {
      startTransition(() => formAction(new FormData(element)));
    })(event);
  };

  const errorOf = (name: Path<z.input<TSchema>>): string | undefined => {
    const error = form.formState.errors[name as keyof typeof form.formState.errors] as { message?: unknown } | undefined;
    return typeof error?.message === "string" ? error.message : undefined;
  };

  return { form, state, pending, formAction, onSubmit, errorOf };
}
