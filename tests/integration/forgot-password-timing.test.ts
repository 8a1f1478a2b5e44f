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
      const state = await askForReset(initialFormState, form({ email }));
      return { state };
    };
    await timed("warm-up@example.com");
    const unknown = await timed("nobody-known@example.com");
    const known = await timed("staffa@example.com");
    expect(known.state).toEqual(unknown.state);
    // The relay never answers. Had the answer waited for the mail, the mail client would have given up on the
    // relay (and closed its connection) before answering; instead the mail is still waiting on an open
    // connection after the answer is given: a state, not a time.
    await vi.waitFor(() => expect(sockets.length).toBeGreaterThan(0), { timeout: 5_000 });
    expect(sockets.some((socket) => !socket.destroyed && !socket.readableEnded)).toBe(true);
  }, 15_000);
});
