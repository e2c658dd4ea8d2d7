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
