import { beforeEach, describe, expect, it } from "vitest";
import { consume, resetRateLimits } from "@/lib/server/rate-limit";

describe("rate limit", () => {
  beforeEach(resetRateLimits);

  it("allows the limit, refuses the next, and opens again after the window", () => {
    const now = 1_000_000;
    for (let i = 0; i < 3; i++) expect(consume("sign-in:a", 3, 60_000, now).allowed).toBe(true);
    const refused = consume("sign-in:a", 3, 60_000, now + 1_000);
    expect(refused.allowed).toBe(false);
    expect(refused.retryAfterSeconds).toBe(59);
    expect(consume("sign-in:b", 3, 60_000, now + 1_000).allowed).toBe(true);
    expect(consume("sign-in:a", 3, 60_000, now + 60_000).allowed).toBe(true);
  });
});
