// The stylesheet of focus charts and printed sheets, as a string so the screen (a <style> element), the
// browser's print view and the server's PDF load the very same rules. Colours come from the app's theme
// variables where present (dark theme on screen), with light fallbacks for paper.
import { PAPER, type Paper } from "./pages";

export const CHART_CSS = `
.fc-card{--fc-ink:var(--ink,#1f1d1a);--fc-muted:var(--muted,#6b655c);--fc-line:var(--line,#d6d0c4);--fc-surface:var(--surface,#fff);
  --fc-accent:var(--accent,#b4561c);--fc-ok:var(--success,#2f6b3a);
  box-sizing:border-box;display:flex;flex-direction:column;gap:.45em;padding:.7em;border:1px solid var(--fc-line);border-radius:6px;
  background:var(--fc-surface);color:var(--fc-ink);font-family:"IBM Plex Sans",system-ui,sans-serif;line-height:1.25;overflow:hidden;
  break-inside:avoid;page-break-inside:avoid}
.fc-head{display:flex;flex-wrap:wrap;align-items:baseline;gap:.3em .9em;border-bottom:1px solid var(--fc-line);padding-bottom:.3em}
.fc-title{margin:0;font-weight:600;font-size:1.15em}
.fc-chan{font-weight:600;font-size:1.15em;color:var(--fc-accent)}
.fc-status{margin-left:auto;color:var(--fc-muted);font-size:.9em}
.fc-status.fc-done{color:var(--fc-ok);font-weight:500}
.fc-status.fc-done::before{content:"\\2713  "}
.fc-body{display:grid;grid-template-columns:minmax(0,44fr) minmax(0,56fr);grid-template-areas:"fig id" "focus focus";gap:.5em .8em;min-height:0}
.fc-figure{grid-area:fig;margin:0;min-height:0;display:flex}
.fc-identity{grid-area:id}
.fc-focus{grid-area:focus;columns:2;column-gap:1em}
.fc-fields{margin:0;min-width:0}
.fc-row{display:flex;gap:.4em;break-inside:avoid;padding:.08em 0}
.fc-row dt{flex:0 0 auto;color:var(--fc-muted);min-width:5.6em}
.fc-row dd{margin:0;min-width:0;overflow-wrap:anywhere}
.fc-cuts h3{display:inline;margin:0 .4em 0 0;font-size:1em;color:var(--fc-muted);font-weight:500}
.fc-cutlist{display:inline;margin:0;padding:0;list-style:none}
.fc-cutlist li{display:inline}
.fc-cutlist li+li::before{content:" · "}
.fc-notes{display:flex;flex-direction:column;gap:.15em}
.fc-foot{display:flex;gap:.6em;align-items:flex-start;min-height:0}
.fc-foot .fc-notes{flex:1;min-width:0}
.fc-photo{flex:0 0 auto;display:block;line-height:0}
.fc-photo img{display:block;height:6em;width:auto;max-width:9em;object-fit:cover;border:1px solid var(--fc-line);border-radius:3px}
.fc-note-label{color:var(--fc-muted)}
.fc-none{color:var(--fc-muted);font-style:italic;display:inline;margin:0}
.fc-warn-text{margin:0;color:var(--caution,#8a6100)}
.fc-diagram{width:100%;height:auto;max-height:100%;aspect-ratio:1;border:1px solid var(--fc-line);border-radius:4px}
.fc-bg{fill:var(--fc-surface)}
.fc-lm{stroke:var(--fc-muted);stroke-width:calc(var(--u) * 1);stroke-dasharray:calc(var(--u) * 12) calc(var(--u) * 6);opacity:.8}
.fc-lm-label,.fc-muted{fill:var(--fc-muted)}
.fc-band{fill:rgba(226,160,52,.32);stroke:none}
.fc-core{fill:rgba(236,178,60,.78);stroke:none}
.fc-outline{fill:none;stroke:rgba(180,110,20,.9);stroke-width:calc(var(--u) * 1.2);stroke-dasharray:calc(var(--u) * 7) calc(var(--u) * 4)}
.fc-cut{stroke:var(--fc-accent);stroke-width:calc(var(--u) * 2)}
.fc-cut-label{fill:var(--fc-accent);font-weight:600}
.fc-arrow{stroke:var(--fc-ink);stroke-width:calc(var(--u) * 1.6)}
.fc-arrow-head{fill:var(--fc-ink)}
.fc-arrow-down{fill:none;stroke:var(--fc-ink);stroke-width:calc(var(--u) * 1.4)}
.fc-mark{fill:var(--fc-surface);stroke:var(--fc-ink);stroke-width:calc(var(--u) * 1.4)}
.fc-mark-cross{stroke:var(--fc-ink);stroke-width:calc(var(--u) * 1)}
.fc-mark-label{fill:var(--fc-ink);font-weight:600}
.fc-warn{fill:var(--danger,#b3261e)}
.fc-screen .fc-card{font-size:13px}
.fc-screen .fc-figure{max-width:340px}
/* Dashes are long on purpose: the PDF writer draws every dash as its own stroke, and short ones doubled the file. */
/* Printed sheets: fixed boxes, one grid a page, never a chart across two pages. */
.fc-sheet{box-sizing:border-box;display:flex;flex-direction:column;overflow:hidden;break-after:page;page-break-after:always;
  font-family:"IBM Plex Sans",system-ui,sans-serif;color:#000;background:#fff}
.fc-sheet:last-child{break-after:auto;page-break-after:auto}
.fc-sheet-head{display:flex;justify-content:space-between;gap:1em;font-size:8pt;border-bottom:.4pt solid #888;padding-bottom:1.5mm;margin-bottom:2mm;height:6mm;box-sizing:border-box}
.fc-sheet-head b{font-weight:600}
.fc-grid{flex:1;display:grid;gap:3mm;min-height:0}
.fc-grid>.fc-card{min-height:0;height:100%;--ink:#000;--muted:#555;--line:#999;--surface:#fff;--accent:#9a4210;--success:#2f6b3a}
.fc-n1 .fc-grid{grid-template:1fr/1fr}
.fc-n2 .fc-grid{grid-template:repeat(2,1fr)/1fr}
.fc-n4 .fc-grid{grid-template:repeat(2,1fr)/repeat(2,1fr)}
.fc-n6 .fc-grid{grid-template:repeat(3,1fr)/repeat(2,1fr)}
.fc-n1 .fc-card{font-size:10pt}
.fc-n2 .fc-card{font-size:7.4pt}
.fc-n4 .fc-card{font-size:6.8pt}
.fc-n6 .fc-card{font-size:5.4pt}
.fc-n2 .fc-body{grid-template-columns:minmax(0,30fr) minmax(0,28fr) minmax(0,42fr);grid-template-areas:"fig id focus"}
.fc-n2 .fc-focus,.fc-n4 .fc-focus{columns:1}
.fc-n4 .fc-body{grid-template-columns:minmax(0,46fr) minmax(0,54fr)}
.fc-n6 .fc-body{grid-template-columns:minmax(0,40fr) minmax(0,60fr)}
.fc-n6 .fc-focus{columns:2}
.fc-n1 .fc-figure{max-height:110mm}
`;

