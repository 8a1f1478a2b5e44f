import "server-only";
import { and, asc, count, desc, eq, gte, inArray, isNotNull, isNull, lte, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import {
  installationChecklistItems,
  installationPhotos,
  installationRecords,
  memberships,
  users,
  vehicleProfiles,
} from "@/db/schema";
import { can, type Permission } from "@/lib/roles";
import { convertRig, hitchAllowance, type HitchAllowance, type HitchAllowanceInput } from "@/lib/towing";
import type { RigInput } from "@/lib/towing/input";
import type { UnitSystem } from "@/lib/towing/units";
import type { InstallationRecordInput, InstallationState, ListInstallationsQuery, MeasurementKey } from "@/lib/validation/installations";
import { MEASUREMENT_KEYS } from "@/lib/validation/installations";
import type { AccessContext } from "./access";
import { checkDocumentBytes, cleanFileName } from "./documents";
import { absoluteUrl, composeMail, sendMail } from "./mail";
import { createInstallationLink, listInstallationLinks, resolveInstallationToken } from "./share-links";
import { documentStore, type StoredObject } from "./storage";
import { AccessDenied } from "./access-denied";
import { newId } from "./tokens";

function assertCan(access: AccessContext, permission: Permission) {
  if (!can(access.role, permission)) throw new AccessDenied(permission);
}

/**
 * Where each measurement and label figure of a record goes on the vehicle profile (rig paths). The core
 * measures from the rear axle centre to the receiver pin hole (`vehicle.rearAxleToPin`) for every rig and
 * reaches the ball through the ball mount's length.
 */
export const PROFILE_PATHS = {
  measurements: { pinToFascia: "hitch.pinToFascia", receiverHeight: "hitch.receiverHeight", rearAxleToPin: "vehicle.rearAxleToPin" } satisfies Record<MeasurementKey, string>,
  hitch: { class: "hitch.class", receiverSize: "hitch.receiverSize", gtwRating: "hitch.gtwRating", twRating: "hitch.twRating", gtwRatingWd: "hitch.gtwRatingWd", twRatingWd: "hitch.twRatingWd" },
} as const;

export interface Measurement {
  value: number;
  method?: string;
  measuredByUserId?: string;
}
export type Measurements = Partial<Record<MeasurementKey, Measurement>>;
export interface FittedHitch {
  class?: number;
  receiverSize?: string;
  gtwRating?: number;
  twRating?: number;
  gtwRatingWd?: number;
  twRatingWd?: number;
}
export interface FittedPart {
  label: string;
  gtwRating?: number;
  twRating?: number;
}
export interface ChecklistEntry {
  itemId: string;
  label: string;
  valueLabel?: string;
  done: boolean;
  value?: string;
}
export interface CustomerVehicle {
  towRating?: number;
  towRatingWd?: number;
  tongueWeightLimit?: number;
  tongueWeightLimitWd?: number;
  departureAngle?: number;
}

/** Where a profile figure came from: the record that measured or read it, and its date. */
export interface FigureSource {
  recordId: string;
  fittedOn: string;
  kind: "measured" | "label";
  method?: string;
  measuredBy?: string;
}
export type FigureSources = Record<string, FigureSource>;

// ------------------------------------------------------------------------------------------ members

export async function listInstallers(access: AccessContext) {
  assertCan(access, "installations.read");
  const db = await getDb();
  return db
    .select({ id: users.id, name: users.name, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(memberships.userId, users.id))
    .where(eq(memberships.organisationId, access.organisation.id))
    .orderBy(asc(users.name));
}

// ---------------------------------------------------------------------------------------- checklist

export interface ChecklistItem {
  id: string;
  label: string;
  valueLabel: string | null;
  position: number;
}

export async function listChecklistItems(access: AccessContext): Promise<ChecklistItem[]> {
  assertCan(access, "installations.read");
  const db = await getDb();
  return db
    .select({ id: installationChecklistItems.id, label: installationChecklistItems.label, valueLabel: installationChecklistItems.valueLabel, position: installationChecklistItems.position })
    .from(installationChecklistItems)
    .where(and(eq(installationChecklistItems.organisationId, access.organisation.id), isNull(installationChecklistItems.archivedAt)))
    .orderBy(asc(installationChecklistItems.position));
}

export async function addChecklistItem(access: AccessContext, input: { label: string; valueLabel?: string }): Promise<string> {
  assertCan(access, "installations.checklist");
  const db = await getDb();
  const [last] = await db
    .select({ position: sql<number>`coalesce(max(${installationChecklistItems.position}), 0)` })
    .from(installationChecklistItems)
    .where(eq(installationChecklistItems.organisationId, access.organisation.id));
  const id = newId();
  await db.insert(installationChecklistItems).values({ id, organisationId: access.organisation.id, label: input.label, valueLabel: input.valueLabel ?? null, position: (last?.position ?? 0) + 1 });
  return id;
}

/** Takes an item off the checklist for new records; records already ticked keep their copy of it. */
export async function removeChecklistItem(access: AccessContext, itemId: string): Promise<boolean> {
  assertCan(access, "installations.checklist");
  const db = await getDb();
  const done = await db
    .update(installationChecklistItems)
    .set({ archivedAt: new Date() })
    .where(and(eq(installationChecklistItems.id, itemId), eq(installationChecklistItems.organisationId, access.organisation.id), isNull(installationChecklistItems.archivedAt)))
    .returning({ id: installationChecklistItems.id });
  return done.length === 1;
}

// ------------------------------------------------------------------------------------------ records

/** A fleet manager sees the records of the fleet's own vehicles; everyone else with read access sees all of the organisation's. */
function scope(access: AccessContext): SQL[] {
  const where: SQL[] = [eq(installationRecords.organisationId, access.organisation.id)];
  if (access.role === "fleet_manager") where.push(isNotNull(installationRecords.vehicleProfileId));
  return where;
}

export interface InstallationListRow {
  id: string;
  fittedOn: string;
  state: InstallationState;
  customerName: string;
  vehicleLabel: string;
  vehicleProfileId: string | null;
  installerName: string | null;
  customerConfirmedAt: number | null;
}

export interface InstallationListPage {
  rows: InstallationListRow[];
  total: number;
  page: number;
  pageCount: number;
}

export async function listInstallations(access: AccessContext, query: ListInstallationsQuery): Promise<InstallationListPage> {
  assertCan(access, "installations.read");
  const db = await getDb();
  const where = scope(access);
  if (query.state) where.push(eq(installationRecords.state, query.state));
  if (query.installer) where.push(eq(installationRecords.installerUserId, query.installer));
  if (query.from) where.push(gte(installationRecords.fittedOn, query.from));
  if (query.to) where.push(lte(installationRecords.fittedOn, query.to));
  if (query.vehicle) where.push(eq(installationRecords.vehicleProfileId, query.vehicle));
  const [{ total } = { total: 0 }] = await db.select({ total: count() }).from(installationRecords).where(and(...where));
  const pageCount = Math.max(1, Math.ceil(total / query.pageSize));
  const page = Math.min(query.page, pageCount);
  const rows = await db
    .select({
      id: installationRecords.id,
      fittedOn: installationRecords.fittedOn,
      state: installationRecords.state,
      customerName: installationRecords.customerName,
      vehicleLabel: installationRecords.vehicleDescription,
      vehicleProfileId: installationRecords.vehicleProfileId,
      profileName: vehicleProfiles.name,
      installerName: users.name,
      customerConfirmedAt: installationRecords.customerConfirmedAt,
    })
    .from(installationRecords)
    .leftJoin(users, eq(installationRecords.installerUserId, users.id))
    .leftJoin(vehicleProfiles, eq(installationRecords.vehicleProfileId, vehicleProfiles.id))
    .where(and(...where))
    .orderBy(desc(installationRecords.fittedOn), desc(installationRecords.createdAt))
    .limit(query.pageSize)
    .offset((page - 1) * query.pageSize);
  return {
    rows: rows.map(({ profileName, ...row }) => ({ ...row, vehicleLabel: profileName ?? row.vehicleLabel, customerConfirmedAt: row.customerConfirmedAt?.getTime() ?? null })),
    total,
    page,
    pageCount,
  };
}

export interface InstallationRecord {
  id: string;
  units: UnitSystem;
  vehicleProfileId: string | null;
  vehicleLabel: string;
  vehicle: CustomerVehicle | null;
  customerName: string;
  customerEmail: string | null;
  installerUserId: string | null;
  installerName: string | null;
  fittedOn: string;
  state: InstallationState;
  hitch: FittedHitch;
  parts: FittedPart[];
  measurements: Measurements;
  checklist: ChecklistEntry[];
  carrierDepth: number | null;
  note: string | null;
  appliedToProfileAt: number | null;
  handedOverAt: number | null;
  customerConfirmedAt: number | null;
  updatedAt: number;
}

async function loadRecord(organisationId: string, id: string, extra: SQL[] = []): Promise<InstallationRecord | undefined> {
  const db = await getDb();
  const row = await db
    .select({ record: installationRecords, installerName: users.name, profileName: vehicleProfiles.name })
    .from(installationRecords)
    .leftJoin(users, eq(installationRecords.installerUserId, users.id))
    .leftJoin(vehicleProfiles, eq(installationRecords.vehicleProfileId, vehicleProfiles.id))
    .where(and(eq(installationRecords.id, id), eq(installationRecords.organisationId, organisationId), ...extra))
    .get();
  if (!row) return undefined;
  const r = row.record;
  return {
    id: r.id,
    units: r.units,
    vehicleProfileId: r.vehicleProfileId,
    vehicleLabel: row.profileName ?? r.vehicleDescription,
    vehicle: (r.vehicle as CustomerVehicle | null) ?? null,
    customerName: r.customerName,
    customerEmail: r.customerEmail,
    installerUserId: r.installerUserId,
    installerName: row.installerName,
    fittedOn: r.fittedOn,
    state: r.state,
    hitch: r.hitch as FittedHitch,
    parts: r.parts as FittedPart[],
    measurements: r.measurements as Measurements,
    checklist: r.checklist as ChecklistEntry[],
    carrierDepth: r.carrierDepth,
    note: r.note,
    appliedToProfileAt: r.appliedToProfileAt?.getTime() ?? null,
    handedOverAt: r.handedOverAt?.getTime() ?? null,
    customerConfirmedAt: r.customerConfirmedAt?.getTime() ?? null,
    updatedAt: r.updatedAt.getTime(),
  };
}

export async function getInstallation(access: AccessContext, id: string): Promise<InstallationRecord | undefined> {
  assertCan(access, "installations.read");
  const where = access.role === "fleet_manager" ? [isNotNull(installationRecords.vehicleProfileId)] : [];
  return loadRecord(access.organisation.id, id, where);
}

/** The vehicle's ratings the allowance needs, in the record's units: the profile's (as it stands) or the customer's vehicle as typed. */
async function vehicleRatingsOf(organisationId: string, record: InstallationRecord): Promise<CustomerVehicle> {
  if (!record.vehicleProfileId) return record.vehicle ?? {};
  const db = await getDb();
  const profile = await db
    .select({ units: vehicleProfiles.units, data: vehicleProfiles.data })
    .from(vehicleProfiles)
    .where(and(eq(vehicleProfiles.id, record.vehicleProfileId), eq(vehicleProfiles.organisationId, organisationId)))
    .get();
  if (!profile) return record.vehicle ?? {};
  const data = profile.data as Partial<RigInput>;
  const rig = { units: profile.units, vehicle: data.vehicle ?? {} } as RigInput;
  const vehicle = (profile.units === record.units ? rig : convertRig(rig, record.units)).vehicle;
  return {
    towRating: vehicle.towRating,
    towRatingWd: vehicle.towRatingWd,
    tongueWeightLimit: vehicle.tongueWeightLimit,
    tongueWeightLimitWd: vehicle.tongueWeightLimitWd,
    departureAngle: vehicle.departureAngle,
  };
}

export function allowanceInput(record: InstallationRecord, vehicle: CustomerVehicle): HitchAllowanceInput {
  const m = record.measurements;
  return {
    units: record.units,
    vehicle,
    hitch: { ...record.hitch, receiverHeight: m.receiverHeight?.value, pinToFascia: m.pinToFascia?.value },
    rearAxleToPin: m.rearAxleToPin?.value,
    parts: record.parts,
    carrier: record.carrierDepth !== null ? { depth: record.carrierDepth } : undefined,
  };
}

/** What this hitch allows, worked out by the core from the record (and the vehicle profile's ratings). */
export async function allowanceOf(organisationId: string, record: InstallationRecord): Promise<HitchAllowance> {
  return hitchAllowance(allowanceInput(record, await vehicleRatingsOf(organisationId, record)));
}

export type SaveInstallationResult = { ok: true; id: string; appliedToProfile: boolean } | { ok: false; field?: string; message: string };

/** A record's figures as they go into the profile, converted to the profile's units. */
function profileFigures(record: { units: UnitSystem; hitch: FittedHitch; measurements: Measurements }, profileUnits: UnitSystem) {
  const m = record.measurements;
  const rig = {
    units: record.units,
    vehicle: m.rearAxleToPin ? { rearAxleToPin: m.rearAxleToPin.value } : {},
    hitch: { ...record.hitch, ...(m.receiverHeight ? { receiverHeight: m.receiverHeight.value } : {}), ...(m.pinToFascia ? { pinToFascia: m.pinToFascia.value } : {}) },
  } as RigInput;
  return record.units === profileUnits ? rig : convertRig(rig, profileUnits);
}

/**
 * Creates or edits a record. When it is fitted (or handed over) and its vehicle is a fleet profile, the
 * hitch as fitted and the measurements replace the profile's, with their date and this record as their
 * source, in the same transaction: the counter check, the pairings and the fleet read them from then on.
 */
export async function saveInstallation(access: AccessContext, input: InstallationRecordInput): Promise<SaveInstallationResult> {
  assertCan(access, "installations.edit");
  const db = await getDb();
  const organisationId = access.organisation.id;
  let existing: InstallationRecord | undefined;
  if (input.id) {
    existing = await loadRecord(organisationId, input.id);
    if (!existing) return { ok: false, message: "No such installation record in this organisation." };
  }
  const members = new Map((await listInstallers(access)).map((m) => [m.id, m.name]));
  if (!members.has(input.installerUserId)) return { ok: false, field: "installerUserId", message: "Installer: choose a member of this organisation." };
  for (const key of MEASUREMENT_KEYS) {
    const by = input.measurements[key]?.measuredByUserId;
    if (by && !members.has(by)) return { ok: false, field: `measurements.${key}.measuredByUserId`, message: "Measured by: choose a member of this organisation." };
  }
  let profile: { id: string; name: string; units: UnitSystem; data: unknown; figureSources: unknown } | undefined;
  if (input.vehicleProfileId) {
    profile = await db
      .select({ id: vehicleProfiles.id, name: vehicleProfiles.name, units: vehicleProfiles.units, data: vehicleProfiles.data, figureSources: vehicleProfiles.figureSources })
      .from(vehicleProfiles)
      .where(and(eq(vehicleProfiles.id, input.vehicleProfileId), eq(vehicleProfiles.organisationId, organisationId)))
      .get();
    if (!profile) return { ok: false, field: "vehicleProfileId", message: "Vehicle: no such fleet vehicle in this organisation." };
  }
  const items = await listChecklistItems(access);
  const known = new Map(items.map((item) => [item.id, item]));
  const previous = new Map((existing?.checklist ?? []).map((entry) => [entry.itemId, entry]));
  const checklist: ChecklistEntry[] = [];
  for (const entry of input.checklist) {
    const item = known.get(entry.itemId) ?? previous.get(entry.itemId);
    if (!item) return { ok: false, field: "checklist", message: "Checklist: an item is not on this shop's checklist." };
    const valueLabel = "valueLabel" in item ? (item.valueLabel ?? undefined) : undefined;
    checklist.push({ itemId: entry.itemId, label: item.label, valueLabel: valueLabel || undefined, done: entry.done, value: entry.value });
  }
  const clean = <T extends object>(value: T) => Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as T;
  const measurements: Measurements = {};
  for (const key of MEASUREMENT_KEYS) {
    const m = input.measurements[key];
    if (m?.value !== undefined) measurements[key] = clean({ value: m.value as number, method: m.method, measuredByUserId: m.measuredByUserId });
  }
  const hitch = clean(input.hitch as FittedHitch);
  const parts = input.parts.map((part) => clean(part as FittedPart));
  const vehicle = profile ? null : input.vehicle ? clean(input.vehicle as CustomerVehicle) : null;
  const state: InstallationState = existing?.state === "handed-over" ? "handed-over" : input.state;
  const now = new Date();
  const applies = Boolean(profile) && state !== "planned";
  const values = {
    units: input.units,
    vehicleProfileId: profile?.id ?? null,
    vehicleDescription: profile?.name ?? input.vehicleDescription ?? "",
    vehicle,
    customerName: input.customerName,
    customerEmail: input.customerEmail ?? null,
    installerUserId: input.installerUserId,
    fittedOn: input.fittedOn,
    state,
    hitch,
    parts,
    measurements,
    checklist,
    carrierDepth: (input.carrierDepth as number | undefined) ?? null,
    note: input.note ?? null,
    updatedAt: now,
    ...(applies ? { appliedToProfileAt: now } : {}),
  };
  const id = existing?.id ?? newId();
  await db.transaction(async (tx) => {
    if (existing) await tx.update(installationRecords).set(values).where(and(eq(installationRecords.id, id), eq(installationRecords.organisationId, organisationId)));
    else await tx.insert(installationRecords).values({ id, organisationId, createdByUserId: access.user.id, ...values });
    if (applies && profile) {
      const figures = profileFigures({ units: input.units, hitch, measurements }, profile.units);
      const data = { ...(profile.data as Record<string, unknown>) } as Record<string, Record<string, unknown>>;
      data.vehicle = { ...(data.vehicle ?? {}), ...figures.vehicle };
      data.hitch = { ...(data.hitch ?? {}), ...figures.hitch };
      const sources: FigureSources = { ...((profile.figureSources as FigureSources | null) ?? {}) };
      for (const key of MEASUREMENT_KEYS) {
        const m = measurements[key];
        if (m) sources[PROFILE_PATHS.measurements[key]] = clean({ recordId: id, fittedOn: input.fittedOn, kind: "measured" as const, method: m.method, measuredBy: m.measuredByUserId ? members.get(m.measuredByUserId) : undefined });
      }
      for (const [key, path] of Object.entries(PROFILE_PATHS.hitch)) if (hitch[key as keyof FittedHitch] !== undefined) sources[path] = { recordId: id, fittedOn: input.fittedOn, kind: "label" };
      await tx.update(vehicleProfiles).set({ data, figureSources: sources, updatedAt: now }).where(and(eq(vehicleProfiles.id, profile.id), eq(vehicleProfiles.organisationId, organisationId)));
    }
  });
  return { ok: true, id, appliedToProfile: applies };
}

/** The figure sources of one vehicle profile of this organisation (rig path → record and date). */
export async function figureSourcesOf(access: AccessContext, vehicleProfileId: string): Promise<FigureSources> {
  assertCan(access, "fleet.read");
  const db = await getDb();
  const row = await db
    .select({ figureSources: vehicleProfiles.figureSources })
    .from(vehicleProfiles)
    .where(and(eq(vehicleProfiles.id, vehicleProfileId), eq(vehicleProfiles.organisationId, access.organisation.id)))
    .get();
  return (row?.figureSources as FigureSources | null) ?? {};
}

/** Figure sources of every vehicle of the organisation, for the check screen's pickers and the pairings. */
export async function figureSourcesByVehicle(access: AccessContext, ids?: string[]): Promise<Record<string, FigureSources>> {
  assertCan(access, "fleet.read");
  const db = await getDb();
  const where = [eq(vehicleProfiles.organisationId, access.organisation.id), isNotNull(vehicleProfiles.figureSources)];
  if (ids) where.push(inArray(vehicleProfiles.id, ids.length ? ids : ["-"]));
  const rows = await db.select({ id: vehicleProfiles.id, figureSources: vehicleProfiles.figureSources }).from(vehicleProfiles).where(and(...where));
  return Object.fromEntries(rows.map((row) => [row.id, row.figureSources as FigureSources]));
}

/** The records of one vehicle profile, newest first. */
export async function installationsOfVehicle(access: AccessContext, vehicleProfileId: string) {
  return (await listInstallations(access, { vehicle: vehicleProfileId, page: 1, pageSize: 50 })).rows;
}

// ------------------------------------------------------------------------------------------ hand-over

export type HandOverResult =
  | { ok: true; url: string; token: string; expiresAt: Date | null; mailed: boolean | null }
  | { ok: false; field?: string; message: string };

/**
 * Hands the record over: the state becomes "handed over", a customer link is made (shown once), and when an
 * address is given the link is mailed. Mail goes after the write, outside any transaction.
 */
export async function handOverInstallation(access: AccessContext, recordId: string, options: { email?: string; expiresInDays?: number }): Promise<HandOverResult> {
  assertCan(access, "installations.edit");
  const record = await loadRecord(access.organisation.id, recordId);
  if (!record) return { ok: false, message: "No such installation record in this organisation." };
  if (record.state === "planned") return { ok: false, message: "Record the fitting first: a planned installation cannot be handed over." };
  const link = await createInstallationLink(access, recordId, options.expiresInDays);
  if (!link) return { ok: false, message: "No such installation record in this organisation." };
  const db = await getDb();
  await db
    .update(installationRecords)
    .set({ state: "handed-over", handedOverAt: record.handedOverAt ? new Date(record.handedOverAt) : new Date(), updatedAt: new Date(), ...(options.email ? { customerEmail: options.email } : {}) })
    .where(and(eq(installationRecords.id, recordId), eq(installationRecords.organisationId, access.organisation.id)));
  let mailed: boolean | null = null;
  if (options.email) {
    const mail = composeMail({
      heading: `Your hitch from ${access.organisation.name}: what it allows`,
      paragraphs: [
        `Hello ${record.customerName}.`,
        `${access.organisation.name} fitted a hitch to your ${record.vehicleLabel} on ${record.fittedOn}. The link shows what was fitted and measured, and what the hitch allows: the heaviest trailer and tongue weight, with and without weight distribution, and what racks and carriers fit.`,
        "Ratings come from the vehicle maker and the labels; the lowest one governs. Weigh the loaded rig, follow each maker's instructions and torque values; local law and a licensed installer have the last word.",
      ],
      actionLabel: "See what your hitch allows",
      actionUrl: link.url,
      footer: `Sent by ${access.organisation.name} through Towmargin. The link needs no account.`,
    });
    mailed = await sendMail({ to: options.email, subject: `Your hitch from ${access.organisation.name}: what it allows`, ...mail });
  }
  return { ok: true, url: link.url, token: link.token, expiresAt: link.expiresAt, mailed };
}

export { listInstallationLinks };

export interface HandOverView {
  shopName: string;
  record: InstallationRecord;
  allowance: HitchAllowance;
  measuredBy: Record<string, string>;
}

/** What the customer's page shows, from the link's token alone. Withdrawn, expired or unknown: nothing. */
export async function handOverByToken(token: string): Promise<HandOverView | undefined> {
  const link = await resolveInstallationToken(token);
  if (link.status !== "ok") return undefined;
  const record = await loadRecord(link.organisationId, link.recordId);
  if (!record) return undefined;
  return { shopName: link.shopName, record, allowance: await allowanceOf(link.organisationId, record), measuredBy: await measuredByNames(link.organisationId, record) };
}

async function measuredByNames(organisationId: string, record: InstallationRecord): Promise<Record<string, string>> {
  const ids = [...new Set(MEASUREMENT_KEYS.map((key) => record.measurements[key]?.measuredByUserId).filter((id): id is string => Boolean(id)))];
  if (!ids.length) return {};
  const db = await getDb();
  const rows = await db
    .select({ id: users.id, name: users.name })
    .from(users)
    .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.organisationId, organisationId)))
    .where(inArray(users.id, ids));
  return Object.fromEntries(rows.map((row) => [row.id, row.name]));
}

