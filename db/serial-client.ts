import type { Client, InArgs, InStatement, ResultSet, Transaction, TransactionMode } from "@libsql/client";

/**
 * A local SQLite file through one connection, one statement or one transaction at a time.
 *
 * Why: the libSQL client keeps a pool of connections, and it opens another whenever a statement arrives while
 * one is borrowed (a borrow spans an `await`). A connection opened that way never ran our PRAGMAs, so it
 * would commit with `synchronous = FULL` and fail at once on a lock (no busy timeout), and every commit on
 * one connection throws away the page cache of the others. Worse, SQLite statements run synchronously on the
 * event loop: a write on a second connection while a transaction is open on the first spins in the busy
 * handler, and the transaction it waits for can never get the event loop back to commit.
 *
 * So the client is made with `concurrency: 1` and everything passes through this gate in arrival order: a
 * statement, a batch or a migration holds it for its one synchronous call; a transaction holds it from BEGIN
 * until it commits, rolls back or closes. Statements that arrive meanwhile wait their turn (transactions here
 * are a few short statements), and the pool never sees two borrowers, so nothing is refused.
 *
 * Inside a transaction use only its `tx`: a query on the outer database would wait for the transaction that
 * is waiting for it.
 */
export function serialClient(inner: Client): Client {
  let tail: Promise<unknown> = Promise.resolve();

  /** Runs `work` once everything queued before it has finished; later work waits for it in turn. */
  function inTurn<T>(work: () => Promise<T>): Promise<T> {
    const run = tail.then(work, work);
    tail = run.then(
      () => undefined,
      () => undefined,
    );
    return run;
  }

  function transaction(mode?: TransactionMode): Promise<Transaction> {
    return new Promise<Transaction>((resolve, reject) => {
      void inTurn(
        () =>
          new Promise<void>((finished) => {
            inner.transaction(mode).then(
              (tx) => resolve(heldUntilClosed(tx, finished)),
              (error: unknown) => {
                finished();
                reject(error);
              },
            );
          }),
      );
    });
  }

  const client: Client = {
    execute(stmtOrSql: InStatement | string, args?: InArgs): Promise<ResultSet> {
      return inTurn(() => (typeof stmtOrSql === "string" ? inner.execute(stmtOrSql, args) : inner.execute(stmtOrSql)));
    },
    batch: (stmts, mode) => inTurn(() => inner.batch(stmts, mode)),
    migrate: (stmts) => inTurn(() => inner.migrate(stmts)),
    transaction,
    executeMultiple: (sql) => inTurn(() => inner.executeMultiple(sql)),
    sync: () => inTurn(() => inner.sync()),
    close: () => inner.close(),
    reconnect: () => inner.reconnect(),
    get closed() {
      return inner.closed;
    },
    get protocol() {
      return inner.protocol;
    },
  } as Client;
  return client;
}

/** The transaction as it is, except that settling it (in any of the three ways) lets the next work in. */
function heldUntilClosed(tx: Transaction, finished: () => void): Transaction {
  const settled = <T>(result: Promise<T>): Promise<T> =>
    result.finally(() => {
      if (tx.closed) finished();
    });
  return {
    execute: (stmt: InStatement) => tx.execute(stmt),
    batch: (stmts: InStatement[]) => tx.batch(stmts),
    executeMultiple: (sql: string) => tx.executeMultiple(sql),
    commit: () => settled(tx.commit()),
    rollback: () => settled(tx.rollback()),
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
