import { createClient, type Client } from "@libsql/client";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { drizzle } from "drizzle-orm/libsql";
import { integer, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { scopedTransactions, serialClient, type SerialClient } from "@/db/serial-client";
import { installStatementCache } from "@/db/statement-cache";

let dir: string;
let client: SerialClient;

beforeEach(async () => {
  dir = mkdtempSync(join(tmpdir(), "towmargin-serial-"));
  client = serialClient(createClient({ url: `file:${join(dir, "app.db")}`, concurrency: 1, timeout: 5000 }));
  await client.execute("PRAGMA journal_mode = WAL");
  await client.execute("PRAGMA synchronous = NORMAL");
  await client.execute("CREATE TABLE rows (id INTEGER PRIMARY KEY, kind TEXT NOT NULL)");
});

afterEach(() => {
  client.close();
  rmSync(dir, { recursive: true, force: true });
});

const count = async (kind?: string) =>
  Number((await client.execute(kind ? { sql: "SELECT count(*) AS n FROM rows WHERE kind = ?", args: [kind] } : "SELECT count(*) AS n FROM rows")).rows[0]!.n);

describe("the local database client", () => {
  it("runs work on the connection itself in its turn: never inside another caller's transaction", async () => {
    installStatementCache();
    const tx = await client.transaction("write");
    await tx.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: ["in-tx"] });
    const direct = client.onConnection((connection) => connection.prepare("SELECT count(*) FROM rows").raw(true).get([]));
    await new Promise((resolve) => setTimeout(resolve, 20));
    await tx.rollback();
    // It waited for the rollback, so it counts no row; then it writes and reads on the client's connection.
    expect(await direct).toEqual([0]);
    await client.onConnection((connection) => connection.prepare("INSERT INTO rows (kind) VALUES (?)").get(["direct"]));
    expect(await count("direct")).toBe(1);
    expect(await client.onConnection((connection) => connection.prepare("PRAGMA synchronous").raw(true).get([]))).toEqual([1]);
  });

  it("answers every statement of a burst on the one connection that got the settings", async () => {
    // 1 is NORMAL. Without the gate the pool opens more connections under a burst, and those report 2 (FULL).
    const answers = await Promise.all(Array.from({ length: 40 }, () => client.execute("PRAGMA synchronous")));
    expect(new Set(answers.map((answer) => Number(answer.rows[0]![0])))).toEqual(new Set([1]));
  });

  it("lets statements that arrive during a transaction wait for it instead of failing or freezing", async () => {
    const transactions = Array.from({ length: 10 }, async (_, i) => {
      const tx = await client.transaction("write");
      await tx.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: [`tx-${i}`] });
      await new Promise((resolve) => setTimeout(resolve, 2));
      await tx.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: [`tx-${i}`] });
      await tx.commit();
    });
    const plain = Array.from({ length: 50 }, (_, i) => client.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: [`plain-${i % 5}`] }));
    await Promise.all([...transactions, ...plain]);
    expect(await count()).toBe(10 * 2 + 50);
    for (let i = 0; i < 10; i++) expect(await count(`tx-${i}`)).toBe(2);
  });

  it("rolls a failed transaction back and goes on with the next work", async () => {
    const failing = (async () => {
      const tx = await client.transaction("write");
      await tx.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: ["undone"] });
      await tx.rollback();
    })();
    const closedUnfinished = (async () => {
      const tx = await client.transaction("write");
      await tx.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: ["undone"] });
      tx.close();
    })();
    const broken = client.transaction("write").then(async (tx) => {
      try {
        await tx.execute("INSERT INTO no_such_table VALUES (1)");
      } finally {
        await tx.rollback();
      }
    });
    const after = client.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: ["kept"] });
    await Promise.all([failing, closedUnfinished, expect(broken).rejects.toThrow(/no_such_table/), after]);
    expect(await count("undone")).toBe(0);
    expect(await count("kept")).toBe(1);
  });

  it("keeps a failed statement from blocking the ones behind it", async () => {
    const results = await Promise.allSettled([
      client.execute("SELECT * FROM no_such_table"),
      client.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: ["after-error"] }),
    ]);
    expect(results.map((result) => result.status)).toEqual(["rejected", "fulfilled"]);
    expect(await count("after-error")).toBe(1);
  });

  it("refuses a query on the outer database made inside a transaction's callback, instead of waiting forever", async () => {
    const db = scopedTransactions(drizzle(client));
    const rows = sqliteTable("rows", { id: integer("id").primaryKey(), kind: text("kind").notNull() });
    const error = await db
      .transaction(async (tx) => {
        await tx.insert(rows).values({ kind: "inside" });
        await db.select().from(rows);
      })
      .catch((caught: Error & { cause?: Error }) => caught);
    // The ORM wraps it as a failed query; the reason is its cause.
    expect(String((error as Error & { cause?: Error })?.cause?.message)).toMatch(/inside a transaction/);
    // The transaction was rolled back, and the gate is free again.
    expect(await count("inside")).toBe(0);
  });

  it("runs drizzle's transactions and savepoints through the gate, next to plain statements", async () => {
    const db = scopedTransactions(drizzle(client));
    const rows = sqliteTable("rows", { id: integer("id").primaryKey(), kind: text("kind").notNull() });
    const work = db.transaction(async (tx) => {
      await tx.insert(rows).values({ kind: "outer" });
      await expect(
        tx.transaction(async (inner) => {
          await inner.insert(rows).values({ kind: "savepoint" });
          throw new Error("undo the savepoint");
        }),
      ).rejects.toThrow("undo the savepoint");
      await tx.insert(rows).values({ kind: "outer" });
    });
    const beside = Array.from({ length: 20 }, () => db.insert(rows).values({ kind: "beside" }));
    await Promise.all([work, ...beside]);
    expect([await count("outer"), await count("savepoint"), await count("beside")]).toEqual([2, 0, 20]);
  });

  it("lets the next work in when the client fails to begin a transaction, and refuses to reconnect", async () => {
    const failing = serialClient({
      ...client,
      execute: (stmt: string) => client.execute(stmt),
      transaction: () => {
        throw new Error("cannot begin");
      },
    } as unknown as Client);
    await expect(failing.transaction("write")).rejects.toThrow("cannot begin");
    expect((await failing.execute("SELECT 1")).rows.length).toBe(1);
    expect(() => client.reconnect()).toThrow(/does not reconnect/);
  });
});
