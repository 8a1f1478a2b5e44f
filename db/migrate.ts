import { migrate } from "drizzle-orm/libsql/migrator";
import { fileURLToPath } from "node:url";
import { getDb } from "./client";

const migrationsFolder = fileURLToPath(new URL("./migrations", import.meta.url));

/** Applies every committed migration that has not run yet. Safe to call on every start. */
export async function applyMigrations(): Promise<void> {
  const db = await getDb();
  await migrate(db, { migrationsFolder });
}
