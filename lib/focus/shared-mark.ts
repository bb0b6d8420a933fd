// A small plan of the whole stage for the focus call: the stage outline, the current unit's deck pool
// (strong) and the pools of its neighbours on the same focus point (faint), so the crew can see the
// overlap they are matching. Plan to scale, audience at the bottom.
import { ellipseToPolygon, type Ellipse, type Point } from "@/lib/optics";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { Landmark } from "./landmarks";
import { escapeHtml } from "./escape";
import { drawnPool } from "./diagram";

const fmt = (v: number) => (Math.round(v * 1000) / 1000).toString();
const pathOf = (e: Ellipse) => `M${ellipseToPolygon(e, 48).map((p) => `${fmt(p.x)},${fmt(-p.y)}`).join("L")}Z`;

/** Fixtures sharing the focus point, or (without one) aimed within half a metre of the same mark. */
export function neighboursOf<F extends Pick<FixtureDto, "id" | "focusPointId" | "computed">>(current: F, all: F[]): F[] {
  const mark = current.computed.focus;
  return all.filter((f) => {
    if (f.id === current.id || !f.computed.focus) return false;
    if (current.focusPointId != null) return f.focusPointId === current.focusPointId;
    return !!mark && Math.hypot(f.computed.focus.x - mark.x, f.computed.focus.y - mark.y) < 0.5;
  });
}

/** "unit 14 and 21 others on this mark": the count is of the other units, so it says so. */
export function sharedMarkWords(unitNumber: string, others: number): string {
  if (others === 0) return `unit ${unitNumber}, alone on this mark`;
  return `unit ${unitNumber} and ${others} ${others === 1 ? "other" : "others"} on this mark`;
}

export function poolPlanSvg(o: {
  current: Pick<FixtureDto, "computed" | "unitNumber">;
  neighbours: Array<Pick<FixtureDto, "computed" | "positionName" | "unitNumber">>;
  landmarks: Landmark[];
  stage: { stageWidth: number; apronDepth: number; backWallY: number };
}): string {
  const half = o.stage.stageWidth / 2 + 1;
  const box = { minX: -half, maxX: half, minY: -o.stage.apronDepth - 1, maxY: o.stage.backWallY + 0.5 };
  const text = (box.maxX - box.minX) * 0.028;
  const lines = o.landmarks
    .map((l) => `<line x1="${fmt(l.a.x)}" y1="${fmt(-l.a.y)}" x2="${fmt(l.b.x)}" y2="${fmt(-l.b.y)}" class="fc-lm"/>`)
    .join("");
  const pool = (f: { computed: FixtureDto["computed"] }, cls: string) => {
    const outer = drawnPool(f.computed)?.pool.outer;
    return outer ? `<path d="${pathOf(outer)}" class="${cls}"/>` : "";
  };
  const neighbours = o.neighbours.map((n) => pool(n, "fc-plan-neighbour")).join("");
  const mark: Point | null = o.current.computed.focus;
  const markSvg = mark ? `<circle cx="${fmt(mark.x)}" cy="${fmt(-mark.y)}" r="${fmt(text * 0.35)}" class="fc-mark"/>` : "";
  const legend = `<text x="${fmt(box.minX + text * 0.5)}" y="${fmt(-box.minY - text * 0.5)}" font-size="${fmt(text)}" class="fc-muted">audience</text>` +
    `<text x="${fmt(box.maxX - text * 0.5)}" y="${fmt(-box.minY - text * 0.5)}" font-size="${fmt(text)}" text-anchor="end" class="fc-muted">${escapeHtml(sharedMarkWords(o.current.unitNumber, o.neighbours.length))}</text>`;
  return `<svg class="fc-plan" viewBox="${fmt(box.minX)} ${fmt(-box.maxY)} ${fmt(box.maxX - box.minX)} ${fmt(box.maxY - box.minY)}" role="img" aria-label="Stage plan with this unit's pool and its neighbours'">` +
    `<rect x="${fmt(box.minX)}" y="${fmt(-box.maxY)}" width="${fmt(box.maxX - box.minX)}" height="${fmt(box.maxY - box.minY)}" class="fc-bg"/>` +
    lines + neighbours + pool(o.current, "fc-plan-current") + markSvg + legend + `</svg>`;
}
