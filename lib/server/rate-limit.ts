import "server-only";
import { fillPlaceholders, lt, sql } from "drizzle-orm";
import { getDb, onConnection, type Database } from "@/db/client";
import { rateLimits } from "@/db/schema";

/**
 * Fixed-window counters kept in the database (`rate_limits`), so that every server process on it counts
 * against the same limit: a limit reached through one process holds on all of them. Every limit in the app
 * goes through `consume()`.
 *
 * One statement per check: an UPSERT that starts the window again when it has ended, or adds one, and
 * answers the count and the window's end (RETURNING). SQLite runs it atomically, so two processes counting
 * the same key at once never lose a count. Windows that have ended are swept by the process that notices
 * (at most once a minute per process), so a flood of new names leaves rows for one window at most.
 *
 * On a local file the UPSERT runs straight on the connection (`onConnection`), in its turn like any other
 * statement: the same SQL, which Drizzle writes once, without the client's and Drizzle's layers around it
 * (every evaluate request pays this statement, and those layers cost more CPU than SQLite's work on it).
 */
export interface RateLimitResult {
  allowed: boolean;
  retryAfterSeconds: number;
}

const SWEEP_EVERY_MS = 60_000;
let lastSweep = 0;

type Counter = ReturnType<typeof prepareCounter>;
const counters = new WeakMap<Database, Counter>();

function prepareCounter(db: Database) {
  const now = sql.placeholder("now");
  return db
    .insert(rateLimits)
    .values({ key: sql.placeholder("key"), count: 1, resetAt: sql.placeholder("resetAt") })
    .onConflictDoUpdate({
      target: rateLimits.key,
      // SQLite reads every right-hand side from the row as it was, so both CASEs see the old window.
      set: {
        count: sql`CASE WHEN ${rateLimits.resetAt} <= ${now} THEN 1 ELSE ${rateLimits.count} + 1 END`,
        resetAt: sql`CASE WHEN ${rateLimits.resetAt} <= ${now} THEN excluded.reset_at ELSE ${rateLimits.resetAt} END`,
      },
    })
    .returning({ count: rateLimits.count, resetAt: rateLimits.resetAt })
    .prepare();
}

/** The counter's SQL and its arguments in order, for running it on the connection itself. */
interface DirectCounter {
  sql: string;
  args: (values: Record<string, unknown>) => unknown[];
}
const directCounters = new WeakMap<Database, DirectCounter>();

function directCounter(db: Database): DirectCounter {
  const { sql: text, params } = prepareCounter(db).getQuery();
  // Drizzle's own filling of placeholders, as its prepared statement does it.
  return { sql: text, args: (values) => fillPlaceholders(params, values) };
}

export async function consume(key: string, limit: number, windowMs: number, now = Date.now()): Promise<RateLimitResult> {
  const values = { key, now, resetAt: now + windowMs };
  const db = await getDb();
  let direct = directCounters.get(db);
  if (!direct) directCounters.set(db, (direct = directCounter(db)));
  const counter = direct;
  // An UPSERT with RETURNING always answers one row: undefined means the connection was out of reach.
  const counted = (await onConnection((connection) => connection.prepare(counter.sql).raw(true).get(counter.args(values)))) as [unknown, unknown] | undefined;
  let row: { count: unknown; resetAt: unknown } | undefined;
  if (counted) row = { count: counted[0], resetAt: counted[1] };
  else {
    let prepared = counters.get(db);
    if (!prepared) counters.set(db, (prepared = prepareCounter(db)));
    row = await prepared.get(values);
  }
  if (now - lastSweep >= SWEEP_EVERY_MS) {
    lastSweep = now;
    void db
      .delete(rateLimits)
      .where(lt(rateLimits.resetAt, now))
      .run()
      .catch(() => undefined);
  }
  const count = Number(row?.count ?? 1);
  const resetAt = Number(row?.resetAt ?? now + windowMs);
  return { allowed: count <= limit, retryAfterSeconds: Math.max(1, Math.ceil((resetAt - now) / 1000)) };
}

/** For tests only: every counter of the database. */
export async function resetRateLimits(): Promise<void> {
  const db = await getDb();
  await db.delete(rateLimits).run();
  lastSweep = 0;
}
