import { and, eq } from "drizzle-orm";
import { rmSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-pairs-${process.pid}-${Date.now()}.db`;
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);
import { archiveProfileAction, saveProfileAction } from "@/app/(workspace)/fleet/actions";
import { GET as matrixRoute } from "@/app/api/v1/fleet/matrix/route";
import { getDb } from "@/db/client";
import { organisations, pairRechecks, pairVerdicts, trailerProfiles, vehicleProfiles } from "@/db/schema";
import { evaluatePair, profilePart, type MatrixCell } from "@/lib/fleet/matrix";
import { settledPairRechecks } from "@/lib/server/pair-verdicts";
import { actAs, buildFixture, ORG_A } from "./support/fixture";

// The stored pair verdicts (pair_verdicts) of a small fleet: three invented trucks and two invented trailers of
// organisation A. Correctness only: which pairs are worked out again, and when the stored ones are trusted.

const truck = (name: string, towRating: string) => ({
  name,
  units: "imperial",
  vehicle: { gvwr: "9900", curbWeight: "6400", towRating },
  hitch: { class: "4", gtwRating: "10000", twRating: "1000", receiverHeight: "20.5", pinToFascia: "5" },
});
const trailer = (name: string, gross: string, tongue: string) => ({
  name,
  units: "imperial",
  trailer: { type: "utility", grossTrailerWeight: gross, tongueWeight: tongue, tongueWeightBasis: "measured", couplerHeight: "17.5" },
});

interface Page {
  rechecking: boolean;
  evaluated: number;
  counts: Record<string, number> | null;
  rows: Array<{ id: string; cells: Array<MatrixCell | null> }>;
  columns: Array<{ id: string }>;
}
const matrix = async (query = "") => (await (await matrixRoute(new Request(`http://t/api/v1/fleet/matrix?${query}`))).json()) as Page;

async function storedRows() {
  const db = await getDb();
  const rows = await db.select().from(pairVerdicts).where(eq(pairVerdicts.organisationId, ORG_A));
  return new Map(rows.map((row) => [`${row.vehicleId} ${row.hitchedId}`, row]));
}

/** Each pair's verdict worked out alone, from the profiles as they are in the database. */
async function freshLevel(vehicleId: string, trailerId: string, tightMarginRatio = 0.1) {
  const db = await getDb();
  const v = (await db.select().from(vehicleProfiles).where(eq(vehicleProfiles.id, vehicleId)).get())!;
  const t = (await db.select().from(trailerProfiles).where(eq(trailerProfiles.id, trailerId)).get())!;
  const part = (row: { units: "imperial" | "metric"; data: unknown }) => profilePart({ units: row.units, data: row.data as Record<string, unknown> }, "imperial");
  return evaluatePair("imperial", part(v), part(t), tightMarginRatio, 0.1).level;
}

afterAll(async () => {
  await settledPairRechecks();
  const file = process.env.DATABASE_URL!.slice("file:".length);
  for (const suffix of ["", "-wal", "-shm"]) rmSync(`${file}${suffix}`, { force: true });
});

const ids = { trucks: [] as string[], trailers: [] as string[] };

beforeAll(async () => {
  await buildFixture();
  await actAs("fleetA");
  for (const [name, rating] of [
    ["Stored truck A", "9000"],
    ["Stored truck B", "5000"],
    ["Stored truck C", "3000"],
  ] as const) {
    ids.trucks.push((await saveProfileAction({ kind: "vehicles", values: truck(name, rating) })).id!);
  }
  for (const [name, gross, tongue] of [
    ["Stored trailer P", "4000", "480"],
    ["Stored trailer Q", "7000", "840"],
  ] as const) {
    ids.trailers.push((await saveProfileAction({ kind: "trailers", values: trailer(name, gross, tongue) })).id!);
  }
  await settledPairRechecks();
});

describe("stored pair verdicts", () => {
  it("keeps every pair of the fleet with the verdict it has alone, and answers from them", async () => {
    const page = await matrix();
    expect(page).toMatchObject({ rechecking: false, evaluated: 0 });
    const stored = await storedRows();
    expect(stored.size).toBe(3 * 2);
    for (const v of ids.trucks) for (const t of ids.trailers) expect(stored.get(`${v} ${t}`)!.level).toBe(await freshLevel(v, t));
    // Statics, with the lowest rating governing (Source: WAC 204-70-060): 7,000 lb behind truck C's 3,000 lb tow rating is over.
    const row = page.rows.find((r) => r.id === ids.trucks[2])!;
    expect(row.cells[page.columns.findIndex((c) => c.id === ids.trailers[1])]!.level).toBe("over");
    const db = await getDb();
    expect(await db.select().from(pairRechecks).where(eq(pairRechecks.organisationId, ORG_A)).get()).toMatchObject({ status: "ready", claim: null });
  });

  it("works out again only the pairs of a changed profile", async () => {
    const before = await storedRows();
    const saved = await saveProfileAction({ kind: "trailers", id: ids.trailers[0], values: trailer("Stored trailer P", "8800", "1050") });
    expect(saved.ok).toBe(true);
    await settledPairRechecks();
    const after = await storedRows();
    for (const [key, row] of after) {
      const changed = key.endsWith(` ${ids.trailers[0]}`);
      if (changed) expect(row.inputs).not.toBe(before.get(key)!.inputs);
      else expect(row.inputs).toBe(before.get(key)!.inputs);
      const [v, t] = key.split(" ");
      expect(row.level).toBe(await freshLevel(v!, t!));
    }
    // 8,800 lb is above truck B's 5,000 lb tow rating (the lowest rating governs; Source: WAC 204-70-060).
    expect(after.get(`${ids.trucks[1]} ${ids.trailers[0]}`)!.level).toBe("over");
  });

  it("drops the pairs of an archived profile", async () => {
    expect(await archiveProfileAction({ kind: "vehicles", id: ids.trucks[2]!, archived: true })).toMatchObject({ ok: true });
    await settledPairRechecks();
    const stored = await storedRows();
    expect(stored.size).toBe(2 * 2);
    expect([...stored.keys()].some((key) => key.startsWith(`${ids.trucks[2]} `))).toBe(false);
    const counts = (await matrix()).counts!;
    expect(Object.values(counts).reduce((a, b) => a + b, 0)).toBe(4);
  });

  it("re-stamps every pair when the organisation's tight threshold changes", async () => {
    const db = await getDb();
    const before = await storedRows();
    await db.update(organisations).set({ tightMarginRatio: 0.25 }).where(eq(organisations.id, ORG_A));
    const page = await matrix();
    expect(page.rechecking).toBe(false);
    const after = await storedRows();
    for (const [key, row] of after) {
      expect(row.inputs).not.toBe(before.get(key)!.inputs);
      const [v, t] = key.split(" ");
      expect(row.level).toBe(await freshLevel(v!, t!, 0.25));
    }
    await db.update(organisations).set({ tightMarginRatio: 0.1 }).where(eq(organisations.id, ORG_A));
    await matrix();
  });

  it("does not trust stored verdicts another process is rechecking: works the small fleet out itself, then takes over a claim left behind", async () => {
    const db = await getDb();
    // Another process claimed the recheck a moment ago, after this truck changed.
    await saveProfileAction({ kind: "vehicles", id: ids.trucks[0], values: truck("Stored truck A", "4000") });
    await settledPairRechecks();
    const stale = await storedRows();
    await db.update(pairRechecks).set({ status: "rechecking", fingerprint: "another", claim: "another-process", claimedAt: Date.now() }).where(eq(pairRechecks.organisationId, ORG_A));
    await db.update(pairVerdicts).set({ level: "within", inputs: "old" }).where(and(eq(pairVerdicts.organisationId, ORG_A), eq(pairVerdicts.vehicleId, ids.trucks[0]!)));
    const page = await matrix();
    expect(page.rechecking).toBe(false);
    expect(page.evaluated).toBe(2 * 2);
    const row = page.rows.find((r) => r.id === ids.trucks[0])!;
    // 8,800 lb behind a 4,000 lb tow rating: over, whatever the stored row says.
    expect(row.cells[page.columns.findIndex((c) => c.id === ids.trailers[0])]!.level).toBe("over");
    expect((await storedRows()).get(`${ids.trucks[0]} ${ids.trailers[0]}`)!.level).toBe("within");
    // The other process ended without finishing: after half a minute its claim is taken over.
    await db.update(pairRechecks).set({ claimedAt: Date.now() - 60_000 }).where(eq(pairRechecks.organisationId, ORG_A));
    expect((await matrix()).evaluated).toBe(0);
    const after = await storedRows();
    expect(after.get(`${ids.trucks[0]} ${ids.trailers[0]}`)!.level).toBe("over");
    expect(after.size).toBe(stale.size);
    expect(await db.select().from(pairRechecks).where(eq(pairRechecks.organisationId, ORG_A)).get()).toMatchObject({ status: "ready", claim: null });
  });
});
