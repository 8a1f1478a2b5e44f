/**
 * `npm run demo`: migrate, seed, build and start Towmargin on http://localhost:3000 with the local SQLite
 * file and the fake mail server. Stop it with Ctrl+C.
 */
import { spawn, spawnSync } from "node:child_process";

process.env.DEV_MAILBOX ??= "on";
const port = process.env.PORT ?? "3000";
process.env.APP_URL ??= `http://localhost:${port}`;

const { applyMigrations } = await import("../db/migrate");
const { seedDemo, DEMO_PEOPLE, DEMO_PASSWORD } = await import("../db/seed");
const { startFakeSmtp } = await import("../lib/dev/fake-smtp");
const { env } = await import("../lib/env");
const { demoServerArgs } = await import("../lib/dev/demo-server");

await applyMigrations();
const { created } = await seedDemo();
console.log(created ? "Demo data added." : "Demo data already present.");

if (process.env.SKIP_BUILD !== "1") {
  console.log("Building the app (about half a minute)…");
  const build = spawnSync("npx", ["next", "build"], { stdio: "inherit", env: process.env });
  if (build.status !== 0) process.exit(build.status ?? 1);
}

const smtp = await startFakeSmtp(env.SMTP_PORT).catch((error: Error) => {
  console.error(`The fake mail server could not listen on 127.0.0.1:${env.SMTP_PORT} (${error.message}). Set SMTP_PORT to a free port.`);
  process.exit(1);
});

const server = spawn("npx", demoServerArgs(port), { stdio: ["ignore", "inherit", "inherit"], env: process.env });

console.log(`
Towmargin is starting on ${env.APP_URL}
Demo accounts (password for all: ${DEMO_PASSWORD}):
${DEMO_PEOPLE.map((p) => `  ${p.email.padEnd(34)} ${p.role}`).join("\n")}
Captured mail: ${env.APP_URL}/mailbox (signed in as the owner)
`);

let stopping = false;
const stop = async () => {
  if (stopping) return;
  stopping = true;
  server.kill("SIGTERM");
  await smtp.close();
  process.exit(0);
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
server.on("exit", (code) => {
  if (!stopping) {
    void smtp.close();
    process.exit(code ?? 1);
  }
});
