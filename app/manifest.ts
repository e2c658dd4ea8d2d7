import type { MetadataRoute } from "next";

// GET /manifest.webmanifest — what a phone needs to install Spanlark on its home screen, no sign-in.
// The icons are drawn from our own mark (app/icon.svg) by scripts/icons.ts.
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: "/",
    name: "Spanlark",
    short_name: "Spanlark",
    description: "Size floor joists, headers, beams, deck framing and rafters on site, with or without a signal.",
    start_url: "/size",
    scope: "/",
    display: "standalone",
    orientation: "portrait",
    background_color: "#F7F5EF",
    theme_color: "#1E5B4F",
    categories: ["productivity", "utilities"],
    icons: [
      { src: "/icon.svg", sizes: "any", type: "image/svg+xml", purpose: "any" },
      { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
      { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
      { src: "/icons/icon-maskable-192.png", sizes: "192x192", type: "image/png", purpose: "maskable" },
      { src: "/icons/icon-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
    ],
  };
}
