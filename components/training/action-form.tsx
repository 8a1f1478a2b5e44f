"use client";
import type React from "react";
/**
 * A small form bound to one training action: hidden fields, an optional control, a button, and the answer in a
 * live region. Still posts without JavaScript. `goTo` follows the made record (a copied or new example); it is a
 * string, not a function, because Server Components hand it over.
 */
import { useRouter } from "next/navigation";
import { useActionState, useEffect, type ReactNode } from "react";
import { Button, FormMessage, type ButtonVariant } from "@/components/ui";
import type { FormState } from "@/lib/validation/form-state";

export type TrainingFormState = FormState & { id?: string; url?: string };
type Action = (state: TrainingFormState, formData: FormData) => Promise<TrainingFormState>;

export function ActionForm({
  action,
  hidden,
  label,
  variant = "secondary",
  children,
  goTo,
  className,
  showUrl = false,
  ariaLabel,
}: {
  action: Action;
  hidden: Record<string, string>;
  label: ReactNode;
  variant?: ButtonVariant;
  children?: ReactNode;
  /** Where to go once the action made or removed something; ":id" stands for the new record. */
  goTo?: string;
  className?: string;
  showUrl?: boolean;
  ariaLabel?: string;
}) {
  const [state, formAction, pending] = useActionState(action, { ok: false } as TrainingFormState);
  const router = useRouter();
  useEffect(() => {
    if (state.ok && goTo && (state.id || !goTo.includes(":id"))) router.push(goTo.replace(":id", state.id ?? ""));
  }, [state, goTo, router]);
  const fieldError = state.fieldErrors ? Object.values(state.fieldErrors)[0]?.[0] : undefined;
  return (
    <form action={formAction} className={className} aria-label={ariaLabel}>
      {Object.entries(hidden).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      <div className="flex flex-wrap items-end gap-2">
        {children}
        <Button type="submit" variant={variant} size="sm" loading={pending} aria-label={buttonName(label, ariaLabel)}>
          {label}
        </Button>
      </div>
      {state.message || fieldError ? (
        <FormMessage tone={state.ok ? "success" : "error"} className="mt-2">
          {fieldError && !state.ok ? `${state.message ?? ""} ${fieldError}`.trim() : state.message}
        </FormMessage>
      ) : (
        <FormMessage />
      )}
      {showUrl && state.url ? (
        <p className="mt-2 text-sm text-ink">
          Public link:{" "}
          <a href={state.url} className="break-all text-accent underline" data-testid="public-link">
            {state.url}
          </a>
        </p>
      ) : null}
    </form>
  );
}

/**
 * A button's spoken name must contain the words on it (WCAG 2.5.3, label in name), so speech users can say
 * what they see: the extra context follows the visible label.
 */
function buttonName(label: React.ReactNode, context: string | undefined): string | undefined {
  if (!context) return undefined;
  if (typeof label !== "string" || context.toLowerCase().startsWith(label.toLowerCase())) return context;
  return `${label}: ${context.charAt(0).toLowerCase()}${context.slice(1)}`;
}
