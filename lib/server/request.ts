import "server-only";
import { headers } from "next/headers";

/**
 * The client's address for rate limits: the first hop of X-Forwarded-For when a proxy sets it, otherwise a
 * single shared key (a server reached directly on loopback).
 */
export async function clientAddress(): Promise<string> {
  const list = await headers();
  const forwarded = list.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || list.get("x-real-ip") || "direct";
}
