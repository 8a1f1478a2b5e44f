import { createClient } from "@libsql/client";
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { createHash, randomBytes } from "node:crypto";
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { sessionCookieSettings } from "../../../lib/server/session-cookie";

/**
 * A production server of this tree on a free loopback port, over its own seeded SQLite file: the bench and
 * the crash test start, kill and restart it as they need.
 */
export const DIST_DIR = process.env.NEXT_DIST_DIR || (process.env.TOWMARGIN_TEST_ROUTES === "1" ? ".next-test" : ".next");

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/** Runs `next build` into NEXT_DIST_DIR when that folder has no finished build. */
export function buildIfNeeded(root = process.cwd()): void {
  if (existsSync(join(root, DIST_DIR, "BUILD_ID"))) return;
  const build = spawnSync("npx", ["next", "build"], { stdio: "inherit", env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" } });
  if (build.status !== 0) throw new Error("next build failed.");
}

export interface AppDatabase {
  dir: string;
  url: string;
  remove: () => void;
}

/** A new temporary SQLite file with the migrations and the demo seed applied. */
export function seededDatabase(prefix = "towmargin-load-"): AppDatabase {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  const url = `file:${join(dir, "app.db")}`;
  const seed = spawnSync("npx", ["tsx", "scripts/seed.ts"], { env: { ...process.env, DATABASE_URL: url }, encoding: "utf8" });
  if (seed.status !== 0) throw new Error(`Seeding failed: ${seed.stderr}`);
  return { dir, url, remove: () => rmSync(dir, { recursive: true, force: true }) };
}

export interface AppServer {
  baseURL: string;
  port: number;
  process: ChildProcess;
  log: () => string;
  /** SIGTERM to the whole process group, and waits for it to end. */
  stop: () => Promise<void>;
  /** SIGKILL to the whole process group (kill -9): no shutdown code runs. */
  kill: () => Promise<void>;
}

function ended(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => child.once("exit", () => resolve()));
}

/** `nodeArgs` go before Next's own (for instance `--cpu-prof`, which NODE_OPTIONS does not take). */
export async function startApp(databaseUrl: string, extraEnv: Record<string, string> = {}, port?: number, nodeArgs: string[] = []): Promise<AppServer> {
  const appPort = port ?? (await freePort());
  const baseURL = `http://127.0.0.1:${appPort}`;
  // `next start` directly (not through npx) so the process group is exactly this server.
  const nextBin = join(process.cwd(), "node_modules", "next", "dist", "bin", "next");
  const child = spawn(process.execPath, [...nodeArgs, nextBin, "start", "-p", String(appPort), "-H", "127.0.0.1"], {
    env: {
      ...process.env,
      NODE_ENV: "production",
      NEXT_TELEMETRY_DISABLED: "1",
      DATABASE_URL: databaseUrl,
      APP_URL: baseURL,
      // Nothing listens here: mail fails fast and never leaves the machine.
      SMTP_HOST: "127.0.0.1",
      SMTP_PORT: "9",
      ...extraEnv,
    },
    stdio: ["ignore", "pipe", "pipe"],
    detached: true,
  });
  let log = "";
  child.stdout?.on("data", (chunk) => (log += chunk));
  child.stderr?.on("data", (chunk) => (log += chunk));
  const signal = async (name: NodeJS.Signals) => {
    if (child.pid && child.exitCode === null && child.signalCode === null) {
      try {
        process.kill(-child.pid, name);
      } catch {
        // already gone
      }
    }
    await ended(child);
  };
  const server: AppServer = { baseURL, port: appPort, process: child, log: () => log, stop: () => signal("SIGTERM"), kill: () => signal("SIGKILL") };
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The app server exited early with code ${child.exitCode}.\n${log}`);
    try {
      if ((await fetch(`${baseURL}/api/v1/health`)).ok) return server;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  await server.kill();
  throw new Error(`The app server did not answer within 60 s.\n${log}`);
}

/**
 * A session for a seeded person, written straight into the sessions table (as the session library would),
 * so load tools can send its cookie without driving the sign-in form. Returns the Cookie header value.
 */
export async function sessionCookieFor(databaseUrl: string, email: string): Promise<string> {
  const client = createClient({ url: databaseUrl });
  try {
    const user = (await client.execute({ sql: "SELECT u.id, m.organisation_id FROM users u JOIN memberships m ON m.user_id = u.id WHERE u.email = ?", args: [email] })).rows[0];
    if (!user) throw new Error(`No seeded person with the address ${email}.`);
    const id = randomBytes(20).toString("hex");
    await client.execute({
      sql: "INSERT INTO sessions (id, user_id, expires_at, organisation_id) VALUES (?, ?, ?, ?)",
      // The table keys a session by the SHA-256 of the id the cookie carries (lib/server/session.ts).
      args: [createHash("sha256").update(id).digest("hex"), String(user.id), Math.floor(Date.now() / 1000) + 86_400, String(user.organisation_id)],
    });
    // `next start` is a production server: the cookie has the __Host- prefix (lib/server/session-cookie.ts).
    return `${sessionCookieSettings(true).name}=${id}`;
  } finally {
    client.close();
  }
}

export async function countRows(databaseUrl: string, table: "saved_checks"): Promise<number> {
  const client = createClient({ url: databaseUrl });
  try {
    return Number((await client.execute(`SELECT count(*) AS n FROM ${table}`)).rows[0]!.n);
  } finally {
    client.close();
  }
}

/**
 * CPU time (user + system, every thread) used so far by the server's process group, in milliseconds, from
 * /proc: the load tool shares the machine, so req/s alone mixes the server's cost with its neighbours'.
 * 0 where /proc is missing.
 */
export function cpuTimeMs(server: AppServer): number {
  const group = server.process.pid;
  if (!group || !existsSync("/proc")) return 0;
  let ticks = 0;
  for (const entry of readdirSync("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      // The fields after the command's closing parenthesis: state is field 3, pgrp 5, utime 14, stime 15.
      const fields = readFileSync(`/proc/${entry}/stat`, "utf8").split(") ")[1]!.split(" ");
      if (Number(fields[2]) === group) ticks += Number(fields[11]) + Number(fields[12]);
    } catch {
      // the process ended while we looked
    }
  }
  // Linux counts in clock ticks of 1/100 s (USER_HZ).
  return ticks * 10;
}
