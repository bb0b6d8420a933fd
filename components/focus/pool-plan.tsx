// The focus call's small plan of the whole stage: the stage lines, the current unit's pool (strong) and the
// pools of its neighbours on the same mark (faint), so the crew can see the overlap they are matching. Plan
// to scale, audience at the bottom. Names reach it as React text, so they are escaped.
import { ellipseToPolygon, type Ellipse } from "@/lib/optics";
import { drawnPool, fmt } from "@/lib/focus/diagram";
import type { FocusChart } from "@/lib/focus/chart-model";
import type { Landmark } from "@/lib/focus/landmarks";
import { sharedMarkWords } from "@/lib/focus/shared-mark";

type Unit = Pick<FocusChart["fixture"], "computed" | "unitNumber">;
const pathOf = (e: Ellipse) =>
  `M${ellipseToPolygon(e, 48)
    .map((p) => `${fmt(p.x)},${fmt(-p.y)}`)
    .join("L")}Z`;

function PoolOutline({ unit, className }: { unit: Pick<Unit, "computed">; className: string }) {
  const outer = drawnPool(unit.computed)?.pool.outer;
  return outer ? <path d={pathOf(outer)} className={className} /> : null;
}

export function PoolPlan(o: {
  current: Unit;
  neighbours: Unit[];
  landmarks: Landmark[];
  stage: { stageWidth: number; apronDepth: number; backWallY: number };
}) {
  const half = o.stage.stageWidth / 2 + 1;
  const box = { minX: -half, maxX: half, minY: -o.stage.apronDepth - 1, maxY: o.stage.backWallY + 0.5 };
  const text = (box.maxX - box.minX) * 0.028;
  const mark = o.current.computed.focus;
  return (
    <svg
      className="fc-plan"
      viewBox={`${fmt(box.minX)} ${fmt(-box.maxY)} ${fmt(box.maxX - box.minX)} ${fmt(box.maxY - box.minY)}`}
      role="img"
      aria-label="Stage plan with this unit's pool and its neighbours'"
    >
      <rect
        x={fmt(box.minX)}
        y={fmt(-box.maxY)}
        width={fmt(box.maxX - box.minX)}
        height={fmt(box.maxY - box.minY)}
        className="fc-bg"
      />
      {o.landmarks.map((l, n) => (
        <line key={n} x1={fmt(l.a.x)} y1={fmt(-l.a.y)} x2={fmt(l.b.x)} y2={fmt(-l.b.y)} className="fc-lm" />
      ))}
      {o.neighbours.map((u, n) => (
        <PoolOutline key={n} unit={u} className="fc-plan-neighbour" />
      ))}
      <PoolOutline unit={o.current} className="fc-plan-current" />
      {mark ? <circle cx={fmt(mark.x)} cy={fmt(-mark.y)} r={fmt(text * 0.35)} className="fc-mark" /> : null}
      <text x={fmt(box.minX + text * 0.5)} y={fmt(-box.minY - text * 0.5)} fontSize={fmt(text)} className="fc-muted">
        audience
      </text>
      <text
        x={fmt(box.maxX - text * 0.5)}
        y={fmt(-box.minY - text * 0.5)}
        fontSize={fmt(text)}
        textAnchor="end"
        className="fc-muted"
      >
        {sharedMarkWords(o.current.unitNumber, o.neighbours.length)}
      </text>
    </svg>
  );
}
