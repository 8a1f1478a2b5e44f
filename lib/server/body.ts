import "server-only";
import { env } from "@/lib/env";
import { badRequest, json } from "./http";

/**
 * Reading request bodies on custom routes. A body is read through a counting reader that stops at the limit,
 * so a body sent without a length (chunked) is never held whole in memory before it is refused; a declared
 * length over the limit is refused before a byte is read.
 */
export type Read<T> = { ok: true; value: T } | { ok: false; response: Response };

export interface Limit {
  bytes: number;
  /** The 413 answer: a message and the field it is reported at. */
  message: string;
  field: string;
  fieldMessage?: string;
}

export function tooLarge(limit: Limit): Response {
  return json({ ok: false, error: "too_large", message: limit.message, fieldErrors: { [limit.field]: [limit.fieldMessage ?? limit.message] } }, 413);
}

export async function readLimitedBytes(request: Request, limit: Limit): Promise<Read<Uint8Array<ArrayBuffer>>> {
  const declared = Number(request.headers.get("content-length") ?? "");
  if (Number.isFinite(declared) && declared > limit.bytes) return { ok: false, response: tooLarge(limit) };
  if (!request.body) return { ok: true, value: new Uint8Array(0) };
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limit.bytes) {
        await reader.cancel().catch(() => undefined);
        return { ok: false, response: tooLarge(limit) };
      }
      chunks.push(value);
    }
  } catch {
    return { ok: false, response: badRequest({ [limit.field]: ["The body could not be read to its end."] }, "The body could not be read to its end.") };
  }
  // A small body arrives in one chunk: hand it on as it is.
  if (chunks.length === 1) return { ok: true, value: chunks[0] as Uint8Array<ArrayBuffer> };
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.byteLength;
  }
  return { ok: true, value: bytes };
}

/** Decoding without `stream` keeps no state between calls, so one decoder serves every request. */
const utf8 = new TextDecoder("utf-8", { fatal: true });

function mediaType(request: Request): string {
  return (request.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
}

/** A JSON body: the content type must say JSON (a cross-site form cannot send that without asking first). */
export async function readJsonBody(request: Request, limit: Limit): Promise<Read<unknown>> {
  if (mediaType(request) !== "application/json") {
    const message = "Send the body as JSON, with the header Content-Type: application/json.";
    return { ok: false, response: json({ ok: false, error: "unsupported_media_type", message, fieldErrors: { [limit.field]: [message] } }, 415) };
  }
  const read = await readLimitedBytes(request, limit);
  if (!read.ok) return read;
  try {
    return { ok: true, value: JSON.parse(utf8.decode(read.value)) };
  } catch {
    return { ok: false, response: badRequest({ [limit.field]: ["The body is not valid JSON."] }, "The body is not valid JSON.") };
  }
}

/** A multipart form upload, read within the limit and then parsed. */
export async function readMultipartBody(request: Request, limit: Limit): Promise<Read<FormData>> {
  const contentType = request.headers.get("content-type") ?? "";
  const refused = { ok: false as const, response: badRequest({ [limit.field]: ["Send the file as a form upload (multipart/form-data)."] }) };
  if (mediaType(request) !== "multipart/form-data") return refused;
  const read = await readLimitedBytes(request, limit);
  if (!read.ok) return read;
  try {
    return { ok: true, value: await new Response(read.value, { headers: { "content-type": contentType } }).formData() };
  } catch {
    return refused;
  }
}

/**
 * Custom POST routes answer only this app's own pages and programs that send no Origin: a browser always
 * sends Origin on a cross-site POST, and SameSite cookies alone leave a gap for sibling subdomains and older
 * browsers. `Sec-Fetch-Site: cross-site` is refused too. A page served with `Referrer-Policy: no-referrer`
 * (the customer's pages) makes the browser send `Origin: null`; that passes only beside
 * `Sec-Fetch-Site: same-origin`, a header no page can set.
 */
let own = { url: "", origin: "" };

export function refuseForeignOrigin(request: Request): Response | null {
  const origin = request.headers.get("origin");
  const site = request.headers.get("sec-fetch-site");
  // Parsed once, not on every request (again only if the setting were to change).
  if (own.url !== env.APP_URL) own = { url: env.APP_URL, origin: new URL(env.APP_URL).origin };
  const ownOrigin = own.origin;
  const opaqueFromHere = origin === "null" && site === "same-origin";
  if ((origin !== null && origin !== ownOrigin && !opaqueFromHere) || site === "cross-site") {
    return json({ ok: false, error: "forbidden", message: "This request came from another site and was refused." }, 403);
  }
  return null;
}
