import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  experimental: { authInterrupts: true },
  poweredByHeader: false,
  reactStrictMode: true,
};

export default nextConfig;
