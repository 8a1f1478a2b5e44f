import { createClient } from "@libsql/client";
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seededDatabase, sessionCookieFor, startApp, type AppDatabase, type AppServer } from "../load/support/app-server";
import { openBrowser } from "./support/browser";

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));
const EVALUATE_LIMIT = 6;

/**
 * Two production server processes on one SQLite file (WAL), as a shop runs them behind one proxy on one
 * machine: what one process does, the other sees.
 */
describe("two server processes on one database", () => {
  let database: AppDatabase;
  let a: AppServer;
  let b: AppServer;

  beforeAll(async () => {
    database = seededDatabase("towmargin-processes-");
    const settings = { EVALUATE_LIMIT_PER_MINUTE: String(EVALUATE_LIMIT) };
    [a, b] = await Promise.all([startApp(database.url, settings), startApp(database.url, settings)]);
  });

  afterAll(async () => {
    await Promise.all([a?.stop(), b?.stop()]);
    database?.remove();
  });

  it("a session started on one is honoured on the other, and signing out on one ends it on both", async () => {
    const session = await openBrowser();
    try {
      const { page, context } = session;
      await page.goto(`${a.baseURL}/sign-in`);
      await page.getByLabel("E-mail").fill("counter@quillfield.example.com");
      await page.getByLabel("Password").fill("towmargin-demo");
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.waitForURL(/\/overview/);
      const cookie = (await context.cookies()).find((c) => c.name.endsWith("towmargin_session"));
      expect(cookie).toBeDefined();
      const me = (server: AppServer) => fetch(`${server.baseURL}/api/v1/me`, { headers: { cookie: `${cookie!.name}=${cookie!.value}` } });
      const onB = await me(b);
      expect(onB.status).toBe(200);
      expect(JSON.stringify(await onB.json())).toContain("counter@quillfield.example.com");

      // The cookie belongs to the address, not the port: the browser opens B's workspace signed in, and signs out there.
      await page.goto(`${b.baseURL}/overview`);
      const signOut = page.getByRole("button", { name: "Sign out" });
      await signOut.waitFor();
      await signOut.click();
      await page.waitForURL(/\/sign-in\?signed-out=1/);
      expect((await me(b)).status).toBe(401);
      expect((await me(a)).status).toBe(401);
    } finally {
      await session.close();
    }
  });

  it("a check saved through one is read through the other", async () => {
    const cookie = await sessionCookieFor(database.url, "counter@quillfield.example.com");
    const saved = await fetch(`${a.baseURL}/api/v1/checks`, {
      method: "POST",
      headers: { "content-type": "application/json", cookie },
      body: JSON.stringify({ rig: camper, customerName: "Seen from the other process" }),
    });
    expect(saved.status).toBe(201);
    const { id } = (await saved.json()) as { id: string };
    const read = await fetch(`${b.baseURL}/api/v1/checks/${id}`, { headers: { cookie } });
    expect(read.status).toBe(200);
    expect(JSON.stringify(await read.json())).toContain("Seen from the other process");
  });

  it("a limit reached through one holds on the other", async () => {
    const evaluate = (server: AppServer) =>
      fetch(`${server.baseURL}/api/v1/evaluate`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ rig: camper, detail: "summary" }) });
    // Both servers see this test's requests from the same loopback address: one counter between them.
    const statuses: number[] = [];
    for (let i = 0; i < EVALUATE_LIMIT; i++) statuses.push((await evaluate(i % 2 ? b : a)).status);
    expect(statuses).toEqual(Array.from({ length: EVALUATE_LIMIT }, () => 200));
    const refusedOnA = await evaluate(a);
    const refusedOnB = await evaluate(b);
    expect([refusedOnA.status, refusedOnB.status]).toEqual([429, 429]);
    expect(Number(refusedOnB.headers.get("retry-after"))).toBeGreaterThan(0);
  });

  it("kill -9 of one during a stream of saves through both: no acknowledged save is lost, the file is intact, the other goes on", async () => {
    const cookie = await sessionCookieFor(database.url, "counter@quillfield.example.com");
    const acknowledged: string[] = [];
    let running = true;
    const worker = async (server: AppServer, client: number) => {
      for (let i = 0; running; i++) {
        try {
          const response = await fetch(`${server.baseURL}/api/v1/checks`, {
            method: "POST",
            headers: { "content-type": "application/json", cookie },
            body: JSON.stringify({ rig: camper, customerName: `Two processes ${client}-${i}` }),
          });
          if (response.status === 201) acknowledged.push(((await response.json()) as { id: string }).id);
        } catch {
          // a request cut off by the kill was never acknowledged; wait, then try again
          await new Promise((resolve) => setTimeout(resolve, 20));
        }
      }
    };
    const workers = [worker(a, 0), worker(a, 1), worker(a, 2), worker(b, 3), worker(b, 4), worker(b, 5)];
    const waitFor = async (count: number) => {
      const started = Date.now();
      while (acknowledged.length < count && Date.now() - started < 30_000) await new Promise((resolve) => setTimeout(resolve, 25));
    };
    await waitFor(40);
    await a.kill();
    const atKill = acknowledged.length;
    // B keeps saving after A is gone.
    await waitFor(atKill + 20);
    running = false;
    await Promise.all(workers);
    console.log(`two processes: ${atKill} saves acknowledged before kill -9 of one, ${acknowledged.length} in all`);
    expect(atKill).toBeGreaterThan(0);
    expect(acknowledged.length).toBeGreaterThanOrEqual(atKill + 20);

    const client = createClient({ url: database.url });
    try {
      const integrity = (await client.execute("PRAGMA integrity_check")).rows.map((row) => String(Object.values(row)[0]));
      expect(integrity).toEqual(["ok"]);
      const stored = new Set<string>();
      for (let i = 0; i < acknowledged.length; i += 200) {
        const batch = acknowledged.slice(i, i + 200);
        const rows = await client.execute({ sql: `SELECT id FROM saved_checks WHERE id IN (${batch.map(() => "?").join(",")})`, args: batch });
        for (const row of rows.rows) stored.add(String(row.id));
      }
      expect(acknowledged.filter((id) => !stored.has(id))).toEqual([]);
    } finally {
      client.close();
    }
  });
});
