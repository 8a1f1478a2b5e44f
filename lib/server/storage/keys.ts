/**
 * The one rule for a storage key, shared by every driver. Keys are made by the caller (an organisation's id
 * and a random id, no user text), so anything else is refused rather than cleaned: segments of letters,
 * digits, `_`, `-` and `.`, none empty and none starting with a dot (so no `.` or `..`), at most 512
 * characters. A folder resolves `..` on disk and some S3-compatible stores do too, so a key that is not
 * refused here could leave the store's folder or prefix.
 */
const KEY = /^[A-Za-z0-9_-][A-Za-z0-9_.-]*(?:\/[A-Za-z0-9_-][A-Za-z0-9_.-]*)*$/;

export function checkStorageKey(key: string): string {
  if (key.length > 512 || !KEY.test(key) || key.includes("..")) throw new Error("Invalid storage key.");
  return key;
}
