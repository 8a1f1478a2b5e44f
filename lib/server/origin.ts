import "server-only";
import { env } from "@/lib/env";

/**
 * For custom POST routes a browser may reach from another site: the request must come from our own pages.
 * The Origin header (sent by browsers on every POST) must be the app's own address or the address the
 * request was made to. A page served with `Referrer-Policy: no-referrer` (the customer's pages) makes the
 * browser send `Origin: null`; then, as without an Origin, `Sec-Fetch-Site: same-origin` (a header no page
 * can set) will do. Anything else is refused, so another site cannot make a visitor's browser post here.
 */
export function sameOrigin(request: Request): boolean {
  const origin = request.headers.get("origin");
  if (origin && origin !== "null") {
    const own = new Set([new URL(env.APP_URL).origin, new URL(request.url).origin]);
    const host = request.headers.get("host");
    if (host) own.add(`${new URL(request.url).protocol}//${host}`);
    return own.has(origin);
  }
  return request.headers.get("sec-fetch-site") === "same-origin";
}
