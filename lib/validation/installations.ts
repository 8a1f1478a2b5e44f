/**
 * Installation records: the shapes the record form, its actions and routes share. Figures reuse the core's
 * own field schemas (ranges and messages per unit system), read from typed text where a form sends text.
 */
import { z } from "zod";
import { rigInputSchema } from "../towing/input";
import { entityId } from "./checks";
import {
  DEFAULT_MEASURING_METHOD,
  INSTALLATION_STATES,
  MEASUREMENT_KEYS,
  MEASUREMENT_WORDS,
  PHOTO_KINDS,
  PHOTO_KIND_WORDS,
  STATE_WORDS,
  type InstallationState,
  type MeasurementKey,
} from "../installations/words";

const [imperial, metric] = rigInputSchema.options.map((option) => option.shape) as [
  (typeof rigInputSchema.options)[0]["shape"],
  (typeof rigInputSchema.options)[1]["shape"],
];

export { INSTALLATION_STATES, STATE_WORDS, PHOTO_KINDS, PHOTO_KIND_WORDS, MEASUREMENT_KEYS, MEASUREMENT_WORDS, DEFAULT_MEASURING_METHOD, type InstallationState, type MeasurementKey };

/** Typed text to a number: "7000" and " 7000.5 " read; "", blanks and absent mean nothing given; anything else is left for the number schema to refuse. */
function typedNumber(value: unknown): unknown {
  if (value === undefined || value === null) return value === null ? null : undefined;
  if (typeof value !== "string") return value;
  const text = value.trim();
  if (text === "") return undefined;
  return /^-?\d+(\.\d+)?$/.test(text) && text.length <= 20 ? Number(text) : value;
}
const num = <T extends z.ZodType>(schema: T) => z.preprocess(typedNumber, schema);

const text = (max: number, label: string) =>
  z
    .string({ error: `${label}: enter text.` })
    .trim()
    .max(max, `${label}: use at most ${max} characters.`)
    .refine((value) => !/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(value), `${label}: remove the control characters.`);
const optionalText = (max: number, label: string) =>
  text(max, label)
    .optional()
    .transform((value) => (value ? value : undefined));
const requiredText = (max: number, label: string, missing: string) => z.string({ error: missing }).trim().min(1, missing).pipe(text(max, label));

const optionalId = z
  .union([z.literal(""), entityId])
  .optional()
  .transform((value) => (value ? value : undefined));

const dateOnly = z
  .string({ error: "Fitting date: use a date like 2026-12-01." })
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Fitting date: use a date like 2026-12-01.")
  .refine((value) => {
    const parsed = new Date(`${value}T00:00:00Z`);
    return !Number.isNaN(parsed.getTime()) && parsed.toISOString().slice(0, 10) === value;
  }, "Fitting date: use a date like 2026-12-01.");

const email = z
  .union([z.literal(""), z.string().trim().max(254, "E-mail: use at most 254 characters.").pipe(z.email({ error: "Customer e-mail: enter an address like name@example.com." }))])
  .optional()
  .transform((value) => (value ? value : undefined));

function shapeFor(u: typeof imperial | typeof metric, units: "imperial" | "metric") {
  const v = u.vehicle.shape;
  const h = u.hitch.unwrap().shape;
  const measured = (schema: z.ZodType) =>
    z
      .object({
        value: num(schema),
        method: optionalText(200, "How it was measured"),
        measuredByUserId: optionalId,
      })
      .optional();
  const ratings = {
    gtwRating: num(h.gtwRating),
    twRating: num(h.twRating),
    gtwRatingWd: num(h.gtwRatingWd),
    twRatingWd: num(h.twRatingWd),
  };
  return z.object({
    id: optionalId,
    units: z.literal(units),
    vehicleProfileId: optionalId,
    vehicleDescription: optionalText(200, "Vehicle"),
    vehicle: z
      .object({
        towRating: num(v.towRating),
        towRatingWd: num(v.towRatingWd),
        tongueWeightLimit: num(v.tongueWeightLimit),
        tongueWeightLimitWd: num(v.tongueWeightLimitWd),
        departureAngle: num(v.departureAngle),
      })
      .optional(),
    customerName: requiredText(120, "Customer", "Customer: enter the customer's name."),
    customerEmail: email,
    installerUserId: z.string({ error: "Installer: choose a member." }).min(1, "Installer: choose a member.").pipe(entityId),
    fittedOn: dateOnly,
    state: z.enum(["planned", "fitted"], { error: "State: planned or fitted (hand-over has its own button)." }),
    hitch: z.object({
      class: num(h.class),
      receiverSize: z.preprocess((value) => (value === "" ? undefined : value), h.receiverSize),
      ...ratings,
    }),
    parts: z
      .array(
        z.object({
          label: requiredText(120, "Part", "Part: name it, or remove the line."),
          gtwRating: num(h.gtwRating),
          twRating: num(h.twRating),
        }),
        { error: "Parts: a list of lines." },
      )
      .max(12, "Parts: at most 12 lines."),
    measurements: z.object({
      pinToFascia: measured(h.pinToFascia),
      receiverHeight: measured(h.receiverHeight),
      rearAxleToPin: measured(v.rearAxleToPin),
    }),
    checklist: z
      .array(
        z.object({
          itemId: entityId,
          done: z.boolean({ error: "Checklist: ticked or not." }),
          value: optionalText(60, "Value from the instruction sheet"),
        }),
        { error: "Checklist: a list of items." },
      )
      .max(50, "Checklist: at most 50 items."),
    carrierDepth: num(u.accessory.unwrap().shape.lowestPointBehindPin),
    note: optionalText(2000, "Note"),
  });
}

