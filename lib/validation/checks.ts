import { z } from "zod";
import { placeSchema } from "@/lib/towing/rules/places";
import { rigInputSchema } from "./rig";
import { VERDICT_LEVELS } from "../towing/types";

const optionalText = (max: number, label: string) =>
  z
    .string()
    .trim()
    .max(max, `${label}: use at most ${max} characters.`)
    .optional()
    .transform((value) => (value ? value : undefined));

export const saveCheckSchema = z.object({
  rig: rigInputSchema,
  customerName: optionalText(120, "Customer name"),
  note: optionalText(1000, "Note"),
  /** The place this check is read for; left out: the organisation's own; null: no local rules. */
  place: placeSchema.nullable().optional(),
});
export type SaveCheckInput = z.output<typeof saveCheckSchema>;

export const CHECK_SORTS = ["createdAt", "customerName", "vehicleLabel", "level"] as const;

const dateOnly = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-12-01.")
  // The shape alone lets 2026-13-45 through, which is no day at all.
  .refine((value) => !Number.isNaN(Date.parse(`${value}T00:00:00Z`)), "Use a date like 2026-12-01.")
  .optional()
  .or(z.literal("").transform(() => undefined));

export const listChecksQuerySchema = z.object({
  vehicle: z.string().trim().max(120).optional(),
  customer: z.string().trim().max(120).optional(),
  from: dateOnly,
  to: dateOnly,
  level: z.enum(VERDICT_LEVELS).optional().or(z.literal("").transform(() => undefined)),
  sort: z.enum(CHECK_SORTS).default("createdAt"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(5).max(100).default(20),
});
export type ListChecksQuery = z.output<typeof listChecksQuerySchema>;

export const entityId = z.string().min(1).max(64).regex(/^[A-Za-z0-9_-]+$/, "Not a valid id.");

export const createLinkSchema = z.object({
  checkId: entityId,
  expiresInDays: z
    .union([z.literal(""), z.coerce.number().int("Use whole days.").min(1, "Use at least 1 day.").max(365, "Use at most 365 days.")])
    .optional()
    .transform((value) => (value === "" || value === undefined ? undefined : value)),
});

export const revokeLinkSchema = z.object({ linkId: entityId });

export const emailLinkSchema = z.object({
  checkId: entityId,
  token: z.string().min(20).max(100),
  email: z.string().trim().toLowerCase().pipe(z.email({ error: "Enter an e-mail address like name@example.com." })),
});

export const vehicleProfileSchema = z.object({
  name: z.string().trim().min(1, "Name the vehicle.").max(120, "Use at most 120 characters."),
  rig: rigInputSchema,
});
