import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** A URL-safe random token of 160 bits, for invitation and password-reset links. */
export function newToken(): string {
  return randomBytes(20).toString("base64url");
}

/** What the database keeps of a token: its SHA-256, so a leaked table opens no link. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export function newId(): string {
  return randomBytes(15).toString("base64url");
}

/** A customer's result link token: 192 random bits, URL-safe (32 characters). */
export function newShareToken(): string {
  return randomBytes(24).toString("base64url");
}