export async function measuredByOf(access: AccessContext, record: InstallationRecord) {
  assertCan(access, "installations.read");
  return measuredByNames(access.organisation.id, record);
}

/** The customer confirms on their page that they have read the limits; the first confirmation's time is kept. */
export async function confirmLimitsByToken(token: string): Promise<{ ok: true; confirmedAt: Date } | { ok: false }> {
  const link = await resolveInstallationToken(token, { touch: false });
  if (link.status !== "ok") return { ok: false };
  const db = await getDb();
  const now = new Date();
  await db
    .update(installationRecords)
    .set({ customerConfirmedAt: now })
    .where(and(eq(installationRecords.id, link.recordId), eq(installationRecords.organisationId, link.organisationId), isNull(installationRecords.customerConfirmedAt)));
  const row = await db.select({ at: installationRecords.customerConfirmedAt }).from(installationRecords).where(eq(installationRecords.id, link.recordId)).get();
  return { ok: true, confirmedAt: row?.at ?? now };
}

export function handOverUrl(token: string) {
  return absoluteUrl(`/r/${token}`);
}

// ------------------------------------------------------------------------------------------ photos

export interface InstallationPhoto {
  id: string;
  kind: "hitch-label" | "fitted-hitch" | "other";
  fileName: string;
  contentType: string;
  sizeBytes: number;
  createdAt: number;
}

