import "server-only";
import { and, eq, inArray, notInArray, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import { pairRechecks, pairVerdicts } from "@/db/schema";
import { evaluatePair, type MatrixCell } from "@/lib/fleet/matrix";
import type { RigInput } from "@/lib/towing/input";
import type { VerdictLevel } from "@/lib/towing/types";
import type { UnitSystem } from "@/lib/towing/units";
import { newId } from "./tokens";

/**
 * Every pair's verdict of an organisation's fleet, kept in `pair_verdicts` so that a verdict filter over all
 * pairs (500 vehicles × 200 trailers is 100,000) is a query, and shared by every server process on the
 * database.
 *
 * What is stored is current when `pair_rechecks` says "ready" for the fleet's fingerprint (the core version,
 * the organisation's thresholds and units, every live profile's id and last change). When it is not, a
 * recheck works out again only the pairs whose stamp differs, in batches that leave the server free between
 * them, and deletes the pairs of profiles gone or archived. One recheck per organisation at a time, across
 * processes: it holds a claim in `pair_rechecks` and renews it with every batch; a claim not renewed for
 * half a minute (its process ended) may be taken over.
 */

export interface PairProfile {
  id: string;
  /** The profile's last change, part of each of its pairs' stamp. */
  updatedAt: number;
  part: Partial<RigInput>;
}

export interface PairSource {
  organisationId: string;
  /** The fleet as it stands: a recheck that finishes marks the stored verdicts ready for this fingerprint. */
  fingerprint: string;
  /** The core version, units and thresholds: part of every pair's stamp. */
  settings: string;
  units: UnitSystem;
  tightMarginRatio: number;
  frontAxleLossRatio: number;
  vehicles: PairProfile[];
  hitched: PairProfile[];
}

/** Rows written per transaction; the server answers other requests between batches. */
const BATCH = 500;
/** A claim not renewed for this long belongs to a process that has ended. */
const CLAIM_STALE_MS = 30_000;

const stampOf = (source: PairSource, vehicle: PairProfile, hitched: PairProfile) => `${source.settings}|${vehicle.updatedAt}|${hitched.updatedAt}`;
const pairKey = (vehicleId: string, hitchedId: string) => `${vehicleId} ${hitchedId}`;

/** Whether the stored verdicts are those of this fleet as it stands. */
export async function storedVerdictsReady(organisationId: string, fingerprint: string): Promise<boolean> {
  const db = await getDb();
  const row = await db.select({ fingerprint: pairRechecks.fingerprint, status: pairRechecks.status }).from(pairRechecks).where(eq(pairRechecks.organisationId, organisationId)).get();
  return row?.status === "ready" && row.fingerprint === fingerprint;
}

/** Takes the organisation's recheck for `fingerprint`, unless another holds a live claim; answers the claim. */
async function claim(organisationId: string, fingerprint: string, now = Date.now()): Promise<string | undefined> {
  const db = await getDb();
  const token = newId();
  const rows = await db
    .insert(pairRechecks)
    .values({ organisationId, fingerprint, status: "rechecking", claim: token, claimedAt: now })
    .onConflictDoUpdate({
      target: pairRechecks.organisationId,
      set: { fingerprint, status: "rechecking", claim: token, claimedAt: now },
      setWhere: sql`${pairRechecks.status} <> 'rechecking' OR ${pairRechecks.claimedAt} IS NULL OR ${pairRechecks.claimedAt} < ${now - CLAIM_STALE_MS}`,
    })
    .returning({ claim: pairRechecks.claim });
  return rows[0]?.claim === token ? token : undefined;
}

/** Renews the claim; false when it was taken over (the recheck then stops). */
async function renew(organisationId: string, token: string): Promise<boolean> {
  const db = await getDb();
  const rows = await db
    .update(pairRechecks)
    .set({ claimedAt: Date.now() })
    .where(and(eq(pairRechecks.organisationId, organisationId), eq(pairRechecks.claim, token)))
    .returning({ claim: pairRechecks.claim });
  return rows.length > 0;
}

/** Ends the claim: "ready" for the claimed fingerprint, or after a failure "ready" for none (tried again on the next look). */
async function release(organisationId: string, token: string, outcome: "done" | "failed"): Promise<void> {
  const db = await getDb();
  await db
    .update(pairRechecks)
    .set({ status: "ready", claim: null, claimedAt: null, ...(outcome === "failed" ? { fingerprint: "" } : {}) })
    .where(and(eq(pairRechecks.organisationId, organisationId), eq(pairRechecks.claim, token)));
}

const pause = () => new Promise((resolve) => setImmediate(resolve));

/** Works out the pairs whose stamp differs and deletes those of profiles no longer in the fleet. */
async function writePairs(source: PairSource, token: string): Promise<"done" | "taken-over"> {
  const db = await getDb();
  const { organisationId } = source;
  const stored = new Map<string, string>();
  for (const row of await db
    .select({ vehicleId: pairVerdicts.vehicleId, hitchedId: pairVerdicts.hitchedId, inputs: pairVerdicts.inputs })
    .from(pairVerdicts)
    .where(eq(pairVerdicts.organisationId, organisationId))) {
    stored.set(pairKey(row.vehicleId, row.hitchedId), row.inputs);
  }

  type Row = typeof pairVerdicts.$inferInsert;
  let batch: Row[] = [];
  const flush = async () => {
    if (!batch.length) return true;
    const rows = batch;
    batch = [];
    await db.transaction(async (tx) => {
      await tx
        .insert(pairVerdicts)
        .values(rows)
        .onConflictDoUpdate({
          target: [pairVerdicts.organisationId, pairVerdicts.vehicleId, pairVerdicts.hitchedId],
          set: { level: sql`excluded.level`, cell: sql`excluded.cell`, inputs: sql`excluded.inputs` },
        });
    });
    await pause();
    return renew(organisationId, token);
  };

  for (const vehicle of source.vehicles) {
    for (const hitched of source.hitched) {
      const inputs = stampOf(source, vehicle, hitched);
      if (stored.get(pairKey(vehicle.id, hitched.id)) === inputs) continue;
      const cell = evaluatePair(source.units, vehicle.part, hitched.part, source.tightMarginRatio, source.frontAxleLossRatio);
      batch.push({ organisationId, vehicleId: vehicle.id, hitchedId: hitched.id, level: cell.level, cell: JSON.stringify(cell), inputs });
      if (batch.length >= BATCH && !(await flush())) return "taken-over";
    }
  }
  if (!(await flush())) return "taken-over";

  // Pairs of a vehicle or a trailer no longer in the fleet (deleted or archived).
  const gone = (column: typeof pairVerdicts.vehicleId | typeof pairVerdicts.hitchedId, ids: string[]): SQL =>
    and(eq(pairVerdicts.organisationId, organisationId), ids.length ? notInArray(column, ids) : sql`1 = 1`)!;
  await db.delete(pairVerdicts).where(gone(pairVerdicts.vehicleId, source.vehicles.map((v) => v.id)));
  await db.delete(pairVerdicts).where(gone(pairVerdicts.hitchedId, source.hitched.map((h) => h.id)));
  return "done";
}

/** The recheck under way in this process, by organisation. */
const running = new Map<string, Promise<RecheckOutcome>>();

/** "done": the stored verdicts are current for the fleet as last loaded; "elsewhere": another process holds the recheck. */
export type RecheckOutcome = "done" | "elsewhere";

/**
 * Brings the organisation's stored verdicts up to date with the fleet `load` answers, in this process; joins a
 * recheck already under way here. When the fleet changed while it ran, it goes round again (a few times at most).
 */
export function recheckPairs(organisationId: string, load: () => Promise<PairSource>): Promise<RecheckOutcome> {
  const under = running.get(organisationId);
  if (under) return under;
  const job = (async (): Promise<RecheckOutcome> => {
    let source = await load();
    for (let round = 0; round < 3; round++) {
      if (await storedVerdictsReady(organisationId, source.fingerprint)) return "done";
      const token = await claim(organisationId, source.fingerprint);
      if (!token) return "elsewhere";
      let outcome: "done" | "taken-over";
      try {
        outcome = await writePairs(source, token);
      } catch (error) {
        await release(organisationId, token, "failed").catch(() => undefined);
        throw error;
      }
      if (outcome === "taken-over") return "elsewhere";
      await release(organisationId, token, "done");
      const next = await load();
      if (next.fingerprint === source.fingerprint) return "done";
      source = next;
    }
    return "done";
  })().finally(() => running.delete(organisationId));
  running.set(organisationId, job);
  return job;
}

/** Starts a recheck without waiting for it (after a profile changes); a failure is logged, never thrown. */
export function recheckPairsSoon(organisationId: string, load: () => Promise<PairSource>): void {
  recheckPairs(organisationId, load).catch((error: unknown) => {
    console.error("pair verdicts: recheck failed", error instanceof Error ? error.message : error);
  });
}

/** For tests: waits for every recheck under way in this process. */
export async function settledPairRechecks(): Promise<void> {
  while (running.size) await Promise.allSettled([...running.values()]);
}

// ---------------------------------------------------------------------------------------------- reading

/** The scope of a question: the organisation, and the vehicles and trailers a name filter kept (undefined: all). */
export interface PairScope {
  organisationId: string;
  vehicleIds?: string[];
  hitchedIds?: string[];
}

function scoped(scope: PairScope, ...more: SQL[]): SQL {
  const where: SQL[] = [eq(pairVerdicts.organisationId, scope.organisationId), ...more];
  if (scope.vehicleIds) where.push(inArray(pairVerdicts.vehicleId, scope.vehicleIds));
  if (scope.hitchedIds) where.push(inArray(pairVerdicts.hitchedId, scope.hitchedIds));
  return and(...where)!;
}

/** Pairs by verdict within the scope. */
export async function storedCounts(scope: PairScope): Promise<Record<VerdictLevel, number>> {
  const counts: Record<VerdictLevel, number> = { within: 0, tight: 0, adjust: 0, over: 0, incomplete: 0 };
  if (scope.vehicleIds?.length === 0 || scope.hitchedIds?.length === 0) return counts;
  const db = await getDb();
  const rows = await db
    .select({ level: pairVerdicts.level, n: sql<number>`count(*)` })
    .from(pairVerdicts)
    .where(scoped(scope))
    .groupBy(pairVerdicts.level);
  for (const row of rows) counts[row.level] = Number(row.n);
  return counts;
}

/** The vehicles and the trailers and accessories that have at least one pair of this verdict within the scope. */
export async function storedWithLevel(scope: PairScope, level: VerdictLevel): Promise<{ vehicleIds: Set<string>; hitchedIds: Set<string> }> {
  if (scope.vehicleIds?.length === 0 || scope.hitchedIds?.length === 0) return { vehicleIds: new Set(), hitchedIds: new Set() };
  const db = await getDb();
  const where = scoped(scope, eq(pairVerdicts.level, level));
  const vehicles = await db.selectDistinct({ id: pairVerdicts.vehicleId }).from(pairVerdicts).where(where);
  const hitched = await db.selectDistinct({ id: pairVerdicts.hitchedId }).from(pairVerdicts).where(where);
  return { vehicleIds: new Set(vehicles.map((row) => row.id)), hitchedIds: new Set(hitched.map((row) => row.id)) };
}

/** The stored cells of a page: every pair of these vehicles with these trailers and accessories. */
export async function storedCells(organisationId: string, vehicleIds: string[], hitchedIds: string[]): Promise<Map<string, MatrixCell>> {
  const cells = new Map<string, MatrixCell>();
  if (!vehicleIds.length || !hitchedIds.length) return cells;
  const db = await getDb();
  const rows = await db
    .select({ vehicleId: pairVerdicts.vehicleId, hitchedId: pairVerdicts.hitchedId, cell: pairVerdicts.cell })
    .from(pairVerdicts)
    .where(and(eq(pairVerdicts.organisationId, organisationId), inArray(pairVerdicts.vehicleId, vehicleIds), inArray(pairVerdicts.hitchedId, hitchedIds)));
  for (const row of rows) cells.set(pairKey(row.vehicleId, row.hitchedId), JSON.parse(row.cell) as MatrixCell);
  return cells;
}

export { pairKey };
