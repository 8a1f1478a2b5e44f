"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { Plus, Trash2 } from "lucide-react";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { useFieldArray, useForm, useWatch } from "react-hook-form";
import { Button, Card, CardBody, CardHeader, Field, FormMessage, NumberInput, Select, TextInput, Textarea, useToast } from "@/components/ui";
import { DEFAULT_MEASURING_METHOD, MEASUREMENT_KEYS, MEASUREMENT_WORDS } from "@/lib/installations/words";
import type { InstallationRecord } from "@/lib/server/installations";
import { installationRecordSchema } from "@/lib/validation/installations";

type Typed = Record<string, unknown>;
type ActionResult = { ok: boolean; message?: string; fieldErrors?: Record<string, string[]>; id?: string };

export interface RecordFormProps {
  units: "imperial" | "metric";
  vehicles: Array<{ id: string; name: string }>;
  installers: Array<{ id: string; name: string }>;
  checklistItems: Array<{ id: string; label: string; valueLabel: string | null }>;
  record?: InstallationRecord;
  defaults: { vehicleProfileId?: string; installerUserId: string; fittedOn: string };
  action: (input: unknown) => Promise<ActionResult>;
}

const text = (value: number | string | undefined | null) => (value === undefined || value === null ? "" : String(value));

function startValues({ units, record, defaults, checklistItems }: RecordFormProps): Typed {
  const m = record?.measurements ?? {};
  const ticked = new Map((record?.checklist ?? []).map((entry) => [entry.itemId, entry]));
  const items = [...checklistItems.map((item) => ({ itemId: item.id, label: item.label, valueLabel: item.valueLabel ?? undefined })), ...(record?.checklist ?? []).filter((entry) => !checklistItems.some((item) => item.id === entry.itemId))];
  return {
    id: record?.id ?? "",
    units: record?.units ?? units,
    vehicleSource: record && !record.vehicleProfileId ? "customer" : "fleet",
    vehicleProfileId: record?.vehicleProfileId ?? defaults.vehicleProfileId ?? "",
    vehicleDescription: record && !record.vehicleProfileId ? record.vehicleLabel : "",
    vehicle: {
      towRating: text(record?.vehicle?.towRating),
      towRatingWd: text(record?.vehicle?.towRatingWd),
      tongueWeightLimit: text(record?.vehicle?.tongueWeightLimit),
      tongueWeightLimitWd: text(record?.vehicle?.tongueWeightLimitWd),
      departureAngle: text(record?.vehicle?.departureAngle),
    },
    customerName: record?.customerName ?? "",
    customerEmail: record?.customerEmail ?? "",
    installerUserId: record?.installerUserId ?? defaults.installerUserId,
    fittedOn: record?.fittedOn ?? defaults.fittedOn,
    state: record?.state === "planned" ? "planned" : "fitted",
    hitch: {
      class: text(record?.hitch.class),
      receiverSize: record?.hitch.receiverSize ?? "",
      gtwRating: text(record?.hitch.gtwRating),
      twRating: text(record?.hitch.twRating),
      gtwRatingWd: text(record?.hitch.gtwRatingWd),
      twRatingWd: text(record?.hitch.twRatingWd),
    },
    parts: (record?.parts ?? [{ label: "Ball mount" }, { label: "Pin and clip" }, { label: "Wiring harness" }]).map((part) => ({ label: part.label, gtwRating: text(part.gtwRating), twRating: text(part.twRating) })),
    measurements: Object.fromEntries(
      MEASUREMENT_KEYS.map((key) => [
        key,
        { value: text(m[key]?.value), method: m[key]?.method ?? DEFAULT_MEASURING_METHOD, measuredByUserId: m[key]?.measuredByUserId ?? record?.installerUserId ?? defaults.installerUserId },
      ]),
    ),
    checklist: items.map((item) => ({ itemId: item.itemId, label: item.label, valueLabel: item.valueLabel ?? "", done: ticked.get(item.itemId)?.done ?? false, value: ticked.get(item.itemId)?.value ?? "" })),
    carrierDepth: text(record?.carrierDepth),
    note: record?.note ?? "",
  };
}

