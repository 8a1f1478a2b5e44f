import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-limits-${process.pid}-${Date.now()}.db`;
});

import { createClient } from "@libsql/client";
import { getDb, onConnection } from "@/db/client";
import { applyMigrations } from "@/db/migrate";
import { rateLimits } from "@/db/schema";
import { consume, resetRateLimits } from "@/lib/server/rate-limit";

import { clientAddressFrom, PEER_ADDRESS_HEADER } from "@/lib/server/request";

beforeAll(async () => {
  await applyMigrations();
});

describe("rate limit", () => {
  beforeEach(resetRateLimits);

  it("allows the limit, refuses the next, and opens again after the window", async () => {
    const now = 1_000_000;
    for (let i = 0; i < 3; i++) expect((await consume("sign-in:a", 3, 60_000, now)).allowed).toBe(true);
    const refused = await consume("sign-in:a", 3, 60_000, now + 1_000);
    expect(refused.allowed).toBe(false);
    expect(refused.retryAfterSeconds).toBe(59);
    expect((await consume("sign-in:b", 3, 60_000, now + 1_000)).allowed).toBe(true);
    expect((await consume("sign-in:a", 3, 60_000, now + 60_000)).allowed).toBe(true);
  });

  it("a flood of new names leaves every other counter as it was (each name is a row of its own)", async () => {
    const now = 2_000_000;
    for (let i = 0; i < 4; i++) await consume("sign-in:address:victim", 3, 900_000, now + 1);
    expect((await consume("sign-in:address:victim", 3, 900_000, now + 2)).allowed).toBe(false);
    for (let i = 0; i < 500; i++) await consume(`flood:${i}`, 5, 900_000, now + 3);
    expect((await consume("sign-in:address:victim", 3, 900_000, now + 4)).allowed).toBe(false);
  });

  it("counts in the database, so another connection (another server process) sees the same counter", async () => {
    const now = Date.now();
    for (let i = 0; i < 2; i++) await consume("evaluate:192.0.2.7", 2, 60_000, now);
    // A second connection to the same file counts on from the first one's two.
    const other = createClient({ url: process.env.DATABASE_URL! });
    try {
      const row = await other.execute({ sql: "SELECT count, reset_at FROM rate_limits WHERE key = ?", args: ["evaluate:192.0.2.7"] });
      expect(Number(row.rows[0]!.count)).toBe(2);
      expect(Number(row.rows[0]!.reset_at)).toBe(now + 60_000);
      await other.execute({ sql: "UPDATE rate_limits SET count = count + 1 WHERE key = ?", args: ["evaluate:192.0.2.7"] });
    } finally {
      other.close();
    }
    expect((await consume("evaluate:192.0.2.7", 4, 60_000, now + 1)).allowed).toBe(true); // the fourth
    expect((await consume("evaluate:192.0.2.7", 4, 60_000, now + 2)).allowed).toBe(false); // the fifth
  });

  it("counts on the local file's connection itself, with the same SQL Drizzle writes for it", async () => {
    // The statement the counter runs directly; a libSQL server (no such connection) goes through Drizzle.
    expect(await onConnection((connection) => connection.open)).toBe(true);
    const now = Date.now();
    expect(await consume("direct:192.0.2.9", 1, 60_000, now)).toEqual({ allowed: true, retryAfterSeconds: 60 });
    expect(await consume("direct:192.0.2.9", 1, 60_000, now + 1_500)).toEqual({ allowed: false, retryAfterSeconds: 59 });
    const db = await getDb();
    expect(await db.select().from(rateLimits)).toEqual([{ key: "direct:192.0.2.9", count: 2, resetAt: now + 60_000 }]);
  });

  it("loses no count when many checks of one key arrive at once", async () => {
    const now = Date.now();
    const answers = await Promise.all(Array.from({ length: 50 }, () => consume("sign-up:address:192.0.2.8", 20, 60_000, now)));
    expect(answers.filter((answer) => answer.allowed)).toHaveLength(20);
    const db = await getDb();
    expect((await db.select().from(rateLimits)).map((row) => row.count)).toEqual([50]);
  });

  it("sweeps counters whose window has ended, keeping the others", async () => {
    const now = Date.now() + 3_600_000;
    await consume("old", 5, 1_000, now - 10_000);
    await consume("current", 5, 600_000, now - 10_000);
    await consume("trigger", 5, 60_000, now + 60_000); // the first check a minute after the last sweep sweeps again
    await new Promise((resolve) => setTimeout(resolve, 50));
    const db = await getDb();
    expect((await db.select({ key: rateLimits.key }).from(rateLimits)).map((row) => row.key).sort()).toEqual(["current", "trigger"]);
  });
});

describe("the client's address", () => {
  const headers = (values: Record<string, string>) => new Headers(values);

  it("with no trusted proxy, ignores a forwarding header the client sent and uses the connection's address", () => {
    const sent = headers({ "x-forwarded-for": "198.51.100.1, 198.51.100.2", "x-real-ip": "198.51.100.3", [PEER_ADDRESS_HEADER]: "203.0.113.9" });
    expect(clientAddressFrom(sent, 0)).toBe("203.0.113.9");
  });

  it("with one trusted proxy, takes the address that proxy appended, not what the client claimed before it", () => {
    const sent = headers({ "x-forwarded-for": "198.51.100.1, 192.0.2.44", [PEER_ADDRESS_HEADER]: "10.0.0.2" });
    expect(clientAddressFrom(sent, 1)).toBe("192.0.2.44");
    expect(clientAddressFrom(sent, 2)).toBe("198.51.100.1");
  });

  it("with more trusted hops than the header holds, falls back to its first entry", () => {
    const sent = headers({ "x-forwarded-for": "192.0.2.44", [PEER_ADDRESS_HEADER]: "10.0.0.2" });
    expect(clientAddressFrom(sent, 3)).toBe("192.0.2.44");
    expect(clientAddressFrom(headers({ [PEER_ADDRESS_HEADER]: "10.0.0.2" }), 1)).toBe("10.0.0.2");
  });
});
