"use client";
import { useActionState, useEffect, useRef } from "react";
import { addChecklistItemAction, removeChecklistItemAction } from "@/app/(workspace)/installations/actions";
import { Button, Field, FormMessage, TextInput, useToast } from "@/components/ui";
import { initialFormState, type FormState } from "@/lib/validation/form-state";

export function ChecklistEditor({ items, canEdit }: { items: Array<{ id: string; label: string; valueLabel: string | null }>; canEdit: boolean }) {
  const [added, addAction, adding] = useActionState<FormState, FormData>(addChecklistItemAction, initialFormState);
  const [removed, removeAction, removing] = useActionState<FormState, FormData>(removeChecklistItemAction, initialFormState);
  const { toast } = useToast();
  const formRef = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (added.ok) formRef.current?.reset();
    if (added.ok && added.message) toast({ title: added.message, tone: "success" });
  }, [added, toast]);
  useEffect(() => {
    if (removed.message) toast({ title: removed.message, tone: removed.ok ? "success" : "error" });
  }, [removed, toast]);
  return (
    <div className="flex flex-col gap-5">
      {items.length === 0 ? <p className="text-sm text-ink-soft">No items yet.</p> : null}
      <ol className="flex flex-col divide-y divide-rule">
        {items.map((item, i) => (
          <li key={item.id} className="flex items-start justify-between gap-3 py-2">
            <span className="text-sm">
              <span className="num mr-2 text-ink-faint">{i + 1}.</span>
              {item.label}
              {item.valueLabel ? <span className="block pl-6 text-xs text-ink-soft">The installer types: {item.valueLabel}</span> : null}
            </span>
            {canEdit ? (
              <form action={removeAction}>
                <input type="hidden" name="itemId" value={item.id} />
                <Button type="submit" size="sm" variant="quiet" loading={removing} aria-label={`Remove “${item.label}”`}>
                  Remove
                </Button>
              </form>
            ) : null}
          </li>
        ))}
      </ol>
      {canEdit ? (
        <form ref={formRef} action={addAction} className="grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-end" noValidate>
          <Field label="New item" error={added.fieldErrors?.label?.[0]} required>
            <TextInput name="label" placeholder="Exhaust hangers back in place" />
          </Field>
          <Field label="Value to type (optional)" help="For example the torque read from the instruction sheet." error={added.fieldErrors?.valueLabel?.[0]}>
            <TextInput name="valueLabel" />
          </Field>
          <Button type="submit" loading={adding}>
            Add to the checklist
          </Button>
        </form>
      ) : null}
      {added.ok === false && added.message && !added.fieldErrors ? <FormMessage tone="error">{added.message}</FormMessage> : null}
    </div>
  );
}
