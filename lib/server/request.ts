import "server-only";
import { headers } from "next/headers";
import { env } from "@/lib/env";

/**
 * The header that carries the address of the connection itself. `instrumentation.ts` writes it on every
 * request the server receives, over anything the client sent under that name, so it cannot be made up.
 */
export const PEER_ADDRESS_HEADER = "x-towmargin-peer";

/**
 * The client's address for rate limits, given how many reverse proxies in front of the server are trusted.
 * With none (the default), forwarding headers are the client's own words and are ignored: the connection's
 * address counts. With N, the address the Nth proxy from the server appended to X-Forwarded-For counts
 * (each proxy appends the address it saw; what stands before them is whatever the client claimed).
 */
export function clientAddressFrom(list: Headers, trustedHops: number): string {
  const peer = list.get(PEER_ADDRESS_HEADER)?.trim() || "unknown";
  if (trustedHops <= 0) return peer;
  const hops = list.get("x-forwarded-for")?.split(",").map((hop) => hop.trim()).filter(Boolean) ?? [];
  if (hops.length === 0) return peer;
  return hops[Math.max(0, hops.length - trustedHops)]!;
}

/**
 * A route handler passes its request's headers (the same headers `headers()` answers, without the request
 * scope's lookup); server actions and pages call it without.
 */
export async function clientAddress(list?: Headers): Promise<string> {
  return clientAddressFrom(list ?? (await headers()), env.TRUSTED_PROXY_HOPS);
}
