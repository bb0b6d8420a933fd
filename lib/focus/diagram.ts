// The chart's diagram as an SVG string, drawn to scale in plan (audience at the bottom): the stage lines
// near the mark, the mark, the deck pool's outer and core edges with the soft band shaded between them, the
// shutter cuts, an arrow for the direction the light comes from, and a scale bar. One string serves the
// screen, the browser's print and the server's PDF, so all three show the same drawing.
import { clipPoolByCuts, ellipseBounds, ellipseToPolygon, formatLength, METRES_PER_FOOT, type Ellipse, type Point, type Units } from "@/lib/optics";
import type { FixtureDto } from "@/lib/data/fixtures";
import type { Landmark } from "./landmarks";
import { escapeHtml } from "./escape";

export type DiagramInput = {
  fixture: Pick<FixtureDto, "computed" | "shutterCuts" | "focusPointName">;
  landmarks: Landmark[];
  units: Units;
  /** Shutter letters to print beside each cut, in the same order as fixture.shutterCuts. */
  cutLabels?: string[];
};

type Box = { minX: number; minY: number; maxX: number; maxY: number };

const MIN_SPAN_M = 3;
const fmt = (v: number) => (Math.round(v * 1000) / 1000).toString();
/** Plan to SVG: y upstage is up on the page. */
const pt = (p: Point) => `${fmt(p.x)},${fmt(-p.y)}`;
const path = (poly: Point[]) => (poly.length ? `M${poly.map(pt).join("L")}Z` : "");
const CUT_POINTS = 48;

/** A plan ellipse as an SVG <ellipse>: the page's y runs down, so the plan's rotation turns the other way. */
function ellipseEl(e: Ellipse, cls: string): string {
  const cx = fmt(e.centre.x);
  const cy = fmt(-e.centre.y);
  const rot = e.rotationDeg ? ` transform="rotate(${fmt(-e.rotationDeg)} ${cx} ${cy})"` : "";
  return `<ellipse cx="${cx}" cy="${cy}" rx="${fmt(e.semiMajor)}" ry="${fmt(e.semiMinor)}"${rot} class="${cls}"/>`;
}

function viewBox(mark: Point, outer: { minX: number; minY: number; maxX: number; maxY: number } | null): Box {
  const b = outer ?? { minX: mark.x, minY: mark.y, maxX: mark.x, maxY: mark.y };
  const box = { minX: Math.min(b.minX, mark.x), minY: Math.min(b.minY, mark.y), maxX: Math.max(b.maxX, mark.x), maxY: Math.max(b.maxY, mark.y) };
  const span = Math.max(MIN_SPAN_M, box.maxX - box.minX, box.maxY - box.minY) * 1.35;
  const cx = (box.minX + box.maxX) / 2;
  const cy = (box.minY + box.maxY) / 2;
  return { minX: cx - span / 2, maxX: cx + span / 2, minY: cy - span / 2, maxY: cy + span / 2 };
}

/** A round scale-bar length (1, 2, 5 × 10ⁿ metres, or whole feet) about a fifth of the view. */
function scaleLength(span: number, units: Units): number {
  const unit = units === "imperial" ? METRES_PER_FOOT : 1;
  const target = span / 5 / unit;
  const pow = 10 ** Math.floor(Math.log10(target));
  const step = [1, 2, 5, 10].find((s) => s * pow >= target) ?? 10;
  return Math.max(step * pow, units === "imperial" ? 1 : 0) * unit;
}

/** The part of segment a–b inside the box (Liang–Barsky), or null: a stage line drawn past the view
 * would still be dashed all along its length in the PDF. */
export function clipSegment(a: Point, b: Point, box: Box): [Point, Point] | null {
  const d = { x: b.x - a.x, y: b.y - a.y };
  let t0 = 0;
  let t1 = 1;
  const edges: Array<[number, number]> = [[-d.x, a.x - box.minX], [d.x, box.maxX - a.x], [-d.y, a.y - box.minY], [d.y, box.maxY - a.y]];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return null;
  }
  return [{ x: a.x + d.x * t0, y: a.y + d.y * t0 }, { x: a.x + d.x * t1, y: a.y + d.y * t1 }];
}

