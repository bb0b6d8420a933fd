"use client";

import { useEffect, useRef, useState } from "react";
import { Circle, Ellipse, Layer, Line, Stage } from "react-konva";
import type { Ellipse as PoolEllipse } from "@/lib/optics";

export type PlanPool = { id: number; source: { x: number; y: number }; pool: PoolEllipse; level: number; channel: number | null };

function cssVar(name: string, fallback: string) {
  if (typeof window === "undefined") return fallback;
  return getComputedStyle(document.documentElement).getPropertyValue(name).trim() || fallback;
}

/** Read-only plan: x to stage left is to the right, upstage is up (plan y is flipped for the screen). */
export function CuePlanCanvas({ pools }: { pools: PlanPool[] }) {
  const box = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(480);
  const [colours, setColours] = useState({ accent: "#b4561c", line: "#d6d0c4", ink: "#1f1d1a" });
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const read = () => {
      setWidth(el.clientWidth);
      setColours({ accent: cssVar("--accent", "#b4561c"), line: cssVar("--line", "#d6d0c4"), ink: cssVar("--muted", "#6b655c") });
    };
    read();
    const ro = new ResizeObserver(read);
    ro.observe(el);
    const mo = new MutationObserver(read); // the theme toggle changes <html class>
    mo.observe(document.documentElement, { attributes: true, attributeFilter: ["class"] });
    return () => (ro.disconnect(), mo.disconnect());
  }, []);

  // Frame the pool centres (not their full extent: a wide wash would shrink the stage to a dot).
  const xs = pools.map((p) => p.pool.centre.x);
  const ys = pools.map((p) => p.pool.centre.y);
  const minX = Math.min(-6, ...xs) - 1, maxX = Math.max(6, ...xs) + 1, minY = Math.min(-1, ...ys) - 1, maxY = Math.max(8, ...ys) + 1;
  // One scale for both axes, so rotated ellipses keep their true shape.
  const scale = Math.min(width / (maxX - minX), 520 / (maxY - minY));
  const height = (maxY - minY) * scale;
  const sx = (x: number) => (x - minX) * scale;
  const sy = (y: number) => height - (y - minY) * scale;

  return (
    <div ref={box} className="w-full" data-testid="cue-plan" aria-label={`Plan with ${pools.filter((p) => p.level > 0).length} lit pools`} role="img">
      <Stage width={width} height={height} listening={false}>
        <Layer clipX={0} clipY={0} clipWidth={width} clipHeight={height}>
          <Line points={[sx(minX), sy(0), sx(maxX), sy(0)]} stroke={colours.line} dash={[6, 4]} strokeWidth={1} />
          <Line points={[sx(0), sy(minY), sx(0), sy(maxY)]} stroke={colours.line} dash={[2, 4]} strokeWidth={1} />
          {[...pools].sort((a, b) => a.level - b.level).map((p) => (
            <Ellipse
              key={p.id}
              x={sx(p.pool.centre.x)}
              y={sy(p.pool.centre.y)}
              radiusX={p.pool.semiMajor * scale}
              radiusY={p.pool.semiMinor * scale}
              rotation={-p.pool.rotationDeg}
              fill={colours.accent}
              opacity={p.level > 0 ? 0.02 + 0.1 * p.level : 0.6}
              fillEnabled={p.level > 0}
              stroke={p.level > 0 ? colours.accent : colours.line}
              strokeWidth={p.level > 0 ? 0.5 + p.level : 0.5}
            />
          ))}
          {pools.map((p) => <Circle key={`s${p.id}`} x={sx(p.source.x)} y={sy(p.source.y)} radius={2} fill={p.level > 0 ? colours.accent : colours.ink} />)}
        </Layer>
      </Stage>
    </div>
  );
}
