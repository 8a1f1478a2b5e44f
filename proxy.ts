import { NextResponse, type NextRequest } from "next/server";

/**
 * Sets the pages' Content-Security-Policy with a fresh nonce per request; Next.js reads the nonce from the
 * request's policy and puts it on its own scripts. This file only sets headers: who may see what is decided
 * in lib/server (a proxy is not a safe access gate).
 */
export function contentSecurityPolicy(nonce: string, development: boolean): string {
  return [
    "default-src 'self'",
    // 'strict-dynamic': scripts the nonced framework scripts load (lazy chunks) are trusted too; nothing else.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    // <style> elements need the nonce; style="" attributes cannot carry one, and React and the charts set
    // positions and sizes through them, so attributes alone are allowed inline.
    `style-src 'self' 'nonce-${nonce}'`,
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

export function proxy(request: NextRequest) {
  const nonce = Buffer.from(crypto.getRandomValues(new Uint8Array(18))).toString("base64");
  const policy = contentSecurityPolicy(nonce, process.env.NODE_ENV === "development");
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("content-security-policy", policy);
  return response;
}

export const config = {
  matcher: [
    {
      // Pages only: JSON routes and static files get their fixed headers from next.config.ts.
      source: "/((?!api/|_next/static|_next/image|favicon.ico|robots.txt|manifest.webmanifest|icon.svg|icon-|apple-touch-icon).*)",
      missing: [
        { type: "header", key: "next-router-prefetch" },
        { type: "header", key: "purpose", value: "prefetch" },
      ],
    },
  ],
};
