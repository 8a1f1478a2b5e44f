"use client";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, NumberInput, Select, TextInput } from "@/components/ui";
import { organisationSettingsSchema } from "@/lib/validation/auth";
import { saveSettings } from "./actions";

export function SettingsForm({ defaults }: { defaults: { name: string; units: "imperial" | "metric"; tightMarginPercent: number; linkLifetimeDays: number } }) {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(organisationSettingsSchema, saveSettings, defaults);
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex max-w-xl flex-col gap-5">
      <FormMessage tone={state.ok ? "success" : "error"}>{state.message}</FormMessage>
      <Field label="Name" help="Shown to customers at the top of their result page." error={errorOf("name")} required>
        <TextInput autoComplete="organization" {...form.register("name")} />
      </Field>
      <Field label="Units" help="What forms start in. Staff can still switch a single check." error={errorOf("units")} required>
        <Select {...form.register("units")}>
          <option value="imperial">Imperial: pounds and inches</option>
          <option value="metric">Metric: kilograms and millimetres</option>
        </Select>
      </Field>
      <Field
        label="Call a check tight when less than this is left"
        help="A share of the limit. 10 % is the usual choice: a 5,000 lb rating with under 500 lb to spare reads as tight."
        error={errorOf("tightMarginPercent")}
        required
      >
        <NumberInput unit="%" {...form.register("tightMarginPercent")} />
      </Field>
      <Field
        label="Customer links work for"
        help="Unless whoever makes a link chooses otherwise. Every link ends; it can be withdrawn sooner at any time."
        error={errorOf("linkLifetimeDays")}
        required
      >
        <NumberInput unit="days" {...form.register("linkLifetimeDays")} />
      </Field>
      <div>
        <Button type="submit" loading={pending}>
          Save settings
        </Button>
      </div>
    </form>
  );
}
