import type { NextConfig } from "next";

/**
 * A test build (TOWMARGIN_TEST_ROUTES=1, as `npm test` and the browser tests make it) also routes the
 * `page.fixture.tsx` files, pages that only the tests visit, and goes to its own folder, so a product build
 * never holds them.
 */
const testRoutes = process.env.TOWMARGIN_TEST_ROUTES === "1";

const nextConfig: NextConfig = {
  // Separate build folders let several builds of one tree live side by side (NEXT_DIST_DIR=.next-other).
  distDir: process.env.NEXT_DIST_DIR || (testRoutes ? ".next-test" : ".next"),
  pageExtensions: testRoutes ? ["tsx", "ts", "fixture.tsx"] : ["tsx", "ts"],
  experimental: { authInterrupts: true },
  poweredByHeader: false,
  reactStrictMode: true,
  async headers() {
    const common = [
      { key: "X-Content-Type-Options", value: "nosniff" },
      { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
      { key: "X-Frame-Options", value: "DENY" },
      { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
      { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
      // Production is served over HTTPS only: browsers remember it for two years and never try plain HTTP.
      // (Browsers ignore this header on http://localhost, where the browser tests run the production build.)
      ...(process.env.NODE_ENV === "production" ? [{ key: "Strict-Transport-Security", value: "max-age=63072000; includeSubDomains" }] : []),
    ];
    return [
      { source: "/:path*", headers: common },
      // Pages get their policy, with a nonce, from proxy.ts. JSON answers are never a document to run.
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'" }] },
      // A customer's link: never indexed, and the token never leaks in a Referer header.
      { source: "/r/:token", headers: [{ key: "X-Robots-Tag", value: "noindex, nofollow" }, { key: "Referrer-Policy", value: "no-referrer" }] },
    ];
  },
};

export default nextConfig;
