import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import { Suspense, type ReactNode } from "react";
import { AdminNavLink } from "@/components/shell/admin-nav-link";
import { BottomNav } from "@/components/shell/bottom-nav";
import { DeferredOfflineShell } from "@/components/shell/deferred-offline-shell";
import { SiteFooter } from "@/components/shell/site-footer";
import { SiteHeader } from "@/components/shell/site-header";
import { ToastProvider } from "@/components/ui/toast";
import "./globals.css";

// Shipped in fonts/ (copied from @fontsource, SIL OFL 1.1); nothing is fetched from a font service.
const atkinson = localFont({
  src: [
    { path: "../fonts/atkinson-hyperlegible-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/atkinson-hyperlegible-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-sans",
  display: "swap",
  fallback: ["system-ui", "Arial", "sans-serif"],
});

const plexMono = localFont({
  src: [
    { path: "../fonts/ibm-plex-mono-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/ibm-plex-mono-latin-500-normal.woff2", weight: "500", style: "normal" },
  ],
  variable: "--font-mono",
  display: "swap",
  // figures only (tables, step numbers), not the first screen's text: not preloaded, so the slow link carries the
  // body font, the styles and the scripts first; the fallback is metric-matched by next/font, so the swap does not
  // move the page
  preload: false,
  fallback: ["ui-monospace", "Menlo", "monospace"],
});

export const metadata: Metadata = {
  appleWebApp: { capable: true, title: "Spanlark", statusBarStyle: "default" },
  icons: { apple: "/icons/apple-touch-icon.png" },
  title: { default: "Spanlark — size joists, headers and beams on site", template: "%s · Spanlark" },
  description: "Spanlark sizes floor joists, headers, beams, deck framing and rafters in timber and steel, on your phone.",
  applicationName: "Spanlark",
  manifest: "/manifest.webmanifest",
  formatDetection: { telephone: false },
};

export const viewport: Viewport = {
  width: "device-width",
  initialScale: 1,
  themeColor: "#F7F5EF",
  viewportFit: "cover",
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Rendered per request: the nonce proxy.ts puts in each response's Content-Security-Policy must be on the
  // scripts of that very response, which a page built ahead of time cannot have.
  await connection();
  return (
    <html lang="en" className={`${atkinson.variable} ${plexMono.variable}`}>
      <body className="flex min-h-dvh flex-col bg-paper font-sans text-ink antialiased">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50 focus:rounded-lg focus:bg-ink focus:px-4 focus:py-3 focus:text-paper"
        >
          Skip to content
        </a>
        <ToastProvider>
          <SiteHeader
            adminLink={
              <Suspense fallback={null}>
                <AdminNavLink />
              </Suspense>
            }
          />
          <DeferredOfflineShell />
          <main id="main" tabIndex={-1} className="mx-auto w-full max-w-5xl flex-1 px-4 pt-6 focus:outline-none">
            {children}
          </main>
          <SiteFooter />
          <div aria-hidden="true" className="md:hidden" style={{ height: "var(--bottom-nav-h)" }} />
          <BottomNav />
        </ToastProvider>
      </body>
    </html>
  );
}