/** What goes to the action: the values as typed, with the vehicle the installer did not choose left out. */
function toSubmit(values: Typed): Typed {
  const { vehicleSource, checklist, ...rest } = values as Typed & { checklist: Array<Typed> };
  const items = checklist.map(({ itemId, done, value }) => ({ itemId, done: Boolean(done), value }));
  const measurements = Object.fromEntries(
    Object.entries(rest.measurements as Record<string, Typed>).map(([key, m]) => [key, String(m.value ?? "").trim() === "" ? undefined : m]),
  );
  return vehicleSource === "fleet"
    ? { ...rest, measurements, checklist: items, vehicleDescription: "", vehicle: undefined }
    : { ...rest, measurements, checklist: items, vehicleProfileId: "" };
}

/**
 * The installation record: the job, what was fitted, what was measured after fitting, and the checklist.
 * The shared schema checks in the browser on submit and again in the server action.
 */
export function RecordForm(props: RecordFormProps) {
  const { vehicles, installers, record, action } = props;
  const form = useForm<Typed>({
    // The browser checks what the server will check: the typed values, shaped as they are sent.
    resolver: async (values, context, options) => zodResolver(installationRecordSchema as never)(toSubmit(values) as never, context, options as never) as never,
    defaultValues: startValues(props),
    mode: "onSubmit",
    reValidateMode: "onChange",
  });
  const parts = useFieldArray({ control: form.control, name: "parts" as never });
  const checklist = (form.getValues("checklist") as Array<{ itemId: string; label: string; valueLabel: string }>) ?? [];
  const router = useRouter();
  const { toast } = useToast();
  const [message, setMessage] = useState<string>();
  const [pending, startTransition] = useTransition();
  const units = useWatch({ control: form.control, name: "units" }) as "imperial" | "metric";
  const source = useWatch({ control: form.control, name: "vehicleSource" }) as "fleet" | "customer";
  const wu = units === "metric" ? "kg" : "lb";
  const lu = units === "metric" ? "mm" : "in";

  const errorOf = (path: string): string | undefined => {
    let node: unknown = form.formState.errors;
    for (const key of path.split(".")) node = (node as Record<string, unknown> | undefined)?.[key];
    const found = (node as { message?: unknown } | undefined)?.message;
    return typeof found === "string" ? found : undefined;
  };

  const onSubmit = form.handleSubmit(
    () => {
      setMessage(undefined);
      startTransition(async () => {
        const result = await action(toSubmit(form.getValues()));
        if (!result.ok) {
          setMessage(result.message ?? "Not saved.");
          for (const [name, messages] of Object.entries(result.fieldErrors ?? {})) if (messages[0]) form.setError(name, { type: "server", message: messages[0] });
          return;
        }
        toast({ title: result.message ?? "Saved.", tone: "success" });
        router.push(`/installations/${result.id ?? record?.id ?? ""}`);
        router.refresh();
      });
    },
    () => setMessage("Some fields need attention: see the messages beside them."),
  );

  const numberField = (path: string, label: string, unit: string, help?: string) => (
    <Field key={path} label={label} help={help} error={errorOf(path)}>
      <NumberInput unit={unit} {...form.register(path)} />
    </Field>
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Installation record">
      <FormMessage tone="error">{message}</FormMessage>
      <input type="hidden" {...form.register("units")} />

      <Card as="section" aria-label="The job">
        <CardHeader title="The job" titleAs="h2" description={`Figures in ${units === "metric" ? "kilograms and millimetres" : "pounds and inches"}.`} />
        <CardBody className="grid gap-4 sm:grid-cols-2">
          <fieldset className="flex flex-col gap-2 sm:col-span-2">
            <legend className="text-sm font-medium text-ink">Vehicle</legend>
            <div className="flex flex-wrap gap-4 text-sm">
              <label className="flex items-center gap-2">
                <input type="radio" value="fleet" className="size-4 accent-accent" {...form.register("vehicleSource")} />A vehicle of the fleet
              </label>
              <label className="flex items-center gap-2">
                <input type="radio" value="customer" className="size-4 accent-accent" {...form.register("vehicleSource")} />A customer&rsquo;s vehicle
              </label>
            </div>
          </fieldset>
          {source === "fleet" ? (
            <Field label="Fleet vehicle" error={errorOf("vehicleProfileId") ?? errorOf("vehicleDescription")} required className="sm:col-span-2" help="Once the record is fitted, the vehicle's profile takes the hitch and the measured figures.">
              <Select {...form.register("vehicleProfileId")}>
                <option value="">Choose a vehicle</option>
                {vehicles.map((vehicle) => (
                  <option key={vehicle.id} value={vehicle.id}>
                    {vehicle.name}
                  </option>
                ))}
              </Select>
            </Field>
          ) : (
            <>
              <Field label="The customer's vehicle" error={errorOf("vehicleDescription")} required className="sm:col-span-2" help="Year, make, model and colour as the customer would say them.">
                <TextInput autoComplete="off" {...form.register("vehicleDescription")} />
              </Field>
              <div className="grid gap-4 sm:col-span-2 sm:grid-cols-3">
                {numberField("vehicle.towRating", "Tow rating", wu, "Owner's manual, weight-carrying.")}
                {numberField("vehicle.towRatingWd", "Tow rating with weight distribution", wu)}
                {numberField("vehicle.tongueWeightLimit", "Tongue-weight limit", wu)}
                {numberField("vehicle.tongueWeightLimitWd", "Tongue-weight limit with weight distribution", wu)}
                {numberField("vehicle.departureAngle", "Departure angle", "°", "Owner's manual or the maker's specification sheet.")}
              </div>
            </>
          )}
          <Field label="Customer" error={errorOf("customerName")} required>
            <TextInput autoComplete="off" {...form.register("customerName")} />
          </Field>
          <Field label="Customer's e-mail" error={errorOf("customerEmail")} help="For the hand-over mail; optional.">
            <TextInput type="email" autoComplete="off" {...form.register("customerEmail")} />
          </Field>
          <Field label="Installer" error={errorOf("installerUserId")} required>
            <Select {...form.register("installerUserId")}>
              {installers.map((person) => (
                <option key={person.id} value={person.id}>
                  {person.name}
                </option>
              ))}
            </Select>
          </Field>
          <Field label="Fitting date" error={errorOf("fittedOn")} required>
            <TextInput type="date" {...form.register("fittedOn")} />
          </Field>
          <Field label="State" error={errorOf("state")} help={record?.state === "handed-over" ? "Handed over: it stays so." : "Fitted: the vehicle takes the figures below."}>
            <Select {...form.register("state")}>
              <option value="planned">Planned</option>
              <option value="fitted">Fitted</option>
            </Select>
          </Field>
        </CardBody>
      </Card>

      <Card as="section" aria-label="What was fitted">
        <CardHeader title="What was fitted" titleAs="h2" description="Read the ratings from the hitch's own label, and each part's from its stamp or packaging." />
        <CardBody className="flex flex-col gap-4">
          <div className="grid gap-4 sm:grid-cols-3">
            <Field label="Hitch class" error={errorOf("hitch.class")}>
              <Select {...form.register("hitch.class")}>
                <option value="">Not known</option>
                {[1, 2, 3, 4, 5].map((n) => (
                  <option key={n} value={String(n)}>
                    Class {n}
                  </option>
                ))}
              </Select>
            </Field>
            <Field label="Receiver size" error={errorOf("hitch.receiverSize")}>
              <Select {...form.register("hitch.receiverSize")}>
                <option value="">Not known</option>
                {["1-1/4", "2", "2-1/2", "3"].map((size) => (
                  <option key={size} value={size}>
                    {size} in
                  </option>
                ))}
              </Select>
            </Field>
            <span className="hidden sm:block" />
            {numberField("hitch.gtwRating", "Label: gross trailer weight", wu)}
            {numberField("hitch.twRating", "Label: tongue weight", wu)}
            <span className="hidden sm:block" />
            {numberField("hitch.gtwRatingWd", "Label: gross trailer weight with WD", wu, "Leave empty if the label gives none.")}
            {numberField("hitch.twRatingWd", "Label: tongue weight with WD", wu)}
          </div>
          <fieldset className="flex flex-col gap-3">
            <legend className="text-sm font-medium text-ink">Other parts</legend>
            {parts.fields.map((field, i) => (
              <div key={field.id} className="grid gap-3 rounded-md border border-rule p-3 sm:grid-cols-[2fr_1fr_1fr_auto] sm:items-end">
                <Field label={`Part ${i + 1}`} error={errorOf(`parts.${i}.label`)}>
                  <TextInput autoComplete="off" {...form.register(`parts.${i}.label`)} />
                </Field>
                {numberField(`parts.${i}.gtwRating`, "Gross trailer weight rating", wu)}
                {numberField(`parts.${i}.twRating`, "Tongue weight rating", wu)}
                <Button variant="quiet" aria-label={`Remove part ${i + 1}`} onClick={() => parts.remove(i)}>
                  <Trash2 aria-hidden="true" className="size-4" />
                </Button>
              </div>
            ))}
            <div>
              <Button variant="secondary" size="sm" icon={<Plus aria-hidden="true" className="size-4" />} onClick={() => parts.append({ label: "", gtwRating: "", twRating: "" } as never)} disabled={parts.fields.length >= 12}>
                Add a part
              </Button>
            </div>
          </fieldset>
        </CardBody>
      </Card>

      <Card as="section" aria-label="Measured after fitting">
        <CardHeader title="Measured after fitting" titleAs="h2" description="Each figure with how it was measured and who measured it. They decide every later rack, carrier and ball-mount question." />
        <CardBody className="flex flex-col gap-4">
          {MEASUREMENT_KEYS.map((key) => (
            <div key={key} className="grid gap-3 sm:grid-cols-[1fr_2fr_1fr] sm:items-start">
              {numberField(`measurements.${key}.value`, MEASUREMENT_WORDS[key].label, lu, MEASUREMENT_WORDS[key].help)}
              <Field label="How it was measured" error={errorOf(`measurements.${key}.method`)}>
                <TextInput autoComplete="off" {...form.register(`measurements.${key}.method`)} />
              </Field>
              <Field label="Measured by" error={errorOf(`measurements.${key}.measuredByUserId`)}>
                <Select {...form.register(`measurements.${key}.measuredByUserId`)}>
                  {installers.map((person) => (
                    <option key={person.id} value={person.id}>
                      {person.name}
                    </option>
                  ))}
                </Select>
              </Field>
            </div>
          ))}
        </CardBody>
      </Card>

      <Card as="section" aria-label="Fitting checklist">
        <CardHeader title="Fitting checklist" titleAs="h2" description="The shop's own checklist. Where a value is asked for, type it from the maker's instruction sheet: Towmargin holds none." />
        <CardBody className="flex flex-col gap-3">
          {checklist.length === 0 ? <p className="text-sm text-ink-soft">The shop has no checklist yet: the owner sets it up under Installations → Fitting checklist.</p> : null}
          {checklist.map((item, i) => (
            <div key={item.itemId} className="grid gap-2 sm:grid-cols-[1fr_16rem] sm:items-center">
              <label className="flex items-start gap-3 text-sm">
                <input type="checkbox" className="mt-0.5 size-5 shrink-0 accent-accent" {...form.register(`checklist.${i}.done`)} />
                <span>{item.label}</span>
              </label>
              {item.valueLabel ? (
                <Field label={item.valueLabel} error={errorOf(`checklist.${i}.value`)}>
                  <TextInput autoComplete="off" {...form.register(`checklist.${i}.value`)} />
                </Field>
              ) : null}
            </div>
          ))}
        </CardBody>
      </Card>

      <Card as="section" aria-label="For the hand-over">
        <CardHeader title="For the hand-over" titleAs="h2" />
        <CardBody className="grid gap-4 sm:grid-cols-2">
          {numberField("carrierDepth", "A carrier the customer asked about: depth behind the pin", lu, "The hand-over shows its ground clearance and angle, and the rise it would need.")}
          <Field label="Note" error={errorOf("note")} className="sm:col-span-2">
            <Textarea rows={3} {...form.register("note")} />
          </Field>
        </CardBody>
      </Card>

      <div className="flex flex-wrap gap-2">
        <Button type="submit" loading={pending}>
          {record ? "Save the record" : "Create the record"}
        </Button>
        <Button variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
