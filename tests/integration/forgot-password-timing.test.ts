import { createServer, type Server, type Socket } from "node:net";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-forgot-${process.pid}-${Date.now()}.db`;
  // A mail relay that accepts the connection and then says nothing, as a slow or stuck one would.
  process.env.SMTP_PORT = String(40_000 + (process.pid % 20_000));
  process.env.AUTH_LIMIT_PER_ACCOUNT = "100";
  process.env.AUTH_LIMIT_PER_ADDRESS = "100";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import { askForReset } from "@/app/(public)/forgot-password/actions";
import { initialFormState } from "@/lib/validation/form-state";
import { buildFixture, form } from "./support/fixture";

let relay: Server;
const sockets: Socket[] = [];

beforeAll(async () => {
  await buildFixture();
  relay = createServer((socket) => sockets.push(socket));
  await new Promise<void>((resolve) => relay.listen(Number(process.env.SMTP_PORT), "127.0.0.1", resolve));
});

afterAll(async () => {
  for (const socket of sockets) socket.destroy();
  await new Promise((resolve) => relay.close(resolve));
});

describe("asking for a password reset", () => {
  it("answers a known address as fast as an unknown one: the mail leaves after the answer", async () => {
    const timed = async (email: string) => {
      const started = performance.now();
      const state = await askForReset(initialFormState, form({ email }));
      return { state, ms: performance.now() - started };
    };
    await timed("warm-up@example.com");
    const unknown = await timed("nobody-known@example.com");
    const known = await timed("staffa@example.com");
    expect(known.state).toEqual(unknown.state);
    // The relay never answers: waiting for it would take its whole timeout (many seconds).
    expect(known.ms).toBeLessThan(1_000);
    await vi.waitFor(() => expect(sockets.length).toBeGreaterThan(0), { timeout: 5_000 });
  }, 15_000);
});
