import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { TestProject } from "vitest/node";
import { CHROMIUM_PATH, chromiumMissingMessage } from "./chromium";
import { DIST_DIR } from "../../load/support/app-server";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    databaseUrl: string;
  }
}

function freePort(): Promise<number> {
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

async function waitForHealth(url: string, server: ChildProcess, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`The app server exited early with code ${server.exitCode}.`);
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`The app server did not answer ${url} within ${timeoutMs} ms.`);
}

/**
 * Starts what the browser tests need: a fresh SQLite file with the demo seed, the fake SMTP server and the
 * production build on free loopback ports. A missing chromium is a failure with an install hint, never a skip.
 */
export default async function setup(project: TestProject) {
  if (!existsSync(CHROMIUM_PATH)) throw new Error(chromiumMissingMessage());

  const root = process.cwd();
  if (!existsSync(join(root, DIST_DIR, "BUILD_ID"))) {
    const build = spawnSync("npx", ["next", "build"], { stdio: "inherit", env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" } });
    if (build.status !== 0) throw new Error("next build failed.");
  }

  const dir = mkdtempSync(join(tmpdir(), "towmargin-e2e-"));
  const databaseUrl = `file:${join(dir, "e2e.db")}`;
  const [appPort, smtpPort] = [await freePort(), await freePort()];
  const baseURL = `http://localhost:${appPort}`;
  const env = {
    ...process.env,
    NODE_ENV: "production" as const,
    NEXT_TELEMETRY_DISABLED: "1",
    DATABASE_URL: databaseUrl,
    APP_URL: baseURL,
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(smtpPort),
    DEV_MAILBOX: "on",
    // Every browser test reaches the server from one loopback address: the per-address sign-in limit would
    // count the whole suite as one visitor. The per-account limit stays as shipped (security.e2e.ts tests it).
    AUTH_LIMIT_PER_ADDRESS: "10000",
  };
  Object.assign(process.env, { DATABASE_URL: databaseUrl, SMTP_PORT: String(smtpPort) });

  const seed = spawnSync("npx", ["tsx", "scripts/seed.ts"], { env, encoding: "utf8" });
  if (seed.status !== 0) throw new Error(`Seeding failed: ${seed.stderr}`);

  // The fake SMTP server runs in this process, writing to the same database file as the app.
  const { startFakeSmtp } = await import("../../../lib/dev/fake-smtp");
  const smtp = await startFakeSmtp(smtpPort);

  const server = spawn("npx", ["next", "start", "-p", String(appPort), "-H", "127.0.0.1"], { env, stdio: ["ignore", "pipe", "pipe"], detached: true });
  let serverLog = "";
  server.stdout?.on("data", (chunk) => (serverLog += chunk));
  server.stderr?.on("data", (chunk) => (serverLog += chunk));
  try {
    await waitForHealth(`${baseURL}/api/v1/health`, server, 60_000);
  } catch (error) {
    console.error(serverLog);
    throw error;
  }

  project.provide("baseURL", baseURL);
  project.provide("databaseUrl", databaseUrl);

  return async () => {
    if (server.pid) {
      try {
        process.kill(-server.pid, "SIGTERM");
      } catch {
        // already gone
      }
    }
    await smtp.close();
    if (process.env.E2E_SHOW_SERVER_LOG === "1") console.log(serverLog);
    rmSync(dir, { recursive: true, force: true });
  };
}
