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
  // Throwline's own icon set (public/icons) and the manifest from app/manifest.ts.
  icons: {
    icon: [
      { url: "/favicon.ico", sizes: "48x48" },
      { url: "/icons/throwline.svg", type: "image/svg+xml" },
    ],
    apple: "/icons/apple-touch-icon.png",
  },
  manifest: "/manifest.webmanifest",
  appleWebApp: { capable: true, title: "Throwline", statusBarStyle: "black-translucent" },
};

export const viewport: Viewport = {
  width: "device-width",
  initialScale: 1,
  themeColor: [
    { media: "(prefers-color-scheme: dark)", color: "#161412" },
    { media: "(prefers-color-scheme: light)", color: "#ffffff" },
  ],
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // The proxy's per-request nonce (proxy.ts); reading it also renders every page per request, which a
  // nonce needs (a page built ahead of time could not carry it).
  const nonce = (await headers()).get("x-nonce") ?? undefined;
  return (
    <html lang="en" suppressHydrationWarning>
      <head>
        {/* Applies the remembered theme before the first paint, so a dark room never sees a white flash. */}
        {/* biome-ignore lint/security/noDangerouslySetInnerHtml: a constant script of ours, run under the page's nonce */}
        <script nonce={nonce} dangerouslySetInnerHTML={{ __html: THEME_SCRIPT }} />
      </head>
      <body className="min-h-screen">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
