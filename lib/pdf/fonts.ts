import "server-only";
// IBM Plex Sans from the installed @fontsource package, embedded as data: URLs so the PDF carries the
// font and the browser never fetches anything.
import { readFileSync } from "node:fs";
import path from "node:path";

/** The weights chart-css.ts uses (400 text, 500 status and headings, 600 titles); there is no italic:
 * the few italic words ("none") are slanted by the browser. */
export const PLEX_WEIGHTS = [400, 500, 600] as const;
let cached: string | null = null;

export function plexFontFaces(): string {
  if (cached !== null) return cached;
  const dir = path.join(process.cwd(), "node_modules", "@fontsource", "ibm-plex-sans", "files");
  cached = PLEX_WEIGHTS.map((w) => {
    try {
      const data = readFileSync(path.join(dir, `ibm-plex-sans-latin-${w}-normal.woff2`)).toString("base64");
      return `@font-face{font-family:"IBM Plex Sans";font-style:normal;font-weight:${w};src:url(data:font/woff2;base64,${data}) format("woff2")}`;
    } catch {
      return ""; // the system sans-serif stands in; the PDF is still readable
    }
  }).join("\n");
  return cached;
}
