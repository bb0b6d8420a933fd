import type { MetadataRoute } from "next";

/**
 * The web app manifest (served at /manifest.webmanifest): lets a tablet on deck add Throwline to its home
 * screen and open it full screen, in the dark theme's colours, straight into the focus call (/focus sends
 * it to the production the tablet followed last, or the person's only one). The icons are Throwline's own, drawn by scripts/make-icons.mjs into public/icons.
 */
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Throwline",
    short_name: "Throwline",
    description: "Plot, focus, cues and paperwork for the lighting department.",
    start_url: "/focus",
    scope: "/",
    display: "standalone",
    orientation: "any",
    background_color: "#161412",
    theme_color: "#161412",
    icons: [
      { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
      { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
      { src: "/icons/maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
      { src: "/icons/throwline.svg", sizes: "any", type: "image/svg+xml" },
    ],
  };
}
