import "server-only";
import { dictionary } from "@zxcvbn-ts/language-common";

/**
 * The common-password list that ships with @zxcvbn-ts/language-common (about 49,000 passwords seen most
 * often in published leaks), checked in memory: no look-up leaves the server. Only the server loads it, so
 * no browser bundle carries it.
 */
let common: Set<string> | undefined;

export const COMMON_PASSWORD_MESSAGE = "That password is one of the most common ones and is easy to guess. Choose another.";

export function isCommonPassword(password: string): boolean {
  common ??= new Set(dictionary["passwords-common"]);
  return common.has(password.toLowerCase()) || common.has(password.trim().toLowerCase());
}

/** The field errors for a new password that is too common, or undefined when it may be used. */
export function commonPasswordErrors(password: string, field = "password"): Record<string, string[]> | undefined {
  return isCommonPassword(password) ? { [field]: [COMMON_PASSWORD_MESSAGE] } : undefined;
}