export async function listInstallationPhotos(access: AccessContext, recordId: string): Promise<InstallationPhoto[]> {
  assertCan(access, "installations.read");
  const db = await getDb();
  const rows = await db
    .select({ id: installationPhotos.id, kind: installationPhotos.kind, fileName: installationPhotos.fileName, contentType: installationPhotos.contentType, sizeBytes: installationPhotos.sizeBytes, createdAt: installationPhotos.createdAt })
    .from(installationPhotos)
    .where(and(eq(installationPhotos.organisationId, access.organisation.id), eq(installationPhotos.installationRecordId, recordId)))
    .orderBy(desc(installationPhotos.createdAt));
  return rows.map((row) => ({ ...row, createdAt: row.createdAt.getTime() }));
}

export type PhotoUploadResult = { ok: true; photo: InstallationPhoto } | { ok: false; status: 400 | 404 | 413; field: string; message: string };

/** Stores a photo of the hitch label or the fitted hitch with a record of this organisation, through the document store. */
export async function uploadInstallationPhoto(access: AccessContext, recordId: string, kind: InstallationPhoto["kind"], file: { name: string; bytes: Uint8Array }): Promise<PhotoUploadResult> {
  assertCan(access, "installations.edit");
  const db = await getDb();
  const organisationId = access.organisation.id;
  const record = await db.select({ id: installationRecords.id }).from(installationRecords).where(and(eq(installationRecords.id, recordId), eq(installationRecords.organisationId, organisationId))).get();
  if (!record) return { ok: false, status: 404, field: "recordId", message: "No such installation record in this organisation." };
  const checked = await checkDocumentBytes(file);
  if (!checked.ok) return checked;
  const id = newId();
  const storageKey = `${organisationId.replace(/[^A-Za-z0-9_-]/g, "_")}/installations/${id}.${checked.extension}`;
  await documentStore().put(storageKey, file.bytes, checked.mime);
  const photo = { id, kind, fileName: cleanFileName(file.name, checked.extension), contentType: checked.mime, sizeBytes: file.bytes.byteLength };
  try {
    await db.insert(installationPhotos).values({ ...photo, organisationId, installationRecordId: recordId, storageKey, uploadedByUserId: access.user.id });
  } catch (error) {
    await documentStore().delete(storageKey);
    throw error;
  }
  return { ok: true, photo: { ...photo, createdAt: Date.now() } };
}

export async function openInstallationPhoto(access: AccessContext, id: string): Promise<{ photo: InstallationPhoto; object: StoredObject } | undefined> {
  assertCan(access, "installations.read");
  const db = await getDb();
  const row = await db
    .select({ photo: installationPhotos })
    .from(installationPhotos)
    .innerJoin(installationRecords, eq(installationPhotos.installationRecordId, installationRecords.id))
    .where(and(eq(installationPhotos.id, id), ...scope(access)))
    .get();
  if (!row) return undefined;
  const object = await documentStore().get(row.photo.storageKey);
  if (!object) return undefined;
  const p = row.photo;
  return { photo: { id: p.id, kind: p.kind, fileName: p.fileName, contentType: p.contentType, sizeBytes: p.sizeBytes, createdAt: p.createdAt.getTime() }, object };
}
