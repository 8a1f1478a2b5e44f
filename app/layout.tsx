import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { sans, mono } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Towmargin", template: "%s · Towmargin" },
  description: "Check a trailer, rack or carrier against every rating of the vehicle and the hitch, and see why.",
  applicationName: "Towmargin",
  icons: {
    icon: [
      { url: "/favicon.ico", sizes: "16x16 32x32 48x48" },
      { url: "/icon.svg", type: "image/svg+xml" },
    ],
    apple: [{ url: "/apple-touch-icon.png", sizes: "180x180" }],
  },
  appleWebApp: { title: "Towmargin", capable: true, statusBarStyle: "default" },
};

export const viewport: Viewport = {
  width: "device-width",
  initialScale: 1,
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: "#f6f4ef" },
    { media: "(prefers-color-scheme: dark)", color: "#15171a" },
  ],
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request so that its scripts carry that request's CSP nonce (proxy.ts);
  // a page prerendered at build time would have scripts the policy blocks.
  await connection();
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-dvh antialiased">{children}</body>
    </html>
  );
}
