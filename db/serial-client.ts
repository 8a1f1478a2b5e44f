import type { Client, InArgs, InStatement, ResultSet, Transaction, TransactionMode } from "@libsql/client";
import { AsyncLocalStorage } from "node:async_hooks";
import { claimConnection, CONNECTION_MARKER } from "./statement-cache";

/** The few methods of a libSQL connection (the `libsql` package's Database) that `onConnection` work uses. */
export interface NativeConnection {
  readonly open: boolean;
  prepare(sql: string): NativeStatement;
}
export interface NativeStatement {
  raw(toggle?: boolean): NativeStatement;
  get(args: unknown[]): unknown;
}

/** The serial client, and its connection for work that must cost as little as a statement can. */
export type SerialClient = Client & {
  /**
   * Runs `work` on the connection itself, in its turn like any statement (so never inside another caller's
   * transaction), and answers what it returns; undefined when the connection cannot be reached (the
   * statement cache is not installed), for the caller to go through the client instead. `work` must be one
   * synchronous statement: it skips the client's and Drizzle's layers, not the gate.
   */
  onConnection<T>(work: (connection: NativeConnection) => T): Promise<T | undefined>;
};

let markers = 0;

/**
 * A local SQLite file through one connection, one statement or one transaction at a time.
 *
 * Why: the libSQL client keeps a pool of connections, and it opens another whenever a statement arrives while
 * one is borrowed (a borrow spans an `await`). A connection opened that way never ran our PRAGMAs, so it
 * would commit with `synchronous = FULL`, and every commit on one connection throws away the page cache of
 * the others. Worse, SQLite statements run synchronously on the event loop: a write on a second connection
 * while a transaction is open on the first waits in the busy handler, and the transaction it waits for can
 * never get the event loop back to commit, so the write fails with SQLITE_BUSY.
 *
 * So the client is made with `concurrency: 1` and everything passes through this gate in arrival order: a
 * statement, a batch or a migration holds it for its one synchronous call; a transaction holds it from BEGIN
 * until it commits, rolls back or closes. Statements that arrive meanwhile wait their turn (transactions here
 * are a few short statements), and the pool never sees two borrowers, so nothing is refused.
 *
 * Inside a transaction use only its `tx`: a query on the outer database would wait for the transaction that
 * is waiting for it. With the database wrapped by `scopedTransactions`, such a query is refused at once with
 * an error that says so, instead of freezing every query of the process. `close()` is for shutting down;
 * `reconnect()` is refused (a new connection would lack the PRAGMAs).
 */
export function serialClient(inner: Client): SerialClient {
  let tail: Promise<unknown> = Promise.resolve();
  /** The scope of the transaction now holding the gate, if any. */
  let open: object | null = null;

  /** Runs `work` once everything queued before it has finished; later work waits for it in turn. */
  function inTurn<T>(work: () => Promise<T>): Promise<T> {
    const own = transactionScope.getStore();
    if (own && own === open) {
      return Promise.reject(new Error("A query on the database was made inside a transaction; use the transaction's own `tx` there."));
    }
    const run = tail.then(work, work);
    tail = run.then(
      () => undefined,
      () => undefined,
    );
    return run;
  }

  function transaction(mode?: TransactionMode): Promise<Transaction> {
    const marker = transactionScope.getStore() ?? {};
    return new Promise<Transaction>((resolve, reject) => {
      inTurn(
        () =>
          new Promise<void>((finished) => {
            open = marker;
            const release = () => {
              if (open === marker) open = null;
              finished();
            };
            Promise.resolve()
              .then(() => inner.transaction(mode))
              .then(
                (tx) => resolve(heldUntilClosed(tx, release)),
                (error: unknown) => {
                  release();
                  reject(error);
                },
              );
          }),
      ).catch(reject);
    });
  }

  /** The client's one connection (concurrency 1), asked for once and again only if it was closed. */
  let connection: NativeConnection | undefined;
  async function reach(): Promise<NativeConnection | undefined> {
    if (connection?.open) return connection;
    const marker = `${CONNECTION_MARKER}${process.pid}_${++markers}`;
    await inner.execute(marker);
    connection = claimConnection(marker) as NativeConnection | undefined;
    return connection;
  }

  const client: SerialClient = {
    onConnection<T>(work: (connection: NativeConnection) => T): Promise<T | undefined> {
      // Known and open: run it at once in its turn, with no other promise in between.
      return inTurn(() => (connection?.open ? Promise.resolve(work(connection)) : reach().then((reached) => (reached ? work(reached) : undefined))));
    },
    execute(stmtOrSql: InStatement | string, args?: InArgs): Promise<ResultSet> {
      return inTurn(() => (typeof stmtOrSql === "string" ? inner.execute(stmtOrSql, args) : inner.execute(stmtOrSql)));
    },
    batch: (stmts, mode) => inTurn(() => inner.batch(stmts, mode)),
    migrate: (stmts) => inTurn(() => inner.migrate(stmts)),
    transaction,
    executeMultiple: (sql) => inTurn(() => inner.executeMultiple(sql)),
    sync: () => inTurn(() => inner.sync()),
    close: () => inner.close(),
    reconnect: () => {
      throw new Error("The local database client does not reconnect: open a new one.");
    },
    get closed() {
      return inner.closed;
    },
    get protocol() {
      return inner.protocol;
    },
  } as SerialClient;
  return client;
}

/** Which database transaction's callback the running code belongs to. */
const transactionScope = new AsyncLocalStorage<object>();

/**
 * Runs each `db.transaction(callback)` of this database, callback and all, in a scope of its own, so that the
 * serial client can tell a query on the outer database made from inside the callback (which would wait
 * forever) from one made beside it by other code (which simply waits its turn).
 */
export function scopedTransactions<D extends { transaction: (...args: never[]) => Promise<unknown> }>(db: D): D {
  const begin = db.transaction.bind(db) as (...args: unknown[]) => Promise<unknown>;
  (db as { transaction: unknown }).transaction = (...args: unknown[]) => transactionScope.run({}, () => begin(...args));
  return db;
}

/** The transaction as it is, except that settling it (in any of the three ways) lets the next work in. */
function heldUntilClosed(tx: Transaction, finished: () => void): Transaction {
  const settled = (settle: () => Promise<void>): Promise<void> =>
    Promise.resolve()
      .then(settle)
      .finally(() => {
        if (tx.closed) finished();
      });
  return {
    execute: (stmt: InStatement) => tx.execute(stmt),
    batch: (stmts: InStatement[]) => tx.batch(stmts),
    executeMultiple: (sql: string) => tx.executeMultiple(sql),
    commit: () => settled(() => tx.commit()),
    // SQLite may have rolled back by itself (a full disk, an I/O error): then there is nothing to undo, and
    // the error that caused it is the one the caller should see.
    rollback: () => settled(() => (tx.closed ? Promise.resolve() : tx.rollback())),
    close: () => {
      try {
        tx.close();
      } finally {
        finished();
      }
    },
    get closed() {
      return tx.closed;
    },
  };
}
