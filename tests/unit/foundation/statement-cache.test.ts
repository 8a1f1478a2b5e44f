import { createClient, type Client } from "@libsql/client";
import Database from "libsql";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { installStatementCache } from "@/db/statement-cache";
import { serialClient } from "@/db/serial-client";

let dir: string;
let client: Client;

beforeAll(async () => {
  installStatementCache();
  dir = mkdtempSync(join(tmpdir(), "towmargin-statements-"));
  client = serialClient(createClient({ url: `file:${join(dir, "app.db")}`, concurrency: 1, timeout: 5000 }));
  await client.execute("CREATE TABLE rows (id INTEGER PRIMARY KEY, kind TEXT NOT NULL)");
});

afterAll(() => {
  client.close();
  rmSync(dir, { recursive: true, force: true });
});

describe("prepared statements kept per connection", () => {
  it("prepares a statement text once per connection", () => {
    const db = new Database(":memory:");
    const other = new Database(":memory:");
    expect(db.prepare("SELECT 1")).toBe(db.prepare("SELECT 1"));
    expect(db.prepare("SELECT 2")).not.toBe(db.prepare("SELECT 1"));
    expect(other.prepare("SELECT 1")).not.toBe(db.prepare("SELECT 1"));
  });

  it("answers each run with its own arguments, reads and writes alike", async () => {
    for (const kind of ["a", "b", "b", "c"]) await client.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: [kind] });
    const count = async (kind: string) => Number((await client.execute({ sql: "SELECT count(*) AS n FROM rows WHERE kind = ?", args: [kind] })).rows[0]!.n);
    expect([await count("a"), await count("b"), await count("c"), await count("d")]).toEqual([1, 2, 1, 0]);
    const update = await client.execute({ sql: "UPDATE rows SET kind = ? WHERE kind = ?", args: ["d", "b"] });
    expect(update.rowsAffected).toBe(2);
    expect(await count("d")).toBe(2);
  });

  it("remembers a kept statement's columns and that a write returns no rows, and still answers each run", async () => {
    const db = new Database(":memory:");
    db.exec("CREATE TABLE counters (key TEXT PRIMARY KEY, n INTEGER NOT NULL)");
    const select = db.prepare("SELECT key, n FROM counters");
    expect(select.columns()).toBe(select.columns());
    expect(select.columns().map((column: { name: string }) => column.name)).toEqual(["key", "n"]);
    const insert = db.prepare("INSERT INTO counters (key, n) VALUES (?, 1)");
    const first = (() => {
      try {
        insert.raw(true);
      } catch (error) {
        return error;
      }
    })();
    expect(first).toBeInstanceOf(Error);
    expect(() => insert.raw(true)).toThrow(first as Error);
    expect(insert.run(["a"]).changes).toBe(1);
    const upsert = "INSERT INTO counters (key, n) VALUES (?, 1) ON CONFLICT (key) DO UPDATE SET n = n + 1 RETURNING n";
    for (const expected of [2, 3]) {
      const statement = db.prepare(upsert);
      statement.raw(true);
      expect(statement.get(["a"])).toEqual([expected]);
    }
    // Through the client: a write's rowsAffected, a RETURNING's rows, run after run.
    await client.execute("CREATE TABLE IF NOT EXISTS tallies (key TEXT PRIMARY KEY, n INTEGER NOT NULL)");
    for (const expected of [1, 2, 3]) {
      const returned = await client.execute({ sql: "INSERT INTO tallies (key, n) VALUES (?, 1) ON CONFLICT (key) DO UPDATE SET n = n + 1 RETURNING n", args: ["k"] });
      expect(returned.columns).toEqual(["n"]);
      expect(Number(returned.rows[0]!.n)).toBe(expected);
      const written = await client.execute({ sql: "UPDATE tallies SET n = n WHERE key = ?", args: ["k"] });
      expect(written.rowsAffected).toBe(1);
    }
    db.close();
  });

  it("still answers rightly after the table changes shape", async () => {
    const select = "SELECT * FROM rows ORDER BY id LIMIT 1";
    expect((await client.execute(select)).columns).toEqual(["id", "kind"]);
    await client.execute("ALTER TABLE rows ADD COLUMN note TEXT");
    expect((await client.execute(select)).columns).toEqual(["id", "kind", "note"]);
  });

  it("keeps transactions working: begin, commit and rollback run again and again", async () => {
    for (let i = 0; i < 3; i++) {
      const tx = await client.transaction("write");
      await tx.execute({ sql: "INSERT INTO rows (kind) VALUES (?)", args: [`tx-${i}`] });
      if (i === 1) await tx.rollback();
      else await tx.commit();
    }
    const kinds = (await client.execute("SELECT kind FROM rows WHERE kind LIKE 'tx-%' ORDER BY kind")).rows.map((row) => row.kind);
    expect(kinds).toEqual(["tx-0", "tx-2"]);
  });
});
