import { createClient, type Client } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import { mkdirSync } from "node:fs";
import { dirname, resolve } from "node:path";
import { env } from "../lib/env";
import * as schema from "./schema";
import { scopedTransactions, serialClient, type NativeConnection, type SerialClient } from "./serial-client";
import { installStatementCache } from "./statement-cache";

export type Database = LibSQLDatabase<typeof schema>;

interface DatabaseHandle {
  client: Client;
  db: Database;
  ready: Promise<void>;
  /** A local file's connection itself, in its turn (db/serial-client.ts); absent for a libSQL server. */
  onConnection?: SerialClient["onConnection"];
}

/**
 * One client per process. A local file is one connection taken in turn (db/serial-client.ts explains why),
 * with WAL (other processes' readers never wait for the writer), `synchronous = NORMAL` (a commit survives a
 * crash of the process; a power cut may lose the last ones, never the file), foreign keys and a busy
 * timeout for locks held by other processes. A libSQL server URL (libsql://, https://, ws://) is used as it
 * is, with its auth token.
 */
function open(url: string, authToken: string | undefined): DatabaseHandle {
  const isLocalFile = url.startsWith("file:");
  if (isLocalFile) {
    const path = url.slice("file:".length);
    if (path && path !== ":memory:") mkdirSync(dirname(resolve(path)), { recursive: true });
  }
  if (isLocalFile) installStatementCache();
  const serial = isLocalFile ? serialClient(createClient({ url, concurrency: 1, timeout: 5000 })) : undefined;
  const client = serial ?? createClient({ url, authToken });
  const ready = (async () => {
    if (isLocalFile) {
      await client.execute("PRAGMA journal_mode = WAL");
      await client.execute("PRAGMA busy_timeout = 5000");
      await client.execute("PRAGMA synchronous = NORMAL");
    }
    await client.execute("PRAGMA foreign_keys = ON");
  })();
  const db = drizzle(client, { schema });
  return { client, db: isLocalFile ? scopedTransactions(db) : db, ready, onConnection: serial?.onConnection };
}

const globalForDb = globalThis as unknown as { towmarginDb?: DatabaseHandle };

export function databaseHandle(): DatabaseHandle {
  if (!globalForDb.towmarginDb) {
    globalForDb.towmarginDb = open(env.DATABASE_URL, env.DATABASE_AUTH_TOKEN || undefined);
  }
  return globalForDb.towmarginDb;
}

/** The database, with its connection settings applied. */
export async function getDb(): Promise<Database> {
  const handle = databaseHandle();
  await handle.ready;
  return handle.db;
}

/**
 * One statement on a local file's connection itself, in its turn with every other statement, for the few
 * statements a request always runs (the rate limit's): it skips Drizzle's and the client's layers. Undefined
 * where there is no such connection (a libSQL server): then go through `getDb()`.
 */
export async function onConnection<T>(work: (connection: NativeConnection) => T): Promise<T | undefined> {
  const handle = databaseHandle();
  await handle.ready;
  return handle.onConnection ? handle.onConnection(work) : undefined;
}
