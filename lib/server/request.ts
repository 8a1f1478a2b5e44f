import "server-only";
import { headers } from "next/headers";

/**
 * The client's address for rate limits: the last hop of X-Forwarded-For. Next.js fills the header from the
 * socket when it is absent, and a reverse proxy appends the address it saw, so the last hop is the one the
 * nearest trusted party wrote; earlier hops are whatever the client claimed. A server exposed with no proxy
 * in front can be sent a made-up header, so put one in front in production (the per-account limit holds
 * either way).
 */
export async function clientAddress(): Promise<string> {
  const list = await headers();
  const hops = list.get("x-forwarded-for")?.split(",").map((hop) => hop.trim()).filter(Boolean) ?? [];
  return hops.at(-1) || list.get("x-real-ip") || "direct";
}
