"use client";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, NumberInput, Select, TextInput } from "@/components/ui";
import { COUNTRIES, ruleSetFor } from "@/lib/towing/rules/places";
import { organisationSettingsSchema } from "@/lib/validation/auth";
import { saveSettings } from "./actions";

export interface SettingsDefaults {
  name: string;
  units: "imperial" | "metric";
  tightMarginPercent: number;
  frontAxleLossPercent: number;
  linkLifetimeDays: number;
  country: string;
  region: string;
}

export function SettingsForm({ defaults }: { defaults: SettingsDefaults }) {
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(organisationSettingsSchema, saveSettings, defaults);
  const countryCode = form.watch("country") ?? "";
  const regionCode = form.watch("region") ?? "";
  const country = COUNTRIES.find((c) => c.code === countryCode);
  const set = country ? ruleSetFor(regionCode ? { country: country.code, region: regionCode } : { country: country.code }) : undefined;
  const countryField = form.register("country", {
    onChange: (event: { target: { value: string } }) => {
      // A new country starts with no region and the units the place uses by default (metric outside the US).
      form.setValue("region", "");
      const next = ruleSetFor({ country: event.target.value });
      if (next) form.setValue("units", next.defaultUnits);
    },
  });
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex max-w-xl flex-col gap-5">
      <FormMessage tone={state.ok ? "success" : "error"}>{state.message}</FormMessage>
      <Field label="Name" help="Shown to customers at the top of their result page." error={errorOf("name")} required>
        <TextInput autoComplete="organization" {...form.register("name")} />
      </Field>
      <Field
        label="Where you work"
        help="Checks are read against this place's rules (brakes, licence, coupling) and use its words. Staff can choose another place for one check."
        error={errorOf("country")}
      >
        <Select {...countryField}>
          <option value="">Not set: no local rules</option>
          {COUNTRIES.map((c) => (
            <option key={c.code} value={c.code}>
              {c.name}
            </option>
          ))}
        </Select>
      </Field>
      {country && country.regions.length > 0 ? (
        <Field label={country.regionWord ?? "Region"} help="Where the rules differ within the country." error={errorOf("region")}>
          <Select {...form.register("region")}>
            <option value="">Not given</option>
            {country.regions.map((r) => (
              <option key={r.code} value={r.code}>
                {r.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : (
        <input type="hidden" {...form.register("region")} />
      )}
      {set ? (
        <p className="text-sm text-ink-soft" data-testid="settings-rule-set">
          Rules read: <span className="font-medium text-ink">{set.title}</span>, rule set {set.version}. {set.scope}
        </p>
      ) : null}
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
        label="Front axle may lose at most"
        help="A share of the front axle's load unhitched. Beyond it the check reads tight and suggests weight distribution. 10 % is common practice, with no published source; the vehicle maker's own figure wins."
        error={errorOf("frontAxleLossPercent")}
        required
      >
        <NumberInput unit="%" {...form.register("frontAxleLossPercent")} />
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
