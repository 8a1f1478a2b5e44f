/**
 * Fleet profiles: their zod schemas are cut from the core's own rig schema, so a saved profile is always a
 * valid part of a rig and drops straight into a check. Shared by the forms, the actions, the routes and the
 * CSV import.
 */
import { z } from "zod";
import { buildProfileData, getPath, type ProfileKind } from "../fleet/fields";
import { rigInputSchema } from "../towing/input";
import { VERDICT_LEVELS } from "../towing/types";

const [imperial, metric] = rigInputSchema.options.map((option) => option.shape) as [
  (typeof rigInputSchema.options)[0]["shape"],
  (typeof rigInputSchema.options)[1]["shape"],
];

export const profileName = z
  .string({ error: "Name the profile." })
  .trim()
  .min(1, "Name the profile.")
  .max(120, "Use at most 120 characters.");

const unitsError = { error: "Units: choose imperial (lb, in) or metric (kg, mm)." };

export const vehicleProfileSchema = z.discriminatedUnion(
  "units",
  [
    z.object({ name: profileName, units: z.literal("imperial"), vehicle: imperial.vehicle, hitch: imperial.hitch, load: imperial.load }),
    z.object({ name: profileName, units: z.literal("metric"), vehicle: metric.vehicle, hitch: metric.hitch, load: metric.load }),
  ],
  unitsError,
);

export const trailerProfileSchema = z.discriminatedUnion(
  "units",
  [
    z.object({
      name: profileName,
      units: z.literal("imperial"),
      trailer: imperial.trailer.unwrap(),
      ballMount: imperial.ballMount,
      weightDistribution: imperial.weightDistribution,
    }),
    z.object({
      name: profileName,
      units: z.literal("metric"),
      trailer: metric.trailer.unwrap(),
      ballMount: metric.ballMount,
      weightDistribution: metric.weightDistribution,
    }),
  ],
  unitsError,
);

export const accessoryProfileSchema = z.discriminatedUnion(
  "units",
  [
    z.object({ name: profileName, units: z.literal("imperial"), accessory: imperial.accessory.unwrap(), extender: imperial.extender }),
    z.object({ name: profileName, units: z.literal("metric"), accessory: metric.accessory.unwrap(), extender: metric.extender }),
  ],
  unitsError,
);

export type VehicleProfileInput = z.output<typeof vehicleProfileSchema>;
export type TrailerProfileInput = z.output<typeof trailerProfileSchema>;
export type AccessoryProfileInput = z.output<typeof accessoryProfileSchema>;
export type ProfileInput = VehicleProfileInput | TrailerProfileInput | AccessoryProfileInput;

export const PROFILE_SCHEMAS = {
  vehicles: vehicleProfileSchema,
  trailers: trailerProfileSchema,
  accessories: accessoryProfileSchema,
} as const;

/**
 * A form's typed values (text in nested objects, as react-hook-form keeps them) to the profile's shape:
 * numbers read, empty fields and sections dropped. Name and units pass through.
 */
export function profileFromTyped(kind: ProfileKind, typed: unknown): Record<string, unknown> {
  const source = (typeof typed === "object" && typed !== null ? typed : {}) as Record<string, unknown>;
  return {
    name: source.name,
    units: source.units,
    ...buildProfileData(kind, (path) => getPath(source, path)),
  };
}

/** The form's schema: typed text in, a valid profile out (field messages keyed by the same dotted paths). */
export function profileFormSchema(kind: ProfileKind) {
  return z.preprocess((typed) => profileFromTyped(kind, typed), PROFILE_SCHEMAS[kind] as z.ZodType<ProfileInput>);
}

export const profileIdSchema = z.string().min(1).max(64).regex(/^[A-Za-z0-9_-]+$/, "Not a valid id.");

export const saveProfileSchema = z.object({
  kind: z.enum(["vehicles", "trailers", "accessories"], { error: "Choose vehicles, trailers or accessories." }),
  id: profileIdSchema.optional(),
  values: z.unknown(),
});

export const archiveProfileSchema = z.object({
  kind: z.enum(["vehicles", "trailers", "accessories"], { error: "Choose vehicles, trailers or accessories." }),
  id: profileIdSchema,
  archived: z.boolean(),
});

export const listProfilesQuerySchema = z.object({
  archived: z.enum(["include", "only", "exclude"]).default("exclude"),
});

export const MATRIX_LEVELS = VERDICT_LEVELS;
/** Rows: by name, or by the most the vehicle may pull (its lowest tow rating). */
export const MATRIX_VEHICLE_SORTS = ["name", "capacity-desc", "capacity-asc"] as const;
/** Columns: by name (trailers, then accessories), or by the trailer's gross weight or the accessory's loaded weight. */
export const MATRIX_HITCHED_SORTS = ["name", "weight-desc", "weight-asc"] as const;
export type MatrixVehicleSort = (typeof MATRIX_VEHICLE_SORTS)[number];
export type MatrixHitchedSort = (typeof MATRIX_HITCHED_SORTS)[number];

export const matrixQuerySchema = z.object({
  vehicle: z.string().trim().max(120).optional(),
  hitched: z.string().trim().max(120).optional(),
  level: z.enum(MATRIX_LEVELS, { error: "Verdict: within, tight, adjust the set-up, over or not confirmed." }).optional().or(z.literal("").transform(() => undefined)),
  page: z.coerce.number({ error: "Page: a whole number." }).int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number({ error: "Page size: a whole number." }).int().min(5).max(100).default(25),
  colPage: z.coerce.number({ error: "Column page: a whole number." }).int().min(1).max(10_000).default(1),
  colPageSize: z.coerce.number({ error: "Column page size: a whole number." }).int().min(4).max(60).default(10),
  // The order is kept across pages: the server sorts before it pages. Left out or empty, by name.
  vehicleSort: z.preprocess(
    (value) => (value === "" ? undefined : value),
    z.enum(MATRIX_VEHICLE_SORTS, { error: "Order of the vehicles: name, capacity-desc (largest first) or capacity-asc (smallest first)." }).default("name"),
  ),
  hitchedSort: z.preprocess(
    (value) => (value === "" ? undefined : value),
    z.enum(MATRIX_HITCHED_SORTS, { error: "Order of the trailers and accessories: name, weight-desc (heaviest first) or weight-asc (lightest first)." }).default("name"),
  ),
});
export type MatrixQuery = z.output<typeof matrixQuerySchema>;

export const DOCUMENT_KINDS = ["door-jamb-label", "hitch-label", "other"] as const;
export const DOCUMENT_KIND_WORDS: Record<(typeof DOCUMENT_KINDS)[number], string> = {
  "door-jamb-label": "Door-jamb label (tire and loading)",
  "hitch-label": "Hitch label",
  other: "Other",
};
export const documentUploadSchema = z.object({
  kind: z.enum(DOCUMENT_KINDS, { error: "Choose what the document shows." }),
});

export const importOptionsSchema = z.object({
  kind: z.enum(["vehicles", "trailers", "accessories"], { error: "Choose vehicles, trailers or accessories." }),
  units: z.enum(["imperial", "metric", "column"], { error: "Units: imperial, metric, or from the file's units column." }),
  mode: z.enum(["preview", "valid-rows", "all-or-nothing"], { error: "Choose preview, import the valid rows, or all or nothing." }),
});
export type ImportOptions = z.output<typeof importOptionsSchema>;
