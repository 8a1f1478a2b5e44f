import Database from "libsql";

/**
 * Prepared statements kept per connection, so that a statement the server runs again and again is compiled
 * once. The libSQL client prepares every statement anew on each call (about 5 % of a save's server time in a
 * CPU profile, more than the insert itself takes to run); its statements can be run again with new
 * arguments.
 *
 * Only reads and writes of rows are kept (SELECT, INSERT, UPDATE, DELETE, WITH, REPLACE). Any other
 * statement (CREATE, ALTER, DROP, PRAGMA, a migration through exec) empties the connection's set first: a
 * kept `SELECT *` would otherwise go on answering the columns the table had when it was prepared.
 *
 * Installed once per process by db/client.ts for local files. Only the statement text is the key; each
 * connection has its own set (a WeakMap), bounded at MAX_STATEMENTS with the least recently used dropped.
 * The client runs a statement to its end in one synchronous call, so one cached statement is never in use
 * twice at once.
 *
 * A kept statement also remembers what cannot change while it is kept (`remember`): its result columns, which
 * the client asks for twice on every run, and, for a write with no RETURNING, that it returns no rows, which
 * the client finds out on every run by calling `raw()` and catching the error it throws. Building that
 * error and its stack cost more CPU than a small insert takes to run.
 */
const MAX_STATEMENTS = 300;

type Prepare = (this: object, sql: string) => unknown;
type Exec = (this: object, sql: string) => unknown;

const ROW_STATEMENT = /^\s*(select|insert|update|delete|with|replace)\b/i;

const installed = Symbol.for("towmargin.statementCache");

/**
 * A statement of this shape names the connection that prepares it (`claimConnection`): the libSQL client keeps
 * its connections to itself, and db/serial-client.ts asks for its one connection this way.
 */
export const CONNECTION_MARKER = "SELECT 1 AS towmargin_connection_";
const claimed = new Map<string, object>();

/** The connection that prepared this marker statement, once (undefined when the cache is not installed). */
export function claimConnection(marker: string): object | undefined {
  const connection = claimed.get(marker);
  claimed.delete(marker);
  return connection;
}

interface Statement {
  raw: (toggle?: boolean) => unknown;
  columns: () => unknown[];
}

/** The statement, with `columns()` and a refused `raw()` answered from memory after their first call. */
function remember(statement: Statement): Statement {
  const raw = statement.raw;
  const columns = statement.columns;
  let refusal: unknown = null;
  let known: unknown[] | null = null;
  statement.raw = function rememberedRaw(this: Statement, toggle?: boolean) {
    if (refusal) throw refusal;
    try {
      return raw.call(this, toggle);
    } catch (error) {
      // Only a statement that returns no rows refuses raw mode, and that does not change while it is kept.
      refusal = error;
      throw error;
    }
  };
  statement.columns = function rememberedColumns(this: Statement) {
    known ??= Object.freeze(columns.call(this)) as unknown[];
    return known;
  };
  return statement;
}

export function installStatementCache(): void {
  const proto = (Database as unknown as { prototype: { prepare: Prepare; exec: Exec; [installed]?: true } }).prototype;
  if (proto[installed]) return;
  const prepare = proto.prepare;
  const exec = proto.exec;
  const caches = new WeakMap<object, Map<string, unknown>>();
  proto.exec = function execForgetting(this: object, sql: string) {
    caches.delete(this);
    return exec.call(this, sql);
  };
  proto.prepare = function cachedPrepare(this: object, sql: string) {
    if (sql.startsWith(CONNECTION_MARKER)) claimed.set(sql, this);
    if (!ROW_STATEMENT.test(sql)) {
      caches.delete(this);
      return prepare.call(this, sql);
    }
    let cache = caches.get(this);
    if (!cache) caches.set(this, (cache = new Map()));
    const hit = cache.get(sql);
    if (hit) {
      // Most recently used last.
      cache.delete(sql);
      cache.set(sql, hit);
      return hit;
    }
    const statement = remember(prepare.call(this, sql) as Statement);
    cache.set(sql, statement);
    if (cache.size > MAX_STATEMENTS) cache.delete(cache.keys().next().value!);
    return statement;
  };
  proto[installed] = true;
}
