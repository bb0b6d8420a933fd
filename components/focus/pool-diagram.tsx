// The focus chart's diagram as SVG elements, drawn to scale in plan (audience at the bottom): the stage lines
// near the mark, the mark, the pool's outer and core edges with the soft band shaded between them, the
// shutter cuts, an arrow for the direction the light comes from, and a scale bar. No hooks and no context:
// the server's PDF renders it with react-dom/server outside the React Server Components bundle.
import type { CSSProperties, ReactElement } from "react";
import { clipPoolByCuts, ellipseBounds, ellipseToPolygon, formatLength, type Point } from "@/lib/optics";
import {
  CUT_POINTS,
  drawnPool,
  ellipseAttrs,
  fmt,
  landmarkLines,
  scaleLength,
  svgPath,
  viewBox,
  type Box,
  type DiagramInput,
} from "@/lib/focus/diagram";

function StageLines({ input, box, text }: { input: DiagramInput; box: Box; text: number }) {
  return landmarkLines(input.landmarks, box, text).map((l, n) => {
    const x = l.label ? fmt(l.label.at.x + text * 0.3) : "";
    const y = l.label ? fmt(-l.label.at.y - text * 0.3) : "";
    return [
      <line key={`l${n}`} x1={fmt(l.a.x)} y1={fmt(-l.a.y)} x2={fmt(l.b.x)} y2={fmt(-l.b.y)} className="fc-lm" />,
      l.label ? (
        <text
          key={`t${n}`}
          x={x}
          y={y}
          className="fc-lm-label"
          fontSize={fmt(text)}
          transform={l.label.vertical ? `rotate(-90 ${x} ${y})` : undefined}
        >
          {l.name}
        </text>
      ) : null,
    ];
  });
}

/** The pool's band and core (cut by the shutters when there are cuts) and its dashed outer edge. */
function Pool({
  pool,
  cuts,
  mark,
}: {
  pool: NonNullable<ReturnType<typeof drawnPool>>["pool"];
  cuts: Array<{ a: Point; b: Point }>;
  mark: Point;
}) {
  if (!pool.outer) return null;
  // Uncut pools are drawn as <ellipse> elements (a few bytes each, cheap to print); only a pool the
  // shutters cut becomes polygons.
  let band: ReactElement = <ellipse {...ellipseAttrs(pool.outer)} className="fc-band" />;
  let core: ReactElement | null = pool.core ? <ellipse {...ellipseAttrs(pool.core)} className="fc-core" /> : null;
  if (cuts.length) {
    try {
      const clippedBand = svgPath(clipPoolByCuts(ellipseToPolygon(pool.outer, CUT_POINTS), cuts, mark));
      const clippedCore = pool.core ? clipPoolByCuts(ellipseToPolygon(pool.core, CUT_POINTS), cuts, mark) : [];
      band = <path d={clippedBand} className="fc-band" />;
      core = clippedCore.length ? <path d={svgPath(clippedCore)} className="fc-core" /> : null;
    } catch {
      /* a cut through the mark is reported on the chart; draw the uncut pool */
    }
  }
  return (
    <>
      {band}
      {core}
      <ellipse {...ellipseAttrs(pool.outer)} className="fc-outline" />
    </>
  );
}

