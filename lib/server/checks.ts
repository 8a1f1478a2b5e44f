import "server-only";
import { and, asc, count, desc, eq, gte, like, lt, sql, type SQL } from "drizzle-orm";
import { getDb, type Database } from "@/db/client";
import { savedChecks, users } from "@/db/schema";
import { can } from "@/lib/roles";
import { evaluateRig } from "@/lib/towing";
import { placeFrom } from "@/lib/towing/rules/places";
import type { RigResult, VerdictLevel } from "@/lib/towing/types";
import type { RigInput } from "@/lib/towing/input";
import type { ListChecksQuery, SaveCheckInput } from "@/lib/validation/checks";
import type { AccessContext } from "./access";
import { matchVehicleProfileName } from "./profiles";
import { AccessDenied } from "./access-denied";
import { newId } from "./tokens";

const TRAILER_WORDS: Record<string, string> = {
  utility: "Utility trailer",
  "enclosed-cargo": "Enclosed cargo trailer",
  travel: "Travel trailer",
  boat: "Boat trailer",
  "car-hauler": "Car hauler",
  "horse-livestock": "Horse or livestock trailer",
  other: "Trailer",
};
const ACCESSORY_WORDS: Record<string, string> = {
  "platform-rack": "Platform rack",
  "hanging-rack": "Hanging rack",
  "cargo-carrier": "Cargo carrier",
  other: "Hitch-mounted accessory",
};

export function hitchedLabel(rig: RigInput): string {
  if (rig.trailer) return TRAILER_WORDS[rig.trailer.type] ?? "Trailer";
  if (rig.accessory) return ACCESSORY_WORDS[rig.accessory.type] ?? "Accessory";
  return "Nothing hitched";
}

const placeholder = (name: string) => sql.placeholder(name);

/**
 * The insert of a saved check, built once per database: Drizzle builds an insert's SQL again on every call
 * otherwise. Each value still goes through its column's own mapping (the deflated result, the JSON rig).
 */
const inserts = new WeakMap<Database, ReturnType<typeof prepareInsert>>();
function prepareInsert(db: Database) {
  return db
    .insert(savedChecks)
    .values({
      id: placeholder("id"),
      organisationId: placeholder("organisationId"),
      createdByUserId: placeholder("createdByUserId"),
      customerName: placeholder("customerName"),
      note: placeholder("note"),
      vehicleLabel: placeholder("vehicleLabel"),
      hitchedLabel: placeholder("hitchedLabel"),
      level: placeholder("level"),
      complete: placeholder("complete"),
      units: placeholder("units"),
      rig: placeholder("rig"),
      result: placeholder("result"),
      coreVersion: placeholder("coreVersion"),
    })
    .prepare();
}

/**
 * Stores a check as an immutable snapshot. The result is computed here, on the server, with the
 * organisation's tight threshold and front-axle loss limit: a client's own figures are never stored as if they were the core's.
 */
export async function saveCheck(access: AccessContext, input: SaveCheckInput): Promise<{ id: string; result: RigResult }> {
  if (!can(access.role, "checks.save")) throw new AccessDenied("checks.save");
  const place = input.place === undefined ? placeFrom(access.organisation.country, access.organisation.region) : (input.place ?? undefined);
  const result = evaluateRig(input.rig, { tightMarginRatio: access.organisation.tightMarginRatio, frontAxleLossLimit: access.organisation.frontAxleLossRatio, place });
  const vehicleLabel = input.rig.name?.trim() || (await matchVehicleProfileName(access, input.rig)) || "Typed vehicle";
  const id = newId();
  const db = await getDb();
  let insert = inserts.get(db);
  if (!insert) inserts.set(db, (insert = prepareInsert(db)));
  await insert.run({
    id,
    organisationId: access.organisation.id,
    createdByUserId: access.user.id,
    customerName: input.customerName ?? null,
    note: input.note ?? null,
    vehicleLabel,
    hitchedLabel: hitchedLabel(input.rig),
    level: result.verdict.level,
    complete: result.verdict.complete,
    units: input.rig.units,
    rig: input.rig,
    result,
    coreVersion: result.coreVersion,
  });
  return { id, result };
}

export interface CheckListRow {
  id: string;
  createdAt: string;
  customerName: string | null;
  vehicleLabel: string | null;
  hitchedLabel: string | null;
  level: VerdictLevel;
  complete: boolean;
  createdBy: string | null;
}

export interface CheckListPage {
  rows: CheckListRow[];
  total: number;
  page: number;
  pageSize: number;
  pageCount: number;
}

const escapeLike = (value: string) => value.replace(/[\\%_]/g, (c) => `\\${c}`);

/** One page of the organisation's saved checks, filtered and sorted on the database. */
export async function listChecks(access: AccessContext, query: ListChecksQuery): Promise<CheckListPage> {
  if (!can(access.role, "checks.run")) throw new AccessDenied("checks.run");
  const db = await getDb();
  const filters: SQL[] = [eq(savedChecks.organisationId, access.organisation.id)];
  if (query.vehicle) filters.push(like(savedChecks.vehicleLabel, `%${escapeLike(query.vehicle)}%`));
  if (query.customer) filters.push(like(savedChecks.customerName, `%${escapeLike(query.customer)}%`));
  if (query.level) filters.push(eq(savedChecks.level, query.level));
  if (query.from) filters.push(gte(savedChecks.createdAt, new Date(`${query.from}T00:00:00Z`)));
  if (query.to) filters.push(lt(savedChecks.createdAt, new Date(new Date(`${query.to}T00:00:00Z`).getTime() + 86_400_000)));
  const where = and(...filters);
  const column = {
    createdAt: savedChecks.createdAt,
    customerName: savedChecks.customerName,
    vehicleLabel: savedChecks.vehicleLabel,
    level: sql`CASE ${savedChecks.level} WHEN 'within' THEN 0 WHEN 'tight' THEN 1 WHEN 'adjust' THEN 2 WHEN 'incomplete' THEN 3 ELSE 4 END`,
  }[query.sort];
  const order = query.dir === "asc" ? asc(column) : desc(column);
  const [totalRow, rows] = await Promise.all([
    db.select({ total: count() }).from(savedChecks).where(where).get(),
    db
      .select({
        id: savedChecks.id,
        createdAt: savedChecks.createdAt,
        customerName: savedChecks.customerName,
        vehicleLabel: savedChecks.vehicleLabel,
        hitchedLabel: savedChecks.hitchedLabel,
        level: savedChecks.level,
        complete: savedChecks.complete,
        createdBy: users.name,
      })
      .from(savedChecks)
      .leftJoin(users, eq(savedChecks.createdByUserId, users.id))
      .where(where)
      .orderBy(order, desc(savedChecks.createdAt), asc(savedChecks.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
  ]);
  const total = totalRow?.total ?? 0;
  return {
    rows: rows.map((row) => ({ ...row, createdAt: row.createdAt.toISOString() })),
    total,
    page: query.page,
    pageSize: query.pageSize,
    pageCount: Math.max(1, Math.ceil(total / query.pageSize)),
  };
}

/** One saved check of this organisation, or undefined (another organisation's id reads as not found). */
export async function getCheck(access: AccessContext, id: string) {
  if (!can(access.role, "checks.run")) throw new AccessDenied("checks.run");
  const db = await getDb();
  const row = await db
    .select()
    .from(savedChecks)
    .where(and(eq(savedChecks.id, id), eq(savedChecks.organisationId, access.organisation.id)))
    .get();
  if (!row) return undefined;
  return { ...row, rig: row.rig as RigInput, result: row.result as RigResult };
}
