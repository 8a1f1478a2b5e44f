import { databaseHandle, getDb } from "@/db/client";

/**
 * Every row of every table, as one comparable string: a refused request must leave it exactly as it was.
 * Sessions are left out (reading one renews it), and so are the rate-limit counters (a refused request is
 * still counted), the stored pair verdicts (worked out from the profiles, in the background after an earlier
 * change) and the migrations journal.
 */
export async function snapshotAll(): Promise<string> {
  await getDb();
  const { client } = databaseHandle();
  const tables = await client.execute(
    "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' AND name NOT LIKE '__drizzle%' AND name NOT IN ('sessions', 'rate_limits', 'pair_verdicts', 'pair_rechecks') ORDER BY name",
  );
  const parts: Record<string, unknown[]> = {};
  for (const row of tables.rows) {
    const name = String(row.name);
    parts[name] = (await client.execute(`SELECT * FROM "${name}" ORDER BY rowid`)).rows.map((r) => ({ ...r }));
  }
  return JSON.stringify(parts, (_key, value) => (typeof value === "bigint" ? String(value) : value));
}

export async function rowCount(table: string): Promise<number> {
  await getDb();
  const { client } = databaseHandle();
  return Number((await client.execute(`SELECT count(*) AS n FROM "${table}"`)).rows[0]!.n);
}

/** Text that would show a stack trace or an internal error to the person who sent the request. */
export const STACK_TRACE = /\n\s+at |at [\w.<>]+ \(.*:\d+:\d+\)|node_modules|\.tsx?:\d+|TypeError|ReferenceError|SQLITE_|ZodError/;
