/** What every server action answers a form with. */
export interface FormState {
  ok: boolean;
  message?: string;
  fieldErrors?: Record<string, string[]>;
}

export const initialFormState: FormState = { ok: false };

/** Field errors from a zod error, keyed by dotted path (the form's field names). */
export function fieldErrorsFrom(issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }>) {
  const fieldErrors: Record<string, string[]> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join(".") || "form";
    (fieldErrors[key] ??= []).push(issue.message);
  }
  return fieldErrors;
}

export function invalid(issues: Parameters<typeof fieldErrorsFrom>[0]): FormState {
  return { ok: false, message: "Some fields need attention.", fieldErrors: fieldErrorsFrom(issues) };
}
