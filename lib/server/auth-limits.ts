import "server-only";
import { env } from "@/lib/env";
import { consume } from "./rate-limit";
import { clientAddress } from "./request";

const WINDOW_MS = 15 * 60 * 1000;

/**
 * Counts one attempt against the account (the address typed, whether or not it has an account) and against
 * the client's address. Returns the refusal message, or null when the attempt may go ahead.
 */
export async function limitAuthAttempt(kind: "sign-in" | "sign-up" | "reset", email: string): Promise<string | null> {
  const byAccount = consume(`${kind}:account:${email}`, env.AUTH_LIMIT_PER_ACCOUNT, WINDOW_MS);
  const byAddress = consume(`${kind}:address:${await clientAddress()}`, env.AUTH_LIMIT_PER_ADDRESS, WINDOW_MS);
  if (byAccount.allowed && byAddress.allowed) return null;
  const minutes = Math.ceil(Math.max(byAccount.retryAfterSeconds, byAddress.retryAfterSeconds) / 60);
  return `Too many attempts. Wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.`;
}
