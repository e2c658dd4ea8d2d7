import { randomUUID } from "node:crypto";
import { createSerwistRoute } from "@serwist/turbopack";
import { OFFLINE_PAGE } from "@/lib/offline/pages";

// A new revision per build (this route is built once, ahead of time): each new service worker fetches the offline page again.
const revision = randomUUID();

// GET /serwist/sw.js (and its source map) — the service worker, built from lib/offline/sw.ts at build time, no sign-in
export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: "lib/offline/sw.ts",
  useNativeEsbuild: true,
  // the built scripts, styles and fonts (next/font puts the .woff2 files in static/media) and the install icons
  globPatterns: [".next/static/**/*.{js,css,woff2,svg,png,ico}", "public/**/*.{svg,png}"],
  additionalPrecacheEntries: [{ url: OFFLINE_PAGE, revision }],
});