function landmarkLines(landmarks: Landmark[], box: Box, text: number): string {
  return landmarks
    .flatMap((l) => {
      const seg = clipSegment(l.a, l.b, box);
      return seg ? [{ ...l, a: seg[0], b: seg[1] }] : [];
    })
    .map((l) => {
      const mid = { x: Math.min(Math.max((l.a.x + l.b.x) / 2, box.minX + text * 3), box.maxX - text * 3), y: (l.a.y + l.b.y) / 2 };
      const vertical = Math.abs(l.b.x - l.a.x) < Math.abs(l.b.y - l.a.y);
      const labelAt = vertical ? { x: l.a.x, y: Math.min(Math.max(mid.y, box.minY + text), box.maxY - text * 4) } : mid;
      const inside = labelAt.x > box.minX && labelAt.x < box.maxX && labelAt.y > box.minY && labelAt.y < box.maxY;
      const label = inside
        ? `<text x="${fmt(labelAt.x + text * 0.3)}" y="${fmt(-labelAt.y - text * 0.3)}" class="fc-lm-label" font-size="${fmt(text)}"${vertical ? ` transform="rotate(-90 ${fmt(labelAt.x + text * 0.3)} ${fmt(-labelAt.y - text * 0.3)})"` : ""}>${escapeHtml(l.name)}</text>`
        : "";
      return `<line x1="${fmt(l.a.x)}" y1="${fmt(-l.a.y)}" x2="${fmt(l.b.x)}" y2="${fmt(-l.b.y)}" class="fc-lm"/>${label}`;
    })
    .join("");
}

/** The pool the chart draws: at the aim height the designer chose, else the other plane; null if both are open. */
export function drawnPool(g: FixtureDto["computed"]): { pool: NonNullable<FixtureDto["computed"]["deck"]>; plane: "the deck" | "head height" } | null {
  const deck = g.deck?.status === "ok" && g.deck.outer ? { pool: g.deck, plane: "the deck" as const } : null;
  const head = g.head?.status === "ok" && g.head.outer ? { pool: g.head, plane: "head height" as const } : null;
  return g.focus && g.focus.z > 0 ? head ?? deck : deck ?? head;
}

