import type { Config } from "tailwindcss";

// Throwline's palette. Colours are CSS variables (app/globals.css) so the dark low-glare theme can
// swap them without touching a class name.
const v = (name: string) => `var(--${name})`;

const config: Config = {
  content: [],
  theme: {
    extend: {
      colors: {
        canvas: v("canvas"),
        surface: v("surface"),
        raised: v("raised"),
        line: v("line"),
        field: v("field"),
        ink: v("ink"),
        muted: v("muted"),
        accent: v("accent"),
        "accent-ink": v("accent-ink"),
        danger: v("danger"),
        "danger-ink": v("danger-ink"),
        caution: v("caution"),
        success: v("success"),
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', "system-ui", "sans-serif"],
      },
    },
  },
};
export default config;
