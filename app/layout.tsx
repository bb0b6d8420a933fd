import type { Metadata, Viewport } from "next";
import { headers } from "next/headers";
import "@fontsource/ibm-plex-sans/400.css";
import "@fontsource/ibm-plex-sans/500.css";
import "@fontsource/ibm-plex-sans/600.css";
import "./globals.css";
import { Providers } from "@/components/providers";
import { THEME_SCRIPT } from "@/components/theme-script";

export const metadata: Metadata = {
  title: { default: "Throwline", template: "%s · Throwline" },
  description: "Plot, focus, cues and paperwork for the lighting department.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1 };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // The proxy's per-request nonce (proxy.ts); reading it also renders every page per request, which a
  // nonce needs (a page built ahead of time could not carry it).
  const nonce = (await headers()).get("x-nonce") ?? undefined;
  return (
    <html lang="en" suppressHydrationWarning>
      <head>
        {/* Applies the remembered theme before the first paint, so a dark room never sees a white flash. */}
        <script nonce={nonce} dangerouslySetInnerHTML={{ __html: THEME_SCRIPT }} />
      </head>
      <body className="min-h-screen">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
