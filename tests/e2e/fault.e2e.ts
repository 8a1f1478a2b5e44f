import { createClient } from "@libsql/client";
import { readFileSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seededDatabase, sessionCookieFor, startApp, type AppDatabase, type AppServer } from "../load/support/app-server";

const camper = JSON.parse(readFileSync("tests/fixtures/rigs/camper-on-pickup.json", "utf8"));

/**
 * Saves from several clients at once until stopped; returns the ids the server acknowledged (201 with an id).
 * A request cut off by the crash is not acknowledged, so it may or may not be stored.
 */
function streamSaves(server: AppServer, cookie: string, clients: number) {
  const acknowledged: string[] = [];
  let running = true;
  let attempts = 0;
  const worker = async (client: number) => {
    for (let i = 0; running; i++) {
      attempts++;
      try {
        const response = await fetch(`${server.baseURL}/api/v1/checks`, {
          method: "POST",
          headers: { "content-type": "application/json", cookie },
          body: JSON.stringify({ rig: camper, customerName: `Crash customer ${client}-${i}` }),
        });
        if (response.status === 201) acknowledged.push(((await response.json()) as { id: string }).id);
      } catch {
        // the server is gone: keep trying until told to stop
        await new Promise((resolve) => setTimeout(resolve, 20));
      }
    }
  };
  const done = Promise.all(Array.from({ length: clients }, (_, client) => worker(client)));
  return {
    acknowledged,
    attempts: () => attempts,
    stop: async () => {
      running = false;
      await done;
    },
  };
}

async function inspect(url: string, ids: string[]) {
  const client = createClient({ url });
  try {
    const integrity = (await client.execute("PRAGMA integrity_check")).rows.map((row) => String(Object.values(row)[0]));
    const stored = new Set<string>();
    for (let i = 0; i < ids.length; i += 200) {
      const batch = ids.slice(i, i + 200);
      const rows = await client.execute({ sql: `SELECT id FROM saved_checks WHERE id IN (${batch.map(() => "?").join(",")})`, args: batch });
      for (const row of rows.rows) stored.add(String(row.id));
    }
    return { integrity, missing: ids.filter((id) => !stored.has(id)) };
  } finally {
    client.close();
  }
}

describe("a crash in the middle of saving", () => {
  let database: AppDatabase;
  let server: AppServer | undefined;
  beforeAll(() => {
    database = seededDatabase("towmargin-fault-");
  });
  afterAll(async () => {
    await server?.stop();
    database.remove();
  });

  it("kill -9 during a stream of saves: the database is intact and every acknowledged save is there", async () => {
    server = await startApp(database.url);
    const cookie = await sessionCookieFor(database.url, "counter@quillfield.example.com");
    const acknowledged: string[] = [];
    for (let round = 1; round <= 2; round++) {
      const stream = streamSaves(server, cookie, 6);
      // Let the saves get going, then pull the plug with no warning at all.
      const started = Date.now();
      while (stream.acknowledged.length < 40 && Date.now() - started < 20_000) await new Promise((resolve) => setTimeout(resolve, 25));
      await server.kill();
      const beforeStop = stream.acknowledged.length;
      await stream.stop();
      acknowledged.push(...stream.acknowledged);
      console.log(`crash ${round}: ${beforeStop} saves acknowledged before kill -9 (${stream.attempts()} attempts in all)`);
      expect(beforeStop).toBeGreaterThan(0);

      server = await startApp(database.url);
      const { integrity, missing } = await inspect(database.url, acknowledged);
      expect(integrity).toEqual(["ok"]);
      expect(missing).toEqual([]);
    }
    // And the restarted server takes new saves.
    const after = await fetch(`${server.baseURL}/api/v1/checks`, {
      method: "POST",
      headers: { "content-type": "application/json", cookie },
      body: JSON.stringify({ rig: camper, customerName: "After the crash" }),
    });
    expect(after.status).toBe(201);
  });
});
