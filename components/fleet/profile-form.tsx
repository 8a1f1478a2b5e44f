"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useMemo, useState, useTransition } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Button, Card, CardBody, CardHeader, Field, FormMessage, NumberInput, Select, TextInput, useToast } from "@/components/ui";
import { convertTypedFigure } from "@/components/check/rig-form";
import { FIELDS_BY_KIND, KIND_WORDS, profileValueText, unitFor, type ProfileField, type ProfileKind } from "@/lib/fleet/fields";
import type { FleetProfile } from "@/lib/server/fleet";
import { profileFormSchema } from "@/lib/validation/fleet";

type Typed = Record<string, unknown>;
type ActionResult = { ok: boolean; message?: string; fieldErrors?: Record<string, string[]>; id?: string };

export interface ProfileFormProps {
  kind: ProfileKind;
  units: "imperial" | "metric";
  profile?: FleetProfile;
  action: (input: unknown) => Promise<ActionResult>;
}

function nestedDefaults(kind: ProfileKind, profile: FleetProfile | undefined, units: string): Typed {
  const values: Typed = { name: profile?.name ?? "", units };
  for (const field of FIELDS_BY_KIND[kind]) {
    const keys = field.path.split(".");
    let node = values;
    for (const key of keys.slice(0, -1)) node = (node[key] ??= {}) as Typed;
    node[keys[keys.length - 1]!] = profile ? profileValueText(field, profile.data) : "";
  }
  return values;
}

const CHOICE_WORDS: Record<string, string> = {
  "enclosed-cargo": "enclosed cargo",
  "car-hauler": "car hauler",
  "horse-livestock": "horse or livestock",
  "platform-rack": "platform rack",
  "hanging-rack": "hanging rack",
  "cargo-carrier": "cargo carrier",
};

/**
 * A vehicle, trailer or accessory, with the fields grouped as the labels are read. The shared schema checks
 * in the browser on submit, and again in the server action.
 */
export function ProfileForm({ kind, units: startUnits, profile, action }: ProfileFormProps) {
  const schema = useMemo(() => profileFormSchema(kind), [kind]);
  const form = useForm<Typed>({
    resolver: zodResolver(schema as never) as never,
    defaultValues: nestedDefaults(kind, profile, startUnits),
    mode: "onSubmit",
    reValidateMode: "onChange",
  });
  const router = useRouter();
  const { toast } = useToast();
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  const units = (useWatch({ control: form.control, name: "units" }) as "imperial" | "metric") ?? startUnits;
  const fields = FIELDS_BY_KIND[kind];
  const groups = [...new Set(fields.map((field) => field.group))];

  // The figures typed so far follow the unit switch, as on the check screen: 3,500 lb becomes 1,588 kg.
  const [shownUnits, setShownUnits] = useState(startUnits);
  const convertTyped = (to: string) => {
    if ((to !== "imperial" && to !== "metric") || to === shownUnits) return;
    for (const field of fields) {
      const text = form.getValues(field.path);
      if (typeof text === "string" && text.trim()) form.setValue(field.path, convertTypedFigure(text, field.measure ?? "", to), { shouldDirty: true });
    }
    setShownUnits(to);
  };

  const errorOf = (path: string): string | undefined => {
    let node: unknown = form.formState.errors;
    for (const key of path.split(".")) node = (node as Record<string, unknown> | undefined)?.[key];
    const text = (node as { message?: unknown } | undefined)?.message;
    return typeof text === "string" ? text : undefined;
  };

  const onSubmit = form.handleSubmit(
    () => {
      setMessage(undefined);
      startTransition(async () => {
        const result = await action({ kind, id: profile?.id, values: form.getValues() });
        if (!result.ok) {
          setMessage(result.message ?? "Not saved.");
          for (const [name, messages] of Object.entries(result.fieldErrors ?? {})) {
            if (messages[0]) form.setError(name, { type: "server", message: messages[0] });
          }
          return;
        }
        toast({ title: result.message ?? "Saved.", tone: "success" });
        router.push(`/fleet/${kind}/${result.id ?? profile?.id ?? ""}`);
        router.refresh();
      });
    },
    (errors) => setMessage(`${Object.keys(errors).length > 0 ? "Some fields need attention" : "Check the form"}: see the messages beside them.`),
  );

  const control = (field: ProfileField) => {
    const error = errorOf(field.path);
    if (field.type === "choice" || field.type === "integer" || field.type === "yes-no") {
      const choices = field.type === "yes-no" ? ["yes", "no"] : (field.choices ?? []);
      return (
        <Field key={field.path} label={field.label} help={field.help} error={error}>
          <Select {...form.register(field.path)}>
            <option value="">Not known</option>
            {choices.map((value) => (
              <option key={value} value={value}>
                {CHOICE_WORDS[value] ?? value}
              </option>
            ))}
          </Select>
        </Field>
      );
    }
    return (
      <Field key={field.path} label={field.label} help={field.help} error={error}>
        <NumberInput unit={unitFor(field, units)} {...form.register(field.path)} />
      </Field>
    );
  };

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label={`${KIND_WORDS[kind].one} profile`}>
      <FormMessage tone="error">{message}</FormMessage>
      <Card>
        <CardBody className="grid gap-4 sm:grid-cols-[1fr_16rem]">
          <Field label="Name" error={errorOf("name")} required help="What the crews call it: a fleet number and a short description.">
            <TextInput autoComplete="off" {...form.register("name")} />
          </Field>
          <Field label="Units" error={errorOf("units")} help="The figures below are in these units; switching converts the figures already typed.">
            <Select {...form.register("units", { onChange: (event) => convertTyped(event.target.value) })}>
              <option value="imperial">Imperial (lb, in)</option>
              <option value="metric">Metric (kg, mm)</option>
            </Select>
          </Field>
        </CardBody>
      </Card>
      {groups.map((group) => (
        <Card key={group} as="section" aria-label={group}>
          <CardHeader title={group} titleAs="h2" />
          <CardBody className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">{fields.filter((field) => field.group === group).map(control)}</CardBody>
        </Card>
      ))}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" loading={pending}>
          {profile ? "Save changes" : `Add ${KIND_WORDS[kind].one}`}
        </Button>
        <Button variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
