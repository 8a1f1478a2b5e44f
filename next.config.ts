import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Separate build folders let several builds of one tree live side by side (NEXT_DIST_DIR=.next-other).
  distDir: process.env.NEXT_DIST_DIR || ".next",
  experimental: { authInterrupts: true },
  poweredByHeader: false,
  reactStrictMode: true,
  async headers() {
    const common = [
      { key: "X-Content-Type-Options", value: "nosniff" },
      { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
      { key: "X-Frame-Options", value: "DENY" },
      { key: "Content-Security-Policy", value: "frame-ancestors 'none'" },
    ];
    return [
      { source: "/:path*", headers: common },
      // A customer's link: never indexed, and the token never leaks in a Referer header.
      { source: "/r/:token", headers: [{ key: "X-Robots-Tag", value: "noindex, nofollow" }, { key: "Referrer-Policy", value: "no-referrer" }] },
    ];
  },
};

export default nextConfig;
