import "server-only";

/**
 * Fixed-window counters. Every limit in the app goes through `consume()`, which answers a promise so that
 * the buckets can move to a shared store (a database table, one UPSERT … RETURNING per check) without
 * touching a caller. Here they live in this process's memory: enough for one server.
 *
 * The table is bounded: when it is full, the oldest bucket goes first (a Map keeps insertion order, and a
 * bucket whose window starts again is moved to the end), so a flood of new names evicts only as many old
 * counters as it adds, never every counter at once.
 */
interface Bucket {
  count: number;
  resetAt: number;
}

const buckets = new Map<string, Bucket>();
export const MAX_BUCKETS = 50_000;

export interface RateLimitResult {
  allowed: boolean;
  retryAfterSeconds: number;
}

export async function consume(key: string, limit: number, windowMs: number, now = Date.now()): Promise<RateLimitResult> {
  let bucket = buckets.get(key);
  if (!bucket || bucket.resetAt <= now) {
    buckets.delete(key);
    while (buckets.size >= MAX_BUCKETS) buckets.delete(buckets.keys().next().value!);
    bucket = { count: 0, resetAt: now + windowMs };
    buckets.set(key, bucket);
  }
  bucket.count += 1;
  return {
    allowed: bucket.count <= limit,
    retryAfterSeconds: Math.max(1, Math.ceil((bucket.resetAt - now) / 1000)),
  };
}

/** For tests only. */
export function resetRateLimits() {
  buckets.clear();
}