/** The page rule and sheet size for a paper; margins leave room for the PDF's footer line. */
export function sheetCss(paper: Paper): string {
  const p = PAPER[paper];
  return `@page{size:${p.cssSize};margin:${p.marginMm.top}mm ${p.marginMm.side}mm ${p.marginMm.bottom}mm}
.fc-sheet{width:${p.widthMm - 2 * p.marginMm.side}mm;height:${p.widthMm > 0 ? p.heightMm - p.marginMm.top - p.marginMm.bottom - 0.6 : 0}mm}
@media screen{.fc-sheet{margin:6mm auto;box-shadow:0 1px 6px rgba(0,0,0,.25);outline:${p.marginMm.side}mm solid #fff}}`;
}

/** The focus call's small plan (shares the diagram's classes). */
export const PLAN_CSS = `
.fc-plan{width:100%;height:auto;border:1px solid var(--line,#d6d0c4);border-radius:6px;--fc-ink:var(--ink,#1f1d1a);--fc-muted:var(--muted,#6b655c);--fc-surface:var(--surface,#fff)}
.fc-plan line,.fc-plan path,.fc-plan circle{vector-effect:non-scaling-stroke}
.fc-plan .fc-bg{fill:var(--fc-surface)}
.fc-plan .fc-lm{stroke:var(--fc-muted);stroke-width:1;stroke-dasharray:5 3}
.fc-plan .fc-muted{fill:var(--fc-muted)}
.fc-plan .fc-mark{fill:var(--fc-surface);stroke:var(--fc-ink);stroke-width:1.4}
.fc-plan-neighbour{fill:rgba(120,140,200,.18);stroke:rgba(120,140,200,.8);stroke-width:1;stroke-dasharray:4 2}
.fc-plan-current{fill:rgba(236,178,60,.45);stroke:rgba(200,120,20,.95);stroke-width:1.6}
`;
