import type { MetadataRoute } from "next";

/** Lets a counter tablet or a fleet phone add Towmargin to its home screen. */
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Towmargin",
    short_name: "Towmargin",
    description: "Check a trailer, rack or carrier against every rating of the vehicle and the hitch, and see why.",
    id: "/",
    start_url: "/overview",
    scope: "/",
    display: "standalone",
    orientation: "any",
    background_color: "#f6f4ef",
    theme_color: "#0b6470",
    categories: ["business", "productivity", "utilities"],
    icons: [
      { src: "/icon.svg", sizes: "any", type: "image/svg+xml" },
      { src: "/icon-192.png", sizes: "192x192", type: "image/png" },
      { src: "/icon-512.png", sizes: "512x512", type: "image/png" },
      { src: "/icon-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
    ],
  };
}