/** The record as the form sends it (figures as typed text or numbers), in the record's own unit system. */
export const installationRecordSchema = z
  .discriminatedUnion("units", [shapeFor(imperial, "imperial"), shapeFor(metric, "metric")], {
    error: "Units: choose imperial (lb, in) or metric (kg, mm).",
  })
  .superRefine((record, ctx) => {
    if (!record.vehicleProfileId && !record.vehicleDescription)
      ctx.addIssue({ code: "custom", path: ["vehicleDescription"], message: "Vehicle: pick a fleet vehicle, or describe the customer's vehicle." });
    const missingValue = (key: MeasurementKey) => {
      const m = record.measurements[key];
      if (m && m.value === undefined && (m.method || m.measuredByUserId)) return true;
      return false;
    };
    for (const key of MEASUREMENT_KEYS)
      if (missingValue(key)) ctx.addIssue({ code: "custom", path: ["measurements", key, "value"], message: `${MEASUREMENT_WORDS[key].label}: enter the measured figure, or clear who measured it.` });
  });
export type InstallationRecordInput = z.output<typeof installationRecordSchema>;

export const recordIdSchema = z.object({ recordId: entityId });

export const handOverSchema = z.object({
  recordId: entityId,
  email: email,
  expiresInDays: z
    .union([z.literal(""), z.coerce.number({ error: "Use whole days." }).int("Use whole days.").min(1, "Use at least 1 day.").max(365, "Use at most 365 days.")])
    .optional()
    .transform((value) => (value === "" || value === undefined ? undefined : value)),
});

export const revokeInstallationLinkSchema = z.object({ linkId: entityId });

export const checklistItemSchema = z.object({
  label: requiredText(160, "Item", "Item: say what to check."),
  valueLabel: optionalText(80, "Value to type"),
});
export const checklistItemIdSchema = z.object({ itemId: entityId });
export const moveChecklistItemSchema = z.object({ itemId: entityId, direction: z.enum(["up", "down"], { error: "Direction: up or down." }) });

export const photoUploadSchema = z.object({
  recordId: entityId,
  kind: z.enum(PHOTO_KINDS, { error: "Choose what the photo shows." }),
});

const listDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-12-01.")
  .refine((value) => !Number.isNaN(Date.parse(`${value}T00:00:00Z`)), "Use a date like 2026-12-01.")
  .optional()
  .or(z.literal("").transform(() => undefined));

export const listInstallationsQuerySchema = z.object({
  state: z.enum(INSTALLATION_STATES, { error: "State: planned, fitted or handed-over." }).optional().or(z.literal("").transform(() => undefined)),
  installer: z.union([z.literal("").transform(() => undefined), entityId]).optional(),
  from: listDate,
  to: listDate,
  vehicle: z.union([z.literal("").transform(() => undefined), entityId]).optional(),
  page: z.coerce.number({ error: "Page: a whole number." }).int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number({ error: "Page size: a whole number." }).int().min(5).max(100).default(25),
});
export type ListInstallationsQuery = z.output<typeof listInstallationsQuerySchema>;

/** The customer's confirmation on their page: the link's token and the ticked box. */
export const confirmLimitsSchema = z.object({
  token: z.string({ error: "The link is not complete." }).regex(/^[A-Za-z0-9_-]{20,100}$/, "The link is not complete."),
  confirm: z.literal("yes", { error: "Tick the box to confirm you have read the limits." }),
});
