// Security headers for every response. The Content-Security-Policy is set per request by proxy.ts (a nonce for
// the scripts, lib/security/csp.ts).
const securityHeaders = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(self)" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

import { withSerwist } from "@serwist/turbopack";

/** @type {import("next").NextConfig} */
const nextConfig = {
  poweredByHeader: false,
  reactStrictMode: true,
  // forbidden(): admin pages answer 403 to a signed-in account without the admin role (app/forbidden.tsx).
  // Not experimental.inlineCss: measured here (Lighthouse, 2026-12-03), it put the stylesheet into the page's RSC
  // payload as well as its <head>, so every page's HTML grew from 12 KB to 34 KB compressed, more than the one
  // round trip to the cached stylesheet it saves.
  experimental: { authInterrupts: true },
  serverExternalPackages: ["sequelize", "pg", "pg-hstore", "pino", "pdfkit"],
  async headers() {
    return [
      { source: "/:path*", headers: securityHeaders },
      // JSON answers run nothing; pages get theirs with a nonce from proxy.ts.
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'" }] },
    ];
  },
};

// withSerwist: esbuild (which builds the service worker, app/serwist/[path]/route.ts) stays outside the server bundle.
export default withSerwist(nextConfig);
