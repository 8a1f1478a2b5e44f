import "server-only";
import { env } from "@/lib/env";
import { consume } from "./rate-limit";
import { clientAddress } from "./request";

const WINDOW_MS = 15 * 60 * 1000;

function refusal(retryAfterSeconds: number): string {
  const minutes = Math.ceil(retryAfterSeconds / 60);
  return `Too many attempts. Wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.`;
}

/**
 * Counts one attempt against the client's address and then against the account (the address typed, whether
 * or not it has an account). Returns the refusal message, or null when the attempt may go ahead. Once the
 * client's address is refused, the account's counter is left alone: a flood from one place must not lock
 * the account's owner out from everywhere else.
 */
export async function limitAuthAttempt(kind: "sign-in" | "sign-up" | "reset" | "new-password" | "change-password", account: string): Promise<string | null> {
  const byAddress = await consume(`${kind}:address:${await clientAddress()}`, env.AUTH_LIMIT_PER_ADDRESS, WINDOW_MS);
  if (!byAddress.allowed) return refusal(byAddress.retryAfterSeconds);
  const byAccount = await consume(`${kind}:account:${account}`, env.AUTH_LIMIT_PER_ACCOUNT, WINDOW_MS);
  if (!byAccount.allowed) return refusal(byAccount.retryAfterSeconds);
  return null;
}

/** The client address alone, for requests that name no account (a reset link's token). */
export async function limitByAddress(kind: "new-password", limit = env.AUTH_LIMIT_PER_ADDRESS): Promise<string | null> {
  const byAddress = await consume(`${kind}:address:${await clientAddress()}`, limit, WINDOW_MS);
  return byAddress.allowed ? null : refusal(byAddress.retryAfterSeconds);
}