export function diagramSvg(i: DiagramInput): string {
  const g = i.fixture.computed;
  if (!g.focus) return `<svg class="fc-diagram" viewBox="0 0 10 4" role="img" aria-label="No focus mark"><text x="5" y="2.2" text-anchor="middle" font-size="0.8" class="fc-muted">No focus mark set</text></svg>`;
  const mark = { x: g.focus.x, y: g.focus.y };
  const chosen = drawnPool(g);
  const pool = chosen?.pool ?? null;
  const circleR = !pool && g.throw ? g.throw * Math.tan((g.coneDeg * Math.PI) / 360) : 0;
  const box = viewBox(mark, pool?.outer ? ellipseBounds(pool.outer) : circleR ? { minX: mark.x - circleR, maxX: mark.x + circleR, minY: mark.y - circleR, maxY: mark.y + circleR } : null);
  const span = box.maxX - box.minX;
  const text = span * 0.04;
  const cuts = (i.fixture.shutterCuts ?? []).map((c) => ({ a: c.a, b: c.b }));

  let poolSvg = "";
  if (pool?.outer) {
    // Uncut pools are drawn as <ellipse> elements (a few bytes each, cheap to print); only a pool the
    // shutters cut becomes polygons, with fewer points than the optics default, which is plenty at this size.
    let band = ellipseEl(pool.outer, "fc-band");
    let core = pool.core ? ellipseEl(pool.core, "fc-core") : "";
    if (cuts.length) {
      try {
        band = `<path d="${path(clipPoolByCuts(ellipseToPolygon(pool.outer, CUT_POINTS), cuts, mark))}" class="fc-band"/>`;
        const clippedCore = pool.core ? clipPoolByCuts(ellipseToPolygon(pool.core, CUT_POINTS), cuts, mark) : [];
        core = clippedCore.length ? `<path d="${path(clippedCore)}" class="fc-core"/>` : "";
      } catch {
        /* a cut through the mark is reported on the chart; draw the uncut pool */
      }
    }
    poolSvg = band + core + ellipseEl(pool.outer, "fc-outline");
  }

  const cutSvg = cuts
    .map((c, n) => {
      const label = i.cutLabels?.[n] ?? "";
      const mid = { x: (c.a.x + c.b.x) / 2, y: (c.a.y + c.b.y) / 2 };
      return `<line x1="${fmt(c.a.x)}" y1="${fmt(-c.a.y)}" x2="${fmt(c.b.x)}" y2="${fmt(-c.b.y)}" class="fc-cut"/>` +
        (label ? `<text x="${fmt(mid.x)}" y="${fmt(-mid.y - text * 0.4)}" font-size="${fmt(text)}" class="fc-cut-label" text-anchor="middle">${escapeHtml(label)}</text>` : "");
    })
    .join("");

  // The arrow runs along the beam's plan direction, ending just short of the near edge of the pool.
  let arrow = "";
  const dx = g.focus.x - g.source.x;
  const dy = g.focus.y - g.source.y;
  const plan = Math.hypot(dx, dy);
  if (plan > 1e-6) {
    const u = { x: dx / plan, y: dy / plan };
    const reach = pool?.outer ? Math.max(pool.outer.semiMajor, pool.outer.semiMinor) : span * 0.1;
    const tip = { x: mark.x - u.x * Math.min(reach * 0.9, span * 0.42), y: mark.y - u.y * Math.min(reach * 0.9, span * 0.42) };
    const tail = { x: tip.x - u.x * span * 0.14, y: tip.y - u.y * span * 0.14 };
    arrow = `<line x1="${fmt(tail.x)}" y1="${fmt(-tail.y)}" x2="${fmt(tip.x)}" y2="${fmt(-tip.y)}" class="fc-arrow" marker-end="url(#fc-head)"/>`;
  } else {
    arrow = `<circle cx="${fmt(mark.x)}" cy="${fmt(-mark.y)}" r="${fmt(text * 0.9)}" class="fc-arrow-down"/>`;
  }

  const r = text * 0.45;
  const markSvg = `<circle cx="${fmt(mark.x)}" cy="${fmt(-mark.y)}" r="${fmt(r)}" class="fc-mark"/>` +
    `<line x1="${fmt(mark.x - r * 2)}" y1="${fmt(-mark.y)}" x2="${fmt(mark.x + r * 2)}" y2="${fmt(-mark.y)}" class="fc-mark-cross"/>` +
    `<line x1="${fmt(mark.x)}" y1="${fmt(-mark.y - r * 2)}" x2="${fmt(mark.x)}" y2="${fmt(-mark.y + r * 2)}" class="fc-mark-cross"/>` +
    (i.fixture.focusPointName ? `<text x="${fmt(mark.x + r * 2.2)}" y="${fmt(-mark.y + text * 1.2)}" font-size="${fmt(text)}" class="fc-mark-label">${escapeHtml(i.fixture.focusPointName)}</text>` : "");

  const bar = scaleLength(span, i.units);
  const bx = box.minX + text;
  const by = -(box.minY + text * 1.2);
  const scale = `<line x1="${fmt(bx)}" y1="${fmt(by)}" x2="${fmt(bx + bar)}" y2="${fmt(by)}" class="fc-scale"/>` +
    `<text x="${fmt(bx)}" y="${fmt(by - text * 0.4)}" font-size="${fmt(text)}" class="fc-muted">${escapeHtml(formatLength(bar, i.units).replace(/ 0"$/, ""))}</text>`;
  // With no closed pool on either plane, a dashed circle shows the beam's width square to the axis at the mark.
  const across = !pool && g.throw ? g.throw * Math.tan((g.coneDeg * Math.PI) / 360) : 0;
  const beamCircle = across > 0 ? `<circle cx="${fmt(mark.x)}" cy="${fmt(-mark.y)}" r="${fmt(across)}" class="fc-outline"/>` : "";
  const caption = pool ? `pool at ${chosen!.plane}` : "pool open: beam width at the mark";
  const open = `<text x="${fmt(box.minX + text)}" y="${fmt(-box.maxY + text * 1.4)}" font-size="${fmt(text)}" class="${pool ? "fc-muted" : "fc-warn"}">${caption}</text>`;

  const vb = `${fmt(box.minX)} ${fmt(-box.maxY)} ${fmt(span)} ${fmt(box.maxY - box.minY)}`;
  // Strokes are in plan metres scaled to the view (--u), not non-scaling strokes: those cost Chromium dearly
  // when printing hundreds of diagrams, and a line a fixed share of the drawing reads the same at any size.
  return `<svg class="fc-diagram" style="--u:${fmt(span / 250)}px" viewBox="${vb}" preserveAspectRatio="xMidYMid meet" role="img" aria-label="Pool diagram, to scale, audience at the bottom">` +
    `<defs><marker id="fc-head" viewBox="0 0 10 10" refX="8" refY="5" markerWidth="5" markerHeight="5" orient="auto-start-reverse"><path d="M0,0L10,5L0,10z" class="fc-arrow-head"/></marker></defs>` +
    `<rect x="${fmt(box.minX)}" y="${fmt(-box.maxY)}" width="${fmt(span)}" height="${fmt(box.maxY - box.minY)}" class="fc-bg"/>` +
    landmarkLines(i.landmarks, box, text * 0.85) + poolSvg + beamCircle + cutSvg + arrow + markSvg + scale + open + `</svg>`;
}