export function PoolDiagram(input: DiagramInput) {
  const g = input.fixture.computed;
  if (!g.focus) {
    return (
      <svg className="fc-diagram" viewBox="0 0 10 4" role="img" aria-label="No focus mark">
        <text x="5" y="2.2" textAnchor="middle" fontSize="0.8" className="fc-muted">
          No focus mark set
        </text>
      </svg>
    );
  }
  const mark = { x: g.focus.x, y: g.focus.y };
  const chosen = drawnPool(g);
  const pool = chosen?.pool ?? null;
  // With no closed pool on either plane, a dashed circle shows the beam's width square to the axis at the mark.
  const across = !pool && g.throw ? g.throw * Math.tan((g.coneDeg * Math.PI) / 360) : 0;
  const box = viewBox(
    mark,
    pool?.outer
      ? ellipseBounds(pool.outer)
      : across
        ? { minX: mark.x - across, maxX: mark.x + across, minY: mark.y - across, maxY: mark.y + across }
        : null,
  );
  const span = box.maxX - box.minX;
  const text = span * 0.04;
  const cuts = (input.fixture.shutterCuts ?? []).map((c) => ({ a: c.a, b: c.b }));
  const r = text * 0.45;
  const bar = scaleLength(span, input.units);
  const bx = box.minX + text;
  const by = -(box.minY + text * 1.2);
  const vb = `${fmt(box.minX)} ${fmt(-box.maxY)} ${fmt(span)} ${fmt(box.maxY - box.minY)}`;
  // Strokes are in plan metres scaled to the view (--u), not non-scaling strokes: those cost Chromium dearly
  // when printing hundreds of diagrams, and a line a fixed share of the drawing reads the same at any size.
  const style = { "--u": `${fmt(span / 250)}px` } as CSSProperties;
  return (
    <svg
      className="fc-diagram"
      style={style}
      viewBox={vb}
      preserveAspectRatio="xMidYMid meet"
      role="img"
      aria-label="Pool diagram, to scale, audience at the bottom"
    >
      <defs>
        <marker
          id="fc-head"
          viewBox="0 0 10 10"
          refX="8"
          refY="5"
          markerWidth="5"
          markerHeight="5"
          orient="auto-start-reverse"
        >
          <path d="M0,0L10,5L0,10z" className="fc-arrow-head" />
        </marker>
      </defs>
      <rect
        x={fmt(box.minX)}
        y={fmt(-box.maxY)}
        width={fmt(span)}
        height={fmt(box.maxY - box.minY)}
        className="fc-bg"
      />
      <StageLines input={input} box={box} text={text * 0.85} />
      {pool ? <Pool pool={pool} cuts={cuts} mark={mark} /> : null}
      {across > 0 ? <circle cx={fmt(mark.x)} cy={fmt(-mark.y)} r={fmt(across)} className="fc-outline" /> : null}
      {cuts.map((c, n) => (
        <Cut key={n} cut={c} label={input.cutLabels?.[n] ?? ""} text={text} />
      ))}
      <Arrow
        g={g}
        mark={mark}
        reach={pool?.outer ? Math.max(pool.outer.semiMajor, pool.outer.semiMinor) : span * 0.1}
        span={span}
        text={text}
      />
      <circle cx={fmt(mark.x)} cy={fmt(-mark.y)} r={fmt(r)} className="fc-mark" />
      <line
        x1={fmt(mark.x - r * 2)}
        y1={fmt(-mark.y)}
        x2={fmt(mark.x + r * 2)}
        y2={fmt(-mark.y)}
        className="fc-mark-cross"
      />
      <line
        x1={fmt(mark.x)}
        y1={fmt(-mark.y - r * 2)}
        x2={fmt(mark.x)}
        y2={fmt(-mark.y + r * 2)}
        className="fc-mark-cross"
      />
      {input.fixture.focusPointName ? (
        <text x={fmt(mark.x + r * 2.2)} y={fmt(-mark.y + text * 1.2)} fontSize={fmt(text)} className="fc-mark-label">
          {input.fixture.focusPointName}
        </text>
      ) : null}
      <line x1={fmt(bx)} y1={fmt(by)} x2={fmt(bx + bar)} y2={fmt(by)} className="fc-scale" />
      <text x={fmt(bx)} y={fmt(by - text * 0.4)} fontSize={fmt(text)} className="fc-muted">
        {formatLength(bar, input.units).replace(/ 0"$/, "")}
      </text>
      <text
        x={fmt(box.minX + text)}
        y={fmt(-box.maxY + text * 1.4)}
        fontSize={fmt(text)}
        className={pool ? "fc-muted" : "fc-warn"}
      >
        {pool ? `pool at ${chosen!.plane}` : "pool open: beam width at the mark"}
      </text>
    </svg>
  );
}

function Cut({ cut, label, text }: { cut: { a: Point; b: Point }; label: string; text: number }) {
  const mid = { x: (cut.a.x + cut.b.x) / 2, y: (cut.a.y + cut.b.y) / 2 };
  return (
    <>
      <line x1={fmt(cut.a.x)} y1={fmt(-cut.a.y)} x2={fmt(cut.b.x)} y2={fmt(-cut.b.y)} className="fc-cut" />
      {label ? (
        <text
          x={fmt(mid.x)}
          y={fmt(-mid.y - text * 0.4)}
          fontSize={fmt(text)}
          className="fc-cut-label"
          textAnchor="middle"
        >
          {label}
        </text>
      ) : null}
    </>
  );
}

/** Along the beam's plan direction, ending just short of the pool's near edge; a ring when the beam points straight down. */
function Arrow({
  g,
  mark,
  reach,
  span,
  text,
}: {
  g: DiagramInput["fixture"]["computed"];
  mark: Point;
  reach: number;
  span: number;
  text: number;
}) {
  const dx = mark.x - g.source.x;
  const dy = mark.y - g.source.y;
  const plan = Math.hypot(dx, dy);
  if (plan <= 1e-6) return <circle cx={fmt(mark.x)} cy={fmt(-mark.y)} r={fmt(text * 0.9)} className="fc-arrow-down" />;
  const u = { x: dx / plan, y: dy / plan };
  const tip = {
    x: mark.x - u.x * Math.min(reach * 0.9, span * 0.42),
    y: mark.y - u.y * Math.min(reach * 0.9, span * 0.42),
  };
  const tail = { x: tip.x - u.x * span * 0.14, y: tip.y - u.y * span * 0.14 };
  return (
    <line
      x1={fmt(tail.x)}
      y1={fmt(-tail.y)}
      x2={fmt(tip.x)}
      y2={fmt(-tip.y)}
      className="fc-arrow"
      markerEnd="url(#fc-head)"
    />
  );
}
