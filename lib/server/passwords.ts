import "server-only";
import { hashPassword, verifyPassword } from "@/lib/auth/password-hash";

export { hashPassword, verifyPassword };

/** A hash of nothing in particular, verified when no account matches, so both paths take the same time. */
let decoyHash: Promise<string> | undefined;
export async function verifyAgainstDecoy(password: string): Promise<void> {
  decoyHash ??= hashPassword("towmargin-decoy-password");
  await verifyPassword(await decoyHash, password);
}
