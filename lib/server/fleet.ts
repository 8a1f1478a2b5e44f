import "server-only";
import { createHash } from "node:crypto";
import { and, asc, desc, eq, isNotNull, isNull, ne, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import { accessoryProfiles, savedChecks, trailerProfiles, vehicleProfiles } from "@/db/schema";
import { exportFleetCsv, parseFleetCsv, type ParsedImport, type UnitsChoice } from "@/lib/fleet/csv";
import { KIND_WORDS, SECTIONS_BY_KIND, type ProfileKind } from "@/lib/fleet/fields";
import { can, type Permission } from "@/lib/roles";
import { evaluatePair, hitchedWeight, profilePart, vehicleCapacity, type HitchedWeight, type MatrixCell, type VehicleCapacity } from "@/lib/fleet/matrix";
import type { RigInput } from "@/lib/towing/input";
import { CORE_VERSION } from "@/lib/towing/version";
import type { VerdictLevel } from "@/lib/towing/types";
import type { UnitSystem } from "@/lib/towing/units";
import type { ImportOptions, MatrixHitchedSort, MatrixQuery, MatrixVehicleSort, ProfileInput } from "@/lib/validation/fleet";
import type { AccessContext } from "./access";
import { figureSourcesByVehicle } from "./installations";
import { AccessDenied } from "./access-denied";
import { newId } from "./tokens";
import { pairKey, recheckPairs, recheckPairsSoon, storedCells, storedCounts, storedVerdictsReady, storedWithLevel, type PairScope, type PairSource } from "./pair-verdicts";

function assertCan(access: AccessContext, permission: Permission) {
  if (!can(access.role, permission)) throw new AccessDenied(permission);
}

const TABLES = { vehicles: vehicleProfiles, trailers: trailerProfiles, accessories: accessoryProfiles } as const;
type ProfileTable = (typeof TABLES)[ProfileKind];

export interface FleetProfile {
  id: string;
  name: string;
  units: UnitSystem;
  /** The core's input parts of this kind (no name, no units). */
  data: Record<string, unknown>;
  archivedAt: number | null;
  updatedAt: number;
}

function toProfile(row: { id: string; name: string; units: UnitSystem; data: unknown; archivedAt: Date | null; updatedAt: Date }): FleetProfile {
  const { units: _units, ...data } = (row.data ?? {}) as Record<string, unknown>;
  return { id: row.id, name: row.name, units: row.units, data, archivedAt: row.archivedAt?.getTime() ?? null, updatedAt: row.updatedAt.getTime() };
}

/** The stored `data`: the profile's sections with its units, the shape `listProfilesForCheck` hands the check screen. */
function storedData(kind: ProfileKind, input: ProfileInput): Record<string, unknown> {
  const data: Record<string, unknown> = { units: input.units };
  for (const section of SECTIONS_BY_KIND[kind]) {
    const value = (input as Record<string, unknown>)[section];
    if (value !== undefined) data[section] = value;
  }
  return data;
}

export async function listFleetProfiles(
  access: AccessContext,
  kind: ProfileKind,
  archived: "include" | "only" | "exclude" = "exclude",
): Promise<FleetProfile[]> {
  assertCan(access, "fleet.read");
  const db = await getDb();
  const table: ProfileTable = TABLES[kind];
  const where: SQL[] = [eq(table.organisationId, access.organisation.id)];
  if (archived === "exclude") where.push(isNull(table.archivedAt));
  if (archived === "only") where.push(isNotNull(table.archivedAt));
  const rows = await db
    .select({ id: table.id, name: table.name, units: table.units, data: table.data, archivedAt: table.archivedAt, updatedAt: table.updatedAt })
    .from(table)
    .where(and(...where))
    .orderBy(asc(table.name));
  return rows.map(toProfile);
}

export async function getFleetProfile(access: AccessContext, kind: ProfileKind, id: string): Promise<FleetProfile | undefined> {
  assertCan(access, "fleet.read");
  const db = await getDb();
  const table: ProfileTable = TABLES[kind];
  const row = await db
    .select({ id: table.id, name: table.name, units: table.units, data: table.data, archivedAt: table.archivedAt, updatedAt: table.updatedAt })
    .from(table)
    .where(and(eq(table.id, id), eq(table.organisationId, access.organisation.id)))
    .get();
  return row ? toProfile(row) : undefined;
}

export type SaveProfileResult = { ok: true; id: string } | { ok: false; field?: string; message: string };

async function nameTaken(kind: ProfileKind, organisationId: string, name: string, exceptId?: string): Promise<boolean> {
  const db = await getDb();
  const table: ProfileTable = TABLES[kind];
  const where = [eq(table.organisationId, organisationId), sql`lower(${table.name}) = lower(${name})`];
  if (exceptId) where.push(ne(table.id, exceptId));
  return Boolean(await db.select({ id: table.id }).from(table).where(and(...where)).get());
}

/** Creates a profile, or updates one of this organisation (another's is "not found"). Names are unique per kind. */
export async function saveFleetProfile(access: AccessContext, kind: ProfileKind, id: string | undefined, input: ProfileInput): Promise<SaveProfileResult> {
  assertCan(access, "fleet.edit");
  const db = await getDb();
  const table: ProfileTable = TABLES[kind];
  const organisationId = access.organisation.id;
  if (id) {
    const existing = await db.select({ id: table.id }).from(table).where(and(eq(table.id, id), eq(table.organisationId, organisationId))).get();
    if (!existing) return { ok: false, message: `No such ${KIND_WORDS[kind].one} in this organisation.` };
  }
  if (await nameTaken(kind, organisationId, input.name, id)) {
    return { ok: false, field: "name", message: `Another ${KIND_WORDS[kind].one} is already called “${input.name}”.` };
  }
  const data = storedData(kind, input);
  if (id) {
    await db
      .update(table)
      .set({ name: input.name, units: input.units, data, updatedAt: new Date() })
      .where(and(eq(table.id, id), eq(table.organisationId, organisationId)));
    recheckAfterChange(access);
    return { ok: true, id };
  }
  const newProfileId = newId();
  await db.insert(table).values({ id: newProfileId, organisationId, name: input.name, units: input.units, data });
  recheckAfterChange(access);
  return { ok: true, id: newProfileId };
}

/** Archives (or restores) a profile: it leaves the pickers and the matrix but stays on record. */
export async function setProfileArchived(access: AccessContext, kind: ProfileKind, id: string, archived: boolean): Promise<boolean> {
  assertCan(access, "fleet.edit");
  const db = await getDb();
  const table: ProfileTable = TABLES[kind];
  const result = await db
    .update(table)
    .set({ archivedAt: archived ? new Date() : null, updatedAt: new Date() })
    .where(and(eq(table.id, id), eq(table.organisationId, access.organisation.id)))
    .returning({ id: table.id });
  if (result.length > 0) recheckAfterChange(access);
  return result.length > 0;
}

export interface ImportOutcome extends ParsedImport {
  imported: number;
  /** What happened: nothing asked (a preview), written, or refused because a row had errors in all-or-nothing. */
  outcome: "preview" | "imported" | "refused" | "nothing-to-import";
}

/**
 * Reads a CSV against the organisation's names, then (unless previewing) writes its valid rows in one
 * transaction. "all-or-nothing" writes nothing when any row has an error; "valid-rows" skips those rows.
 */
export async function importFleetProfiles(access: AccessContext, text: string, options: ImportOptions): Promise<ImportOutcome> {
  assertCan(access, options.mode === "preview" ? "fleet.read" : "fleet.edit");
  const db = await getDb();
  const table: ProfileTable = TABLES[options.kind];
  const organisationId = access.organisation.id;
  const names = await db.select({ name: table.name }).from(table).where(eq(table.organisationId, organisationId));
  const parsed = parseFleetCsv(text, options.kind, options.units as UnitsChoice, { existingNames: names.map((row) => row.name) });
  if (options.mode === "preview") return { ...parsed, imported: 0, outcome: "preview" };
  if (parsed.fileErrors.length || (options.mode === "all-or-nothing" && parsed.errorCount > 0)) {
    return { ...parsed, imported: 0, outcome: "refused" };
  }
  const valid = parsed.rows.filter((row) => row.profile);
  if (valid.length === 0) return { ...parsed, imported: 0, outcome: "nothing-to-import" };
  const now = new Date();
  const values = valid.map((row) => ({
    id: newId(),
    organisationId,
    name: row.profile!.name,
    units: row.profile!.units,
    data: storedData(options.kind, row.profile!),
    createdAt: now,
    updatedAt: now,
  }));
  await db.transaction(async (tx) => {
    // SQLite limits the bound values of one statement; 100 rows of 7 columns stay well inside it.
    for (let i = 0; i < values.length; i += 100) await tx.insert(table).values(values.slice(i, i + 100));
  });
  recheckAfterChange(access);
  return { ...parsed, imported: values.length, outcome: "imported" };
}

export async function exportFleet(access: AccessContext, kind: ProfileKind, archived: "include" | "only" | "exclude" = "exclude"): Promise<string> {
  const profiles = await listFleetProfiles(access, kind, archived);
  return exportFleetCsv(kind, profiles);
}

/** Saved checks whose vehicle is this profile: saved under its name, or with exactly its vehicle figures. */
export async function savedChecksOfVehicle(access: AccessContext, profile: FleetProfile, limit = 50) {
  assertCan(access, "fleet.read");
  const db = await getDb();
  const rows = await db
    .select({
      id: savedChecks.id,
      createdAt: savedChecks.createdAt,
      customerName: savedChecks.customerName,
      vehicleLabel: savedChecks.vehicleLabel,
      hitchedLabel: savedChecks.hitchedLabel,
      level: savedChecks.level,
      complete: savedChecks.complete,
      units: savedChecks.units,
      vehicle: sql<string | null>`json_extract(${savedChecks.rig}, '$.vehicle')`,
    })
    .from(savedChecks)
    .where(eq(savedChecks.organisationId, access.organisation.id))
    .orderBy(desc(savedChecks.createdAt))
    .limit(2000);
  const wanted = JSON.stringify(profile.data.vehicle ?? null);
  return rows
    .filter((row) => row.vehicleLabel === profile.name || (row.units === profile.units && row.vehicle !== null && JSON.stringify(JSON.parse(row.vehicle)) === wanted))
    .slice(0, limit)
    .map(({ vehicle: _vehicle, ...row }) => ({ ...row, createdAt: row.createdAt.getTime() }));
}

// ---------------------------------------------------------------------------------------------- matrix

export type { HitchedWeight, MatrixCell, VehicleCapacity };

export interface MatrixColumn {
  id: string;
  kind: "trailers" | "accessories";
  name: string;
  /** The trailer's gross weight or the accessory's loaded weight, in the organisation's units; absent when not on record. */
  weight?: HitchedWeight;
}

export interface MatrixRow {
  id: string;
  name: string;
  /** The date of the installation record the vehicle's hitch figures were measured by, if any. */
  measuredOn?: string;
  /** The most it may pull by its own and its hitch's ratings, in the organisation's units; absent when neither is on record. */
  capacity?: VehicleCapacity;
  cells: Array<MatrixCell | null>;
}

export interface MatrixPage {
  units: UnitSystem;
  rows: MatrixRow[];
  columns: MatrixColumn[];
  vehicleSort: MatrixVehicleSort;
  hitchedSort: MatrixHitchedSort;
  page: number;
  pageCount: number;
  totalRows: number;
  colPage: number;
  colPageCount: number;
  totalColumns: number;
  /** Pairs by verdict among the filtered vehicles and trailers; null while the stored verdicts are being rechecked. */
  counts: Record<VerdictLevel, number> | null;
  /**
   * True while a large fleet's stored verdicts are being rechecked after a change: the page's own cells are
   * current (worked out for this answer), the counts are null and a verdict filter matches nothing yet.
   */
  rechecking: boolean;
  evaluated: number;
  elapsedMs: number;
}

interface Prepared {
  vehicles: Array<{ id: string; name: string; updatedAt: number; capacity?: VehicleCapacity; part: Partial<RigInput> }>;
  hitched: Array<MatrixColumn & { updatedAt: number; part: Partial<RigInput> }>;
}

interface MatrixCacheEntry {
  /** The fleet as it stands (a hash): the stored pair verdicts are current when they were worked out for it. */
  fingerprint: string;
  /** The core version, units and thresholds, part of every stored pair's stamp. */
  settings: string;
  prepared: Prepared;
  /** A small fleet's every pair, worked out here when the stored verdicts are being rechecked by another process. */
  cells?: MatrixCell[];
  /** Row and column indexes in each order asked for so far. */
  orders: Map<string, number[]>;
}

const matrixCache = new Map<string, MatrixCacheEntry>();

function partOf(profile: FleetProfile, units: UnitSystem): Partial<RigInput> {
  return profilePart(profile, units);
}

async function prepareMatrix(access: AccessContext): Promise<MatrixCacheEntry> {
  const units = access.organisation.units;
  const [vehicles, trailers, accessories] = await Promise.all([
    listFleetProfiles(access, "vehicles"),
    listFleetProfiles(access, "trailers"),
    listFleetProfiles(access, "accessories"),
  ]);
  const settings = [CORE_VERSION, units, access.organisation.tightMarginRatio, access.organisation.frontAxleLossRatio].join("|");
  const fingerprint = createHash("sha256")
    .update([settings, ...[vehicles, trailers, accessories].map((list) => list.map((p) => `${p.id}:${p.updatedAt}`).join(","))].join("|"))
    .digest("base64url");
  const key = access.organisation.id;
  const cached = matrixCache.get(key);
  if (cached && cached.fingerprint === fingerprint) return cached;
  const vehicle = (p: FleetProfile) => {
    const part = partOf(p, units);
    return { id: p.id, name: p.name, updatedAt: p.updatedAt, capacity: vehicleCapacity(units, part), part };
  };
  const hitchedOf = (kind: MatrixColumn["kind"]) => (p: FleetProfile) => {
    const part = partOf(p, units);
    return { id: p.id, kind, name: p.name, updatedAt: p.updatedAt, weight: hitchedWeight(units, part), part };
  };
  const entry: MatrixCacheEntry = {
    fingerprint,
    settings,
    prepared: {
      vehicles: vehicles.map(vehicle),
      hitched: [...trailers.map(hitchedOf("trailers")), ...accessories.map(hitchedOf("accessories"))],
    },
    orders: new Map(),
  };
  matrixCache.set(key, entry);
  // A handful of organisations at most stay in memory.
  if (matrixCache.size > 8) matrixCache.delete(matrixCache.keys().next().value!);
  return entry;
}

/** What a recheck of the stored pair verdicts works from: the fleet as it stands now. */
function pairSourceOf(access: AccessContext): () => Promise<PairSource> {
  return async () => {
    const entry = await prepareMatrix(access);
    return {
      organisationId: access.organisation.id,
      fingerprint: entry.fingerprint,
      settings: entry.settings,
      units: access.organisation.units,
      tightMarginRatio: access.organisation.tightMarginRatio,
      frontAxleLossRatio: access.organisation.frontAxleLossRatio,
      vehicles: entry.prepared.vehicles,
      hitched: entry.prepared.hitched,
    };
  };
}

/** After a profile changes: the stored pair verdicts are worked out again in the background. */
function recheckAfterChange(access: AccessContext) {
  recheckPairsSoon(access.organisation.id, pairSourceOf(access));
}

/**
 * Indexes in the order asked for. "name" keeps the lists' own order (vehicles A to Z; trailers A to Z, then
 * accessories A to Z). By a figure, a profile without one comes last either way, and equal figures keep the
 * name order. Kept per cache entry: a profile's change starts a new entry.
 */
function orderOf(entry: MatrixCacheEntry, axis: "rows" | "columns", sort: MatrixVehicleSort | MatrixHitchedSort): number[] {
  const key = `${axis}:${sort}`;
  const known = entry.orders.get(key);
  if (known) return known;
  const figures = axis === "rows" ? entry.prepared.vehicles.map((v) => v.capacity?.value) : entry.prepared.hitched.map((h) => h.weight?.value);
  const indexes = figures.map((_, i) => i);
  if (sort !== "name") {
    const sign = sort.endsWith("-desc") ? -1 : 1;
    indexes.sort((a, b) => {
      const x = figures[a];
      const y = figures[b];
      if (x === undefined || y === undefined) return x === y ? a - b : x === undefined ? 1 : -1;
      return x === y ? a - b : sign * (x - y);
    });
  }
  entry.orders.set(key, indexes);
  return indexes;
}

/**
 * Up to this many pairs, a request waits for the stored verdicts to be brought up to date (a few tens of
 * milliseconds); a larger fleet's page answers at once while they are rechecked in the background.
 */
const WAIT_FOR_RECHECK_LIMIT = 5_000;

/**
 * Every vehicle against every trailer and accessory. Filters by name and by verdict; sorts vehicles by name
 * or capacity and trailers and accessories by name or weight, then pages over vehicles (rows) and over
 * trailers and accessories (columns), so an order holds across pages.
 *
 * The verdicts come from `pair_verdicts` (lib/server/pair-verdicts.ts) when they are current, so the counts
 * and a verdict filter over every pair are queries. After a change to a profile, the thresholds or the core,
 * a large fleet's stored verdicts are rechecked in the background: meanwhile the page's own cells are worked
 * out as it is asked for, and the counts and a verdict filter answer "being rechecked" (`rechecking`) rather
 * than from verdicts that may no longer hold.
 */
export async function fleetMatrix(
  access: AccessContext,
  asked: Omit<MatrixQuery, "vehicleSort" | "hitchedSort"> & Partial<Pick<MatrixQuery, "vehicleSort" | "hitchedSort">>,
): Promise<MatrixPage> {
  assertCan(access, "fleet.read");
  const query: MatrixQuery = { ...asked, vehicleSort: asked.vehicleSort ?? "name", hitchedSort: asked.hitchedSort ?? "name" };
  const started = performance.now();
  const organisationId = access.organisation.id;
  const entry = await prepareMatrix(access);
  const { vehicles, hitched } = entry.prepared;
  const units = access.organisation.units;
  const ratio = access.organisation.tightMarginRatio;
  const frontLoss = access.organisation.frontAxleLossRatio;
  const width = hitched.length;
  const needle = (text: string | undefined) => text?.toLowerCase() ?? "";
  const vehicleNeedle = needle(query.vehicle);
  const hitchedNeedle = needle(query.hitched);
  let rowIndexes = orderOf(entry, "rows", query.vehicleSort).filter((i) => !vehicleNeedle || vehicles[i]!.name.toLowerCase().includes(vehicleNeedle));
  let colIndexes = orderOf(entry, "columns", query.hitchedSort).filter((i) => !hitchedNeedle || hitched[i]!.name.toLowerCase().includes(hitchedNeedle));

  let evaluated = 0;
  const small = vehicles.length * width <= WAIT_FOR_RECHECK_LIMIT;
  let stored = await storedVerdictsReady(organisationId, entry.fingerprint);
  if (!stored) {
    const recheck = recheckPairs(organisationId, pairSourceOf(access));
    if (small) {
      stored = (await recheck) === "done" && (await storedVerdictsReady(organisationId, entry.fingerprint));
    } else {
      recheck.catch((error: unknown) => console.error("pair verdicts: recheck failed", error instanceof Error ? error.message : error));
    }
  }
  // A small fleet whose verdicts another process is rechecking: every pair worked out here, once per change.
  if (!stored && small && !entry.cells) {
    entry.cells = vehicles.flatMap((v) => hitched.map((h) => evaluatePair(units, v.part, h.part, ratio, frontLoss)));
    evaluated = entry.cells.length;
  }
  const scope: PairScope = {
    organisationId,
    ...(vehicleNeedle ? { vehicleIds: rowIndexes.map((r) => vehicles[r]!.id) } : {}),
    ...(hitchedNeedle ? { hitchedIds: colIndexes.map((c) => hitched[c]!.id) } : {}),
  };

  let counts: MatrixPage["counts"] = null;
  if (stored) {
    counts = await storedCounts(scope);
    if (query.level) {
      const withLevel = await storedWithLevel(scope, query.level);
      rowIndexes = rowIndexes.filter((r) => withLevel.vehicleIds.has(vehicles[r]!.id));
      colIndexes = colIndexes.filter((c) => withLevel.hitchedIds.has(hitched[c]!.id));
    }
  } else if (entry.cells) {
    const cells = entry.cells;
    counts = { within: 0, tight: 0, adjust: 0, over: 0, incomplete: 0 };
    for (const r of rowIndexes) for (const c of colIndexes) counts[cells[r * width + c]!.level]++;
    if (query.level) {
      const level = query.level;
      const rowsWith = new Set<number>();
      const colsWith = new Set<number>();
      for (const r of rowIndexes) {
        for (const c of colIndexes) {
          if (cells[r * width + c]!.level === level) {
            rowsWith.add(r);
            colsWith.add(c);
          }
        }
      }
      rowIndexes = rowIndexes.filter((r) => rowsWith.has(r));
      colIndexes = colIndexes.filter((c) => colsWith.has(c));
    }
  }
  // Being rechecked: a verdict filter cannot be answered yet (the page says so and asks again shortly).
  const rechecking = !stored && !entry.cells;
  if (rechecking && query.level) {
    rowIndexes = [];
    colIndexes = [];
  }

  const pageCount = Math.max(1, Math.ceil(rowIndexes.length / query.pageSize));
  const page = Math.min(query.page, pageCount);
  const colPageCount = Math.max(1, Math.ceil(colIndexes.length / query.colPageSize));
  const colPage = Math.min(query.colPage, colPageCount);
  const pageRows = rowIndexes.slice((page - 1) * query.pageSize, page * query.pageSize);
  const pageCols = colIndexes.slice((colPage - 1) * query.colPageSize, colPage * query.colPageSize);
  const pageCells = stored
    ? await storedCells(
        organisationId,
        pageRows.map((r) => vehicles[r]!.id),
        pageCols.map((c) => hitched[c]!.id),
      )
    : undefined;

  const rows: MatrixRow[] = pageRows.map((r) => ({
    id: vehicles[r]!.id,
    name: vehicles[r]!.name,
    ...(vehicles[r]!.capacity ? { capacity: vehicles[r]!.capacity } : {}),
    cells: pageCols.map((c) => {
      let cell = pageCells?.get(pairKey(vehicles[r]!.id, hitched[c]!.id)) ?? entry.cells?.[r * width + c];
      if (!cell) {
        cell = evaluatePair(units, vehicles[r]!.part, hitched[c]!.part, ratio, frontLoss);
        evaluated++;
      }
      return query.level && cell.level !== query.level ? null : cell;
    }),
  }));
  const sources = await figureSourcesByVehicle(access, rows.map((row) => row.id));
  for (const row of rows) {
    const dates = Object.values(sources[row.id] ?? {}).filter((source) => source.kind === "measured").map((source) => source.fittedOn).sort();
    if (dates.length) Object.assign(row, { measuredOn: dates.at(-1) });
  }
  return {
    units,
    rows,
    columns: pageCols.map((c) => {
      const { id, kind, name, weight } = hitched[c]!;
      return weight ? { id, kind, name, weight } : { id, kind, name };
    }),
    vehicleSort: query.vehicleSort,
    hitchedSort: query.hitchedSort,
    page,
    pageCount,
    totalRows: rowIndexes.length,
    colPage,
    colPageCount,
    totalColumns: colIndexes.length,
    counts,
    rechecking,
    evaluated,
    elapsedMs: Math.round(performance.now() - started),
  };
}

/** For the check screen's "start from these profiles": the organisation's own profiles only. */
export async function rigFromProfiles(
  access: AccessContext,
  ids: { vehicle?: string; trailer?: string; accessory?: string },
): Promise<RigInput | undefined> {
  if (!ids.vehicle) return undefined;
  const vehicle = await getFleetProfile(access, "vehicles", ids.vehicle);
  if (!vehicle) return undefined;
  const hitchedKind = ids.trailer ? "trailers" : ids.accessory ? "accessories" : undefined;
  const hitchedId = ids.trailer ?? ids.accessory;
  const hitched = hitchedKind && hitchedId ? await getFleetProfile(access, hitchedKind, hitchedId) : undefined;
  const units = vehicle.units;
  const rig = { units, name: vehicle.name, ...partOf(vehicle, units), ...(hitched ? partOf(hitched, units) : {}) } as RigInput;
  return rig;
}

