// One focus chart as an HTML string (with its SVG diagram). The screen, the browser's print view and the
// server's PDF all use this one renderer and the stylesheet in chart-css.ts.
import type { Units } from "@/lib/optics";
import type { ChartRow, FocusChart } from "./chart-model";
import { diagramSvg } from "./diagram";
import { escapeHtml } from "./escape";
import type { Landmark } from "./landmarks";

const SHORT: Record<string, string> = { top: "T", bottom: "B", left: "L", right: "R" };

function rows(list: ChartRow[], skip: string[] = []): string {
  return list
    .filter((r) => !skip.includes(r.key))
    .map((r) => `<div class="fc-row" data-key="${r.key}"><dt>${escapeHtml(r.label)}</dt><dd>${escapeHtml(r.value)}</dd></div>`)
    .join("");
}

function cutsHtml(chart: FocusChart): string {
  if (!chart.cuts.length) return `<p class="fc-none">No cuts.</p>`;
  return `<ol class="fc-cutlist">${chart.cuts
    .map((c) => `<li><b>${escapeHtml(c.words)}</b> — ${escapeHtml(c.cutterWords)}</li>`)
    .join("")}</ol>`;
}

function notesHtml(label: string, text: string | null, cls: string): string {
  return `<div class="fc-note ${cls}"><span class="fc-note-label">${label}</span> ${text?.trim() ? escapeHtml(text) : `<span class="fc-none">none</span>`}</div>`;
}

// The deck photo beside the notes: a small copy (a data: URL in the server's PDF), linked to the full one on screen.
function photoHtml(chart: FocusChart): string {
  if (!chart.photo) return "";
  // Lazy on screen, where a long list may hold hundreds; the PDF's inline copies load with the page.
  const lazy = chart.photo.href ? ` loading="lazy"` : "";
  const img = `<img src="${escapeHtml(chart.photo.thumbSrc)}"${lazy} alt="Focus photo of ${escapeHtml(chart.positionName)} unit ${escapeHtml(chart.unitNumber)}" data-testid="focus-photo-thumb">`;
  return chart.photo.href ? `<a class="fc-photo" href="${escapeHtml(chart.photo.href)}" target="_blank" rel="noopener">${img}</a>` : `<span class="fc-photo">${img}</span>`;
}

export function chartHtml(chart: FocusChart, o: { landmarks: Landmark[]; units: Units }): string {
  const svg = diagramSvg({
    fixture: chart.fixture,
    landmarks: o.landmarks,
    units: o.units,
    cutLabels: chart.cuts.map((c) => (c.physical ? SHORT[c.physical] : "")),
  });
  const status = chart.focused ? "fc-status fc-done" : "fc-status";
  const warn = chart.warnings.length ? `<p class="fc-warn-text">${chart.warnings.map(escapeHtml).join(" ")}</p>` : "";
  return `<article class="fc-card" data-testid="focus-chart" data-fixture-id="${chart.id}">` +
    `<header class="fc-head"><span class="fc-title">${escapeHtml(chart.positionName)} · unit ${escapeHtml(chart.unitNumber)}</span>` +
    `<span class="fc-chan">ch ${chart.channel ?? "—"}</span><span class="${status}">${escapeHtml(chart.focusedLine)}</span></header>` +
    `<div class="fc-body"><figure class="fc-figure">${svg}</figure>` +
    `<dl class="fc-fields fc-identity">${rows(chart.identity, ["position", "unit", "channel"])}</dl>` +
    `<dl class="fc-fields fc-focus">${rows(chart.focus)}${rows(chart.beam)}</dl></div>` +
    `<section class="fc-cuts"><h4>Cuts</h4>${cutsHtml(chart)}</section>` +
    `<div class="fc-foot"><section class="fc-notes">${notesHtml("Designer:", chart.notes, "fc-designer")}${notesHtml("As focused:", chart.focusNotes, "fc-electrician")}</section>${photoHtml(chart)}</div>` +
    warn + `</article>`;
}
