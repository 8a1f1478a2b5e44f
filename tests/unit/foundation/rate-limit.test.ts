import { beforeEach, describe, expect, it } from "vitest";
import { consume, resetRateLimits } from "@/lib/server/rate-limit";

/** The in-memory table holds this many counters (lib/server/rate-limit.ts). */
const TABLE_SIZE = 50_000;
import { clientAddressFrom, PEER_ADDRESS_HEADER } from "@/lib/server/request";

describe("rate limit", () => {
  beforeEach(resetRateLimits);

  it("allows the limit, refuses the next, and opens again after the window", async () => {
    const now = 1_000_000;
    for (let i = 0; i < 3; i++) expect((await consume("sign-in:a", 3, 60_000, now)).allowed).toBe(true);
    const refused = await consume("sign-in:a", 3, 60_000, now + 1_000);
    expect(refused.allowed).toBe(false);
    expect(refused.retryAfterSeconds).toBe(59);
    expect((await consume("sign-in:b", 3, 60_000, now + 1_000)).allowed).toBe(true);
    expect((await consume("sign-in:a", 3, 60_000, now + 60_000)).allowed).toBe(true);
  });

  it("a flood of new names evicts the oldest counters only, never every counter at once", async () => {
    const now = 2_000_000;
    for (let i = 0; i < TABLE_SIZE - 10; i++) await consume(`filler:${i}`, 5, 900_000, now);
    for (let i = 0; i < 4; i++) await consume("sign-in:address:victim", 3, 900_000, now + 1);
    expect((await consume("sign-in:address:victim", 3, 900_000, now + 2)).allowed).toBe(false);
    // Twenty more distinct names: the table is full, so the oldest ten go, and the refused counter stays.
    for (let i = 0; i < 20; i++) await consume(`flood:${i}`, 5, 900_000, now + 3);
    expect((await consume("sign-in:address:victim", 3, 900_000, now + 4)).allowed).toBe(false);
    // The oldest filler was evicted: it starts again from one.
    expect((await consume("filler:0", 1, 900_000, now + 5)).allowed).toBe(true);
  });
});

describe("the client's address", () => {
  const headers = (values: Record<string, string>) => new Headers(values);

  it("with no trusted proxy, ignores a forwarding header the client sent and uses the connection's address", () => {
    const sent = headers({ "x-forwarded-for": "198.51.100.1, 198.51.100.2", "x-real-ip": "198.51.100.3", [PEER_ADDRESS_HEADER]: "203.0.113.9" });
    expect(clientAddressFrom(sent, 0)).toBe("203.0.113.9");
  });

  it("with one trusted proxy, takes the address that proxy appended, not what the client claimed before it", () => {
    const sent = headers({ "x-forwarded-for": "198.51.100.1, 192.0.2.44", [PEER_ADDRESS_HEADER]: "10.0.0.2" });
    expect(clientAddressFrom(sent, 1)).toBe("192.0.2.44");
    expect(clientAddressFrom(sent, 2)).toBe("198.51.100.1");
  });

  it("with more trusted hops than the header holds, falls back to its first entry", () => {
    const sent = headers({ "x-forwarded-for": "192.0.2.44", [PEER_ADDRESS_HEADER]: "10.0.0.2" });
    expect(clientAddressFrom(sent, 3)).toBe("192.0.2.44");
    expect(clientAddressFrom(headers({ [PEER_ADDRESS_HEADER]: "10.0.0.2" }), 1)).toBe("10.0.0.2");
  });
});
