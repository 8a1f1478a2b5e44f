import type { MetadataRoute } from "next";

/**
 * Only the public front door may be indexed. Customer links (/r/…) and lesson links (/learn/…) are private
 * to whoever holds them; they also answer with noindex, this keeps well-behaved crawlers from asking at all.
 */
export default function robots(): MetadataRoute.Robots {
  return {
    rules: [
      {
        userAgent: "*",
        allow: ["/$", "/quick-check", "/sign-in", "/sign-up"],
        disallow: ["/r/", "/learn/", "/api/", "/invite/", "/reset-password/", "/sign-up/confirm/", "/overview", "/check", "/checks", "/fleet", "/training", "/team", "/settings", "/mailbox"],
      },
    ],
  };
}
